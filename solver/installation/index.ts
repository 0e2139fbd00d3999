/** Installation data and site checks: public entry points (re-exported by solver/index.ts). */
export {
  cableFrequencies, tautStringFrequency, irvineLambdaSquared, symmetricOmegaBar, modeFrequency,
  type CableFrequencies, type CableVibrationInput, type CableMode,
} from './cable-frequency.ts';
export * from './site-check.ts';
export { fixedEndTension, type FixedEndCable } from './thermal-tension.ts';
export { memberCutLengths } from './cut-length.ts';
export {
  installationData, defaultInstallationTemperatures, DEFAULT_REFERENCE_TEMPERATURE,
  type InstallationData, type InstallationNote, type MemberInstallation, type TemperatureRow,
} from './installation-data.ts';
export { findBracketedRoot } from './bracketed-root.ts';
export { targetTensionAt, checkMemberFrequency, checkMemberSag, expectedStringFrequency, type MemberSiteCheck } from './site-check-member.ts';

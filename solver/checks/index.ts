/** Design checks, groups and envelopes (pure). Re-exported by the solver barrel. */
export { membersOfGroup, membersOfGroups, groupExists } from './groups.ts';
export { envelopeOf } from './envelope.ts';
export type { Envelope, MemberEnvelope, NodeEnvelope, ReactionEnvelope } from './envelope.ts';
export { runChecks } from './run-checks.ts';
export { CheckInputError, checkSettingsProblems, resistanceFactorOf } from './check-settings.ts';
export type * from './check-types.ts';
export { resolveDesignBasis, cableResistanceDivisor, purposeOf, purposeOfCase, purposeOfCombination, checksFor, FROM_PROJECT } from './design-basis.ts';
export type { ResolvedBasis } from './design-basis.ts';
export type { Sourced } from './basis-defaults.ts';

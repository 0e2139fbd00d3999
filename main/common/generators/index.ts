/** Parametric generators that make ordinary, editable project parts (see types.ts for ownership). */
export { generateGuyedMast, checkGuyedMastParams } from './guyed-mast.ts';
export type { GuyedMastParams } from './guyed-mast.ts';
export { generateSaddleNet } from './saddle-net.ts';
export type { SaddleNetParams } from './saddle-net.ts';
export { generateRadialNet } from './radial-net.ts';
export type { RadialNetParams } from './radial-net.ts';
export { applyGenerated } from './apply-generated.ts';
export type { ApplyOutcome, DanglingChoice, DanglingReference } from './apply-generated.ts';
export { runGenerator } from './run-generator.ts';
export { solveForceDensity } from './force-density.ts';
export { GeneratorInputError } from './types.ts';
export type { GeneratedParts, GeneratorProblem, SectionInput } from './types.ts';
export type { GeneratorNote, GeneratorNoteCode, ReattachTarget } from './generator-notes.ts';
export { generatorNoteText, generatorNotesText, generatorProblemText, reattachText } from './generator-text.ts';
export { fitGuyedMastLevels, atLevel, PER_LEVEL_KEYS } from './guyed-mast-levels.ts';

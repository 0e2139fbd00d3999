import type { ProjectFile } from '../../../solver/index.ts';

/** Result of checking a document: the typed project, or every problem found (capped). */
export type ValidationOutcome =
  | { ok: true; project: ProjectFile; migratedFrom?: number }
  | { ok: false; errors: string[] };

/** parseProjectText returns the same shape; JSON syntax problems come first and alone. */
export type ParseOutcome = ValidationOutcome;

/** Longest error list handed back; the rest is summarised in one closing line. */
export const MAX_ERRORS = 50;

/** Caps a list of messages at MAX_ERRORS, ending with "… and N more problems". */
export function capErrors(errors: readonly string[], max = MAX_ERRORS): string[] {
  if (errors.length <= max) return [...errors];
  const rest = errors.length - max;
  return [...errors.slice(0, max), `… and ${rest} more problem${rest === 1 ? '' : 's'}`];
}

/**
 * When a solve fails or does not converge, the entries whose values look implausible are the
 * likeliest cause: name them after the solver's own message (which names nodes or members where
 * it can). Empty when nothing looks wrong.
 */
import type { ProjectFile } from '../../../../solver/index.ts';
import { plausibilityWarnings } from './plausibility-warnings.ts';

export function failureHint(project: ProjectFile, max = 3): string {
  const w = plausibilityWarnings(project);
  if (w.length === 0) return '';
  const more = w.length > max ? ` (and ${w.length - max} more)` : '';
  return ` Entries that look implausible and may be the cause: ${w.slice(0, max).join('; ')}${more}.`;
}

/**
 * What the cases added by design actions (solve-actions.ts) are checked for:
 * - member loss: the spec's purpose, default 'accidental' (a guy rupture is an accidental
 *   design situation, checked with the accidental factors of the design basis);
 * - patch wind ("<id> / patch k", "<id> max", "<id> min"): the purpose of the mean-wind case;
 * - wind directions, ice with wind, unbalanced ice: the purpose of the load case they make
 *   (ice with wind: the spec's purpose, else the ice case's; the others: their base case's).
 * Load cases without a purpose count as serviceability (design-basis.ts).
 */
import type { CasePurpose, ProjectFile } from '../project/types.ts';
import { lostMembers } from '../loads/member-loss.ts';
import { derivedLoadCase } from './solve-actions.ts';

export function actionCasePurpose(project: ProjectFile, id: string): CasePurpose | undefined {
  for (const s of project.memberLoss ?? []) {
    if (id.startsWith(`${s.id} / `) && lostMembers(project, s).some((m) => id === `${s.id} / ${m}`)) return s.purpose ?? 'accidental';
  }
  for (const s of project.patchWind ?? []) {
    if (id === `${s.id} max` || id === `${s.id} min` || id.startsWith(`${s.id} / patch `)) {
      return project.loadCases.find((c) => c.id === s.meanCase)?.purpose ?? 'serviceability';
    }
  }
  const c = derivedLoadCase(project, id);
  return c ? (c.purpose ?? 'serviceability') : undefined;
}

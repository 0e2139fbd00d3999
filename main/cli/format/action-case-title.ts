/**
 * Titles of the cases the design actions add (patch wind, member loss), for the text report.
 * Returns undefined for any other id.
 */
import type { ProjectFile } from '../../../solver/index.ts';
import { dynamicFactorOf, lostMembers, windDirectionCases } from '../../../solver/index.ts';

export function actionCaseTitle(project: ProjectFile, id: string): string | undefined {
  for (const s of project.windDirections ?? []) {
    const c = windDirectionCases(project, s).find((x) => x.id === id);
    if (c) return `Wind direction case ${JSON.stringify(id)}: load case ${JSON.stringify(s.case)} with the wind toward ${c.wind!.direction}° (${s.count} directions${s.label ? `, ${s.label}` : ''})`;
  }
  for (const s of project.patchWind ?? []) {
    const label = s.label ? ` (${s.label})` : '';
    if (id === `${s.id} max`) return `Patch wind ${JSON.stringify(s.id)}${label}, S = S_m + √Σ(S_i − S_m)² per result (EN 1993-3-1 B.4.3.2.5), mean case ${JSON.stringify(s.meanCase)}`;
    if (id === `${s.id} min`) return `Patch wind ${JSON.stringify(s.id)}${label}, S = S_m − √Σ(S_i − S_m)² per result (EN 1993-3-1 B.4.3.2.5), mean case ${JSON.stringify(s.meanCase)}`;
    const m = id.startsWith(`${s.id} / patch `) ? id.slice(`${s.id} / patch `.length) : undefined;
    if (m !== undefined && /^\d+$/.test(m)) return `Patch case ${m} of patch wind ${JSON.stringify(s.id)}: mean wind of ${JSON.stringify(s.meanCase)}, × ${s.patchFactor} on the mast inside the patch`;
  }
  for (const s of project.memberLoss ?? []) {
    for (const member of lostMembers(project, s)) {
      if (id === `${s.id} / ${member}`) {
        const label = s.label ? ` (${s.label})` : '';
        return `Member loss ${JSON.stringify(s.id)}${label}: member ${JSON.stringify(member)} removed from case ${JSON.stringify(s.fromCase)}, released force × dynamic factor ${dynamicFactorOf(s).toFixed(3)}`;
      }
    }
  }
  return undefined;
}

/**
 * The governing value of each design check over every case and combination, read from the
 * structured check results of the one solve the report prints (CheckReport.results: the worst
 * result per check and item, failures first, then by ratio), so the table shows exactly the
 * numbers of `stayset check` and the app's Checks tab — nothing is recomputed here:
 * - one row per check code present in `checks.results`: its first (governing) result;
 * - the highest member utilisation with its case (`checks.members`);
 * - the least tension of the no-slack members from the envelope of the same solve, passing when
 *   the checks report no slack for them.
 */
import { membersOfGroup } from '../../../solver/index.ts';
import type { CheckReport, Envelope, ProjectFile } from '../../../solver/index.ts';
import type { GoverningRow } from './report-types.ts';

export function governingRows(project: ProjectFile, checks: CheckReport, env: Envelope): GoverningRow[] {
  const rows: GoverningRow[] = [];
  const used = checks.members.filter((m) => m.utilisation !== null).sort((a, b) => b.utilisation! - a.utilisation!);
  if (used.length) {
    const m = used[0];
    rows.push({ check: 'utilisation', item: m.id, case: m.utilisationCase, quantity: 'ratio', value: m.utilisation!, limit: 1, ratio: m.utilisation!, pass: m.utilisation! <= 1, source: checks.basis.label });
  }
  const noSlack = new Set<string>();
  for (const g of project.checks?.noSlackGroups ?? []) {
    const ids = g === '*' ? project.members.filter((m) => m.kind === 'cable').map((m) => m.id) : [...membersOfGroup(project, g)];
    ids.forEach((id) => noSlack.add(id));
  }
  const mins = env.members.filter((m) => noSlack.has(m.id)).sort((a, b) => a.tensionMin - b.tensionMin);
  if (mins.length) {
    const slack = checks.results.some((r) => r.code === 'slack' && noSlack.has(r.item));
    rows.push({ check: 'leastTension', item: mins[0].id, case: mins[0].tensionMinCase, quantity: 'force', value: mins[0].tensionMin, limit: null, ratio: null, pass: !slack, source: 'project file (checks.noSlackGroups)' });
  }
  const seen = new Set<string>();
  for (const r of checks.results) {
    if (seen.has(r.code)) continue;
    seen.add(r.code);
    rows.push({ check: r.code, item: r.item, case: r.case, quantity: r.quantity, value: r.value, limit: r.ratio === null ? null : r.limit, ratio: r.ratio, pass: r.pass, source: r.source, result: r });
  }
  return rows;
}

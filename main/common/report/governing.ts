/**
 * The governing value of each design check over all cases, with its case — the same quantities
 * and formulas as solver/checks/run-checks.ts (utilisation T_max/(φ·MBL), sag against the group
 * limit, displacement magnitude, tilt = horizontal offset of top relative to base over height,
 * uplift = Fz < 0 at listed supports), reported whether or not they fail; the minimum tension of
 * the no-slack members comes from the envelope.
 */
import { membersOfGroup } from '../../../solver/index.ts';
import type { CheckReport, Envelope, ProjectFile, SolveReport } from '../../../solver/index.ts';
import type { GoverningRow } from './report-types.ts';

export function governingRows(project: ProjectFile, report: SolveReport, checks: CheckReport, env: Envelope): GoverningRow[] {
  const rows: GoverningRow[] = [];
  const s = project.checks ?? {};
  const used = checks.members.filter((m) => m.utilisation !== null).sort((a, b) => b.utilisation! - a.utilisation!);
  if (used.length) {
    const m = used[0];
    rows.push({ check: 'utilisation', item: m.id, case: m.utilisationCase, value: m.utilisation!, limit: 1, ratio: m.utilisation!, pass: m.utilisation! <= 1 });
  }
  const noSlack = new Set<string>();
  for (const g of s.noSlackGroups ?? []) {
    const ids = g === '*' ? project.members.filter((m) => m.kind === 'cable').map((m) => m.id) : [...membersOfGroup(project, g)];
    ids.forEach((id) => noSlack.add(id));
  }
  const mins = env.members.filter((m) => noSlack.has(m.id)).sort((a, b) => a.tensionMin - b.tensionMin);
  if (mins.length) rows.push({ check: 'minimumTension', item: mins[0].id, case: mins[0].tensionMinCase, value: mins[0].tensionMin, limit: null, ratio: null, pass: mins[0].slackCases.length === 0 });
  const converged = report.cases.filter((c) => c.converged);
  const worst = (candidate: GoverningRow) => {
    const prev = rows.find((r) => r.check === candidate.check);
    if (!prev) rows.push(candidate);
    else if ((candidate.ratio ?? 0) > (prev.ratio ?? 0)) rows.splice(rows.indexOf(prev), 1, candidate);
  };
  for (const l of s.sagLimits ?? []) {
    const ids = membersOfGroup(project, l.group);
    for (const c of converged) for (const m of c.members) {
      if (!ids.has(m.id)) continue;
      const lim = 'fractionOfSpan' in l.limit ? l.limit.fractionOfSpan * m.chordLength : l.limit.absolute;
      worst({ check: 'sag', item: m.id, case: c.id, value: m.sag, limit: lim, ratio: m.sag / lim, pass: m.sag <= lim });
    }
  }
  for (const l of s.displacementLimits ?? []) for (const c of converged) {
    const n = c.nodes.find((x) => x.id === l.node);
    if (!n) continue;
    const d = Math.hypot(...n.displacement);
    worst({ check: 'displacement', item: l.node, case: c.id, value: d, limit: l.limit, ratio: d / l.limit, pass: d <= l.limit });
  }
  for (const l of s.tiltLimits ?? []) for (const c of converged) {
    const b = c.nodes.find((x) => x.id === l.base), t = c.nodes.find((x) => x.id === l.top);
    if (!b || !t) continue;
    const h = Math.abs(t.position[2] - t.displacement[2] - (b.position[2] - b.displacement[2]));
    if (!(h > 0)) continue;
    const tilt = Math.hypot(t.displacement[0] - b.displacement[0], t.displacement[1] - b.displacement[1]) / h;
    worst({ check: 'tilt', item: `${l.base}→${l.top}`, case: c.id, value: tilt, limit: l.limit, ratio: tilt / l.limit, pass: tilt <= l.limit });
  }
  for (const node of s.upliftNodes ?? []) {
    let best: GoverningRow | null = null;
    for (const c of converged) {
      const r = c.reactions.find((x) => x.node === node);
      if (r && (!best || r.force[2] < best.value)) best = { check: 'uplift', item: node, case: c.id, value: r.force[2], limit: 0, ratio: null, pass: r.force[2] >= 0 };
    }
    if (best) rows.push(best);
  }
  return rows;
}

import type { ProjectFile } from '../project/types.ts';
import type { CaseResult, SolveReport } from '../results/types.ts';
import type { CaseCheck, CheckFailure, CheckReport, ItemStatus, MemberCheck, NodeCheck } from './check-types.ts';
import { CheckInputError, checkSettingsProblems, resistanceFactorOf } from './check-settings.ts';
import { membersOfGroup, membersOfGroups } from './groups.ts';

/**
 * Design checks of every case and combination in a solved report against `project.checks`:
 * utilisation T_max / (φ · breakingLoad), slack in no-slack groups ("*" = every cable), sag limits,
 * node displacement limits, mast tilt limits and uplift at listed supports. Failures are reduced
 * to the worst case per (kind, id): that is the envelope check. Throws CheckInputError on
 * settings that name missing groups or nodes.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
export function runChecks(project: ProjectFile, report: SolveReport): CheckReport {
  const problems = checkSettingsProblems(project);
  if (problems.length) throw new CheckInputError(problems);
  const s = project.checks ?? {};
  const phi = resistanceFactorOf(project);
  const warnings: string[] = [];
  const sectionOf = new Map(project.sections.map((x) => [x.id, x] as const));
  const mbl = new Map<string, number>();
  const noMbl: string[] = [];
  for (const m of project.members) {
    const b = sectionOf.get(m.section)?.breakingLoad;
    if (b && b > 0) mbl.set(m.id, b); else noMbl.push(m.id);
  }
  if (noMbl.length) {
    warnings.push(`${noMbl.length} member(s) have no breaking load and are not checked for utilisation (e.g. "${noMbl[0]}")`);
  }
  const noSlack = new Set<string>();
  for (const g of s.noSlackGroups ?? []) {
    const ids = g === '*' ? project.members.filter((m) => m.kind === 'cable').map((m) => m.id) : [...membersOfGroup(project, g)];
    for (const id of ids) noSlack.add(id);
  }
  const sagRules = (s.sagLimits ?? []).map((l) => ({ members: membersOfGroups(project, [l.group]), limit: l.limit, group: l.group }));

  const worst = new Map<string, CheckFailure>();
  const note = (f: CheckFailure) => {
    const key = `${f.kind}\u0000${f.id}`;
    const prev = worst.get(key);
    if (!prev || (f.ratio ?? -Infinity) > (prev.ratio ?? -Infinity) || (f.kind === 'uplift' && f.value < prev.value)) worst.set(key, f);
  };
  const memberUse = new Map<string, { u: number; c: string; t: number }>();
  const cases: CaseCheck[] = [];

  for (const c of report.cases) {
    let caseFailures = 0;
    const count = (f: CheckFailure) => { caseFailures++; note(f); };
    const cc: CaseCheck = { id: c.id, converged: c.converged, pass: true, maxUtilisation: 0, maxUtilisationMember: '', failures: 0 };
    cases.push(cc);
    if (!c.converged) {
      count({ kind: 'notConverged', id: c.id, case: c.id, value: 0, limit: 0, ratio: null, message: `case "${c.id}" did not converge (${c.status})${c.message ? `: ${c.message}` : ''}` });
      cc.pass = false; cc.failures = 1;
      continue;
    }
    for (const m of c.members) {
      const b = mbl.get(m.id);
      const prevUse = memberUse.get(m.id);
      if (b !== undefined) {
        const u = m.tensionMax / (phi * b);
        if (u > cc.maxUtilisation) { cc.maxUtilisation = u; cc.maxUtilisationMember = m.id; }
        if (!prevUse || u > prevUse.u) memberUse.set(m.id, { u, c: c.id, t: m.tensionMax });
        if (u > 1) count({ kind: 'utilisation', id: m.id, case: c.id, value: m.tensionMax, limit: phi * b, ratio: u, message: `member "${m.id}": tension ${fmt(m.tensionMax)} N exceeds φ·MBL = ${fmt(phi * b)} N in "${c.id}"` });
      } else if (!prevUse || m.tensionMax > prevUse.t) {
        memberUse.set(m.id, { u: -Infinity, c: c.id, t: m.tensionMax });
      }
      if (m.slack && noSlack.has(m.id)) count({ kind: 'slack', id: m.id, case: c.id, value: m.tensionMin, limit: 0, ratio: null, message: `member "${m.id}" goes slack in "${c.id}" (not allowed)` });
      for (const r of sagRules) {
        if (!r.members.has(m.id)) continue;
        const lim = 'fractionOfSpan' in r.limit ? r.limit.fractionOfSpan * m.chordLength : r.limit.absolute;
        if (m.sag > lim) count({ kind: 'sag', id: m.id, case: c.id, value: m.sag, limit: lim, ratio: m.sag / lim, message: `member "${m.id}": sag ${fmt(m.sag)} m exceeds ${fmt(lim)} m (group "${r.group}") in "${c.id}"` });
      }
    }
    checkNodes(project, c, count);
    cc.failures = caseFailures;
    cc.pass = caseFailures === 0;
  }

  const failures = [...worst.values()].sort((a, b) => (b.ratio ?? Infinity) - (a.ratio ?? Infinity));
  const members: MemberCheck[] = project.members.map((m) => {
    const use = memberUse.get(m.id);
    const failed = failures.filter((f) => f.id === m.id && ['utilisation', 'slack', 'sag'].includes(f.kind)).map((f) => f.kind);
    const checked = mbl.has(m.id) || noSlack.has(m.id) || sagRules.some((r) => r.members.has(m.id));
    const status: ItemStatus = failed.length ? 'fail' : checked && use ? 'pass' : 'unchecked';
    const u = use && Number.isFinite(use.u) ? use.u : null;
    return { id: m.id, status, utilisation: u, utilisationCase: use?.c ?? '', tensionMax: use?.t ?? 0, failed };
  });
  const checkedNodes = new Set<string>([
    ...(s.displacementLimits ?? []).map((l) => l.node), ...(s.tiltLimits ?? []).flatMap((l) => [l.base, l.top]), ...(s.upliftNodes ?? []),
  ]);
  const nodes: NodeCheck[] = project.nodes.map((n) => {
    const failed = failures.filter((f) => (f.kind === 'displacement' || f.kind === 'uplift') && f.id === n.id).map((f) => f.kind);
    for (const f of failures) if (f.kind === 'tilt' && f.id.split('→').includes(n.id)) failed.push('tilt');
    return { id: n.id, status: failed.length ? 'fail' : checkedNodes.has(n.id) ? 'pass' : 'unchecked', failed };
  });
  const allConverged = report.cases.every((c) => c.converged);
  return { pass: allConverged && failures.length === 0, allConverged, resistanceFactor: phi, failures, warnings, cases, members, nodes };
}

function checkNodes(project: ProjectFile, c: CaseResult, count: (f: CheckFailure) => void): void {
  const s = project.checks ?? {};
  const byId = new Map(c.nodes.map((n) => [n.id, n] as const));
  for (const l of s.displacementLimits ?? []) {
    const n = byId.get(l.node);
    if (!n) continue;
    const d = Math.hypot(...n.displacement);
    if (d > l.limit) count({ kind: 'displacement', id: l.node, case: c.id, value: d, limit: l.limit, ratio: d / l.limit, message: `node "${l.node}": displacement ${fmt(d)} m exceeds ${fmt(l.limit)} m in "${c.id}"` });
  }
  for (const l of s.tiltLimits ?? []) {
    const b = byId.get(l.base), t = byId.get(l.top);
    if (!b || !t) continue;
    const h = Math.abs(t.position[2] - t.displacement[2] - (b.position[2] - b.displacement[2]));
    if (!(h > 0)) continue;
    const tilt = Math.hypot(t.displacement[0] - b.displacement[0], t.displacement[1] - b.displacement[1]) / h;
    if (tilt > l.limit) count({ kind: 'tilt', id: `${l.base}→${l.top}`, case: c.id, value: tilt, limit: l.limit, ratio: tilt / l.limit, message: `mast ${l.base}→${l.top}: tilt 1/${fmt(1 / tilt)} exceeds 1/${fmt(1 / l.limit)} in "${c.id}"` });
  }
  const up = new Set(s.upliftNodes ?? []);
  for (const r of c.reactions) {
    if (up.has(r.node) && r.force[2] < 0) count({ kind: 'uplift', id: r.node, case: c.id, value: r.force[2], limit: 0, ratio: null, message: `support "${r.node}": uplift, reaction Fz = ${fmt(r.force[2])} N in "${c.id}"` });
  }
}

function fmt(v: number): string {
  const a = Math.abs(v);
  return a >= 1000 ? v.toFixed(0) : a >= 1 ? v.toFixed(2) : v.toPrecision(3);
}

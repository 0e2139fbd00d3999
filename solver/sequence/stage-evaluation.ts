/**
 * A solved stage → the state of every member in place and the stage's issues: overload
 * (T_max > φ · breaking load, the checks' resistance factor), slack (a cable in place slack, or
 * with a tension below SLACK_STRAIN · EA),
 * plumb (tilt of the mast above the erection tolerance), notConverged.
 * Tilt = horizontal displacement of top relative to base over their modelled height
 * (as solver/checks/run-checks.ts).
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult, MemberResult } from '../results/types.ts';
import type { SequenceIssue, StageMemberState } from './sequence-types.ts';

/** Tension at the lower end of a member (the anchor end, where guys are usually tensioned; common practice). */
export function lowerEnd(project: ProjectFile, r: MemberResult): number {
  const m = project.members.find((x) => x.id === r.id)!;
  const z = (id: string) => project.nodes.find((n) => n.id === id)!.at[2];
  return z(m.from) <= z(m.to) ? r.tensionStart : r.tensionEnd;
}

/**
 * A cable with a tension below SLACK_STRAIN · EA is counted slack during erection: it cannot be
 * set (the structure moves instead). Common practice threshold (strain 1e-6, ≈ 0.2 mm on 200 m).
 */
export const SLACK_STRAIN = 1e-6;

export function stageTilt(result: CaseResult, plumb: { base: string; top: string } | null): number | null {
  if (!plumb || !result.converged) return null;
  const b = result.nodes.find((n) => n.id === plumb.base), t = result.nodes.find((n) => n.id === plumb.top);
  if (!b || !t) return null;
  const h = Math.abs(t.position[2] - t.displacement[2] - (b.position[2] - b.displacement[2]));
  if (!(h > 0)) return null;
  return Math.hypot(t.displacement[0] - b.displacement[0], t.displacement[1] - b.displacement[1]) / h;
}

export interface StageEvaluation {
  state: StageMemberState[];
  tilt: number | null;
  issues: SequenceIssue[];
}

export function evaluateStage(
  project: ProjectFile, result: CaseResult, stage: number, phi: number, plumb: { base: string; top: string; limit: number } | null,
): StageEvaluation {
  if (!result.converged) return { state: [], tilt: null, issues: [{ code: 'notConverged', stage, status: result.status }] };
  const issues: SequenceIssue[] = [];
  const state: StageMemberState[] = [];
  const byId = new Map(project.members.map((m) => [m.id, m]));
  const sections = new Map(project.sections.map((s) => [s.id, s]));
  for (const r of result.members) {
    const m = byId.get(r.id)!;
    const mbl = sections.get(m.section)?.breakingLoad;
    if (m.kind !== 'cable' && !mbl) continue;
    const utilisation = mbl ? r.tensionMax / (phi * mbl) : null;
    const section = sections.get(m.section)!;
    const slack = m.kind === 'cable' && (r.slack || r.tensionMin <= SLACK_STRAIN * section.E * section.area);
    state.push({ member: r.id, tension: lowerEnd(project, r), tensionMax: r.tensionMax, utilisation, slack });
    if (mbl && utilisation! > 1) issues.push({ code: 'overload', stage, member: r.id, value: r.tensionMax, limit: phi * mbl });
    if (slack) issues.push({ code: 'slack', stage, member: r.id, value: r.tensionMin });
  }
  const tilt = stageTilt(result, plumb);
  if (plumb && tilt !== null && tilt > plumb.limit) issues.push({ code: 'plumb', stage, value: tilt, limit: plumb.limit });
  return { state, tilt, issues };
}

/** A badness score of a stage for ordering searches: 0 when it passes, larger when worse; Infinity when not converged. */
export function stageScore(ev: StageEvaluation): number {
  let s = 0;
  for (const i of ev.issues) {
    if (i.code === 'notConverged') return Infinity;
    if (i.code === 'overload' || i.code === 'plumb') s += i.value / i.limit;
    else s += 1;
  }
  return s;
}

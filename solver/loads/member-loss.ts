/**
 * Sudden loss of a member (guy rupture), MemberLossSpec.
 *
 * Before the loss the member exerts forces F on its end nodes; the rest of the structure R is in
 * equilibrium under the case loads P plus F. The rupture removes F as a step load. For a
 * single-degree-of-freedom idealisation the peak response to a step is DAF times the static
 * change, so the peak state is taken as the static equilibrium of R under
 *   P + (1 − DAF) F
 * (DAF = 1: the static state after the loss; DAF = 2: the undamped peak). The equilibrium is
 * solved nonlinearly from the pretensioned state (elastic, so the path does not matter).
 *
 * Default DAF from the critical damping ratio ζ: the peak of the step response of a damped
 * single-degree-of-freedom oscillator, 1 + exp(−πζ/√(1 − ζ²)) (its maximum overshoot; standard
 * structural-dynamics / control-theory result, e.g. Chopra, "Dynamics of Structures", response to
 * a step force; Ogata, "Modern Control Engineering", maximum overshoot of a second-order system).
 * ζ = 0 gives 2, the classical factor for a suddenly applied (or released) load.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { MemberLossSpec, ProjectFile } from '../project/types.ts';
import type { CaseFields } from '../results/types.ts';
import { membersOfGroup } from '../checks/groups.ts';

/** Dynamic amplification factor of a MemberLossSpec (see the file comment). */
export function dynamicFactorOf(spec: Pick<MemberLossSpec, 'dynamicFactor' | 'dampingRatio'>): number {
  if (spec.dynamicFactor !== undefined) return spec.dynamicFactor;
  return stepResponsePeak(spec.dampingRatio ?? 0);
}

/** Peak of the unit step response of a damped SDOF oscillator, 1 + exp(−πζ/√(1 − ζ²)), 0 ≤ ζ < 1. */
export function stepResponsePeak(zeta: number): number {
  return 1 + Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta));
}

/** Members removed by a spec, one case each: `members` then the group's members, no repeats, project order within the group. */
export function lostMembers(project: ProjectFile, spec: MemberLossSpec): string[] {
  const out = [...(spec.members ?? [])];
  if (spec.group) for (const id of membersOfGroup(project, spec.group)) if (!out.includes(id)) out.push(id);
  return out;
}

/**
 * The project without one member. Nodes no remaining member uses are fixed (they are detached
 * and carry nothing); their ids are returned so their reactions can be left out.
 */
export function projectWithout(project: ProjectFile, memberId: string): { project: ProjectFile; detached: Set<string> } {
  const members = project.members.filter((m) => m.id !== memberId);
  if (members.length === project.members.length) throw new Error(`member "${memberId}" does not exist`);
  const used = new Set<string>();
  for (const m of members) { used.add(m.from); used.add(m.to); }
  const detached = new Set<string>();
  const nodes = project.nodes.map((n) => {
    if (used.has(n.id) || n.fixed === 'xyz') return n;
    detached.add(n.id);
    return { ...n, fixed: 'xyz' };
  });
  return { project: { ...project, nodes, members }, detached };
}

/**
 * Forces (N, 3 × userNodeCount, zero elsewhere) a member exerted on its two end nodes in a solved
 * state: at each end, the end element's axial force along the deformed element, pointing from
 * the node into the member.
 */
export function memberEndForces(model: AnalysisModel, fields: CaseFields, memberId: string): Float64Array {
  const f = new Float64Array(3 * model.userNodeCount);
  const m = model.members.find((t) => t.id === memberId);
  if (!m) throw new Error(`member "${memberId}" does not exist`);
  const x = fields.positions, chain = m.nodeChain, n = chain.length - 1;
  const ends: [number, number, number][] = [[chain[0], chain[1], m.firstElement], [chain[n], chain[n - 1], m.firstElement + m.elementCount - 1]];
  for (const [node, next, e] of ends) {
    const d = [0, 1, 2].map((q) => x[3 * next + q] - x[3 * node + q]);
    const l = Math.hypot(d[0], d[1], d[2]);
    if (!(l > 0) || node >= model.userNodeCount) continue;
    for (let q = 0; q < 3; q++) f[3 * node + q] += (fields.elementTension[e] * d[q]) / l;
  }
  return f;
}

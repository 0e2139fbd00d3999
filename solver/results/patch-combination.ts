/**
 * A combination of results (not loads): S = S_m ± S_p, S_p = √Σ (S_i − S_m)², taken per result
 * quantity — every node coordinate and displacement component, every member's tensions, sag and
 * chord, every reaction component, every element tension (EN 1993-3-1 B.4.3.2.5(1), patch loads
 * on guyed masts). The two results ("max" = S_m + S_p, "min" = S_m − S_p) have the shape of any
 * case, so envelopes and checks take them as they are. A tension-only element whose combined
 * force is ≤ 0 is reported slack.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { Vec3 } from '../project/types.ts';
import type { CaseSolution } from '../analysis/solve-case.ts';
import type { CaseResult, MemberResult } from './types.ts';

type Sign = 1 | -1;

function rss(mean: number, others: number[]): number {
  let s = 0;
  for (const v of others) s += (v - mean) * (v - mean);
  return Math.sqrt(s);
}

const combine = (sign: Sign, mean: number, others: number[]) => mean + sign * rss(mean, others);
const combineVec = (sign: Sign, mean: Vec3, others: Vec3[]): Vec3 =>
  [0, 1, 2].map((d) => combine(sign, mean[d], others.map((o) => o[d]))) as Vec3;

function combineArray(sign: Sign, mean: Float64Array, others: Float64Array[]): Float64Array {
  const out = new Float64Array(mean.length);
  for (let i = 0; i < mean.length; i++) {
    let s = 0;
    for (const o of others) s += (o[i] - mean[i]) * (o[i] - mean[i]);
    out[i] = mean[i] + sign * Math.sqrt(s);
  }
  return out;
}

/** S_m + S_p (sign +1) or S_m − S_p (sign −1) of `mean` and the patch solutions, as a case `id`. */
export function combinePatchResults(model: AnalysisModel, id: string, sign: Sign, mean: CaseSolution, patches: CaseSolution[]): CaseSolution {
  const m = mean.result, ps = patches.map((p) => p.result);
  const elementTension = combineArray(sign, mean.fields.elementTension, patches.map((p) => p.fields.elementTension));
  const elementSlack = new Uint8Array(elementTension.length);
  for (let e = 0; e < elementSlack.length; e++) elementSlack[e] = model.elemTensionOnly[e] && elementTension[e] <= 0 ? 1 : 0;
  const members: MemberResult[] = m.members.map((mr, k) => {
    const o = ps.map((p) => p.members[k]);
    const topo = model.members[k];
    let slack = false;
    for (let e = topo.firstElement; e < topo.firstElement + topo.elementCount; e++) if (elementSlack[e]) slack = true;
    const q = (key: 'tensionMax' | 'tensionMin' | 'tensionStart' | 'tensionEnd' | 'sag' | 'chordLength') => combine(sign, mr[key], o.map((x) => x[key]));
    return {
      id: mr.id, tensionMax: q('tensionMax'), tensionMin: q('tensionMin'), tensionStart: q('tensionStart'), tensionEnd: q('tensionEnd'),
      slack, sag: Math.max(0, q('sag')), chordLength: q('chordLength'),
    };
  });
  const all = [m, ...ps];
  const failed = all.find((c) => !c.converged);
  const result: CaseResult = {
    id,
    converged: !failed,
    status: failed ? failed.status : 'converged',
    slackMembers: members.filter((x) => x.slack).map((x) => x.id),
    nodes: m.nodes.map((n, k) => ({
      id: n.id,
      position: combineVec(sign, n.position, ps.map((p) => p.nodes[k].position)),
      displacement: combineVec(sign, n.displacement, ps.map((p) => p.nodes[k].displacement)),
    })),
    members,
    reactions: m.reactions.map((r, k) => ({ node: r.node, force: combineVec(sign, r.force, ps.map((p) => p.reactions[k].force)) })),
    stats: {
      dofs: m.stats.dofs,
      iterations: all.reduce((s, c) => s + c.stats.iterations, 0),
      loadSteps: all.reduce((s, c) => s + c.stats.loadSteps, 0),
      seconds: all.reduce((s, c) => s + c.stats.seconds, 0),
      residual: Math.max(...all.map((c) => c.stats.residual)),
    },
  };
  if (failed) result.message = `case "${failed.id}" of the combination did not converge: ${failed.message ?? failed.status}`;
  return {
    result,
    fields: { positions: combineArray(sign, mean.fields.positions, patches.map((p) => p.fields.positions)), elementTension, elementSlack },
  };
}

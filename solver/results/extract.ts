/**
 * Solved state → the reported quantities (CaseResult fields) and raw fields.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { BeamEndActions, BeamMemberEnds, MemberResult, NodeResult, ReactionResult } from './types.ts';
import { DIRECTION_NAMES } from '../model/supports.ts';
import type { Vec3 } from '../project/types.ts';

/** User-node positions and displacements. */
export function nodeResults(model: AnalysisModel, x: Float64Array): NodeResult[] {
  const out: NodeResult[] = [];
  for (let i = 0; i < model.userNodeCount; i++) {
    const p: Vec3 = [x[3 * i], x[3 * i + 1], x[3 * i + 2]];
    const c = model.coords;
    out.push({ id: model.nodeIds[i], position: p, displacement: [p[0] - c[3 * i], p[1] - c[3 * i + 1], p[2] - c[3 * i + 2]] });
  }
  return out;
}

/** Member tensions (N), slack flags and sag (m), see MemberResult. */
export function memberResults(
  model: AnalysisModel, x: Float64Array, tension: Float64Array, slack: Uint8Array, endForces?: Float64Array,
): MemberResult[] {
  return model.members.map((m) => {
    let tMax = -Infinity, tMin = Infinity, anySlack = false;
    for (let e = m.firstElement; e < m.firstElement + m.elementCount; e++) {
      tMax = Math.max(tMax, tension[e]);
      tMin = Math.min(tMin, tension[e]);
      if (slack[e]) anySlack = true;
    }
    const chain = m.nodeChain;
    const a = 3 * chain[0], b = 3 * chain[chain.length - 1];
    const dx = x[b] - x[a], dy = x[b + 1] - x[a + 1], dz = x[b + 2] - x[a + 2];
    const result: MemberResult = {
      id: m.id,
      tensionMax: tMax,
      tensionMin: tMin,
      tensionStart: tension[m.firstElement],
      tensionEnd: tension[m.firstElement + m.elementCount - 1],
      slack: anySlack,
      sag: memberSag(x, chain),
      chordLength: Math.sqrt(dx * dx + dy * dy + dz * dz),
    };
    if (m.kind === 'beam' && endForces && endForces.length > 0) result.beam = beamEnds(endForces, m.firstElement, m.elementCount);
    return result;
  });
}

function beamEnds(f: Float64Array, first: number, count: number): BeamMemberEnds {
  const actions = (o: number): BeamEndActions => ({ fx: f[o], fy: f[o + 1], fz: f[o + 2], mx: f[o + 3], my: f[o + 4], mz: f[o + 5] });
  let maxM = 0;
  for (let e = first; e < first + count; e++) {
    for (const o of [12 * e, 12 * e + 6]) maxM = Math.max(maxM, Math.hypot(f[o + 4], f[o + 5]));
  }
  return { start: actions(12 * first), end: actions(12 * (first + count - 1) + 6), maxBendingMoment: maxM };
}

/**
 * Largest vertical distance between the member's node chain and the straight line through its end
 * points, at the same horizontal position (each node projected on the chord's plan direction;
 * the member is piecewise straight, so the largest distance is at a node). 0 for a chord with no
 * horizontal extent.
 */
export function memberSag(x: Float64Array, chain: Int32Array): number {
  const a = 3 * chain[0], b = 3 * chain[chain.length - 1];
  const hx = x[b] - x[a], hy = x[b + 1] - x[a + 1], dz = x[b + 2] - x[a + 2];
  const h2 = hx * hx + hy * hy;
  if (h2 <= 1e-18 * (h2 + dz * dz) || chain.length < 3) return 0;
  let sag = 0;
  for (let k = 1; k < chain.length - 1; k++) {
    const p = 3 * chain[k];
    const t = ((x[p] - x[a]) * hx + (x[p + 1] - x[a + 1]) * hy) / h2;
    const zLine = x[a + 2] + t * dz;
    sag = Math.max(sag, Math.abs(zLine - x[p + 2]));
  }
  return sag;
}

/**
 * Support reactions of user nodes (force and moment the support exerts on the structure):
 * r = f_int − f_ext at restrained DOFs, −k·u at springs (u the DOF's displacement or rotation).
 * A node appears when any of its directions is restrained or sprung; `moment` where a rotation is.
 */
export function reactionResults(model: AnalysisModel, fInt: Float64Array, fExt: Float64Array, u?: Float64Array): ReactionResult[] {
  const out: ReactionResult[] = [];
  const f = model.fixed, k = model.springs;
  for (let i = 0; i < model.userNodeCount; i++) {
    const r = [0, 0, 0, 0, 0, 0];
    let any = false, anyRotation = false;
    for (let dir = 0; dir < 6; dir++) {
      const d = dir < 3 ? 3 * i + dir : model.dofs.rotationOffset[i] < 0 ? -1 : model.dofs.rotationOffset[i] + dir - 3;
      if (d < 0) continue;
      if (f[d]) r[dir] = fInt[d] - fExt[d];
      else if (k && k[d] > 0) r[dir] = u ? -k[d] * u[d] : 0;
      else continue;
      any = true;
      if (dir >= 3) anyRotation = true;
    }
    if (!any) continue;
    const reaction: ReactionResult = { node: model.nodeIds[i], force: [r[0], r[1], r[2]] };
    if (anyRotation) reaction.moment = [r[3], r[4], r[5]];
    out.push(reaction);
  }
  return out;
}

/**
 * Plain-language name of a DOF: `node "TOP" direction x`, `interior node 3 of member "G1"
 * direction z`, `node "B" direction rz` (rotation about z).
 */
export function describeDof(model: AnalysisModel, dof: number): string {
  const node = model.dofs.dofNode[dof];
  const dir = DIRECTION_NAMES[model.dofs.dofDirection[dof]];
  if (node < model.userNodeCount) return `node "${model.nodeIds[node]}" direction ${dir}`;
  for (const m of model.members) {
    const k = m.nodeChain.indexOf(node);
    if (k > 0) return `interior node ${k} of member "${m.id}" direction ${dir}`;
  }
  return `node #${node} direction ${dir}`;
}

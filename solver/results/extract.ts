/**
 * Solved state → the reported quantities (CaseResult fields) and raw fields.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { MemberResult, NodeResult, ReactionResult } from './types.ts';
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
  model: AnalysisModel, x: Float64Array, tension: Float64Array, slack: Uint8Array,
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
    return {
      id: m.id,
      tensionMax: tMax,
      tensionMin: tMin,
      tensionStart: tension[m.firstElement],
      tensionEnd: tension[m.firstElement + m.elementCount - 1],
      slack: anySlack,
      sag: memberSag(x, chain),
      chordLength: Math.hypot(x[b] - x[a], x[b + 1] - x[a + 1], x[b + 2] - x[a + 2]),
    };
  });
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

/** Reaction r = f_int − f_ext at restrained DOFs of user nodes (force of the support on the structure, N). */
export function reactionResults(model: AnalysisModel, fInt: Float64Array, fExt: Float64Array): ReactionResult[] {
  const out: ReactionResult[] = [];
  for (let i = 0; i < model.userNodeCount; i++) {
    const f = model.fixed;
    if (!f[3 * i] && !f[3 * i + 1] && !f[3 * i + 2]) continue;
    const r: Vec3 = [0, 0, 0];
    for (let q = 0; q < 3; q++) if (f[3 * i + q]) r[q] = fInt[3 * i + q] - fExt[3 * i + q];
    out.push({ node: model.nodeIds[i], force: r });
  }
  return out;
}

/** Plain-language name of a DOF: `node "TOP" direction x` or `interior node 3 of member "G1" direction z`. */
export function describeDof(model: AnalysisModel, dof: number): string {
  const node = Math.floor(dof / 3);
  const dir = 'xyz'[dof % 3];
  if (node < model.userNodeCount) return `node "${model.nodeIds[node]}" direction ${dir}`;
  for (const m of model.members) {
    const k = m.nodeChain.indexOf(node);
    if (k > 0) return `interior node ${k} of member "${m.id}" direction ${dir}`;
  }
  return `node #${node} direction ${dir}`;
}

/**
 * A converged state that only the cables' geometric-stiffness floor held together is a mechanism.
 *
 * The Newton tangent gives cables with S below a small floor (slack or stress-free) the geometric
 * stiffness A·S_floor/Lr they do not have (elements/truss/truss-family.ts), so that it stays
 * factorable; equilibrium itself is exact. But where that floor is the only thing holding a node —
 * a weightless cable under no load, a straight cable without pretension — the position of the node
 * is not determined and "converged after 0 iterations" would hide it. Here, only when some cable
 * element is below the floor at the converged state, the floor is taken out of the converged
 * tangent (for such an element the kernel used S_floor in place of S: subtract
 * A (S_floor − S⁺)/Lr · [[I, −I], [−I, I]], S⁺ = S where taut and 0 where slack) and the result
 * factored once: a zero pivot is the mechanism (its DOF is returned). Costs nothing for models
 * whose cables are all in tension.
 * A member that is slack over its whole length carries nothing, and that is the answer: its
 * interior nodes (whose places do not matter) are held fixed for the test, its end nodes are not.
 */
import type { Workspace } from './workspace.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import { assemble, CABLE_STRESS_FLOOR_RATIO } from '../assembly/assemble.ts';

/**
 * @param u converged displacements and rotations from the start state (dofs.count), m, rad
 * @returns the DOF of the zero pivot, or −1 when the state is determined
 */
export function untensionedMechanismDof(ws: Workspace, loads: CaseLoads, u: Float64Array, pivotTolerance: number): number {
  const m = ws.model, dT = loads.temperatureChange;
  const dX = ws.startVectors;
  const below: number[] = [], floorLess: number[] = [];
  const slack = new Uint8Array(m.elementCount);
  for (let e = 0; e < m.elementCount; e++) {
    if (m.elemTensionOnly[e] !== 1) continue;
    const a3 = 3 * m.elemNodes[2 * e], b3 = 3 * m.elemNodes[2 * e + 1];
    const dx = dX[3 * e] + u[b3] - u[a3], dy = dX[3 * e + 1] + u[b3 + 1] - u[a3 + 1], dz = dX[3 * e + 2] + u[b3 + 2] - u[a3 + 2];
    const Lr = m.elemRefLength[e];
    const S = m.elemS0[e] + m.elemE[e] * ((0.5 * (dx * dx + dy * dy + dz * dz - Lr * Lr)) / (Lr * Lr) - m.elemAlpha[e] * dT);
    const floor = CABLE_STRESS_FLOOR_RATIO * m.elemE[e];
    if (S >= floor) continue;
    if (S < 0) slack[e] = 1;
    below.push(e);
    floorLess.push((m.elemArea[e] * (floor - Math.max(S, 0))) / Lr);
  }
  if (below.length === 0) return -1;

  const { pattern } = ws;
  const values = new Float64Array(pattern.rowIdx.length);
  assemble(m, pattern, dX, u, dT, new Float64Array(u.length), { ...ws.elements, tension: new Float64Array(m.elementCount), slack: new Uint8Array(m.elementCount), endForces: new Float64Array(ws.elements.endForces.length) }, values);
  below.forEach((e, k) => removeIsotropic(ws, m.elemNodes[2 * e], m.elemNodes[2 * e + 1], floorLess[k], values));

  for (const member of m.members) {
    let all = member.elementCount > 0;
    for (let k = 0; k < member.elementCount && all; k++) all = slack[member.firstElement + k] === 1;
    if (!all) continue;
    for (let k = 1; k < member.nodeChain.length - 1; k++) {
      for (let q = 0; q < 3; q++) values[pattern.diagonal[3 * member.nodeChain[k] + q]] = 1;
    }
  }
  return ws.ldl.factor(values, pivotTolerance);
}

/** values −= g · [[I, −I], [−I, I]] over the translations of nodes a and b (free DOFs only). */
function removeIsotropic(ws: Workspace, a: number, b: number, g: number, values: Float64Array): void {
  const { pattern, model } = ws;
  for (let q = 0; q < 3; q++) {
    const da = 3 * a + q, db = 3 * b + q;
    if (!model.fixed[da]) values[pattern.diagonal[da]] -= g;
    if (!model.fixed[db]) values[pattern.diagonal[db]] -= g;
    if (model.fixed[da] || model.fixed[db]) continue;
    const row = Math.max(da, db), col = Math.min(da, db);
    for (let p = pattern.colPtr[col]; p < pattern.colPtr[col + 1]; p++) {
      if (pattern.rowIdx[p] === row) { values[p] += g; break; }
    }
  }
}

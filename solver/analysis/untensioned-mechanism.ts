/**
 * A converged state that only the cables' geometric-stiffness floor held together is a mechanism.
 *
 * The Newton tangent gives cables with S below a small floor (slack or stress-free) a geometric
 * stiffness they do not have (assembly/assemble.ts), so that it stays factorable; equilibrium itself
 * is exact. But where that floor is the only thing holding a node — a weightless cable under no
 * load, a straight cable without pretension — the position of the node is not determined and
 * "converged after 0 iterations" would hide it. Here, only when some cable element is below the
 * floor at the converged state, the tangent is assembled without the floor and factored once:
 * a zero pivot is the mechanism (its DOF is returned). Costs nothing for models whose cables are
 * all in tension.
 * A member that is slack over its whole length carries nothing, and that is the answer: its
 * interior nodes (whose places do not matter) are held fixed for the test, its end nodes are not.
 */
import type { Workspace } from './workspace.ts';
import { CABLE_STRESS_FLOOR_RATIO } from '../assembly/assemble.ts';
import { trussTangent } from '../modes/truss-tangent.ts';

/**
 * @param u converged displacements from the start positions (3 × nodeCount), m
 * @param temperatureChange ΔT of the case, K
 * @returns the DOF of the zero pivot, or −1 when the state is determined
 */
export function untensionedMechanismDof(ws: Workspace, u: Float64Array, temperatureChange: number, pivotTolerance: number): number {
  const m = ws.model;
  const positions = new Float64Array(u.length);
  for (let d = 0; d < u.length; d++) positions[d] = m.coords[d] + u[d];
  let belowFloor = false;
  for (let e = 0; e < m.elementCount && !belowFloor; e++) {
    if (m.elemTensionOnly[e] !== 1) continue;
    const a3 = 3 * m.elemNodes[2 * e], b3 = 3 * m.elemNodes[2 * e + 1];
    const l2 = (positions[b3] - positions[a3]) ** 2 + (positions[b3 + 1] - positions[a3 + 1]) ** 2 + (positions[b3 + 2] - positions[a3 + 2]) ** 2;
    const Lr = m.elemRefLength[e];
    const S = m.elemS0[e] + m.elemE[e] * ((0.5 * (l2 - Lr * Lr)) / (Lr * Lr) - m.elemAlpha[e] * temperatureChange);
    if (S < CABLE_STRESS_FLOOR_RATIO * m.elemE[e]) belowFloor = true;
  }
  if (!belowFloor) return -1;
  const slack = ws.elements.slack;
  const skip = new Uint8Array(m.elementCount);
  const heldInterior: number[] = [];
  for (const member of m.members) {
    let all = true;
    for (let k = 0; k < member.elementCount && all; k++) all = slack[member.firstElement + k] === 1;
    if (!all) continue;
    skip.fill(1, member.firstElement, member.firstElement + member.elementCount);
    for (let k = 1; k < member.nodeChain.length - 1; k++) heldInterior.push(member.nodeChain[k]);
  }
  const values = trussTangent(m, ws.pattern, positions, temperatureChange, skip, 0);
  for (const node of heldInterior) for (let q = 0; q < 3; q++) values[ws.pattern.diagonal[3 * node + q]] = 1;
  return ws.ldl.factor(values, pivotTolerance);
}

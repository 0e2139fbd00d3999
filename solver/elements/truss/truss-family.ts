/**
 * Truss / cable family: two-node Total Lagrangian bar (kernel in truss-tl.ts), 3 translations per
 * node, element DOFs [x_a, y_a, z_a, x_b, y_b, z_b]. Members of kind "cable" are tension-only.
 */
import type { ElementFamily, FamilyBlock, AssemblyContext } from '../family.ts';
import type { AnalysisModel } from '../../model/analysis-model.ts';
import { evaluateTrussTL, OUT_N, OUT_SIZE, OUT_STATE, ELEMENT_SLACK } from './truss-tl.ts';

/** Geometric-stiffness floor for cables in the tangent, as a fraction of E (see truss-tl.ts). */
export const CABLE_STRESS_FLOOR_RATIO = 1e-8;

// Module-scope alias: some loaders compile imports to getter calls; keep them out of the hot loop.
const evaluateElement = evaluateTrussTL;
const out = new Float64Array(OUT_SIZE);
const kb = new Float64Array(9);

export const trussFamily: ElementFamily = {
  id: 'truss',
  kinds: ['cable', 'bar'],
  dofsPerElement: 6,
  prepare: () => null,
  markRotations: () => undefined,
  elementDofs(model: AnalysisModel, block: FamilyBlock): Int32Array {
    const { elements } = block;
    const dofs = new Int32Array(6 * elements.length);
    for (let k = 0; k < elements.length; k++) {
      const e = elements[k];
      const a3 = 3 * model.elemNodes[2 * e], b3 = 3 * model.elemNodes[2 * e + 1];
      for (let q = 0; q < 3; q++) { dofs[6 * k + q] = a3 + q; dofs[6 * k + 3 + q] = b3 + q; }
    }
    return dofs;
  },
  assemble: assembleTrusses,
  lumpedMass(model, block, extra, mass) {
    // Half the element mass (mass per unstressed length × unstressed length) to each end node.
    const { elemNodes, elemMassPerLength, elemUnstressedLength } = model;
    for (const e of block.elements) {
      const half = 0.5 * (elemMassPerLength[e] + (extra ? extra[e] : 0)) * elemUnstressedLength[e];
      const a3 = 3 * elemNodes[2 * e], b3 = 3 * elemNodes[2 * e + 1];
      for (let q = 0; q < 3; q++) { mass[a3 + q] += half; mass[b3 + q] += half; }
    }
  },
};

function assembleTrusses(ctx: AssemblyContext, block: FamilyBlock, slots: Int32Array | null): void {
  const { model, dX, u, dT, fInt, state, values } = ctx;
  const { elemNodes, elemRefLength, elemS0, elemE, elemArea, elemAlpha, elemTensionOnly } = model;
  const list = block.elements;
  const m = list.length;
  for (let k = 0; k < m; k++) {
    const e = list[k];
    const a3 = 3 * elemNodes[2 * e], b3 = 3 * elemNodes[2 * e + 1];
    const tensionOnly = elemTensionOnly[e] === 1;
    const E = elemE[e];
    evaluateElement(
      dX[3 * e] + u[b3] - u[a3], dX[3 * e + 1] + u[b3 + 1] - u[a3 + 1], dX[3 * e + 2] + u[b3 + 2] - u[a3 + 2],
      elemRefLength[e], elemS0[e], E, elemArea[e], elemAlpha[e] * dT,
      tensionOnly, CABLE_STRESS_FLOOR_RATIO * E, out, values ? kb : null, 0,
    );
    fInt[b3] += out[0]; fInt[b3 + 1] += out[1]; fInt[b3 + 2] += out[2];
    fInt[a3] -= out[0]; fInt[a3 + 1] -= out[1]; fInt[a3 + 2] -= out[2];
    state.tension[e] = out[OUT_N];
    state.slack[e] = out[OUT_STATE] === ELEMENT_SLACK ? 1 : 0;
    if (values && slots) scatter(values, slots, 21 * k);
  }
}

/**
 * K_e = [[k, −k], [−k, k]] over local DOFs (a0 a1 a2 b0 b1 b2), lower-triangle pairs in
 * row-major order: rows a0..a2 (block aa), then per row b_r the pairs (b_r, a0..a2) of block ba
 * and (b_r, b0..b_r) of block bb. Entries in restrained rows or columns are added like the rest
 * and cleared afterwards by assemble() (assembly/restrained-entries.ts), so the loop has no
 * branches; every other entry receives the same sums in the same order.
 */
function scatter(values: Float64Array, slots: Int32Array, s: number): void {
  const k0 = kb[0], k1 = kb[1], k2 = kb[2], k3 = kb[3], k4 = kb[4], k5 = kb[5], k6 = kb[6], k7 = kb[7], k8 = kb[8];
  values[slots[s]] += k0;
  values[slots[s + 1]] += k3; values[slots[s + 2]] += k4;
  values[slots[s + 3]] += k6; values[slots[s + 4]] += k7; values[slots[s + 5]] += k8;
  values[slots[s + 6]] -= k0; values[slots[s + 7]] -= k1; values[slots[s + 8]] -= k2; values[slots[s + 9]] += k0;
  values[slots[s + 10]] -= k3; values[slots[s + 11]] -= k4; values[slots[s + 12]] -= k5; values[slots[s + 13]] += k3; values[slots[s + 14]] += k4;
  values[slots[s + 15]] -= k6; values[slots[s + 16]] -= k7; values[slots[s + 17]] -= k8; values[slots[s + 18]] += k6; values[slots[s + 19]] += k7; values[slots[s + 20]] += k8;
}

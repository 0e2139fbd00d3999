/**
 * Element loop: internal forces, element axial forces and (optionally) the global tangent.
 *
 * Conventions: u is the displacement from the start positions X (3 × nodeCount, m); each element's
 * current end-to-end vector is d = (X_b − X_a) + (u_b − u_a), with X_b − X_a precomputed once
 * (`startVectors`), so round-off does not scale with the coordinates' magnitude. f_int is the
 * gradient of the strain energy (N), so equilibrium at free DOFs is f_ext − f_int = 0 and the
 * support reaction at a restrained DOF is r = f_int − f_ext. Tangent values follow the
 * BlockPattern layout; restrained DOFs get identity rows.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import { evaluateTrussTL, OUT_N, OUT_SIZE, OUT_STATE, ELEMENT_SLACK } from '../elements/truss-tl.ts';
import { SLOTS_PER_ELEMENT, type BlockPattern } from './block-pattern.ts';

/** Geometric-stiffness floor for cables in the tangent, as a fraction of E (see truss-tl.ts). */
export const CABLE_STRESS_FLOOR_RATIO = 1e-8;

export interface ElementState {
  /** Axial force per element, N. */
  tension: Float64Array;
  /** 1 where the element is slack. */
  slack: Uint8Array;
}

// Module-scope alias: some loaders compile imports to getter calls; keep them out of the hot loop.
const evaluateElement = evaluateTrussTL;
const out = new Float64Array(OUT_SIZE);
const kb = new Float64Array(9);

/** Element start vectors X_b − X_a (3 × elementCount, m). */
export function startVectors(model: AnalysisModel): Float64Array {
  const v = new Float64Array(3 * model.elementCount);
  const { elemNodes, coords } = model;
  for (let e = 0; e < model.elementCount; e++) {
    const a3 = 3 * elemNodes[2 * e], b3 = 3 * elemNodes[2 * e + 1];
    for (let q = 0; q < 3; q++) v[3 * e + q] = coords[b3 + q] - coords[a3 + q];
  }
  return v;
}

/**
 * Evaluate every element at displacements u with temperature change dT (K).
 * Writes f_int (zeroed first) and element state; when `values` is given, also the tangent.
 */
export function assemble(
  model: AnalysisModel, pattern: BlockPattern | null, dX: Float64Array, u: Float64Array, dT: number,
  fInt: Float64Array, state: ElementState, values: Float64Array | null,
): void {
  const { elemNodes, elemRefLength, elemS0, elemE, elemArea, elemAlpha, elemTensionOnly, fixed } = model;
  const m = model.elementCount;
  fInt.fill(0);
  const slots = pattern ? pattern.slots : null;
  if (values) values.fill(0);
  for (let e = 0; e < m; e++) {
    const a = elemNodes[2 * e], b = elemNodes[2 * e + 1];
    const a3 = 3 * a, b3 = 3 * b;
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
    if (values && slots) scatter(values, slots, SLOTS_PER_ELEMENT * e, a, b, fixed);
  }
  if (values && pattern) {
    const diag = pattern.diagonal;
    for (let d = 0; d < pattern.n; d++) if (fixed[d]) values[diag[d]] = 1;
  }
}

function scatter(values: Float64Array, slots: Int32Array, o: number, a: number, b: number, fixed: Uint8Array): void {
  // Diagonal blocks (a, a) and (b, b): lower triangle, row-major.
  let s = o;
  for (let t = 0; t < 2; t++) {
    const base = 3 * (t === 0 ? a : b);
    for (let r = 0; r < 3; r++) {
      for (let c = 0; c <= r; c++, s++) {
        if (fixed[base + r] || fixed[base + c]) continue;
        values[slots[s]] += kb[3 * r + c];
      }
    }
  }
  const hi3 = 3 * (a > b ? a : b), lo3 = 3 * (a > b ? b : a);
  for (let r = 0; r < 3; r++) {
    for (let c = 0; c < 3; c++, s++) {
      if (fixed[hi3 + r] || fixed[lo3 + c]) continue;
      values[slots[s]] -= kb[3 * r + c];
    }
  }
}

/**
 * Member weight lumped to the element ends: adds −g·(selfFactor·m + extra)·L0/2 to z of each end
 * node (m, extra in kg/m of unstressed length L0; g in m/s²; f in N).
 */
export function addGravity(
  model: AnalysisModel, selfFactor: number, extraMassPerLength: Float64Array | null, g: number, f: Float64Array,
): void {
  const { elemNodes, elemMassPerLength, elemUnstressedLength } = model;
  for (let e = 0; e < model.elementCount; e++) {
    const mass = selfFactor * elemMassPerLength[e] + (extraMassPerLength ? extraMassPerLength[e] : 0);
    if (mass === 0) continue;
    const half = 0.5 * g * mass * elemUnstressedLength[e];
    f[3 * elemNodes[2 * e] + 2] -= half;
    f[3 * elemNodes[2 * e + 1] + 2] -= half;
  }
}

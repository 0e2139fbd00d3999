/**
 * Element loop over the families present: internal forces, element state and (optionally) the
 * global tangent, plus springs to ground.
 *
 * Conventions: u is the displacement (and rotation) from the start state, indexed by the model's
 * DOF map; each element's current end-to-end vector is d = (X_b − X_a) + (u_b − u_a), with
 * X_b − X_a precomputed once (`startVectors`), so round-off does not scale with the coordinates'
 * magnitude. f_int is the gradient of the strain energy (N, N·m), springs included, so
 * equilibrium at free DOFs is f_ext − f_int = 0 and the support reaction at a restrained DOF is
 * r = f_int − f_ext. Tangent values follow the BlockPattern layout; restrained DOFs get identity rows.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { AssemblyContext, ElementState } from '../elements/family.ts';
import type { BlockPattern } from './block-pattern.ts';
import { restrainedOffDiagonal } from './restrained-entries.ts';

export type { ElementState };
export { CABLE_STRESS_FLOOR_RATIO } from '../elements/truss/truss-family.ts';

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

/** Element state arrays for a model (end forces only where rotational elements exist). */
export function createElementState(model: AnalysisModel): ElementState {
  const rotational = model.familyBlocks.some((b) => b.family.dofsPerElement > 6);
  return {
    tension: new Float64Array(model.elementCount),
    slack: new Uint8Array(model.elementCount),
    endForces: new Float64Array(rotational ? 12 * model.elementCount : 0),
  };
}

const ctx: AssemblyContext = {
  model: null as unknown as AnalysisModel, dX: new Float64Array(0), u: new Float64Array(0), dT: 0,
  fInt: new Float64Array(0), state: null as unknown as ElementState, values: null, fixed: new Uint8Array(0),
};

/**
 * Evaluate every element at displacements u with temperature change dT (K).
 * Writes f_int (zeroed first) and element state; when `values` is given, also the tangent.
 */
export function assemble(
  model: AnalysisModel, pattern: BlockPattern | null, dX: Float64Array, u: Float64Array, dT: number,
  fInt: Float64Array, state: ElementState, values: Float64Array | null,
): void {
  fInt.fill(0);
  if (values) values.fill(0);
  ctx.model = model; ctx.dX = dX; ctx.u = u; ctx.dT = dT; ctx.fInt = fInt; ctx.state = state;
  ctx.values = pattern ? values : null; ctx.fixed = model.fixed;
  const blocks = model.familyBlocks;
  for (let b = 0; b < blocks.length; b++) {
    const block = blocks[b];
    block.family.assemble(ctx, block, pattern ? pattern.slots[b] : null);
  }
  const springs = model.springs;
  if (springs) {
    for (let d = 0; d < springs.length; d++) {
      const k = springs[d];
      if (k === 0) continue;
      fInt[d] += k * u[d];
      if (values && pattern) values[pattern.diagonal[d]] += k;
    }
  }
  if (values && pattern) {
    const { fixed } = model;
    const cleared = restrainedOffDiagonal(pattern, fixed);
    for (let q = 0; q < cleared.length; q++) values[cleared[q]] = 0;
    const diag = pattern.diagonal;
    for (let d = 0; d < pattern.n; d++) if (fixed[d]) values[diag[d]] = 1;
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

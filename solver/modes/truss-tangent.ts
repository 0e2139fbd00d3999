/**
 * Tangent stiffness of the truss/cable family at a solved state, for the modal eigenproblem:
 * K = Σ_e K_e with K_e the consistent TL truss tangent (solver/elements/truss-tl.ts: material
 * (A E / Lr³) d dᵀ plus geometric (A S / Lr) I blocks) at the converged positions and temperature.
 * Elements marked in `skip` add nothing (slack members take part with their mass only). Values
 * follow the BlockPattern layout (lower-triangle CSC); couplings of restrained DOFs are left at 0
 * and their diagonal at 1, as the Newton tangent does.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { BlockPattern } from '../assembly/block-pattern.ts';
import { SLOTS_PER_ELEMENT } from '../assembly/block-pattern.ts';
import { CABLE_STRESS_FLOOR_RATIO } from '../assembly/assemble.ts';
import { evaluateTrussTL, OUT_SIZE } from '../elements/truss-tl.ts';

const out = new Float64Array(OUT_SIZE);
const kb = new Float64Array(9);

/**
 * @param positions converged node positions (3 × nodeCount, m)
 * @param temperatureChange ΔT of the solved case, K
 * @param skip 1 for elements left out of K (length elementCount), or null
 * @param floorRatio geometric-stiffness floor of cables as a fraction of E (the solver's by default)
 */
export function trussTangent(
  model: AnalysisModel, pattern: BlockPattern, positions: Float64Array, temperatureChange: number,
  skip: Uint8Array | null, floorRatio = CABLE_STRESS_FLOOR_RATIO,
): Float64Array {
  const values = new Float64Array(pattern.rowIdx.length);
  const { elemNodes, fixed } = model;
  for (let e = 0; e < model.elementCount; e++) {
    if (skip && skip[e]) continue;
    const a3 = 3 * elemNodes[2 * e], b3 = 3 * elemNodes[2 * e + 1];
    evaluateTrussTL(
      positions[b3] - positions[a3], positions[b3 + 1] - positions[a3 + 1], positions[b3 + 2] - positions[a3 + 2],
      model.elemRefLength[e], model.elemS0[e], model.elemE[e], model.elemArea[e], model.elemAlpha[e] * temperatureChange,
      model.elemTensionOnly[e] === 1, floorRatio * model.elemE[e], out, kb, 0,
    );
    scatterBlocks(values, pattern.slots, SLOTS_PER_ELEMENT * e, a3, b3, fixed);
  }
  for (let d = 0; d < pattern.n; d++) if (fixed[d]) values[pattern.diagonal[d]] = 1;
  return values;
}

/** K_e = [[k, −k], [−k, k]] into the 21 slots of the element (order: see block-pattern.ts). */
function scatterBlocks(values: Float64Array, slots: Int32Array, o: number, a3: number, b3: number, fixed: Uint8Array): void {
  let s = o;
  for (const base of [a3, b3]) {
    for (let r = 0; r < 3; r++) {
      for (let c = 0; c <= r; c++, s++) if (!fixed[base + r] && !fixed[base + c]) values[slots[s]] += kb[3 * r + c];
    }
  }
  const hi3 = Math.max(a3, b3), lo3 = Math.min(a3, b3);
  for (let r = 0; r < 3; r++) {
    for (let c = 0; c < 3; c++, s++) if (!fixed[hi3 + r] && !fixed[lo3 + c]) values[slots[s]] -= kb[3 * r + c];
  }
}

/**
 * Per-model buffers for the Newton solver: built once per topology (pattern + symbolic
 * factorisation) and reused by every case and iteration.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import { buildBlockPattern, type BlockPattern } from '../assembly/block-pattern.ts';
import { assemble, createElementState, startVectors, type ElementState } from '../assembly/assemble.ts';
import { SparseLDL } from '../linalg/index.ts';
import { stressFreeLength } from '../model/build-model.ts';
import { StartFactorCache } from './start-factor-cache.ts';

export interface Workspace {
  model: AnalysisModel;
  pattern: BlockPattern;
  ldl: SparseLDL;
  values: Float64Array;
  /** Internal force at the modelled state, ΔT = 0 (the homotopy's λ = 0 balance), N. */
  fInt0: Float64Array;
  fInt: Float64Array;
  fExt: Float64Array;
  residual: Float64Array;
  step: Float64Array;
  trial: Float64Array;
  elements: ElementState;
  /** Element start vectors X_b − X_a (3 × elementCount), m. */
  startVectors: Float64Array;
  /** Displacements and rotations at the start of the current load increment (dofs.count), m, rad. */
  stepStart: Float64Array;
  /** Scratch positions X + u for follower loads (3 × nodeCount), m. */
  positions: Float64Array;
  /** Characteristic size of the model (bounding-box diagonal), m. */
  size: number;
  /** Factors of the tangents at the pretensioned state met so far (start-factor-cache.ts). */
  startFactors: StartFactorCache;
}

export function createWorkspace(model: AnalysisModel): Workspace {
  const pattern = buildBlockPattern(model.dofs.count, model.familyBlocks.map((b) => ({ dofsPerElement: b.family.dofsPerElement, elementDofs: b.elementDofs })));
  // Every run of 3 DOFs is one node's translations or rotations (dof-map.ts): node blocks of 3.
  const ldl = SparseLDL.analyse(pattern, { blockSize: 3, decoupledDofs: model.fixed });
  const n = model.dofs.count;
  const elements: ElementState = createElementState(model);
  const fInt0 = new Float64Array(n);
  const dX = startVectors(model);
  assemble(model, null, dX, new Float64Array(n), 0, fInt0, elements, null);
  return {
    model, pattern, ldl, values: new Float64Array(pattern.rowIdx.length), fInt0,
    fInt: new Float64Array(n), fExt: new Float64Array(n), residual: new Float64Array(n),
    step: new Float64Array(n), trial: new Float64Array(n), elements, startVectors: dX,
    stepStart: new Float64Array(n), positions: new Float64Array(3 * model.nodeCount), size: modelSize(model.coords),
    startFactors: new StartFactorCache(),
  };
}

function modelSize(x: Float64Array): number {
  const lo = [Infinity, Infinity, Infinity], hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < x.length; i += 3) {
    for (let q = 0; q < 3; q++) { lo[q] = Math.min(lo[q], x[i + q]); hi[q] = Math.max(hi[q], x[i + q]); }
  }
  const d = Math.hypot(hi[0] - lo[0], hi[1] - lo[1], hi[2] - lo[2]);
  return d > 0 ? d : 1;
}

/**
 * Change the prestress of elements in place — a pretension P at reference length Lr
 * (S0 = P / A) or an unstressed length (Lr = L0, S0 = 0) — and refresh the homotopy's λ = 0
 * balance. Topology and start positions are unchanged, so the sparsity pattern and the symbolic
 * factorisation stay valid; this is what live pretension dragging and tuning iterate on.
 */
export function setElementPrestress(
  ws: Workspace, elements: ArrayLike<number>, refLength: ArrayLike<number>, initialStress: ArrayLike<number>,
): void {
  const m = ws.model;
  for (let k = 0; k < elements.length; k++) {
    const e = elements[k];
    m.elemRefLength[e] = refLength[k];
    m.elemS0[e] = initialStress[k];
    m.elemUnstressedLength[e] = stressFreeLength(refLength[k], initialStress[k], m.elemE[e]);
  }
  assemble(m, null, ws.startVectors, new Float64Array(m.dofs.count), 0, ws.fInt0, ws.elements, null);
  ws.startFactors.clear();
}

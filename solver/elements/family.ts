/**
 * An element family: one kind of element (truss/cable, beam-column, …) as a plug-in over the DOF
 * map. The model builder, the DOF map, the sparsity pattern, assembly, the lumped mass and Newton
 * loop over the families present (solver/elements/registry.ts) without knowing them.
 *
 * A family owns:
 * - which member kinds it models and the per-element data it needs beyond the common element
 *   arrays of AnalysisModel (`prepare`, throwing a message that names the member on bad input);
 * - the DOFs its elements use at their nodes (`markRotations`, `elementDofs`: dofsPerElement
 *   global DOFs per element in the family's own local order, -1 where a DOF is not connected);
 * - its allocation-free kernel (`assemble`): internal force f_int = ∂Π/∂u (N, N·m) added into
 *   ctx.fInt, element state (axial force, slack, end forces), and, when ctx.values is given, the
 *   consistent tangent ∂²Π/∂u² scattered through `slots` (see assembly/block-pattern.ts);
 * - its lumped mass (`lumpedMass`: kg on translations, kg·m² on rotations).
 */
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { DofMap } from '../model/dof-map.ts';
import type { MemberKind, ProjectFile } from '../project/types.ts';

/** Per-element results every family writes (indexed by global element number). */
export interface ElementState {
  /** Axial force per element, N (positive = tension). */
  tension: Float64Array;
  /** 1 where the element is slack. */
  slack: Uint8Array;
  /**
   * End actions of rotational elements, 12 per element (empty when the model has none):
   * see solver/elements/beam/beam-results.ts for the layout and sign convention.
   */
  endForces: Float64Array;
}

export interface AssemblyContext {
  model: AnalysisModel;
  /** Element start vectors X_b − X_a (3 × elementCount), m. */
  dX: Float64Array;
  /** Displacements and rotations from the start state (model.dofs.count), m and rad. */
  u: Float64Array;
  /** Temperature change, K. */
  dT: number;
  /** Internal force, accumulated into (zeroed by the caller), N and N·m. */
  fInt: Float64Array;
  state: ElementState;
  /** Tangent values in the pattern's layout, accumulated into; null for force-only evaluations. */
  values: Float64Array | null;
  /**
   * 1 at restrained DOFs. A kernel may skip their rows and columns or add into them: assemble()
   * makes them identity rows afterwards (assembly/restrained-entries.ts).
   */
  fixed: Uint8Array;
}

export interface FamilyBlock {
  family: ElementFamily;
  /** Global element indices of this family, ascending. */
  elements: Int32Array;
  /** The family's own per-element data (made by `prepare`). */
  data: unknown;
  /** dofsPerElement global DOFs per element of this block (-1 = not connected). */
  elementDofs: Int32Array;
}

export interface ElementFamily {
  readonly id: string;
  readonly kinds: readonly MemberKind[];
  readonly dofsPerElement: number;
  prepare(project: ProjectFile, model: AnalysisModel, elements: Int32Array): unknown;
  /** Set mark[node] = 1 for every node whose rotations this block's elements use. */
  markRotations(model: AnalysisModel, block: FamilyBlock, mark: Uint8Array): void;
  elementDofs(model: AnalysisModel, block: FamilyBlock, dofs: DofMap): Int32Array;
  /**
   * `slots` holds, per element, one value index per local pair (p, q ≤ p) of its DOF list in
   * row-major lower-triangle order (dofsPerElement·(dofsPerElement+1)/2 entries, -1 where a DOF
   * is absent); null when ctx.values is null.
   */
  assemble(ctx: AssemblyContext, block: FamilyBlock, slots: Int32Array | null): void;
  lumpedMass(model: AnalysisModel, block: FamilyBlock, extraMassPerLength: Float64Array | null, mass: Float64Array): void;
}

/** Local lower-triangle pairs per element for a family with n DOFs per element. */
export function slotsPerElement(n: number): number {
  return (n * (n + 1)) >> 1;
}

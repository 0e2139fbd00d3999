import type { DofMap } from './dof-map.ts';
import type { FamilyBlock } from '../elements/family.ts';
import type { MemberKind } from '../project/types.ts';

/**
 * The discretised model the analysis works on, built from a project by `buildModel`.
 *
 * Layout (structure of arrays, all typed):
 * - DOFs follow `dofs` (dof-map.ts): node i's translations are 3i, 3i+1, 3i+2 (x, y, z); nodes
 *   touched by a rotational element or restraint also carry rotations, numbered after all
 *   translations. Position arrays stay 3 × nodeCount. The first `userNodeCount` nodes are the project's
 *   nodes in file order; the rest are interior nodes the solver made when splitting members.
 * - Element e joins nodes elemNodes[2e] → elemNodes[2e+1] (in the member's from → to order).
 * - Element law (Total Lagrangian, reference length Lr, Green–Lagrange strain):
 *     ε = (l² − Lr²) / (2 Lr²),   S = S0 + E (ε − α ΔT),   N = A S l / Lr  (true axial force, N)
 *   A member with `unstressedLength` gets Lr = its element's share of that length and S0 = 0;
 *   a member with `pretension` P gets Lr = modelled element length and S0 = P / A.
 */
export interface AnalysisModel {
  nodeCount: number;
  userNodeCount: number;
  /** User node ids, index = node index. */
  nodeIds: string[];
  /** Initial positions (3 × nodeCount), m: user nodes as modelled, interior nodes on the start shape. */
  coords: Float64Array;
  /** DOF map (which nodes carry rotations, and where). */
  dofs: DofMap;
  /** 1 where the DOF is restrained (dofs.count entries). */
  fixed: Uint8Array;
  /** Spring stiffness to ground per DOF (N/m, N·m/rad), or null when there are no springs. */
  springs: Float64Array | null;

  elementCount: number;
  elemNodes: Int32Array;
  /** Reference length Lr, m. */
  elemRefLength: Float64Array;
  /** Initial second Piola–Kirchhoff stress S0 at the reference length, Pa. */
  elemS0: Float64Array;
  /** Young's modulus, Pa. */
  elemE: Float64Array;
  /** Area, m². */
  elemArea: Float64Array;
  /** Thermal expansion, 1/K. */
  elemAlpha: Float64Array;
  /** 1 = tension-only (cable), 0 = bar. */
  elemTensionOnly: Uint8Array;
  /**
   * Stress-free (cut) length of the element, m: Lr for S0 = 0; otherwise the unstressed length
   * that carries the same force at Lr when entered as an unstressed length (see stressFreeLength).
   */
  elemUnstressedLength: Float64Array;
  /** Mass per unstressed length, kg/m. */
  elemMassPerLength: Float64Array;
  /** Outer diameter, m (0 when unknown). */
  elemDiameter: Float64Array;
  /** Index of the member the element belongs to. */
  elemMember: Int32Array;
  /** The element families present, each with its elements and data (see solver/elements/family.ts). */
  familyBlocks: FamilyBlock[];

  members: MemberTopology[];
}

export interface MemberTopology {
  id: string;
  /** Index in project.members. */
  index: number;
  kind: MemberKind;
  sectionIndex: number;
  firstElement: number;
  elementCount: number;
  /** Node indices along the member, from → to (elementCount + 1 entries). */
  nodeChain: Int32Array;
}

/** Straight distance between a member's end nodes at the model's start positions, m. */
export function memberStartChord(model: AnalysisModel, m: MemberTopology): number {
  const a = 3 * m.nodeChain[0], b = 3 * m.nodeChain[m.nodeChain.length - 1], c = model.coords;
  return Math.hypot(c[b] - c[a], c[b + 1] - c[a + 1], c[b + 2] - c[a + 2]);
}

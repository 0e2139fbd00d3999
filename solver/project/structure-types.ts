/**
 * Project-file types for beam-columns and supports (format version 1, optional fields).
 * SI units: m, N, Pa, rad for rotations of supports and prescribed values.
 */
import type { Vec3 } from './types.ts';

/**
 * End releases (pins) of a beam member: letters of the LOCAL rotation axes released at the
 * member's start (`from`) and end (`to`): "x" torsion, "y" bending about local y, "z" about local
 * z; "xyz" is a full pin. Torsion may be released at one end at most.
 */
export interface BeamReleases {
  start?: string;
  end?: string;
}

/**
 * Elastic supports of a node: translational springs (N/m) along x, y, z and rotational springs
 * (N·m/rad) about x, y, z (global axes). A spring on a restrained direction is refused.
 */
export interface NodeSprings {
  x?: number;
  y?: number;
  z?: number;
  rx?: number;
  ry?: number;
  rz?: number;
}

/**
 * Prescribed displacement of a support in one load case (anchor movement, settlement): metres
 * along x, y, z and radians about x, y, z (global axes). Every direction given must be restrained
 * in the node's `fixed`.
 */
export interface PrescribedDisplacement {
  node: string;
  x?: number;
  y?: number;
  z?: number;
  rx?: number;
  ry?: number;
  rz?: number;
}

/** A nodal moment [Mx, My, Mz], N·m, acting on the node's total rotation vector. */
export type NodalMoment = Vec3;

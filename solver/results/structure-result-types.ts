/**
 * Result types of beam-columns (see solver/elements/beam/beam-results.ts for the convention).
 */

/**
 * Actions the node exerts on a beam member's end, in the end element's local axes (x along the
 * member from → to, y and z its section axes): forces N, moments N·m. At the end (`to`) fx is the
 * axial force N (tension positive); at the start fx = −N.
 */
export interface BeamEndActions {
  fx: number; fy: number; fz: number;
  mx: number; my: number; mz: number;
}

export interface BeamMemberEnds {
  start: BeamEndActions;
  end: BeamEndActions;
  /** Largest bending moment magnitude √(My² + Mz²) at any element end of the member, N·m. */
  maxBendingMoment: number;
}

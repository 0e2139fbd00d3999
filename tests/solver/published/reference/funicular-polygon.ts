/**
 * The elastic funicular polygon: a cable of n straight segments hung between two fixed supports
 * in the x–z plane (z up), loaded by point forces at the n − 1 joints. Independent of the solver.
 *
 * Method (statics of a string polygon, e.g. Irvine, Cable Structures, 1981, ch. 1, and any statics
 * text on cables with point loads): let f_i = T_i e_i be the force in segment i, e_i its unit
 * vector from joint i − 1 to joint i. Equilibrium of joint j (between segments j and j + 1) under
 * the applied force F_j, −f_j + f_{j+1} + F_j = 0, gives f_{j+1} = f_j − F_j. The two unknowns are the components (H, V) of
 * f_1 (H > 0 horizontal pull, V > 0 when segment 1 rises from support A). Marching from A, joint
 * i sits at x_i = x_{i−1} + l_i e_i with the stretched length l_i from the segment's axial law;
 * Newton's method on (H, V) drives the last joint onto support B.
 *
 * Units: m, N. Arrays: `segments[i]` is segment i + 1 (from joint i to joint i + 1), `loads[j]` is
 * the force [Fx, Fz] at interior joint j + 1.
 */
import { lengthAtTension, type SegmentLaw } from './axial-laws.ts';
import { solveSmallNewton } from './small-newton.ts';

export interface FunicularProblem {
  /** Support B relative to support A, [x, z], m (A is at the origin). */
  b: [number, number];
  segments: SegmentLaw[];
  /** Force at each interior joint, [Fx, Fz], N (z up: a weight is negative). */
  loads: [number, number][];
  /** Starting guess for (H, V), N. */
  guess: [number, number];
}

export interface FunicularSolution {
  H: number;
  V: number;
  /** Joint positions including both supports, [x, z] each, m. */
  joints: [number, number][];
  /** Segment tensions, N. */
  tensions: number[];
  /** Closure error at B after convergence, m. */
  closure: number;
}

function march(p: FunicularProblem, H: number, V: number) {
  let fx = H, fz = V;
  let x = 0, z = 0;
  const joints: [number, number][] = [[0, 0]];
  const tensions: number[] = [];
  p.segments.forEach((law, i) => {
    if (i > 0) { fx -= p.loads[i - 1][0]; fz -= p.loads[i - 1][1]; }
    const T = Math.hypot(fx, fz);
    const l = lengthAtTension(law, T);
    x += (l * fx) / T;
    z += (l * fz) / T;
    joints.push([x, z]);
    tensions.push(T);
  });
  return { joints, tensions, end: [x, z] as [number, number] };
}

export function solveFunicular(p: FunicularProblem): FunicularSolution {
  if (p.loads.length !== p.segments.length - 1) throw new Error('funicular: need one load per interior joint');
  const span = Math.hypot(p.b[0], p.b[1]);
  const scale = Math.max(Math.abs(p.guess[0]), Math.abs(p.guess[1]));
  const { x } = solveSmallNewton(
    ([H, V]) => { const e = march(p, H, V).end; return [e[0] - p.b[0], e[1] - p.b[1]]; },
    p.guess, { scale: [scale, scale], residualTol: 1e-12 * span },
  );
  const [H, V] = x;
  const m = march(p, H, V);
  return {
    H, V, joints: m.joints, tensions: m.tensions,
    closure: Math.hypot(m.end[0] - p.b[0], m.end[1] - p.b[1]),
  };
}

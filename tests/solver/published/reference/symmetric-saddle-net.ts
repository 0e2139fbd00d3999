/**
 * A four-node saddle net with two mirror planes, reduced by symmetry to one joint and solved
 * independently of the solver.
 *
 * Layout (z up, m): interior joints at (±b, ±b, 0). Two "sag" cables run along x at y = ±b,
 * anchored at (±c, ±b, +hs) above the joints; two "hog" cables run along y at x = ±b, anchored at
 * (±b, ±c, −hh) below them. Each cable line has three segments: anchor–joint, joint–joint,
 * joint–anchor. Every joint carries the same force [Fx, Fy, Fz] mirrored with the geometry
 * (Fx changes sign across x = 0, Fy across y = 0), so the equilibrium state keeps both mirror
 * planes: joint (+b, +b) moves to (b + u, b + v, w) and the others to the mirror images.
 *
 * The reduced problem has 3 unknowns (u, v, w) and 3 equations, the equilibrium of joint (+b, +b):
 *   Σ_k T_k (x_k − x) / l_k + F = 0
 * over its four segments: sag outer (to (c, b, hs)), sag middle (to the mirror joint (−b − u, b + v, w)),
 * hog outer (to (b, c, −hh)) and hog middle (to (b + u, −b − v, w)); T_k from the segment's
 * axial law (reference/axial-laws.ts). Solved by Newton with a numerical Jacobian.
 */
import { axialForce, type SegmentLaw } from './axial-laws.ts';
import { solveSmallNewton } from './small-newton.ts';

export interface SaddleNetGeometry {
  /** Half-distance between parallel cable lines, m. */
  b: number;
  /** Anchor distance from the centre along each cable line, m (c > b). */
  c: number;
  /** Height of the sag-cable anchors above the joints, m. */
  hs: number;
  /** Depth of the hog-cable anchors below the joints, m. */
  hh: number;
}

export interface SaddleNetLaws {
  sagOuter: SegmentLaw;
  sagMiddle: SegmentLaw;
  hogOuter: SegmentLaw;
  hogMiddle: SegmentLaw;
}

export interface SaddleNetSolution {
  /** Displacement of joint (+b, +b, 0), [u, v, w], m. */
  displacement: [number, number, number];
  tensions: { sagOuter: number; sagMiddle: number; hogOuter: number; hogMiddle: number };
  residual: number;
}

type V3 = [number, number, number];

function segmentForces(g: SaddleNetGeometry, laws: SaddleNetLaws, d: number[]) {
  const x: V3 = [g.b + d[0], g.b + d[1], d[2]];
  const ends: [keyof SaddleNetLaws, V3][] = [
    ['sagOuter', [g.c, g.b, g.hs]],
    ['sagMiddle', [-x[0], x[1], x[2]]],
    ['hogOuter', [g.b, g.c, -g.hh]],
    ['hogMiddle', [x[0], -x[1], x[2]]],
  ];
  const sum: V3 = [0, 0, 0];
  const tensions = { sagOuter: 0, sagMiddle: 0, hogOuter: 0, hogMiddle: 0 };
  for (const [name, p] of ends) {
    const r: V3 = [p[0] - x[0], p[1] - x[1], p[2] - x[2]];
    const l = Math.hypot(r[0], r[1], r[2]);
    const T = axialForce(laws[name], l);
    tensions[name] = T;
    for (let q = 0; q < 3; q++) sum[q] += (T * r[q]) / l;
  }
  return { sum, tensions };
}

/** Equilibrium of the net under the joint force `force` (N, for joint (+b, +b); mirrored elsewhere). */
export function solveSaddleNet(g: SaddleNetGeometry, laws: SaddleNetLaws, force: V3): SaddleNetSolution {
  const scaleForce = Math.max(Math.hypot(...force), laws.sagOuter.EA * 1e-6);
  const { x, residual } = solveSmallNewton(
    (d) => { const s = segmentForces(g, laws, d).sum; return [s[0] + force[0], s[1] + force[1], s[2] + force[2]]; },
    [0, 0, 0], { scale: [g.b * 1e-2, g.b * 1e-2, g.b * 1e-2], residualTol: 1e-11 * scaleForce },
  );
  return { displacement: [x[0], x[1], x[2]], tensions: segmentForces(g, laws, x).tensions, residual };
}

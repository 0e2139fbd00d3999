/**
 * Independent reference: the elastic catenary in closed form (Irvine, Cable Structures, MIT Press
 * 1981, §2.2, eqs. 2.24–2.27 in Lagrangian coordinates), for a cable of unstressed length L0 and
 * weight w per unstressed length (N/m) between a support A at the origin and B at (h, v).
 * With H the (constant) horizontal force and V(s) = V0 + w s the vertical force at Lagrangian
 * coordinate s (V0 at A, positive upward along the cable from A to B):
 *   x(s) = H s / EA + (H / w) [asinh(V(s)/H) − asinh(V0/H)]
 *   z(s) = (V0 s + w s²/2) / EA + (1 / w) [√(H² + V(s)²) − √(H² + V0²)]
 * H and V0 solve x(L0) = h, z(L0) = v (Newton with a numerical Jacobian here).
 * Written for the tests only; it shares no code with the solver.
 */
export interface CatenarySolution {
  H: number;
  V0: number;
  tensionAtA: number;
  tensionAtB: number;
  x: (s: number) => number;
  z: (s: number) => number;
}

export function elasticCatenary(h: number, v: number, L0: number, w: number, EA: number): CatenarySolution {
  const xs = (H: number, V0: number, s: number) => (H * s) / EA + (H / w) * (Math.asinh((V0 + w * s) / H) - Math.asinh(V0 / H));
  const zs = (H: number, V0: number, s: number) =>
    (V0 * s + 0.5 * w * s * s) / EA + (Math.hypot(H, V0 + w * s) - Math.hypot(H, V0)) / w;
  // Start: inextensible parabola-ish guess.
  const chord = Math.hypot(h, v);
  let H = L0 > chord ? (w * h * h) / (8 * Math.sqrt(Math.max(1e-6, (3 * h * (L0 - chord)) / 8))) : w * L0 * 10;
  let V0 = (w * L0) / 2 - (H * v) / h;
  for (let it = 0; it < 200; it++) {
    const f1 = xs(H, V0, L0) - h, f2 = zs(H, V0, L0) - v;
    if (Math.abs(f1) + Math.abs(f2) < 1e-13 * chord) break;
    const dH = 1e-7 * H, dV = 1e-7 * (Math.abs(V0) + H);
    const a11 = (xs(H + dH, V0, L0) - h - f1) / dH, a12 = (xs(H, V0 + dV, L0) - h - f1) / dV;
    const a21 = (zs(H + dH, V0, L0) - v - f2) / dH, a22 = (zs(H, V0 + dV, L0) - v - f2) / dV;
    const det = a11 * a22 - a12 * a21;
    const sH = (f1 * a22 - f2 * a12) / det, sV = (a11 * f2 - a21 * f1) / det;
    let t = 1;
    while (H - t * sH <= 0) t *= 0.5;
    H -= t * sH;
    V0 -= t * sV;
  }
  return {
    H, V0,
    tensionAtA: Math.hypot(H, V0),
    tensionAtB: Math.hypot(H, V0 + w * L0),
    x: (s) => xs(H, V0, s),
    z: (s) => zs(H, V0, s),
  };
}

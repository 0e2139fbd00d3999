/**
 * Start shape of a cable member split into n elements, so that a cable longer than its chord — or
 * one that must sag to carry its weight — starts near its equilibrium instead of on the straight
 * chord, where the Newton basin of a stiff, low-tension cable is tiny.
 * Only the Newton start depends on this; the converged equilibrium does not.
 *
 * The shape follows from the member's stress-free length L0 alone (a pretension P at the chord l is
 * first turned into the L0 that carries it, see stressFreeLength in build-model.ts), so the sag can
 * never exceed what L0 allows — a tiny pretension does not give the unbounded sag w l² / (8 P):
 *  - L0 > chord with weight: the inextensible catenary of that length through the end points
 *    (Irvine, Cable Structures, 1981, ch. 1), lengthened by its mean tension / EA;
 *    without weight: a parabola with the smallest sag at which every element is at least its
 *    reference length (no slack element at the start);
 *  - L0 ≤ chord: a parabola p(t) = A + t (B − A) + 4 d t (1 − t) ŝ, t ∈ [0, 1], ŝ = −z (or a
 *    horizontal direction for a vertical chord), with the sag of the shallow elastic cable
 *    (Irvine 1981, ch. 2)
 *      w_⊥² l³ / (24 H²) − H l / EA + (l − L0) = 0,   d = w_⊥ l² / (8 H cos θ)
 *    with l the chord, θ its inclination and w_⊥ = w cos θ the weight per length across the chord.
 * Nodes are placed at equal arc length.
 */

export interface StartShapeInput {
  /** End points, m. */
  a: ArrayLike<number>;
  b: ArrayLike<number>;
  /**
   * Stress-free length of the whole member, m (for a pretensioned cable: the length that carries
   * its pretension at the modelled chord).
   */
  unstressedLength: number;
  /** Number of elements. */
  n: number;
  /** Weight per length, N/m. */
  weightPerLength: number;
  /** Axial stiffness E·A, N. */
  EA: number;
}

/** Interior node positions (3 × (n − 1), m). */
export function sagStartShape(input: StartShapeInput): Float64Array {
  const { a, b, n, EA, unstressedLength } = input;
  const c = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const l = Math.hypot(c[0], c[1], c[2]);
  const cosTheta = Math.hypot(c[0], c[1]) / l;
  const vertical = cosTheta < 1e-3;
  const s = vertical ? [1, 0, 0] : [0, 0, -1];
  const wPerp = input.weightPerLength * (vertical ? 1 : cosTheta);
  const bowFactor = vertical ? 1 : 1 / cosTheta; // vertical sag per perpendicular sag
  const curve = { a, c, s };

  if (unstressedLength > l * (1 + 1e-9) && !vertical && input.weightPerLength > 0) {
    return catenaryStart(a, c, unstressedLength, n, input.weightPerLength, EA);
  }
  let d = 0;
  if (unstressedLength > l * (1 + 1e-12)) {
    let strain = 1e-6;
    for (let pass = 0; pass < 4; pass++) {
      d = sagForShortestChord(curve, (unstressedLength / n) * (1 + strain), n);
      if (!(wPerp > 0 && EA > 0 && d > 0)) break;
      strain = Math.max(1e-6, (wPerp * l * l) / (8 * (d / bowFactor)) / EA);
    }
  } else if (wPerp > 0 && EA > 0) {
    d = ((wPerp * l * l) / (8 * elasticForce(l, unstressedLength, wPerp, EA))) * bowFactor;
  }
  const t = equalArcParameters(curve, d, n);
  const out = new Float64Array(3 * (n - 1));
  for (let k = 1; k < n; k++) point(curve, d, t[k], out, 3 * (k - 1));
  return out;
}

interface Curve { a: ArrayLike<number>; c: number[]; s: number[] }

function point(curve: Curve, d: number, t: number, out: Float64Array | number[], o: number): void {
  const bow = 4 * d * t * (1 - t);
  for (let q = 0; q < 3; q++) out[o + q] = curve.a[q] + t * curve.c[q] + bow * curve.s[q];
}

/** Parameters t_0 = 0 … t_n = 1 of n + 1 points at equal arc length on the curve of sag d. */
function equalArcParameters(curve: Curve, d: number, n: number): Float64Array {
  const samples = 64 * n;
  const arc = new Float64Array(samples + 1);
  const p = [0, 0, 0], q = [0, 0, 0];
  point(curve, d, 0, p, 0);
  for (let i = 1; i <= samples; i++) {
    point(curve, d, i / samples, q, 0);
    arc[i] = arc[i - 1] + Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
    p[0] = q[0]; p[1] = q[1]; p[2] = q[2];
  }
  const t = new Float64Array(n + 1);
  t[n] = 1;
  let j = 1;
  for (let k = 1; k < n; k++) {
    const target = (arc[samples] * k) / n;
    while (arc[j] < target) j++;
    t[k] = (j - 1 + (target - arc[j - 1]) / (arc[j] - arc[j - 1])) / samples;
  }
  return t;
}

/** Shortest chord between consecutive equal-arc nodes on the curve of sag d, m. */
function shortestChord(curve: Curve, d: number, n: number): number {
  const t = equalArcParameters(curve, d, n);
  const p = [0, 0, 0], q = [0, 0, 0];
  let min = Infinity;
  point(curve, d, 0, p, 0);
  for (let k = 1; k <= n; k++) {
    point(curve, d, t[k], q, 0);
    min = Math.min(min, Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]));
    p[0] = q[0]; p[1] = q[1]; p[2] = q[2];
  }
  return min;
}

/** Smallest sag at which every element is at least `target` long, m (bisection). */
function sagForShortestChord(curve: Curve, target: number, n: number): number {
  let lo = 0, hi = n * target;
  for (let i = 0; i < 80 && hi - lo > 1e-13 * n * target; i++) {
    const mid = 0.5 * (lo + hi);
    if (shortestChord(curve, mid, n) < target) lo = mid; else hi = mid;
  }
  return hi;
}

/** Root H > 0 of w² l³/(24 H²) − H l/EA + (l − L0) = 0 (monotone decreasing in H), N. */
function elasticForce(l: number, L0: number, w: number, EA: number): number {
  const f = (H: number) => (w * w * l * l * l) / (24 * H * H) - (H * l) / EA + (l - L0);
  let lo = 1e-12 * (EA + w * l), hi = EA + w * l;
  while (f(hi) > 0) hi *= 10;
  for (let i = 0; i < 200 && hi / lo > 1 + 1e-12; i++) {
    const mid = Math.sqrt(lo * hi);
    if (f(mid) > 0) lo = mid; else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

/**
 * Nodes on the catenary z = α cosh((x − x0)/α) + const through A and B with arc length
 * L = L0 (1 + H/EA), H = w α the horizontal tension, at equal arc length (Irvine 1981, ch. 1):
 *   √(L² − v²) = 2 α sinh(h / 2α),   x0 = h/2 − α atanh(v/L),
 * h the horizontal span, v the rise from A to B.
 */
function catenaryStart(
  a: ArrayLike<number>, c: number[], L0: number, n: number, w: number, EA: number,
): Float64Array {
  const h = Math.hypot(c[0], c[1]);
  const v = c[2];
  const ex = c[0] / h, ey = c[1] / h;
  // Arc length: L0 stretched by H/EA, then lengthened until every inscribed chord reaches its
  // reference length L0/n (chords are shorter than arcs), so no element starts slack.
  let L = L0;
  let alpha = catenaryParameter(h, v, L);
  let out = catenaryNodes(a, ex, ey, h, v, L, alpha, n);
  for (let pass = 0; pass < 8; pass++) {
    const target = (L0 / n) * (1 + (EA > 0 ? Math.max(1e-6, (w * alpha) / EA) : 1e-6));
    const shortest = shortestSegment(a, out, a, c);
    if (shortest >= target) break;
    L *= (target / shortest) * (1 + 1e-9);
    alpha = catenaryParameter(h, v, L);
    out = catenaryNodes(a, ex, ey, h, v, L, alpha, n);
  }
  return out;
}

function catenaryNodes(
  a: ArrayLike<number>, ex: number, ey: number, h: number, v: number, L: number, alpha: number, n: number,
): Float64Array {
  const m = Math.atanh(v / L);
  const x1 = m - h / (2 * alpha);
  const out = new Float64Array(3 * (n - 1));
  for (let k = 1; k < n; k++) {
    const xi = Math.asinh(Math.sinh(x1) + (k * L) / (n * alpha));
    const x = alpha * (xi - x1);
    const z = alpha * (Math.cosh(xi) - Math.cosh(x1));
    out[3 * (k - 1)] = a[0] + x * ex;
    out[3 * (k - 1) + 1] = a[1] + x * ey;
    out[3 * (k - 1) + 2] = a[2] + z;
  }
  return out;
}

/** Shortest segment of the polygon A, interior nodes, A + c, m. */
function shortestSegment(a: ArrayLike<number>, interior: Float64Array, start: ArrayLike<number>, c: number[]): number {
  const count = interior.length / 3;
  let px = start[0], py = start[1], pz = start[2];
  let min = Infinity;
  for (let k = 0; k <= count; k++) {
    const qx = k < count ? interior[3 * k] : a[0] + c[0];
    const qy = k < count ? interior[3 * k + 1] : a[1] + c[1];
    const qz = k < count ? interior[3 * k + 2] : a[2] + c[2];
    min = Math.min(min, Math.hypot(qx - px, qy - py, qz - pz));
    px = qx; py = qy; pz = qz;
  }
  return min;
}

/** α > 0 with 2 α sinh(h / 2α) = √(L² − v²) (left side decreases from ∞ to h), m. */
function catenaryParameter(h: number, v: number, L: number): number {
  const target = Math.sqrt(L * L - v * v);
  let lo = h * 1e-6, hi = h;
  while (2 * hi * Math.sinh(h / (2 * hi)) > target) hi *= 2;
  for (let i = 0; i < 200 && hi / lo > 1 + 1e-14; i++) {
    const mid = Math.sqrt(lo * hi);
    if (2 * mid * Math.sinh(h / (2 * mid)) > target) lo = mid; else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

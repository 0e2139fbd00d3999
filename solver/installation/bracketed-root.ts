/**
 * Bracketed scalar root finding (bisection with a secant/regula-falsi "Illinois" speed-up).
 *
 * Only bracketed methods are used: the caller supplies a and b with f(a)·f(b) ≤ 0 and the result
 * always stays inside [a, b]. Source: the Illinois variant of regula falsi, Dowell & Jarratt,
 * BIT 11 (1971) 168–174; plain bisection as the fall-back. Pure functions, no units.
 */

export interface RootOptions {
  /** Absolute tolerance on x. Default 1e-12 · max(1, |a|, |b|). */
  xTolerance?: number;
  /** Stop when |f(x)| ≤ this. Default 0 (only the x tolerance stops). */
  fTolerance?: number;
  /** Default 200. */
  maxIterations?: number;
}

/**
 * A root of f in [a, b]. Throws when f(a) and f(b) have the same strict sign, or when f returns
 * a non-finite value inside the bracket.
 */
export function findBracketedRoot(f: (x: number) => number, a: number, b: number, options: RootOptions = {}): number {
  let fa = f(a);
  let fb = f(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) throw new Error(`root finder: f is not finite at the bracket ends (${a}, ${b})`);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa * fb > 0) throw new Error(`root finder: no sign change between ${a} and ${b} (f = ${fa}, ${fb})`);
  const xTol = options.xTolerance ?? 1e-12 * Math.max(1, Math.abs(a), Math.abs(b));
  const fTol = options.fTolerance ?? 0;
  const maxIt = options.maxIterations ?? 200;
  for (let it = 0; it < maxIt; it++) {
    // Illinois regula falsi step; bisect every fourth step or when the step leaves the bracket.
    const lo = Math.min(a, b);
    const hi = Math.max(a, b);
    let x = b - (fb * (b - a)) / (fb - fa);
    if (!(x > lo && x < hi) || it % 4 === 3) x = 0.5 * (a + b);
    const fx = f(x);
    if (!Number.isFinite(fx)) throw new Error(`root finder: f is not finite at x = ${x}`);
    if (fx === 0 || Math.abs(fx) <= fTol) return x;
    if (fx * fb < 0) {
      a = b;
      fa = fb;
    } else {
      fa *= 0.5;
    }
    b = x;
    fb = fx;
    if (Math.abs(b - a) <= xTol) return Math.abs(fa) < Math.abs(fb) ? a : b;
  }
  return Math.abs(fa) < Math.abs(fb) ? a : b;
}

/**
 * All sign changes of f on a grid of `count` points spaced geometrically between lo and hi
 * (lo, hi > 0), each refined with findBracketedRoot. Used where f may have several roots
 * (for example the in-plane symmetric cable frequency as a function of tension).
 */
export function findRootsOnLogGrid(f: (x: number) => number, lo: number, hi: number, count = 200): number[] {
  if (!(lo > 0 && hi > lo)) throw new Error(`root scan: need 0 < lo < hi, got ${lo}, ${hi}`);
  const roots: number[] = [];
  const ratio = Math.pow(hi / lo, 1 / (count - 1));
  let x0 = lo;
  let f0 = f(x0);
  for (let i = 1; i < count; i++) {
    const x1 = i === count - 1 ? hi : lo * Math.pow(ratio, i);
    const f1 = f(x1);
    if (Number.isFinite(f0) && Number.isFinite(f1)) {
      if (f0 === 0) roots.push(x0);
      else if (f0 * f1 < 0) roots.push(findBracketedRoot(f, x0, x1));
    }
    x0 = x1;
    f0 = f1;
  }
  if (f0 === 0) roots.push(x0);
  return roots;
}

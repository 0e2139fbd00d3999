/**
 * Bounded Levenberg–Marquardt on target gaps with finite-difference sensitivities.
 *
 * Method (Levenberg 1944; Marquardt 1963; bounds by projection as in Kelley, Iterative Methods
 * for Optimization, SIAM 1999, ch. 5):
 * - unknowns u = x / scale (scaled variables);
 * - residuals r_i = g_i for equality targets, r_i = max(0, g_i + margin) for "≤" targets, so an
 *   inequality only pulls while it is violated or within `margin` of its limit;
 * - sensitivities J = ∂g/∂u by forward differences (backward at an upper bound), each a full
 *   re-solve of the affected cases through `evaluate`;
 * - step (JᵀJ + μ·max(diag JᵀJ)·I) Δu = −Jᵀr on the free variables (those at a bound whose
 *   gradient points outward are held), then x ← clamp(x + Δu · scale); a step is accepted only if
 *   ½‖r‖² decreases, else μ grows ×4 (shrinks ÷3 on success). Levenberg's identity damping in the
 *   scaled variables (not Marquardt's diag JᵀJ) keeps the change of the scaled variables least:
 *   a group that no unmet target needs is not moved just because it couples weakly.
 * Stops when every target is met, the cost stalls, or after maxIterations.
 * The method is written as a generator of evaluation requests (leastSquaresSteps: one point, or
 * the Jacobian's points together), so the caller decides how and where the points are evaluated;
 * solveBoundedLeastSquares evaluates them in turn with GapProblem.evaluate.
 */
import { solveDense } from './dense-solve.ts';
import type { TargetSense } from './tuning-types.ts';

/** The problem without its evaluation: what the step generator (leastSquaresSteps) needs. */
export interface GapProblemShape {
  x0: number[];
  lower: number[];
  upper: number[];
  scale: number[];
  senses: TargetSense[];
  /** Told each time x becomes the current point (the start, then every accepted step). */
  accept?(x: number[]): void;
}

export interface GapProblem extends GapProblemShape {
  /** Gaps g (see target-evaluation.ts) at x, or null when a case did not converge. */
  evaluate(x: number[]): number[] | null;
}

/**
 * Gaps at each point of a request: null where a case did not converge, undefined where the
 * evaluator stopped after a failure in the same request (not evaluated, not counted).
 */
export type GapReply = (number[] | null | undefined)[];

export interface LmOptions {
  maxIterations?: number;
  /** Inequality activation margin on g. Default 0.01 (1 % of the limit). */
  margin?: number;
  /** |g| ≤ this meets an equality target. Default 1e-3. */
  equalityTolerance?: number;
  /** Finite-difference step in scaled units. Default 1e-3. */
  fdStep?: number;
  onIteration?: (iteration: number, x: number[], cost: number) => void;
  /** Checked before every iteration; return true to stop with the best state so far. */
  isCancelled?: () => boolean;
}

export interface LmOutcome {
  x: number[];
  /** Gaps at x (null only when the very first evaluation failed). */
  gaps: number[] | null;
  /** ∂g/∂u at (or near) x, rows = targets; null when never computed. */
  jacobian: number[][] | null;
  iterations: number;
  evaluations: number;
  /** A trial or the start point did not converge and no progress was possible because of it. */
  failedEvaluation: boolean;
  /** Stopped by isCancelled. */
  cancelled: boolean;
}

export function isMet(g: number, sense: TargetSense, equalityTolerance: number): boolean {
  return sense === 'equal' ? Math.abs(g) <= equalityTolerance : g <= 1e-9;
}

/**
 * Points of the forward-difference Jacobian at x: x + h·scale_k·e_k (backward where the forward
 * step would cross the upper bound), one per variable, with the signed steps.
 */
export function differencePoints(p: GapProblemShape, x: number[], h: number): { points: number[][]; steps: number[] } {
  const points: number[][] = [];
  const steps: number[] = [];
  for (let k = 0; k < x.length; k++) {
    let step = h * p.scale[k];
    if (x[k] + step > p.upper[k]) step = -step;
    const xs = [...x];
    xs[k] += step;
    points.push(xs);
    steps.push(step);
  }
  return { points, steps };
}

/** ∂g/∂u from the gaps at the difference points (rows = targets); null if one is missing. */
export function jacobianFromDifferences(p: GapProblemShape, g: number[], gs: GapReply, steps: number[]): number[][] | null {
  if (gs.some((r) => !r)) return null;
  return g.map((gi, i) => steps.map((step, k) => ((gs[k]![i] - gi) / step) * p.scale[k]));
}

/**
 * ∂g/∂u (rows = targets, columns = variables, u = x / scale) by forward differences of size
 * h·scale (backward where the forward step would cross the upper bound); null if a solve failed.
 */
export function finiteDifferenceJacobian(
  p: GapProblem, x: number[], g: number[], h = 1e-3, evaluate: (x: number[]) => number[] | null = p.evaluate,
): number[][] | null {
  const { points, steps } = differencePoints(p, x, h);
  return jacobianFromDifferences(p, g, evaluateInTurn(points, evaluate), steps);
}

/** Evaluates the points one after another, stopping at the first failure (the rest undefined). */
export function evaluateInTurn(points: number[][], evaluate: (x: number[]) => number[] | null): GapReply {
  const out: GapReply = new Array(points.length).fill(undefined);
  for (let k = 0; k < points.length; k++) {
    out[k] = evaluate(points[k]);
    if (!out[k]) break;
  }
  return out;
}

/**
 * The method as a generator: it yields the points whose gaps it needs (one point, or one per
 * variable for the Jacobian, which may be evaluated together in any order) and takes their gaps
 * back, so a caller may evaluate them synchronously, asynchronously or on several threads.
 */
export function* leastSquaresSteps(p: GapProblemShape, options: LmOptions = {}): Generator<number[][], LmOutcome, GapReply> {
  const maxIt = options.maxIterations ?? 30;
  const margin = options.margin ?? 0.01;
  const eqTol = options.equalityTolerance ?? 1e-3;
  const h = options.fdStep ?? 1e-3;
  const n = p.x0.length;
  let evaluations = 0;
  const ask = function* (points: number[][]): Generator<number[][], GapReply, GapReply> {
    const reply = yield points;
    evaluations += reply.filter((r) => r !== undefined).length;
    return reply;
  };
  const residuals = (g: number[]) => g.map((gi, i) => (p.senses[i] === 'equal' ? gi : Math.max(0, gi + margin)));
  const cost = (g: number[]) => 0.5 * residuals(g).reduce((s, r) => s + r * r, 0);
  const allMet = (g: number[]) => g.every((gi, i) => isMet(gi, p.senses[i], eqTol));
  const clamp = (x: number[]) => x.map((v, k) => Math.min(p.upper[k], Math.max(p.lower[k], v)));

  let x = clamp(p.x0);
  let g = (yield* ask([x]))[0] ?? null;
  if (!g) return { x, gaps: null, jacobian: null, iterations: 0, evaluations, failedEvaluation: true, cancelled: false };
  p.accept?.(x);
  let cancelled = false;
  let jacobian: number[][] | null = null;
  let mu = 1e-3;
  let iterations = 0;
  let failedEvaluation = false;

  while (iterations < maxIt && !allMet(g)) {
    if (options.isCancelled?.()) { cancelled = true; break; }
    iterations++;
    const { points, steps } = differencePoints(p, x, h);
    const J = jacobianFromDifferences(p, g, yield* ask(points), steps);
    if (!J) { failedEvaluation = true; break; }
    jacobian = J;
    const r = residuals(g);
    const active = g.map((gi, i) => p.senses[i] === 'equal' || gi + margin > 0);
    const grad = new Array<number>(n).fill(0);
    const A = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    for (let i = 0; i < g.length; i++) {
      if (!active[i]) continue;
      for (let k = 0; k < n; k++) {
        grad[k] += J[i][k] * r[i];
        for (let l = 0; l < n; l++) A[k][l] += J[i][k] * J[i][l];
      }
    }
    const free = [...Array(n).keys()].filter((k) => !(
      (x[k] <= p.lower[k] && grad[k] > 0) || (x[k] >= p.upper[k] && grad[k] < 0)));
    if (free.length === 0) break;
    const c0 = cost(g);
    const maxDiag = Math.max(...free.map((k) => A[k][k]), 1e-12);
    let accepted = false;
    for (let attempt = 0; attempt < 10 && !accepted; attempt++) {
      const Af = free.map((k) => free.map((l) => A[k][l] + (k === l ? mu * maxDiag : 0)));
      let du: number[];
      try { du = solveDense(Af, free.map((k) => -grad[k])); } catch { mu *= 4; continue; }
      const xt = [...x];
      free.forEach((k, j) => { xt[k] += du[j] * p.scale[k]; });
      const xc = clamp(xt);
      if (xc.every((v, k) => v === x[k])) break;
      const gt = (yield* ask([xc]))[0] ?? null;
      if (gt && cost(gt) < c0) {
        x = xc; g = gt; accepted = true;
        mu = Math.max(mu / 3, 1e-9);
        p.accept?.(x);
      } else {
        if (!gt) failedEvaluation = true;
        mu *= 4;
      }
    }
    options.onIteration?.(iterations, x, cost(g));
    if (!accepted) break;
    failedEvaluation = false;
  }
  return { x, gaps: g, jacobian, iterations, evaluations, failedEvaluation, cancelled };
}

/** Runs a generator of evaluation requests to its end, answering each request with `answer`. */
export function runSteps<Req, Out, Rep>(steps: Generator<Req, Out, Rep>, answer: (request: Req) => Rep): Out {
  let next = steps.next();
  while (!next.done) next = steps.next(answer(next.value));
  return next.value;
}

/** The method with a synchronous evaluation (points evaluated one after another). */
export function solveBoundedLeastSquares(p: GapProblem, options: LmOptions = {}): LmOutcome {
  return runSteps(leastSquaresSteps(p, options), (points) => evaluateInTurn(points, p.evaluate));
}

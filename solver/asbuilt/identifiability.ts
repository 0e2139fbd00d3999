/**
 * Which lengths the measurements determine. With J the Jacobian of the normalised measurement
 * residuals with respect to the lengths in prior units (fit-lengths.ts), the Fisher information
 * is F = JᵀJ and the linearised posterior covariance (Gaussian prior of unit variance) is
 * C = (F + I)⁻¹ (e.g. Tarantola, Inverse Problem Theory, 2005, §3.2). A length counts as
 * identified when its posterior standard deviation √C_kk is at most half the prior one
 * (common-practice threshold); √F_kk is its raw sensitivity (0 = no reading sees it).
 */
import { solveDense } from '../tuning/dense-solve.ts';

export interface Identifiability {
  /** Posterior standard deviation per unknown, in prior units. */
  posteriorSigma: number[];
  sensitivity: number[];
  identified: boolean[];
}

export const IDENTIFIED_SIGMA_RATIO = 0.5;

export function identifiability(jacobian: readonly number[][], n: number): Identifiability {
  const A = Array.from({ length: n }, (_, k) => Array.from({ length: n }, (_, l) => {
    let s = k === l ? 1 : 0;
    for (const row of jacobian) s += row[k] * row[l];
    return s;
  }));
  const posteriorSigma = A.map((_, k) => {
    const e = new Array<number>(n).fill(0);
    e[k] = 1;
    return Math.sqrt(solveDense(A, e)[k]);
  });
  const sensitivity = A.map((row, k) => Math.sqrt(Math.max(0, row[k] - 1)));
  return { posteriorSigma, sensitivity, identified: posteriorSigma.map((s) => s <= IDENTIFIED_SIGMA_RATIO) };
}

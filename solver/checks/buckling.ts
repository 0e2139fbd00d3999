/**
 * Flexural buckling of steel members, EN 1993-1-1 §6.3.1 (read: formulas as quoted in the
 * steelcalculator.app EN 1993 column guide and the standard's §6.3.1.3 page):
 *   λ̄ = (L_cr / i) / λ1,  λ1 = π √(E / f_y)                                   (6.50)
 *   Φ = 0.5 [1 + α (λ̄ − 0.2) + λ̄²],  χ = 1 / (Φ + √(Φ² − λ̄²)) ≤ 1             (6.49)
 *   N_b,Rd = χ A f_y / γ_M1                                                    (6.47)
 * α from Table 6.1 (basis-defaults.ts). Units: lengths m, stresses Pa, forces N.
 */
import { IMPERFECTION_FACTOR } from './basis-defaults.ts';
import type { BucklingCurve } from '../project/types.ts';

/** λ1 = π √(E / f_y), dimensionless (93.9 for E = 210 GPa, f_y = 235 MPa). */
export function lambda1(E: number, fy: number): number {
  return Math.PI * Math.sqrt(E / fy);
}

/** Relative slenderness λ̄ = (L_cr / i) / λ1. */
export function relativeSlenderness(bucklingLength: number, radiusOfGyration: number, E: number, fy: number): number {
  return bucklingLength / radiusOfGyration / lambda1(E, fy);
}

/** Reduction factor χ(λ̄, α) of eq. (6.49), capped at 1. */
export function bucklingReduction(lambdaBar: number, alpha: number): number {
  const phi = 0.5 * (1 + alpha * (lambdaBar - 0.2) + lambdaBar * lambdaBar);
  const chi = 1 / (phi + Math.sqrt(phi * phi - lambdaBar * lambdaBar));
  return Math.min(1, chi);
}

/** χ for a named curve. */
export function bucklingReductionOfCurve(lambdaBar: number, curve: BucklingCurve): number {
  return bucklingReduction(lambdaBar, IMPERFECTION_FACTOR[curve]);
}

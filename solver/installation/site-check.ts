/**
 * Site checks: the tension implied by a measured cable frequency or a measured sag, and its
 * difference from the design (target) tension.
 *
 * - Frequency → tension inverts `cableFrequencies` (Irvine 1981, see cable-frequency.ts)
 *   numerically: the chosen mode frequency minus the measured one is scanned on a geometric grid
 *   of tensions and every sign change is refined by bracketed root finding. The in-plane
 *   symmetric frequency is not monotone in tension near the crossover (λ² ≈ 4π²), so several
 *   tensions can explain one reading; all are returned and the one nearest the target is chosen.
 * - Sag → tension inverts the inextensible catenary between two supports (Irvine 1981, ch. 1):
 *   with a = H/w, supports at (0, 0) and (ℓ, h), the curve is y = a[cosh((x − x0)/a) − cosh(x0/a)]
 *   with x0 = ℓ/2 − a·asinh(h / (2a sinh(ℓ/2a))). The sag is the largest vertical distance between
 *   chord and curve (where the slope equals h/ℓ: x* = x0 + a·asinh(h/ℓ)), matching the sag in
 *   the solver's MemberResult. H follows by bisection (sag decreases monotonically with H).
 *
 * Units: m, N, kg/m, Hz. Tension reported as the chord-direction tension T = H·√(1 + (h/ℓ)²)
 * (the tension at the point of largest sag, where the cable is parallel to the chord).
 */

import { findBracketedRoot, findRootsOnLogGrid } from './bracketed-root.ts';
import { OutcomeError } from '../results/outcome-error.ts';
import { modeFrequency, STANDARD_GRAVITY, type CableMode, type CableVibrationInput } from './cable-frequency.ts';

export interface SiteCheckResult {
  /** Tension implied by the measurement, N. */
  tension: number;
  /** tension − target, N (positive: the cable is tighter than designed). */
  difference: number;
  /** difference / target. */
  relativeDifference: number;
  /** Every tension that explains the reading (more than one near the in-plane crossover), N. */
  candidates: number[];
}

export interface FrequencyCheckInput extends Omit<CableVibrationInput, 'tension'> {
  /** Measured frequency, Hz. */
  measuredFrequency: number;
  /** Which mode was measured. Default 'tautString' (first out-of-plane / string mode). */
  mode?: CableMode;
  /** Design tension, N. */
  targetTension: number;
}

/**
 * Tension from a measured frequency (see the file comment). When no tension fits, throws an
 * OutcomeError `noTensionForFrequency` (quantities low, high: the tensions searched, N; frequency,
 * Hz; refs mode), worded at the edge in the display units.
 */
export function tensionFromFrequency(input: FrequencyCheckInput): SiteCheckResult {
  const mode = input.mode ?? 'tautString';
  if (!(input.measuredFrequency > 0)) throw new Error(`measured frequency must be positive, got ${input.measuredFrequency}`);
  if (!(input.targetTension > 0)) throw new Error(`target tension must be positive, got ${input.targetTension}`);
  const g = (t: number): number => modeFrequency({ ...input, tension: t }, mode) - input.measuredFrequency;
  // Grid from a nearly slack cable to the axial stiffness itself (strain 100 %): wide on purpose.
  const lo = Math.max(1e-9 * input.axialStiffness, 1e-6);
  const hi = input.axialStiffness;
  const candidates = findRootsOnLogGrid(g, lo, hi, 400);
  if (candidates.length === 0) {
    throw new OutcomeError(
      { code: 'noTensionForFrequency', quantities: { low: { value: lo, kind: 'force' }, high: { value: hi, kind: 'force' }, frequency: { value: input.measuredFrequency, kind: 'frequency' } }, refs: { mode } },
      `no tension between ${lo.toPrecision(3)} N and ${hi.toPrecision(3)} N gives ${input.measuredFrequency} Hz in mode '${mode}'`,
    );
  }
  return pick(candidates, input.targetTension);
}

export interface SagCheckInput {
  /** Horizontal distance between the supports, m (> 0). */
  horizontalSpan: number;
  /** Height of the second support above the first, m (any sign). */
  heightDifference: number;
  /** Mass per unit length, kg/m (> 0). */
  massPerLength: number;
  /** Measured largest vertical sag below the chord, m (> 0). */
  measuredSag: number;
  /** Design tension along the chord, N. */
  targetTension: number;
}

/** Largest vertical sag below the chord of an inextensible catenary with horizontal tension H, m. */
export function catenarySag(horizontalTension: number, weightPerLength: number, span: number, heightDifference: number): number {
  const a = horizontalTension / weightPerLength;
  const x0 = span / 2 - a * Math.asinh(heightDifference / (2 * a * Math.sinh(span / (2 * a))));
  const y = (x: number): number => a * (Math.cosh((x - x0) / a) - Math.cosh(x0 / a));
  const xs = x0 + a * Math.asinh(heightDifference / span);
  return (heightDifference / span) * xs - y(xs);
}

/** Tension from a measured sag (see the file comment). */
export function tensionFromSag(input: SagCheckInput): SiteCheckResult {
  const { horizontalSpan: l, heightDifference: h, measuredSag } = input;
  if (!(l > 0)) throw new Error(`horizontal span must be positive, got ${l}`);
  if (!(input.massPerLength > 0)) throw new Error(`mass per length must be positive, got ${input.massPerLength}`);
  if (!(measuredSag > 0)) throw new Error(`measured sag must be positive, got ${measuredSag}`);
  const w = input.massPerLength * STANDARD_GRAVITY;
  const parabolicH = (w * l * l) / (8 * measuredSag);
  // Bracket around the parabolic estimate; the catenary sag decreases with H.
  let lo = parabolicH / 4;
  let hi = parabolicH * 4;
  const f = (H: number): number => catenarySag(H, w, l, h) - measuredSag;
  for (let i = 0; i < 40 && f(lo) < 0; i++) lo /= 2;
  for (let i = 0; i < 40 && f(hi) > 0; i++) hi *= 2;
  const H = findBracketedRoot(f, lo, hi, { xTolerance: 1e-9 * parabolicH });
  const tension = H * Math.sqrt(1 + (h / l) ** 2);
  return pick([tension], input.targetTension);
}

function pick(candidates: number[], target: number): SiteCheckResult {
  let best = candidates[0];
  for (const c of candidates) if (Math.abs(c - target) < Math.abs(best - target)) best = c;
  return { tension: best, difference: best - target, relativeDifference: (best - target) / target, candidates };
}

/**
 * Natural frequencies of a single cable between fixed end points, with Irvine's sag correction.
 *
 * Source: H. M. Irvine, Cable Structures, MIT Press (1981), ch. 2 (flat cable) and ch. 4
 * (linear theory of free vibrations; inclined cables treated with the weight component normal
 * to the chord). Symbols:
 *   L      chord length between the end points, m
 *   θ      chord inclination to the horizontal
 *   T      cable tension along the chord (Irvine's H for a flat cable, H* = H secθ inclined), N
 *   m      mass per unit length, kg/m;   g = 9.80665 m/s²
 *   EA     axial stiffness, N
 *   d      mid-span sag normal to the chord, parabolic: d = m g cosθ L² / (8 T)
 *   Le     effective length  Le ≈ L (1 + 8 (d/L)²)
 *   λ²     Irvine's parameter  λ² = (m g L cosθ / T)² · L / (T Le / EA)
 *   ω̄     non-dimensional frequency  ω̄ = ω L / √(T/m)
 *
 * Modes (taut-string frequency f1 = (1/2L)·√(T/m)):
 * - out-of-plane swinging, n-th: ω̄ = nπ, unaffected by sag → f = n f1 (the lowest mode of all);
 * - in-plane antisymmetric, first: ω̄ = 2π, unaffected by sag → f = 2 f1;
 * - in-plane symmetric, first: root of tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³ in (π, 3π) → f = f1 ω̄/π.
 *   λ² → 0 gives the taut string (ω̄ = π); λ² = 4π² is the crossover where ω̄ = 2π and the
 *   symmetric mode equals the antisymmetric one; λ² → ∞ gives the inextensible limit ω̄ ≈ 2.86π.
 *
 * Conditions: linear theory of small vibrations about the static profile; sag-to-span d/L up to
 * about 1:8; uniform cable; fixed ends (no support motion); for inclined cables the flat-cable
 * result with m g cosθ is Irvine's approximation, valid while the sag is small (θ not near 90°
 * with a slack cable). Bending stiffness is ignored.
 */

import { findBracketedRoot } from './bracketed-root.ts';
import { STANDARD_GRAVITY } from '../model/constants.ts';

export { STANDARD_GRAVITY };

export interface CableVibrationInput {
  /** Chord length, m (> 0). */
  length: number;
  /** Chord inclination to the horizontal, radians (0 = flat, π/2 = vertical). */
  inclination: number;
  /** Tension along the chord, N (> 0). */
  tension: number;
  /** Mass per unit length, kg/m (> 0). */
  massPerLength: number;
  /** Axial stiffness E·A, N (> 0). */
  axialStiffness: number;
}

export interface CableFrequencies {
  /** Taut-string fundamental f1 = (1/2L)√(T/m), Hz (= first out-of-plane mode). */
  tautString: number;
  /** First in-plane symmetric mode with sag correction, Hz. */
  inPlaneSymmetric: number;
  /** First in-plane antisymmetric mode (2 f1), Hz. */
  inPlaneAntisymmetric: number;
  /** The lower of the two in-plane modes, Hz. */
  lowestInPlane: number;
  /** Irvine's λ², dimensionless. */
  lambdaSquared: number;
  /** Non-dimensional symmetric frequency ω̄ (π … 2.86π). */
  symmetricOmegaBar: number;
  /** Parabolic mid-span sag normal to the chord, m. */
  sag: number;
}

/** f1 = (1/2L)·√(T/m), Hz. */
export function tautStringFrequency(length: number, tension: number, massPerLength: number): number {
  return Math.sqrt(tension / massPerLength) / (2 * length);
}

/** Irvine's λ² (see the file comment), dimensionless. */
export function irvineLambdaSquared(c: CableVibrationInput): number {
  const w = c.massPerLength * STANDARD_GRAVITY * Math.cos(c.inclination);
  const sag = (w * c.length * c.length) / (8 * c.tension);
  const effectiveLength = c.length * (1 + 8 * (sag / c.length) ** 2);
  const load = (w * c.length) / c.tension;
  return (load * load * c.length) / ((c.tension * effectiveLength) / c.axialStiffness);
}

/**
 * ω̄ of the first symmetric in-plane mode for a given λ²: the root of
 * h(x) = tan x − x + (4/λ²) x³ with x = ω̄/2 in (π/2, 3π/2). h is strictly increasing there
 * (h' = tan²x + 12x²/λ² > 0) and runs from −∞ to +∞, so the root is unique.
 */
export function symmetricOmegaBar(lambdaSquared: number): number {
  if (!(lambdaSquared >= 0)) throw new Error(`λ² must be ≥ 0, got ${lambdaSquared}`);
  if (lambdaSquared < 1e-12) return Math.PI;
  const h = (x: number): number => Math.tan(x) - x + (4 / lambdaSquared) * x * x * x;
  const eps = 1e-13;
  const x = findBracketedRoot(h, Math.PI / 2 + eps, (3 * Math.PI) / 2 - eps, { xTolerance: 1e-14 });
  return 2 * x;
}

function checkInput(c: CableVibrationInput): void {
  const bad = (name: string, v: number): never => {
    throw new Error(`cable frequency: ${name} must be a positive number, got ${v}`);
  };
  if (!(c.length > 0)) bad('length', c.length);
  if (!(c.tension > 0)) bad('tension', c.tension);
  if (!(c.massPerLength > 0)) bad('mass per length', c.massPerLength);
  if (!(c.axialStiffness > 0)) bad('axial stiffness', c.axialStiffness);
  if (!Number.isFinite(c.inclination)) throw new Error(`cable frequency: inclination must be finite, got ${c.inclination}`);
}

/** Frequencies of the first modes (see the file comment for formulas and conditions). */
export function cableFrequencies(c: CableVibrationInput): CableFrequencies {
  checkInput(c);
  const f1 = tautStringFrequency(c.length, c.tension, c.massPerLength);
  const lambdaSquared = irvineLambdaSquared(c);
  const omegaBar = symmetricOmegaBar(lambdaSquared);
  const symmetric = (f1 * omegaBar) / Math.PI;
  const w = c.massPerLength * STANDARD_GRAVITY * Math.cos(c.inclination);
  return {
    tautString: f1,
    inPlaneSymmetric: symmetric,
    inPlaneAntisymmetric: 2 * f1,
    lowestInPlane: Math.min(symmetric, 2 * f1),
    lambdaSquared,
    symmetricOmegaBar: omegaBar,
    sag: (w * c.length * c.length) / (8 * c.tension),
  };
}

/** Which measured mode a site frequency belongs to. */
export type CableMode = 'tautString' | 'inPlaneSymmetric' | 'inPlaneAntisymmetric' | 'lowestInPlane';

export function modeFrequency(c: CableVibrationInput, mode: CableMode): number {
  return cableFrequencies(c)[mode];
}

/**
 * Per-member approximation of the tension change with temperature, for a cable between fixed
 * (immovable) end points. Used only as a cross-check and for quick estimates: the installation
 * table itself comes from full nonlinear solves (temperature-table.ts), because on a guyed mast the
 * ends move (mast sway, other guys) and this approximation ignores that.
 *
 * Compatibility of lengths (parabolic sag, small sag-to-span; Irvine, Cable Structures 1981, ch. 1):
 *   arc length at tension T:   s(T) = Lc + (w⊥)² Lc³ / (24 T²),   w⊥ = m g cosθ
 *   elastic and thermal length: s(T) = L0 (1 + α ΔT) (1 + T / EA)   (engineering strain on L0;
 *   the solver's Green–Lagrange law differs at second order in the strain, < 0.1 % here)
 * solved for T by bracketed root finding. With m = 0 (weightless, straight) this reduces to the
 * closed form T = EA (Lc / (L0 (1 + αΔT)) − 1) ≈ T0 − EA α ΔT (until slack, T = 0).
 */
import { findBracketedRoot } from './bracketed-root.ts';
import { STANDARD_GRAVITY } from './cable-frequency.ts';

export interface FixedEndCable {
  /** Chord length between the (fixed) ends, m. */
  chord: number;
  /** Chord inclination to the horizontal, radians. */
  inclination: number;
  /** Unstressed length at the reference temperature, m. */
  unstressedLength: number;
  /** E·A, N. */
  axialStiffness: number;
  /** Mass per unit length, kg/m (0 allowed). */
  massPerLength: number;
  /** Thermal expansion coefficient, 1/K. */
  thermalExpansion: number;
}

/** Tension (N, along the chord) at ΔT (K) from the reference temperature; 0 when slack. */
export function fixedEndTension(c: FixedEndCable, deltaT: number): number {
  const l0 = c.unstressedLength * (1 + c.thermalExpansion * deltaT);
  if (c.massPerLength === 0) return Math.max(0, c.axialStiffness * (c.chord / l0 - 1));
  const w = c.massPerLength * STANDARD_GRAVITY * Math.cos(c.inclination);
  const f = (t: number): number => c.chord + (w * w * c.chord ** 3) / (24 * t * t) - l0 * (1 + t / c.axialStiffness);
  // f decreases in T from +∞ (T → 0) to −∞; bracket upward from a tiny tension.
  const lo = 1e-6 * Math.max(1, w * c.chord);
  let hi = Math.max(1, c.axialStiffness * 1e-3);
  for (let i = 0; i < 60 && f(hi) > 0; i++) hi *= 2;
  return findBracketedRoot(f, lo, hi, { xTolerance: 1e-10 * hi });
}

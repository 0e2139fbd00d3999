import { describe, expect, it } from 'vitest';
import {
  cableFrequencies,
  irvineLambdaSquared,
  symmetricOmegaBar,
  tautStringFrequency,
  STANDARD_GRAVITY,
} from '../../../solver/installation/cable-frequency.ts';
import { findBracketedRoot, findRootsOnLogGrid } from '../../../solver/installation/bracketed-root.ts';

describe('bracketed root finding', () => {
  it('finds √2 as the root of x² − 2 (closed form)', () => {
    expect(findBracketedRoot((x) => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 12);
  });
  it('refuses a bracket without a sign change', () => {
    expect(() => findBracketedRoot((x) => x * x + 1, -1, 1)).toThrow(/no sign change/);
  });
  it('finds every root of sin on a log grid (roots nπ)', () => {
    const roots = findRootsOnLogGrid(Math.sin, 1, 10, 100);
    expect(roots.length).toBe(3);
    roots.forEach((r, i) => expect(r).toBeCloseTo((i + 1) * Math.PI, 10));
  });
});

describe('taut-string and Irvine sag-corrected cable frequencies', () => {
  it('taut string f1 = (1/2L)√(T/m)', () => {
    // Taut-string fundamental (Irvine, Cable Structures, 1981, ch. 4): L = 50 m, T = 10 kN, m = 1 kg/m → 1 Hz.
    expect(tautStringFrequency(50, 10_000, 1)).toBeCloseTo(1, 12);
    // Doubling the tension raises f by √2 (same formula).
    expect(tautStringFrequency(50, 20_000, 1) / tautStringFrequency(50, 10_000, 1)).toBeCloseTo(Math.SQRT2, 12);
  });

  it('λ² → 0 gives the taut string: ω̄ = π (Irvine 1981, ch. 4)', () => {
    expect(symmetricOmegaBar(0)).toBe(Math.PI);
    expect(symmetricOmegaBar(1e-6)).toBeCloseTo(Math.PI, 5);
    // A very stiff, very taut cable: symmetric mode ≈ f1.
    const f = cableFrequencies({ length: 10, inclination: 0, tension: 1e6, massPerLength: 0.5, axialStiffness: 1e7 });
    expect(f.lambdaSquared).toBeLessThan(1e-6);
    expect(f.inPlaneSymmetric / f.tautString).toBeCloseTo(1, 6);
  });

  it('λ² = 4π² is the crossover: ω̄ = 2π, symmetric = antisymmetric (Irvine 1981, ch. 4)', () => {
    expect(symmetricOmegaBar(4 * Math.PI * Math.PI)).toBeCloseTo(2 * Math.PI, 10);
    // Below the crossover the symmetric mode is the lower in-plane mode, above it the antisymmetric one.
    expect(symmetricOmegaBar(0.9 * 4 * Math.PI ** 2)).toBeLessThan(2 * Math.PI);
    expect(symmetricOmegaBar(1.1 * 4 * Math.PI ** 2)).toBeGreaterThan(2 * Math.PI);
  });

  it('λ² → ∞ gives the inextensible limit tan(ω̄/2) = ω̄/2, ω̄/2 ≈ 4.4934 (Irvine 1981, ch. 4)', () => {
    // 4.4934094579 is the first positive root of tan x = x (recalled value; also checked as a root below).
    const x = symmetricOmegaBar(1e12) / 2;
    expect(x).toBeCloseTo(4.4934094579, 6);
    expect(Math.tan(x) - x).toBeCloseTo(0, 4);
  });

  it('ω̄ rises monotonically with λ² (h strictly increasing, see the proof in the doc comment)', () => {
    let prev = Math.PI;
    for (const l2 of [0.1, 1, 10, 39.48, 100, 1000, 1e4]) {
      const w = symmetricOmegaBar(l2);
      expect(w).toBeGreaterThan(prev);
      expect(Math.tan(w / 2) - w / 2 + (4 / l2) * (w / 2) ** 3).toBeCloseTo(0, 6);
      prev = w;
    }
  });

  it('λ² matches its definition for a flat cable (Irvine 1981, eq. for λ²)', () => {
    const c = { length: 100, inclination: 0, tension: 20_000, massPerLength: 2, axialStiffness: 5e7 };
    const w = 2 * STANDARD_GRAVITY;
    const d = (w * 100 * 100) / (8 * 20_000);
    const le = 100 * (1 + 8 * (d / 100) ** 2);
    const expected = ((w * 100) / 20_000) ** 2 * (100 / ((20_000 * le) / 5e7));
    expect(irvineLambdaSquared(c)).toBeCloseTo(expected, 10);
    // Inclining the chord scales the normal weight by cosθ: λ² by cos²θ (leading order).
    const inclined = irvineLambdaSquared({ ...c, inclination: Math.PI / 3 });
    expect(inclined / irvineLambdaSquared(c)).toBeCloseTo(0.25, 2);
  });

  it('the antisymmetric mode is 2 f1 regardless of sag and the lowest in-plane mode is the smaller', () => {
    const c = { length: 80, inclination: 0.3, tension: 8_000, massPerLength: 3, axialStiffness: 8e7 };
    const f = cableFrequencies(c);
    expect(f.inPlaneAntisymmetric).toBeCloseTo(2 * f.tautString, 12);
    expect(f.lowestInPlane).toBe(Math.min(f.inPlaneSymmetric, f.inPlaneAntisymmetric));
  });

  it('rejects non-physical input with a message naming the entry', () => {
    expect(() => cableFrequencies({ length: 10, inclination: 0, tension: -1, massPerLength: 1, axialStiffness: 1e6 })).toThrow(/tension/);
    expect(() => cableFrequencies({ length: 10, inclination: 0, tension: 1, massPerLength: 0, axialStiffness: 1e6 })).toThrow(/mass per length/);
  });
});

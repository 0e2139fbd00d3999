import { describe, expect, it } from 'vitest';
import { cableFrequencies, STANDARD_GRAVITY } from '../../../solver/installation/cable-frequency.ts';
import { catenarySag, tensionFromFrequency, tensionFromSag } from '../../../solver/installation/site-check.ts';

const cable = { length: 60, inclination: 0.5, massPerLength: 1.8, axialStiffness: 1.6e8 };

describe('tension from a measured frequency', () => {
  it('inverts the taut-string frequency: T = m (2 L f)² (Irvine 1981, ch. 4, taut string)', () => {
    const r = tensionFromFrequency({ ...cable, measuredFrequency: 1.5, targetTension: 30_000 });
    expect(r.tension).toBeCloseTo(1.8 * (2 * 60 * 1.5) ** 2, 3);
    expect(r.difference).toBeCloseTo(r.tension - 30_000, 6);
  });

  it('round-trips the sag-corrected symmetric mode, picking the root nearest the target', () => {
    for (const T of [2_000, 8_000, 40_000]) {
      const f = cableFrequencies({ ...cable, tension: T }).inPlaneSymmetric;
      const r = tensionFromFrequency({ ...cable, measuredFrequency: f, mode: 'inPlaneSymmetric', targetTension: T });
      expect(r.tension / T).toBeCloseTo(1, 6);
      expect(r.candidates.length).toBeGreaterThanOrEqual(1);
    }
  });

  it('says plainly when no tension fits', () => {
    expect(() => tensionFromFrequency({ ...cable, measuredFrequency: 1e6, targetTension: 1e4 })).toThrow(/no tension/);
  });
});

describe('tension from a measured sag (catenary)', () => {
  it('level supports: sag = a (cosh(ℓ/2a) − 1) (Irvine 1981, ch. 1, catenary)', () => {
    const H = 5_000, w = 20, l = 100, a = H / w;
    expect(catenarySag(H, w, l, 0)).toBeCloseTo(a * (Math.cosh(l / (2 * a)) - 1), 9);
  });

  it('small sag approaches the parabola d = w secθ ℓ²/(8H) (Irvine 1981, ch. 1, inclined chord)', () => {
    const H = 200_000, w = 15, l = 80, h = 30;
    const secTheta = Math.sqrt(1 + (h / l) ** 2);
    expect(catenarySag(H, w, l, h) / ((w * secTheta * l * l) / (8 * H))).toBeCloseTo(1, 3);
  });

  it('round-trips H through the measured sag, inclined chord', () => {
    const H = 12_000, m = 2.5, l = 70, h = 40;
    const d = catenarySag(H, m * STANDARD_GRAVITY, l, h);
    const r = tensionFromSag({ horizontalSpan: l, heightDifference: h, massPerLength: m, measuredSag: d, targetTension: 15_000 });
    expect(r.tension).toBeCloseTo(H * Math.sqrt(1 + (h / l) ** 2), 4);
  });

  it('rejects a non-positive sag', () => {
    expect(() => tensionFromSag({ horizontalSpan: 10, heightDifference: 0, massPerLength: 1, measuredSag: 0, targetTension: 1 })).toThrow(/sag/);
  });
});

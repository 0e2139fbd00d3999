import { describe, expect, it } from 'vitest';
import { dynamicPressure, powerLawRatio, windSpeedAt } from '../../../solver/loads/wind-profile.ts';

describe('wind profile', () => {
  it('power law V10 (z/10)^α: exponent 1/2 doubles the speed at 40 m', () => {
    // Power law V(z) = V10 (z/10)^α; (40/10)^0.5 = 2 by hand.
    expect(windSpeedAt(40, 25, { kind: 'power', exponent: 0.5 })).toBeCloseTo(50, 10);
    expect(windSpeedAt(10, 25, { kind: 'power', exponent: 0.16 })).toBeCloseTo(25, 12);
  });

  it('log law V10 ln(z/z0)/ln(10/z0): z = z0 (10/z0)² doubles the speed', () => {
    // ln(z/z0) = 2 ln(10/z0) at z = 0.05 · 200² = 2000 m (hand algebra).
    expect(windSpeedAt(2000, 20, { kind: 'log', roughnessLength: 0.05 })).toBeCloseTo(40, 9);
    expect(windSpeedAt(10, 20, { kind: 'log', roughnessLength: 0.3 })).toBeCloseTo(20, 12);
  });

  it('holds the speed below the 2 m cut-off and at or below ground', () => {
    const p = { kind: 'power' as const, exponent: 0.2 };
    expect(windSpeedAt(0.5, 30, p)).toBe(windSpeedAt(2, 30, p));
    expect(windSpeedAt(-3, 30, p)).toBe(windSpeedAt(2, 30, p));
    expect(windSpeedAt(-3, 30, { kind: 'log', roughnessLength: 0.05 })).toBeGreaterThan(0);
    expect(windSpeedAt(3, 30, p)).toBeGreaterThan(windSpeedAt(2, 30, p));
  });

  it('uniform profile and default (power 1/7)', () => {
    expect(windSpeedAt(123, 17, { kind: 'uniform' })).toBe(17);
    // 1/7 power law: (1280/10)^(1/7) = 128^(1/7) = 2 exactly.
    expect(windSpeedAt(1280, 17, undefined)).toBeCloseTo(34, 10);
  });

  it('dynamic pressure q = ½ρV²', () => {
    // ½ · 1.225 · 40² = 980 Pa (hand arithmetic).
    expect(dynamicPressure(1.225, 40)).toBeCloseTo(980, 10);
  });

  it('the power-law ratio exp(α ln(z/10)) agrees with Math.pow((z/10), α) to a few units in the last place', () => {
    // Reference: the JavaScript engine's own Math.pow.
    for (const alpha of [0.1, 1 / 7, 0.16, 0.22, 0.4]) {
      for (let z = 2; z <= 400; z *= 1.37) {
        const want = Math.pow(z / 10, alpha);
        expect(Math.abs(powerLawRatio(z, alpha) - want)).toBeLessThanOrEqual(4 * Number.EPSILON * want);
      }
    }
  });
});

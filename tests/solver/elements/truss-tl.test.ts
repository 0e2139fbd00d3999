/**
 * The element tangent is the derivative of the element's internal force (central finite
 * differences, step 1e-6 of the length) — common practice for verifying consistent tangents.
 */
import { describe, expect, it } from 'vitest';
import { evaluateTrussTL, OUT_N, OUT_SIZE, OUT_STATE, ELEMENT_SLACK } from '../../../solver/elements/truss/truss-tl.ts';

function fdCheck(d: [number, number, number], Lr: number, S0: number, thermal: number, tensionOnly: boolean) {
  const E = 160e9, A = 1.5e-4;
  const out = new Float64Array(OUT_SIZE), k = new Float64Array(9), fp = new Float64Array(OUT_SIZE), fm = new Float64Array(OUT_SIZE);
  evaluateTrussTL(d[0], d[1], d[2], Lr, S0, E, A, thermal, tensionOnly, 0, out, k, 0);
  const h = 1e-6 * Lr;
  let worst = 0, scale = 0;
  for (let j = 0; j < 3; j++) {
    const dp = [...d], dm = [...d];
    dp[j] += h; dm[j] -= h;
    evaluateTrussTL(dp[0], dp[1], dp[2], Lr, S0, E, A, thermal, tensionOnly, 0, fp, null, 0);
    evaluateTrussTL(dm[0], dm[1], dm[2], Lr, S0, E, A, thermal, tensionOnly, 0, fm, null, 0);
    for (let i = 0; i < 3; i++) {
      const fd = (fp[i] - fm[i]) / (2 * h);
      worst = Math.max(worst, Math.abs(fd - k[3 * i + j]));
      scale = Math.max(scale, Math.abs(k[3 * i + j]));
    }
  }
  return { out, worst, scale };
}

describe('TL truss element', () => {
  it('tangent matches finite differences of the internal force (stretched, inclined)', () => {
    const { worst, scale } = fdCheck([3.001, -1.2, 4.0], 5, 2e8, 0, true);
    expect(worst / scale).toBeLessThan(1e-6);
  });

  it('tangent matches finite differences for a compressed bar with initial stress and temperature', () => {
    const { worst, scale, out } = fdCheck([2.99, 0.5, -1.0], 3.2, -1e7, 1e-4, false);
    expect(out[OUT_N]).toBeLessThan(0);
    expect(worst / scale).toBeLessThan(1e-6);
  });

  it('a compressed cable is slack: no force and no stiffness', () => {
    const { out, scale } = fdCheck([2.9, 0, 0], 3, 0, 0, true);
    expect(out[OUT_STATE]).toBe(ELEMENT_SLACK);
    expect(out[OUT_N]).toBe(0);
    expect(scale).toBe(0);
  });

  it('axial force is N = A S l / Lr with S = S0 + E ε (Green–Lagrange)', () => {
    // Closed form for a bar stretched from Lr = 2 m to l = 2.002 m.
    const out = new Float64Array(OUT_SIZE);
    evaluateTrussTL(2.002, 0, 0, 2, 1e8, 160e9, 1e-4, 0, false, 0, out, null, 0);
    const eps = (2.002 ** 2 - 4) / (2 * 4);
    expect(out[OUT_N]).toBeCloseTo((1e-4 * (1e8 + 160e9 * eps) * 2.002) / 2, 6);
  });
});

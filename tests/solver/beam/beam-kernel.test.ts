/**
 * The beam element's internal force is the gradient of its energy, and its tangent the derivative
 * of its internal force: central finite differences (step 1e-6) at large, general states, with
 * and without end releases — common practice for verifying consistent tangents. Plus the linear
 * limits at the undeformed state against the textbook Euler–Bernoulli stiffness 12EI/L³, 4EI/L
 * and the consistent geometric stiffness 6N/(5L), 4NL/30 (e.g. Przemieniecki, Theory of Matrix
 * Structural Analysis, 1968, ch. 15).
 */
import { describe, expect, it } from 'vitest';
import { evaluateBeam } from '../../../solver/elements/beam/beam-kernel.ts';
import { RELEASE_AY, RELEASE_BZ, RELEASE_BX, RELEASE_A_ALL, type BeamConstants } from '../../../solver/elements/beam/beam-energy.ts';

const VAR = [[0, -1], [1, -1], [2, -1], [3, 1], [4, 1], [5, 1], [0, 1], [1, 1], [2, 1], [6, 1], [7, 1], [8, 1]];

function constants(releases: number, frame = [1, 0, 0, 0, 1, 0, 0, 0, 1]): BeamConstants {
  return { frame: new Float64Array(frame), start: new Float64Array([2 * frame[0], 2 * frame[1], 2 * frame[2]]), Lr: 2, S0: -3e6, E: 2e11, A: 1e-3, thermalStrain: 1e-4, EIy: 2e5, EIz: 4e5, GJ: 2.4e5, releases };
}

function check(c: BeamConstants, x: Float64Array) {
  const f = new Float64Array(12), K = new Float64Array(144), fp = new Float64Array(12), fm = new Float64Array(12);
  evaluateBeam(c, x, f, K);
  const h = 1e-6;
  let gradErr = 0, gradScale = 0, kErr = 0, kScale = 0, asym = 0;
  for (let q = 0; q < 12; q++) {
    const [v, s] = VAR[q];
    const xp = x.slice(), xm = x.slice();
    xp[v] += s * h; xm[v] -= s * h;
    const ep = evaluateBeam(c, xp, fp, null), em = evaluateBeam(c, xm, fm, null);
    gradErr = Math.max(gradErr, Math.abs((ep - em) / (2 * h) - f[q]));
    gradScale = Math.max(gradScale, Math.abs(f[q]));
    for (let p = 0; p < 12; p++) {
      kErr = Math.max(kErr, Math.abs((fp[p] - fm[p]) / (2 * h) - K[12 * p + q]));
      kScale = Math.max(kScale, Math.abs(K[12 * p + q]));
      asym = Math.max(asym, Math.abs(K[12 * p + q] - K[12 * q + p]));
    }
  }
  return { gradErr: gradErr / gradScale, kErr: kErr / kScale, asym: asym / kScale };
}

describe('co-rotational beam kernel', () => {
  const states: [string, number[]][] = [
    ['moderate rotations', [2.01, 0.1, -0.05, 0.2, -0.3, 0.1, 0.05, 0.25, -0.2]],
    ['large rigid rotation (2 rad) plus deformation', [0.3, 1.2, 1.55, 1.1, -1.3, 0.9, 1.0, -1.2, 1.05]],
    ['near the undeformed state (series branches)', [2 + 1e-5, 1e-4, -2e-4, 1e-5, -3e-5, 2e-5, -1e-5, 2e-5, 1e-5]],
  ];
  it.each(states)('gradient and tangent match finite differences: %s', (_, d) => {
    const x = [d[0] - 2, ...d.slice(1)]; // variables: u_b − u_a from the start vector (2, 0, 0), θ_a, θ_b
    for (const rel of [0, RELEASE_AY | RELEASE_BZ, RELEASE_BX, RELEASE_A_ALL]) {
      const r = check(constants(rel), new Float64Array(x));
      expect(r.gradErr).toBeLessThan(1e-6);
      expect(r.kErr).toBeLessThan(1e-6);
      expect(r.asym).toBeLessThan(1e-12);
    }
  });

  it('undeformed: Euler–Bernoulli stiffness plus the consistent geometric stiffness', () => {
    const c = constants(0);
    c.thermalStrain = 0;
    const f = new Float64Array(12), K = new Float64Array(144);
    evaluateBeam(c, new Float64Array(9), f, K);
    const N = c.S0 * c.A, L = 2;
    expect(f[6]).toBeCloseTo(N, 6); // axial force on node b
    expect(K[12 * 1 + 1]).toBeCloseTo((12 * c.EIz) / L ** 3 + (6 * N) / (5 * L), 4); // v_a, v_a
    expect(K[12 * 2 + 2]).toBeCloseTo((12 * c.EIy) / L ** 3 + (6 * N) / (5 * L), 4); // w_a, w_a
    expect(K[12 * 4 + 4]).toBeCloseTo((4 * c.EIy) / L + (4 * N * L) / 30, 4); // θy_a
    expect(K[12 * 4 + 10]).toBeCloseTo((2 * c.EIy) / L - (N * L) / 30, 4); // θy_a, θy_b
    expect(K[12 * 3 + 3]).toBeCloseTo(c.GJ / L, 6); // torsion
    expect(K[0]).toBeCloseTo((c.E * c.A + N) / L, 0); // TL bar: (EA + N)/L
  });

  it('is independent of how the element is oriented (a rotated frame gives the rotated forces)', () => {
    const a = new Float64Array(12), b = new Float64Array(12);
    const x = new Float64Array([0.01, 0.02, -0.03, 0.01, 0.02, -0.01, 0.03, -0.02, 0.01]);
    evaluateBeam(constants(0), x, a, null);
    // Rotate everything 90° about z: (x, y, z) → (−y, x, z).
    const rot = (v: ArrayLike<number>) => [-v[1], v[0], v[2]];
    const xr = new Float64Array([...rot(x.subarray(0, 3)), ...rot(x.subarray(3, 6)), ...rot(x.subarray(6, 9))]);
    evaluateBeam(constants(0, [0, 1, 0, -1, 0, 0, 0, 0, 1]), xr, b, null);
    for (let p = 0; p < 12; p += 3) expect(Array.from(b.subarray(p, p + 3)).map((v) => v / 1e3)).toEqual(rot(a.subarray(p, p + 3)).map((v) => expect.closeTo(v / 1e3, 6)));
  });
});

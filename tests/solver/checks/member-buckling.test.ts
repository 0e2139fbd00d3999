// Flexural buckling of bars (EN 1993-1-1 §6.3.1) and the beam-column interaction, checked by hand.
// Source of the formulas: EN 1993-1-1 §6.3.1.2 eq. (6.49) and §6.3.1.3 eq. (6.50), imperfection
// factors Table 6.1 (read as quoted in public summaries; see solver/checks/basis-defaults.ts).
import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { beamColumnInteraction, bucklingReductionOfCurve, IMPERFECTION_FACTOR, lambda1, runChecks, solveProject } from '../../../solver/index.ts';

/** The standard's formula written out again, independently of the solver code. */
function chiByFormula(lb: number, alpha: number): number {
  const phi = 0.5 * (1 + alpha * (lb - 0.2) + lb ** 2);
  return Math.min(1, 1 / (phi + Math.sqrt(phi ** 2 - lb ** 2)));
}

describe('buckling reduction factor χ', () => {
  it('α of the five curves is EN 1993-1-1 Table 6.1', () => {
    expect(IMPERFECTION_FACTOR).toEqual({ a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 });
  });

  it.each(['a0', 'a', 'b', 'c', 'd'] as const)('curve %s at λ̄ = 0.2 … 3.0 follows eq. (6.49)', (curve) => {
    for (const lb of [0.1, 0.2, 0.5, 1.0, 1.5, 2.0, 3.0]) {
      expect(bucklingReductionOfCurve(lb, curve)).toBeCloseTo(chiByFormula(lb, IMPERFECTION_FACTOR[curve]), 14);
    }
    // The plateau: χ = 1 up to λ̄ = 0.2.
    expect(bucklingReductionOfCurve(0.2, curve)).toBe(1);
  });

  it('curve b at λ̄ = 1.0: Φ = 0.5(1 + 0.34·0.8 + 1) = 1.136, χ = 1/(1.136 + √(1.136² − 1)) = 0.5970 (hand arithmetic)', () => {
    expect(bucklingReductionOfCurve(1.0, 'b')).toBeCloseTo(1 / (1.136 + Math.sqrt(1.136 ** 2 - 1)), 12);
    expect(bucklingReductionOfCurve(1.0, 'b')).toBeCloseTo(0.597, 3);
  });

  it('λ1 = π√(E/f_y) = 93.9 for E = 210 GPa, f_y = 235 MPa (EN 1993-1-1 §6.3.1.3)', () => {
    expect(lambda1(210e9, 235e6)).toBeCloseTo(93.9, 1);
  });
});

describe('a pinned column in the model, checked by hand', () => {
  // Solid round 30 mm, S355 (f_y = 355 MPa), E = 210 GPa, L = 1.25 m, curve c (solid section).
  // Hand: A = π·0.03²/4 = 7.0686e-4 m², i = d/4 = 7.5 mm, λ = 1.25/0.0075 = 166.67,
  // λ1 = π√(210e9/355e6) = 76.409, λ̄ = 2.1812, Φ = 0.5(1 + 0.49·1.9812 + 2.1812²) = 3.3643,
  // χ = 1/(3.3643 + √(3.3643² − 2.1812²)) = 0.16876, N_b,Rd = χ A f_y / γ_M1 = 42.35 kN (γ_M1 = 1.0).
  const column = (P: number, factor?: number): ProjectFile => ({
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'B', at: [0, 0, 0], fixed: 'xyz' }, { id: 'T', at: [0, 0, 1.25], fixed: 'xy' }],
    sections: [{ id: 'rod', E: 210e9, area: Math.PI * 0.03 ** 2 / 4, diameter: 0.03, yieldStrength: 355e6, shape: 'solidRound' }],
    members: [{ id: 'C', kind: 'bar', from: 'B', to: 'T', section: 'rod', groups: ['legs'] }],
    loadCases: [{ id: 'P', selfWeight: false, nodalLoads: [{ node: 'T', force: [0, 0, -P] }], purpose: 'ultimate' }],
    designBasis: { format: 'limitState' },
    checks: factor ? { memberDesign: [{ group: 'legs', role: 'leg', bucklingLengthFactor: factor }] } : { memberDesign: [{ group: 'legs', role: 'leg' }] },
  });

  it('N_Ed / N_b,Rd with χ = 0.16876 and the slenderness limit 120 of a leg (EN 1993-3-1 Annex H.2)', () => {
    const p = column(30e3);
    const r = runChecks(p, solveProject(p).report);
    const b = r.results.find((x) => x.code === 'barBuckling')!;
    expect(b.detail!.chi).toBeCloseTo(0.16876, 4);
    expect(b.detail!.lambdaBar).toBeCloseTo(2.1812, 4);
    expect(b.limit).toBeCloseTo(42347, -1);
    expect(b.ratio).toBeCloseTo(30e3 / 42346.8, 3);
    expect(b.pass).toBe(true);
    const s = r.results.find((x) => x.code === 'slenderness')!;
    expect([s.value, s.limit, s.pass]).toEqual([expect.closeTo(166.67, 2), 120, false]);
    expect(s.source).toMatch(/EN 1993-3-1:2006 Annex H.2\(1\)/);
  });

  it('a buckling length factor of 0.5 raises χ: λ̄ = 1.0906, χ(c) by the formula', () => {
    const p = column(50e3, 0.5);
    const r = runChecks(p, solveProject(p).report);
    const b = r.results.find((x) => x.code === 'barBuckling')!;
    const chi = chiByFormula(2.1812397630338434 / 2, 0.49);
    expect(b.detail!.chi).toBeCloseTo(chi, 10);
    expect(b.ratio).toBeCloseTo(50e3 / (chi * (Math.PI * 0.03 ** 2 / 4) * 355e6), 6);
  });

  it('tension: N_t,Rd = A f_y / γ_M0 = 250.9 kN', () => {
    const p = column(-100e3);
    const r = runChecks(p, solveProject(p).report);
    const t = r.results.find((x) => x.code === 'barTension')!;
    expect(t.limit).toBeCloseTo(7.0686e-4 * 355e6, -2);
    expect(t.ratio).toBeCloseTo(100e3 / (Math.PI * 0.03 ** 2 / 4 * 355e6), 9);
  });
});

describe('beam-column interaction (linear, conservative)', () => {
  it('N/N_b,Rd + M_y/M_y,Rd + M_z/M_z,Rd by hand: 20/80 + 3/10 + 1/5 = 0.75', () => {
    const r = beamColumnInteraction({ axial: -20e3, momentsY: [1e3, -3e3], momentsZ: [0.5e3, 1e3] }, { tension: 200e3, compression: 80e3, momentY: 10e3, momentZ: 5e3 });
    expect(r.axialShare).toBeCloseTo(0.25, 14);
    expect(r.bendingShareY).toBeCloseTo(0.3, 14);
    expect(r.bendingShareZ).toBeCloseTo(0.2, 14);
    expect(r.ratio).toBeCloseTo(0.75, 14);
  });

  it('tension uses N_t,Rd: 50/200 + 0 + 0 = 0.25', () => {
    expect(beamColumnInteraction({ axial: 50e3, momentsY: [], momentsZ: [] }, { tension: 200e3, compression: 80e3, momentY: 1, momentZ: 1 }).ratio).toBeCloseTo(0.25, 14);
  });
});

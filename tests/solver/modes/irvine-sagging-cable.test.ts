import { describe, expect, it } from 'vitest';
import { solveModes, STANDARD_GRAVITY } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

/**
 * In-plane modes of a shallow sagging cable between supports at one level (Irvine, Cable
 * Structures, 1981, ch. 3; Irvine & Caughey, Proc. R. Soc. Lond. A 341, 1974):
 *   antisymmetric:  ω̄ = 2nπ;   out of plane: ω̄ = nπ;
 *   symmetric:      tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³,
 * with ω̄ = ω L / √(H/m), λ² = (mgL/H)² · L / (H L_e / EA), L_e ≈ L (1 + 8 (d/L)²). At λ² = 4π² the
 * first symmetric and antisymmetric in-plane frequencies cross over. The roots are recomputed
 * here by bisection from the equation, with λ² taken from the solved static state (H, sag).
 */
const L = 100, SAG = 1, MASS = 1.0, SEGMENTS = 120;

function cable(EA: number): ProjectFile {
  const H0 = (MASS * STANDARD_GRAVITY * L * L) / (8 * SAG);
  const arc = L * (1 + (8 / 3) * (SAG / L) ** 2);
  return {
    format: 'stayset-project', version: 1,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [L, 0, 0], fixed: 'xyz' }],
    sections: [{ id: 'rope', E: EA, area: 1, massPerLength: MASS }],
    members: [{ id: 'C', kind: 'cable', from: 'A', to: 'B', section: 'rope', segments: SEGMENTS, unstressedLength: arc / (1 + H0 / EA) }],
    loadCases: [{ id: 'dead' }],
  };
}

/** First root ω̄ of the symmetric-mode equation, in (π, 3π) (monotone there, see the file note). */
function symmetricRoot(lambda2: number): number {
  const f = (x: number) => Math.tan(x) - x + (4 / lambda2) * x ** 3; // x = ω̄/2 ∈ (π/2, 3π/2)
  let lo = Math.PI / 2 + 1e-12, hi = (3 * Math.PI) / 2 - 1e-12;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) < 0) lo = mid; else hi = mid;
  }
  return lo + hi;
}

interface Classified { omegaBar: number; inPlane: boolean; symmetric: boolean }

function classifiedModes(EA: number) {
  const { caseResult, modal } = solveModes(cable(EA), 'dead', { count: 8 });
  if (!caseResult?.converged || !modal.ok) throw new Error('not solved');
  const H = Math.abs(caseResult.reactions[0].force[0]);
  const d = caseResult.members[0].sag;
  const m = (MASS * cable(EA).members[0].unstressedLength!) / L; // mass per span length
  const Le = L * (1 + 8 * (d / L) ** 2);
  const lambda2 = ((m * STANDARD_GRAVITY * L) / H) ** 2 * (L / ((H * Le) / EA));
  return { lambda2, modes: modal.analysis.modes.map((mode, k): Classified => {
    const phi = modal.fields.shapes[k];
    let y2 = 0, xz2 = 0, sym = 0, anti = 0;
    // Interior nodes 2 … SEGMENTS (model nodes after A, B) in order along the cable.
    const z = (i: number) => phi[3 * (i + 1) + 2];
    for (let i = 1; i < SEGMENTS; i++) {
      y2 += phi[3 * (i + 1) + 1] ** 2;
      xz2 += phi[3 * (i + 1)] ** 2 + z(i) ** 2;
      sym += (z(i) + z(SEGMENTS - i)) ** 2;
      anti += (z(i) - z(SEGMENTS - i)) ** 2;
    }
    return { omegaBar: (mode.angularFrequency * L) / Math.sqrt(H / m), inPlane: xz2 > 100 * y2, symmetric: sym > anti };
  }) };
}

describe('Irvine: in-plane modes of a sagging cable', () => {
  for (const target of [1, 20, 4 * Math.PI ** 2, 80, 200]) {
    it(`λ² ≈ ${target.toFixed(1)}: symmetric, antisymmetric and out-of-plane modes`, () => {
      const H0 = (MASS * STANDARD_GRAVITY * L * L) / (8 * SAG);
      const EA = (target * H0 * L * (1 + 8 * (SAG / L) ** 2)) / (((MASS * STANDARD_GRAVITY * L) / H0) ** 2 * L);
      const { lambda2, modes } = classifiedModes(EA);
      const firstSym = modes.find((m) => m.inPlane && m.symmetric)!;
      const firstAnti = modes.find((m) => m.inPlane && !m.symmetric)!;
      const firstOut = modes.find((m) => !m.inPlane)!;
      // Measured differences are below 1e-3: the 120-segment lumped chain and the shallow-cable
      // theory's neglected O((d/L)²) terms (d/L = 1/100) are of that order.
      expect(Math.abs(firstSym.omegaBar / symmetricRoot(lambda2) - 1)).toBeLessThan(2e-3);
      expect(Math.abs(firstAnti.omegaBar / (2 * Math.PI) - 1)).toBeLessThan(2e-3);
      expect(Math.abs(firstOut.omegaBar / Math.PI - 1)).toBeLessThan(2e-3);
      // The crossover: below λ² = 4π² the symmetric mode is the lower in-plane one, above it the higher.
      if (lambda2 < 0.9 * 4 * Math.PI ** 2) expect(firstSym.omegaBar).toBeLessThan(firstAnti.omegaBar);
      if (lambda2 > 1.1 * 4 * Math.PI ** 2) expect(firstSym.omegaBar).toBeGreaterThan(firstAnti.omegaBar);
      if (Math.abs(lambda2 / (4 * Math.PI ** 2) - 1) < 0.02) expect(firstSym.omegaBar / firstAnti.omegaBar).toBeCloseTo(1, 2);
    });
  }
});

import { describe, expect, it } from 'vitest';
import { solveModes, stressFreeLength } from '../../../solver/index.ts';
import { singleCable, STRAND } from '../helpers.ts';

/**
 * A taut, weightless-loaded string: a horizontal cable between pins with pretension T, solved in a
 * case without self-weight (straight), with its mass m per length present for the modes.
 * Continuous string: f_n = n / (2L) · √(T / m) (e.g. Irvine, Cable Structures, 1981, ch. 3; any
 * vibration text). The lumped chain of N equal segments h = L/N has the exact discrete frequencies
 * f_n = (1/π) √(T / (m h²)) · sin(nπ / 2N) (substitute sin(i n π / N) into the chain equations).
 */
describe('taut string', () => {
  const L = 60, T = 20e3, N = 120;
  const project = singleCable([L, 0, 0], { pretension: T, segments: N });
  project.loadCases = [{ id: 'taut', selfWeight: false }];
  const m = STRAND.massPerLength;

  it('matches the lumped chain exactly and the continuous string closely; every transverse frequency is double (y and z)', () => {
    const { caseResult, modal } = solveModes(project, 'taut', { count: 10 });
    expect(caseResult?.converged).toBe(true);
    if (!modal.ok) throw new Error(modal.refusal.code);
    const modes = modal.analysis.modes;
    expect(modes).toHaveLength(10);
    // The mass is per stress-free length, slightly shorter than the stretched span.
    const h = L / N;
    const massPerSpan = (m * stressFreeLength(h, T / STRAND.area, STRAND.E)) / h;
    for (let n = 1; n <= 5; n++) {
      const chain = (1 / Math.PI) * Math.sqrt(T / (massPerSpan * h * h)) * Math.sin((n * Math.PI) / (2 * N));
      const string = (n / (2 * L)) * Math.sqrt(T / massPerSpan);
      for (const mode of [modes[2 * n - 2], modes[2 * n - 1]]) {
        expect(mode.frequency / chain).toBeCloseTo(1, 6);
        expect(Math.abs(mode.frequency / string - 1)).toBeLessThan(1e-3 * n * n);
        expect(mode.period * mode.frequency).toBeCloseTo(1, 12);
      }
    }
  });

  it('effective masses: no mode moves mass along the string; the first mode pair carries the sine mode\'s share of each transverse mass', () => {
    const { modal } = solveModes(project, 'taut', { count: 2 });
    if (!modal.ok) throw new Error(modal.refusal.code);
    const [a, b] = modal.analysis.modes;
    expect(a.effectiveMass[0]).toBeLessThan(1e-9 * modal.analysis.movableMass[0]);
    // The pair spans y and z. Chain mode φ_i = sin(iπ/N) over N − 1 equal masses:
    // share = (Σ sin)² / ((N − 1) Σ sin²) = 2 cot²(π/2N) / (N (N − 1)) → 8/π² (continuous string).
    const share = (2 / Math.tan(Math.PI / (2 * N)) ** 2) / (N * (N - 1));
    const y = a.effectiveMassShare[1] + b.effectiveMassShare[1];
    const z = a.effectiveMassShare[2] + b.effectiveMassShare[2];
    expect(y).toBeCloseTo(share, 8);
    expect(z).toBeCloseTo(share, 8);
    expect(Math.abs(share - 8 / Math.PI ** 2)).toBeLessThan(0.01);
    expect(b.cumulativeShare[1]).toBeCloseTo(y, 12);
  });
});

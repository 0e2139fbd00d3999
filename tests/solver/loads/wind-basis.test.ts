import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { icedLattice, latticeForceCoefficient, solveProject, windDirectionCases, windProfileRows } from '../../../solver/index.ts';

/** A horizontal rope between two supports, crossed by wind (drag only). */
function rope(basis?: ProjectFile['loadCases'][number]['wind']): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'P', at: [0, 0, 10], fixed: 'xyz' }, { id: 'Q', at: [0, 30, 10], fixed: 'xyz' }],
    sections: [{ id: 'r', E: 1.6e11, area: 2e-4, diameter: 0.02 }],
    members: [{ id: 'R', kind: 'cable', from: 'P', to: 'Q', section: 'r', segments: 10, pretension: 60e3 }],
    loadCases: [{ id: 'w', selfWeight: false, wind: basis }],
  };
}

describe('wind basis', () => {
  it('q = ½ρV² on the profile; the gust and structural factors multiply the pressure', () => {
    const rows = windProfileRows({ direction: 0, speed: 30, profile: { kind: 'uniform' }, basis: { velocity: 'mean', averagingPeriod: 600, gustFactor: 1.5, structuralFactor: 0.9 } }, [10, 40]);
    for (const r of rows) {
      expect(r.pressure).toBeCloseTo(0.5 * 1.225 * 30 * 30, 9); // Bernoulli, ISA air density
      expect(r.factoredPressure).toBeCloseTo(1.35 * r.pressure, 9);
    }
  });

  it('the force factor scales the drag the supports carry: Σ reactions = k · ½ρV² Cd D L', () => {
    const V = 25;
    const sum = (p: ProjectFile) => solveProject(p).report.cases[0].reactions.reduce((s, r) => s + r.force[0], 0);
    const plain = sum(rope({ direction: 0, speed: V, profile: { kind: 'uniform' } }));
    const factored = sum(rope({ direction: 0, speed: V, profile: { kind: 'uniform' }, basis: { velocity: 'mean', averagingPeriod: 600, gustFactor: 2 } }));
    // cross-flow drag on the deformed rope; the rope swings, so compare with the straight-rope value at 1 %
    const expected = 0.5 * 1.225 * V * V * 1.2 * 0.02 * 30;
    expect(Math.abs(-plain - expected) / expected).toBeLessThan(1e-2);
    expect(Math.abs(-factored - 2 * expected) / (2 * expected)).toBeLessThan(1e-2);
  });

  it('wind from N directions: one case per 360°/N from the azimuth, named by direction', () => {
    const p = rope({ direction: 0, speed: 20, profile: { kind: 'uniform' } });
    p.windDirections = [{ id: 'all', case: 'w', count: 4, azimuth: 45 }];
    expect(windDirectionCases(p, p.windDirections[0]).map((c) => [c.id, c.wind!.direction])).toEqual([['all 45°', 45], ['all 135°', 135], ['all 225°', 225], ['all 315°', 315]]);
    const rep = solveProject(p).report;
    expect(rep.cases.map((c) => c.id)).toEqual(['w', 'all 45°', 'all 135°', 'all 225°', 'all 315°']);
    // the rope lies along y: wind toward 45° and 135° have the same cross-flow component, opposite in x
    const rx = (id: string) => rep.cases.find((c) => c.id === id)!.reactions.reduce((s, r) => s + r.force[0], 0);
    expect(rx('all 135°')).toBeCloseTo(-rx('all 45°'), 6);
  });
});

describe('lattice force coefficients (EN 1993-3-1 Annex B, recalled — see the source file)', () => {
  it('flat-sided members follow the recalled TIA-222 polynomials within 5 % (two recalled sources agree)', () => {
    for (const phi of [0.1, 0.2, 0.3, 0.4, 0.5]) {
      const tri = 3.4 * phi * phi - 4.7 * phi + 3.4, sq = 4.0 * phi * phi - 5.9 * phi + 4.0;
      expect(Math.abs(latticeForceCoefficient(phi, 'triangular', 'flat') / tri - 1)).toBeLessThan(0.05);
      expect(Math.abs(latticeForceCoefficient(phi, 'square', 'flat') / sq - 1)).toBeLessThan(0.05);
    }
  });

  it('round members draw less than flat ones; the coefficient falls with solidity at low solidity', () => {
    expect(latticeForceCoefficient(0.2, 'triangular', 'round')).toBeLessThan(latticeForceCoefficient(0.2, 'triangular', 'flat'));
    expect(latticeForceCoefficient(0.3, 'square', 'flat')).toBeLessThan(latticeForceCoefficient(0.1, 'square', 'flat'));
    expect(() => latticeForceCoefficient(0, 'square', 'flat')).toThrow(/solidity/);
  });

  it('ice grows the solidity by (d + 2t)/d and counts the members as round', () => {
    const iced = icedLattice(0.2, 0.03, 0.015, 'triangular');
    expect(iced.solidity).toBeCloseTo(0.4, 12);
    expect(iced.forceCoefficient).toBeCloseTo(latticeForceCoefficient(0.4, 'triangular', 'round'), 12);
    // the drag per height (c_f · solidity) grows with ice
    expect(iced.forceCoefficient * iced.solidity).toBeGreaterThan(latticeForceCoefficient(0.2, 'triangular', 'round') * 0.2);
  });
});

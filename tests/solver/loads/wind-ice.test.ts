import { describe, expect, it } from 'vitest';
import type { LoadCaseSpec, ProjectFile } from '../../../solver/index.ts';
import { createWindLoad, windDragWidths } from '../../../solver/loads/wind.ts';
import { iceAnnulusMass, iceMassPerLength } from '../../../solver/loads/ice.ts';
import { handModel } from './hand-model.ts';

function project(): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [
      { id: 'A', at: [0, 0, 20], fixed: 'xyz' }, { id: 'B', at: [0, 10, 20], fixed: 'xyz' },
      { id: 'C', at: [0, 0, 0], fixed: 'xyz' }, { id: 'D', at: [10, 0, 10] },
      { id: 'E', at: [10, 0, 20] },
    ],
    sections: [
      { id: 'rope', E: 1.6e11, area: 2e-4, diameter: 0.02 },
      { id: 'mast', E: 2e11, area: 1e-3, lattice: { faceWidth: 0.6, solidity: 0.25, dragFactor: 2, share: 0.5 } },
    ],
    members: [
      { id: 'across', kind: 'cable', from: 'A', to: 'B', section: 'rope', groups: ['g1'] },
      { id: 'guy45', kind: 'cable', from: 'C', to: 'D', section: 'rope' },
      { id: 'along', kind: 'cable', from: 'A', to: 'E', section: 'rope' },
      { id: 'lat', kind: 'bar', from: 'C', to: 'A', section: 'mast' },
    ],
    loadCases: [],
  };
}

const uniform = (speed: number, direction = 0): LoadCaseSpec => ({
  id: 'w', wind: { direction, speed, profile: { kind: 'uniform' }, airDensity: 1.225 },
});

function nodalForces(p: ProjectFile, c: LoadCaseSpec, factor = 1): Float64Array {
  const m = handModel(p);
  const f = new Float64Array(3 * m.nodeCount);
  createWindLoad(m, p, c).accumulate(m.coords, factor, f);
  return f;
}

describe('wind drag', () => {
  it('cable normal to the flow: F = ½ρ Cd D V² L, half at each end', () => {
    const p = project();
    p.members = [p.members[0]];
    const f = nodalForces(p, uniform(30));
    // ½ · 1.225 · 30² · 1.2 · 0.02 · 10 = 132.3 N (hand arithmetic; Cd 1.2 default, common practice).
    expect(f[0] + f[3]).toBeCloseTo(132.3, 9);
    expect(f[0]).toBeCloseTo(66.15, 9);
    expect(Math.abs(f[1]) + Math.abs(f[2]) + Math.abs(f[4]) + Math.abs(f[5])).toBeLessThan(1e-12);
  });

  it('inclined cable sees only the normal velocity component (cross-flow principle)', () => {
    // Hoerner, Fluid-Dynamic Drag (1965): normal force on an inclined cylinder ∝ (V sin ψ)².
    // ψ = 45°: V_n = V (½, 0, −½), |V_n| = V/√2; F = ½ρCdD |V_n| V_n l, l = 10√2.
    const p = project();
    p.members = [p.members[1]];
    const f = nodalForces(p, uniform(30));
    const c = 0.5 * 1.225 * 1.2 * 0.02 * (30 / Math.SQRT2) * 10 * Math.SQRT2;
    expect(f[6] + f[9]).toBeCloseTo(c * 15, 9);
    expect(f[8] + f[11]).toBeCloseTo(-c * 15, 9);
    expect(f[7] + f[10]).toBeCloseTo(0, 12);
  });

  it('cable along the flow gets no drag; combination factor scales linearly', () => {
    const p = project();
    p.members = [p.members[2]];
    expect(Math.max(...nodalForces(p, uniform(30)).map(Math.abs))).toBeLessThan(1e-12);
    const q = project();
    q.members = [q.members[0]];
    expect(nodalForces(q, uniform(30), 1.5)[0]).toBeCloseTo(1.5 * nodalForces(q, uniform(30))[0], 10);
  });

  it('wind direction 90° pushes toward +y and a cable along y then feels nothing', () => {
    const p = project();
    p.members = [p.members[2]]; // along x
    const f = nodalForces(p, uniform(20, 90));
    expect(f[1] + f[13]).toBeCloseTo(0.5 * 1.225 * 400 * 1.2 * 0.02 * 10, 9);
  });

  it('lattice drag width = Cf · solidity · faceWidth · share; group filter excludes others', () => {
    const p = project();
    const w = windDragWidths(handModel(p), p, uniform(30));
    expect(w[3]).toBeCloseTo(2 * 0.25 * 0.6 * 0.5, 12);
    expect(w[0]).toBeCloseTo(1.2 * 0.02, 12);
    const g = windDragWidths(handModel(p), p, { id: 'g', wind: { direction: 0, speed: 30, groups: ['g1'] } });
    expect(Array.from(g).map((x) => x > 0)).toEqual([true, false, false, false]);
  });

  it('ice enlarges the diameter the wind sees to D + 2t', () => {
    const p = project();
    const c: LoadCaseSpec = { ...uniform(30), ice: { thickness: 0.015 } };
    const w = windDragWidths(handModel(p), p, c);
    expect(w[0]).toBeCloseTo(1.2 * (0.02 + 0.03), 12);
    expect(w[3]).toBeCloseTo(2 * 0.25 * 0.6 * 0.5, 12); // lattice without diameter or memberWidth: no ice on the face
  });
});

describe('ice mass', () => {
  it('annulus area times density', () => {
    // Outer circle minus inner circle: π (0.02)² − π (0.01)² = 3π·10⁻⁴ m²; × 900 = 0.848230 kg/m.
    const annulus = Math.PI * 0.02 ** 2 - Math.PI * 0.01 ** 2;
    expect(iceAnnulusMass(0.02, 0.01, 900)).toBeCloseTo(annulus * 900, 12);
    expect(iceAnnulusMass(0.02, 0.01, 900)).toBeCloseTo(0.848230, 6);
  });

  it('per element, default density 900 (glaze, ISO 12494 recalled), only members with a diameter or in groups', () => {
    const p = project();
    const m = iceMassPerLength(handModel(p), p, { thickness: 0.01 });
    expect(m[0]).toBeCloseTo(0.848230, 6);
    expect(m[3]).toBe(0);
    const g = iceMassPerLength(handModel(p), p, { thickness: 0.01, density: 600, groups: ['g1'] });
    expect(g[0]).toBeCloseTo(0.848230 * 600 / 900, 6);
    expect(g[1]).toBe(0);
  });
});

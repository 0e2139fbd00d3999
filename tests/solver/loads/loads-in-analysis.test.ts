import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { solveProject, STANDARD_GRAVITY } from '../../../solver/index.ts';
import { runGenerator } from '../../../main/common/generators/index.ts';

describe('wind and ice inside the analysis', () => {
  it('ice adds ρπt(D+t) per metre to the weight the supports carry (statics)', () => {
    const L = 20, D = 0.02, t = 0.012, m = 1.9;
    const p: ProjectFile = {
      format: 'stayset-project', version: 2,
      nodes: [{ id: 'P', at: [0, 0, 10], fixed: 'xyz' }, { id: 'Q', at: [L, 0, 10], fixed: 'xyz' }],
      sections: [{ id: 'rope', E: 1.6e11, area: 2e-4, diameter: D, massPerLength: m }],
      members: [{ id: 'R', kind: 'cable', from: 'P', to: 'Q', section: 'rope', segments: 10, pretension: 40e3 }],
      loadCases: [{ id: 'bare' }, { id: 'iced', ice: { thickness: t } }],
    };
    const rep = solveProject(p).report;
    const sumFz = (k: number) => rep.cases[k].reactions.reduce((s, r) => s + r.force[2], 0);
    // Ice mass per length from the annulus: 900 π t (D + t) (glaze ice density 900, ISO 12494 recalled).
    const iceMass = 900 * Math.PI * t * (D + t);
    // Unstressed length of the pretensioned rope is L / (1 + ε) to first order; the weight uses it.
    const lu = L * (1 - 40e3 / (1.6e11 * 2e-4));
    expect(sumFz(0)).toBeCloseTo(m * lu * STANDARD_GRAVITY, 0);
    expect(sumFz(1) - sumFz(0)).toBeCloseTo(iceMass * lu * STANDARD_GRAVITY, 0);
  });

  it('lattice mast drag is counted once: Σ Rx = ½ρV² · Cf · solidity · faceWidth · H', () => {
    const H = 30, w = 0.6, solidity = 0.25, Cf = 2.4, V = 30;
    const base: ProjectFile = {
      format: 'stayset-project', version: 2, nodes: [], sections: [], members: [],
      loadCases: [{ id: 'mast wind', selfWeight: false, wind: { direction: 0, speed: V, profile: { kind: 'uniform' }, groups: ['m/mast legs'] } }],
    };
    const p = runGenerator(base, {
      id: 'm', kind: 'guyedMast',
      params: {
        height: H, guyLevels: [15, 30], guysPerLevel: 3, anchorRadius: 20, faceWidth: w, panelHeight: 1, solidity, latticeDragFactor: Cf,
        leg: { E: 2.1e11, area: 1e-3 }, bracing: { E: 2.1e11, area: 3e-4 },
        guy: { E: 1.6e11, area: 2e-4, breakingLoad: 300e3 }, guySegments: 4,
      },
    }).project;
    const c = solveProject(p).report.cases[0];
    expect(c.converged).toBe(true);
    const sumRx = c.reactions.reduce((s, r) => s + r.force[0], 0);
    const expected = 0.5 * 1.225 * V * V * Cf * solidity * w * H;
    // Tolerance 0.5 %: the three legs of the first (pyramid) panel lean toward the pinned base,
    // which lowers their normal velocity over 1/30 of the height (< 0.2 % of the total), and the
    // legs turn slightly as the mast deflects.
    expect(Math.abs(-sumRx - expected) / expected).toBeLessThan(5e-3);
  });
});

import { describe, expect, it } from 'vitest';
import type { CaseResult, ProjectFile } from '../../../solver/index.ts';
import { buildModel, envelopeOf, runChecks, solveProject } from '../../../solver/index.ts';
import { defaultPatches } from '../../../solver/loads/patch-wind.ts';
import { runGenerator } from '../../../main/common/generators/index.ts';

/** A small lattice mast with straight (one-element) guys and no self-weight: nearly linear under light wind. */
function mast(speed: number): ProjectFile {
  const base: ProjectFile = {
    format: 'stayset-project', version: 2, nodes: [], sections: [], members: [],
    loadCases: [{ id: 'mean', selfWeight: false, wind: { direction: 30, speed, profile: { kind: 'uniform' } } }],
  };
  return runGenerator(base, {
    id: 'm', kind: 'guyedMast',
    params: {
      height: 24, guyLevels: [10, 20], guysPerLevel: 3, anchorRadius: 16, faceWidth: 0.5, panelHeight: 1, solidity: 0.25,
      leg: { E: 2.1e11, area: 8e-4, diameter: 0.03 }, bracing: { E: 2.1e11, area: 2e-4 },
      guy: { E: 1.6e11, area: 2e-4, breakingLoad: 300e3, diameter: 0.016 }, guySegments: 1,
    },
  }).project;
}

const byId = (c: CaseResult, id: string) => c.members.find((m) => m.id === id)!;

describe('patch wind (EN 1993-3-1 B.4.3.2.5: S = S_m ± √Σ(S_i − S_m)²)', () => {
  it('default patches are the spans between guy levels, from the base to the top', () => {
    expect(defaultPatches(buildModel(mast(5)))).toEqual([{ from: 0, to: 10 }, { from: 10, to: 20 }, { from: 20, to: 24 }]);
  });

  it('on a model that stays linear the combination equals the hand combination of separately solved patch increments', () => {
    const k = 2; // patch force = 2 × mean: the increment is one more mean wind on the patch
    const p = mast(4);
    const model = buildModel(p);
    const patches = defaultPatches(model);
    // the increments by hand: the same wind on the bars of one span only (groups by mid-height), alone
    const z = new Map(p.nodes.map((n) => [n.id, n.at[2]] as const));
    p.groups = [...(p.groups ?? []), ...patches.map((r, i) => ({
      id: `span ${i + 1}`,
      members: p.members.filter((m) => m.kind === 'bar').filter((m) => {
        const mid = 0.5 * (z.get(m.from)! + z.get(m.to)!);
        return mid >= r.from && (mid < r.to || (i === patches.length - 1 && mid <= r.to));
      }).map((m) => m.id),
    }))];
    const mean = p.loadCases[0];
    patches.forEach((_, i) => p.loadCases.push({ id: `inc ${i + 1}`, selfWeight: false, wind: { ...mean.wind!, speed: mean.wind!.speed * Math.sqrt(k - 1), groups: [`span ${i + 1}`] } }));
    p.loadCases.push({ id: 'prestress only', selfWeight: false });
    p.patchWind = [{ id: 'pw', meanCase: 'mean', patchFactor: k }];
    const rep = solveProject(p).report;
    const get = (id: string) => rep.cases.find((c) => c.id === id)!;
    const m = get('mean'), max = get('pw max'), min = get('pw min');
    const incs = patches.map((_, i) => get(`inc ${i + 1}`));
    const zero = get('prestress only');
    for (const c of rep.cases) expect(c.converged).toBe(true);
    const top = 'm/P24a';
    let checked = 0;
    for (const q of [...p.members.filter((x) => x.kind === 'cable').map((x) => x.id), p.members[0].id]) {
      // S_i − S_m of a linear model = the response to the increment alone, from the prestressed state
      const sp = Math.sqrt(incs.reduce((s, c) => s + (byId(c, q).tensionMax - byId(zero, q).tensionMax) ** 2, 0));
      const hand = { max: byId(m, q).tensionMax + sp, min: byId(m, q).tensionMax - sp };
      // linear to 0.1 % of the patch part (the guys' geometric stiffness changes a little with load)
      expect(Math.abs(byId(max, q).tensionMax - hand.max)).toBeLessThan(1e-3 * sp + 1e-6 * Math.abs(hand.max));
      expect(Math.abs(byId(min, q).tensionMax - hand.min)).toBeLessThan(1e-3 * sp + 1e-6 * Math.abs(hand.min));
      checked++;
    }
    expect(checked).toBeGreaterThan(6);
    const disp = (c: CaseResult) => c.nodes.find((n) => n.id === top)!.displacement[0];
    const spx = Math.sqrt(incs.reduce((s, c) => s + (disp(c) - disp(zero)) ** 2, 0));
    expect(spx).toBeGreaterThan(0);
    expect(Math.abs(disp(max) - (disp(m) + spx))).toBeLessThan(1e-3 * spx);
    expect(Math.abs(disp(min) - (disp(m) - spx))).toBeLessThan(1e-3 * spx);
  });

  it('max/min results are ordinary cases: the envelope and the checks take them', () => {
    const p = mast(25);
    p.patchWind = [{ id: 'pw', meanCase: 'mean', patchFactor: 1.8 }];
    const rep = solveProject(p).report;
    expect(rep.cases.map((c) => c.id)).toEqual(['mean', 'pw / patch 1', 'pw / patch 2', 'pw / patch 3', 'pw max', 'pw min']);
    const env = envelopeOf(rep);
    expect(env.cases).toContain('pw max');
    const mean = rep.cases[0], max = rep.cases[4];
    for (const mm of mean.members) {
      expect(byId(max, mm.id).tensionMax).toBeGreaterThanOrEqual(mm.tensionMax);
      expect(env.members.find((e) => e.id === mm.id)!.tensionMax).toBeGreaterThanOrEqual(mm.tensionMax);
    }
    const checks = runChecks(p, rep);
    expect(checks.cases.map((c) => c.id)).toContain('pw min');
  });
});

import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { ancillaryNodalMass, buildModel, solveProject, STANDARD_GRAVITY } from '../../../solver/index.ts';
import { runGenerator } from '../../../main/common/generators/index.ts';
import { validateProject } from '../../../main/common/project/index.ts';

function mast(): ProjectFile {
  const base: ProjectFile = {
    format: 'stayset-project', version: 2, nodes: [], sections: [], members: [],
    loadCases: [
      { id: 'bare', selfWeight: false },
      { id: 'weight' },
      { id: 'wind', selfWeight: false, wind: { direction: 0, speed: 30, profile: { kind: 'uniform' } } },
      { id: 'ice', selfWeight: false, ice: { thickness: 0.02 } },
    ],
  };
  const p = runGenerator(base, {
    id: 'm', kind: 'guyedMast',
    params: {
      height: 24, guyLevels: [12, 24], guysPerLevel: 3, anchorRadius: 16, faceWidth: 0.5, panelHeight: 1,
      leg: { E: 2.1e11, area: 8e-4 }, bracing: { E: 2.1e11, area: 2e-4 }, guy: { E: 1.6e11, area: 2e-4, breakingLoad: 300e3 }, guySegments: 4,
    },
  }).project;
  // members without diameter or lattice data take no wind and no ice: only the ancillaries do
  for (const sec of p.sections) delete sec.lattice;
  p.ancillaries = [
    { id: 'dish', kind: 'dish', node: 'm/P24a', dragArea: 1.2, mass: 80, iceDragArea: 10, iceMass: 2000 },
    { id: 'feeder', kind: 'feeder', along: { group: 'm/mast legs', from: 0, to: 20 }, dragArea: 0.05, mass: 3, iceMass: 100 },
  ];
  return p;
}

const sum = (c: { reactions: { force: number[] }[] }, q: number) => c.reactions.reduce((s, r) => s + r.force[q], 0);

describe('ancillaries: weight, wind and ice reach the supports (statics)', () => {
  const p = mast();
  expect(validateProject(p).ok).toBe(true);
  const rep = solveProject(p).report;
  const get = (id: string) => rep.cases.find((c) => c.id === id)!;

  it('weight: Σ Fz grows by g (80 kg + 3 kg/m × 20 m)', () => {
    const members = sum(get('weight'), 2) - sum(get('bare'), 2);
    const model = buildModel(p);
    let own = 0;
    for (let e = 0; e < model.elementCount; e++) own += model.elemMassPerLength[e] * model.elemUnstressedLength[e] * STANDARD_GRAVITY;
    expect(members - own).toBeCloseTo(STANDARD_GRAVITY * (80 + 3 * 20), 6);
  });

  it('wind: Σ Fx = −½ρV² (1.2 m² + 0.05 m²/m × 20 m) (Bernoulli, uniform profile)', () => {
    expect(-sum(get('wind'), 0)).toBeCloseTo(0.5 * 1.225 * 900 * (1.2 + 0.05 * 20), 6);
  });

  it('ice: Σ Fz = g · t (2000 kg/m + 100 kg/m per m × 20 m)', () => {
    expect(sum(get('ice'), 2) - sum(get('bare'), 2)).toBeCloseTo(STANDARD_GRAVITY * 0.02 * (2000 + 100 * 20), 6);
  });

  it('nodal masses for modal mass add up to the ancillaries\' mass', () => {
    const m = ancillaryNodalMass(buildModel(p), p);
    expect(m.reduce((s, v) => s + v, 0)).toBeCloseTo(80 + 3 * 20, 9);
  });

  it('validation names the entry: point or line item, unknown node or group, empty range', () => {
    const q = mast() as unknown as Record<string, unknown>;
    q.ancillaries = [
      { id: 'a', kind: 'antenna', dragArea: 1, mass: 1 },
      { id: 'b', kind: 'ladder', node: 'X', along: { group: 'G', from: 5, to: 5 }, dragArea: -1, mass: 1 },
    ];
    const r = validateProject(q);
    const e = r.ok ? [] : r.errors;
    expect(e).toContain('ancillaries[0] "a": give either "node" (a point item) or "along" (a line item)');
    expect(e).toContain('ancillaries[1] "b": node "X" does not exist');
    expect(e).toContain('ancillaries[1] "b": along: group "G" does not exist');
    expect(e).toContain('ancillaries[1] "b": along: "to" (5 m) must be above "from" (5 m)');
    expect(e.some((m) => m.startsWith('ancillaries[1] "b": "dragArea" must not be negative'))).toBe(true);
  });
});

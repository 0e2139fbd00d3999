import { describe, expect, it } from 'vitest';
import { solveProject } from '../../../../solver/index.ts';
import type { GeneratorRecord, ProjectFile } from '../../../../solver/index.ts';
import { GeneratorInputError, generatorNotesText, generatorProblemText, runGenerator, solveForceDensity } from '../../../../main/common/generators/index.ts';
import { emptyProject, mastRecord, strand } from './fixtures.ts';

const saddle = (outline: 'rectangle' | 'ellipse'): GeneratorRecord => ({
  id: 'canopy', kind: 'saddleNet',
  params: {
    outline, lengthX: 20, lengthY: 14, spacing: 2, highPointHeight: 8, lowPointHeight: 2.5, netTension: 8e3,
    netCable: strand(0.012), edgeCable: strand(0.026), backstay: strand(0.026),
    mast: { E: 2.1e11, area: 3e-3, massPerLength: 24, diameter: 0.22 },
  },
});
const radial: GeneratorRecord = {
  id: 'roof', kind: 'radialNet',
  params: { outerRadius: 12, innerRadius: 2.5, radialCount: 10, outerHeight: 4, mastHeight: 11, radialTension: 15e3,
    radialCable: strand(0.014), ringCable: strand(0.02), hanger: strand(0.014), mast: { E: 2.1e11, area: 3e-3, massPerLength: 24 } },
};

function converges(p: ProjectFile): void {
  const sol = solveProject(p);
  for (const c of sol.report.cases) expect({ id: c.id, status: c.status }).toEqual({ id: c.id, status: 'converged' });
}

describe('generated models solve', () => {
  it('guyed mast, lattice and single bar, 3 and 4 guys', () => {
    converges(runGenerator(emptyProject(), mastRecord()).project);
    converges(runGenerator(emptyProject(), mastRecord({ guysPerLevel: 4, anchorRadius: [16, 22] })).project);
    converges(runGenerator(emptyProject(), mastRecord({ mastModel: 'singleBar', guyLevels: [14, 30] })).project);
  });
  it('guyed stick mast of beam-columns: lattice equivalent, and a tube with a cantilever above the top guys', () => {
    converges(runGenerator(emptyProject(), mastRecord({ mastModel: 'stick' })).project);
    const tube = runGenerator(emptyProject(), mastRecord({ mastModel: 'stick', guyLevels: [10, 20], height: 30, stickSection: { shape: 'tube', diameter: 0.4, wall: 0.01 } })).project;
    converges(tube);
    expect(tube.nodes.find((n) => n.id === 'mast/base')!.fixed).toBe('xyzrz');
    expect(tube.members.filter((m) => m.kind === 'beam')).toHaveLength(3);
  });
  it('saddle nets over a rectangle and an ellipse, radial net', () => {
    converges(runGenerator(emptyProject(), saddle('rectangle')).project);
    converges(runGenerator(emptyProject(), saddle('ellipse')).project);
    converges(runGenerator(emptyProject(), radial).project);
  });
  it('form-found nets are in equilibrium under pretension alone (no movement without loads)', () => {
    for (const rec of [saddle('rectangle'), saddle('ellipse'), radial]) {
      const p = runGenerator(emptyProject(), rec).project;
      p.loadCases = [{ id: 'prestress', selfWeight: false }];
      const c = solveProject(p).report.cases[0];
      expect(Math.max(...c.nodes.map((n) => Math.hypot(...n.displacement)))).toBeLessThan(1e-4);
    }
  });
});

describe('lattice mast base', () => {
  it('the leg feet are pinned: the first panel twists a small fraction of a degree under dead load (the single pivot of old twisted ~4°)', () => {
    const p = runGenerator(emptyProject(), mastRecord()).project;
    p.loadCases = [{ id: 'dead' }];
    const c = solveProject(p).report.cases[0];
    const ring = ['a', 'b', 'c'].map((j) => c.nodes.find((n) => n.id === `mast/P1${j}`)!);
    const cx = ring.reduce((s, n) => s + n.position[0], 0) / 3, cy = ring.reduce((s, n) => s + n.position[1], 0) / 3;
    const ox = ring.reduce((s, n) => s + n.position[0] - n.displacement[0], 0) / 3, oy = ring.reduce((s, n) => s + n.position[1] - n.displacement[1], 0) / 3;
    const a = ring[0];
    const twist = Math.atan2(a.position[1] - cy, a.position[0] - cx) - Math.atan2(a.position[1] - a.displacement[1] - oy, a.position[0] - a.displacement[0] - ox);
    expect(Math.abs(twist) * 180 / Math.PI).toBeLessThan(0.1);
  });
});

describe('guyed mast parts', () => {
  const { project } = runGenerator(emptyProject(), mastRecord());
  it('tags members, groups by level, pretension 10 % of breaking load (common practice default)', () => {
    expect(project.members.every((m) => m.generatedBy === 'mast')).toBe(true);
    const g2 = project.groups!.find((g) => g.id === 'mast/guys level 2')!;
    expect(g2.members).toHaveLength(3);
    const guy = project.members.find((m) => m.id === g2.members[0])!;
    expect(guy.pretension).toBeCloseTo(0.1 * strand(0.012).breakingLoad, -1);
    expect(guy.segments).toBe(8);
    expect(project.nodes.find((n) => n.id === 'mast/base')!.fixed).toBe('xyz');
    expect(project.nodes.filter((n) => n.fixed === 'xyz')).toHaveLength(6); // 3 leg feet + 3 shared anchors
  });
  it('per-level anchor radii: equal radii share anchors, different radii get their own', () => {
    const anchors = (r: number[]) => runGenerator(emptyProject(), mastRecord({ anchorRadius: r })).project.nodes.filter((n) => n.fixed === 'xyz').length - 3;
    expect(anchors([20, 20])).toBe(3);
    expect(anchors([16, 22])).toBe(6);
  });
  it('panel levels include every guy level; top at the height', () => {
    const zs = new Set(project.nodes.map((n) => n.at[2]));
    expect(zs.has(14) && zs.has(28) && zs.has(30)).toBe(true);
  });
  it('names bad parameters', () => {
    expect(() => runGenerator(emptyProject(), mastRecord({ guyLevels: [20, 10], anchorRadius: [1, 2, 3] }))).toThrow(GeneratorInputError);
    try { runGenerator(emptyProject(), mastRecord({ guyLevels: [20, 10], guysPerLevel: 5, height: -1 })); } catch (e) {
      const text = (e as GeneratorInputError).problems.map((x) => generatorProblemText(x, 'SI')).join('\n');
      expect(text).toMatch(/params\.height/);
      expect(text).toMatch(/guysPerLevel/);
      expect(text).toMatch(/guyLevels\[1\]/);
    }
  });
});

describe('parameter problems that quote numbers read in the display units', () => {
  it('a guy level above the mast top: 35 m and 30 m in SI, 114.829 ft and 98.425 ft in US (1 ft = 0.3048 m, NIST SP 811)', () => {
    let problems: GeneratorInputError['problems'] = [];
    try { runGenerator(emptyProject(), mastRecord({ height: 30, guyLevels: [14, 35] })); } catch (e) { problems = (e as GeneratorInputError).problems; }
    const above = problems.filter((x) => typeof x !== 'string');
    expect(above).toHaveLength(1);
    expect(generatorProblemText(above[0], 'SI')).toBe('generators "mast" params.guyLevels[1]: 35.000 m is above the mast height 30.000 m');
    expect(generatorProblemText(above[0], 'US')).toBe('generators "mast" params.guyLevels[1]: 114.829 ft is above the mast height 98.425 ft');
  });
});

describe('canopy parameters', () => {
  it('names bad saddle and radial parameters', () => {
    const bad = saddle('rectangle');
    Object.assign(bad.params, { spacing: 30, outline: 'circle' });
    expect(() => runGenerator(emptyProject(), bad)).toThrow(/outline: "circle".*|spacing: must allow/s);
    const r = structuredClone(radial);
    Object.assign(r.params, { innerRadius: 20, radialCount: 2 });
    try { runGenerator(emptyProject(), r); expect.unreachable(); } catch (e) {
      const text = (e as GeneratorInputError).problems.map((x) => generatorProblemText(x, 'SI')).join('\n');
      expect(text).toMatch(/innerRadius: must be smaller than outerRadius/);
      expect(text).toMatch(/radialCount: 2 must be a whole number from 3/);
    }
  });
});

describe('re-running a generator', () => {
  it('replaces its parts and keeps the user’s edits', () => {
    const first = runGenerator(emptyProject(), mastRecord()).project;
    first.sections.push({ id: 'aerial', E: 2e11, area: 1e-4 });
    first.nodes.push({ id: 'dish', at: [1, 0, 29] });
    first.members.push({ id: 'bracket', kind: 'bar', from: 'mast/P30a', to: 'dish', section: 'aerial' });
    first.members.push({ id: 'feeder', kind: 'bar', from: 'mast/P14a', to: 'dish', section: 'aerial' });
    first.groups!.push({ id: 'mine', members: ['bracket', 'mast/guy L2-1'] });
    const again = runGenerator(first, mastRecord({ height: 28, guyLevels: [14, 28] }));
    const p = again.project;
    expect(p.generators).toHaveLength(1);
    expect(p.members.filter((m) => m.generatedBy === 'mast').length).toBeLessThan(first.members.length);
    expect(p.members.some((m) => m.id === 'bracket') && p.nodes.some((n) => n.id === 'dish')).toBe(true);
    // mast/P30a is no longer generated (top now at 28 m): "bracket" is re-attached to the new top, no old node is kept
    expect(p.nodes.some((n) => n.id === 'mast/P30a')).toBe(false);
    expect(p.members.find((m) => m.id === 'bracket')!.from).toBe('mast/P28a');
    expect(generatorNotesText(again.notes, 'SI').join('\n')).toMatch(/member "bracket" from: node "mast\/P30a" → "mast\/P28a"/);
    // a node still generated is simply the new one
    expect(p.nodes.filter((n) => n.id === 'mast/P14a')).toHaveLength(1);
    // unused old nodes are gone; no duplicate ids
    expect(p.nodes.some((n) => n.id === 'mast/P29a')).toBe(false);
    expect(new Set(p.nodes.map((n) => n.id)).size).toBe(p.nodes.length);
    expect(p.groups!.find((g) => g.id === 'mine')!.members).toEqual(['bracket', 'mast/guy L2-1']);
  });
});

describe('force density form finding', () => {
  it('a uniformly loaded string takes the funicular parabola', () => {
    // Funicular polygon of a string with equal force densities and equal nodal loads P
    // (e.g. Irvine, Cable Structures (1981), ch. 1): q (z_{i+1} − 2 z_i + z_{i−1}) = P, so
    // z_i = −(P / 2q) · i (n − i) between supports at equal height.
    const n = 8, P = 100, q = 250;
    const coords = new Float64Array(3 * (n + 1));
    for (let i = 0; i <= n; i++) coords[3 * i] = i;
    const fixed = new Uint8Array(n + 1); fixed[0] = 1; fixed[n] = 1;
    const links = new Int32Array(Array.from({ length: n }, (_, i) => [i, i + 1]).flat());
    const loads = new Float64Array(3 * (n + 1));
    for (let i = 1; i < n; i++) loads[3 * i + 2] = -P;
    const x = solveForceDensity({ coords, fixed, links, q: new Float64Array(n).fill(q), loads });
    for (let i = 0; i <= n; i++) {
      expect(x[3 * i + 2]).toBeCloseTo((-P / (2 * q)) * i * (n - i), 9);
      expect(x[3 * i]).toBeCloseTo(i, 9);
    }
  });
});

import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ancillaryNodalMass, buildModel, runChecks, solveProject, STANDARD_GRAVITY } from '../../solver/index.ts';
import type { CaseResult, ProjectFile } from '../../solver/index.ts';
import { parseProjectText, serializeProject } from '../../main/common/project/index.ts';
import { demoCanopy, demoMast } from '../fixtures/make-demos.ts';

const assets = fileURLToPath(new URL('../../assets/', import.meta.url));
const files = readdirSync(assets).filter((f) => f.endsWith('.stayset') || f.endsWith('.stayset.json'));
const read = (f: string): ProjectFile => {
  const r = parseProjectText(readFileSync(assets + f, 'utf8'));
  if (!r.ok) throw new Error(`${f}: ${r.errors.join('\n')}`);
  return r.project;
};
const solved = new Map(files.map((f) => [f, solveProject(read(f)).report] as const));
const caseOf = (f: string, id: string): CaseResult => solved.get(f)!.cases.find((c) => c.id === id)!;
const maxTension = (c: CaseResult) => Math.max(...c.members.map((m) => m.tensionMax));

describe('demo projects in assets/', () => {
  it('there are demos', () => expect(files).toEqual(expect.arrayContaining(['demo-mast.stayset', 'demo-canopy.stayset'])));

  for (const f of files) {
    it(`${f}: validates, every case converges and the checks pass`, () => {
      const report = solved.get(f)!;
      for (const c of report.cases) expect({ id: c.id, status: c.status }).toEqual({ id: c.id, status: 'converged' });
      expect(runChecks(read(f), report).pass).toBe(true);
    });

    it(`${f}: vertical equilibrium under self-weight alone (statics: ΣFz of reactions = total weight)`, () => {
      const p = read(f);
      const model = buildModel(p);
      let weight = 0;
      for (let e = 0; e < model.elementCount; e++) weight += model.elemMassPerLength[e] * model.elemUnstressedLength[e] * STANDARD_GRAVITY;
      weight += ancillaryNodalMass(model, p).reduce((s, m) => s + m, 0) * STANDARD_GRAVITY; // antennas, feeders
      const dead = caseOf(f, 'dead');
      const sumFz = dead.reactions.reduce((s, r) => s + r.force[2], 0);
      expect(Math.abs(sumFz - weight) / weight).toBeLessThan(1e-6);
    });
  }

  it('committed demo files are what tests/fixtures/make-demos.ts writes', () => {
    expect(readFileSync(assets + 'demo-mast.stayset', 'utf8')).toBe(serializeProject(demoMast()));
    expect(readFileSync(assets + 'demo-canopy.stayset', 'utf8')).toBe(serializeProject(demoCanopy()));
  });

  it('demo mast: three-fold symmetry — wind toward θ and θ + 120° give the same peak guy tension', () => {
    // Guys at 90°, 210°, 330° and a triangular mast: rotating the wind by 120° maps the structure onto itself.
    const f = 'demo-mast.stayset';
    expect(maxTension(caseOf(f, 'wind 120'))).toBeCloseTo(maxTension(caseOf(f, 'wind 0')), 3);
    expect(maxTension(caseOf(f, 'wind 180'))).toBeCloseTo(maxTension(caseOf(f, 'wind 60')), 3);
  });

  it('demo mast: key numbers (locked from a converged run; regression, not a reference)', () => {
    const f = 'demo-mast.stayset';
    expect(maxTension(caseOf(f, 'dead'))).toBeCloseTo(18506.1, 0);
    expect(maxTension(caseOf(f, 'wind 0'))).toBeCloseTo(23444.2, 0);
    expect(maxTension(caseOf(f, 'ice + wind'))).toBeCloseTo(24319.6, 0);
    expect(maxTension(caseOf(f, 'cold + wind 90'))).toBeCloseTo(23918.0, 0);
    const base = caseOf(f, 'dead').reactions.find((r) => r.node === 'mast/base')!;
    expect(base.force[2]).toBeGreaterThan(0);
  });

  it('demo mast: the patch-wind envelope is at least the mean-wind result (S_m + S_p ≥ S_m ≥ S_m − S_p)', () => {
    const f = 'demo-mast.stayset';
    const mean = caseOf(f, 'wind 0'), max = caseOf(f, 'patch 0 max'), min = caseOf(f, 'patch 0 min');
    mean.members.forEach((m, k) => {
      expect(max.members[k].tensionMax).toBeGreaterThanOrEqual(m.tensionMax);
      expect(min.members[k].tensionMax).toBeLessThanOrEqual(m.tensionMax);
    });
    mean.nodes.forEach((n, k) => n.displacement.forEach((d, q) => expect(max.nodes[k].displacement[q]).toBeGreaterThanOrEqual(d)));
    expect(maxTension(max)).toBeGreaterThan(maxTension(mean));
  });

  it('demo mast: patch wind and guy loss, key numbers (locked from a converged run; regression, not a reference)', () => {
    const f = 'demo-mast.stayset';
    expect(maxTension(caseOf(f, 'patch 0 max'))).toBeCloseTo(24432.1, 0);
    expect(maxTension(caseOf(f, 'patch 0 min'))).toBeCloseTo(22456.4, 0);
    expect(maxTension(caseOf(f, 'guy loss / mast/guy L1-1'))).toBeCloseTo(145787.8, 0);
    // three-fold symmetry: losing any of the three guys of a level gives the same peak force
    expect(maxTension(caseOf(f, 'guy loss / mast/guy L1-3'))).toBeCloseTo(145787.7, 0);
  });

  it('demo canopy: key numbers (locked from a converged run; regression, not a reference)', () => {
    const f = 'demo-canopy.stayset';
    expect(maxTension(caseOf(f, 'dead'))).toBeCloseTo(106717.7, 0);
    expect(maxTension(caseOf(f, 'cold'))).toBeCloseTo(125355.7, 0);
    expect(maxTension(caseOf(f, 'snow'))).toBeCloseTo(132606.3, 0);
    expect(maxTension(caseOf(f, 'uplift 0'))).toBeCloseTo(120118.7, 0);
    const top = caseOf(f, 'snow').nodes.find((n) => n.id === 'canopy/N11-0')!;
    expect(Math.hypot(...top.displacement)).toBeCloseTo(0.12803, 4);
  });
});

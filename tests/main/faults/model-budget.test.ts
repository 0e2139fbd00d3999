/**
 * Fault suite, resource limits (issue 14): a valid file that would make a model too large is
 * refused before anything is built, with a message that names the members driving the size and
 * the limit; the schema bounds `segments`.
 * Reference for the factor estimate: the solver's own symbolic factorisation (SparseLDL.analyse,
 * AMD + elimination tree, Davis 2006 ch. 4) of the real model.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildModel, checkModelBudget, createWorkspace, estimateModelSize, type ProjectFile } from '../../../solver/index.ts';
import { validateProject } from '../../../main/common/project/index.ts';
import { modelBudgetRefusal } from '../../../main/common/limits/model-budget-text.ts';
import { sampleMast } from '../store/sample-project.ts';
import { oversizedMast } from './oversized.ts';

const demo = (name: string): ProjectFile => JSON.parse(readFileSync(new URL(`../../../assets/${name}`, import.meta.url), 'utf8')) as ProjectFile;

describe('model-size estimate', () => {
  it.each(['demo-mast.stayset', 'demo-canopy.stayset', 'demo-tube-mast.stayset'])('%s: DOFs exact, factor entries bounded above within 2× of the real factor', (name) => {
    for (const scale of [1, 3]) {
      const p = demo(name);
      for (const m of p.members) m.segments = (m.segments ?? 1) * scale;
      const e = estimateModelSize(p);
      const model = buildModel(p);
      const ws = createWorkspace(model);
      // The reference is the DOF map buildModel makes (3 per node, 6 where rotations are used).
      expect(e.dofs).toBe(model.dofs.count);
      expect(e.elements).toBe(model.elementCount);
      expect(e.factorNonzeros).toBeGreaterThanOrEqual(ws.ldl.factorNonzeros);
      expect(e.factorNonzeros).toBeLessThanOrEqual(2 * ws.ldl.factorNonzeros);
    }
  });

  it('estimates a model of 100 million segments without building it', () => {
    const p = sampleMast();
    p.members[1].segments = 1e8;
    const e = estimateModelSize(p);
    expect(e.dofs).toBe(3 * (5 + 2 * 7 + (1e8 - 1))); // 5 user nodes, G2 and G3 at 8 segments
    expect(e.drivers[0]).toMatchObject({ member: 1, id: 'G1', segments: 1e8 });
  });

  it('counts 6 DOFs at beam nodes: interior nodes, unpinned ends and rotational supports', () => {
    const p = sampleMast();
    const beam = { ...p.members[0], id: 'B', kind: 'beam' as const, segments: 4 };
    p.members.push(beam);
    const truss = estimateModelSize(sampleMast());
    const rotating = new Set([beam.from, beam.to]).size + 3; // both ends and 3 interior nodes
    expect(estimateModelSize(p).dofs).toBe(truss.dofs + 3 * 3 + 3 * rotating);
    beam.releases = { start: 'xyz' };
    expect(estimateModelSize(p).dofs).toBe(truss.dofs + 3 * 3 + 3 * (rotating - 1));
  });
});

describe('model-size budget', () => {
  it('accepts the demos and refuses a valid oversized model, naming the members and the limit', () => {
    expect(checkModelBudget(demo('demo-mast.stayset')).ok).toBe(true);
    const big = oversizedMast();
    expect(validateProject(big).ok).toBe(true);
    const verdict = checkModelBudget(big);
    expect(verdict.ok).toBe(false);
    if (verdict.ok) return;
    expect(verdict.exceeded).toContain('dofs');
    const text = modelBudgetRefusal(verdict)!;
    expect(text).toContain('degrees of freedom (limit 300,000)');
    expect(text).toMatch(/members\[7\] "G7" \(10,000 segments/);
    expect(text.indexOf('"G7"')).toBeLessThan(text.indexOf('"G1"'));
  });

  it('a tighter budget refuses on memory and factor size too', () => {
    const verdict = checkModelBudget(sampleMast(), { maxDofs: 1e9, maxFactorNonzeros: 100, maxBytes: 1000 });
    expect(verdict.ok).toBe(false);
    if (!verdict.ok) expect(verdict.exceeded).toEqual(['factorNonzeros', 'bytes']);
  });

  it('the schema bounds segments at 10,000 and says so, naming the member', () => {
    const p = sampleMast();
    p.members[2].segments = 1e7;
    const outcome = validateProject(p);
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.errors.join('\n')).toMatch(/members\[2\] "G2".*at most 10000/);
  });
});

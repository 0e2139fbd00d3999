/**
 * Tensioning sequences on a small guyed lattice mast:
 * - any order reproduces the one-shot design state (the unstressed-length principle: every member
 *   ends at its design unstressed length, so the final equilibrium is the design one), to the
 *   solver's tolerance;
 * - every stage equals a separate nonlinear solve of a project holding only the members in place
 *   (built here by hand: members filtered, pretensions replaced by cut lengths, untouched nodes fixed).
 */
import { describe, expect, it } from 'vitest';
import { memberUnstressedLength, runSequence, solveProject, type ProjectFile } from '../../../solver/index.ts';
import { smallMast } from './small-mast.ts';

const guys = ['L1-1', 'L1-2', 'L1-3', 'L2-1', 'L2-2', 'L2-3'].map((g) => `m/guy ${g}`);

function withSequences(): ProjectFile {
  const p = smallMast();
  p.sequences = [
    { id: 'top down', steps: [{ group: 'm/guys level 2', setBy: 'force' }, { group: 'm/guys level 1', setBy: 'force' }] },
    { id: 'bottom up', temperature: 298.15, steps: [{ group: 'm/guys level 1', setBy: 'length' }, { group: 'm/guys level 2', setBy: 'force' }] },
    {
      id: 'one at a time', temporaryRestraints: [{ node: 'm/P16a', fixed: 'xyz', releaseAfterStep: 4 }],
      steps: [3, 0, 4, 1, 5, 2].map((k) => ({ members: [guys[k]], setBy: 'force' as const })),
    },
  ];
  return p;
}

function oneShot(p: ProjectFile, temperature = 288.15): Map<string, number> {
  const q: ProjectFile = { ...p, loadCases: [{ id: 'design', temperatureChange: temperature - 288.15 }] };
  const c = solveProject(q).report.cases[0];
  expect(c.converged).toBe(true);
  const z = (id: string) => p.nodes.find((n) => n.id === id)!.at[2];
  return new Map(c.members.map((m) => {
    const spec = p.members.find((x) => x.id === m.id)!;
    return [m.id, z(spec.from) <= z(spec.to) ? m.tensionStart : m.tensionEnd];
  }));
}

describe('tensioning sequences on a guyed lattice mast', () => {
  const project = withSequences();

  it('different orders and set-by methods all end in the one-shot design state', () => {
    const asLengths: ProjectFile = { ...project, members: project.members.map((m) => {
      if (m.pretension === undefined) return m;
      const { pretension, ...rest } = m;
      void pretension;
      return { ...rest, unstressedLength: memberUnstressedLength(project, m) };
    }) };
    for (const [id, temperature] of [['top down', 288.15], ['bottom up', 298.15], ['one at a time', 288.15]] as const) {
      const r = runSequence(project, id);
      const last = r.stages.at(-1)!;
      expect(last.converged, id).toBe(true);
      const design = oneShot(asLengths, temperature);
      for (const g of guys) {
        const t = last.state.find((s) => s.member === g)!.tension;
        expect(Math.abs(t / design.get(g)! - 1), `${id} ${g}`).toBeLessThan(1e-7);
      }
      expect(r.finalDifference, id).toBeLessThan(1e-7);
    }
  });

  it('the set values depend on the order (the first level set alone reads differently)', () => {
    const a = runSequence(project, 'top down');
    const b = runSequence(project, 'bottom up');
    const topFirst = a.stages[0].settings.find((s) => s.member === guys[3])!.value;
    const topLast = b.stages[1].settings.find((s) => s.member === guys[3])!.value;
    expect(Math.abs(topFirst / topLast - 1)).toBeGreaterThan(0.01);
  });

  it('each stage equals a separate nonlinear solve of the members in place', () => {
    const r = runSequence(project, 'one at a time');
    const order = [3, 0, 4, 1, 5, 2];
    const stepStages = r.stages.filter((s) => s.kind === 'step');
    expect(stepStages.length).toBe(6);
    stepStages.forEach((stage, k) => {
      const inPlace = new Set(order.slice(0, k + 1).map((i) => guys[i]));
      const members = project.members.filter((m) => m.kind === 'bar' || inPlace.has(m.id)).map((m) => {
        if (m.pretension === undefined) return m;
        const { pretension, ...rest } = m;
        void pretension;
        return { ...rest, unstressedLength: memberUnstressedLength(project, m) };
      });
      const used = new Set(members.flatMap((m) => [m.from, m.to]));
      const nodes = project.nodes.map((n) => (!used.has(n.id) ? { ...n, fixed: 'xyz' } : n.id === 'm/P16a' && k < 4 ? { ...n, fixed: 'xyz' } : n));
      const staged: ProjectFile = { ...project, nodes, members, loadCases: [{ id: 'stage' }], sequences: undefined };
      const c = solveProject(staged).report.cases[0];
      expect(c.converged).toBe(stage.converged);
      for (const s of stage.state) {
        const m = c.members.find((x) => x.id === s.member)!;
        expect(Math.abs(m.tensionMax - s.tensionMax), `stage ${stage.index} ${s.member}`).toBeLessThan(1e-6 * Math.max(1, s.tensionMax));
      }
    });
  });
});

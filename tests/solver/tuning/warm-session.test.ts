import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createWarmSession } from '../../../solver/tuning/warm-session.ts';
import { applyVariables, resolveVariables } from '../../../solver/tuning/tuning-variables.ts';
import { solveNamedCases } from '../../../solver/tuning/project-case-solver.ts';
import { tuneProject } from '../../../solver/tuning/tune-project.ts';
import type { ProjectFile } from '../../../solver/project/types.ts';

const mast = (): ProjectFile => JSON.parse(readFileSync(new URL('../../fixtures/projects/kestrel-moor-mast.stayset.json', import.meta.url), 'utf8'));
const CASES = ['dead', 'wind-x', 'cold', 'uls-wind'];

describe('warm tuning session against rebuilding the edited project', () => {
  for (const by of ['pretension', 'unstressedLength'] as const) {
    it(`gives the same case results as applyVariables + a fresh solve (by ${by})`, () => {
      const p = mast();
      p.tuning = { variables: [{ group: 'guys', by }], targets: [{ kind: 'noSlack', group: 'guys', case: 'dead' }] };
      const vars = resolveVariables(p);
      const session = createWarmSession(p, vars, CASES);
      const values = by === 'pretension' ? [15e3, 22e3, 9e3, 30e3] : [1, 0.9995, 1.0004, 0.999];
      for (const v of values) {
        const warm = session([v]);
        const ref = solveNamedCases(applyVariables(p, vars, [v]), CASES);
        for (const id of CASES) {
          const a = warm.get(id)!, b = ref.get(id)!;
          expect(a.converged).toBe(b.converged);
          a.members.forEach((m, i) => {
            expect(Math.abs(m.tensionMax - b.members[i].tensionMax)).toBeLessThan(1e-6 * Math.max(1, Math.abs(b.members[i].tensionMax)));
            expect(m.sag).toBeCloseTo(b.members[i].sag, 7);
          });
          a.nodes.forEach((n, i) => n.displacement.forEach((d, q) => expect(d).toBeCloseTo(b.nodes[i].displacement[q], 7)));
        }
      }
    });
  }

  it('tunes to the same pretension as the rebuild path', () => {
    const p = mast();
    p.tuning = { variables: [{ group: 'guys', by: 'pretension' }], targets: [{ kind: 'tensionShare', group: 'guys', share: 0.13 }] };
    const warm = tuneProject(p);
    const ref = tuneProject(p, { solveCases: solveNamedCases });
    expect(warm.status).toBe('met');
    expect(warm.variables[0].final / ref.variables[0].final).toBeCloseTo(1, 6);
  });
});

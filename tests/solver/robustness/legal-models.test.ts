import { describe, expect, it } from 'vitest';
import { solveProject, stressFreeLength, STANDARD_GRAVITY } from '../../../solver/index.ts';
import type { CaseResult, ProjectFile } from '../../../solver/index.ts';
import { legalModels } from './legal-models.ts';

/**
 * Every legal model converges, and balances: the sum of the support reactions plus the applied
 * nodal loads plus the total weight is zero (global equilibrium, statics) to 1e-8 of the loads.
 * The weight is computed here from the file: mass per stress-free length × stress-free length
 * (for a pretension P, the documented stress-free length of each element at the chord), plus node
 * masses and the ancillaries' masses.
 */
function appliedForce(project: ProjectFile, caseId: string): [number, number, number] {
  const spec = project.loadCases.find((c) => c.id === caseId)!;
  const f: [number, number, number] = [0, 0, 0];
  for (const l of spec.nodalLoads ?? []) for (let q = 0; q < 3; q++) f[q] += l.force[q];
  if (spec.selfWeight === false) return f;
  let mass = 0;
  for (const m of project.members) {
    const s = project.sections.find((x) => x.id === m.section)!;
    const a = project.nodes.find((n) => n.id === m.from)!.at, b = project.nodes.find((n) => n.id === m.to)!.at;
    const chord = Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
    const n = Math.max(1, Math.floor(m.segments ?? 1));
    const length = m.unstressedLength ?? n * stressFreeLength(chord / n, (m.pretension ?? 0) / s.area, s.E);
    mass += (s.massPerLength ?? 0) * length;
  }
  for (const node of project.nodes) mass += node.mass ?? 0;
  // Ancillaries (no ice in these cases): kg at a node, or kg per metre of height over their range.
  for (const a of project.ancillaries ?? []) mass += a.along ? a.mass * (a.along.to - a.along.from) : a.mass;
  f[2] -= mass * STANDARD_GRAVITY;
  return f;
}

function imbalance(project: ProjectFile, c: CaseResult): number {
  const f = appliedForce(project, c.id);
  const sum = [...f];
  let scale = Math.hypot(...f);
  for (const r of c.reactions) {
    for (let q = 0; q < 3; q++) sum[q] += r.force[q];
    scale = Math.max(scale, Math.hypot(...r.force));
  }
  return Math.hypot(sum[0], sum[1], sum[2]) / scale;
}

describe('legal models converge and balance', () => {
  const models = legalModels();
  it('the suite has at least 30 models', () => expect(models.length).toBeGreaterThanOrEqual(30));
  for (const { name, project, cases } of models) {
    it(name, () => {
      const report = solveProject(project, {}, { only: cases }).report;
      expect(report.cases.map((c) => c.id)).toEqual(cases);
      for (const c of report.cases) {
        expect({ case: c.id, status: c.status, message: c.message }).toEqual({ case: c.id, status: 'converged', message: undefined });
        expect(imbalance(project, c)).toBeLessThan(1e-8);
      }
    });
  }
});

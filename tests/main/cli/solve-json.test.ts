// `stayset solve --json` end to end on invented fixtures; results checked against statics and
// Hooke's law, not against earlier output.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { CaseResult, ProjectFile } from '../../../solver/index.ts';
import { REPO_ROOT, fixture, runStayset } from './run-stayset.ts';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901), as documented in solver/project/types.ts

function solveJson(args: string[]): { code: number | null; cases: CaseResult[]; disclaimer: string } {
  const r = runStayset(['solve', ...args, '--json']);
  expect(r.stderr).toBe('');
  const out = JSON.parse(r.stdout) as { cases: CaseResult[]; disclaimer: string };
  return { code: r.code, ...out };
}

function sum(vs: number[][], k: number): number {
  return vs.reduce((s, v) => s + v[k], 0);
}

describe('stayset solve --json', () => {
  it('axial bar: displacement F·L/(E·A) (Hooke), tension = F and reaction = −F (statics)', () => {
    const { code, cases, disclaimer } = solveJson([fixture('axial-bar.stayset.json')]);
    expect(code).toBe(0);
    expect(disclaimer).toMatch(/qualified engineer.*local codes and licensed practice govern/);
    expect(cases).toHaveLength(1);
    const c = cases[0];
    expect(c).toMatchObject({ id: 'pull', converged: true, status: 'converged', slackMembers: [] });
    const F = 2000;
    const L = 10;
    const EA = 200e9 * 1.0e-4;
    const ux = c.nodes.find((n) => n.id === 'B')!.displacement[0];
    // Small-strain Hooke's law; the Green–Lagrange law differs by O(ε) = 1e-4 relative.
    expect(Math.abs(ux - (F * L) / EA) / ((F * L) / EA)).toBeLessThan(1e-3);
    // Exact for a Total Lagrangian bar with Green strain (Crisfield, Non-linear Finite Element
    // Analysis of Solids and Structures, vol. 1, 1991, ch. 3 — recalled from memory):
    // ε = (λ² − 1)/2, S = E·ε, true force N = A·S·λ with stretch λ = l/L.
    const lambda = (L + ux) / L;
    expect((EA * ((lambda * lambda - 1) / 2) * lambda) / F).toBeCloseTo(1, 6);
    const m = c.members[0];
    expect(m.tensionMax).toBeCloseTo(F, 3);
    expect(m.chordLength).toBeCloseTo(L + ux, 9);
    expect(c.reactions.find((q) => q.node === 'A')!.force[0]).toBeCloseTo(-F, 3);
  });

  it('guyed mast: every case in file order, each in vertical and horizontal equilibrium', () => {
    const { code, cases } = solveJson([fixture('kestrel-moor-mast.stayset.json')]);
    expect(code).toBe(0);
    expect(cases.map((c) => c.id)).toEqual(['dead', 'wind-x', 'cold', 'uls-wind']);
    const project = JSON.parse(readFileSync(`${REPO_ROOT}${fixture('kestrel-moor-mast.stayset.json')}`, 'utf8')) as ProjectFile;
    // Weight on unstressed lengths: mast (no pretension) at its chord; guys Lr·√(1 − 2·S0/E)
    // with S0 = P/A (the element law stated in solver/model/analysis-model.ts).
    const E = 150e9;
    const A = 8.5e-5;
    const guyChord = Math.hypot(20, 30);
    const guyL0 = guyChord * Math.sqrt(1 - (2 * (15000 / A)) / E);
    const weight = G * (31.4 * 30 + 3 * 0.7 * guyL0);
    const factor: Record<string, number> = { dead: 1, 'wind-x': 1, cold: 1, 'uls-wind': 1.5 };
    const pushX: Record<string, number> = { dead: 0, 'wind-x': 4000, cold: 0, 'uls-wind': 6000 };
    for (const c of cases) {
      expect(c.converged).toBe(true);
      const R = c.reactions.map((q) => q.force);
      expect(sum(R, 2)).toBeCloseTo(factor[c.id] * weight, 0);
      expect(sum(R, 0)).toBeCloseTo(-pushX[c.id], 0);
      expect(sum(R, 1)).toBeCloseTo(0, 0);
      expect(c.members.map((m) => m.id)).toEqual(project.members.map((m) => m.id));
      expect(c.stats.dofs).toBeGreaterThan(0);
    }
    // The wind pushes toward +x: the windward guy G1 (anchor at +x) unloads, the leeward ones take more.
    const dead = cases[0].members;
    const wind = cases[1].members;
    expect(wind[1].tensionMax).toBeLessThan(dead[1].tensionMax);
    expect(wind[2].tensionMax).toBeGreaterThan(dead[2].tensionMax);
  });

  it('--case keeps only the chosen cases, in file order', () => {
    const { code, cases } = solveJson([fixture('kestrel-moor-mast.stayset.json'), '--case', 'uls-wind', '--case', 'dead']);
    expect(code).toBe(0);
    expect(cases.map((c) => c.id)).toEqual(['dead', 'uls-wind']);
  });

  it('JSON shape: SolveReport fields only, SI numbers, never NaN or Infinity', () => {
    const r = runStayset(['solve', fixture('kestrel-moor-mast.stayset.json'), '--json']);
    expect(r.stdout).not.toMatch(/NaN|Infinity/);
    const out = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(Object.keys(out).sort()).toEqual(['cases', 'disclaimer', 'stats']);
    // Where the time went: the solve (seconds) is its analysis plus its Newton part.
    const t = out.stats as Record<string, number>;
    expect(Object.keys(t).sort()).toEqual(['analysisSeconds', 'inputSeconds', 'newtonSeconds', 'outputSeconds', 'seconds']);
    for (const v of Object.values(t)) expect(v).toBeGreaterThanOrEqual(0);
    expect(t.seconds).toBeCloseTo(t.analysisSeconds + t.newtonSeconds, 6);
    const c = (out.cases as Record<string, unknown>[])[0];
    expect(Object.keys(c).sort()).toEqual(
      ['converged', 'id', 'members', 'nodes', 'reactions', 'slackMembers', 'stats', 'status', ...('message' in c ? ['message'] : [])].sort(),
    );
    expect(Object.keys((c.members as object[])[0]).sort()).toEqual(
      ['chordLength', 'id', 'sag', 'slack', 'tensionEnd', 'tensionMax', 'tensionMin', 'tensionStart'].sort(),
    );
    expect(Object.keys((c.nodes as object[])[0]).sort()).toEqual(['displacement', 'id', 'position']);
    expect(Object.keys((c.reactions as object[])[0]).sort()).toEqual(['force', 'node']);
    // CaseStats of solver/results/types.ts (the solver may add fields; these must be there).
    expect(Object.keys(c.stats as object)).toEqual(expect.arrayContaining(['dofs', 'iterations', 'loadSteps', 'residual', 'seconds']));
  });

  it('a mechanism does not converge: exit 1, status "singular", output still printed', () => {
    const { code, cases } = solveJson([fixture('mechanism-free-node.stayset.json')]);
    expect(code).toBe(1);
    expect(cases[0]).toMatchObject({ id: 'dead', converged: false, status: 'singular' });
    expect(cases[0].message).toContain('"B"');
  });
});

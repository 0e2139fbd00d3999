/**
 * Start tangents' factors kept across cases (solver/analysis/start-factor-cache.ts): the cases of
 * the demo mast solved one after another on one workspace give, bit for bit, what each gives on a
 * workspace of its own (reference: the solver without any carried-over factor, i.e. the documented
 * pipeline "every case starts from the pretensioned state"), while the numeric factorisations
 * actually run are fewer than the factors used (the start tangent recurs for every case at ΔT = 0).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { buildModel } from '../../../solver/model/build-model.ts';
import { createWorkspace, setElementPrestress } from '../../../solver/analysis/workspace.ts';
import { solveCase, type CaseSolution } from '../../../solver/analysis/solve-case.ts';
import { resolveCaseLoads } from '../../../solver/loads/resolve-case-loads.ts';

const demo = JSON.parse(readFileSync(new URL('../../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;

function comparable(s: CaseSolution): unknown {
  return {
    result: JSON.stringify({ ...s.result, stats: { ...s.result.stats, seconds: 0, factorSeconds: 0 } }),
    fields: Object.entries(s.fields).map(([k, v]) => [k, Array.from(v as ArrayLike<number>).map((x) => Object.is(x, -0) ? '-0' : x)]),
  };
}

describe('start factor cache', () => {
  it('cases on one workspace = each case on its own workspace, bit for bit, with fewer factorisations', () => {
    const model = buildModel(demo);
    const shared = createWorkspace(model);
    const factor = vi.spyOn(shared.ldl, 'factor');
    let aloneFactors = 0;
    for (const spec of demo.loadCases) {
      const together = solveCase(shared, spec.id, resolveCaseLoads(model, demo, spec));
      const ownModel = buildModel(demo);
      const own = createWorkspace(ownModel);
      const ownFactor = vi.spyOn(own.ldl, 'factor');
      const alone = solveCase(own, spec.id, resolveCaseLoads(ownModel, demo, spec));
      aloneFactors += ownFactor.mock.calls.length;
      expect(together.result.stats.factorizations).toBe(alone.result.stats.factorizations);
      expect(comparable(together)).toEqual(comparable(alone));
      expect(together.result.converged).toBe(true);
    }
    // 8 of the 10 cases start at ΔT = 0 (one start tangent): at least 7 factorisations saved.
    expect(factor.mock.calls.length).toBeLessThanOrEqual(aloneFactors - 7);
  });

  it('a changed prestress is solved with its own start tangent, as on a fresh workspace', () => {
    const model = buildModel(demo);
    const ws = createWorkspace(model);
    const spec = demo.loadCases.find((c) => c.id === 'wind 0')!;
    solveCase(ws, spec.id, resolveCaseLoads(model, demo, spec));
    const guy = model.members.find((m) => m.kind === 'cable')!;
    const elements = Array.from({ length: guy.elementCount }, (_, k) => guy.firstElement + k);
    const Lr = elements.map((e) => model.elemRefLength[e]);
    const S0 = elements.map((e) => 1.2 * model.elemS0[e]);
    setElementPrestress(ws, elements, Lr, S0);
    const again = solveCase(ws, spec.id, resolveCaseLoads(model, demo, spec));
    const freshModel = buildModel(demo);
    const fresh = createWorkspace(freshModel);
    setElementPrestress(fresh, elements, Lr, S0);
    expect(comparable(again)).toEqual(comparable(solveCase(fresh, spec.id, resolveCaseLoads(freshModel, demo, spec))));
  });
});

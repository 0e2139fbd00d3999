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
import { StartFactorCache } from '../../../solver/analysis/start-factor-cache.ts';
import { SparseLDL } from '../../../solver/linalg/index.ts';
import { prng, randomSystem } from '../linalg/random-systems.ts';

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

  it('keeps what fits: the entry count and the storage bound drop the least recently used factor', () => {
    const a = randomSystem(prng(11), 20, 3, 0.2);
    const ldl = SparseLDL.analyse(a.pattern, { blockSize: 3 });
    const tangents = [1, 2, 3].map((k) => a.values.map((v) => v * (1 + 0.1 * k)));
    const size = ldl.factorStorage + a.values.length;
    const solveWith = (cache: StartFactorCache, t: Float64Array): boolean => cache.reuse(ldl, t, 1e-12);
    // Room for two by storage (four by count): the first of three is dropped.
    const byStorage = new StartFactorCache(4, 2 * size + 1);
    for (const t of tangents) { expect(ldl.factor(t)).toBe(-1); byStorage.remember(ldl, t, 1e-12); }
    expect(tangents.map((t) => solveWith(byStorage, t))).toEqual([false, true, true]);
    // Room for one by count.
    const byCount = new StartFactorCache(1);
    for (const t of tangents) { expect(ldl.factor(t)).toBe(-1); byCount.remember(ldl, t, 1e-12); }
    expect(tangents.map((t) => solveWith(byCount, t))).toEqual([false, false, true]);
    // A factor larger than the whole bound is never kept; another pivot tolerance is another key.
    const tooSmall = new StartFactorCache(4, size - 1);
    tooSmall.remember(ldl, tangents[2], 1e-12);
    expect(solveWith(tooSmall, tangents[2])).toBe(false);
    expect(byCount.reuse(ldl, tangents[2], 1e-10)).toBe(false);
    // A reused factor solves as the fresh one did, bit for bit.
    const rhs = Float64Array.from({ length: a.pattern.n }, (_, i) => 1 + (i % 7));
    const fresh = new Float64Array(rhs.length), reused = new Float64Array(rhs.length);
    ldl.factor(tangents[2]); ldl.solve(rhs, fresh);
    ldl.factor(tangents[0]);
    expect(solveWith(byCount, tangents[2])).toBe(true);
    ldl.solve(rhs, reused);
    expect(Array.from(reused)).toEqual(Array.from(fresh));
  });
});

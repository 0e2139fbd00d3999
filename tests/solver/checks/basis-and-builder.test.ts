// Design basis defaults (each with a source), the check-purpose rules, the combination builder
// and the twist measure.
import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { applyBuiltCombinations, buildCombinations, checksFor, resolveDesignBasis, TERMINATION_EFFICIENCY, twistOf } from '../../../solver/index.ts';

const project = (format: 'limitState' | 'allowable'): ProjectFile => ({
  format: 'stayset-project', version: 2,
  nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [1, 0, 0] }],
  sections: [{ id: 's', E: 1, area: 1 }],
  members: [{ id: 'M', kind: 'bar', from: 'A', to: 'B', section: 's' }],
  loadCases: [
    { id: 'dead', action: 'permanent' },
    { id: 'w0', selfWeight: false, action: 'wind' }, { id: 'w90', selfWeight: false, action: 'wind' },
    { id: 'ice', selfWeight: false, action: 'iceWithWind' },
    { id: 'cold', selfWeight: false, action: 'temperature' },
    { id: 'guy loss', selfWeight: false, action: 'accidental' },
  ],
  combinations: [{ id: 'mine', factors: [{ case: 'dead', factor: 1 }] }],
  designBasis: { format, actionFactors: { wind: 1.5 } },
});

describe('design basis', () => {
  it('every default names a source: a clause read, "recalled, check against the standard" or "common practice"', () => {
    const b = resolveDesignBasis({ ...project('limitState'), designBasis: undefined });
    const all = [b.actionFactors, b.combinationFactors, b.cable, b.steel, b.allowable].flatMap((g) => Object.values(g));
    for (const s of [...all, ...Object.values(TERMINATION_EFFICIENCY)]) expect(s.source).toMatch(/^(read:|recalled, check against the standard|common practice)/);
    expect(b.defaulted).toBe(true);
  });

  it('a project value replaces the default and says so', () => {
    expect(resolveDesignBasis(project('limitState')).actionFactors.wind).toEqual({ value: 1.5, source: 'project file (designBasis)' });
  });

  it('which checks a purpose gets', () => {
    expect(checksFor('limitState', 'ultimate')).toEqual({ strength: true, serviceability: false });
    expect(checksFor('limitState', 'serviceability')).toEqual({ strength: false, serviceability: true });
    expect(checksFor('limitState', 'accidental')).toEqual({ strength: true, serviceability: false });
    expect(checksFor('allowable', 'serviceability')).toEqual({ strength: true, serviceability: true });
    expect(checksFor('allowable', 'componentOnly')).toEqual({ strength: false, serviceability: false });
  });
});

describe('combination builder', () => {
  it('limit state: leading actions with accompanying ψ0, permanent favourable for wind, accidental at 1.0', () => {
    const p = project('limitState');
    const b = buildCombinations(p, resolveDesignBasis(p));
    const by = (id: string) => b.combinations.find((c) => c.id === `basis/${id}`)!;
    // γ_G = 1.1 (recalled EN 1993-3-1 Table A.1), γ_W = 1.5 from the project, ψ0,T = 0.6: 1.4·0.6 = 0.84.
    expect(by('ULS w0').factors).toEqual([{ case: 'dead', factor: 1.1 }, { case: 'w0', factor: 1.5 }]);
    expect(by('ULS w0 + cold').factors).toEqual([{ case: 'dead', factor: 1.1 }, { case: 'w0', factor: 1.5 }, { case: 'cold', factor: 0.84 }]);
    expect(by('ULS w0 (permanent favourable)').factors).toEqual([{ case: 'dead', factor: 1 }, { case: 'w0', factor: 1.5 }]);
    expect(by('ULS cold + w90').factors).toEqual([{ case: 'dead', factor: 1.1 }, { case: 'cold', factor: 1.4 }, { case: 'w90', factor: 0.9 }]);
    expect(by('ULS ice').factors).toEqual([{ case: 'dead', factor: 1.1 }, { case: 'ice', factor: 1.4 }]);
    expect(by('SLS w0 + cold').factors).toEqual([{ case: 'dead', factor: 1 }, { case: 'w0', factor: 1 }, { case: 'cold', factor: 0.6 }]);
    expect(by('ALS guy loss')).toMatchObject({ purpose: 'accidental', factors: [{ case: 'dead', factor: 1 }, { case: 'guy loss', factor: 1 }] });
    // ULS: 2 winds × (1 + 1 temperature) + 2 favourable + 1 ice + 1 temperature × (1 + 2 winds) = 10; SLS: 8; ALS: 1.
    expect(b.combinations.filter((c) => c.purpose === 'ultimate')).toHaveLength(10);
    expect(b.combinations.filter((c) => c.purpose === 'serviceability')).toHaveLength(8);
    expect(b.problems).toEqual([]);
  });

  it('allowable: unfactored serviceability combinations only; without accompanying actions fewer', () => {
    const p = project('allowable');
    const b = buildCombinations(p, resolveDesignBasis(p), { withAccompanying: false });
    expect(b.combinations.map((c) => c.id)).toEqual(['basis/SLS w0', 'basis/SLS w90', 'basis/SLS ice', 'basis/SLS cold', 'basis/ALS guy loss']);
  });

  it('applying keeps user combinations, replaces earlier generated ones and marks action cases component-only', () => {
    const p = project('limitState');
    const once = applyBuiltCombinations(p, buildCombinations(p, resolveDesignBasis(p)));
    const twice = applyBuiltCombinations(once, buildCombinations(once, resolveDesignBasis(once)));
    expect(twice.combinations).toEqual(once.combinations);
    expect(twice.combinations![0].id).toBe('mine');
    expect(twice.loadCases.map((c) => c.purpose)).toEqual([undefined, 'componentOnly', 'componentOnly', 'componentOnly', 'componentOnly', 'componentOnly']);
  });

  it('flags an action case that carries self-weight (it would be counted twice)', () => {
    const p = project('limitState');
    p.loadCases[1] = { id: 'w0', action: 'wind' };
    expect(buildCombinations(p, resolveDesignBasis(p)).problems).toEqual([{ code: 'actionCaseHasSelfWeight', cases: ['w0'] }]);
  });
});

describe('twist of a node set', () => {
  it('a triangle turned 2° about its centroid and shifted sideways gives 2°', () => {
    const r = 0.35, turn = (2 * Math.PI) / 180;
    const at = (k: number, extra: number, dx: number) => [dx + r * Math.cos((2 * Math.PI * k) / 3 + extra), r * Math.sin((2 * Math.PI * k) / 3 + extra), 20];
    const before = [0, 1, 2].map((k) => at(k, 0, 0));
    const after = [0, 1, 2].map((k) => at(k, turn, 0.3));
    expect(twistOf(before, after)).toBeCloseTo(2, 10);
  });
});

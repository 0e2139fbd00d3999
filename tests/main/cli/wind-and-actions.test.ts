// `stayset wind` prints the wind basis and q(z) = ½ρV²; `stayset solve` names the cases the design
// actions add and accepts them in --case.
import { describe, expect, it } from 'vitest';
import { runStayset } from './run-stayset.ts';

describe('stayset wind', () => {
  it('prints each wind case with its basis and the velocity pressure ½ρV² at 10 m', () => {
    const r = runStayset(['wind', 'assets/demo-mast.stayset']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Load case "wind 0": wind toward 0°, 30 m/s at 10 m');
    // 10 m row: V = 30 m/s → q = ½ · 1.225 · 30² = 551 Pa (Bernoulli, ISA air density)
    expect(r.stdout).toMatch(/^\s+10\.0\s+30\.00\s+551\s+/m);
    expect(r.stdout).toContain('qualified engineer');
  });

  it('--json gives numbers in SI', () => {
    const r = runStayset(['wind', 'assets/demo-canopy.stayset', '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { wind: { caseId: string; rows: { z: number; pressure: number }[] }[] };
    const w = out.wind.find((x) => x.caseId === 'wind 0')!;
    const row = w.rows.find((x) => x.z === 10)!;
    expect(row.pressure).toBeCloseTo(0.5 * 1.225 * 28 * 28, 9);
  });
});

describe('stayset solve with design actions', () => {
  it('names patch-wind cases and solves them by --case', () => {
    const r = runStayset(['solve', 'assets/demo-mast.stayset', '--case', 'patch 0 min']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Patch wind "patch 0"');
    expect(r.stdout).toContain('S = S_m − √Σ(S_i − S_m)²');
  });
});

/**
 * Cases shared among threads (main/analysis/parallel-solve.ts, case-shares.ts): the report and
 * fields of a parallel solve are those of the serial solveProject, case for case and bit for bit
 * (the reference is the serial solve itself: every case starts from the pretensioned state, so
 * the thread that solves it must not matter), and the dynamic claim hands out every case once.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveProject, type ProjectFile, type ProjectSolution } from '../../../solver/index.ts';
import { solveProjectInWorkers } from '../../../main/analysis/parallel-solve.ts';
import { caseClaimer, caseIds, claimedBy, createClaims } from '../../../main/analysis/case-shares.ts';

const demo = (name: string): ProjectFile => JSON.parse(readFileSync(new URL(`../../../assets/${name}`, import.meta.url), 'utf8')) as ProjectFile;

/** The report without its timings, and the fields as plain arrays. */
function comparable(s: ProjectSolution): unknown {
  return {
    cases: s.report.cases.map((c) => ({ ...c, stats: { ...c.stats, seconds: 0, factorSeconds: 0 } })),
    fields: s.fields.map((f) => Object.fromEntries(Object.entries(f).map(([k, v]) => [k, Array.from(v as ArrayLike<number>)]))),
  };
}

describe('parallel solve', () => {
  it.each([2, 3])('demo canopy on %i threads: the serial report and fields, in project order', async (workers) => {
    const p = demo('demo-canopy.stayset');
    const serial = solveProject(p);
    const parallel = await solveProjectInWorkers(p, { workers });
    expect(parallel.report.cases.map((c) => c.id)).toEqual(caseIds(p));
    expect(comparable(parallel)).toEqual(comparable(serial));
  });

  it('a subset (`only`) gives the serial subset', async () => {
    const p = demo('demo-tube-mast.stayset');
    const only = caseIds(p).filter((_, i) => i % 2 === 0);
    const serial = solveProject(p, {}, { only });
    const parallel = await solveProjectInWorkers(p, { workers: 2, only });
    expect(comparable(parallel)).toEqual(comparable(serial));
  });

  it('a project with action-derived cases (patch wind) gives the serial report', async () => {
    const p = demo('demo-mast.stayset');
    expect(p.patchWind?.length).toBeGreaterThan(0);
    const serial = solveProject(p);
    const parallel = await solveProjectInWorkers(p, { workers: 2 });
    expect(comparable(parallel)).toEqual(comparable(serial));
  });

  it('claims hand out every case exactly once, in order, whoever asks', () => {
    const ids = Array.from({ length: 17 }, (_, i) => `c${i}`);
    const claims = createClaims(3);
    const takers = [1, 2, 3].map((slot) => caseClaimer(ids, claims, slot));
    const got: string[][] = [[], [], []];
    // An irregular interleaving, as threads of different speed would make.
    const pattern = [0, 0, 2, 1, 0, 2, 2, 2, 1, 0, 1, 1, 0, 2, 0, 0, 1, 2, 1, 0, 2];
    for (const k of pattern) { const id = takers[k](); if (id !== undefined) got[k].push(id); }
    expect(got.flat().sort()).toEqual([...ids].sort());
    expect(got.flat().map((id) => Number(id.slice(1))).sort((a, b) => a - b)).toEqual(ids.map((_, i) => i));
    for (const k of [0, 1, 2]) expect(claimedBy(claims, k + 1)).toBe(got[k].length);
    // Once all are taken, a participant that asks gets nothing and its count stays.
    expect(takers[0]()).toBeUndefined();
    expect(claimedBy(claims, 1)).toBe(got[0].length);
  });
});

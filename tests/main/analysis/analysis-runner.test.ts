/**
 * The worker-thread runner: progress and a report for a real solve, cancellation through the
 * shared flag, transferred typed arrays. Expected values are checked against statics, not
 * against hard-coded solver output: the three symmetric guys and the mast carry the head's
 * vertical equilibrium (sum of reactions = total weight).
 */
import { describe, expect, it } from 'vitest';
import type { AnalysisDone, AnalysisProgress } from '../../../main/common/host-contract.ts';
import { AnalysisRunner } from '../../../main/analysis/analysis-runner.ts';
import { createProgressThrottle } from '../../../main/analysis/progress-throttle.ts';
import { transferablesOf } from '../../../main/analysis/worker-messages.ts';
import { largeGrid, sampleMast } from '../store/sample-project.ts';
import type { CaseFields } from '../../../solver/index.ts';

function runOnce(project: Parameters<AnalysisRunner['start']>[0], cancelAfterFirstProgress = false, cancelGraceMs = 3000) {
  const progress: AnalysisProgress[] = [];
  return new Promise<{ done: AnalysisDone; progress: AnalysisProgress[]; fields?: CaseFields[]; runId: string }>((resolve) => {
    let runId = '';
    const runner = new AnalysisRunner({
      progressIntervalMs: 0,
      cancelGraceMs,
      onProgress: (p) => {
        progress.push(p);
        if (cancelAfterFirstProgress && progress.length === 1) runner.cancel(p.runId);
      },
      onDone: (done, fields) => resolve({ done, progress, fields, runId }),
    });
    runId = runner.start(project).runId;
  });
}

describe('AnalysisRunner', () => {
  it('solves in a worker, reports progress per case and returns the report and fields', async () => {
    const { done, progress, fields, runId } = await runOnce(sampleMast());
    expect(done.status, done.error).toBe('done');
    expect(done.runId).toBe(runId);
    expect(done.report?.cases.map((c) => c.id)).toEqual(['SW', 'HX']);
    expect(new Set(progress.map((p) => p.caseId))).toEqual(new Set(['SW', 'HX']));
    expect(progress.every((p) => p.caseCount === 2 && p.runId === runId)).toBe(true);
    // Statics (common practice check): support reactions balance the self-weight,
    // sum Fz = g · Σ m·L with g = 9.80665 m/s² (solver/project/types.ts convention).
    const sw = done.report!.cases[0];
    const sumFz = sw.reactions.reduce((s, r) => s + r.force[2], 0);
    const g = 9.80665;
    const guyLength = Math.hypot(20, 30);
    const weight = g * (31.4 * 30 + 3 * 1.25 * guyLength);
    expect(sumFz).toBeCloseTo(weight, -1);
    expect(fields).toHaveLength(2);
    expect(fields![0].positions).toBeInstanceOf(Float64Array);
  });

  it('cancels a running analysis through the shared flag: the solver stops and reports what it did', async () => {
    // A 30 × 30 net with ten point-load cases: many Newton iterations in all.
    const net = largeGrid(30, 'C');
    net.sections[0].massPerLength = 2;
    net.loadCases = Array.from({ length: 10 }, (_, i) => ({ id: `L${i}`, nodalLoads: [{ node: 'N15_15', force: [0, 0, -1000 * (i + 1)] as [number, number, number] }] }));
    // No terminate within the test: a report can then only come from the solver seeing the flag.
    const { done, progress } = await runOnce(net, true, 600_000);
    expect(progress.length).toBeGreaterThanOrEqual(1);
    expect(done.status).toBe('cancelled');
    const cases = done.report!.cases;
    expect(cases.map((c) => c.id)).toEqual(net.loadCases.map((c) => c.id));
    // Cases finish in order: some converged ones, then only cancelled ones; the last case was
    // stopped before its first Newton iteration.
    const firstCancelled = cases.findIndex((c) => c.status === 'cancelled');
    expect(firstCancelled).toBeGreaterThanOrEqual(0);
    expect(cases.slice(0, firstCancelled).every((c) => c.status === 'converged')).toBe(true);
    expect(cases.slice(firstCancelled).every((c) => c.status === 'cancelled')).toBe(true);
    expect(cases[cases.length - 1].stats.iterations).toBe(0);
  });

  it('reports a failed analysis as failed with the message', async () => {
    const bad = sampleMast();
    bad.members[1].section = 'MISSING';
    const { done } = await runOnce(bad);
    expect(done.status).toBe('failed');
    expect(done.error).toBeTruthy();
  });
});

describe('worker helpers', () => {
  it('lists each transferable buffer once', () => {
    const buf = new ArrayBuffer(64);
    const f = { positions: new Float64Array(buf, 0, 4), elementTension: new Float64Array(buf, 32, 4), elementSlack: new Uint8Array(2) };
    expect(transferablesOf([f])).toHaveLength(2);
  });

  it('throttles progress but always passes a new case', () => {
    let t = 0;
    const pass = createProgressThrottle(100, () => t);
    const p = (caseIndex: number) => ({ caseIndex, caseCount: 2, caseId: 'x', iteration: 1, loadFactor: 1, residual: 0 });
    expect([pass(p(0)), pass(p(0)), (t = 150, pass(p(0))), pass(p(1))]).toEqual([true, false, true, true]);
  });
});

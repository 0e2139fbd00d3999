import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { isReactive } from 'vue';
import type { CaseResult, SolveReport } from '../../solver/index.ts';
import { useResultsStore } from '../../renderer/stores/results.ts';

function caseResult(id: string): CaseResult {
  return {
    id, converged: true, status: 'converged', slackMembers: [],
    nodes: [{ id: 'N1', position: [0, 0, 1], displacement: [0, 0, 0.01] }],
    members: [{ id: 'M1', tensionMax: 10, tensionMin: 9, tensionStart: 10, tensionEnd: 9, slack: false, sag: 0.1, chordLength: 5 }],
    reactions: [], stats: { dofs: 3, iterations: 4, seconds: 0.01, loadSteps: 1, residual: 1e-12 },
  };
}
const report: SolveReport = { cases: [caseResult('SW'), caseResult('WIND')] };

describe('results store (analysis state machine)', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('runs: idle → running → done, keeps the case selector and raw report', () => {
    const r = useResultsStore();
    expect(r.state).toBe('idle');
    r.started(7);
    r.onProgress({ runId: 'a', caseIndex: 1, caseCount: 2, caseId: 'WIND', iteration: 3, loadFactor: 0.5 });
    expect(r.progressText).toBe('Case 2 of 2 (WIND), iteration 3, load 50 %');
    r.assignRunId('a');
    r.onFinished({ runId: 'a', status: 'done', report });
    expect(r.state).toBe('done');
    expect(r.caseIds).toEqual(['SW', 'WIND']);
    expect(r.caseId).toBe('SW');
    r.selectCase('WIND');
    expect(r.currentCase?.id).toBe('WIND');
    r.selectCase('nonexistent');
    expect(r.caseId).toBe('WIND');
    expect(isReactive(r.report)).toBe(false);
    expect(r.isStale(7)).toBe(false);
    expect(r.isStale(8)).toBe(true);
  });

  it('ignores events of other runs and records failures', () => {
    const r = useResultsStore();
    r.started(1);
    r.assignRunId('mine');
    r.onFinished({ runId: 'other', status: 'done', report });
    expect(r.state).toBe('running');
    r.onFinished({ runId: 'mine', status: 'failed', error: 'singular stiffness at node N3, z' });
    expect(r.state).toBe('failed');
    expect(r.error).toBe('singular stiffness at node N3, z');
    expect(r.report).toBeNull();
  });

  it('accepts the finish event arriving before the run id', () => {
    const r = useResultsStore();
    r.started(1);
    r.onFinished({ runId: 'fast', status: 'cancelled' });
    expect(r.state).toBe('cancelled');
    r.assignRunId('fast');
    expect(r.runId).toBeNull();
  });
});

/**
 * Where the design checks run beside a live slider drag, counted rather than timed: the tuning
 * worker (its real module, run in this process behind a stand-in Worker that clones every
 * message as postMessage does) sends each step's checks with its re-solve, and the UI thread runs
 * none of them (the checks store leaves a performance mark CHECKS_MARK each time it runs them).
 * What is shown is what runChecks gives in Node for the committed project with the live case in
 * place of the analysed one (solver/checks/run-checks.ts); every consumer (check report, 3D
 * status maps, verdict) reads that one report. An edit of the check settings alone runs them once
 * here; a model edit runs none and leaves them with the stale results.
 */
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { readFileSync } from 'node:fs';
import { nextTick } from 'vue';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile, SolveReport } from '../../solver/index.ts';
import { runChecks, solveProject } from '../../solver/index.ts';
import { checkOutcome } from '../../main/common/checks/check-outcome.ts';
import type { WorkerReply, WorkerRequest } from '../../renderer/tuning/worker-protocol.ts';

/** The worker's global scope: the module sets onmessage and calls postMessage. */
const scope: { onmessage: ((e: { data: WorkerRequest }) => void) | null; postMessage: (m: WorkerReply) => void } = {
  onmessage: null,
  postMessage: () => undefined,
};
class InProcessWorker {
  onmessage: ((e: { data: WorkerReply }) => void) | null = null;
  onerror: ((e: unknown) => void) | null = null;
  constructor() {
    scope.postMessage = (m) => { const data = structuredClone(m); setTimeout(() => this.onmessage?.({ data }), 0); };
  }
  postMessage(m: WorkerRequest): void {
    const data = structuredClone(m);
    setTimeout(() => scope.onmessage?.({ data }), 0);
  }
  terminate(): void {
    scope.postMessage = () => undefined;
  }
}
vi.stubGlobal('self', scope);
vi.stubGlobal('Worker', InProcessWorker);
await import('../../renderer/tuning/tuning-worker.ts');
const { useProjectStore } = await import('../../renderer/stores/project.ts');
const { useResultsStore } = await import('../../renderer/stores/results.ts');
const { useChecksStore, CHECKS_MARK } = await import('../../renderer/stores/checks.ts');
const { useTuningStore } = await import('../../renderer/stores/tuning.ts');
const { commitPretension } = await import('../../renderer/tuning/tuning-edits.ts');
const { withLiveCase } = await import('../../renderer/tuning/live-checks.ts');
const { setCableFactor } = await import('../../renderer/model/check-settings-edits.ts');

const LEVEL = 'mast/guys level 1';
const demo = JSON.parse(readFileSync(new URL('../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;
// Allowable stress: every case is strength-checked, so the live case has a utilisation to follow.
const tuned: ProjectFile = {
  ...demo, designBasis: { format: 'allowable', allowable: { cableSafetyFactor: 1 / 0.3 } }, tuning: { variables: [{ group: LEVEL, by: 'pretension' }], targets: [] },
};
let report: SolveReport;
const uiThreadRuns = () => performance.getEntriesByName(CHECKS_MARK).length;

beforeAll(() => {
  report = solveProject(tuned).report;
});
afterAll(() => vi.unstubAllGlobals());

/** Open `tuned`, and finish a run of it as the analysis worker does: the report with its checks. */
function analysed() {
  const project = useProjectStore();
  project.load({ path: '/p/demo.stayset', name: 'demo.stayset', project: tuned });
  const results = useResultsStore();
  results.started(project.revision, tuned);
  results.onFinished({ runId: 'a', status: 'done', report, checks: checkOutcome(tuned, report) });
  return { project, results, checks: useChecksStore(), tuning: useTuningStore() };
}

describe('design checks beside a live slider drag', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
    performance.clearMarks(CHECKS_MARK);
  });

  it('a drag runs no checks on the UI thread; every consumer shows the worker\'s, equal to runChecks of the committed project', async () => {
    const { results, checks, tuning } = analysed();
    expect(checks.report).toBe(results.analysedChecks!.report);
    const caseId = tuning.caseId;
    expect(caseId).toBe('dead'); // the demo's installation case (solver referenceCaseId)
    const p0 = tuned.members.find((m) => m.id === 'mast/guy L1-1')!.pretension!;
    for (const factor of [1.2, 1.5, 1.8]) {
      tuning.drag(LEVEL, p0 * factor);
      await vi.waitFor(() => expect(results.live?.pretension).toBe(p0 * factor), { timeout: 20_000 });
      void checks.report; void checks.statusMaps; void checks.verdict; void checks.envelope;
    }
    expect(uiThreadRuns()).toBe(0);
    const live = results.live!;
    expect(live.checks).toBeDefined();
    expect(checks.report).toBe(live.checks!.report);

    const committed = commitPretension(tuned, LEVEL, p0 * 1.8);
    const reference = runChecks(committed, withLiveCase(report, caseId, live.result));
    expect(checks.report).toEqual(reference);
    expect(checks.report!.cases.find((c) => c.id === caseId)!.maxUtilisation).toBeGreaterThan(runChecks(tuned, report).cases.find((c) => c.id === caseId)!.maxUtilisation);
    expect(new Map(checks.statusMaps!.members)).toEqual(new Map(reference.members.map((m) => [m.id, m.status])));
    expect(new Map(checks.statusMaps!.nodes)).toEqual(new Map(reference.nodes.map((n) => [n.id, n.status])));
    expect(checks.verdict).toBe(reference.pass ? 'PASS' : reference.allConverged ? 'FAIL' : 'INCOMPLETE');

    // Release: the pretension is written; the live case stays shown with the same checks.
    tuning.commit(LEVEL, p0 * 1.8);
    await nextTick();
    expect(results.live).toBe(live);
    expect(checks.report).toBe(live.checks!.report);
    expect(uiThreadRuns()).toBe(0);
    tuning.dispose();
  });

  it('a check-settings edit alone runs the checks once here; a model edit runs none and keeps them with the stale results', () => {
    const { project, results, checks } = analysed();
    const fromWorker = checks.report;
    expect(uiThreadRuns()).toBe(0);
    // a cable factor of 8 forces failures (the demo's worst T / MBL is about 0.14).
    expect(project.edit('Cable factor', (p) => setCableFactor(p, 8))).toEqual({ ok: true });
    const strict = project.project!;
    expect(checks.report).toEqual(runChecks(strict, report));
    expect(checks.verdict).toBe('FAIL');
    void checks.report; void checks.statusMaps;
    expect(uiThreadRuns()).toBe(1);

    const i = strict.members.findIndex((m) => m.id === 'mast/guy L1-1');
    const shown = checks.report;
    expect(project.updateRowsIn('members', [i], (m) => ({ ...m, pretension: m.pretension! * 1.1 }), 'Pretension')).toEqual({ ok: true });
    expect(results.isStaleFor(project.project)).toBe(true);
    expect(checks.report).toBe(shown);
    expect(uiThreadRuns()).toBe(1);

    // Undo twice: back to the analysed project and its own check settings, checked by the worker.
    project.undo();
    project.undo();
    expect(checks.report).toBe(fromWorker);
    expect(uiThreadRuns()).toBe(1);
  });
});

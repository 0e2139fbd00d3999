/**
 * Runs site requests (a tensioning sequence, an as-built fit, a crew sheet or the report;
 * main/common/site/site-run.ts) off the UI / request thread, in the analysis worker script with
 * `site` set. One request at a time: a new run, cancel() or dispose() ends the running one, whose
 * promise resolves `{ ok: false }` saying so. The model-size budget is checked before a worker
 * starts, and the worker gets the analysis heap limit (run-limits.ts), like an analysis run.
 */
import type { Worker, ResourceLimits } from 'node:worker_threads';
import type { ModelBudget, ProjectFile } from '../../solver/index.ts';
import type { HostResult } from '../common/host-contract.ts';
import type { SiteOutcome, SiteRequest } from '../common/site/site-run.ts';
import { defaultWorkerUrl, spawnWorker } from './analysis-runner.ts';
import { defaultResourceLimits, runRefusal, workerDeathMessage } from './run-limits.ts';
import { createCancelFlag, type AnalysisWorkerData, type WorkerMessage } from './worker-messages.ts';

export interface SiteRunnerOptions {
  workerUrl?: URL;
  execArgv?: string[];
  resourceLimits?: ResourceLimits;
  budget?: ModelBudget;
}

const WHAT: Record<SiteRequest['kind'], string> = { sequence: 'The sequence analysis', asbuilt: 'The as-built analysis', crewSheet: 'The crew sheet', report: 'The report' };

export class SiteRunner {
  private active: { worker: Worker; end: (r: HostResult<SiteOutcome>) => void } | null = null;

  constructor(private readonly options: SiteRunnerOptions = {}) {}

  run(project: ProjectFile, request: SiteRequest): Promise<HostResult<SiteOutcome>> {
    this.cancel();
    const refusal = runRefusal(project, this.options.budget);
    if (refusal !== null) return Promise.resolve({ ok: false, error: refusal });
    const limits = this.options.resourceLimits ?? defaultResourceLimits();
    const data: AnalysisWorkerData = { project, cancelFlag: createCancelFlag().buffer, progressIntervalMs: 1000, site: request };
    const worker = spawnWorker(this.options.workerUrl ?? defaultWorkerUrl(), data, this.options.execArgv ?? [], limits);
    return new Promise((resolve) => {
      let done = false;
      const end = (r: HostResult<SiteOutcome>): void => {
        if (done) return;
        done = true;
        if (this.active?.worker === worker) this.active = null;
        void worker.terminate();
        resolve(r);
      };
      this.active = { worker, end };
      worker.on('message', (m: WorkerMessage) => {
        if (m.type === 'site-done') end({ ok: true, value: m.outcome });
        else if (m.type === 'failed') end({ ok: false, error: `${WHAT[request.kind]} failed: ${m.error}` });
      });
      worker.on('error', (e) => end({ ok: false, error: workerDeathMessage(e, limits) }));
      worker.on('exit', (code) => end({ ok: false, error: `${WHAT[request.kind]} stopped unexpectedly (exit code ${code}).` }));
    });
  }

  /** End the running request (its promise resolves ok:false, "cancelled"). */
  cancel(): void {
    this.active?.end({ ok: false, error: 'cancelled: a newer request replaced it or it was stopped' });
  }

  async dispose(): Promise<void> {
    this.cancel();
  }
}

/**
 * Renderer side of the tuning worker. `LiveChannel`: one long-lived worker for the slider; a
 * drag offers pretensions through a LatestOnly gate, so only one re-solve runs at a time and
 * intermediate positions are dropped. The analysed report goes to the worker once (when it
 * changes), and each step comes back with its design checks (live-checks.ts). `runTuning`: a fresh worker per tuning run; cancelling
 * terminates it (a busy worker cannot read messages) and returns the best values reported by the
 * last finished iteration.
 */
import { toRaw } from 'vue';
import type { CaseResult, ProjectFile, SolveReport, TuningResult } from '../../solver/index.ts';
import type { CheckOutcome } from '../../main/common/checks/check-outcome.ts';
import { LatestOnly } from './latest-only.ts';
import type { WorkerReply, WorkerRequest } from './worker-protocol.ts';

function startWorker(): Worker {
  return new Worker(new URL('./tuning-worker.ts', import.meta.url), { type: 'module' });
}

function post(worker: Worker, msg: WorkerRequest): void {
  worker.postMessage(msg);
}

export interface LiveStepOutcome {
  caseId: string;
  group: string;
  pretension: number;
  result: CaseResult | null;
  seconds: number;
  error?: string;
  /** The worker's design checks of `checksReport` with this step in place, under `checksProject` with the pretension committed. */
  checks?: CheckOutcome;
  checksProject?: ProjectFile;
  checksReport?: SolveReport;
}

interface LiveTarget {
  key: string;
  project: ProjectFile;
  caseId: string;
  group: string;
  /** The analysed report the steps are checked against (null: no checks). */
  report: SolveReport | null;
}

export class LiveChannel {
  private worker: Worker | null = null;
  private readonly gate = new LatestOnly<{ target: LiveTarget; pretension: number }>();
  private initialised = '';
  /** The report the worker holds (undefined: none sent to this worker yet). */
  private sentReport: SolveReport | null | undefined = undefined;
  private seq = 0;
  private running: { target: LiveTarget; pretension: number } | null = null;

  constructor(private readonly onStep: (step: LiveStepOutcome) => void) {}

  /** Intermediate values dropped so far (for the status text and tests). */
  get dropped(): number {
    return this.gate.dropped;
  }

  /**
   * Re-solve `caseId` of `project` with `group` at `pretension` N; `revision` keys the model.
   * `report`: the analysed results the step's checks replace the case in (null: no checks).
   */
  drag(project: ProjectFile, revision: number, caseId: string, group: string, pretension: number, report: SolveReport | null = null): void {
    const target = { key: `${revision}\u0000${caseId}\u0000${group}`, project, caseId, group, report };
    if (this.gate.offer({ target, pretension })) this.send(target, pretension);
  }

  dispose(): void {
    this.worker?.terminate();
    this.worker = null;
    this.sentReport = undefined;
    this.gate.reset();
  }

  private send(target: LiveTarget, pretension: number): void {
    const w = this.ensureWorker();
    if (this.initialised !== target.key) {
      post(w, { type: 'live-init', key: target.key, project: toRaw(target.project), caseId: target.caseId, group: target.group });
      this.initialised = target.key;
    }
    if (this.sentReport !== target.report) {
      post(w, { type: 'live-report', report: target.report ? toRaw(target.report) : null });
      this.sentReport = target.report;
    }
    this.running = { target, pretension };
    post(w, { type: 'live-step', key: target.key, seq: ++this.seq, pretension });
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const w = startWorker();
    w.onmessage = (e: MessageEvent<WorkerReply>) => this.onReply(e.data);
    w.onerror = (e) => {
      e.preventDefault();
      this.finish({ error: `the tuning worker stopped: ${e.message || 'unknown error'}` });
      this.worker?.terminate();
      this.worker = null;
      this.initialised = '';
      this.sentReport = undefined;
    };
    this.worker = w;
    return w;
  }

  private onReply(msg: WorkerReply): void {
    if (msg.type === 'live-step') this.finish({ result: msg.result, seconds: msg.seconds, checks: msg.checks });
    else if (msg.type === 'error' && msg.request === 'live-init') this.initialised = '';
    else if (msg.type === 'error' && msg.request === 'live-step') this.finish({ error: msg.message });
  }

  private finish(out: { result?: CaseResult; seconds?: number; error?: string; checks?: CheckOutcome }): void {
    const ran = this.running;
    this.running = null;
    if (ran) {
      const t = ran.target;
      const checked = out.checks && t.report ? { checks: out.checks, checksProject: t.project, checksReport: t.report } : {};
      this.onStep({ caseId: t.caseId, group: t.group, pretension: ran.pretension, result: out.result ?? null, seconds: out.seconds ?? 0, error: out.error, ...checked });
    }
    const next = this.gate.done();
    if (next) this.send(next.target, next.pretension);
  }
}

export type TuningRunOutcome =
  | { kind: 'done'; result: TuningResult }
  | { kind: 'cancelled'; iterations: number; x: number[] | null }
  | { kind: 'failed'; message: string };

export interface TuningRun {
  promise: Promise<TuningRunOutcome>;
  cancel(): void;
}

/** Run tuneProject in a new worker; `onIteration` reports progress (iteration, values, cost). */
export function runTuning(project: ProjectFile, onIteration: (iteration: number, x: number[], cost: number) => void): TuningRun {
  const worker = startWorker();
  let last: { iteration: number; x: number[] } | null = null;
  let settle: (o: TuningRunOutcome) => void = () => undefined;
  const promise = new Promise<TuningRunOutcome>((resolve) => {
    settle = (o) => {
      worker.terminate();
      resolve(o);
      settle = () => undefined;
    };
  });
  worker.onmessage = (e: MessageEvent<WorkerReply>) => {
    const msg = e.data;
    if (msg.type === 'tune-iteration') {
      last = { iteration: msg.iteration, x: msg.x };
      onIteration(msg.iteration, msg.x, msg.cost);
    } else if (msg.type === 'tune-done') settle({ kind: 'done', result: msg.result });
    else if (msg.type === 'error') settle({ kind: 'failed', message: msg.message });
  };
  worker.onerror = (e) => {
    e.preventDefault();
    settle({ kind: 'failed', message: `the tuning worker stopped: ${e.message || 'unknown error'}` });
  };
  post(worker, { type: 'tune', project: toRaw(project) });
  return {
    promise,
    cancel: () => settle({ kind: 'cancelled', iterations: last?.iteration ?? 0, x: last?.x ?? null }),
  };
}

/**
 * Module Web Worker for the tuning panel: the live re-solve behind the pretension slider
 * (createLiveResolver, warm-started from the previous step) and full tuning runs (tuneProject),
 * both off the UI thread. One resolver is kept (the last `live-init`); steps for another key are
 * refused. With an analysed report (`live-report`) each step also runs the design checks of that
 * report with the re-solved case in its place (live-checks.ts), so the UI thread does not.
 * See worker-protocol.ts for the messages.
 */
import { createLiveResolver, tuneProject, type LiveResolver, type ProjectFile } from '../../solver/index.ts';
import type { SolveReport } from '../../solver/index.ts';
import type { WorkerReply, WorkerRequest } from './worker-protocol.ts';
import { liveStepChecks } from './live-checks.ts';

let resolver: { key: string; live: LiveResolver; project: ProjectFile; caseId: string; group: string } | null = null;
let liveReport: SolveReport | null = null;

function reply(message: WorkerReply): void {
  self.postMessage(message);
}

function handle(msg: WorkerRequest): void {
  switch (msg.type) {
    case 'live-init':
      resolver = null;
      resolver = { key: msg.key, live: createLiveResolver(msg.project, msg.caseId, msg.group), project: msg.project, caseId: msg.caseId, group: msg.group };
      return;
    case 'live-report':
      liveReport = msg.report;
      return;
    case 'live-step': {
      const r = resolver;
      if (!r || r.key !== msg.key) throw new Error('live tuning: the slider was not set up for this case and group');
      const step = r.live.setPretension(msg.pretension);
      const checks = liveReport?.cases.some((c) => c.id === r.caseId)
        ? liveStepChecks(r.project, liveReport, r.caseId, r.group, msg.pretension, step.result)
        : undefined;
      reply({ type: 'live-step', key: msg.key, seq: msg.seq, pretension: msg.pretension, result: step.result, seconds: step.seconds, warm: step.warm, ...(checks ? { checks } : {}) });
      return;
    }
    case 'tune': {
      const result = tuneProject(msg.project, { onIteration: (iteration, x, cost) => reply({ type: 'tune-iteration', iteration, x, cost }) });
      reply({ type: 'tune-done', result });
      return;
    }
  }
}

self.onmessage = (e: MessageEvent<WorkerRequest>) => {
  try {
    handle(e.data);
  } catch (err) {
    const seq = e.data.type === 'live-step' ? e.data.seq : -1;
    reply({ type: 'error', request: e.data.type, seq, message: err instanceof Error ? err.message : String(err) });
  }
};

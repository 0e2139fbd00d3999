/**
 * Module Web Worker for the tuning panel: the live re-solve behind the pretension slider
 * (createLiveResolver, warm-started from the previous step) and full tuning runs (tuneProject),
 * both off the UI thread. One resolver is kept (the last `live-init`); steps for another key are
 * refused. See worker-protocol.ts for the messages.
 */
import { createLiveResolver, tuneProject, type LiveResolver } from '../../solver/index.ts';
import type { WorkerReply, WorkerRequest } from './worker-protocol.ts';

let resolver: { key: string; live: LiveResolver } | null = null;

function reply(message: WorkerReply): void {
  self.postMessage(message);
}

function handle(msg: WorkerRequest): void {
  switch (msg.type) {
    case 'live-init':
      resolver = null;
      resolver = { key: msg.key, live: createLiveResolver(msg.project, msg.caseId, msg.group) };
      return;
    case 'live-step': {
      if (!resolver || resolver.key !== msg.key) throw new Error('live tuning: the slider was not set up for this case and group');
      const step = resolver.live.setPretension(msg.pretension);
      reply({ type: 'live-step', key: msg.key, seq: msg.seq, pretension: msg.pretension, result: step.result, seconds: step.seconds, warm: step.warm });
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

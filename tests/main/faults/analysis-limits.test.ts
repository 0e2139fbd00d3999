/**
 * Fault suite, analysis limits (issue 14): an oversized model is refused before a worker starts;
 * a worker that exhausts its heap is reported as a failed run while the host keeps working; a
 * cancelled run is reported cancelled and its worker stopped even when the solver never looks at
 * the cancel flag. Each test asserts what is kept or stopped, not how long it took.
 */
import { mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import type { AnalysisDone } from '../../../main/common/host-contract.ts';
import { AnalysisRunner, type AnalysisRunnerOptions } from '../../../main/analysis/analysis-runner.ts';
import { createWebHostClient } from '../../../main/common/web-host-client.ts';
import { startWebHost } from '../../../main/web/web-server.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';
import { fetchEventSource } from '../web/fetch-event-source.ts';
import { oversizedMast } from './oversized.ts';

const HEAP_HOG = new URL('./workers/heap-hog-worker.mjs', import.meta.url);
const BUSY = new URL('./workers/busy-worker.mjs', import.meta.url);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

let tmp: ReturnType<typeof makeTempDir> | null = null;
afterEach(() => tmp?.cleanup());

function runner(extra: Partial<AnalysisRunnerOptions> = {}) {
  const done: AnalysisDone[] = [];
  let notify: () => void = () => undefined;
  const r = new AnalysisRunner({ onProgress: () => undefined, onDone: (d) => { done.push(d); notify(); }, ...extra });
  const next = () => new Promise<AnalysisDone>((resolve) => {
    const have = done.length;
    notify = () => { if (done.length > have) resolve(done[done.length - 1]); };
  });
  return { r, done, next };
}

describe('analysis runner limits', () => {
  it('refuses an oversized model before starting a worker, naming the member that drives it', async () => {
    const { r, next } = runner();
    const finished = next();
    const { runId } = r.start(oversizedMast());
    expect(r.activeRuns()).toEqual([]);
    const d = await finished;
    expect(d).toMatchObject({ runId, status: 'failed' });
    expect(d.error).toMatch(/too large.*limit 300,000.*members\[7\] "G7"/s);
  });

  it('a worker that runs out of heap is a failed run; the runner then solves the next project', async () => {
    const hog = runner({ workerUrl: HEAP_HOG, resourceLimits: { maxOldGenerationSizeMb: 24, maxYoungGenerationSizeMb: 4 } });
    const failed = hog.next();
    hog.r.start(sampleMast());
    const d = await failed;
    expect(d.status).toBe('failed');
    expect(d.error).toMatch(/ran out of memory \(limit 24 MB\)/);
    // The same process goes on: a real analysis in a fresh runner completes.
    const real = runner();
    const ok = real.next();
    real.r.start(sampleMast());
    expect((await ok).status).toBe('done');
  });

  it('cancel stops a worker that never reads the flag and reports the run cancelled', async () => {
    tmp = makeTempDir('stayset-cancel-');
    const beat = path.join(tmp.dir, 'heartbeat');
    writeFileSync(beat, '');
    const project = sampleMast();
    project.meta = { ...project.meta, notes: beat };
    const { r, next } = runner({ workerUrl: BUSY });
    const finished = next();
    const { runId } = r.start(project);
    while (statSync(beat).size < 3) await sleep(20); // the worker is running
    r.cancel(runId);
    const d = await finished;
    expect(d).toEqual({ runId, status: 'cancelled' });
    expect(r.activeRuns()).toEqual([]);
    // Stopped: the heartbeat no longer grows.
    await sleep(100);
    const size = statSync(beat).size;
    await sleep(300);
    expect(statSync(beat).size).toBe(size);
  });
});

describe('web host with an analysis that dies', () => {
  it('reports the run as failed and keeps serving files and runs', async () => {
    tmp = makeTempDir('stayset-web-oom-');
    const root = path.join(tmp.dir, 'projects');
    const staticDir = path.join(tmp.dir, 'renderer');
    for (const d of [root, staticDir]) mkdirSync(d, { recursive: true });
    writeFileSync(path.join(staticDir, 'index.html'), '<!doctype html><title>Stayset</title>');
    const web = await startWebHost({
      root, staticDir, assetsDir: null, userDataDir: path.join(tmp.dir, 'user'),
      runner: { workerUrl: HEAP_HOG, resourceLimits: { maxOldGenerationSizeMb: 24, maxYoungGenerationSizeMb: 4 } },
    });
    try {
      const events = fetchEventSource(`${web.origin}/api/events?token=${web.token}`);
      const host = createWebHostClient({ token: web.token, baseUrl: web.origin, createEventSource: () => events });
      await events.opened;
      const done = new Promise<AnalysisDone>((resolve) => host.onDidFinishAnalysis(resolve));
      const { runId } = await host.runAnalysis(sampleMast());
      expect(await done).toMatchObject({ runId, status: 'failed' });
      // Still up: saves and reads a project.
      const saved = await host.saveAs(sampleMast(), 'after-oom.stayset');
      expect(saved).toMatchObject({ ok: true });
      expect(JSON.parse(readFileSync(path.join(root, 'after-oom.stayset'), 'utf8')).meta.name).toBe(sampleMast().meta!.name);
      expect(await host.kind()).toBe('web');
      events.close();
    } finally {
      await web.close();
    }
  });
});

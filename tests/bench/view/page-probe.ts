/**
 * Measuring main-thread work per interaction in Chromium, for the responsiveness benchmark.
 *
 * In the page (installed with addInitScript, so it works on any build of the app):
 * `__bench.measure(act, until)` waits a frame, marks `bench:start:N`, runs `act` synchronously (a
 * DOM event as a user would cause it), awaits `until` (e.g. a worker's answer shown in the page)
 * and the next frame (`latency`: event to that frame), lets deferred work run for `settleMs`, and
 * marks `bench:end:N`. `autosaves`: the autosave posts that began in that window (the app's
 * 10 s autosave tick serialises the whole project on the main thread: on the 19,800-member net a
 * few hundred ms that the interaction did not cause; the benchmark counts such samples apart).
 *
 * In Node (`mainThreadWork`): the Chrome trace of the run (CDP Tracing) gives every task of the
 * page's main thread (`RunTask`) with its wall time and its thread CPU time; the tasks between the
 * two marks are summed. Thread CPU time does not count time the thread waits for a core, so the
 * figures hold on a loaded machine; wall time inside tasks is given beside it.
 */
import type { CDPSession } from 'playwright-core';

export const PAGE_PROBE = String.raw`
performance.setResourceTimingBufferSize(100000);
window.__bench = {
  n: 0,
  frame() { return new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0))); },
  wait(ms) { return new Promise((r) => setTimeout(r, ms)); },
  /** Resolves when the text of the first element matching selector differs from before (false after timeoutMs). */
  textChange(selector, before, timeoutMs) {
    return new Promise((resolve) => {
      const t = setTimeout(() => { obs.disconnect(); resolve(false); }, timeoutMs);
      const check = () => { const el = document.querySelector(selector); if (el && el.textContent !== before) { clearTimeout(t); obs.disconnect(); resolve(true); } };
      const obs = new MutationObserver(check);
      obs.observe(document.body, { subtree: true, childList: true, characterData: true });
      check();
    });
  },
  async measure(act, until, settleMs = 300) {
    await this.frame();
    const id = ++this.n;
    performance.mark('bench:start:' + id);
    const t0 = performance.now();
    act();
    if (until) await until();
    await this.frame();
    const latency = performance.now() - t0;
    await this.wait(settleMs);
    performance.mark('bench:end:' + id);
    const t1 = performance.now();
    const autosaves = performance.getEntriesByType('resource').filter((e) => /\/autosave$/.test(e.name) && e.startTime >= t0 - 1 && e.startTime <= t1).length;
    return { id, latency, autosaves };
  },
};
`;

export interface Measured {
  /** From the event to the next frame after the page showed the outcome, ms. */
  latency: number;
  /** Thread CPU time of the page's main-thread tasks in the window, ms. */
  cpu: number;
  /** Wall time of those tasks (includes waiting inside them, e.g. for the GPU process), ms. */
  wall: number;
  /** Longest single task (wall), ms. */
  longest: number;
  /** Worker solve time the page reported (live slider), ms. */
  workerMs?: number;
  /** Autosave posts that began in the window (their work is not the interaction's). */
  autosaves?: number;
}

interface TraceEvent { name: string; ph: string; pid: number; tid: number; ts: number; dur?: number; tdur?: number; cat?: string; args?: { name?: string } }

export class Tracer {
  private events: TraceEvent[] = [];
  constructor(private readonly cdp: CDPSession) {
    cdp.on('Tracing.dataCollected', (e) => { for (const ev of e.value as unknown as TraceEvent[]) this.events.push(ev); });
  }

  async start(): Promise<void> {
    this.events = [];
    await this.cdp.send('Tracing.start', { categories: 'disabled-by-default-devtools.timeline,devtools.timeline,blink.user_timing', transferMode: 'ReportEvents' } as never);
  }

  async stop(): Promise<void> {
    const done = new Promise((r) => this.cdp.once('Tracing.tracingComplete', r));
    await this.cdp.send('Tracing.end');
    await done;
  }

  /** CPU and wall time of the main-thread tasks between bench:start:id and bench:end:id. */
  mainThreadWork(id: number): Omit<Measured, 'latency'> {
    const start = this.events.find((e) => e.name === `bench:start:${id}`);
    const end = this.events.find((e) => e.name === `bench:end:${id}`);
    if (!start || !end) return { cpu: NaN, wall: NaN, longest: NaN };
    const mainThreads = new Set(this.events.filter((e) => e.ph === 'M' && e.name === 'thread_name' && e.args?.name === 'CrRendererMain' && e.pid === start.pid).map((e) => e.tid));
    const tasks = this.events
      .filter((e) => e.ph === 'X' && e.name === 'RunTask' && e.pid === start.pid && mainThreads.has(e.tid) && e.ts + (e.dur ?? 0) >= start.ts && e.ts <= end.ts)
      .sort((a, b) => a.ts - b.ts);
    let cpu = 0, wall = 0, longest = 0, coveredUntil = -Infinity;
    for (const t of tasks) {
      if (t.ts < coveredUntil) continue; // nested in the previous task
      coveredUntil = t.ts + (t.dur ?? 0);
      cpu += (t.tdur ?? t.dur ?? 0) / 1000;
      wall += (t.dur ?? 0) / 1000;
      longest = Math.max(longest, (t.dur ?? 0) / 1000);
    }
    return { cpu, wall, longest };
  }
}

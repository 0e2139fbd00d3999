/**
 * CPU profile of the page's main thread during one interaction of the responsiveness benchmark:
 * a members-table edit on the 19,800-cable net after a run (default) or a live-slider step on the
 * demo (`--slider`). Prints the functions with the most self time and the most total time (ms,
 * from Chrome's sampling profiler over CDP). The renderer of this tree is built first, not minified.
 * Run: `node --import tsx tests/bench/view/profile-net-edit.ts [--slider]`.
 */
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { CDPSession, Page } from 'playwright-core';
import type { ProjectFile } from '../../../solver/index.ts';
import { build } from 'vite';
import { REPO } from '../../e2e/serve-app.ts';
import { launchBenchBrowser } from './bench-browser.ts';
import { PAGE_PROBE } from './page-probe.ts';
import { failingNet, runAnalysis, startBenchHost } from './responsiveness-bench.ts';

interface ProfileNode { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; children?: number[] }
interface Profile { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] }

/** Self and total ms per function (name, file, line) of a CPU profile. */
export function summariseProfile(p: Profile, top = 25): string {
  const byId = new Map(p.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of p.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const key = (n: ProfileNode) => `${n.callFrame.functionName || '(anonymous)'} ${path.basename(n.callFrame.url)}:${n.callFrame.lineNumber + 1}`;
  const self = new Map<string, number>();
  const total = new Map<string, number>();
  p.samples.forEach((id, i) => {
    const ms = (p.timeDeltas[i] ?? 0) / 1000;
    const n = byId.get(id)!;
    self.set(key(n), (self.get(key(n)) ?? 0) + ms);
    const seen = new Set<string>();
    for (let c: number | undefined = id; c !== undefined; c = parent.get(c)) {
      const k = key(byId.get(c)!);
      if (!seen.has(k)) { seen.add(k); total.set(k, (total.get(k) ?? 0) + ms); }
    }
  });
  const list = (m: Map<string, number>) => [...m].sort((a, b) => b[1] - a[1]).slice(0, top).map(([k, v]) => `${v.toFixed(1).padStart(8)}  ${k}`).join('\n');
  return `self ms:\n${list(self)}\n\ntotal ms:\n${list(total)}`;
}

async function profiled(cdp: CDPSession, act: () => Promise<unknown>): Promise<Profile> {
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  await act();
  const { profile } = await cdp.send('Profiler.stop');
  return profile as unknown as Profile;
}

async function netEdit(page: Page, cdp: CDPSession, url: string, net: ProjectFile): Promise<Profile> {
  await page.goto(url);
  await page.getByTestId('status-line').filter({ hasText: `${net.members.length} members` }).waitFor({ timeout: 120_000 });
  await runAnalysis(page, 600_000);
  await page.getByTestId('tab-members').click();
  const m = net.members[0];
  const cell = page.locator(`[data-testid="table-members"] tr[data-row-id="${m.id}"] td[data-col="pretension"]`);
  await cell.locator('.cell-text').click();
  await cell.locator('.cell-editor').fill(((m.pretension! / 1000) * 1.01).toFixed(3));
  return profiled(cdp, () => page.evaluate(() => (window as unknown as { __bench: { measure: (a: () => void, u?: unknown, s?: number) => Promise<unknown> } }).__bench.measure(() => {
    document.querySelector('[data-testid="table-members"] .cell-editor')!.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, cancelable: true }));
  }, undefined, 600)));
}

async function sliderStep(page: Page, cdp: CDPSession, url: string): Promise<Profile> {
  await page.goto(url);
  await page.getByTestId('project-name').filter({ hasText: 'demo-mast' }).waitFor({ timeout: 60_000 });
  await runAnalysis(page, 180_000);
  await page.getByTestId('right-tab-tuning').click();
  const setupBox = page.locator('details:has([data-testid="tuning-setup"])');
  if (!(await setupBox.evaluate((d) => (d as HTMLDetailsElement).open))) await setupBox.locator('summary').click();
  await page.getByTestId('tuning-new-variable').selectOption('mast/guys level 1');
  await page.getByTestId('tuning-add-variable').click();
  const step = (f: number) => page.evaluate((x) => {
    const s = document.querySelector<HTMLInputElement>('[data-testid="pretension-slider"]')!;
    const before = document.querySelector('[data-testid="live-step"]')?.textContent ?? null;
    const b = (window as unknown as { __bench: { measure: (a: () => void, u?: () => Promise<unknown>) => Promise<unknown>; textChange: (s: string, b: string | null, ms: number) => Promise<boolean> } }).__bench;
    return b.measure(() => { s.value = String(Number(s.min) + (Number(s.max) - Number(s.min)) * x); s.dispatchEvent(new Event('input', { bubbles: true })); }, () => b.textChange('[data-testid="live-step"]', before, 60_000));
  }, f);
  await step(0.3);
  return profiled(cdp, async () => { for (let k = 1; k <= 3; k++) await step(0.3 + 0.04 * k); });
}

const work = await mkdtemp(path.join(os.tmpdir(), 'stayset-profile-'));
const browser = await launchBenchBrowser();
try {
  const dir = path.join(work, 'renderer');
  // Not minified, so the profile names the functions.
  await build({ configFile: path.join(REPO, 'vite.config.ts'), logLevel: 'warn', build: { outDir: dir, emptyOutDir: true, minify: false } });
  await browser.context.addInitScript(PAGE_PROBE);
  const slider = process.argv.includes('--slider');
  let file: string;
  if (slider) {
    file = path.join(work, 'demo-mast.stayset');
    await cp(path.join(REPO, 'assets', 'demo-mast.stayset'), file);
  } else {
    file = path.join(work, 'net-19800.stayset');
    await writeFile(file, JSON.stringify(failingNet()));
  }
  const host = await startBenchHost(work, dir, file, 'profile');
  const page = await browser.context.newPage();
  const cdp = await browser.context.newCDPSession(page);
  try {
    const profile = slider ? await sliderStep(page, cdp, host.url) : await netEdit(page, cdp, host.url, JSON.parse(await readFile(file, 'utf8')) as ProjectFile);
    console.log(summariseProfile(profile));
  } finally {
    await page.close();
    await host.close();
  }
} finally {
  await browser.close();
  await rm(work, { recursive: true, force: true });
}

/**
 * Responsiveness of the browser edition, measured in headless Chromium (software WebGL) on the
 * real web host: main-thread work per interaction (page-probe.ts) and the time to the next frame.
 *
 *  - Demo mast (assets/demo-mast.stayset) after a run: change the result case, the colour mode,
 *    the selection (a row of the results table), one live pretension-slider step (main-thread
 *    work beside the worker's solve, which the page reports) and a members-table edit.
 *  - A square net of 100 × 100 cells (19,800 cables, tests/bench/square-net.ts) whose strand is
 *    weak enough that about half the cables fail the design check, after a run: a members-table edit.
 *
 * Targets (not asserted): demo interactions < 100 ms of main-thread work, a slider step < 50 ms
 * beside the worker's solve, a table edit on the net < 300 ms.
 *
 * With `--baseline REV` (or STAYSET_BENCH_BASELINE) the renderer of git revision REV is built too
 * and measured in the same run, on the same host and browser. Run alone:
 * `node --import tsx tests/bench/view/responsiveness-bench.ts [--baseline REV] [--repeat N] [--no-net]`.
 */
import { execFileSync, execSync } from 'node:child_process';
import { cp, mkdir, mkdtemp, readFile, rm, symlink, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import type { ProjectFile } from '../../../solver/index.ts';
import { startWebHost } from '../../../main/web/web-server.ts';
import type { Browser } from '../../e2e/browser.ts';
import { launchBenchBrowser } from './bench-browser.ts';
import { buildRenderer, REPO, SCREENSHOTS } from '../../e2e/serve-app.ts';
import { squareNetProject } from '../square-net.ts';
import { PAGE_PROBE, Tracer, type Measured } from './page-probe.ts';

const GUY_LEVEL = 'mast/guys level 1';
const ROW_PX = 24; // DataTable row height

interface Row { what: string; samples: Measured[] }
/** What the page returns for one interaction; the trace adds the main-thread work. */
interface Taken { id: number; latency: number; workerMs?: number; autosaves?: number }
interface TakenRow { what: string; samples: Taken[] }

/** The net of the benchmark: 19,800 cables; a strand of 140 kN breaking load makes about half of them fail. */
export function failingNet(): ProjectFile {
  const p = squareNetProject(100);
  p.sections[0].breakingLoad = 140e3;
  return p;
}

async function buildBaseline(rev: string, work: string): Promise<string> {
  const src = path.join(work, `src-${rev}`);
  await mkdir(src, { recursive: true });
  execSync(`git archive ${rev} | tar -x -C ${JSON.stringify(src)}`, { cwd: REPO, stdio: ['ignore', 'ignore', 'inherit'] });
  await symlink(path.join(REPO, 'node_modules'), path.join(src, 'node_modules'));
  const out = path.join(work, `renderer-${rev}`);
  execFileSync(process.execPath, [path.join(REPO, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn', '--outDir', out, '--emptyOutDir'], { cwd: src, stdio: 'inherit' });
  return out;
}

type BenchWindow = Window & { __bench: { measure: (act: () => void, until?: () => Promise<unknown>, settle?: number) => Promise<Taken>; textChange: (s: string, before: string | null, ms: number) => Promise<boolean> } };

async function runAnalysis(page: Page, timeoutMs: number): Promise<void> {
  await page.getByTestId('run').click();
  await page.waitForTimeout(500);
  // The page may be busy for long stretches (checks of a large model): poll in the page, patiently.
  await page.waitForFunction(() => document.querySelector('[data-testid="analysis-state"]')?.textContent !== 'analysis running'
    && document.querySelector('[data-testid="run"]') !== null, null, { timeout: timeoutMs, polling: 500 });
}

async function selectMeasured(page: Page, testId: string, value: string): Promise<Taken> {
  return page.evaluate(([id, v]) => (window as unknown as BenchWindow).__bench.measure(() => {
    const s = document.querySelector<HTMLSelectElement>(`[data-testid="${id}"]`)!;
    s.value = v;
    s.dispatchEvent(new Event('change', { bubbles: true }));
  }), [testId, value] as const);
}

/** Open the members-table cell editor of member `index`, type `text`, and measure the Enter that commits it. */
async function tableEdit(page: Page, id: string, index: number, col: string, text: string): Promise<Taken> {
  await page.getByTestId('tab-members').click();
  await page.locator('[data-testid="table-members"] .scroller').evaluate((el, top) => { el.scrollTop = top; el.dispatchEvent(new Event('scroll')); }, Math.max(0, index * ROW_PX - 100));
  const cell = page.locator(`[data-testid="table-members"] tr[data-row-id="${id}"] td[data-col="${col}"]`);
  await cell.locator('.cell-text').click();
  await cell.locator('.cell-editor').fill(text);
  return page.evaluate(() => (window as unknown as BenchWindow).__bench.measure(() => {
    const ed = document.querySelector<HTMLInputElement>('[data-testid="table-members"] .cell-editor')!;
    ed.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, cancelable: true }));
  }, undefined, 600));
}

async function demoRows(page: Page, url: string, project: ProjectFile, repeat: number, shots: string | null, tracer: Tracer): Promise<TakenRow[]> {
  await page.goto(url);
  await page.getByTestId('project-name').filter({ hasText: 'demo-mast' }).waitFor({ timeout: 60_000 });
  await runAnalysis(page, 180_000);
  await page.getByTestId('results-tab-members').click();
  await tracer.start();
  const cases = await page.locator('[data-testid="case-select"] option').evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value));
  const rows: TakenRow[] = [];
  const idle: TakenRow = { what: 'demo mast: no interaction (floor: frame and 300 ms wait)', samples: [] };
  for (let k = 0; k < repeat; k++) idle.samples.push(await page.evaluate(() => (window as unknown as BenchWindow).__bench.measure(() => undefined)));
  rows.push(idle);
  const caseRow: TakenRow = { what: 'demo mast: change result case', samples: [] };
  for (let k = 1; k <= repeat; k++) caseRow.samples.push(await selectMeasured(page, 'case-select', cases[k % cases.length]));
  rows.push(caseRow);
  const modes = ['utilisation', 'checks', 'tension'];
  const colourRow: TakenRow = { what: 'demo mast: change colour mode', samples: [] };
  for (let k = 0; k < repeat; k++) colourRow.samples.push(await selectMeasured(page, 'colour-mode', modes[k % modes.length]));
  rows.push(colourRow);
  const selRow: TakenRow = { what: 'demo mast: select a member (results row)', samples: [] };
  for (let k = 0; k < repeat; k++) {
    selRow.samples.push(await page.evaluate((n) => (window as unknown as BenchWindow).__bench.measure(() => {
      const trs = document.querySelectorAll<HTMLElement>('[data-testid="results-table"] tr[data-member]');
      trs[(3 * n + 1) % trs.length].click();
    }), k));
  }
  rows.push(selRow);
  if (shots) await page.screenshot({ path: path.join(SCREENSHOTS, `${shots}-demo-selected.png`) });

  // Live slider: one tuning variable (the first guy level), then single steps.
  await page.getByTestId('right-tab-tuning').click();
  // The demo has tuning variables of its own (levels 2 and 3): its set-up starts folded.
  const setupBox = page.locator('details:has([data-testid="tuning-setup"])');
  if (!(await setupBox.evaluate((d) => (d as HTMLDetailsElement).open))) await setupBox.locator('summary').click();
  await page.getByTestId('tuning-new-variable').selectOption(GUY_LEVEL);
  await page.getByTestId('tuning-add-variable').click();
  await page.getByTestId('pretension-slider').waitFor();
  const sliderRow: TakenRow = { what: 'demo mast: live slider step (main thread beside the worker)', samples: [] };
  for (let k = 0; k <= repeat; k++) {
    const m = await page.evaluate((n) => {
      const s = document.querySelector<HTMLInputElement>('[data-testid="pretension-slider"]')!;
      const lo = Number(s.min), hi = Number(s.max);
      const before = document.querySelector('[data-testid="live-step"]')?.textContent ?? null;
      const b = (window as unknown as BenchWindow).__bench;
      return b.measure(() => {
        s.value = String(lo + (hi - lo) * (0.3 + 0.04 * n));
        s.dispatchEvent(new Event('input', { bubbles: true }));
      }, () => b.textChange('[data-testid="live-step"]', before, 60_000)).then((r) => ({ ...r, text: document.querySelector('[data-testid="live-step"]')?.textContent ?? '' }));
    }, k);
    const solved = /solved in (\d+) ms/.exec(m.text);
    if (k > 0) sliderRow.samples.push({ id: m.id, latency: m.latency, autosaves: m.autosaves, workerMs: solved ? Number(solved[1]) : undefined }); // step 0 warms the worker
  }
  rows.push(sliderRow);
  if (shots) await page.screenshot({ path: path.join(SCREENSHOTS, `${shots}-demo-slider.png`) });

  const index = project.members.findIndex((m) => m.kind === 'cable' && m.pretension !== undefined);
  const guy = project.members[index];
  const editRow: TakenRow = { what: 'demo mast: members-table edit (pretension)', samples: [] };
  for (let k = 0; k < repeat; k++) editRow.samples.push(await tableEdit(page, guy.id, index, 'pretension', ((guy.pretension! / 1000) * (1 + 0.01 * (k + 1))).toFixed(3)));
  rows.push(editRow);
  return rows;
}

async function netRows(page: Page, url: string, project: ProjectFile, repeat: number, shots: string | null, tracer: Tracer): Promise<TakenRow[]> {
  await page.goto(url);
  await page.getByTestId('status-line').filter({ hasText: `${project.members.length} members` }).waitFor({ timeout: 120_000 });
  await runAnalysis(page, 600_000);
  if (shots) await page.screenshot({ path: path.join(SCREENSHOTS, `${shots}-net-after-run.png`) });
  await tracer.start();
  const m = project.members[0];
  const row: TakenRow = { what: `net ${project.members.length} members, after a run: members-table edit`, samples: [] };
  for (let k = 0; k < repeat; k++) row.samples.push(await tableEdit(page, m.id, 0, 'pretension', ((m.pretension! / 1000) * (1 + 0.01 * (k + 1))).toFixed(3)));
  return [row];
}

const median = (xs: number[]) => { const s = [...xs].sort((a, b) => a - b); return s.length ? s[Math.floor((s.length - 1) / 2)] : NaN; };

/**
 * Median, max, wall and frame of a row. Samples in which the app's autosave tick posted the
 * project are left out of the figures when others remain (their count is shown as `a`).
 */
function summary(row: Row | undefined): string {
  if (!row || !row.samples.length) return '—'.padStart(30);
  const clean = row.samples.filter((s) => !s.autosaves);
  const r = { ...row, samples: clean.length ? clean : row.samples };
  const med = (f: (m: Measured) => number) => median(r.samples.map(f));
  const worker = r.samples.every((s) => s.workerMs !== undefined) ? `w${med((s) => s.workerMs!).toFixed(0)}` : '';
  const saved = row.samples.length - clean.length;
  return `${med((s) => s.cpu).toFixed(0).padStart(5)} ${Math.max(...r.samples.map((s) => s.cpu)).toFixed(0).padStart(5)} ${med((s) => s.wall).toFixed(0).padStart(5)} ${med((s) => s.latency).toFixed(0).padStart(6)} ${worker.padStart(5)}${saved ? ` a${saved}` : ''}`;
}

export function printResponsiveness(builds: { label: string; rows: Row[] }[]): void {
  console.log('\nResponsiveness of the browser edition (headless Chromium, software WebGL): main-thread ms per interaction');
  console.log('cpu = main-thread CPU time of the page\'s tasks (median, max); wall = their wall time; frame = event to the next frame; w = worker solve (medians, ms);');
  console.log('a = samples left out because the app\'s autosave tick posted the project during them');
  const header = builds.map((b) => `${b.label.slice(0, 10).padEnd(10)}: cpu  max  wall  frame     `).join(' | ');
  console.log(`${'interaction'.padEnd(62)} ${header}`);
  const whats = builds[0].rows.map((r) => r.what);
  for (const what of whats) console.log(`${what.padEnd(62)} ${builds.map((b) => summary(b.rows.find((r) => r.what === what)).padEnd(31)).join(' | ')}`);
  console.log('targets: demo < 100 ms; slider step < 50 ms beside the worker; net table edit < 300 ms');
}

/** Start the web host on `file` with the renderer in `staticDir` (for the benchmark and profiling). */
export async function startBenchHost(work: string, staticDir: string, file: string, tag: string) {
  const data = path.join(work, `data-${tag}`);
  await mkdir(data, { recursive: true });
  return startWebHost({ root: work, staticDir, assetsDir: null, userDataDir: data, port: 0, initialPath: file });
}

export { demoRows, runAnalysis };

export async function runResponsivenessBenchmark(baseline = process.env.STAYSET_BENCH_BASELINE, options: { repeat?: number; net?: boolean } = {}): Promise<void> {
  const repeat = options.repeat ?? 5;
  const work = await mkdtemp(path.join(os.tmpdir(), 'stayset-bench-view-'));
  let browser: Browser | null = null;
  try {
    await mkdir(SCREENSHOTS, { recursive: true });
    const builds: { label: string; dir: string }[] = [];
    if (baseline) builds.push({ label: baseline, dir: await buildBaseline(baseline, work) });
    builds.push({ label: 'this tree', dir: await buildRenderer(path.join(work, 'renderer-now')) });
    const demoFile = path.join(work, 'demo-mast.stayset');
    await cp(path.join(REPO, 'assets', 'demo-mast.stayset'), demoFile);
    const demo = JSON.parse(await readFile(demoFile, 'utf8')) as ProjectFile;
    const net = failingNet();
    const netFile = path.join(work, 'net-19800.stayset');
    await writeFile(netFile, JSON.stringify(net));
    browser = await launchBenchBrowser();
    await browser.context.addInitScript(PAGE_PROBE);
    const results: { label: string; rows: Row[] }[] = [];
    let hostRuns = 0;
    for (const b of builds) {
      const rows: Row[] = [];
      const shots = b.label === 'this tree' ? 'bench-now' : 'bench-base';
      for (const [file, measureRows] of [[demoFile, demoRows] as const, ...(options.net === false ? [] : [[netFile, netRows] as const])]) {
        const data = path.join(work, `data-${hostRuns++}`);
        await mkdir(data);
        const host = await startWebHost({ root: work, staticDir: b.dir, assetsDir: null, userDataDir: data, port: 0, initialPath: file });
        const page = await browser.context.newPage();
        const tracer = new Tracer(await browser.context.newCDPSession(page));
        try {
          const taken = await (measureRows as typeof demoRows)(page, host.url, file === demoFile ? demo : net, repeat, shots, tracer);
          await tracer.stop();
          for (const r of taken) rows.push({ what: r.what, samples: r.samples.map((t) => ({ ...t, ...tracer.mainThreadWork(t.id) })) });
        } catch (e) {
          console.log(`${b.label}: ${path.basename(file)} stopped: ${(e as Error).message}`);
        } finally {
          await page.close();
          await host.close();
        }
      }
      results.push({ label: b.label, rows });
    }
    printResponsiveness(results);
  } finally {
    await browser?.close();
    await rm(work, { recursive: true, force: true });
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const arg = (name: string) => { const i = process.argv.indexOf(name); return i > 0 ? process.argv[i + 1] : undefined; };
  await runResponsivenessBenchmark(arg('--baseline'), { repeat: arg('--repeat') ? Number(arg('--repeat')) : undefined, net: !process.argv.includes('--no-net') });
}

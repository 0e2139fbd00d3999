/**
 * The printed schedule: HTML → PDF in headless Chromium (playwright-core, the Debian chromium),
 * A4 and US Letter; pages rendered to PNG with poppler's pdftoppm and read back with pdftotext.
 * Artifacts go to test-artifacts/schedule/ for a human look.
 * Page sizes: ISO 216 A4 = 210 × 297 mm = 595.28 × 841.89 pt; ANSI Letter = 8.5 × 11 in = 612 × 792 pt.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type BrowserContext } from 'playwright-core';
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { installationData, referenceCaseId, runChecks, solveModes, solveProject, tuneProject, solveNamedCases } from '../../solver/index.ts';
import { buildSchedule, scheduleHtml, SCHEDULE_CAUTION } from '../../main/common/schedule/index.ts';
import { mastProject } from '../main/common/schedule/mast-fixture.ts';
import { build } from 'vite';
import vue from '@vitejs/plugin-vue';
import { createServer, type Server } from 'node:http';
import type { ScheduleDocument } from '../../main/common/schedule/index.ts';
import { CHROMIUM, SKIP_BROWSER_TESTS, requireBrowserTools } from './browser-tools.ts';

const ARTIFACTS = resolve('test-artifacts/schedule');
let context: BrowserContext;
let profile: string;
let html: { a4: string; letter: string };
let docA4: ScheduleDocument;

beforeAll(async () => {
  requireBrowserTools(['chromium', 'poppler']);
  const project = mastProject();
  project.tuning = {
    variables: [{ group: 'mast/guys level 1', by: 'pretension' }, { group: 'mast/guys level 2', by: 'pretension' }],
    targets: [
      { kind: 'tensionShare', group: 'mast/guys level 1', share: 0.1 },
      { kind: 'tensionShare', group: 'mast/guys level 2', share: 0.1 },
      { kind: 'noSlack', group: 'mast/guys', case: 'wind0' },
    ],
  };
  const tuning = tuneProject(project, { solveCases: solveNamedCases });
  const tuned = tuning.project;
  const report = solveProject(tuned).report;
  const modes = solveModes(tuned, referenceCaseId(tuned), { count: 6 }).modal;
  const revised = { ...tuned, report: { documentNumber: 'HF-CALC-7', revisions: [{ revision: 'A', date: '2026-11-30', description: 'For review', by: 'A. N. Engineer', checkedBy: 'C. Hecker' }] } };
  const src = { project: revised, report, checks: runChecks(tuned, report), installation: installationData(tuned), tuning, modes };
  docA4 = buildSchedule(src, { issueDate: '2026-12-01', paper: 'a4' });
  html = {
    a4: scheduleHtml(docA4),
    letter: scheduleHtml(buildSchedule(src, { issueDate: '2026-12-01', paper: 'letter', units: 'US' })),
  };
  mkdirSync(ARTIFACTS, { recursive: true });
  profile = mkdtempSync(join(tmpdir(), 'stayset-print-'));
  context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM, headless: true,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

function pdfInfo(pdf: string): { pages: number; width: number; height: number } {
  const out = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
  const pages = Number(/Pages:\s+(\d+)/.exec(out)![1]);
  const size = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(out)!;
  return { pages, width: Number(size[1]), height: Number(size[2]) };
}

/** Share of pixels darker than mid-grey in a PNG rendered by pdftoppm (-gray -> PGM is simpler to read). */
function inkShare(pgm: Buffer): number {
  // Binary PGM (P5): header "P5\n<w> <h>\n<max>\n" then w·h bytes.
  const text = pgm.subarray(0, 64).toString('latin1');
  const m = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(text)!;
  const offset = m[0].length;
  const w = Number(m[1]), h = Number(m[2]);
  let dark = 0;
  for (let i = 0; i < w * h; i++) if (pgm[offset + i] < 128) dark++;
  return dark / (w * h);
}

describe.skipIf(SKIP_BROWSER_TESTS)('printed member tension schedule', () => {
  it('prints the demo mast (9 guys, 441 mast bars) in a few numbered pages through `stayset schedule --pdf`', () => {
    const bin = resolve('dist/cli/stayset.mjs');
    const pdf = join(ARTIFACTS, 'demo-mast-schedule.pdf');
    const all = join(ARTIFACTS, 'demo-mast-schedule-all.pdf');
    for (const [out, extra] of [[pdf, []], [all, ['--all']]] as const) {
      execFileSync(process.execPath, [bin, 'schedule', 'assets/demo-mast.stayset', '--pdf', out, '--date', '2026-12-02', ...extra], { env: { ...process.env, STAYSET_CHROMIUM: CHROMIUM }, stdio: 'pipe' });
    }
    // Before the listing choice the same schedule printed all 450 members in full (105 A4 pages,
    // measured when this test was written); cables in full and the bars summarised fit in a few.
    const pages = pdfInfo(pdf).pages;
    expect(pages).toBeLessThanOrEqual(12);
    expect(pdfInfo(all).pages).toBeLessThanOrEqual(12);
    expectPageNumbers(pdf, pages);
    const text = execFileSync('pdftotext', ['-layout', all, '-'], { encoding: 'utf8' });
    expect(text).toContain('Other members listed, summarised per group');
    expect(text).toContain('SR-CALC-001');
    for (const f of readdirSync(ARTIFACTS)) if (f.startsWith('demo-mast-schedule-') && f.endsWith('.png')) rmSync(join(ARTIFACTS, f));
    execFileSync('pdftoppm', ['-r', '60', '-png', pdf, join(ARTIFACTS, 'demo-mast-schedule')]);
  });

  for (const [paper, format, w, h] of [['a4', 'A4', 595.28, 841.89], ['letter', 'Letter', 612, 792]] as const) {
    it(`prints on ${format} with the caution, readable pages and repeating headers`, async () => {
      const page = await context.newPage();
      await page.setContent(html[paper], { waitUntil: 'load' });
      const pdf = join(ARTIFACTS, `schedule-${paper}.pdf`);
      writeFileSync(join(ARTIFACTS, `schedule-${paper}.html`), html[paper]);
      await page.pdf({ path: pdf, format, printBackground: true });
      await page.close();

      const info = pdfInfo(pdf);
      expect(info.pages).toBeGreaterThanOrEqual(1);
      // Chromium rounds A4 to 8.27 × 11.7 in (595.92 × 842.4 pt): allow 1.5 pt.
      expect(Math.abs(info.width - w)).toBeLessThan(1.5);
      expect(Math.abs(info.height - h)).toBeLessThan(1.5);

      const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
      expect(text.replace(/\s+/g, ' ')).toContain(SCHEDULE_CAUTION);
      expectPageNumbers(pdf, info.pages);
      expect(text).toContain('C. Hecker');
      expect(text).toContain('Harrow Fell relay mast');
      expect(text).toContain('Installation temperature table');
      expect(text).toContain(paper === 'letter' ? 'kip' : 'kN');

      for (const f of readdirSync(ARTIFACTS)) if (f.startsWith(`schedule-${paper}-`)) rmSync(join(ARTIFACTS, f));
      execFileSync('pdftoppm', ['-r', '60', '-png', pdf, join(ARTIFACTS, `schedule-${paper}`)]);
      const pngs = readdirSync(ARTIFACTS).filter((f) => f.startsWith(`schedule-${paper}-`) && f.endsWith('.png'));
      expect(pngs.length).toBe(info.pages);
      // Not blank: every page carries ink (grey render of the same pages).
      const grey = join(profile, `grey-${paper}`);
      execFileSync('pdftoppm', ['-r', '30', '-gray', pdf, grey]);
      for (const f of readdirSync(profile).filter((x) => x.startsWith(`grey-${paper}`))) {
        const share = inkShare(readFileSync(join(profile, f)));
        expect(share, f).toBeGreaterThan(0.005);
        expect(share, f).toBeLessThan(0.6);
      }
    });
  }
});

/** "page k of n" on every page k of the PDF (pdftotext page by page). */
function expectPageNumbers(pdf: string, pages: number): void {
  for (let k = 1; k <= pages; k++) {
    const text = execFileSync('pdftotext', ['-f', String(k), '-l', String(k), '-layout', pdf, '-'], { encoding: 'utf8' });
    expect(text, `page ${k}`).toContain(`page ${k} of ${pages}`);
  }
}

/** Numbers as printed (e.g. 22.7, -167.5, 0.253), as a set. */
function numberTokens(text: string): Set<string> {
  return new Set(text.match(/-?\d+\.\d+/g) ?? []);
}

/** The two renderer components built with Vite + the Vue plugin into one page, served on loopback. */
const MAIN_TS = (print: string, panel: string) => `import { createApp, h, reactive } from 'vue';
import SchedulePrint from '${print}';
import TuningPanel from '${panel}';
const w = window as any;
if (location.hash === '#tuning') {
  w.__events = [];
  const props = reactive(w.__PANEL_PROPS__);
  createApp({ render: () => h(TuningPanel, {
    ...props,
    onDrag: (g: string, p: number) => w.__events.push(['drag', g, p]),
    onCommit: (g: string, p: number) => w.__events.push(['commit', g, p]),
    onRunTuning: () => w.__events.push(['runTuning']),
    'onUpdate:selectedGroup': (id: string) => { w.__events.push(['select', id]); props.selectedGroup = id; },
  }) }).mount('#app');
} else {
  createApp(SchedulePrint, { doc: w.__STAYSET_DOC__ }).mount('#app');
}
`;

describe.skipIf(SKIP_BROWSER_TESTS)('the renderer schedule components', () => {
  let server: Server;
  let base: string;
  const work = join(ARTIFACTS, 'vue-print-build');

  beforeAll(async () => {
    // Inside the repository (ignored test-artifacts/) so 'vue' resolves from node_modules.
    rmSync(work, { recursive: true, force: true });
    mkdirSync(work, { recursive: true });
    const file = (f: string) => resolve(`renderer/components/schedule/${f}`).replace(/\\/g, '/');
    writeFileSync(join(work, 'index.html'), '<!DOCTYPE html><html><head><meta charset="utf-8"></head><body><div id="app"></div><script type="module" src="./main.ts"></script></body></html>');
    writeFileSync(join(work, 'main.ts'), MAIN_TS(file('SchedulePrint.vue'), file('TuningPanel.vue')));
    const out = join(work, 'dist');
    await build({ configFile: false, root: work, base: './', logLevel: 'warn', plugins: [vue()], build: { outDir: out, emptyOutDir: true } });
    server = createServer((req, res) => {
      const name = (req.url ?? '/').split('?')[0];
      const f = join(out, name === '/' ? 'index.html' : name);
      if (!f.startsWith(out) || !existsSync(f)) { res.statusCode = 404; res.end(); return; }
      res.setHeader('content-type', f.endsWith('.js') ? 'text/javascript' : f.endsWith('.css') ? 'text/css' : 'text/html');
      res.end(readFileSync(f));
    });
    await new Promise<void>((ok) => server.listen(0, '127.0.0.1', ok));
    base = `http://127.0.0.1:${(server.address() as { port: number }).port}/`;
  });

  afterAll(() => {
    server?.close();
    rmSync(work, { recursive: true, force: true });
  });

  it('SchedulePrint.vue prints the same schedule model as the standalone HTML', async () => {
    const page = await context.newPage();
    await page.addInitScript((d) => { (window as unknown as { __STAYSET_DOC__: unknown }).__STAYSET_DOC__ = d; }, docA4);
    await page.goto(base);
    await page.waitForSelector('[data-testid="schedule-print"]');
    const pdf = join(ARTIFACTS, 'schedule-vue-a4.pdf');
    await page.pdf({ path: pdf, printBackground: true, preferCSSPageSize: true });
    await page.close();
    expect(pdfInfo(pdf).pages).toBeGreaterThanOrEqual(1);
    // The app's print route numbers its pages as the standalone HTML does.
    expectPageNumbers(pdf, pdfInfo(pdf).pages);
    const vueText = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    expect(vueText.replace(/\s+/g, ' ')).toContain(SCHEDULE_CAUTION);
    const htmlText = execFileSync('pdftotext', ['-layout', join(ARTIFACTS, 'schedule-a4.pdf'), '-'], { encoding: 'utf8' });
    // Same model, same formatting: the printed numbers agree.
    const a = numberTokens(vueText), b = numberTokens(htmlText);
    expect(a.size).toBeGreaterThan(50);
    expect([...b].filter((x) => !a.has(x))).toEqual([]);
    expect([...a].filter((x) => !b.has(x))).toEqual([]);
    expect(vueText).toContain('Natural frequencies of the structure');
    expect(vueText).toContain('C. Hecker');
    execFileSync('pdftoppm', ['-r', '60', '-png', pdf, join(ARTIFACTS, 'schedule-vue-a4')]);
  });

  it('TuningPanel.vue emits drag while sliding, commit on release, and group changes', async () => {
    const page = await context.newPage();
    const props = {
      groups: [{ id: 'g1', label: 'guys level 1', value: 20000, min: 5000, max: 45000 }, { id: 'g2', label: 'guys level 2', value: 30000, min: 5000, max: 45000 }],
      selectedGroup: 'g1', caseId: 'dead', units: 'SI', busy: false,
      lastStep: { converged: true, seconds: 0.021, tensionMax: 20500, sag: 0.412 },
      targets: [{ index: 0, target: { kind: 'sag', group: 'g1', case: 'dead', limit: { absolute: 0.3 } }, label: "sag ≤ 0.300 m in 'dead' for 'guys level 1'", value: 0.412, limit: 0.3, unit: 'm', sense: 'atMost', governing: 'G1', met: false }],
      diagnosis: ["sag ≤ 0.300 m in 'dead' for 'guys level 1' needs the pretension of 'guys level 1' above its upper bound 45.0 kN."],
    };
    await page.addInitScript((p) => { (window as unknown as { __PANEL_PROPS__: unknown }).__PANEL_PROPS__ = p; }, props);
    await page.goto(`${base}#tuning`);
    await page.waitForSelector('[data-testid="tuning-panel"]');
    const text = await page.textContent('[data-testid="tuning-panel"]');
    expect(text).toContain('20.00 kN'); // forces to 0.01 kN (main/common/units)
    expect(text).toContain('solved in 21 ms');
    expect(text).toContain('NO');
    expect(text).toContain('above its upper bound 45.0 kN');
    expect(text).toContain('Results are for review by a qualified engineer');
    await page.locator('[data-testid="pretension-slider"]').fill('30000');
    await page.selectOption('[data-testid="tuning-group"]', 'g2');
    await page.click('[data-testid="run-tuning"]');
    const events = await page.evaluate(() => (window as unknown as { __events: unknown[] }).__events);
    expect(events).toContainEqual(['drag', 'g1', 30000]);
    expect(events).toContainEqual(['commit', 'g1', 30000]);
    expect(events).toContainEqual(['select', 'g2']);
    expect(events).toContainEqual(['runTuning']);
    await page.screenshot({ path: join(ARTIFACTS, 'tuning-panel.png') });
    await page.close();
  });
});

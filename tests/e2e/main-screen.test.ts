/**
 * End to end, in headless Chromium against the real web host: open the demo, run the analysis,
 * find tensions in the member table and tension colours in the 3D view, edit a pretension, save,
 * reload and see it persisted (and on disk), and see the messages for bad entries.
 *
 * Reference for the numbers on screen: the same project solved in Node by solveProject (the table
 * must show what the solver computed, converted to kN).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { MemberSpec, ProjectFile, SolveReport } from '../../solver/index.ts';
import { solveProject } from '../../solver/index.ts';
import { launchBrowser, type Browser } from './browser.ts';
import { SKIP_BROWSER_TESTS } from './browser-tools.ts';
import { buildRenderer, SCREENSHOTS, startApp, startBareHost, type AppRig } from './serve-app.ts';
import { pixelStats } from './pixels.ts';
import { TENSION_STOPS } from '../../renderer/view3d/colour-scale.ts';

let rig: AppRig;
let browser: Browser;
let page: Page;
let project: ProjectFile;
let guy: MemberSpec;
const pageErrors: string[] = [];
let solved: SolveReport | null = null;
/** The demo as opened, solved in Node: what the screen must show. */
const reference = (): SolveReport => (solved ??= solveProject(project).report);

const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, name) });
const to255 = (c: readonly number[]) => c.map((v) => Math.round(v * 255));
const MEMBER_ROW_PX = 24; // DataTable row height

beforeAll(async () => {
  await mkdir(SCREENSHOTS, { recursive: true });
  await buildRenderer();
  rig = await startApp();
  project = JSON.parse(await readFile(rig.demoPath, 'utf8')) as ProjectFile;
  guy = project.members.find((m) => m.kind === 'cable' && m.pretension !== undefined)!;
  browser = await launchBrowser();
  page = await browser.context.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('console', (m) => { if (m.type() === 'error' && !m.text().includes('404')) pageErrors.push(m.text()); });
});

afterAll(async () => {
  await browser?.close();
  await rig?.close();
});

/** The members-table cell of `id`, scrolled into the table's window. */
async function membersCell(id: string, col: string) {
  await page.getByTestId('tab-members').click();
  const index = project.members.findIndex((m) => m.id === id);
  await page.locator('[data-testid="table-members"] .scroller').evaluate((el, top) => {
    el.scrollTop = top;
    el.dispatchEvent(new Event('scroll'));
  }, Math.max(0, index * MEMBER_ROW_PX - 100));
  return page.locator(`[data-testid="table-members"] tr[data-row-id="${id}"] td[data-col="${col}"]`);
}

async function typeInto(id: string, col: string, text: string): Promise<void> {
  const cell = await membersCell(id, col);
  await cell.locator('.cell-text').click();
  const editor = cell.locator('.cell-editor');
  await editor.fill(text);
  await editor.press('Enter');
}

describe.skipIf(SKIP_BROWSER_TESTS)('main screen in the browser edition', () => {
  it('opens the demo project from the web host', async () => {
    expect(guy).toBeDefined();
    await page.goto(rig.host.url);
    await expect.poll(() => page.getByTestId('project-name').textContent(), { timeout: 20_000 }).toContain('demo-mast');
    await expect.poll(() => page.getByTestId('status-line').textContent()).toContain('host: web');
    expect(await page.getByTestId('status-line').textContent()).toContain('Results are for review by a qualified engineer');
    expect(await page.getByTestId('status-line').textContent()).toContain(`${project.members.length} members`);
    await page.waitForTimeout(300);
    await shot('01-model-as-entered.png');
  });

  it('runs the analysis and shows tensions in the table and tension colours in the 3D view', async () => {
    // After the report, the page fetches each case's solved node positions (binary) to draw the real cable shapes.
    const fieldsReply = page.waitForResponse((r) => r.url().includes('/api/caseFields'), { timeout: 60_000 });
    await page.getByTestId('run').click();
    await expect.poll(() => page.getByTestId('analysis-state').textContent(), { timeout: 60_000 }).toMatch(/cases converged/);
    const reply = await fieldsReply;
    expect(reply.status()).toBe(200);
    expect(reply.headers()['content-type']).toContain('application/vnd.stayset.case-fields');
    const first = project.loadCases[0].id;
    expect(await page.getByTestId('case-select').inputValue()).toBe(first);
    const ref1 = reference().cases.find((c) => c.id === first)!.members.find((m) => m.id === guy.id)!;
    // The table draws only the rows in view: filter it to the guy.
    await page.getByTestId('results-filter').fill(guy.id);
    const cell = page.locator(`[data-testid="results-table"] tr[data-member="${guy.id}"] td[data-col="tensionMax"]`);
    const shown = Number(await cell.textContent());
    // Shown in kN to the force resolution of 10 N (2 decimals): the solver's value rounded, within half a step.
    expect(shown).toBeCloseTo(ref1.tensionMax / 1000, 1);
    expect(Math.abs(shown - ref1.tensionMax / 1000)).toBeLessThanOrEqual(0.005 + 1e-9);
    await page.waitForTimeout(300);
    const png = await page.getByTestId('view3d-canvas').screenshot();
    const stats = await pixelStats(page, png, [0x1b, 0x23, 0x30], TENSION_STOPS.map(to255), 60);
    expect(stats.nonBackground / stats.total).toBeGreaterThan(0.002); // not blank
    expect(stats.matches.reduce((a, b) => a + b, 0)).toBeGreaterThan(30); // tension-scale colours drawn
    await shot('02-after-analysis.png');
    // Another case, and selection from the results table to the inspector.
    await page.getByTestId('case-select').selectOption(project.loadCases[1].id);
    await page.locator(`[data-testid="results-table"] tr[data-member="${guy.id}"]`).click();
    await expect.poll(() => page.getByTestId('inspector').textContent()).toContain(`Member ${guy.id}`);
    await page.waitForTimeout(300);
    await shot('03-case-and-selection.png');
    // Click in the 3D view: the view is framed on the model's centre, which lies on the mast axis,
    // so the centre pixel picks a mast member or node and the inspector follows.
    const box = (await page.getByTestId('view3d-canvas').boundingBox())!;
    await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
    await expect.poll(() => page.getByTestId('inspector').textContent()).toMatch(/^\s*(Member|Node) mast\//);
    await page.locator(`[data-testid="results-table"] tr[data-member="${guy.id}"]`).click();
    // US customary display: same tension in kip (1 kip = 4448.2216152605 N exactly, NIST SP 811).
    await page.getByTestId('units-us').click();
    const kip = Number(await page.locator(`[data-testid="results-table"] tr[data-member="${guy.id}"] td[data-col="tensionMax"]`).textContent());
    const ref2 = reference().cases.find((c) => c.id === project.loadCases[1].id)!.members.find((m) => m.id === guy.id)!;
    // Shown to 3 decimals of a kip (the 10 N resolution in kip): within half a step of the converted value.
    expect(Math.abs(kip - ref2.tensionMax / 4448.2216152605)).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(await page.locator('[data-testid="results-table"] thead').textContent()).toContain('kip');
    await shot('06-us-units.png');
    await page.getByTestId('units-si').click();
    // The printable tension schedule from the same results (main/common/schedule).
    await page.getByTestId('schedule').click();
    await expect.poll(() => page.getByTestId('schedule-view').textContent()).toContain(guy.id);
    expect(await page.getByTestId('schedule-view').textContent()).toMatch(/qualified engineer/);
    await shot('07-schedule.png');
    await page.getByTestId('schedule-close').click();
  });

  it('chooses what the schedule lists and edits its revision block; the printed pages are numbered', async () => {
    await page.getByTestId('schedule').click();
    const view = page.getByTestId('schedule-view');
    const cables = project.members.filter((m) => m.kind === 'cable').length;
    await expect.poll(() => view.textContent()).toContain(`cables: ${cables} cables in full`);
    expect(await view.textContent()).not.toContain('Other members listed');
    await page.getByTestId('schedule-list-all').check();
    await expect.poll(() => view.textContent()).toContain('Other members listed, summarised per group');
    const before = project.report?.revisions?.length ?? 0;
    await page.getByTestId('revision-add').click();
    const checker = page.getByTestId(`revision-${before}-checkedBy`);
    await checker.fill('C. Hecker');
    await checker.press('Enter');
    await expect.poll(() => page.locator('.meta').textContent()).toContain('C. Hecker');
    await shot('07b-schedule-settings.png');
    // Printed from the app page: settings and tool bar hidden, every page numbered.
    const { execFileSync } = await import('node:child_process');
    const pdf = path.join(SCREENSHOTS, '07c-schedule-print.pdf');
    await page.pdf({ path: pdf, printBackground: true, preferCSSPageSize: true });
    const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [pdf], { encoding: 'utf8' }))![1]);
    for (let k = 1; k <= pages; k++) {
      expect(execFileSync('pdftotext', ['-f', String(k), '-l', String(k), '-layout', pdf, '-'], { encoding: 'utf8' })).toContain(`page ${k} of ${pages}`);
    }
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    expect(text).toContain('C. Hecker');
    expect(text).not.toContain('Add revision');
    // Three undo steps take the settings back (the later tests start from the demo as opened).
    await page.locator('[data-testid="schedule-view"] h1').click();
    for (let i = 0; i < 3; i++) await page.keyboard.press('Control+z');
    await expect.poll(() => view.textContent()).toContain(`cables: ${cables} cables in full`);
    await page.getByTestId('schedule-close').click();
  });

  it('edits a pretension, saves with Ctrl+S, and finds it after a reload and on disk', async () => {
    const next = Math.round(guy.pretension! / 1000 + 1);
    await typeInto(guy.id, 'pretension', `${next} kN`);
    await expect.poll(async () => (await membersCell(guy.id, 'pretension')).textContent()).toBe(String(next));
    expect(await page.getByTestId('dirty-mark').count()).toBe(1);
    await page.keyboard.press('Control+s');
    await expect.poll(() => page.getByTestId('notice').textContent()).toContain('Saved');
    expect(await page.getByTestId('dirty-mark').count()).toBe(0);
    const onDisk = JSON.parse(await readFile(rig.demoPath, 'utf8')) as ProjectFile;
    expect(onDisk.members.find((m) => m.id === guy.id)?.pretension).toBeCloseTo(next * 1000, 9);
    await page.reload();
    await expect.poll(() => page.getByTestId('project-name').textContent(), { timeout: 20_000 }).toContain('demo-mast');
    await expect.poll(async () => (await membersCell(guy.id, 'pretension')).textContent()).toBe(String(next));
  });

  it('shows the validator message for a missing node and a unit message for a force typed into a length', async () => {
    await typeInto(guy.id, 'from', 'NOPE');
    const messages = page.getByTestId('cell-messages');
    await expect.poll(() => messages.textContent()).toMatch(new RegExp(`members\\[\\d+\\] "${guy.id}".*NOPE`));
    // The typed text stays visible in the cell for correction.
    expect(await (await membersCell(guy.id, 'from')).locator('.cell-editor').inputValue()).toBe('NOPE');
    await shot('04-bad-node-reference.png');
    await (await membersCell(guy.id, 'from')).locator('.cell-editor').press('Escape');
    await typeInto(guy.id, 'unstressedLength', '12 kN');
    await expect.poll(() => messages.textContent()).toContain('"12 kN" is a force, not a length');
    await shot('05-bad-unit.png');
    await (await membersCell(guy.id, 'unstressedLength')).locator('.cell-editor').press('Escape');
    // Nothing was changed by the refused entries.
    expect(await page.getByTestId('dirty-mark').count()).toBe(0);
    expect(pageErrors).toEqual([]);
  });

  it('without an initial project shows the empty state and opens a typed path', async () => {
    const bare = await startBareHost(rig.root);
    const second = await browser.context.newPage();
    try {
      await second.goto(bare.url);
      await second.getByTestId('open-demo').waitFor({ timeout: 20_000 });
      expect(await second.getByTestId('empty-state').textContent()).toContain('Results are for review by a qualified engineer');
      await second.screenshot({ path: path.join(SCREENSHOTS, '00-empty-state.png') });
      await second.getByRole('button', { name: 'Open a file…' }).first().click();
      await second.getByTestId('path-input').fill('demo-mast.stayset');
      await second.getByTestId('path-input').press('Enter');
      await expect.poll(() => second.getByTestId('project-name').textContent(), { timeout: 20_000 }).toContain('demo-mast');
    } finally {
      await second.close();
      await bare.close();
    }
  });
});

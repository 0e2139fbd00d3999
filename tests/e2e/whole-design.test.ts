/**
 * End to end in headless Chromium against the real web host: a whole design in the app without a
 * text editor. Re-running the demo mast's generator with two guy levels at 30 m (the form asks for
 * the per-level values, checks follow the new top), the choice about the user's parts on removed
 * generated parts (drop, undo, re-attach), and the analysis of the result.
 *
 * References: the same operations run in Node (runGenerator, solveProject) on the same file.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { ProjectFile } from '../../solver/index.ts';
import { fitGuyedMastLevels, runGenerator, type GuyedMastParams } from '../../main/common/generators/index.ts';
import { startWebHost, type WebHost } from '../../main/web/web-server.ts';
import { launchBrowser, type Browser } from './browser.ts';
import { buildRenderer, REPO, SCREENSHOTS } from './serve-app.ts';
import { pixelStats } from './pixels.ts';
import { DEFAULT_MODE_COUNT, solveModes, solveProject } from '../../solver/index.ts';
import { blankProject } from '../../renderer/model/new-project.ts';
import { defaultGuyedMast, newRecordId } from '../../renderer/generators/generator-defaults.ts';
import { pinBaseMeltProject } from './fixtures/pin-base-mast.ts';

let root: string;
let host: WebHost;
let browser: Browser;
let page: Page;
let project: ProjectFile;
const pageErrors: string[] = [];

const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, name) });
const statusText = async () => (await page.getByTestId('status-line').textContent()) ?? '';
const memberCount = async () => Number(/(\d+) members/.exec(await statusText())?.[1]);

beforeAll(async () => {
  await mkdir(SCREENSHOTS, { recursive: true });
  root = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-whole-'));
  const staticDir = await buildRenderer(path.join(root, 'renderer'));
  project = JSON.parse(await readFile(path.join(REPO, 'assets', 'demo-mast.stayset'), 'utf8')) as ProjectFile;
  // The user's own aerial bracket on the mast top (a generated node that a 30 m mast no longer makes).
  project.sections.push({ id: 'bracket tube', E: 2.1e11, area: 4e-4 });
  project.nodes.push({ id: 'aerial', at: [1.2, 0, 59.5], fixed: 'y' });
  project.members.push({ id: 'bracket', kind: 'bar', from: 'mast/P49a', to: 'aerial', section: 'bracket tube' });
  project.members.push({ id: 'strut', kind: 'bar', from: 'mast/P48a', to: 'aerial', section: 'bracket tube' });
  const file = path.join(root, 'mast.stayset');
  await writeFile(file, JSON.stringify(project, null, 2));
  host = await startWebHost({ root, staticDir, assetsDir: null, userDataDir: path.join(root, 'data'), port: 0, initialPath: file });
  browser = await launchBrowser();
  page = await browser.context.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('console', (m) => { if (m.type() === 'error' && !m.text().includes('404')) pageErrors.push(m.text()); });
  await page.goto(host.url);
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await host?.close();
  if (root) await rm(root, { recursive: true, force: true });
});

async function runAnalysis(): Promise<string> {
  await page.getByTestId('run').click();
  await expect.poll(async () => (await page.getByTestId('run').count()) > 0 && (await page.getByTestId('analysis-state').textContent()) !== 'analysis running', { timeout: 90_000 }).toBe(true);
  return (await page.getByTestId('analysis-state').textContent()) ?? '';
}

describe('generator re-runs in the app', () => {
  it('re-runs the demo mast at 30 m with two guy levels: one row per level, checks follow the top', async () => {
    await expect.poll(() => page.getByTestId('project-name').textContent(), { timeout: 20_000 }).toContain('mast');
    await page.getByTestId('generate').click();
    const form = page.getByTestId('guyed-mast-form');
    await form.waitFor();
    expect(await page.getByTestId('guy-level-rows').locator('tbody tr').count()).toBe(3);
    await form.locator('input[data-field="height"]').fill('30');
    await form.locator('input[data-field="guyLevels"]').fill('15, 29');
    await expect.poll(() => page.getByTestId('guy-level-rows').locator('tbody tr').count()).toBe(2);
    await form.locator('input[data-field="anchorRadius-2"]').fill('24');
    await form.locator('input[data-field="anchorRadius-1"]').fill('24');
    await shot('30-generate-two-levels.png');
    await page.getByTestId('generate-dialog').getByRole('button', { name: 'Generate' }).click();
    // The user's bracket and strut use nodes the 30 m mast does not make: asked first.
    const question = page.getByTestId('generate-dangling');
    await question.waitFor();
    const text = (await question.textContent()) ?? '';
    expect(text).toContain('member "bracket" uses node "mast/P49a"');
    expect(text).toContain('member "strut" uses node "mast/P48a"');
    await shot('31-generate-dangling.png');
    await page.getByTestId('dangling-drop').click();
    await page.getByTestId('generate-notes').waitFor();
    const rec = project.generators![0];
    const params = fitGuyedMastLevels({ ...(rec.params as unknown as GuyedMastParams), height: 30, guyLevels: [15, 29], anchorRadius: 24 });
    const dropped = runGenerator(project, { ...rec, params: params as unknown as Record<string, unknown> }, 'drop');
    const notes = (await page.getByTestId('generate-notes').textContent()) ?? '';
    expect(notes).toContain('member "bracket": dropped');
    expect(notes).toContain('node "aerial": no member is left on it: removed');
    expect(notes).toMatch(/checks\.tiltLimits\[0\] top: node "mast\/P49a" → "mast\/P25a" \(mast top, moved 30\.000 m\)/);
    await shot('32-generate-notes.png');
    await page.getByTestId('generate-close').click();
    expect(await memberCount()).toBe(dropped.project.members.length);
    // Undo is one step; then the same run, re-attaching.
    await page.getByTestId('undo').click();
    expect(await memberCount()).toBe(project.members.length);
    await page.getByTestId('generate').click();
    await form.locator('input[data-field="height"]').fill('30');
    await form.locator('input[data-field="guyLevels"]').fill('15, 29');
    await form.locator('input[data-field="anchorRadius-1"]').fill('24');
    await form.locator('input[data-field="anchorRadius-2"]').fill('24');
    await page.getByTestId('generate-dialog').getByRole('button', { name: 'Generate' }).click();
    await page.getByTestId('dangling-reattach').click();
    await page.getByTestId('generate-notes').waitFor();
    const attached = runGenerator(project, { ...rec, params: params as unknown as Record<string, unknown> }, 'reattach');
    expect(await page.getByTestId('generate-notes').textContent()).toContain('member "bracket" from: node "mast/P49a" → "mast/P25a"');
    await page.getByTestId('generate-close').click();
    expect(await memberCount()).toBe(attached.project.members.length);
    await page.getByTestId('fit').click();
    expect(await runAnalysis()).toMatch(/^\d+ cases converged$/);
    await shot('33-regenerated-30m-solved.png');
    expect(pageErrors).toEqual([]);
  }, 180_000);
});

describe('a new project, edited without a text editor', () => {
  it('New… from the guyed-mast generator, then project information, temperatures, checks, tuning targets and nodal loads, each one undo step', async () => {
    await page.getByTestId('new-project').click();
    page.once('dialog', (d) => void d.accept()); // discard the re-generated, unsaved mast
    await page.getByTestId('new-project-dialog').waitFor({ timeout: 5000 }).catch(async () => {
      await page.getByTestId('new-project').click();
      await page.getByTestId('new-project-dialog').waitFor();
    });
    await page.getByTestId('new-project-name').fill('Kestrel Hill test mast');
    await page.getByTestId('new-from-guyedMast').check();
    await page.getByTestId('new-project-create').click();
    const form = page.getByTestId('guyed-mast-form');
    await form.waitFor();
    await shot('34-new-project-generate.png');
    await page.getByTestId('generate-dialog').getByRole('button', { name: 'Generate' }).click();
    await page.getByTestId('generate-notes').waitFor();
    await page.getByTestId('generate-close').click();
    expect(await page.getByTestId('project-name').textContent()).toContain('Kestrel Hill test mast');
    expect(await statusText()).toContain('model valid');
    const members = await memberCount();
    expect(members).toBeGreaterThan(50);

    // Project information and temperatures.
    await page.getByTestId('right-tab-project').click();
    const panel = page.getByTestId('project-panel');
    for (const [field, text] of [['site', 'Kestrel Hill (invented)'], ['client', 'Test client'], ['engineer', 'A. Checker']]) {
      await panel.locator(`input[data-field="${field}"]`).fill(text);
      await panel.locator(`input[data-field="${field}"]`).press('Enter');
    }
    await panel.locator('input[data-field="referenceTemperature"]').fill('10');
    await panel.locator('input[data-field="referenceTemperature"]').press('Enter');
    await panel.locator('input[data-field="installationTemperatures"]').fill('-10, 0, 10, 20, 30');
    await panel.locator('input[data-field="installationTemperatures"]').press('Enter');
    await expect.poll(() => page.getByTestId('undo').getAttribute('title')).toContain('Installation temperatures');
    await page.getByTestId('undo').click();
    expect(await panel.locator('input[data-field="installationTemperatures"]').inputValue()).toBe('');
    expect(await panel.locator('input[data-field="referenceTemperature"]').inputValue()).toBe('10');
    await page.getByTestId('undo').click();
    expect(await panel.locator('input[data-field="referenceTemperature"]').inputValue()).toBe('15');
    expect(await panel.locator('input[data-field="engineer"]').inputValue()).toBe('A. Checker');
    await shot('35-project-panel.png');

    // Check settings: a displacement limit on the node selected in the Nodes table, an uplift check, a sag limit.
    // The same project made in Node: its mast top and where it sits in the Nodes table.
    const made = runGenerator(blankProject('x'), { id: newRecordId(blankProject('x'), 'guyedMast'), kind: 'guyedMast', params: defaultGuyedMast([0, 0, 0]) as unknown as Record<string, unknown> }).project;
    expect(made.members.length).toBe(members);
    const rid = made.generators![0].id;
    const topNode = made.nodes.filter((n) => n.id.startsWith(`${rid}/P`)).reduce((a, b) => (b.at[2] > a.at[2] ? b : a));
    const top = topNode.id;
    const base = `${rid}/base`;
    await page.getByTestId('tab-nodes').click();
    await page.locator('[data-testid="table-nodes"] .scroller').evaluate((el, y) => { el.scrollTop = y; el.dispatchEvent(new Event('scroll')); }, Math.max(0, made.nodes.indexOf(topNode) * 24 - 100));
    await page.locator(`[data-testid="table-nodes"] tr[data-row-id="${top}"] td.rowhead`).click();
    await page.getByTestId('right-tab-checks').click();
    const checks = page.getByTestId('checks-editor');
    await page.getByTestId('displacement-limit').fill('300'); // displacements in mm
    await page.getByTestId('add-displacement').click();
    await expect.poll(() => checks.textContent()).toContain(`|Δ| of ${top} ≤ 300.0 mm`);
    await page.getByTestId('uplift-node').fill(base);
    await page.getByTestId('add-uplift').click();
    await page.getByTestId('sag-group').selectOption(`${rid}/guys`);
    await page.getByTestId('add-sag').click();
    await expect.poll(() => checks.textContent()).toContain(`${rid}/guys: sag ≤ 2.0 % of span`);
    // Minimum tension of the guys (the installation share is prefilled with 10 %), one undo step.
    await page.getByTestId('min-tension-group').selectOption(`${rid}/guys`);
    await page.getByTestId('min-tension-breaking').fill('5');
    await page.getByTestId('add-min-tension').click();
    await expect.poll(() => checks.textContent()).toContain(`${rid}/guys: T ≥ 10.0 % of installation and 5.0 % of breaking load`);
    expect(await page.getByTestId('undo').getAttribute('title')).toContain(`Minimum tension of ${rid}/guys`);
    await page.getByTestId('uplift-node').fill('no such node');
    await page.getByTestId('add-uplift').click();
    expect(await page.getByTestId('checks-editor-errors').textContent()).toMatch(/no such node/);
    await shot('36-checks-editor.png');

    // Tuning: a plumb target (base and top typed) and a reaction target.
    await page.getByTestId('right-tab-tuning').click();
    // open the set-up if it is folded (it starts folded for a project that already has tuning variables)
    const setupBox = page.locator('details:has([data-testid="tuning-setup"])');
    if (!(await setupBox.evaluate((d) => (d as HTMLDetailsElement).open))) await setupBox.locator('summary').click();
    await page.getByTestId('tuning-target-kind').selectOption('plumb');
    await page.getByTestId('tuning-target-base').fill(base);
    await page.getByTestId('tuning-target-top').fill(top);
    await page.getByTestId('tuning-target-value').fill('50'); // plumb tolerance in mm
    await page.getByTestId('tuning-add-target').click();
    await page.getByTestId('tuning-target-kind').selectOption('reaction');
    await page.getByTestId('tuning-target-node').fill(base);
    await page.getByTestId('tuning-target-value').fill('60');
    await page.getByTestId('tuning-add-target').click();
    // A tuning variable with a lower bound typed in kN.
    await page.getByTestId('tuning-new-variable').selectOption(`${rid}/guys`);
    await page.getByTestId('tuning-add-variable').click();
    await page.getByTestId('tuning-min-0').fill('5');
    await page.getByTestId('tuning-min-0').press('Enter');
    await expect.poll(() => page.getByTestId('undo').getAttribute('title')).toContain(`Lower bound of ${rid}/guys`);
    const setup = (await page.getByTestId('tuning-setup').textContent()) ?? '';
    expect(setup).toMatch(/plumb over .* within 50\.0 mm/);
    expect(setup).toMatch(/reaction/i);
    await shot('37-tuning-targets.png');

    // A nodal load on the picked node, then its Fz edited in the table.
    await page.getByTestId('tab-nodalLoads').click();
    const loads = page.getByTestId('nodal-loads');
    await loads.locator('input[data-field="fx"]').fill('2');
    await loads.locator('input[data-field="fz"]').fill('-1.5');
    await page.getByTestId('add-nodal-load').click();
    await expect.poll(() => loads.locator('tbody tr').count()).toBe(1);
    expect(await loads.locator('tbody tr input.node').inputValue()).toBe(top);
    await loads.locator('tbody tr input[data-col="fz"]').fill('-2.5');
    await loads.locator('tbody tr input[data-col="fz"]').press('Tab');
    await expect.poll(() => page.getByTestId('undo').getAttribute('title')).toContain('Fz of a load in dead');
    await shot('38-nodal-loads.png');
    expect(await runAnalysis()).toMatch(/^1 cases converged$/);
    expect(pageErrors).toEqual([]);
  }, 180_000);
});

describe('results that can be trusted', () => {
  it('a case that did not converge shows no tensions or colours but the reason; reactions per case and as an envelope; loads drawn in 3D', async () => {
    // The demo mast on a single pin with a case that heats the guys until they go slack: a mechanism.
    const melt = pinBaseMeltProject(JSON.parse(await readFile(path.join(REPO, 'assets', 'demo-mast.stayset'), 'utf8')) as ProjectFile);
    await writeFile(path.join(root, 'melt.stayset'), JSON.stringify(melt, null, 2));
    const reference = solveProject(melt).report;
    expect(reference.cases.map((c) => c.status)).toEqual(['converged', 'limitPoint', 'converged']);
    // Save the new project into a folder that does not exist yet: the prompt has the focus and adds the extension.
    await page.getByRole('button', { name: 'Save As…' }).click();
    await page.getByTestId('path-prompt').waitFor();
    await page.keyboard.press('Control+A');
    await page.keyboard.type('jobs/kestrel/test-mast');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(0);
    const saved = JSON.parse(await readFile(path.join(root, 'jobs', 'kestrel', 'test-mast.stayset'), 'utf8')) as ProjectFile;
    expect(saved.meta?.site).toBe('Kestrel Hill (invented)');
    await page.getByRole('button', { name: 'Open…' }).click();
    await page.getByTestId('path-input').fill('melt.stayset');
    await page.getByTestId('path-input').press('Enter');
    await expect.poll(() => page.getByTestId('project-name').textContent(), { timeout: 20_000 }).toContain('melt');
    expect(await runAnalysis()).toBe('1 of 3 cases not converged');
    // Slack members are counted over the converged cases only (a case that did not converge has no valid ones).
    const slackConverged = reference.cases.filter((c) => c.converged).reduce((n, c) => n + c.slackMembers.length, 0);
    expect(await statusText()).toContain(slackConverged ? `${slackConverged} slack member-cases` : 'no slack members');
    await page.getByTestId('case-select').selectOption('melt');
    const state = page.getByTestId('not-converged');
    await state.waitFor();
    expect(await state.textContent()).toContain('Case "melt" did not converge: the load passes a limit point');
    expect(await state.textContent()).toContain(reference.cases[1].message!);
    expect(await state.textContent()).toContain('What to try');
    expect(await page.getByTestId('results-table').count()).toBe(0);
    await page.getByTestId('view-not-converged').waitFor();
    expect(await page.getByTestId('legend').textContent()).not.toMatch(/kN/);
    await page.waitForTimeout(300);
    await shot('39-not-converged.png');

    // Reactions of the dead case and their envelope: the numbers the solver gives, in kN.
    await page.getByTestId('case-select').selectOption('dead');
    await page.getByTestId('results-tab-reactions').click();
    const dead = reference.cases[0];
    const base = dead.reactions.find((r) => r.node === 'mast/base')!;
    const row = page.locator('[data-testid="reactions-case"] tr[data-node="mast/base"] td');
    expect(Number(await row.nth(3).textContent())).toBeCloseTo(base.force[2] / 1000, 1);
    expect(await page.locator('[data-testid="reactions-case"] tbody tr').count()).toBe(dead.reactions.length);
    expect(await page.getByTestId('reactions').textContent()).toContain('Envelope over 2 converged cases (1 not converged, left out)');
    await shot('40-reactions.png');

    // Loads in 3D: a 50 kN load on the mast top draws an orange arrow; the wind case shows its direction.
    await page.getByTestId('tab-nodalLoads').click();
    await page.getByTestId('nodal-loads').locator('input[data-field="node"]').fill('mast/P49a');
    await page.getByTestId('nodal-loads').locator('input[data-field="fx"]').fill('50');
    await page.getByTestId('nodal-loads').locator('input[data-field="fz"]').fill('0');
    await page.getByTestId('add-nodal-load').click();
    await page.getByTestId('fit').click();
    await page.waitForTimeout(400);
    const canvas = page.getByTestId('view3d-canvas');
    const orange = async () => (await pixelStats(page, await canvas.screenshot(), [0x1b, 0x23, 0x30], [[0xff, 0x9f, 0x43]], 60)).matches[0];
    const withLoad = await orange();
    await page.getByTestId('show-loads').uncheck();
    await page.waitForTimeout(300);
    const without = await orange();
    expect(withLoad).toBeGreaterThan(without + 20);
    await page.getByTestId('show-loads').check();
    await page.getByTestId('case-select').selectOption('wind 0');
    await expect.poll(() => page.getByTestId('wind-note').textContent()).toContain('toward 0°');
    await page.waitForTimeout(300);
    await shot('41-loads-in-3d.png');
    expect(pageErrors).toEqual([]);
  }, 180_000);
});

describe('layout', () => {
  it('panels and the results strip resize by dragging; tables sort and filter', async () => {
    const box = async (id: string) => (await page.getByTestId(id).boundingBox())!;
    const drag = async (id: string, dx: number, dy: number) => {
      const b = await box(id);
      await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2);
      await page.mouse.down();
      await page.mouse.move(b.x + b.width / 2 + dx / 2, b.y + b.height / 2 + dy / 2);
      await page.mouse.move(b.x + b.width / 2 + dx, b.y + b.height / 2 + dy);
      await page.mouse.up();
    };
    const left = (await box('left-panel')).width, right = (await box('right-panel')).width, bottom = (await box('bottom-panel')).height;
    await drag('split-left', -120, 0);
    await drag('split-right', -80, 0);
    await drag('split-bottom', 0, -150);
    expect((await box('left-panel')).width).toBeCloseTo(left - 120, -1);
    expect((await box('right-panel')).width).toBeCloseTo(right + 80, -1);
    expect((await box('bottom-panel')).height).toBeCloseTo(bottom + 150, -1);

    // Nodes table: filter to the anchors, sort by x, then reversed.
    await page.getByTestId('tab-nodes').click();
    await page.getByTestId('filter-nodes').fill('mast/A');
    const ids = () => page.locator('[data-testid="table-nodes"] tbody tr[data-row-id]').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-row-id')));
    await expect.poll(ids).toEqual(['mast/A1', 'mast/A2', 'mast/A3']);
    await page.locator('[data-testid="table-nodes"] th[data-sort="x"]').click();
    const melt = JSON.parse(await readFile(path.join(root, 'melt.stayset'), 'utf8')) as ProjectFile;
    const byX = melt.nodes.filter((n) => n.id.startsWith('mast/A')).sort((a, b) => a.at[0] - b.at[0]).map((n) => n.id);
    await expect.poll(ids).toEqual(byX);
    await page.locator('[data-testid="table-nodes"] th[data-sort="x"]').click();
    await expect.poll(ids).toEqual([...byX].reverse());
    expect(await page.getByTestId('table-nodes').textContent()).toContain(`3 of ${melt.nodes.length} rows`);
    // The results table filters too.
    await page.getByTestId('case-select').selectOption('dead');
    await page.getByTestId('results-tab-members').click();
    await page.getByTestId('results-filter').fill('guy L3');
    await expect.poll(() => page.locator('[data-testid="results-table"] tbody tr[data-member]').count()).toBe(3);
    await shot('42-resized-sorted-filtered.png');
    // Natural frequencies about the dead case, as solveModes gives them in Node on the same project.
    const edited = structuredClone(melt);
    edited.loadCases[0] = { ...edited.loadCases[0], nodalLoads: [{ node: 'mast/P49a', force: [50_000, 0, 0] }] };
    const modes = solveModes(edited, 'dead', { count: DEFAULT_MODE_COUNT });
    expect(modes.modal.ok).toBe(true);
    await page.getByTestId('results-tab-modes').click();
    await page.getByTestId('compute-modes').click();
    await page.getByTestId('modes-table').waitFor({ timeout: 60_000 });
    const first = Number(await page.locator('[data-testid="modes-table"] tbody tr').first().locator('td').nth(2).textContent()); // columns: play, mode, f
    if (modes.modal.ok) expect(first).toBeCloseTo(modes.modal.analysis.modes[0].frequency, 2);
    await shot('43-modes.png');
    expect(pageErrors).toEqual([]);
  }, 120_000);
});


describe('generator forms in the display units', () => {
  it('in kip/ft a new guyed mast is entered in feet and written in metres (NIST SP 811: 1 ft = 0.3048 m exactly)', async () => {
    await page.getByTestId('units-us').click();
    await page.getByTestId('generate').click();
    await page.getByTestId('generate-kind-guyedMast').click();
    await page.getByTestId('generate-record').selectOption({ label: (await page.getByTestId('generate-record').locator('option').last().textContent())! });
    const form = page.getByTestId('guyed-mast-form');
    await form.waitFor();
    expect(await form.textContent()).toContain('Height (ft)');
    await page.getByTestId('generate-place').fill('400, 0, 0');
    await form.locator('input[data-field="height"]').fill('100');
    await form.locator('input[data-field="guyLevels"]').fill('50, 95');
    await expect.poll(() => page.getByTestId('guy-level-rows').locator('tbody tr').count()).toBe(2);
    await form.locator('input[data-field="anchorRadius-1"]').fill('60');
    await form.locator('input[data-field="anchorRadius-2"]').fill('60');
    await form.locator('input[data-field="faceWidth"]').fill('2');
    await form.locator('input[data-field="panelHeight"]').fill('4');
    await page.getByTestId('generate-dialog').getByRole('button', { name: 'Generate' }).click();
    await page.getByTestId('generate-notes').waitFor();
    await shot('44-generate-in-feet.png');
    await page.getByTestId('generate-close').click();
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('dirty-mark').count()).toBe(0);
    const saved = JSON.parse(await readFile(path.join(root, 'melt.stayset'), 'utf8')) as ProjectFile;
    const rec = saved.generators!.at(-1)!;
    const p = rec.params as unknown as GuyedMastParams;
    expect(p.base![0]).toBeCloseTo(400 * 0.3048, 9);
    expect(p.height).toBeCloseTo(100 * 0.3048, 9);
    expect(p.guyLevels[0]).toBeCloseTo(50 * 0.3048, 9);
    expect(p.guyLevels[1]).toBeCloseTo(95 * 0.3048, 9);
    expect(p.anchorRadius).toBeCloseTo(60 * 0.3048, 9);
    expect(p.faceWidth).toBeCloseTo(2 * 0.3048, 9);
    const top = Math.max(...saved.nodes.filter((n) => n.id.startsWith(`${rec.id}/`)).map((n) => n.at[2]));
    expect(top).toBeCloseTo(100 * 0.3048, 6);
    await page.getByTestId('units-si').click();
    expect(pageErrors).toEqual([]);
  }, 120_000);
});

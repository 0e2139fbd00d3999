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
    expect(notes).toMatch(/checks\.tiltLimits\[0\] top: node "mast\/P49a" → "mast\/P25a" \(mast top, moved 30 m\)/);
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

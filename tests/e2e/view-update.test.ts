/**
 * The 3D view in the browser edition updates in place: after a run, changing the case, the colour
 * mode and the selection builds no geometry (the canvas reports its geometry builds) while the
 * picture changes; a mode shape animates (successive frames differ); panels and ancillaries are
 * drawn. Screenshots in test-artifacts/screenshots/view-*.png. Behaviour only, no timing.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { ProjectFile } from '../../solver/index.ts';
import { startWebHost, type WebHost } from '../../main/web/web-server.ts';
import { launchBrowser, type Browser } from './browser.ts';
import { SKIP_BROWSER_TESTS } from './browser-tools.ts';
import { buildRenderer, REPO, SCREENSHOTS } from './serve-app.ts';

let host: WebHost;
let browser: Browser;
let page: Page;
let root: string;
const pageErrors: string[] = [];

beforeAll(async () => {
  await mkdir(SCREENSHOTS, { recursive: true });
  root = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-view-'));
  const staticDir = await buildRenderer(path.join(root, 'renderer'));
  const project = JSON.parse(await readFile(path.join(REPO, 'assets', 'demo-mast.stayset'), 'utf8')) as ProjectFile;
  // Invented ancillaries: a dish near the top and a feeder along the legs.
  project.ancillaries = [
    { id: 'dish', kind: 'dish', node: 'mast/P46a', dragArea: 0.8, mass: 40 },
    { id: 'feeder', kind: 'feeder', along: { group: 'mast/mast legs', from: 2, to: 50 }, dragArea: 0.04, mass: 2 },
  ];
  const file = path.join(root, 'mast.stayset');
  await writeFile(file, JSON.stringify(project));
  await mkdir(path.join(root, 'data'));
  host = await startWebHost({ root, staticDir, assetsDir: null, userDataDir: path.join(root, 'data'), port: 0, initialPath: file });
  browser = await launchBrowser();
  page = await browser.context.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
});

afterAll(async () => {
  await browser?.close();
  await host?.close();
  if (root) await rm(root, { recursive: true, force: true });
});

const builds = async () => Number(await page.getByTestId('view3d-canvas').getAttribute('data-geometry-builds'));
const canvasShot = () => page.getByTestId('view3d-canvas').screenshot();
const frame = () => page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r(null)))));

describe.skipIf(SKIP_BROWSER_TESTS)('3D view updates in place', () => {
  it('case, colour mode and selection change the picture without building geometry', async () => {
    await page.goto(host.url);
    await expect.poll(() => page.getByTestId('project-name').textContent(), { timeout: 30_000 }).toContain('mast');
    await page.getByTestId('run').click();
    await expect.poll(async () => (await page.getByTestId('run').count()) > 0 && (await page.getByTestId('analysis-state').textContent()) !== 'analysis running', { timeout: 120_000 }).toBe(true);
    await frame();
    const afterRun = await builds();
    expect(afterRun).toBeGreaterThanOrEqual(1);
    let before = await canvasShot();
    await page.selectOption('[data-testid="case-select"]', 'wind 60');
    await frame();
    let after = await canvasShot();
    expect(Buffer.compare(before, after)).not.toBe(0);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'view-case-wind60.png') });
    before = after;
    await page.selectOption('[data-testid="colour-mode"]', 'utilisation');
    await frame();
    after = await canvasShot();
    expect(Buffer.compare(before, after)).not.toBe(0);
    await page.locator('[data-testid="results-table"] tr[data-member]').nth(2).click();
    await frame();
    expect(await builds()).toBe(afterRun);
    expect(await page.getByTestId('legend-ancillaries').textContent()).toContain('2');
    expect(await page.getByTestId('wind-note').textContent()).toContain('60');
  });

  it('animates a mode shape: frames differ, and stop restores the still view', async () => {
    await page.getByTestId('results-tab-modes').click();
    await page.getByTestId('compute-modes').click();
    await page.getByTestId('modes-table').waitFor({ timeout: 60_000 });
    const built = await builds();
    await page.getByTestId('play-mode-1').click();
    await expect.poll(() => page.getByTestId('view-mode-note').count()).toBe(1);
    const a = await canvasShot();
    await page.waitForTimeout(400);
    const b = await canvasShot();
    expect(Buffer.compare(a, b)).not.toBe(0);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'view-mode-1.png') });
    await page.getByTestId('play-mode-1').click();
    await expect.poll(() => page.getByTestId('view-mode-note').count()).toBe(0);
    await frame();
    const c = await canvasShot();
    await page.waitForTimeout(300);
    expect(Buffer.compare(c, await canvasShot())).toBe(0);
    expect(await builds()).toBe(built);
    expect(pageErrors).toEqual([]);
  });
});

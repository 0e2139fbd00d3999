/**
 * A 20,200-member cable net (invented, tests/renderer/net-fixture.ts) in the browser edition:
 * opens, draws, redraws while orbiting, and the tables stay windowed. Behaviour only: how fast
 * is a matter for `npm run bench`, not for a test.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { startWebHost, type WebHost } from '../../main/web/web-server.ts';
import { launchBrowser, type Browser } from './browser.ts';
import { SKIP_BROWSER_TESTS } from './browser-tools.ts';
import { buildRenderer, SCREENSHOTS } from './serve-app.ts';
import { pixelStats } from './pixels.ts';
import { net } from '../renderer/net-fixture.ts';

let host: WebHost;
let browser: Browser;
let page: Page;
let root: string;
const { project } = net(100);

beforeAll(async () => {
  await mkdir(SCREENSHOTS, { recursive: true });
  root = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-large-'));
  const staticDir = await buildRenderer(path.join(root, 'renderer'));
  const file = path.join(root, 'net-20k.stayset');
  await writeFile(file, JSON.stringify(project));
  await mkdir(path.join(root, 'data'));
  host = await startWebHost({ root, staticDir, assetsDir: null, userDataDir: path.join(root, 'data'), port: 0, initialPath: file });
  browser = await launchBrowser();
  page = await browser.context.newPage();
});

afterAll(async () => {
  await browser?.close();
  await host?.close();
  if (root) await rm(root, { recursive: true, force: true });
});

describe.skipIf(SKIP_BROWSER_TESTS)('20,000 members in the browser', () => {
  it('opens and draws the model, tables windowed', async () => {
    await page.goto(host.url);
    await expect.poll(() => page.getByTestId('status-line').textContent(), { timeout: 60_000 }).toContain(`${project.members.length} members`);
    await page.waitForTimeout(200);
    const rows = await page.locator('[data-testid="table-members"] tbody tr[data-row-id]').count();
    expect(rows).toBeLessThan(120);
    const png = await page.getByTestId('view3d-canvas').screenshot();
    const stats = await pixelStats(page, png, [0x1b, 0x23, 0x30], [], 0);
    expect(stats.nonBackground / stats.total).toBeGreaterThan(0.05);
    await page.screenshot({ path: path.join(SCREENSHOTS, '10-large-net.png') });
  });

  it('orbits: 20 drag steps and the view changes', async () => {
    const box = (await page.getByTestId('view3d-canvas').boundingBox())!;
    const before = await page.getByTestId('view3d-canvas').screenshot();
    const cx = box.x + box.width / 2;
    const cy = box.y + box.height / 2;
    await page.mouse.move(cx, cy);
    await page.mouse.down();
    for (let k = 1; k <= 20; k++) {
      await page.mouse.move(cx + 8 * k, cy + 2 * k);
      await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => r(null))));
    }
    await page.mouse.up();
    const after = await page.getByTestId('view3d-canvas').screenshot();
    expect(Buffer.compare(before, after)).not.toBe(0);
  });
});

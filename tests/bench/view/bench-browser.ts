/**
 * Headless Chromium for the responsiveness benchmark. Unlike the e2e launcher it keeps the GPU
 * process (SwiftShader, software GL) and so GPU compositing: with `--disable-gpu` the compositor is
 * software and every WebGL frame is read back to the page's main thread (glReadPixels, ~100 ms a
 * frame at 1440 × 900), a cost of the build machine that a desktop with a GPU does not pay.
 * `STAYSET_BENCH_SOFTWARE_COMPOSITING=1` measures with the e2e flags instead.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { CHROMIUM, requireBrowserTools } from '../../e2e/browser-tools.ts';
import { launchBrowser, type Browser } from '../../e2e/browser.ts';

export async function launchBenchBrowser(): Promise<Browser> {
  if (process.env.STAYSET_BENCH_SOFTWARE_COMPOSITING === '1') return launchBrowser();
  requireBrowserTools(['chromium']);
  const profile = await mkdtemp(path.join(os.tmpdir(), 'stayset-bench-profile-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1440, height: 900 },
    args: ['--headless', '--no-sandbox', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync', '--use-angle=swiftshader', '--enable-unsafe-swiftshader', '--ignore-gpu-blocklist'],
  });
  return {
    context,
    async close() {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

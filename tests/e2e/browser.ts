/**
 * Headless Chromium for the end-to-end tests (Debian's /usr/bin/chromium driven by
 * playwright-core), software WebGL through SwiftShader, a throw-away profile in os.tmpdir().
 */
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

import { CHROMIUM, requireBrowserTools } from './browser-tools.ts';

export { CHROMIUM };

export interface Browser {
  context: BrowserContext;
  close(): Promise<void>;
}

export async function launchBrowser(): Promise<Browser> {
  requireBrowserTools(['chromium']);
  const profile = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-profile-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1440, height: 900 },
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync', '--use-angle=swiftshader', '--enable-unsafe-swiftshader'],
  });
  return {
    context,
    async close() {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

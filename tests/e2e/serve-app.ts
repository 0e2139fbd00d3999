/**
 * Test rig: build the renderer with Vite's JS API into dist/renderer and start the real loopback
 * web host (main/web) on a temporary project folder holding a copy of assets/. The demo mast
 * (assets/demo-mast.stayset) is copied into the folder so it can be saved; without it the small
 * invented mast of tests/e2e/fixtures stands in.
 */
import { cp, mkdir, mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { startWebHost, type WebHost } from '../../main/web/web-server.ts';

export const REPO = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const SCREENSHOTS = path.join(REPO, 'test-artifacts', 'screenshots');

export interface AppRig {
  host: WebHost;
  root: string;
  demoPath: string;
  close(): Promise<void>;
}

/** Build into dist/renderer (default) or another folder (so test files running at once do not clobber each other). */
export async function buildRenderer(outDir = path.join(REPO, 'dist', 'renderer')): Promise<string> {
  await build({ configFile: path.join(REPO, 'vite.config.ts'), logLevel: 'warn', build: { outDir, emptyOutDir: true } });
  return outDir;
}

/** A second web host on the same project folder, started without an initial project. */
export async function startBareHost(root: string): Promise<WebHost> {
  const userData = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-data-'));
  return startWebHost({ root, staticDir: path.join(REPO, 'dist', 'renderer'), assetsDir: path.join(root, 'assets'), userDataDir: userData, port: 0, initialPath: null });
}

export async function startApp(): Promise<AppRig> {
  const root = await mkdtemp(path.join(os.tmpdir(), 'stayset-e2e-root-'));
  const userData = path.join(root, '.user-data');
  await mkdir(userData);
  const assets = path.join(REPO, 'assets');
  await cp(assets, path.join(root, 'assets'), { recursive: true });
  const assetFiles = await readdir(assets);
  const fixture = path.join(REPO, 'tests', 'e2e', 'fixtures', 'demo-mast.stayset.json');
  const demoPath = path.join(root, 'demo-mast.stayset');
  await cp(assetFiles.includes('demo-mast.stayset') ? path.join(assets, 'demo-mast.stayset') : fixture, demoPath);
  const host = await startWebHost({
    root,
    staticDir: path.join(REPO, 'dist', 'renderer'),
    assetsDir: path.join(root, 'assets'),
    userDataDir: userData,
    port: 0,
    initialPath: demoPath,
  });
  return {
    host, root, demoPath,
    async close() {
      await host.close();
      await rm(root, { recursive: true, force: true });
    },
  };
}

/**
 * The web host as started from the command line: prints the start URL on stdout, listens on
 * 127.0.0.1 only, answers with the printed token; a bad option is named and exits with code 2.
 */
import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createWebHostClient, readTokenFromHash } from '../../../main/common/web-host-client.ts';
import { makeTempDir } from '../store/temp-dir.ts';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
const start = path.join(repo, 'main', 'web', 'start.ts');
let tmp: ReturnType<typeof makeTempDir>;
beforeAll(() => {
  tmp = makeTempDir('stayset-start-');
  mkdirSync(path.join(tmp.dir, 'www'));
  writeFileSync(path.join(tmp.dir, 'www', 'index.html'), '<!doctype html>');
});
afterAll(() => tmp.cleanup());

describe('web host command line', () => {
  it('prints the URL with the token and serves the API', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', start, '--root', tmp.dir, '--static', path.join(tmp.dir, 'www'), '--data', path.join(tmp.dir, 'data'), '--open-demo'], { cwd: repo });
    try {
      const url = await new Promise<string>((resolve, reject) => {
        let out = '';
        child.stdout.on('data', (d) => {
          out += String(d);
          const m = out.match(/http:\/\/127\.0\.0\.1:\d+\/#token=[0-9a-f]+/);
          if (m) resolve(m[0]);
        });
        child.on('exit', (code) => reject(new Error(`exited ${code}`)));
      });
      const u = new URL(url);
      const token = readTokenFromHash(u.hash);
      expect(token).toMatch(/^[0-9a-f]{64}$/);
      const host = createWebHostClient({ token: token!, baseUrl: u.origin });
      expect(await host.kind()).toBe('web');
      const demo = await host.openInitial();
      expect(demo?.ok && demo.value.name).toBe('demo-mast.stayset'); // the repository's bundled demo
      await expect(createWebHostClient({ token: 'ab'.repeat(32), baseUrl: u.origin }).kind()).rejects.toThrow(/Wrong access token/);
    } finally {
      child.kill('SIGTERM');
    }
  });

  it('names a bad option and exits with code 2', () => {
    const r = spawnSync(process.execPath, ['--import', 'tsx', start, '--port', 'ninety'], { cwd: repo, encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('stayset web: --port: "ninety" is not a port number (0–65535)');
  });
});

describe('readTokenFromHash', () => {
  it('reads the token parameter of the hash only when it looks like ours', () => {
    expect(readTokenFromHash('#token=' + 'a1'.repeat(32))).toBe('a1'.repeat(32));
    expect(readTokenFromHash('#/schedule&token=' + 'ff'.repeat(16))).toBe('ff'.repeat(16));
    expect(readTokenFromHash('#token=<script>')).toBeNull();
    expect(readTokenFromHash('')).toBeNull();
  });
});

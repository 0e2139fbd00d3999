/**
 * The Electron bundle (esbuild): main and worker import nothing but Node built-ins and electron,
 * the sandboxed preload requires only electron, and the bundled worker really solves in a plain
 * worker thread (no TypeScript loader), as it will inside the packaged app.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisDone } from '../../../main/common/host-contract.ts';
import { AnalysisRunner } from '../../../main/analysis/analysis-runner.ts';
import { buildMain } from '../../../main/electron/build-main.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';

let tmp: ReturnType<typeof makeTempDir>;
beforeAll(async () => {
  tmp = makeTempDir('stayset-bundle-');
  await buildMain(tmp.dir, 'silent');
});
afterAll(() => tmp.cleanup());

/** Module specifiers of static import/export statements (at a line start, as esbuild writes them) and of import(). */
const importsOf = (code: string) => [...code.matchAll(/(?:^\s*(?:import|export)\b[^;]*?\bfrom\s*|\bimport\(\s*)["']([^"']+)["']/gm)].map((m) => m[1]);

describe('electron bundle', () => {
  it('main and worker import only node: built-ins and electron', () => {
    for (const f of ['main.js', 'analysis-worker.mjs']) {
      const imports = importsOf(readFileSync(path.join(tmp.dir, f), 'utf8'));
      expect(imports.filter((i) => !i.startsWith('node:') && i !== 'electron'), f).toEqual([]);
    }
  });

  it('the preload requires only electron and exposes one object', () => {
    const code = readFileSync(path.join(tmp.dir, 'preload.cjs'), 'utf8');
    expect([...code.matchAll(/require\("([^"]+)"\)/g)].map((m) => m[1])).toEqual(['electron']);
    expect(code.match(/exposeInMainWorld\(/g)).toHaveLength(1);
    expect(code).toContain('exposeInMainWorld("stayset", Object.freeze(host))');
  });

  it('the bundled worker solves in a plain worker thread', async () => {
    const done = await new Promise<AnalysisDone>((resolve) => {
      const runner = new AnalysisRunner({ workerUrl: pathToFileURL(path.join(tmp.dir, 'analysis-worker.mjs')), onProgress: () => undefined, onDone: resolve });
      runner.start(sampleMast());
    });
    expect(done.status, done.error).toBe('done');
    expect(done.report?.cases.every((c) => c.converged)).toBe(true);
  });
});

/**
 * The loopback web host end to end over real HTTP on 127.0.0.1 (in-process server, real files
 * in a temporary folder), through the same client the browser edition uses.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisDone, AnalysisProgress, StaysetHost } from '../../../main/common/host-contract.ts';
import { serializeProject } from '../../../main/common/project/index.ts';
import { createWebHostClient } from '../../../main/common/web-host-client.ts';
import { STAYSET_CSP } from '../../../main/common/web-protocol.ts';
import { startWebHost, type WebHost } from '../../../main/web/web-server.ts';
import { largeGrid, sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';
import { fetchEventSource } from './fetch-event-source.ts';
import { buildModel } from '../../../solver/index.ts';

let tmp: ReturnType<typeof makeTempDir>;
let web: WebHost;
let host: StaysetHost;
let root: string;

beforeAll(async () => {
  tmp = makeTempDir('stayset-web-');
  root = path.join(tmp.dir, 'projects');
  const staticDir = path.join(tmp.dir, 'renderer');
  const assets = path.join(tmp.dir, 'assets');
  for (const d of [root, staticDir, assets, path.join(staticDir, 'assets')]) mkdirSync(d, { recursive: true });
  writeFileSync(path.join(staticDir, 'index.html'), '<!doctype html><title>Stayset</title>');
  writeFileSync(path.join(staticDir, 'assets', 'app.js'), 'console.log(1)');
  writeFileSync(path.join(tmp.dir, 'secret.txt'), 'outside');
  writeFileSync(path.join(assets, 'demo-mast.stayset'), serializeProject(sampleMast()));
  writeFileSync(path.join(tmp.dir, 'elsewhere.stayset'), serializeProject(sampleMast()));
  web = await startWebHost({
    root, staticDir, assetsDir: assets, userDataDir: path.join(tmp.dir, 'user'),
    initialPath: path.join(assets, 'demo-mast.stayset'), runner: { progressIntervalMs: 0 },
  });
  host = createWebHostClient({ token: web.token, baseUrl: web.origin, createEventSource: fetchEventSource });
});

afterAll(async () => {
  await web.close();
  tmp.cleanup();
});

function rawRequest(pathname: string, headers: Record<string, string>, method = 'GET', body = ''): Promise<{ status: number; headers: http.IncomingHttpHeaders; text: string }> {
  return new Promise((resolve, reject) => {
    const req = http.request({ host: '127.0.0.1', port: web.port, path: pathname, method, headers }, (res) => {
      let text = '';
      res.on('data', (d) => (text += String(d)));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
    });
    req.on('error', reject);
    req.end(body);
  });
}

describe('web host: access rules', () => {
  it('prints a start URL on 127.0.0.1 with the token in the hash', () => {
    expect(web.url).toBe(`http://127.0.0.1:${web.port}/#token=${web.token}`);
    expect(web.token).toMatch(/^[0-9a-f]{64}$/);
  });

  it('refuses API calls without or with a wrong token (401)', async () => {
    const host0 = `127.0.0.1:${web.port}`;
    expect((await rawRequest('/api/kind', { Host: host0 }, 'POST', '{"args":[]}')).status).toBe(401);
    expect((await rawRequest('/api/kind', { Host: host0, 'X-Stayset-Token': 'ab'.repeat(32) }, 'POST', '{"args":[]}')).status).toBe(401);
    expect((await rawRequest('/api/events', { Host: host0 })).status).toBe(401);
    // The token in the query is accepted for the event stream only.
    expect((await rawRequest(`/api/kind?token=${web.token}`, { Host: host0 }, 'POST', '{"args":[]}')).status).toBe(401);
    const ok = await rawRequest('/api/kind', { Host: host0, 'X-Stayset-Token': web.token }, 'POST', '{"args":[]}');
    expect(JSON.parse(ok.text)).toEqual({ ok: true, value: 'web' });
  });

  it('refuses another Origin or Host (403), even with the token', async () => {
    const evil = await rawRequest('/api/kind', { Host: `127.0.0.1:${web.port}`, Origin: 'http://evil.example', 'X-Stayset-Token': web.token }, 'POST', '{"args":[]}');
    expect(evil.status).toBe(403);
    const rebound = await rawRequest('/api/kind', { Host: `attacker.example:${web.port}`, 'X-Stayset-Token': web.token }, 'POST', '{"args":[]}');
    expect(rebound.status).toBe(403);
    expect((await rawRequest('/', { Host: 'attacker.example' })).status).toBe(403);
  });

  it('serves static files with content types and the CSP, and refuses traversal', async () => {
    const h = { Host: `127.0.0.1:${web.port}` };
    const index = await rawRequest('/', h);
    expect(index.status).toBe(200);
    expect(index.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(index.headers['content-security-policy']).toBe(STAYSET_CSP);
    expect((await rawRequest('/assets/app.js', h)).headers['content-type']).toBe('text/javascript; charset=utf-8');
    for (const p of ['/../secret.txt', '/%2e%2e/secret.txt', '/assets/..%2f..%2fsecret.txt', '/..%5csecret.txt']) {
      const r = await rawRequest(p, h);
      expect(r.status, p).toBe(404);
      expect(r.text).not.toContain('outside');
    }
  });

  it('answers bad arguments with 400 naming the argument', async () => {
    await expect(host.save('', sampleMast())).rejects.toThrow(/save: argument 1 \(path\) must be a non-empty string/);
    await expect(host.recover('../../etc')).rejects.toThrow(/recover: argument 1 \(id\)/);
    const broken = { ...sampleMast(), members: [{ id: 'G1', kind: 'cable', from: 'HEAD', to: 'NOWHERE', section: 'GUY' }] };
    await expect(host.runAnalysis(broken as never)).rejects.toThrow(/runAnalysis: argument 1 \(project\) is not a valid project:.*NOWHERE/);
  });
});

describe('web host: projects on disk', () => {
  it('opens the demo read-only, saves it only by save as into the root, reopens it', async () => {
    const initial = await host.openInitial();
    expect(initial?.ok && initial.value.name).toBe('demo-mast.stayset');
    const demoPath = initial?.ok ? initial.value.path! : '';
    const refused = await host.save(demoPath, sampleMast(99));
    expect(!refused.ok && refused.error).toMatch(/bundled demo file and read-only; use Save As/);
    // Save As makes a missing folder inside the root.
    const saved = await host.saveAs(sampleMast(15_000), 'sites/north');
    expect(saved?.ok && saved.value.name).toBe('north.stayset');
    const again = await host.save('sites/north.stayset', sampleMast(16_000));
    expect(again.ok).toBe(true);
    const reopened = await host.open('sites/north.stayset');
    expect(reopened?.ok && reopened.value.project.members[1].pretension).toBe(16_000);
    expect(JSON.parse(readFileSync(path.join(root, 'sites', 'north.stayset.bak'), 'utf8')).members[1].pretension).toBe(15_000);
    const recent = await host.recentProjects();
    expect(recent[0].path).toBe(path.join(root, 'sites', 'north.stayset'));
  });

  it('refuses paths outside the project root', async () => {
    const outside = await host.open('../elsewhere.stayset');
    expect(!outside?.ok && outside?.error).toMatch(/is outside the project folder/);
    const write = await host.saveAs(sampleMast(), path.join(tmp.dir, 'escape.stayset'));
    expect(!write?.ok && write?.error).toMatch(/is outside the project folder/);
    const noPath = await host.open();
    expect(!noPath?.ok && noPath?.error).toMatch(/no file dialog/);
  });

  it('autosaves, lists and recovers, and discards', async () => {
    await host.autosave(null, sampleMast(21_000));
    const list = await host.listRecovery();
    expect(list.map((e) => e.path)).toContain(null);
    const rec = await host.recover(list.find((e) => e.path === null)!.id);
    expect(rec.ok && rec.value.project.members[1].pretension).toBe(21_000);
    await host.discardRecovery(null);
    expect((await host.listRecovery()).some((e) => e.path === null)).toBe(false);
  });

  it('print schedule points to the browser print', async () => {
    const r = await host.printSchedule(sampleMast());
    expect(!r?.ok && r?.error).toMatch(/browser's Print/);
  });
});

describe('web host: analysis over SSE', () => {
  function nextDone(runIdOf: () => string): Promise<{ done: AnalysisDone; progress: AnalysisProgress[] }> {
    return new Promise((resolve) => {
      const progress: AnalysisProgress[] = [];
      const offP = host.onDidProgress((p) => p.runId === runIdOf() && progress.push(p));
      const offD = host.onDidFinishAnalysis((d) => {
        if (d.runId !== runIdOf()) return;
        offP();
        offD();
        resolve({ done: d, progress });
      });
    });
  }

  it('streams progress and the report of a run', async () => {
    let runId = '';
    const finished = nextDone(() => runId);
    await new Promise((r) => setTimeout(r, 200)); // let the event stream connect
    runId = (await host.runAnalysis(sampleMast())).runId;
    const { done, progress } = await finished;
    expect(done.status).toBe('done');
    expect(done.report?.cases).toHaveLength(2);
    expect(progress.length).toBeGreaterThan(0);
    expect(progress[0].caseCount).toBe(2);

    // The raw fields of each case come over the binary route and match the solved model.
    const project = sampleMast();
    const model = buildModel(project);
    for (let k = 0; k < 2; k++) {
      const fields = await host.caseFields(runId, k);
      expect(fields).not.toBeNull();
      expect(fields!.positions).toHaveLength(3 * model.nodeCount);
      expect(fields!.elementTension).toHaveLength(model.elementCount);
      expect(fields!.elementSlack).toHaveLength(model.elementCount);
      const top = done.report!.cases[k].nodes[1];
      expect(Array.from(fields!.positions.subarray(3, 6))).toEqual(top.position);
      const m0 = done.report!.cases[k].members[0];
      expect(fields!.elementTension[model.members[0].firstElement]).toBe(m0.tensionStart);
    }
    expect(await host.caseFields(runId, 2)).toBeNull();
    expect(await host.caseFields('0123456789abcdef', 0)).toBeNull();
    await expect(host.caseFields(runId, -1)).rejects.toThrow(/caseIndex/);
  });

  it('cancels a run', async () => {
    const net = largeGrid(30, 'W');
    net.sections[0].massPerLength = 2;
    net.loadCases = Array.from({ length: 10 }, (_, i) => ({ id: `L${i}`, nodalLoads: [{ node: 'N15_15', force: [0, 0, -1000 * (i + 1)] as [number, number, number] }] }));
    let runId = '';
    const finished = nextDone(() => runId);
    await new Promise((r) => setTimeout(r, 200));
    runId = (await host.runAnalysis(net)).runId;
    const off = host.onDidProgress((p) => {
      if (p.runId === runId) {
        off();
        void host.cancelAnalysis(runId);
      }
    });
    const { done } = await finished;
    expect(done.status).toBe('cancelled');
  });
});

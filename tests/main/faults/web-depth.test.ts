/**
 * Fault suite, web host requests (issue 14): a request body nested 20,000 levels deep is a bad
 * request (400) with a message, and the host goes on serving.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startWebHost, type WebHost } from '../../../main/web/web-server.ts';
import { makeTempDir } from '../store/temp-dir.ts';

let tmp: ReturnType<typeof makeTempDir>;
let web: WebHost;
beforeAll(async () => {
  tmp = makeTempDir('stayset-depth-');
  mkdirSync(path.join(tmp.dir, 'r'));
  web = await startWebHost({ root: tmp.dir, staticDir: path.join(tmp.dir, 'r'), assetsDir: null, userDataDir: path.join(tmp.dir, 'u') });
});
afterAll(async () => {
  await web.close();
  tmp.cleanup();
});

const post = (method: string, body: string) => fetch(`${web.origin}/api/${method}`, { method: 'POST', headers: { 'X-Stayset-Token': web.token, 'Content-Type': 'application/json' }, body });

describe('deeply nested request bodies', () => {
  it.each(['save', 'runAnalysis', 'autosave'])('%s with a 20,000-deep project → 400, host still up', async (method) => {
    const deep = '['.repeat(20_000) + ']'.repeat(20_000);
    const project = `{"format":"stayset-project","version":1,"nodes":${deep}}`;
    const args = method === 'save' ? `["x.stayset",${project}]` : method === 'autosave' ? `[null,${project}]` : `[${project}]`;
    const r = await post(method, `{"args":${args}}`);
    expect(r.status).toBe(400);
    expect(((await r.json()) as { error: string }).error).toMatch(new RegExp(`^${method}: `));
    expect(await (await post('kind', '{"args":[]}')).json()).toEqual({ ok: true, value: 'web' });
  });
});

/** Pure rules of the web host: request guard, static path mapping, project-root policy, CLI. */
import { mkdirSync, symlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseWebCli } from '../../../main/web/cli-args.ts';
import { PathPolicy } from '../../../main/web/path-policy.ts';
import { checkApiRequest, checkOrigin, tokensEqual } from '../../../main/web/request-guard.ts';
import { contentTypeFor, resolveStaticFile } from '../../../main/web/static-files.ts';
import { makeTempDir } from '../store/temp-dir.ts';

let tmp: ReturnType<typeof makeTempDir>;
beforeEach(() => (tmp = makeTempDir('stayset-rules-')));
afterEach(() => tmp.cleanup());

describe('request guard', () => {
  const base = { host: '127.0.0.1:5000', origin: undefined, secFetchSite: undefined, token: 'abc' };
  it('accepts our own host and origin, refuses others', () => {
    expect(checkOrigin(5000, base)).toEqual({ ok: true });
    expect(checkOrigin(5000, { ...base, host: 'localhost:5000', origin: 'http://localhost:5000' })).toEqual({ ok: true });
    expect(checkOrigin(5000, { ...base, host: '127.0.0.1:5001' })).toMatchObject({ status: 403 });
    expect(checkOrigin(5000, { ...base, origin: 'null' })).toMatchObject({ status: 403 });
    expect(checkOrigin(5000, { ...base, secFetchSite: 'cross-site' })).toMatchObject({ status: 403 });
  });
  it('checks the token', () => {
    expect(checkApiRequest(5000, 'abc', base)).toEqual({ ok: true });
    expect(checkApiRequest(5000, 'abc', { ...base, token: undefined })).toMatchObject({ status: 401, error: /Missing/ });
    expect(checkApiRequest(5000, 'abc', { ...base, token: 'abd' })).toMatchObject({ status: 401, error: /Wrong/ });
    expect(tokensEqual('abc', 'abcd')).toBe(false);
  });
});

describe('static files', () => {
  it('maps paths inside the root only, following symlinks to their target', async () => {
    const root = path.join(tmp.dir, 'www');
    mkdirSync(root);
    writeFileSync(path.join(root, 'index.html'), 'x');
    writeFileSync(path.join(tmp.dir, 'secret.txt'), 's');
    symlinkSync(path.join(tmp.dir, 'secret.txt'), path.join(root, 'link.txt'));
    expect(await resolveStaticFile(root, '/')).toBe(path.join(await import('node:fs').then((f) => f.realpathSync(root)), 'index.html'));
    expect(await resolveStaticFile(root, '/link.txt')).toBeNull();
    expect(await resolveStaticFile(root, '/%2e%2e/secret.txt')).toBeNull();
    expect(await resolveStaticFile(root, '/a%00b')).toBeNull();
    expect(await resolveStaticFile(root, '/%E0%A4%A')).toBeNull();
    expect(contentTypeFor('x.CSS')).toBe('text/css; charset=utf-8');
    expect(contentTypeFor('x.unknown')).toBe('application/octet-stream');
  });
});

describe('project root policy', () => {
  it('confines reads to root + assets and writes to root, not assets', async () => {
    const root = path.join(tmp.dir, 'root');
    const assets = path.join(tmp.dir, 'assets');
    mkdirSync(root);
    mkdirSync(assets);
    writeFileSync(path.join(assets, 'demo.stayset'), '{}');
    writeFileSync(path.join(tmp.dir, 'out.stayset'), '{}');
    symlinkSync(path.join(tmp.dir, 'out.stayset'), path.join(root, 'sneaky.stayset'));
    const policy = await PathPolicy.create(root, assets);
    expect(await policy.forRead(path.join(assets, 'demo.stayset'))).toMatchObject({ ok: true, readOnly: true });
    expect(await policy.forRead('../out.stayset')).toMatchObject({ ok: false, error: /outside the project folder/ });
    expect(await policy.forRead('sneaky.stayset')).toMatchObject({ ok: false });
    expect(await policy.forWrite('sneaky.stayset')).toMatchObject({ ok: false, error: /outside/ });
    expect(await policy.forWrite(path.join(assets, 'demo.stayset'))).toMatchObject({ ok: false, error: /read-only/ });
    expect(await policy.forWrite('new.stayset')).toMatchObject({ ok: true, path: path.join(policy.root, 'new.stayset') });
    expect(await policy.forRead('missing.stayset')).toMatchObject({ ok: false, error: /not found/ });
  });
});

describe('web CLI', () => {
  it('parses options and names bad ones', () => {
    expect(parseWebCli(['--root', 'r', '--port', '8080', '--open-demo'], '/cwd')).toEqual({
      ok: true, options: { root: 'r', port: 8080, open: null, openDemo: 'demo-mast.stayset', dataDir: null, staticDir: null },
    });
    expect(parseWebCli(['--port', 'x'], '/cwd')).toMatchObject({ ok: false, error: /--port: "x" is not a port/ });
    expect(parseWebCli(['--root'], '/cwd')).toMatchObject({ ok: false, error: /--root needs a value/ });
    expect(parseWebCli(['--bogus'], '/cwd')).toMatchObject({ ok: false, error: /Unknown option "--bogus"/ });
  });
});

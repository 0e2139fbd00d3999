/**
 * electron-builder.yml: targets, app id, the .stayset association, and that only the bundle,
 * assets and package.json are shipped (option names per electron.build configuration docs).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
const cfg = parse(readFileSync(path.join(repo, 'electron-builder.yml'), 'utf8'));
const pkg = JSON.parse(readFileSync(path.join(repo, 'package.json'), 'utf8'));

describe('electron-builder.yml', () => {
  it('names the app', () => {
    expect(cfg.appId).toBe('app.stayset.desktop');
    expect(cfg.productName).toBe('Stayset');
  });

  it('builds AppImage + deb, NSIS and dmg', () => {
    expect(cfg.linux.target).toEqual(['AppImage', 'deb']);
    expect(cfg.win.target).toEqual(['nsis']);
    expect(cfg.mac.target).toEqual(['dmg']);
  });

  it('associates .stayset files', () => {
    expect(cfg.fileAssociations).toEqual([expect.objectContaining({ ext: 'stayset', name: 'Stayset project', mimeType: 'application/x-stayset-project' })]);
    expect(cfg.linux.mimeTypes).toContain('application/x-stayset-project');
  });

  it('ships the bundle, assets and package.json only; never tests or sources', () => {
    const files: string[] = cfg.files;
    expect(files).toEqual(expect.arrayContaining(['package.json', 'dist/**/*', 'assets/**/*']));
    for (const excluded of ['!tests/**/*', '!solver/**/*', '!main/**/*', '!renderer/**/*', '!**/*.ts', '!node_modules/**/*']) expect(files).toContain(excluded);
    expect(files.filter((f) => !f.startsWith('!'))).toEqual(['package.json', 'dist/**/*', 'assets/**/*']);
  });

  it('starts the bundled main and unpacks the worker from asar', () => {
    expect(pkg.main).toBe('dist/main/electron/main.js');
    expect(cfg.asarUnpack).toContain('dist/main/electron/analysis-worker.mjs');
  });
});

/**
 * Electron security checklist (electronjs.org/docs/latest/tutorial/security, "Check which fuses
 * you can change"; fuse names per @electron/fuses and electron-builder's electronFuses option).
 */
describe('electron-builder.yml: fuses', () => {
  it('turns off Node entry points and pins the app to its asar archive', () => {
    expect(cfg.electronFuses).toEqual({
      runAsNode: false,
      enableCookieEncryption: true,
      enableNodeOptionsEnvironmentVariable: false,
      enableNodeCliInspectArguments: false,
      enableEmbeddedAsarIntegrityValidation: true,
      onlyLoadAppFromAsar: true,
      grantFileProtocolExtraPrivileges: false,
    });
  });

  it('every fuse named is one electron-builder knows (its own configuration schema)', () => {
    const scheme = JSON.parse(readFileSync(path.join(repo, 'node_modules', 'app-builder-lib', 'scheme.json'), 'utf8'));
    const known = Object.keys(scheme.definitions.FuseOptionsV1.properties);
    for (const name of Object.keys(cfg.electronFuses)) expect(known).toContain(name);
  });
});

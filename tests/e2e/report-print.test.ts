/**
 * The calculation report printed to PDF by `stayset report --pdf` (headless Chromium through
 * playwright-core): every page carries the caution and "page N of M"; pages rendered to PNG with
 * poppler's pdftoppm land in test-artifacts/report/ for a human look.
 * Page size: ISO 216 A4 = 595.28 × 841.89 pt (Chromium rounds to 8.27 × 11.7 in).
 */
import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { runStayset } from '../main/cli/run-stayset.ts';
import { smallMast } from '../solver/sequence/small-mast.ts';
import { serializeProject } from '../../main/common/project/index.ts';

const ARTIFACTS = resolve('test-artifacts/report');

describe.runIf(existsSync('/usr/bin/chromium'))('printed calculation report', () => {
  it('prints A4 pages, each with the caution and its page number', () => {
    mkdirSync(ARTIFACTS, { recursive: true });
    const p = smallMast();
    p.meta = { ...p.meta, name: 'Report print test mast' };
    p.sequences = [{ id: 'top down', steps: [{ group: 'm/guys level 2', setBy: 'force' }, { group: 'm/guys level 1', setBy: 'force' }] }];
    const file = join(ARTIFACTS, 'report-test.stayset');
    writeFileSync(file, serializeProject(p));
    const pdf = join(ARTIFACTS, 'report.pdf');
    const r = runStayset(['report', file, '--pdf', pdf, '--date', '2026-12-01']);
    expect(r.code, r.stderr).toBe(0);
    const info = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
    const pages = Number(/Pages:\s+(\d+)/.exec(info)![1]);
    const size = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info)!;
    expect(pages).toBeGreaterThanOrEqual(2);
    expect(Math.abs(Number(size[1]) - 595.28)).toBeLessThan(1.5);
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    const perPage = text.split('\f').filter((t) => t.trim().length > 0);
    expect(perPage.length).toBe(pages);
    perPage.forEach((t, i) => {
      const flat = t.replace(/\s+/g, ' ');
      expect(flat, `page ${i + 1}`).toContain('CAUTION');
      expect(flat, `page ${i + 1}`).toContain('qualified engineer');
      expect(flat, `page ${i + 1}`).toContain(`page ${i + 1} of ${pages}`);
    });
    expect(text).toContain('Governing results per check');
    expect(text).toContain('Tensioning sequence top down');
    for (const f of readdirSync(ARTIFACTS)) if (f.endsWith('.png')) rmSync(join(ARTIFACTS, f));
    execFileSync('pdftoppm', ['-r', '50', '-png', pdf, join(ARTIFACTS, 'report')]);
    expect(readdirSync(ARTIFACTS).filter((f) => f.endsWith('.png')).length).toBe(pages);
  });
});

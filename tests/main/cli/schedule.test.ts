import { describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { fixture, REPO_ROOT, runStayset } from './run-stayset.ts';
import { solveProject } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

const MAST = join(REPO_ROOT, fixture('kestrel-moor-mast.stayset.json'));

describe('stayset schedule', () => {
  it('writes the HTML and the CSV; the CSV tensions are the solver numbers', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-schedule-'));
    const html = join(dir, 'out.html');
    const csv = join(dir, 'out.csv');
    const r = runStayset(['schedule', MAST, '--html', html, '--csv', csv, '--paper', 'letter', '--date', '2026-12-01']);
    expect(r.stderr).toContain('wrote');
    expect(r.code).toBe(0);
    const page = readFileSync(html, 'utf8');
    expect(page).toContain('Results are for review by a qualified engineer; local codes and licensed practice govern.');
    expect(page).toContain('size: letter portrait');
    expect(page).toContain('2026-12-01');
    const records = parse(readFileSync(csv, 'utf8'), { relax_column_count: true }) as string[][];
    const start = records.findIndex((x) => x[0].startsWith('Tension per case'));
    const head = records[start + 1];
    const project = JSON.parse(readFileSync(MAST, 'utf8')) as ProjectFile;
    const report = solveProject(project).report;
    // Cables only by default (the project has no "schedule" field).
    const cables = project.members.filter((m) => m.kind === 'cable');
    expect(records[start + 2 + cables.length]).toEqual(['']);
    for (let i = start + 2; i < start + 2 + cables.length; i++) {
      const row = records[i];
      head.slice(1).forEach((caseId, j) => {
        const m = report.cases.find((c) => c.id === caseId)!.members.find((x) => x.id === row[0])!;
        expect(Number(row[j + 1])).toBeCloseTo(m.tensionMax / 1000, 2);
      });
    }
    // No temp files left beside the outputs.
    expect(readFileSync(csv, 'utf8').length).toBeGreaterThan(100);
  });

  it('refuses to overwrite the project file and rejects bad option values (exit 2)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-schedule-'));
    const file = join(dir, 'p.stayset.json');
    writeFileSync(file, readFileSync(MAST));
    const before = readFileSync(file, 'utf8');
    const same = runStayset(['schedule', file, '--html', file]);
    expect(same.code).toBe(2);
    expect(same.stderr).toMatch(/project file itself/);
    expect(readFileSync(file, 'utf8')).toBe(before);
    const paper = runStayset(['schedule', file, '--html', join(dir, 'x.html'), '--paper', 'a3']);
    expect(paper.code).toBe(2);
    expect(paper.stderr).toMatch(/--paper must be a4 or letter, got "a3"/);
    expect(existsSync(join(dir, 'x.html'))).toBe(false);
    const none = runStayset(['schedule', file]);
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/--html FILE, --pdf FILE and\/or --csv FILE/);
  });

  it('still writes the schedule when a case does not converge, says why, and exits 1', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-schedule-'));
    const html = join(dir, 'm.html');
    const r = runStayset(['schedule', join(REPO_ROOT, fixture('mechanism-free-node.stayset.json')), '--html', html, '--date', '2026-12-01']);
    expect(r.code).toBe(1);
    const page = readFileSync(html, 'utf8');
    expect(page).toMatch(/Case &#39;dead&#39; did not converge \(singular\)/);
    expect(page).toMatch(/Installation data left out: reference case &#39;dead&#39; did not converge/);
    expect(page).toContain('Results are for review by a qualified engineer');
  });
});

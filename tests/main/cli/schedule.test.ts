import { describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { fixture, REPO_ROOT, runStayset } from './run-stayset.ts';
import { solveProject } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';
import { targetText } from '../../../main/common/tuning/tuning-text.ts';

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

  it('lists the chosen groups or every member; an unknown group or two choices are bad input (exit 2)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-schedule-'));
    const csv = join(dir, 'g.csv');
    const records = (f: string) => parse(readFileSync(f, 'utf8'), { relax_column_count: true }) as string[][];
    const tensionRows = (rows: string[][]) => {
      const start = rows.findIndex((x) => x[0].startsWith('Tension per case'));
      const out: string[] = [];
      for (let i = start + 2; rows[i] && rows[i][0] !== ''; i++) out.push(rows[i][0]);
      return out;
    };
    expect(runStayset(['schedule', MAST, '--csv', csv, '--date', '2026-12-01']).code).toBe(0);
    expect(tensionRows(records(csv))).toEqual(['G1', 'G2', 'G3']);
    expect(records(csv).some((r) => r[0].startsWith('Other members listed'))).toBe(false);
    // --all: the mast bar appears once, in the summary (group-less: by its section).
    expect(runStayset(['schedule', MAST, '--csv', csv, '--all', '--date', '2026-12-01']).code).toBe(0);
    const all = records(csv);
    expect(tensionRows(all)).toEqual(['G1', 'G2', 'G3']);
    const summary = all[all.findIndex((r) => r[0].startsWith('Other members listed')) + 2];
    const project = JSON.parse(readFileSync(MAST, 'utf8')) as ProjectFile;
    expect(summary.slice(0, 3)).toEqual([`section ${project.members.find((m) => m.id === 'MAST')!.section}`, 'bar', '1']);
    // The mast bar's smallest axial force is its compression in the worst case.
    const report = solveProject(project).report;
    const least = Math.min(...report.cases.filter((c) => c.converged).map((c) => c.members.find((m) => m.id === 'MAST')!.tensionMin));
    expect(Number(summary[5])).toBeCloseTo(least / 1000, 2);
    // --groups
    expect(runStayset(['schedule', MAST, '--csv', csv, '--groups', 'guys', '--date', '2026-12-01']).code).toBe(0);
    expect(tensionRows(records(csv))).toEqual(['G1', 'G2', 'G3']);
    const unknown = runStayset(['schedule', MAST, '--csv', join(dir, 'u.csv'), '--groups', 'guys,stays']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/schedule.groups: group "stays" does not exist \(groups: guys\)/);
    expect(existsSync(join(dir, 'u.csv'))).toBe(false);
    const both = runStayset(['schedule', MAST, '--csv', join(dir, 'u.csv'), '--groups', 'guys', '--all']);
    expect(both.code).toBe(2);
    expect(both.stderr).toMatch(/choose one of --groups, --all and --cables/);
  });

  it('prints the tuning run `tune --write` kept in the file, and the frequencies of `stayset modes`', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-schedule-'));
    const file = join(dir, 'mast.stayset.json');
    const p = JSON.parse(readFileSync(MAST, 'utf8')) as ProjectFile;
    p.tuning!.targets = [{ kind: 'tensionShare', group: 'guys', share: 0.12 }];
    writeFileSync(file, JSON.stringify(p, null, 2));
    const html = join(dir, 's.html');
    expect(runStayset(['schedule', file, '--html', html, '--date', '2026-12-01']).code).toBe(0);
    expect(readFileSync(html, 'utf8')).toContain('No tuning run is recorded');
    const tune = runStayset(['tune', file, '--write', '--json']);
    expect(tune.code).toBe(0);
    const tuned = JSON.parse(tune.stdout);
    const saved = JSON.parse(readFileSync(file, 'utf8')) as ProjectFile;
    // The record keeps the tuner's numbers and the words of the run in the project's display units (SI).
    expect(saved.tuning!.lastRun).toMatchObject({ status: 'met', targets: [{ kind: 'tensionShare', met: true, label: targetText(p, tuned.targets[0].target, 'SI') }], variables: [{ group: 'guys', by: 'pretension' }] });
    expect(saved.tuning!.lastRun!.summary).toBe(`1 of 1 targets met after ${tuned.iterations} iterations (${tuned.evaluations} solves)`);
    expect(saved.tuning!.lastRun!.variables![0].final).toBe(tuned.variables[0].final);
    expect(runStayset(['schedule', file, '--html', html, '--date', '2026-12-01']).code).toBe(0);
    const page = readFileSync(html, 'utf8');
    expect(page).not.toContain('No tuning run is recorded');
    expect(page).toContain(`<td>${saved.tuning!.lastRun!.targets![0].label.replace(/'/g, '&#39;')}</td><td>12.0 % (target 12.0 %)</td><td>yes</td>`);
    expect(page).toContain(`<td>All guys</td><td>pretension</td><td>${(tuned.variables[0].final / 1000).toFixed(2)} kN</td>`);
    // Natural frequencies: the same numbers as `stayset modes` about the reference case.
    const modes = runStayset(['modes', file, '--case', 'dead', '-n', '6', '--json']);
    expect(modes.code).toBe(0);
    const list = JSON.parse(modes.stdout).modes.modes as { number: number; frequency: number }[];
    expect(list.length).toBeGreaterThanOrEqual(3);
    expect(page).toContain('about case &quot;dead&quot;');
    for (const m of list) expect(page).toContain(`<td>${m.number}</td><td class="num">${m.frequency.toFixed(3)}</td>`);
  });
});

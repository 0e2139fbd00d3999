// What the schedule lists (cables by default, chosen groups, all members summarised), the
// revision block, the stored tuning run and the natural frequencies, checked against the solver
// results read directly (envelope = max/min over the cases by definition; utilisation from
// runChecks; frequencies from solveModes) — not against the schedule's own helpers.
import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { membersOfGroup, purposeOf, referenceCaseId, runChecks, solveModes, solveNamedCases, solveProject, tuneProject } from '../../../../solver/index.ts';
import { tuningRunRecord } from '../../../../main/common/tuning/tuning-record.ts';
import type { CheckReport, ModalOutcome, ProjectFile, SolveReport } from '../../../../solver/index.ts';
import { buildSchedule, scheduleCsv, scheduleHtml } from '../../../../main/common/schedule/index.ts';
import { validateProject } from '../../../../main/common/project/index.ts';
import { buildReport } from '../../../../main/common/report/build-report.ts';
import { reportHtml } from '../../../../main/common/report/report-html.ts';
import { mastProject } from './mast-fixture.ts';

let project: ProjectFile;
let report: SolveReport;
let checks: CheckReport;
let modes: ModalOutcome;
const date = { issueDate: '2026-12-02' };

beforeAll(() => {
  project = mastProject({ mastModel: 'lattice' });
  report = solveProject(project).report;
  checks = runChecks(project, report);
  modes = solveModes(project, referenceCaseId(project), { count: 6 }).modal;
});

const cableIds = () => project.members.filter((m) => m.kind === 'cable').map((m) => m.id);

describe('what the schedule lists', () => {
  it('lists the cables only by default, in full, and nothing is summarised', () => {
    const doc = buildSchedule({ project, report, checks }, date);
    expect(doc.members.map((m) => m.id)).toEqual(cableIds());
    expect(doc.memberSummary).toEqual([]);
    expect(doc.listing).toMatchObject({ list: 'cables', inFull: 6, summarised: 0, total: project.members.length });
    // Every per-case tension row is a cable; the printed page says what was left out.
    const html = scheduleHtml(doc);
    expect(html).toContain(`cables: 6 cables in full; ${project.members.length - 6} of ${project.members.length} members not listed`);
    expect(html).not.toMatch(/<b>mast\/leg/); // no row of a mast leg
    // Passing check rows of unlisted bars are left out, with a note; failing rows would stay.
    expect(doc.checkRows!.every((r) => r.verdict === 'FAIL' || !r.item.startsWith('mast/leg'))).toBe(true);
  });

  it('lists chosen groups: their cables in full, their bars as one summary row per group, numbers from the cases', () => {
    const legs = 'mast/mast legs';
    const doc = buildSchedule({ project, report, checks }, { ...date, listing: { list: 'groups', groups: ['mast/guys level 1', legs] } });
    const level1 = [...membersOfGroup(project, 'mast/guys level 1')];
    expect(doc.members.map((m) => m.id).sort()).toEqual(level1.sort());
    expect(doc.memberSummary).toHaveLength(1);
    const row = doc.memberSummary[0];
    const ids = membersOfGroup(project, legs);
    expect(row.count).toBe(ids.size);
    // Envelope by definition: the largest tension and the smallest axial force over the
    // converged cases that are checked by themselves.
    let max = -Infinity, min = Infinity;
    for (const c of report.cases) {
      if (!c.converged || purposeOf(project, c.id) === 'componentOnly') continue;
      for (const m of c.members) if (ids.has(m.id)) { max = Math.max(max, m.tensionMax); min = Math.min(min, m.tensionMin); }
    }
    expect(row.maxTension).toBe(max);
    expect(row.minForce).toBe(min);
    expect(row.minForce!).toBeLessThan(0); // the legs of a guyed mast are in compression
    // The fixture's bars have no yield strength: no utilisation, every leg counted as not checked.
    const utils = checks.members.filter((m) => ids.has(m.id) && m.utilisation !== null).map((m) => m.utilisation!);
    expect(row.utilisation).toBe(utils.length ? Math.max(...utils) : null);
    expect(row.unchecked + row.failing).toBe(checks.members.filter((m) => ids.has(m.id) && m.status !== 'pass').length + ids.size - checks.members.filter((m) => ids.has(m.id)).length);
    const html = scheduleHtml(doc);
    expect(html).toContain('Other members listed, summarised per group');
    expect(html).toContain(`${(min / 1000).toFixed(2)}</td>`);
    // The CSV carries the same summary.
    expect(scheduleCsv(doc)).toContain(`mast legs,bar,${ids.size},${(max / 1000).toFixed(2)}`);
  });

  it('all members: every bar summarised, the project field chooses when no option is given', () => {
    const doc = buildSchedule({ project: { ...project, schedule: { list: 'all' } }, report, checks }, date);
    expect(doc.listing.summarised + doc.listing.inFull).toBe(project.members.length);
    expect(doc.memberSummary.map((r) => r.label)).toEqual(['mast legs', 'mast bracing']);
    expect(doc.memberSummary.reduce((n, r) => n + r.count, 0)).toBe(project.members.length - 6);
  });

  it('the demo mast (bars with a yield strength): each summary row carries the highest utilisation of its group', () => {
    const demo = JSON.parse(readFileSync('assets/demo-mast.stayset', 'utf8')) as ProjectFile;
    const r = solveProject(demo).report;
    const c = runChecks(demo, r);
    const doc = buildSchedule({ project: demo, report: r, checks: c }, { ...date, listing: { list: 'all' } });
    expect(doc.memberSummary.map((x) => x.label)).toEqual(['mast legs', 'mast bracing']);
    for (const row of doc.memberSummary) {
      const ids = membersOfGroup(demo, `mast/${row.label}`);
      const own = c.members.filter((m) => ids.has(m.id));
      expect(row.count).toBe(ids.size);
      expect(row.utilisation).toBe(Math.max(...own.map((m) => m.utilisation!)));
      expect(row.utilisation!).toBeGreaterThan(0);
      expect(row.failing).toBe(own.filter((m) => m.status === 'fail').length);
    }
  });

  it('refuses an unknown group naming it, and an empty group choice', () => {
    expect(() => buildSchedule({ project, report }, { ...date, listing: { list: 'groups', groups: ['stays'] } })).toThrow(/schedule.groups: group "stays" does not exist/);
    expect(() => buildSchedule({ project, report }, { ...date, listing: { list: 'groups', groups: [] } })).toThrow(/needs at least one group/);
  });

  it('the project file validates the choice: unknown group and empty list named', () => {
    const bad = validateProject({ ...project, schedule: { list: 'groups', groups: ['stays'] } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors).toContain('schedule: groups: group "stays" does not exist');
    const empty = validateProject({ ...project, schedule: { list: 'groups' } });
    expect(empty.ok).toBe(false);
    if (!empty.ok) expect(empty.errors).toContain('schedule: list "groups" needs at least one group in "groups"');
    const wrong = validateProject({ ...project, schedule: { list: 'bars' } });
    expect(wrong.ok).toBe(false);
    expect(validateProject({ ...project, schedule: { list: 'groups', groups: ['mast/guys'] } }).ok).toBe(true);
  });
});

describe('revision block', () => {
  it('prints the revisions of report.revisions with who checked, and the latest in the header', () => {
    const p: ProjectFile = { ...project, report: { documentNumber: 'HF-001', revisions: [
      { revision: 'A', date: '2026-11-01', description: 'For review', by: 'A. N. Engineer' },
      { revision: 'B', date: '2026-12-01', description: 'Issued for construction', by: 'A. N. Engineer', checkedBy: 'C. Hecker' },
    ] } };
    const doc = buildSchedule({ project: p, report }, date);
    const html = scheduleHtml(doc);
    expect(html).toContain('<caption>Revisions</caption>');
    expect(html).toContain('<td>B</td><td>2026-12-01</td><td>Issued for construction</td><td>A. N. Engineer</td><td>C. Hecker</td>');
    expect(html).toContain('<th scope="row">Checked by</th><td>C. Hecker</td>');
    expect(html).toContain('<th scope="row">Revision</th><td>B (2026-12-01)</td>');
    expect(html).toContain('<th scope="row">Document</th><td>HF-001</td>');
  });

  it('says so when the project records no revision', () => {
    const html = scheduleHtml(buildSchedule({ project, report }, date));
    expect(html).toContain('not recorded in the project (report.revisions)');
    expect(html).toContain('<th scope="row">Checked by</th><td>not recorded</td>');
  });
});

describe('the tuning run kept in the project', () => {
  it('prints targets, values and variables from tuning.lastRun alone, and notes a later change of pretension', () => {
    const p: ProjectFile = structuredClone(project);
    p.tuning = { variables: [{ group: 'mast/guys level 1', by: 'pretension' }], targets: [{ kind: 'tensionShare', group: 'mast/guys level 1', share: 0.1 }] };
    const run = tuneProject(p, { solveCases: solveNamedCases });
    expect(run.status).toBe('met');
    const tuned: ProjectFile = { ...run.project, tuning: { ...run.project.tuning!, lastRun: tuningRunRecord(run, p, 'SI', '2026-12-01T10:00:00Z') } };
    // The record survives the file format.
    expect(validateProject(JSON.parse(JSON.stringify(tuned))).ok).toBe(true);
    const doc = buildSchedule({ project: tuned, report: solveProject(tuned).report }, date);
    expect(doc.tuning).not.toBeNull();
    expect(doc.tuning!.date).toBe('2026-12-01T10:00:00Z');
    expect(doc.tuning!.targets).toHaveLength(1);
    expect(doc.tuning!.targets[0].met).toBe(true);
    // Tension share 0.1 of the breaking load (16 mm strand: 230 kN in the fixture) → 10.0 % (a share prints to 0.1 %).
    expect(doc.tuning!.targets[0].value).toMatch(/^10\.0 % \(target 10\.0 %\)$/);
    expect(doc.tuning!.variables[0]).toEqual({ group: 'guys level 1', by: 'pretension', value: `${(run.variables[0].final / 1000).toFixed(2)} kN` });
    const html = scheduleHtml(doc);
    expect(html).not.toContain('No tuning run is recorded');
    expect(html).toContain('every target met');
    expect(doc.notes.join(' ')).not.toContain('tuning record is not the current state');
    // The calculation report prints the same run from the same record.
    const tunedReport = solveProject(tuned).report;
    const calc = reportHtml(buildReport({ project: tuned, report: tunedReport, checks: runChecks(tuned, tunedReport), installation: null, sequences: [] }, date));
    expect(calc).toContain(`<td>${doc.tuning!.targets[0].value}</td><td>yes</td>`);
    expect(calc).toContain(`<td>guys level 1</td><td>pretension</td><td>${doc.tuning!.variables[0].value}</td>`);
    // A later edit of the pretension: the record stays, and the schedule says it is not the current state.
    const edited: ProjectFile = { ...tuned, members: tuned.members.map((m) => (membersOfGroup(tuned, 'mast/guys level 1').has(m.id) ? { ...m, pretension: 12e3 } : m)) };
    const later = buildSchedule({ project: edited, report: solveProject(edited).report }, date);
    expect(later.notes.join(' ')).toContain('The pretension of guys level 1 is 12.00 kN; the tuning run of 2026-12-01T10:00:00Z left');
  });

  it('a record written before the detailed one (date and summary only) still prints', () => {
    const p: ProjectFile = { ...project, tuning: { variables: [], targets: [], lastRun: { date: '2026-01-02', summary: '2 of 2 targets met' } } };
    const html = scheduleHtml(buildSchedule({ project: p, report }, date));
    expect(html).toContain('<b>2 of 2 targets met</b> (run of 2026-01-02)');
  });
});

describe('natural frequencies', () => {
  it('prints the first modes of solveModes about the reference case, 3 decimals', () => {
    expect(modes.ok).toBe(true);
    if (!modes.ok) return;
    const doc = buildSchedule({ project, report, modes }, date);
    expect(doc.frequencies!.case).toBe(referenceCaseId(project));
    expect(doc.frequencies!.modes.map((m) => m.frequency)).toEqual(modes.analysis.modes.slice(0, 6).map((m) => m.frequency));
    const html = scheduleHtml(doc);
    for (const m of modes.analysis.modes.slice(0, 6)) expect(html).toContain(`<td>${m.number}</td><td class="num">${m.frequency.toFixed(3)}</td><td class="num">${(1 / m.frequency).toFixed(3)}</td>`);
  });

  it('prints the reason when there are no modes', () => {
    const doc = buildSchedule({ project, report, modes: { ok: false, refusal: { code: 'noMass' } } }, date);
    expect(scheduleHtml(doc)).toContain('No modes: no mass is free to move.');
  });
});

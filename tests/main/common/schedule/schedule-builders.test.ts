import { beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { buildModel, checkMemberFrequency, installationData, runChecks, solveProject } from '../../../../solver/index.ts';
import type { CheckReport, InstallationData, ProjectFile, SolveReport } from '../../../../solver/index.ts';
import { buildSchedule, scheduleCsv, scheduleFragment, scheduleHtml, SCHEDULE_CAUTION } from '../../../../main/common/schedule/index.ts';
import { NEWTONS_PER_KIP, METRES_PER_FOOT } from '../../../../main/common/units/index.ts';
import { mastProject } from './mast-fixture.ts';

let project: ProjectFile;
let report: SolveReport;
let checks: CheckReport;
let installation: InstallationData;

beforeAll(() => {
  project = mastProject();
  report = solveProject(project).report;
  checks = runChecks(project, report);
  installation = installationData(project);
});

/** Rows of one CSV block: the records after the block's title record, up to the next empty record. */
function block(records: string[][], title: string): string[][] {
  const start = records.findIndex((r) => r[0].startsWith(title));
  expect(start, `block "${title}"`).toBeGreaterThanOrEqual(0);
  const out: string[][] = [];
  for (let i = start + 1; i < records.length && !(records[i].length === 1 && records[i][0] === ''); i++) out.push(records[i]);
  return out;
}

describe('schedule CSV against the solver numbers', () => {
  it('every member tension per case equals the solver result (kN, 2 decimals)', () => {
    const doc = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' });
    const records = parse(scheduleCsv(doc), { relax_column_count: true, skip_empty_lines: false }) as string[][];
    expect(records[1]).toEqual(['Caution', SCHEDULE_CAUTION]);
    const [head, ...rows] = block(records, 'Tension per case');
    expect(head).toEqual(['member', ...report.cases.map((c) => c.id)]);
    expect(rows.map((r) => r[0])).toEqual(project.members.filter((m) => m.kind === 'cable').map((m) => m.id));
    for (const row of rows) {
      report.cases.forEach((c, j) => {
        const m = c.members.find((x) => x.id === row[0])!;
        expect(Number(row[j + 1])).toBeCloseTo(m.tensionMax / 1000, 2);
      });
    }
  });

  it('cut lengths are the sums of the model element unstressed lengths; installation tensions match', () => {
    const doc = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' });
    const records = parse(scheduleCsv(doc), { relax_column_count: true }) as string[][];
    const [head, ...rows] = block(records, 'Members');
    const cutCol = head.indexOf('cut length (m)');
    const instCol = head.indexOf('installation tension (kN)');
    const model = buildModel(project);
    for (const row of rows) {
      const topo = model.members.find((m) => m.id === row[0])!;
      let sum = 0;
      for (let e = topo.firstElement; e < topo.firstElement + topo.elementCount; e++) sum += model.elemUnstressedLength[e];
      expect(Number(row[cutCol])).toBeCloseTo(sum, 3); // lengths print to 1 mm (main/common/units)
      const dead = report.cases.find((c) => c.id === 'dead')!.members.find((m) => m.id === row[0])!;
      // Installation tension = lower-end tension in the dead case at T_ref.
      const from = project.nodes.find((n) => n.id === project.members.find((m) => m.id === row[0])!.from)!;
      const to = project.nodes.find((n) => n.id === project.members.find((m) => m.id === row[0])!.to)!;
      const lower = from.at[2] <= to.at[2] ? dead.tensionStart : dead.tensionEnd;
      expect(Number(row[instCol])).toBeCloseTo(lower / 1000, 2);
    }
  });

  it('US units convert by the exact definitions (1 kip = 4448.2216152605 N, 1 ft = 0.3048 m; NIST SP 811)', () => {
    const si = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' });
    const us = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01', units: 'US' });
    const siRows = block(parse(scheduleCsv(si), { relax_column_count: true }) as string[][], 'Members');
    const usRows = block(parse(scheduleCsv(us), { relax_column_count: true }) as string[][], 'Members');
    expect(usRows[0]).toContain('cut length (ft)');
    for (let i = 1; i < siRows.length; i++) {
      // Both printed to their kind's resolution (1 mm; 0.001 ft), so they agree to about 2 mm.
      expect(Math.abs(Number(usRows[i][4]) * METRES_PER_FOOT - Number(siRows[i][4]))).toBeLessThan(0.002);
      expect(Number(usRows[i][5])).toBeCloseTo((Number(siRows[i][5]) * 1000) / NEWTONS_PER_KIP, 2);
    }
    expect(us.temperatureTable!.temperatures[0]).toBeCloseTo(253.15, 6); // model stays SI
    expect(scheduleCsv(us)).toContain('-4.0'); // −20 °C = −4 °F (°F = °C·9/5 + 32)
  });

  it('the temperature block lists every cable at every installation temperature', () => {
    const doc = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' });
    const [head, ...rows] = block(parse(scheduleCsv(doc), { relax_column_count: true }) as string[][], 'Installation tension by temperature');
    expect(head.slice(1).map(Number)).toEqual([-20, -15, -10, -5, 0, 5, 10, 15, 20, 25, 30, 35, 40]);
    expect(rows.length).toBe(project.members.filter((m) => m.kind === 'cable').length);
    // At the reference temperature (10 °C) the table gives the installation tension itself.
    const col = head.indexOf('10.0');
    for (const r of rows) expect(Number(r[col])).toBeCloseTo(installation.members.find((m) => m.id === r[0])!.installationTension / 1000, 2);
  });
});

describe('schedule frequency table for site checks', () => {
  it('f1 at each temperature is the taut-string frequency of the table tension and reads back as on target', () => {
    const doc = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' });
    const tt = doc.temperatureTable!;
    for (const row of tt.rows) {
      const m = installation.members.find((x) => x.id === row.member)!;
      tt.temperatures.forEach((T, j) => {
        // f1 = (1/2L)√(T_mid/m), T_mid = T_lower + m g h/2 (Irvine 1981, ch. 1 and 4).
        const mid = row.tensions[j]! + (m.massPerLength * 9.80665 * m.heightDifference) / 2;
        expect(row.frequencies[j]).toBeCloseTo(Math.sqrt(mid / m.massPerLength) / (2 * m.chordLength), 10);
        // Reading exactly that frequency on site at that temperature means "on target".
        const check = checkMemberFrequency(installation, row.member, T, row.frequencies[j]!);
        expect(Math.abs(check.relativeDifference)).toBeLessThan(1e-6);
      });
    }
  });
});

describe('schedule HTML', () => {
  it('is a standalone document with the caution, repeating headers and the chosen paper', () => {
    const a4 = scheduleHtml(buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' }));
    const letter = scheduleHtml(buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01', paper: 'letter' }));
    expect(a4.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(a4).toContain(SCHEDULE_CAUTION);
    expect(a4).toContain('thead { display: table-header-group; }');
    expect(a4).toContain('size: A4 portrait');
    expect(letter).toContain('size: letter portrait');
    expect(a4).not.toMatch(/<script|<link|src=/);
  });

  it('escapes text from the project file', () => {
    const p = structuredClone(project);
    p.meta!.name = '<img src=x onerror=alert(1)> & "Co"';
    const html = scheduleHtml(buildSchedule({ project: p, report, checks: null, installation: null }, { issueDate: '2026-12-01' }));
    expect(html).not.toContain('<img src=x');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt; &amp; &quot;Co&quot;');
    expect(html).toContain('Design checks were not run');
  });

  it('rejects an unknown unit system or paper, naming it', () => {
    expect(() => buildSchedule({ project, report }, { issueDate: '2026-12-01', units: 'imperial' as never })).toThrow(/units must be SI or US/);
    expect(() => buildSchedule({ project, report }, { issueDate: '2026-12-01', paper: 'a3' as never })).toThrow(/paper must be a4 or letter/);
  });

  it('embeds as a fragment whose CSS only styles inside its wrapper', () => {
    const doc = buildSchedule({ project, report, checks, installation }, { issueDate: '2026-12-01' });
    const f = scheduleFragment(doc);
    expect(f.html.startsWith('<div class="stayset-schedule">')).toBe(true);
    expect(f.html).toContain(SCHEDULE_CAUTION);
    // Every rule outside @page starts with the scope class; no bare html/body/table selectors.
    const rules = f.css.replace(/@page \{[\s\S]*?\} \}/, '').split('\n').filter((x) => x.trim());
    expect(rules.length).toBeGreaterThan(10);
    for (const r of rules) {
      const selectors = r.slice(0, r.indexOf('{')).split(',');
      for (const sel of selectors) expect(sel.trim().startsWith('.stayset-schedule')).toBe(true);
    }
    expect(() => scheduleFragment(doc, 'x"}body{')).toThrow(/class name/);
  });

  it('keeps project text out of the CSS page footer syntax', () => {
    const p = structuredClone(project);
    p.meta!.name = 'Mast "A"\\ </style><script>x</script>';
    const html = scheduleHtml(buildSchedule({ project: p, report }, { issueDate: '2026-12-01' }));
    const style = /<style>([\s\S]*?)<\/style>/.exec(html)![1];
    expect(style).toContain('content: "Mast A /stylescriptx/script — issued 2026-12-01"');
    expect(html).not.toContain('<script>');
  });
});

describe('schedule reactions with moments (beam models)', () => {
  it('lists support moments of the tube demo in the HTML and the CSV', async () => {
    const { demoTubeMast } = await import('../../../fixtures/demos/tube-mast.ts');
    const p = demoTubeMast();
    p.loadCases = p.loadCases.filter((c) => c.id === 'wind 0');
    p.combinations = [];
    const rep = solveProject(p).report;
    const doc = buildSchedule({ project: p, report: rep, checks: runChecks(p, rep), installation: null }, { issueDate: '2026-12-01' });
    const base = doc.reactions.find((r) => r.node === 'pole/base')!;
    expect(base.moment).toBeDefined();
    expect(scheduleHtml(doc)).toMatch(/Mz \(kN·m\)/);
    expect(scheduleCsv(doc)).toMatch(/Mx \(kN·m\)/);
  });
});

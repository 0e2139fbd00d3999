/**
 * The calculation report's reaction envelope on the tube-mast demo (its base restrains the twist
 * rz, so the support carries a moment): the forces and the largest moment printed are those of the
 * solver's reactions over the report's converged cases (independent maximum over the solve report),
 * in the unit module's force and moment kinds — kN 2 decimals / kN·m 2 decimals, kip 3 / kip·ft 3.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveProject, type ProjectFile } from '../../../../solver/index.ts';
import { collectReportSource } from '../../../../main/common/report/report-source.ts';
import { buildReport } from '../../../../main/common/report/build-report.ts';
import { reportHtml } from '../../../../main/common/report/report-html.ts';
import { formatValue } from '../../../../main/common/units/index.ts';

const project = JSON.parse(readFileSync(new URL('../../../../assets/demo-tube-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;

describe('support moments in the printed reaction envelope', () => {
  const report = solveProject(project).report;
  const source = collectReportSource(project, report);
  const built = (units: 'SI' | 'US') => buildReport(source, { units, paper: units === 'US' ? 'letter' : 'a4', issueDate: '2026-12-02' });
  const doc = (units: 'SI' | 'US') => reportHtml(built(units));
  const section = (html: string) => html.slice(html.indexOf('Support reactions envelope'), html.indexOf('</table>', html.indexOf('Support reactions envelope')));
  const enveloped = new Set(built('SI').envelope.cases);
  // The largest moment component in size at the base over the enveloped cases, from the solve report.
  let largest = 0, axis = 'x';
  for (const c of report.cases) {
    if (!enveloped.has(c.id)) continue;
    for (const r of c.reactions) if (r.node === 'pole/base' && r.moment) r.moment.forEach((v, k) => { if (Math.abs(v) > Math.abs(largest)) { largest = v; axis = 'xyz'[k]; } });
  }

  it('the base restrains a rotation, so the solver reports a moment there', () => {
    expect(enveloped.size).toBeGreaterThan(0);
    expect(Math.abs(largest)).toBeGreaterThan(0);
  });
  it('prints it as "largest M" in kN·m (SI) and kip·ft (US) with the moment kind\'s precision', () => {
    const si = section(doc('SI')), us = section(doc('US'));
    expect(si).toContain('kN·m');
    expect(si).toContain(`M${axis} ${formatValue(largest, 'moment', 'SI')}`);
    expect(us).toContain('kip·ft');
    expect(us).toContain(`M${axis} ${formatValue(largest, 'moment', 'US')}`);
    expect(si).toContain('largest M');
  });
});

/**
 * Project + one solve + checks + installation data + sequences → ReportDocument (pure; the CLI,
 * the app and tests build the calculation report here).
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { envelopeOf } from '../../../solver/index.ts';
import { SCHEDULE_CAUTION, type PaperSize } from '../schedule/schedule-types.ts';
import type { UnitSystem } from '../units/index.ts';
import { installationNoteText } from './installation-text.ts';
import type { ReportDocument, ReportSource } from './report-types.ts';
import { governingRows } from './governing.ts';
import { warningText } from '../checks/check-text.ts';

export interface ReportOptions {
  issueDate: string;
  units?: UnitSystem;
  paper?: PaperSize;
}

export function buildReport(src: ReportSource, options: ReportOptions): ReportDocument {
  const { project, report, checks } = src;
  const units = options.units ?? project.display?.units ?? 'SI';
  if (units !== 'SI' && units !== 'US') throw new Error(`units must be SI or US, got ${JSON.stringify(units)}`);
  const paper = options.paper ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') throw new Error(`paper must be a4 or letter, got ${JSON.stringify(paper)}`);
  const env = envelopeOf(report);
  const cables = project.members.filter((m) => m.kind === 'cable').length;
  const notes = [...(src.notes ?? []), ...checks.warnings.map(warningText), ...(src.installation?.warnings ?? []).map((w) => installationNoteText(w, units))];
  for (const c of report.cases) if (!c.converged) notes.push(`Case "${c.id}" did not converge (${c.status}); it is left out of the envelope. ${c.message ?? ''}`.trim());
  return {
    project, units, paper, issueDate: options.issueDate,
    documentNumber: project.report?.documentNumber ?? '',
    revisions: project.report?.revisions ?? [],
    caution: SCHEDULE_CAUTION,
    model: {
      nodes: project.nodes.length, supports: project.nodes.filter((n) => n.fixed).length,
      members: project.members.length, cables, bars: project.members.length - cables,
      elements: project.members.reduce((s, m) => s + Math.max(1, Math.floor(m.segments ?? 1)), 0),
      dofs: report.cases[0]?.stats.dofs ?? 0, sections: project.sections.length, groups: project.groups?.length ?? 0,
    },
    report, checks, envelope: env, governing: governingRows(project, checks, env),
    installation: src.installation, sequences: src.sequences, modes: src.modes ?? null, notes,
  };
}

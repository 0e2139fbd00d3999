/**
 * Work on site that the app asks its host to do off the UI thread (StaysetHost.runSite): analyse a
 * tensioning sequence, back-analyse a set of site measurements, or build a printable document
 * (the crew sheet of a sequence, the calculation report). Pure: the host runs `runSiteRequest` in
 * its analysis worker; tests call it directly. The documents are built by the same functions the
 * CLI uses (main/common/report/), from the same solver calls.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { runAsBuilt, runSequence } from '../../../solver/index.ts';
import type { AsBuiltResult, ProjectFile, SequenceResult } from '../../../solver/index.ts';
import { crewSheetHtml } from '../report/crew-sheet.ts';
import { buildReport } from '../report/build-report.ts';
import { reportHtml } from '../report/report-html.ts';
import { collectReportSource } from '../report/report-source.ts';
import type { PaperSize } from '../schedule/schedule-types.ts';
import type { UnitSystem } from '../units/index.ts';
import { siteErrorText } from './site-input-text.ts';

/** How a printed document is laid out: units of the numbers, paper size, date of issue (YYYY-MM-DD). */
export interface SiteDocumentOptions {
  units: UnitSystem;
  paper: PaperSize;
  issueDate: string;
}

/** `units`: the display units its input problems are worded in (SI when absent). */
export type SiteRequest =
  | { kind: 'sequence'; id: string; units?: UnitSystem }
  | { kind: 'asbuilt'; id: string; units?: UnitSystem }
  | ({ kind: 'crewSheet'; id: string } & SiteDocumentOptions)
  | ({ kind: 'report' } & SiteDocumentOptions);

export type SiteOutcome =
  | { kind: 'sequence'; result: SequenceResult }
  | { kind: 'asbuilt'; result: AsBuiltResult }
  /** A standalone printable HTML document (no scripts) and a file name for it without extension. */
  | { kind: 'document'; html: string; title: string };

function fileTitle(project: ProjectFile, what: string): string {
  return `${project.meta?.name ?? 'Untitled'} ${what}`.replace(/[\\/:*?"<>|]+/g, ' ').trim();
}

/**
 * Run one request. Throws an Error naming the entry when the input is bad (unknown sequence or set,
 * a reading no tension fits, …), worded in the request's display units.
 */
export function runSiteRequest(project: ProjectFile, request: SiteRequest): SiteOutcome {
  try {
    return runRequest(project, request);
  } catch (e) {
    throw new Error(siteErrorText(e, request.units ?? 'SI'), { cause: e });
  }
}

function runRequest(project: ProjectFile, request: SiteRequest): SiteOutcome {
  switch (request.kind) {
    case 'sequence':
      return { kind: 'sequence', result: runSequence(project, request.id) };
    case 'asbuilt':
      return { kind: 'asbuilt', result: runAsBuilt(project, request.id) };
    case 'crewSheet': {
      const result = runSequence(project, request.id);
      return { kind: 'document', html: crewSheetHtml(project, result, request), title: fileTitle(project, `crew sheet ${request.id}`) };
    }
    case 'report': {
      const source = collectReportSource(project);
      return { kind: 'document', html: reportHtml(buildReport(source, request)), title: fileTitle(project, 'calculation report') };
    }
  }
}

const DATE = /^\d{4}-\d{2}-\d{2}$/;
/** Longest sequence or set id accepted from a page, characters. */
export const MAX_SITE_ID_LENGTH = 200;

/**
 * Check a request from an untrusted page: returns it typed, or one message naming the field and
 * the problem (e.g. `request.units must be "SI" or "US"`).
 */
export function checkSiteRequest(value: unknown): { ok: true; value: SiteRequest } | { ok: false; error: string } {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return { ok: false, error: 'must be an object with a kind' };
  const r = value as Record<string, unknown>;
  const kinds = ['sequence', 'asbuilt', 'crewSheet', 'report'];
  if (typeof r.kind !== 'string' || !kinds.includes(r.kind)) return { ok: false, error: `kind must be one of ${kinds.join(', ')}` };
  const allowed = r.kind === 'sequence' || r.kind === 'asbuilt' ? ['kind', 'id', 'units'] : r.kind === 'crewSheet' ? ['kind', 'id', 'units', 'paper', 'issueDate'] : ['kind', 'units', 'paper', 'issueDate'];
  const extra = Object.keys(r).filter((k) => !allowed.includes(k));
  if (extra.length) return { ok: false, error: `has unknown field(s) ${extra.join(', ')}` };
  if (allowed.includes('id') && (typeof r.id !== 'string' || r.id.length === 0 || r.id.length > MAX_SITE_ID_LENGTH)) {
    return { ok: false, error: `id must be a non-empty string of at most ${MAX_SITE_ID_LENGTH} characters` };
  }
  if ((r.kind === 'sequence' || r.kind === 'asbuilt') && r.units !== undefined && r.units !== 'SI' && r.units !== 'US') return { ok: false, error: 'units must be "SI" or "US"' };
  if (r.kind === 'crewSheet' || r.kind === 'report') {
    if (r.units !== 'SI' && r.units !== 'US') return { ok: false, error: 'units must be "SI" or "US"' };
    if (r.paper !== 'a4' && r.paper !== 'letter') return { ok: false, error: 'paper must be "a4" or "letter"' };
    if (typeof r.issueDate !== 'string' || !DATE.test(r.issueDate)) return { ok: false, error: 'issueDate must be a date YYYY-MM-DD' };
  }
  return { ok: true, value: r as unknown as SiteRequest };
}

/**
 * Display text of the schedule's header, listing, revision block, member summary and natural
 * frequencies, made once for both printers (schedule-html.ts and the renderer's
 * SchedulePrint.vue), so they print the same words and numbers. Plain text: callers escape.
 */
import type { ScheduleDocument } from './schedule-types.ts';
import { formatValue, unitLabels } from '../units/index.ts';

/** Header rows [label, value]. */
export function headerRows(doc: ScheduleDocument): [string, string][] {
  const u = doc.units;
  const l = unitLabels(u);
  const h = doc.header;
  const tRef = Number.isFinite(h.referenceTemperature)
    ? `${formatValue(h.referenceTemperature, 'temperature', u)} ${l.temperature}${h.referenceTemperatureAssumed ? ' (assumed: not set in the project)' : ''}`
    : 'not set';
  const last = doc.revisions.at(-1);
  return [
    ['Project', h.projectName], ['Site', h.site], ['Client', h.client], ['Engineer', h.engineer],
    ['Document', doc.documentNumber || '—'], ['Revision', last ? `${last.revision} (${last.date})` : '—'],
    ['Checked by', last?.checkedBy || 'not recorded'],
    ['Date of issue', h.issueDate], ['Units', u === 'US' ? 'US customary (kip, ft, °F)' : 'SI (kN, m, °C)'],
    ['Reference temperature', tRef], ['Installation (reference) case', h.referenceCase || '—'],
    ['Members listed', listingText(doc)],
    ['Design checks', doc.checksPass === null ? 'NOT RUN' : doc.checksPass ? 'ALL PASS' : 'SOME FAIL — see the Checks column'],
  ];
}

/** What the schedule lists, in words. */
export function listingText(doc: ScheduleDocument): string {
  const s = doc.listing;
  const what = s.list === 'cables' ? 'cables' : s.list === 'all' ? 'all members' : `groups ${s.groups.join(', ')}`;
  const summary = s.summarised ? `, ${s.summarised} other members summarised per group` : '';
  const left = s.total - s.inFull - s.summarised;
  return `${what}: ${s.inFull} cables in full${summary}${left ? `; ${left} of ${s.total} members not listed` : ''}`;
}

export const REVISION_HEAD = ['Rev.', 'Date', 'Description', 'By', 'Checked'];

/** Revision block rows, oldest first; one placeholder row when the project records none. */
export function revisionCells(doc: ScheduleDocument): string[][] {
  if (!doc.revisions.length) return [['—', doc.header.issueDate, 'not recorded in the project (report.revisions)', '', '']];
  return doc.revisions.map((r) => [r.revision, r.date, r.description, r.by ?? '', r.checkedBy ?? '']);
}

export function summaryHead(doc: ScheduleDocument): string[] {
  const f = unitLabels(doc.units).force;
  return ['Group / section', 'Kind', 'Members', `Max tension (${f})`, 'member · case', `Min force (${f}, − = compression)`, 'member · case', 'Utilisation', 'member · case', 'Checks'];
}

/** Member summary rows; numeric columns are 2–3, 5 and 7. */
export function summaryCells(doc: ScheduleDocument): string[][] {
  const u = doc.units;
  return doc.memberSummary.map((r) => [
    r.label, r.kinds.join(', '), String(r.count),
    formatValue(r.maxTension, 'force', u), r.maxTensionAt, formatValue(r.minForce, 'force', u), r.minForceAt,
    formatValue(r.utilisation, 'ratio', u), r.utilisationAt,
    r.failing ? `FAIL: ${r.failing}` : r.unchecked === r.count ? 'NOT CHECKED' : `PASS${r.unchecked ? ` (${r.unchecked} not checked)` : ''}`,
  ]);
}

export const FREQUENCY_HEAD = ['Mode', 'f (Hz)', 'T (s)'];

export function frequencyIntro(doc: ScheduleDocument): string {
  const f = doc.frequencies;
  if (!f) return 'Natural frequencies were not computed.';
  if (!f.modes.length) return f.notes.join(' ');
  return `First ${f.modes.length} natural frequencies about case "${f.case}" (the pretensioned structure under its permanent load; lumped mass, tangent stiffness of the solved state; solver modes).`;
}

export function frequencyCells(doc: ScheduleDocument): string[][] {
  return (doc.frequencies?.modes ?? []).map((m) => [String(m.number), formatValue(m.frequency, 'frequency', doc.units), formatValue(m.period, 'period', doc.units)]);
}

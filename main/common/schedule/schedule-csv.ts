/**
 * ScheduleDocument → CSV (RFC 4180 quoting by csv-stringify). One file with several blocks, each
 * introduced by a one-cell title record and separated by an empty record, so spreadsheets open it
 * directly: header, caution and revisions, members, tension per case, reactions, installation temperatures,
 * member summary, natural frequencies, design basis, checks, tuning.
 * Numbers are plain decimals in the chosen units (named in each column header), with the precision
 * of their kind (main/common/units); "—" is written as an empty cell.
 */
import { stringify } from 'csv-stringify/sync';
import type { ScheduleDocument } from './schedule-types.ts';
import { formatValue, MISSING, unitLabels, type QuantityKind } from '../units/index.ts';

export function scheduleCsv(doc: ScheduleDocument): string {
  const u = doc.units;
  const l = unitLabels(u);
  const num = (v: number | null, kind: QuantityKind): string => { const t = formatValue(v, kind, u); return t === MISSING ? '' : t; };
  const F = (n: number | null) => num(n, 'force');
  // Moments (kN·m, kip·ft): columns only when a support restrains a rotation.
  const M = (n: number | null) => num(n, 'moment');
  const withMoments = doc.reactions.some((r) => r.moment);
  const L = (m: number | null) => num(m, 'length');
  const h = doc.header;
  const records: string[][] = [
    [doc.title, h.projectName],
    ['Caution', doc.caution],
    ['Site', h.site], ['Client', h.client], ['Engineer', h.engineer], ['Date of issue', h.issueDate],
    ['Units', u], ['Reference temperature (' + l.temperature + ')', num(h.referenceTemperature, 'temperature')],
    ['Installation case', h.referenceCase],
    ['Document', doc.documentNumber],
    ...doc.revisions.map((r) => ['Revision', r.revision, r.date, r.description, r.by ?? '', r.checkedBy ?? '']),
    [],
    ['Members'],
    ['member', 'groups', 'section', 'kind', `cut length (${l.length})`, `installation tension (${l.force})`, 'f1 string (Hz)', 'f in-plane (Hz)',
      `max tension (${l.force})`, 'max tension case', `min tension (${l.force})`, 'min tension case', 'utilisation', 'utilisation case', 'check', 'failed checks'],
    ...doc.members.map((m) => [
      m.id, m.groups.join('; '), m.section, m.kind, L(m.cutLength), F(m.installationTension), num(m.frequency, 'frequency'), num(m.frequencyInPlane, 'frequency'),
      F(m.envelopeMax), m.envelopeMaxCase, F(m.envelopeMin), m.envelopeMinCase, num(m.utilisation, 'ratio'), m.utilisationCase,
      m.checkStatus.toUpperCase(), m.failedChecks.join(' '),
    ]),
    [],
    [`Tension per case (${l.force})`],
    ['member', ...doc.cases.map((c) => c.id)],
    ...doc.members.map((m) => [m.id, ...m.tensionByCase.map(F)]),
    [],
    [`Reactions (${l.force})`],
    ['support', 'case', 'Fx', 'Fy', 'Fz', '|R|', ...(withMoments ? [`Mx (${l.moment})`, `My (${l.moment})`, `Mz (${l.moment})`] : [])],
    ...doc.reactions.map((r) => [r.node, r.case, ...r.force.map(F), F(r.magnitude), ...(withMoments ? (r.moment ?? [null, null, null]).map(M) : [])]),
  ];
  if (doc.temperatureTable) {
    records.push([], [`Installation tension by temperature (${l.force}); header = temperature (${l.temperature})`],
      ['member', ...doc.temperatureTable.temperatures.map((t) => num(t, 'temperature'))],
      ...doc.temperatureTable.rows.map((r) => [r.member, ...r.tensions.map(F)]),
      [], [`Taut-string frequency f1 (Hz) at the installation tension; header = temperature (${l.temperature})`],
      ['member', ...doc.temperatureTable.temperatures.map((t) => num(t, 'temperature'))],
      ...doc.temperatureTable.rows.map((r) => [r.member, ...r.frequencies.map((f) => num(f, 'frequency'))]));
  }
  if (doc.memberSummary.length) {
    records.push([], [`Other members listed, per group (${l.force})`],
      ['group or section', 'kinds', 'members', 'max tension', 'member · case', 'min force', 'member · case', 'utilisation', 'member · case', 'failing', 'not checked'],
      ...doc.memberSummary.map((r) => [r.label, r.kinds.join(' '), String(r.count), F(r.maxTension), r.maxTensionAt, F(r.minForce), r.minForceAt, num(r.utilisation, 'ratio'), r.utilisationAt, String(r.failing), String(r.unchecked)]));
  }
  if (doc.frequencies?.modes.length) {
    records.push([], [`Natural frequencies about case ${doc.frequencies.case}`], ['mode', 'f (Hz)', 'T (s)'],
      ...doc.frequencies.modes.map((m) => [String(m.number), num(m.frequency, 'frequency'), num(m.period, 'period')]));
  }
  if (doc.basis) records.push([], ['Design basis'], ...doc.basis.map((b) => [b]));
  if (doc.checkRows) {
    records.push([], ['Checks (governing result of each)'], ['check', 'item', 'case', 'purpose', 'value', 'limit', 'ratio', 'result', 'source'],
      ...doc.checkRows.map((r) => [r.check, r.item, r.case, r.purpose, r.value, r.limit, r.ratio, r.verdict, r.source]));
  }
  if (doc.tuning) {
    records.push([], ['Tuning'], ['summary', doc.tuning.summary], ['date', doc.tuning.date], ...doc.tuning.targets.map((t) => [t.label, t.value, t.met ? 'met' : 'NOT MET']),
      ...doc.tuning.variables.map((v) => [v.group, v.by, v.value]));
  }
  return stringify(records, { record_delimiter: '\r\n' });
}

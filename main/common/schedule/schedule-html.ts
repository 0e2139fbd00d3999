/**
 * ScheduleDocument → a complete, standalone HTML document for printing (no scripts, no external
 * resources). Print CSS: @page A4 or US Letter (portrait, 12 mm margins), table headers repeat on
 * every page (thead as table-header-group), rows never split, black-and-white readable — status
 * is always spelled out (PASS / FAIL / NOT CHECKED, "yes"/"NO") and emphasised by weight and
 * borders, never by colour alone.
 */
import type { ScheduleDocument } from './schedule-types.ts';
import { cssPageSize } from './paper.ts';
import { formatValue, unitLabel, unitLabels } from '../units/index.ts';
import { FREQUENCY_HEAD, REVISION_HEAD, frequencyCells, frequencyIntro, headerRows, revisionCells, summaryCells, summaryHead } from './schedule-cells.ts';

export function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

const CASES_PER_TABLE = 8;

/** A table; columns from `numericFrom` up to (not including) `numericTo` are right-aligned numbers. */
function table(caption: string, head: string[], rows: string[][], numericFrom = 1, numericTo = Infinity): string {
  const num = (i: number) => (i >= numericFrom && i < numericTo ? ' class="num"' : '');
  const th = head.map((h, i) => `<th${num(i)} scope="col">${h}</th>`).join('');
  const body = rows.map((r) => `<tr>${r.map((c, i) => `<td${num(i)}>${c}</td>`).join('')}</tr>`).join('\n');
  return `<table><caption>${caption}</caption><thead><tr>${th}</tr></thead><tbody>\n${body}\n</tbody></table>`;
}

function statusCell(status: 'pass' | 'fail' | 'unchecked', failed: string[]): string {
  if (status === 'fail') return `<span class="fail">FAIL</span> ${escapeHtml(failed.join(', '))}`;
  if (status === 'pass') return 'PASS';
  return '<span class="unchecked">NOT CHECKED</span>';
}

function scheduleMarkup(doc: ScheduleDocument): { title: string; body: string } {
  const u = doc.units;
  const l = unitLabels(u);
  const h = doc.header;
  const e = escapeHtml;
  const headerHtml = `<table class="meta"><tbody>${headerRows(doc).map(([k, v]) => `<tr><th scope="row">${e(k)}</th><td>${e(v)}</td></tr>`).join('')}</tbody></table>`;
  const revisionsHtml = table('Revisions', REVISION_HEAD, revisionCells(doc).map((r) => r.map(e)), 99);

  const memberRows = doc.members.map((m) => [
    `<b>${e(m.id)}</b>`, e(m.groups.join(', ')), e(m.section), m.kind,
    formatValue(m.cutLength, 'length', u), formatValue(m.installationTension, 'force', u),
    formatValue(m.frequency, 'frequency', u), formatValue(m.frequencyInPlane, 'frequency', u),
    `${formatValue(m.envelopeMax, 'force', u)}<br><small>${e(m.envelopeMaxCase)}</small>`,
    `${formatValue(m.envelopeMin, 'force', u)}<br><small>${e(m.envelopeMinCase)}</small>`,
    m.utilisation === null ? '—' : `${m.utilisation > 1 ? '<b class="fail">' : ''}${formatValue(m.utilisation, 'ratio', u)}${m.utilisation > 1 ? '</b>' : ''}<br><small>${e(m.utilisationCase)}</small>`,
    statusCell(m.checkStatus, m.failedChecks),
  ]);
  const membersHtml = table(`Members — cut lengths, installation tension at the reference temperature, frequencies, envelope and checks`,
    ['Member', 'Groups', 'Section', 'Kind', `Cut length (${l.length})`, `Install. tension (${l.force})`, 'f₁ string (Hz)', 'f in-plane (Hz)',
      `Max tension (${l.force})`, `Min tension (${l.force})`, 'Utilisation', 'Checks'], memberRows, 4, 11);
  const summaryHtml = doc.memberSummary.length
    ? table('Other members listed, summarised per group (envelope over the checked cases)', summaryHead(doc), summaryCells(doc).map((r) => r.map(e)), 2, 8)
    : '';
  const frequenciesHtml = `<p>${e(frequencyIntro(doc))}</p>`
    + (doc.frequencies?.modes.length ? table('Natural frequencies of the structure', FREQUENCY_HEAD, frequencyCells(doc)) : '')
    + (doc.frequencies?.modes.length && doc.frequencies.notes.length ? `<ul>${doc.frequencies.notes.map((n) => `<li>${e(n)}</li>`).join('')}</ul>` : '');

  const caseTables: string[] = [];
  for (let start = 0; start < doc.cases.length; start += CASES_PER_TABLE) {
    const cs = doc.cases.slice(start, start + CASES_PER_TABLE);
    const rows = doc.members.map((m) => [`<b>${e(m.id)}</b>`, ...cs.map((_, j) => formatValue(m.tensionByCase[start + j], 'force', u))]);
    caseTables.push(table(`Largest member tension per case (${l.force})${doc.cases.length > CASES_PER_TABLE ? ` — cases ${start + 1}–${start + cs.length} of ${doc.cases.length}` : ''}`,
      ['Member', ...cs.map((c) => `${e(c.label)}${c.converged ? '' : ' <b>(NOT CONVERGED)</b>'}<br><small>${e(c.id)}</small>`)], rows));
  }

  // Moment columns only when some support restrains a rotation (beam models).
  const withMoments = doc.reactions.some((r) => r.moment);
  const momentCells = (m: [number, number, number] | undefined) => (withMoments ? (m ? m.map((v) => formatValue(v, 'moment', u)) : ['—', '—', '—']) : []);
  const reactionRows = doc.reactions.map((r) => [`<b>${e(r.node)}</b>`, e(r.case), ...r.force.map((f) => formatValue(f, 'force', u)), formatValue(r.magnitude, 'force', u), ...momentCells(r.moment)]);
  const momentHeads = withMoments ? [`Mx (${unitLabel('moment', u)})`, `My (${unitLabel('moment', u)})`, `Mz (${unitLabel('moment', u)})`] : [];
  const reactionsHtml = doc.reactions.length
    ? table(`Anchor and base reactions (force and moment the support exerts on the structure, ${l.force})`, ['Support', 'Case', 'Fx', 'Fy', 'Fz', '|R|', ...momentHeads], reactionRows, 2)
    : '<p>No support reactions (no converged case).</p>';

  let tuningHtml = '<p>No tuning run is recorded for this project.</p>';
  if (doc.tuning) {
    const t = doc.tuning;
    tuningHtml = `<p><b>${e(t.summary)}</b> (run of ${e(t.date)}${t.status ? `; ${e(t.status === 'met' ? 'every target met' : t.status === 'unmet' ? 'SOME TARGET NOT MET' : 'A CASE DID NOT CONVERGE')}` : ''})</p>`;
    if (t.targets.length) tuningHtml += table('Tuning targets', ['Target', 'Value reached', 'Met'], t.targets.map((x) => [e(x.label), e(x.value), x.met ? 'yes' : '<b class="fail">NO</b>']), 99);
    if (t.variables.length) tuningHtml += table('Tuned variables', ['Group', 'Variable', 'Final value'], t.variables.map((v) => [e(v.group), e(v.by), e(v.value)]), 99);
    if (t.diagnosis.length) tuningHtml += `<ul class="diagnosis">${t.diagnosis.map((d) => `<li>${e(d)}</li>`).join('')}</ul>`;
  }

  let tempHtml = '<p>No installation temperature table.</p>';
  if (doc.temperatureTable && doc.temperatureTable.rows.length) {
    const tt = doc.temperatureTable;
    tempHtml = table(`Tension to set at installation (${l.force}, at the lower end) by air temperature (${l.temperature}) — same unstressed lengths as the design state`,
      ['Member', ...tt.temperatures.map((t) => `${formatValue(t, 'temperature', u)} ${l.temperature}`)],
      tt.rows.map((r) => [`<b>${e(r.member)}</b>`, ...r.tensions.map((x) => formatValue(x, 'force', u))]))
      + table(`Taut-string frequency f₁ (Hz) the cable should show when set to that tension — for site checks by vibration`,
        ['Member', ...tt.temperatures.map((t) => `${formatValue(t, 'temperature', u)} ${l.temperature}`)],
        tt.rows.map((r) => [`<b>${e(r.member)}</b>`, ...r.frequencies.map((x) => formatValue(x, 'frequency', u))]));
  }

  const basisHtml = doc.basis ? `<ul class="basis">${doc.basis.map((b) => `<li>${e(b)}</li>`).join('')}</ul>` : '<p>Design checks were not run.</p>';
  const checkRowsHtml = doc.checkRows && doc.checkRows.length
    ? table('Governing result of each check (worst first)', ['Check', 'Item', 'Case', 'Purpose', 'Value', 'Limit', 'Ratio', 'Result', 'Source'],
      doc.checkRows.map((r) => [e(r.check), `<b>${e(r.item)}</b>`, e(r.case), e(r.purpose), e(r.value), e(r.limit), e(r.ratio), r.verdict === 'FAIL' ? '<b class="fail">FAIL</b>' : 'pass', `<small>${e(r.source)}</small>`]), 4, 7)
    : '';
  const notesHtml = doc.notes.length ? `<h2>Notes</h2><ul>${doc.notes.map((n) => `<li>${e(n)}</li>`).join('')}</ul>` : '';

  return { title: `${e(doc.title)} — ${e(h.projectName)}`, body: `<header>
<h1>${e(doc.title)}</h1>
${headerHtml}
${revisionsHtml}
<p class="caution" role="note">${e(doc.caution)}</p>
</header>
<main>
<h2>Design basis</h2>
${basisHtml}
<h2>Members</h2>
${doc.members.length ? membersHtml : '<p>No cable is listed.</p>'}
${summaryHtml}
${checkRowsHtml}
<h2>Tension per case</h2>
${doc.members.length ? caseTables.join('\n') : '<p>No cable is listed.</p>'}
<h2>Reactions</h2>
${reactionsHtml}
<h2>Natural frequencies</h2>
${frequenciesHtml}
<h2>Tuning summary</h2>
${tuningHtml}
<h2>Installation temperature table</h2>
${tempHtml}
${notesHtml}
<p class="caution" role="note">${e(doc.caution)}</p>
</main>` };
}

/** Print style rules as [selector, declarations]; selectors are scoped by scheduleCss. */
const RULES: [string, string][] = [
  ['html', 'color: #000; background: #fff;'],
  ['body', 'font: 8pt/1.25 "DejaVu Sans", "Liberation Sans", Arial, sans-serif; margin: 0;'],
  ['h1', 'font-size: 14pt; margin: 0 0 2mm;'],
  ['h2', 'font-size: 10.5pt; margin: 5mm 0 1.5mm; border-bottom: 1.5pt solid #000; break-after: avoid;'],
  ['.caution', 'border: 2.5pt solid #000; padding: 2mm 3mm; margin: 2mm 0 3mm; font-size: 10pt; font-weight: bold;'],
  ['.caution::before', 'content: "CAUTION — ";'],
  ['table', 'border-collapse: collapse; width: 100%; margin: 0 0 3mm;'],
  ['caption', 'text-align: left; font-weight: bold; padding: 1mm 0; caption-side: top;'],
  ['thead', 'display: table-header-group;'],
  ['tr', 'break-inside: avoid;'],
  ['th, td', 'border: 0.6pt solid #000; padding: 0.6mm 1mm; vertical-align: top;'],
  ['thead th', 'background: #fff; border-bottom: 1.5pt solid #000; font-weight: bold; text-align: left;'],
  ['.num', 'text-align: right; font-variant-numeric: tabular-nums;'],
  ['small', 'font-size: 6.5pt;'],
  ['.fail', 'font-weight: bold; text-decoration: underline;'],
  ['.unchecked', 'font-style: italic;'],
  ['table.meta', 'width: auto;'],
  ['table.meta th', 'text-align: left; padding-right: 4mm; border: none; font-weight: bold;'],
  ['table.meta td', 'border: none;'],
];

/**
 * The print CSS. Without `scope` it styles a whole document (html, body, elements). With a
 * class name, every rule is limited to elements inside `.scope` and the html/body rules apply to
 * the `.scope` element itself, so the schedule can sit inside another page (the app's print
 * route) without restyling it. The @page rule (paper size, margins, page footer) is global
 * either way: it only acts when printing.
 */
export function scheduleCss(doc: ScheduleDocument, scope?: string): string {
  const pageSize = cssPageSize(doc.paper);
  const h = doc.header;
  // A CSS string, not HTML: drop quotes, backslashes, angle brackets and line breaks (no escapes needed).
  const cssText = (t: string) => t.replace(/["\\<>\r\n]/g, '');
  const footer = `${cssText(h.projectName)} — issued ${cssText(h.issueDate)}`;
  const page = `@page { size: ${pageSize}; margin: 12mm 10mm 14mm 10mm;
  @bottom-left { content: "${footer}"; font: 7pt sans-serif; }
  @bottom-right { content: "page " counter(page) " of " counter(pages); font: 7pt sans-serif; } }`;
  if (scope !== undefined && !/^[A-Za-z][\w-]*$/.test(scope)) throw new Error(`schedule CSS scope must be a class name, got ${JSON.stringify(scope)}`);
  const sel = (selector: string): string => selector.split(',').map((x) => x.trim()).map((x) => {
    if (!scope) return x;
    return x === 'html' || x === 'body' ? `.${scope}` : `.${scope} ${x}`;
  }).join(', ');
  const rules = RULES.map(([s, d]) => `${sel(s)} { ${d} }`);
  if (!scope) rules.push('@media screen { body { max-width: 190mm; margin: 8mm auto; } }');
  return `${page}\n${rules.join('\n')}`;
}

/** A complete standalone HTML document (see the file comment). */
export function scheduleHtml(doc: ScheduleDocument): string {
  const m = scheduleMarkup(doc);
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>${m.title}</title>
<style>
${scheduleCss(doc)}
</style>
</head>
<body>
${m.body}
</body>
</html>
`;
}

/**
 * The schedule for embedding in a page: markup wrapped in a div of class `scope` and CSS
 * scoped to it (scheduleCss with scope). Insert the CSS in a <style> element and the HTML as
 * markup; every text from the project is escaped.
 */
export function scheduleFragment(doc: ScheduleDocument, scope = 'stayset-schedule'): { css: string; html: string } {
  const css = scheduleCss(doc, scope);
  return { css, html: `<div class="${scope}">\n${scheduleMarkup(doc).body}\n</div>` };
}

/**
 * ReportDocument → a standalone printable HTML calculation report (no scripts, no external
 * resources): title and revision block, the caution, design basis, model, materials and sections,
 * actions and combinations, analysis, governing results per check with the case, envelopes,
 * natural frequencies (solver/modes), cable frequencies, tuning record, installation data and the
 * tensioning sequences. Page
 * numbers and the caution on every page come from print-css.ts. Key numbers carry a data-n
 * attribute (e.g. data-n="env-max|G1") so tests can compare them with the CLI.
 */
import { escapeHtml as e } from '../schedule/schedule-html.ts';
import { fixedText, formatValue, unitLabels } from '../units/index.ts';
import type { ReportDocument } from './report-types.ts';
import { printCss } from './print-css.ts';
import { modelSvg, type DeformedShape } from './model-svg.ts';
import { crewSheetBody } from './crew-sheet.ts';
import { checkRow } from '../checks/check-text.ts';
import { designBasisHtml, actionsHtml, sectionsHtml } from './report-input-sections.ts';
import { modesHtml } from './report-modes.ts';
import { scheduleTuning } from '../schedule/schedule-tuning.ts';

const table = (caption: string, head: string[], rows: string[][]) =>
  `<table><caption>${caption}</caption><thead><tr>${head.map((h) => `<th>${h}</th>`).join('')}</tr></thead><tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${c}</td>`).join('')}</tr>`).join('\n')}</tbody></table>`;
const num = (key: string, text: string) => `<span class="num" data-n="${e(key)}">${text}</span>`;

function governingHtml(d: ReportDocument): string {
  const u = d.units, l = unitLabels(u);
  const rows = d.governing.map((g) => {
    const key = `gov-${g.check}|${g.item}`;
    if (g.result) {
      const r = checkRow(g.result, u);
      return [e(r.check), e(r.item), e(r.case), num(key, e(r.value)), e(r.limit || '—'), num(`${key}|ratio`, r.ratio), g.pass ? 'PASS' : '<b class="fail">FAIL</b>'];
    }
    const value = g.check === 'utilisation' ? formatValue(g.value, 'ratio', u) : `${formatValue(g.value, 'force', u)} ${l.force}`;
    const name = g.check === 'utilisation' ? 'highest utilisation (design force / resistance)' : 'least tension of the no-slack members';
    return [name, e(g.item), e(g.case), num(key, value), g.limit === null ? 'no slack' : formatValue(g.limit, 'ratio', u), g.ratio === null ? '—' : formatValue(g.ratio, 'ratio', u), g.pass ? 'PASS' : '<b class="fail">FAIL</b>'];
  });
  const failures = d.checks.failures.map((f) => checkRow(f, u)).map((r) => [e(r.check), e(r.item), e(r.case), e(`${r.value} against ${r.limit}${r.ratio === '—' ? '' : ` (ratio ${r.ratio})`} — ${r.source}`)]);
  return (rows.length ? table('Governing value of each check over every case and combination (the results of the design checks on this solve)', ['Check', 'Item', 'Case', 'Value', 'Limit', 'Ratio', 'Result'], rows) : '<p>No check settings in the project.</p>')
    + `<p><b>Overall: ${d.checks.pass ? 'every check passes in every case' : `${d.checks.failures.length} failure(s)`}</b> (design basis: ${e(d.checks.basis.label)}).</p>`
    + (failures.length ? table('Failures (worst case of each)', ['Check', 'Item', 'Case', 'Description'], failures) : '');
}

/** The deformed shape drawn in the model pictures: the case of the first failing governing row, else of the highest utilisation, else the first converged case. */
function governingShape(d: ReportDocument): DeformedShape | null {
  const converged = d.report.cases.filter((c) => c.converged);
  const wanted = d.governing.find((g) => !g.pass && g.case)?.case ?? d.governing.find((g) => g.check === 'utilisation')?.case ?? d.governing.find((g) => g.case)?.case;
  const c = converged.find((x) => x.id === wanted) ?? converged[0];
  return c ? { caseId: c.id, nodes: c.nodes } : null;
}

function envelopeHtml(d: ReportDocument): string {
  const u = d.units, l = unitLabels(u);
  const util = new Map(d.checks.members.map((m) => [m.id, m]));
  const rows = d.envelope.members.map((m) => [`<b>${e(m.id)}</b>`, num(`env-max|${m.id}`, formatValue(m.tensionMax, 'force', u)), e(m.tensionMaxCase), num(`env-min|${m.id}`, formatValue(m.tensionMin, 'force', u)), e(m.tensionMinCase),
    formatValue(m.sagMax, 'sag', u), util.get(m.id)?.utilisation == null ? '—' : num(`util|${m.id}`, formatValue(util.get(m.id)!.utilisation, 'ratio', u)), m.slackCases.length ? `<b>slack</b> ${e(m.slackCases.join(', '))}` : '']);
  // Moment columns only when some support restrains a rotation (beam models): the largest moment
  // component in size, with its axis and case.
  const withMoments = d.envelope.reactions.some((r) => r.moment);
  const momentCells = (r: ReportDocument['envelope']['reactions'][number]): string[] => {
    if (!withMoments) return [];
    if (!r.moment) return ['—', ''];
    const m = r.moment;
    let best = { v: 0, axis: 0, case: '' };
    for (let k = 0; k < 3; k++) {
      if (Math.abs(m.max[k]) > Math.abs(best.v)) best = { v: m.max[k], axis: k, case: m.maxCase[k] };
      if (Math.abs(m.min[k]) > Math.abs(best.v)) best = { v: m.min[k], axis: k, case: m.minCase[k] };
    }
    return [best.case ? `M${'xyz'[best.axis]} ${formatValue(best.v, 'moment', u)}` : formatValue(0, 'moment', u), e(best.case)];
  };
  const reactions = d.envelope.reactions.map((r) => [`<b>${e(r.node)}</b>`, num(`react|${r.node}`, formatValue(r.magnitudeMax, 'force', u)), e(r.magnitudeMaxCase), formatValue(r.min[2], 'force', u), e(r.minCase[2]), formatValue(r.max[2], 'force', u), e(r.maxCase[2]), ...momentCells(r)]);
  return table(`Member envelope over ${d.envelope.cases.length} converged case(s) (${l.force}; sag ${l.sag})`, ['Member', 'T max', 'case', 'T min', 'case', 'Sag max', 'Utilisation', 'Slack'], rows)
    + table(`Support reactions envelope (${l.force}${withMoments ? `, ${l.moment}` : ''}; force${withMoments ? ' and moment' : ''} of the support on the structure)`,
      ['Support', '|R| max', 'case', 'Fz min', 'case', 'Fz max', 'case', ...(withMoments ? ['largest M', 'case'] : [])], reactions);
}

function analysisHtml(d: ReportDocument): string {
  const rows = d.report.cases.map((c) => [e(c.id), c.converged ? 'yes' : '<b class="fail">NO</b>', String(c.stats.iterations), fixedText(c.stats.residual * 1e10, 3), String(c.slackMembers.length),
    d.checks.cases.find((x) => x.id === c.id)?.pass ? 'PASS' : '<b class="fail">FAIL</b>']);
  return `<p>Geometrically nonlinear static analysis (Total Lagrangian truss elements, Green–Lagrange strain, S = S0 + E(ε − αΔT); cables tension-only). Each case and combination is solved from the pretensioned state to a relative residual of 1e-10.</p>`
    + table('Cases and combinations', ['Case', 'Converged', 'Newton iterations', 'Residual ×1e-10', 'Slack members', 'Checks'], rows);
}

function installationHtml(d: ReportDocument): string {
  const inst = d.installation;
  if (!inst) return '<p>Installation data was not computed.</p>';
  const u = d.units, l = unitLabels(u);
  const rows = inst.members.filter((m) => m.kind === 'cable').map((m) => [`<b>${e(m.id)}</b>`, num(`cut|${m.id}`, formatValue(m.cutLength, 'length', u)), num(`inst|${m.id}`, formatValue(m.installationTension, 'force', u)),
    formatValue(m.frequencies?.tautString, 'frequency', u), formatValue(m.frequencies?.lowestInPlane, 'frequency', u), fixedText(m.frequencies?.lambdaSquared, 2)]);
  return `<p>Reference case "${e(inst.referenceCase)}" at ${formatValue(inst.referenceTemperature, 'temperature', u)} ${l.temperature}${inst.referenceTemperatureAssumed ? ' (assumed)' : ''}. Cut length = stress-free length (end fittings not included). Frequencies after Irvine (Cable Structures, 1981): f₁ taut string, lowest in-plane with the sag parameter λ².</p>`
    + table('Cables: cut lengths, installation tension (lower end) and frequencies', ['Cable', `Cut length (${l.length})`, `Tension (${l.force})`, 'f₁ (Hz)', 'f in-plane (Hz)', 'λ²'], rows);
}

function tuningHtml(d: ReportDocument): string {
  const t = d.project.tuning;
  if (!t) return '<p>No tuning is recorded in the project.</p>';
  const vars = t.variables.map((v) => [e(v.group), e(v.by), v.min === undefined ? '—' : String(v.min), v.max === undefined ? '—' : String(v.max)]);
  const targets = t.targets.map((x) => [e(x.kind), e(JSON.stringify(x).replace(/^\{|\}$/g, ''))]);
  // The run's targets and final values as the schedule prints them (schedule-tuning.ts).
  const run = t.lastRun ? scheduleTuning(d.project, t.lastRun, d.units, (g) => d.project.groups?.find((x) => x.id === g)?.label ?? g, []) : null;
  const reached = run?.targets.length ? table('Targets reached in the last run', ['Target', 'Value reached', 'Met'], run.targets.map((x) => [e(x.label), e(x.value), x.met ? 'yes' : '<b class="fail">NO</b>'])) : '';
  const finals = run?.variables.length ? table('Values left by the last run', ['Group', 'Variable', 'Final value'], run.variables.map((v) => [e(v.group), e(v.by), e(v.value)])) : '';
  return (t.lastRun ? `<p><b>Last run ${e(t.lastRun.date)}:</b> ${e(t.lastRun.summary)}</p>` : '<p>The tuner has not been run on this file (no record).</p>')
    + reached + finals
    + table('Tuning variables', ['Group', 'By', 'Min', 'Max'], vars) + table('Tuning targets', ['Kind', 'Definition'], targets);
}

function revisionsHtml(d: ReportDocument): string {
  const rows = d.revisions.map((r) => [e(r.revision), e(r.date), e(r.description), e(r.by ?? ''), e(r.checkedBy ?? '')]);
  return table('Revisions', ['Rev.', 'Date', 'Description', 'By', 'Checked'], rows.length ? rows : [['—', e(d.issueDate), 'not recorded in the project (report.revisions)', '', '']]);
}

export function reportHtml(d: ReportDocument): string {
  const p = d.project;
  const name = p.meta?.name ?? '(unnamed project)';
  const rev = d.revisions.at(-1)?.revision ?? '—';
  const sections: [string, string][] = [
    ['Design basis', designBasisHtml(d)],
    ['Model', `<p>${d.model.nodes} nodes (${d.model.supports} with supports), ${d.model.members} members (${d.model.cables} cables, ${d.model.bars} bars) in ${d.model.elements} elements, ${d.model.dofs} free degrees of freedom, ${d.model.sections} sections, ${d.model.groups} groups.</p>${modelSvg(p, 300, governingShape(d), d.units)}`],
    ['Materials and sections', sectionsHtml(d)],
    ['Actions and combinations', actionsHtml(d)],
    ['Analysis', analysisHtml(d)],
    ['Governing results per check', governingHtml(d)],
    ['Envelopes', envelopeHtml(d)],
    ['Natural frequencies', modesHtml(d)],
    ['Installation data and cable frequencies', installationHtml(d)],
    ['Tuning record', tuningHtml(d)],
    ['Tensioning sequences', d.sequences.length ? d.sequences.map((s) => crewSheetBody(p, s, d.units, 3)).join('\n') : '<p>No tensioning sequence in the project.</p>'],
  ];
  const contents = `<ol>${sections.map(([t]) => `<li>${t}</li>`).join('')}</ol>`;
  const meta: [string, string][] = [['Project', name], ['Site', p.meta?.site ?? ''], ['Client', p.meta?.client ?? ''], ['Engineer', p.meta?.engineer ?? ''], ['Document', d.documentNumber || '—'], ['Revision', rev], ['Date of issue', d.issueDate]];
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>Calculation report — ${e(name)}</title>
<style>
${printCss({ paper: d.paper, caution: d.caution, header: `${name} — calculation report ${d.documentNumber} rev. ${rev}`, footer: `${name} — issued ${d.issueDate}` })}
.views { display: flex; gap: 6mm; } .views svg { border: 0.6pt solid #000; } p.fig { font-size: 8pt; margin-top: 1mm; }
</style>
</head>
<body>
<header>
<h1>Calculation report — ${e(name)}</h1>
<table class="meta"><tbody>${meta.map(([k, v]) => `<tr><th scope="row">${e(k)}</th><td>${e(v)}</td></tr>`).join('')}</tbody></table>
${revisionsHtml(d)}
<p class="caution" role="note">${e(d.caution)}</p>
<h2>Contents</h2>${contents}
</header>
<main>
${sections.map(([t, body], i) => `<section${i === 0 ? '' : ''}><h2>${i + 1}. ${t}</h2>\n${body}</section>`).join('\n')}
${d.notes.length ? `<h2>Notes</h2><ul>${d.notes.map((n) => `<li>${e(n)}</li>`).join('')}</ul>` : ''}
<p class="caution" role="note">${e(d.caution)}</p>
</main>
</body>
</html>
`;
}

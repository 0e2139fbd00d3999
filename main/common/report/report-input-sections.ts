/**
 * Report sections that restate the input: design basis (check settings, reference temperature,
 * and a recorded design basis when the project file carries one), materials and sections, load
 * cases and combinations. Numbers in the chosen display units.
 */
import { escapeHtml as e } from '../schedule/schedule-html.ts';
import { fixedText, formatValue, formatWithUnit, unitLabels } from '../units/index.ts';
import { tiltText } from '../checks/check-text.ts';
import { basisLines } from '../checks/check-text.ts';
import type { ReportDocument } from './report-types.ts';

const table = (caption: string, head: string[], rows: string[][]) =>
  `<table><caption>${caption}</caption><thead><tr>${head.map((h) => `<th>${h}</th>`).join('')}</tr></thead><tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${c}</td>`).join('')}</tr>`).join('\n')}</tbody></table>`;

/** A recorded design basis object (a later file format may carry one) as key/value rows. */
function recordedBasis(value: unknown, prefix = ''): [string, string][] {
  if (value === null || typeof value !== 'object') return [[prefix || 'value', String(value)]];
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) =>
    v !== null && typeof v === 'object' && !Array.isArray(v) ? recordedBasis(v, `${prefix}${k}.`) : [[`${prefix}${k}`, Array.isArray(v) ? v.map((x) => (typeof x === 'object' ? JSON.stringify(x) : String(x))).join('; ') : String(v)]]);
}

export function designBasisHtml(d: ReportDocument): string {
  const p = d.project, u = d.units, l = unitLabels(u);
  const s = p.checks ?? {};
  const basis = (p as unknown as { designBasis?: unknown }).designBasis;
  const rows: [string, string][] = [
    ['Reference temperature', p.meta?.referenceTemperature ? `${formatValue(p.meta.referenceTemperature, 'temperature', u)} ${l.temperature}` : 'not set (15 °C assumed)'],
    ...basisLines(d.checks.basis).map((line, i): [string, string] => [i === 0 ? 'Design basis' : '', e(line.trim())]),
    ['Members that must not go slack', (s.noSlackGroups ?? []).join(', ') || '—'],
    ['Sag limits', (s.sagLimits ?? []).map((x) => `${x.group}: ${'fractionOfSpan' in x.limit ? `${formatValue(x.limit.fractionOfSpan, 'share', u)} % of span` : `${formatValue(x.limit.absolute, 'sag', u)} ${l.sag}`}`).join('; ') || '—'],
    ['Displacement limits', (s.displacementLimits ?? []).map((x) => `${x.node}: ${formatWithUnit(x.limit, 'displacement', u)}`).join('; ') || '—'],
    ['Tilt limits', (s.tiltLimits ?? []).map((x) => `${x.base}→${x.top}: ${tiltText(x.limit)}`).join('; ') || '—'],
    ['Uplift checked at', (s.upliftNodes ?? []).join(', ') || '—'],
  ];
  const recorded = basis === undefined ? '<p>No design basis (codes, classes, partial factors) is recorded in the project file: state it here before issue.</p>'
    : table('Recorded design basis', ['Item', 'Value'], recordedBasis(basis).map(([k, v]) => [e(k), e(v)]));
  return recorded + table('Check settings used', ['Item', 'Value'], rows.map(([k, v]) => [e(k), e(v)]))
    + '<p>Not checked by this program: connections, lateral-torsional buckling, foundations and anchors; check those separately. Bars and beam-columns are checked for tension, flexural buckling and slenderness (and beams for N + M) as listed in the check results.</p>';
}

export function sectionsHtml(d: ReportDocument): string {
  const u = d.units, l = unitLabels(u);
  const rows = d.project.sections.map((s) => [`<b>${e(s.id)}</b>`, e(s.label ?? ''), formatValue(s.E, 'modulus', u), formatValue(s.area, 'area', u), formatValue(s.massPerLength ?? 0, 'massPerLength', u),
    s.breakingLoad ? formatValue(s.breakingLoad, 'force', u) : '—', s.thermalExpansion ? formatValue(s.thermalExpansion, 'thermalExpansion', u) : '—', s.diameter ? formatValue(s.diameter, 'smallLength', u) : '—']);
  return table('Sections', ['Section', 'Description', `E (${l.modulus})`, `A (${l.area})`, `Mass (${l.massPerLength})`, `MBL (${l.force})`, `α (${l.thermalExpansion})`, `Ø (${l.smallLength})`], rows);
}

export function actionsHtml(d: ReportDocument): string {
  const u = d.units, l = unitLabels(u);
  const cases = d.project.loadCases.map((c) => {
    const nodal = (c.nodalLoads ?? []).reduce((s, x) => s + Math.hypot(...x.force), 0);
    return [`<b>${e(c.id)}</b>`, e(c.label ?? ''), c.selfWeight ?? true ? 'yes' : 'no', formatValue(c.temperatureChange ?? 0, 'temperatureChange', u),
      c.nodalLoads?.length ? `${c.nodalLoads.length} loads, Σ|F| ${formatValue(nodal, 'force', u)} ${l.force}` : '—',
      c.wind ? `${formatWithUnit(c.wind.speed, 'speed', u)} toward ${fixedText(c.wind.direction, 0)}°` : '—', c.ice ? formatWithUnit(c.ice.thickness, 'smallLength', u) : '—'];
  });
  const combos = (d.project.combinations ?? []).map((c) => [`<b>${e(c.id)}</b>`, e(c.label ?? ''), e(c.factors.map((f) => `${f.factor} × ${f.case}`).join(' + '))]);
  return table('Load cases', ['Case', 'Description', 'Self-weight', `ΔT (${l.temperatureChange})`, 'Nodal loads', 'Wind (at 10 m)', 'Ice'], cases)
    + (combos.length ? table('Combinations (each solved as its own nonlinear case)', ['Combination', 'Description', 'Factors'], combos) : '<p>No combinations.</p>');
}

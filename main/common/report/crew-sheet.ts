/**
 * The crew sheet of a tensioning sequence: a standalone printable HTML document (A4 / Letter, black
 * and white, page numbers and the caution on every page), one table row per member set, with the
 * value to set, its tolerance band, the correction per degree, and the check readings of the other
 * cables after the step. Pure: the caller supplies the solved SequenceResult and the date.
 */
import type { ProjectFile, SequenceResult } from '../../../solver/index.ts';
import { escapeHtml } from '../schedule/schedule-html.ts';
import { fixedText, formatValue, formatWithUnit, significantText, toDisplay, unitLabels, type UnitSystem } from '../units/index.ts';
import { tiltText } from '../checks/check-text.ts';
import { SCHEDULE_CAUTION, type PaperSize } from '../schedule/schedule-types.ts';
import { sequenceIssueText, sequenceSuggestionText } from './sequence-text.ts';
import { printCss } from './print-css.ts';

export interface CrewSheetOptions {
  issueDate: string;
  units?: UnitSystem;
  paper?: PaperSize;
}

/** "ΔF per °C" for display: per kelvin = per °C; per °F is 5/9 of it. */
function perDegree(units: UnitSystem, perKelvin: number): number {
  return units === 'US' ? (perKelvin * 5) / 9 : perKelvin;
}

export function stepLabel(project: ProjectFile, r: SequenceResult, stepIndex: number): string {
  const spec = project.sequences?.find((s) => s.id === r.id)?.steps[stepIndex];
  return spec?.label ?? spec?.group ?? spec?.members?.join(' + ') ?? `step ${stepIndex + 1}`;
}

/** The sheet's body markup (header, caution, steps, issues); shared with the calculation report. */
export function crewSheetBody(project: ProjectFile, r: SequenceResult, units: UnitSystem, headingLevel = 2): string {
  const e = escapeHtml;
  const l = unitLabels(units);
  const h = `h${headingLevel}`;
  const spec = project.sequences?.find((s) => s.id === r.id);
  const F = (n: number) => formatValue(n, 'force', units);
  const sl = (m: number) => formatWithUnit(m, 'displacement', units);
  // Corrections per degree are small rates: three significant digits in the display unit.
  const rate = (base: number, kind: 'force' | 'displacement') => `${significantText(toDisplay(base, kind, units), 3)} ${l[kind]}`;
  const rows: string[] = [];
  for (const st of r.stages) {
    const others = st.state.filter((s) => !st.members.includes(s.member)).map((s) => `${e(s.member)} ${F(s.tension)}${s.slack ? ' <b>SLACK</b>' : ''}`).join('<br>');
    const check = st.issues.length ? `<b class="fail">STOP</b><br><small>${st.issues.map((i) => e(sequenceIssueText(i, units))).join('<br>')}</small>` : 'OK';
    const tilt = st.tilt === null ? '' : `<br><small>tilt ${tiltText(st.tilt)}</small>`;
    if (st.kind === 'release') {
      rows.push(`<tr><td class="num">${st.index}</td><td colspan="5">Release the temporary restraint at ${e(st.released.join(', '))}</td><td><small>${others}</small></td><td>${check}${tilt}</td></tr>`);
      continue;
    }
    if (st.settings.length === 0) {
      rows.push(`<tr><td class="num">${st.index}</td><td>${e(st.members.join(', '))}</td><td colspan="4">— (stage did not solve)</td><td></td><td>${check}</td></tr>`);
      continue;
    }
    st.settings.forEach((s, k) => {
      const force = s.setBy === 'force';
      const value = force ? `${F(s.value)} ${l.force}` : `${formatValue(s.value, 'length', units)} ${l.length}`;
      const band = force ? `${F(s.band[0])} … ${F(s.band[1])} ${l.force}<br><small>≈ ±${sl(s.equivalentBand[1])} of length</small>`
        : `${formatValue(s.band[0], 'length', units)} … ${formatValue(s.band[1], 'length', units)} ${l.length}<br><small>≈ ±${F(s.equivalentBand[1])} ${l.force}</small>`;
      const corr = force ? `${rate(perDegree(units, s.perKelvin), 'force')}/${l.temperature}`
        : `${rate(perDegree(units, s.perKelvin), 'displacement')}/${l.temperature}`;
      const first = k === 0;
      rows.push(`<tr>${first ? `<td class="num" rowspan="${st.settings.length}">${st.index}${st.pass > 1 ? `<br><small>pass ${st.pass}</small>` : ''}</td>` : ''}<td><b>${e(s.member)}</b></td><td>${force ? 'force' : 'length mark'}</td><td class="num"><b>${value}</b></td><td class="num">${band}</td><td class="num">${corr}</td>${first ? `<td rowspan="${st.settings.length}"><small>${others}</small></td><td rowspan="${st.settings.length}">${check}${tilt}</td>` : ''}</tr>`);
    });
  }
  const table = `<table><caption>Steps — set each cable to the value shown, then read the others</caption><thead><tr><th>Stage</th><th>Cable</th><th>Set by</th><th class="num">Value to set</th><th class="num">Tolerance band</th><th class="num">Correction per ${l.temperature}</th><th>Check readings of the other cables (${l.force}, lower end)</th><th>Stage check</th></tr></thead><tbody>${rows.join('\n')}</tbody></table>`;
  const meta: [string, string][] = [
    ['Sequence', `${spec?.label ?? r.id} (${r.id})`],
    ['Day\'s temperature', `${formatValue(r.temperature, 'temperature', units)} ${l.temperature}`],
    ['Reference temperature', `${formatValue(r.referenceTemperature, 'temperature', units)} ${l.temperature}${r.referenceTemperatureAssumed ? ' (assumed: not set in the project)' : ''}`],
    ['Stage checks', `φ = ${fixedText(r.resistanceFactor, 3)} on breaking load; no slack cable; ${r.plumbLimit ? `tilt ≤ ${tiltText(r.plumbLimit)}` : 'no plumb tolerance set'}`],
    ['Result', r.ok ? 'every stage passes; the final state equals the design state' : 'SOME STAGE FAILS — do not use this order as it stands'],
  ];
  const metaHtml = `<table class="meta"><tbody>${meta.map(([k, v]) => `<tr><th scope="row">${e(k)}</th><td>${e(v)}</td></tr>`).join('')}</tbody></table>`;
  const notes = [
    'Force settings: the tension at the lower (anchor) end when the cable reaches its design unstressed length in this stage. Length settings: the mark on the unloaded cable at the day\'s temperature.',
    `Correction per degree: add it per ${l.temperature} the air is above the day's temperature shown (subtract below).`,
    ...r.issues.map((i) => sequenceIssueText(i, units)),
    ...r.suggestions.map((s) => sequenceSuggestionText(s, r, (i) => stepLabel(project, r, i))),
  ];
  return `<${h}>Tensioning sequence ${e(r.id)}</${h}>\n${metaHtml}\n${table}\n<ul>${notes.map((n) => `<li>${e(n)}</li>`).join('')}</ul>`;
}

export function crewSheetHtml(project: ProjectFile, r: SequenceResult, options: CrewSheetOptions): string {
  const units = options.units ?? project.display?.units ?? 'SI';
  const name = project.meta?.name ?? '(unnamed project)';
  const e = escapeHtml;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>Crew sheet — ${e(name)} — ${e(r.id)}</title>
<style>
${printCss({ paper: options.paper ?? 'a4', footer: `${name} — crew sheet ${r.id} — issued ${options.issueDate}`, caution: SCHEDULE_CAUTION })}
</style>
</head>
<body>
<header><h1>Crew sheet — ${e(name)}</h1><p>Issued ${e(options.issueDate)}</p>
<p class="caution" role="note">${e(SCHEDULE_CAUTION)}</p></header>
<main>
${crewSheetBody(project, r, units)}
<p class="caution" role="note">${e(SCHEDULE_CAUTION)}</p>
</main>
</body>
</html>
`;
}

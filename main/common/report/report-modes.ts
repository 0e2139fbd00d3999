/**
 * Report section: natural frequencies of the structure about the reference case (solver/modes:
 * lumped mass, tangent stiffness of the solved, pretensioned state), with effective modal mass
 * shares per direction, and the modal notes or the reason no modes exist, in words.
 */
import type { ModalNote, ModalRefusal } from '../../../solver/index.ts';
import { escapeHtml as e } from '../schedule/schedule-html.ts';
import { fixedText, formatValue } from '../units/index.ts';
import type { ReportDocument } from './report-types.ts';

export function modalNoteText(n: ModalNote): string {
  switch (n.code) {
    case 'slackMembersMassOnly': return `Slack members count with their mass only: ${n.members.slice(0, 8).join(', ')}${n.members.length > 8 ? ` and ${n.members.length - 8} more` : ''}.`;
    case 'fewerModesThanRequested': return `Only ${n.available} modes exist (${n.requested} asked for).`;
    case 'modesNotConverged': return `The eigen-solver stopped before every mode met its tolerance (worst residual ${n.worstResidual.toExponential(1)}).`;
    case 'followerLoadStiffnessOmitted': return 'The case has wind: its load stiffness is not in the tangent, as in the static solve.';
  }
}

export function modalRefusalText(r: ModalRefusal): string {
  switch (r.code) {
    case 'caseNotConverged': return `No modes: case "${r.case}" did not converge (${r.status}).`;
    case 'mechanism': return `No modes: the structure is a mechanism at ${r.dof.node ?? `${r.dof.member} interior ${r.dof.interior}`} ${r.dof.direction}.`;
    case 'notPositiveDefinite': return `No modes: the tangent stiffness is not positive definite (${r.negativePivots} negative pivots).`;
    case 'noMass': return 'No modes: no mass is free to move.';
    case 'unknownCase': return `No modes: case "${r.case}" does not exist.`;
  }
}

export function modesHtml(d: ReportDocument): string {
  const m = d.modes;
  if (!m) return '<p>Natural frequencies were not computed.</p>';
  if (!m.ok) return `<p>${e(modalRefusalText(m.refusal))}</p>`;
  const a = m.analysis;
  const rows = a.modes.map((x) => [String(x.number), `<span class="num" data-n="mode|${x.number}">${formatValue(x.frequency, 'frequency', d.units)}</span>`, fixedText(x.period, 3),
    ...x.effectiveMassShare.map((s) => formatValue(s, 'share', d.units)), ...x.cumulativeShare.map((s) => formatValue(s, 'share', d.units))]);
  return `<p>Lowest modes about case "${e(a.case)}" (the pretensioned structure under its permanent load; lumped mass, tangent stiffness of the solved state).</p>`
    + `<table><caption>Natural frequencies and effective modal mass (% of the movable mass)</caption><thead><tr><th>Mode</th><th>f (Hz)</th><th>T (s)</th><th>x</th><th>y</th><th>z</th><th>Σx</th><th>Σy</th><th>Σz</th></tr></thead><tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${c}</td>`).join('')}</tr>`).join('\n')}</tbody></table>`
    + (a.notes.length ? `<ul>${a.notes.map((n) => `<li>${e(modalNoteText(n))}</li>`).join('')}</ul>` : '');
}

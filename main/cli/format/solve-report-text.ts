/**
 * The readable form of a solve report: per case a header line (status, iterations, load steps,
 * DOFs, time, residual), then tables of members (forces in kN, tension positive; sag in m),
 * user-node displacements (mm), beam end actions where there are beams, and support reactions (kN,
 * force the support exerts on the structure; moments in kN·m where rotations are restrained).
 * Cases that did not converge show the reason instead of tables.
 */
import type { CaseResult, ProjectFile, SolveReport } from '../../../solver/index.ts';
import { fixedText, formatValue } from '../../common/units/index.ts';

const force = (n: number): string => formatValue(n, 'force', 'SI');
const mm = (m: number): string => formatValue(m, 'displacement', 'SI');
import { textTable } from './text-table.ts';
import { actionCaseTitle } from './action-case-title.ts';
import { beamTable, supportMomentTable } from './beam-report-text.ts';

/** "Load case \"id\" (label)", "Combination …" or the title of a case a design action adds. */
export function caseTitle(project: ProjectFile, id: string): string {
  const action = actionCaseTitle(project, id);
  if (action) return action;
  const lc = project.loadCases.find((c) => c.id === id);
  const combo = project.combinations?.find((c) => c.id === id);
  const label = lc?.label ?? combo?.label;
  const kind = combo ? 'Combination' : 'Load case';
  return `${kind} ${JSON.stringify(id)}${label ? ` (${label})` : ''}`;
}

function statusLine(c: CaseResult): string {
  const s = c.stats;
  const status = c.converged ? 'converged' : `NOT CONVERGED (${c.status})`;
  return (
    `  ${status}: ${s.iterations} iterations, ${s.loadSteps} load steps, ${s.dofs} DOFs, ` +
    `${fixedText(s.seconds, 3)} s, residual ${Number.isFinite(s.residual) ? s.residual.toExponential(1) : 'n/a'}`
  );
}

function memberTable(project: ProjectFile, c: CaseResult): string {
  const kindOf = new Map(project.members.map((m) => [m.id, m.kind]));
  const rows = c.members.map((m) => [
    m.id,
    kindOf.get(m.id) ?? '',
    force(m.tensionMax),
    force(m.tensionMin),
    force(m.tensionStart),
    force(m.tensionEnd),
    m.slack ? 'SLACK' : '',
    formatValue(m.sag, 'length', 'SI'),
  ]);
  const r = 'right' as const;
  return textTable(
    [
      { title: 'member' },
      { title: 'kind' },
      { title: 'T max kN', align: r },
      { title: 'T min kN', align: r },
      { title: 'T start kN', align: r },
      { title: 'T end kN', align: r },
      { title: 'slack' },
      { title: 'sag m', align: r },
    ],
    rows,
  );
}

function nodeTable(project: ProjectFile, c: CaseResult): string {
  const userNodes = new Set(project.nodes.map((n) => n.id));
  const rows = c.nodes
    .filter((n) => userNodes.has(n.id))
    .map((n) => {
      const [ux, uy, uz] = n.displacement;
      return [n.id, mm(ux), mm(uy), mm(uz), mm(Math.hypot(ux, uy, uz))];
    });
  const r = 'right' as const;
  return textTable(
    [{ title: 'node' }, { title: 'ux mm', align: r }, { title: 'uy mm', align: r }, { title: 'uz mm', align: r }, { title: '|u| mm', align: r }],
    rows,
  );
}

function reactionTable(c: CaseResult): string {
  const rows = c.reactions.map((q) => [q.node, force(q.force[0]), force(q.force[1]), force(q.force[2])]);
  const r = 'right' as const;
  return textTable([{ title: 'support' }, { title: 'Rx kN', align: r }, { title: 'Ry kN', align: r }, { title: 'Rz kN', align: r }], rows);
}

export function caseText(project: ProjectFile, c: CaseResult): string {
  const parts = [caseTitle(project, c.id), statusLine(c)];
  if (c.message) parts.push(`  ${c.message}`);
  if (!c.converged) {
    parts.push('  No results shown: the analysis did not converge, so its forces and displacements are not valid.');
    return parts.join('\n');
  }
  if (c.slackMembers.length > 0) parts.push(`  slack members: ${c.slackMembers.join(', ')}`);
  parts.push('', '  Members (tension positive)', memberTable(project, c));
  parts.push('', '  Node displacements', nodeTable(project, c));
  const beams = beamTable(c);
  if (beams) parts.push('', '  Beam end actions (node on member end, member local axes; N tension positive)', beams);
  parts.push('', '  Support reactions (force on the structure)', reactionTable(c));
  const moments = supportMomentTable(c);
  if (moments) parts.push('', '  Support moments (moment on the structure)', moments);
  return parts.join('\n');
}

export function solveReportText(project: ProjectFile, report: SolveReport, disclaimer: string): string {
  const cases = report.cases.map((c) => caseText(project, c));
  const notConverged = report.cases.filter((c) => !c.converged).map((c) => c.id);
  const summary =
    notConverged.length === 0
      ? `All ${report.cases.length} case(s) converged.`
      : `${notConverged.length} of ${report.cases.length} case(s) did NOT converge: ${notConverged.join(', ')}.`;
  return `${[...cases, summary, disclaimer].join('\n\n')}\n`;
}

/**
 * The short form of a solve report, printed by `stayset solve` when the project has member groups:
 * one status line per case, then one row per group with its governing (largest) tension and the
 * member and case it occurs in, the smallest tension, the highest utilisation (design force /
 * design resistance under the project's design basis, as `stayset check` computes it) and the
 * cases in which a member of the group goes slack. Groups of cables (the guys) come before groups
 * of bars and beams; members in no group get one row of their own. Forces in kN, tension positive.
 * The per-member tables are `caseText` (solve-report-text.ts), printed with `--full`.
 */
import { CheckInputError, envelopeOf, runChecks } from '../../../solver/index.ts';
import type { CaseResult, CheckReport, Envelope, MemberCheck, MemberEnvelope, ProjectFile, SolveReport } from '../../../solver/index.ts';
import { formatValue } from '../../common/units/index.ts';

const kN = (n: number): string => formatValue(n, 'force', 'SI');
import { textTable } from './text-table.ts';
import { caseTitle } from './solve-report-text.ts';

interface GroupRow {
  id: string;
  label: string;
  members: string[];
  kind: string;
  /** 0 cables only, 1 mixed, 2 no cables: the order the rows are printed in. */
  rank: number;
}

function groupRows(project: ProjectFile): GroupRow[] {
  const kindOf = new Map(project.members.map((m) => [m.id, m.kind]));
  const rowOf = (id: string, label: string, members: string[]): GroupRow => {
    const kinds = [...new Set(members.map((m) => kindOf.get(m) ?? '?'))];
    const cables = kinds.filter((k) => k === 'cable').length;
    const rank = cables === 0 ? 2 : kinds.length === 1 ? 0 : 1;
    return { id, label, members, kind: kinds.length === 1 ? kinds[0] : 'mixed', rank };
  };
  const rows = (project.groups ?? []).map((g) => rowOf(g.id, g.label ?? g.id, g.members));
  const grouped = new Set(rows.flatMap((r) => r.members));
  const others = project.members.map((m) => m.id).filter((id) => !grouped.has(id));
  if (others.length > 0) rows.push(rowOf('', '(members in no group)', others));
  // Stable sort: guys first, file order within each rank.
  return rows.map((r, i) => ({ r, i })).sort((a, b) => a.r.rank - b.r.rank || a.i - b.i).map((x) => x.r);
}

function casesList(ids: string[], shown = 3): string {
  if (ids.length === 0) return 'never';
  const head = ids.slice(0, shown).join(', ');
  return ids.length > shown ? `${head} +${ids.length - shown} more` : head;
}

function groupLine(g: GroupRow, env: Map<string, MemberEnvelope>, checks: Map<string, MemberCheck> | null, allConverged: boolean): string[] {
  const members = g.members.map((id) => env.get(id)).filter((m): m is MemberEnvelope => m !== undefined);
  const count = `${g.members.length} ${g.kind}`;
  if (members.length === 0) return [g.label, count, '—', '', '', '—', '', '—', '', 'no result'];
  const hi = members.reduce((a, b) => (b.tensionMax > a.tensionMax ? b : a));
  const lo = members.reduce((a, b) => (b.tensionMin < a.tensionMin ? b : a));
  const slack = [...new Set(members.flatMap((m) => m.slackCases))];
  let util = '—';
  let utilCase = '';
  let verdict = 'not checked';
  if (checks) {
    const mc = g.members.map((id) => checks.get(id)).filter((m): m is MemberCheck => m !== undefined);
    const used = mc.filter((m) => m.utilisation !== null);
    if (used.length > 0) {
      const top = used.reduce((a, b) => ((b.utilisation ?? 0) > (a.utilisation ?? 0) ? b : a));
      util = formatValue(top.utilisation ?? 0, 'ratio', 'SI');
      utilCase = top.utilisationCase;
    }
    const failing = mc.filter((m) => m.status === 'fail').length;
    // With a case that did not converge, nothing passes: the checks are incomplete.
    verdict = failing > 0 ? `FAIL (${failing})` : !mc.some((m) => m.status === 'pass') ? 'not checked' : allConverged ? 'pass' : 'incomplete';
  }
  return [g.label, count, kN(hi.tensionMax), hi.id, hi.tensionMaxCase, kN(lo.tensionMin), lo.tensionMinCase, util, utilCase, verdict, casesList(slack)];
}

function caseLine(project: ProjectFile, c: CaseResult): string {
  const status = c.converged ? `converged in ${c.stats.iterations} iterations` : `NOT CONVERGED (${c.status})`;
  const line = `  ${caseTitle(project, c.id)}: ${status}`;
  return c.converged || !c.message ? line : `${line}\n    ${c.message}`;
}

/** Design checks for the utilisation column; null (with the reason) when the check settings are invalid. */
function checksOf(project: ProjectFile, report: SolveReport): { checks: CheckReport | null; note: string } {
  try {
    return { checks: runChecks(project, report), note: '' };
  } catch (e) {
    if (e instanceof CheckInputError) return { checks: null, note: `Utilisation not computed: ${e.problems.join('; ')}.` };
    throw e;
  }
}

export function solveSummaryText(project: ProjectFile, report: SolveReport, disclaimer: string, file: string): string {
  const out: string[] = [];
  const name = project.meta?.name;
  out.push(`${name ? `${name}: ` : ''}summary of ${report.cases.length} case(s)`, '');
  out.push('Cases');
  for (const c of report.cases) out.push(caseLine(project, c));
  const env: Envelope = envelopeOf(report);
  const { checks, note } = checksOf(project, report);
  const envById = new Map(env.members.map((m) => [m.id, m]));
  const checkById = checks ? new Map(checks.members.map((m) => [m.id, m])) : null;
  out.push('');
  if (env.cases.length === 0) {
    out.push('No group results: no case converged, so there are no valid forces to show.');
  } else {
    out.push(`Member groups over the ${env.cases.length} converged case(s): tension positive, kN; utilisation = design force / design resistance (highest over the strength-checked cases)`);
    const r = 'right' as const;
    out.push(textTable(
      [
        { title: 'group' }, { title: 'members' },
        { title: 'T max kN', align: r }, { title: 'in member' }, { title: 'case' },
        { title: 'T min kN', align: r }, { title: 'case' },
        { title: 'util.', align: r }, { title: 'case' }, { title: 'checks' },
        { title: 'slack in' },
      ],
      groupRows(project).map((g) => groupLine(g, envById, checkById, checks?.allConverged ?? false)),
    ));
    if (env.skipped.length > 0) out.push(`Left out (did not converge): ${env.skipped.join(', ')}.`);
    if (checks && !checks.members.some((m) => m.utilisation !== null)) {
      out.push('No utilisation: no ultimate or accidental case was checked, or no section gives a breaking load or yield strength.');
    }
  }
  if (note) out.push(note);
  out.push('');
  const notConverged = report.cases.filter((c) => !c.converged).map((c) => c.id);
  out.push(notConverged.length === 0
    ? `All ${report.cases.length} case(s) converged.`
    : `${notConverged.length} of ${report.cases.length} case(s) did NOT converge: ${notConverged.join(', ')}.`);
  const arg = /[\s"'$`\\]/.test(file) ? JSON.stringify(file) : file;
  out.push(`Per-member forces, displacements and reactions: stayset solve ${arg} --full; every design check: stayset check ${arg}`);
  out.push('', disclaimer);
  return `${out.join('\n')}\n`;
}

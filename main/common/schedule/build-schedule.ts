/**
 * Project + solution + checks + installation data (+ tuning) → ScheduleDocument.
 * Pure: no I/O; the CLI, the desktop print route and tests all build the schedule here.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { envelopeOf, expectedStringFrequency, membersOfGroup, purposeOf } from '../../../solver/index.ts';
import { basisLines, checkRow, warningText } from '../checks/check-text.ts';
import type { CheckReport, InstallationData, ModalOutcome, ProjectFile, ScheduleSpec, SolveReport, TuningResult } from '../../../solver/index.ts';
import { SCHEDULE_CAUTION, type PaperSize, type ScheduleDocument, type ScheduleMemberRow } from './schedule-types.ts';
import type { UnitSystem } from '../units/index.ts';
import { installationNoteText } from '../report/installation-text.ts';
import { tuningRunRecord } from '../tuning/tuning-record.ts';
import { scheduleListing, summariseMembers } from './schedule-listing.ts';
import { scheduleTuning } from './schedule-tuning.ts';
import { scheduleFrequencies } from './schedule-frequencies.ts';

export interface ScheduleSource {
  project: ProjectFile;
  report: SolveReport;
  checks?: CheckReport | null;
  installation?: InstallationData | null;
  /** A tuning run to summarise; without it project.tuning.lastRun is used when present. */
  tuning?: TuningResult | null;
  /** Modes about the reference case (solver/modes: solveModes), null when not computed. */
  modes?: ModalOutcome | null;
  /** Further notes for the reader (e.g. why installation data is missing). */
  notes?: string[];
}

export interface ScheduleOptions {
  units?: UnitSystem;
  paper?: PaperSize;
  /** ISO date of issue (YYYY-MM-DD); the caller supplies it (pure builder, no clock). */
  issueDate: string;
  /** What to list, over the project's `schedule` field (CLI --groups / --all). */
  listing?: ScheduleSpec;
}

export function buildSchedule(src: ScheduleSource, options: ScheduleOptions): ScheduleDocument {
  const { project, report } = src;
  const units = options.units ?? project.display?.units ?? 'SI';
  if (units !== 'SI' && units !== 'US') throw new Error(`units must be SI or US, got ${JSON.stringify(units)}`);
  const paper = options.paper ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') throw new Error(`paper must be a4 or letter, got ${JSON.stringify(paper)}`);
  const notes: string[] = [];
  const caseLabel = new Map<string, string>([
    ...project.loadCases.map((c) => [c.id, c.label ?? c.id] as const),
    ...(project.combinations ?? []).map((c) => [c.id, c.label ?? c.id] as const),
  ]);
  const cases = report.cases.map((c) => ({ id: c.id, label: caseLabel.get(c.id) ?? c.id, converged: c.converged }));
  for (const c of report.cases) if (!c.converged) notes.push(`Case '${c.id}' did not converge (${c.status}); its results are left out (shown as —). ${c.message ?? ''}`.trim());

  const groupsOf = new Map<string, string[]>(project.members.map((m) => [m.id, []]));
  const groupIds = new Set<string>([...(project.groups ?? []).map((g) => g.id), ...project.members.flatMap((m) => m.groups ?? [])]);
  const groupLabel = (g: string) => project.groups?.find((x) => x.id === g)?.label ?? g;
  for (const g of groupIds) for (const id of membersOfGroup(project, g)) groupsOf.get(id)?.push(groupLabel(g));

  // Envelope over the cases that are checked by themselves (componentOnly cases are left out).
  const env = envelopeOf(report, report.cases.filter((c) => purposeOf(project, c.id) !== 'componentOnly').map((c) => c.id));
  const envById = new Map(env.members.map((m) => [m.id, m]));
  const checkById = new Map((src.checks?.members ?? []).map((m) => [m.id, m]));
  const instById = new Map((src.installation?.members ?? []).map((m) => [m.id, m]));
  const caseMembers = report.cases.map((c) => (c.converged ? new Map(c.members.map((m) => [m.id, m])) : null));

  const listing = scheduleListing(project, options.listing ?? project.schedule ?? {}, groupLabel);
  const members: ScheduleMemberRow[] = project.members.filter((m) => listing.inFull.has(m.id)).map((m) => {
    const e = envById.get(m.id);
    const chk = checkById.get(m.id);
    const inst = instById.get(m.id);
    return {
      id: m.id,
      groups: groupsOf.get(m.id) ?? [],
      section: m.section,
      kind: m.kind,
      cutLength: inst?.cutLength ?? null,
      installationTension: inst?.installationTension ?? null,
      frequency: inst?.frequencies?.tautString ?? null,
      frequencyInPlane: inst?.frequencies?.lowestInPlane ?? null,
      tensionByCase: caseMembers.map((cm) => cm?.get(m.id)?.tensionMax ?? null),
      envelopeMax: e?.tensionMax ?? null,
      envelopeMaxCase: e?.tensionMaxCase ?? '',
      envelopeMin: e?.tensionMin ?? null,
      envelopeMinCase: e?.tensionMinCase ?? '',
      utilisation: chk?.utilisation ?? null,
      utilisationCase: chk?.utilisationCase ?? '',
      checkStatus: chk?.status ?? 'unchecked',
      failedChecks: chk?.failed ?? [],
    };
  });

  const reactions = report.cases.filter((c) => c.converged).flatMap((c) => c.reactions.map((r) => ({
    node: r.node, case: c.id, force: [...r.force] as [number, number, number], magnitude: Math.hypot(...r.force),
    ...(r.moment ? { moment: [...r.moment] as [number, number, number] } : {}),
  })));
  reactions.sort((a, b) => (a.node < b.node ? -1 : a.node > b.node ? 1 : 0));

  const record = src.tuning ? tuningRunRecord(src.tuning, project, units, options.issueDate) : project.tuning?.lastRun ?? null;
  const tuning = record ? scheduleTuning(project, record, units, groupLabel, notes) : null;

  const inst = src.installation;
  if (inst) notes.push(...inst.warnings.map((w) => installationNoteText(w, units)));
  else notes.push('Installation data (cut lengths, frequencies, temperature table) was not computed.');
  if (!src.checks) notes.push('Design checks were not run: utilisation and check columns are empty.');
  else notes.push(...src.checks.warnings.map(warningText));
  notes.push(...(src.notes ?? []));
  const temperatureTable = inst ? {
    temperatures: inst.table.map((r) => r.temperature),
    rows: inst.members.map((m, k) => ({
      member: m.id, kind: m.kind,
      tensions: inst.table.map((r) => (r.converged ? r.tensions[k] : null)),
      frequencies: inst.table.map((r) => (r.converged ? expectedStringFrequency(m, r.tensions[k]) : null)),
    })).filter((r) => r.kind === 'cable' && listing.inFull.has(r.member)).map(({ member, tensions, frequencies }) => ({ member, tensions, frequencies })),
  } : null;

  const meta = project.meta ?? {};
  return {
    title: 'Member tension schedule',
    caution: SCHEDULE_CAUTION,
    units,
    paper,
    header: {
      projectName: meta.name ?? '(unnamed project)',
      site: meta.site ?? '',
      client: meta.client ?? '',
      engineer: meta.engineer ?? '',
      issueDate: options.issueDate,
      referenceTemperature: inst?.referenceTemperature ?? meta.referenceTemperature ?? NaN,
      referenceTemperatureAssumed: inst?.referenceTemperatureAssumed ?? meta.referenceTemperature === undefined,
      referenceCase: inst?.referenceCase ?? '',
    },
    documentNumber: project.report?.documentNumber ?? '',
    revisions: (project.report?.revisions ?? []).map((r) => ({ ...r })),
    listing: listing.info,
    cases,
    members,
    memberSummary: summariseMembers(project, listing.summarised, env, src.checks ?? null),
    frequencies: src.modes ? scheduleFrequencies(src.modes) : null,
    reactions,
    tuning,
    temperatureTable,
    checksPass: src.checks ? src.checks.pass : null,
    basis: src.checks ? basisLines(src.checks.basis) : null,
    checkRows: src.checks ? listedCheckRows(src.checks, units, listing.inFull, notes) : null,
    notes,
  };
}

/**
 * Check rows of the schedule: every row about a member printed in full or about something other
 * than a member (nodes, sets), and every failing row; passing rows of summarised or unlisted
 * members are left out (their summary row carries the worst utilisation), with a note.
 */
function listedCheckRows(checks: CheckReport, units: UnitSystem, inFull: Set<string>, notes: string[]) {
  const memberIds = new Set(checks.members.map((m) => m.id));
  const rows = checks.results.map((r) => checkRow(r, units));
  const kept = rows.filter((r) => r.verdict === 'FAIL' || !memberIds.has(r.item) || inFull.has(r.item));
  if (kept.length < rows.length) notes.push(`${rows.length - kept.length} passing check rows of members not printed in full are left out (\`stayset check\` lists every row).`);
  return kept;
}

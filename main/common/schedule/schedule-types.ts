/**
 * The member tension schedule as data: what the printed schedule (HTML/PDF), the CSV and the
 * renderer's print route all show. Numbers are SI (N, m, Hz, K); formatting is main/common/units.
 * Built by buildSchedule (build-schedule.ts) from project + solution + checks + installation data.
 */
import type { UnitSystem } from '../units/index.ts';
import type { CheckRow } from '../checks/check-text.ts';
import type { MemberKind, ReportRevision, ScheduleListing } from '../../../solver/index.ts';

export const SCHEDULE_CAUTION = 'Results are for review by a qualified engineer; local codes and licensed practice govern.';

export type PaperSize = 'a4' | 'letter';

export interface ScheduleHeader {
  projectName: string;
  site: string;
  client: string;
  engineer: string;
  /** Date of issue, ISO 8601 (YYYY-MM-DD). */
  issueDate: string;
  /** Reference (design) temperature, K. */
  referenceTemperature: number;
  referenceTemperatureAssumed: boolean;
  /** Id of the installation (reference) case. */
  referenceCase: string;
}

export interface ScheduleCase {
  id: string;
  label: string;
  converged: boolean;
}

export interface ScheduleMemberRow {
  id: string;
  /** Group ids the member belongs to, comma-joined for display. */
  groups: string[];
  section: string;
  kind: MemberKind;
  /** Unstressed (cut) length, m; null when installation data is missing. */
  cutLength: number | null;
  /** Tension at the lower end in the reference state at T_ref, N. */
  installationTension: number | null;
  /** Taut-string / first out-of-plane frequency, Hz (cables only). */
  frequency: number | null;
  /** Lowest in-plane frequency (Irvine sag-corrected), Hz (cables only). */
  frequencyInPlane: number | null;
  /** Largest element tension per case, same order as ScheduleDocument.cases; null = not converged. */
  tensionByCase: (number | null)[];
  envelopeMax: number | null;
  envelopeMaxCase: string;
  envelopeMin: number | null;
  envelopeMinCase: string;
  /** Design force / design resistance under the design basis (highest over strength cases), null without resistance data or checks. */
  utilisation: number | null;
  utilisationCase: string;
  /** 'pass' | 'fail' | 'unchecked' (checks not run or member without limits). */
  checkStatus: 'pass' | 'fail' | 'unchecked';
  /** Failed check codes (e.g. "cableResistance", "minimumTension"). */
  failedChecks: string[];
}

export interface ScheduleReactionRow {
  node: string;
  case: string;
  /** Force the support exerts on the structure [Fx, Fy, Fz], N. */
  force: [number, number, number];
  magnitude: number;
  /** Moment the support exerts [Mx, My, Mz], N·m, where it restrains or springs a rotation. */
  moment?: [number, number, number];
}

export interface ScheduleTuning {
  summary: string;
  /** 'met' | 'unmet' | 'notConverged', or '' for a record without status. */
  status: string;
  /** Date of the tuning run (ISO), when known. */
  date: string;
  targets: { label: string; value: string; met: boolean }[];
  variables: { group: string; by: string; value: string }[];
  diagnosis: string[];
}

export interface ScheduleTemperatureTable {
  /** Installation temperatures, K. */
  temperatures: number[];
  /**
   * Per cable: tension to set (N, lower end) and the taut-string frequency it should then show
   * (Hz, f1 = (1/2L)√(T/m) with the mid-length tension), per temperature.
   */
  rows: { member: string; tensions: (number | null)[]; frequencies: (number | null)[] }[];
}

/**
 * Members other than cables that the listing includes, summarised per group (or per section when
 * in no group): how many, the governing axial forces and the highest utilisation, with where.
 */
export interface ScheduleMemberSummary {
  /** Group label, or "section <id>". */
  label: string;
  /** Member kinds in the row, e.g. ["bar"]. */
  kinds: MemberKind[];
  count: number;
  /** Largest tension over the enveloped cases, N, and the member and case. */
  maxTension: number | null;
  maxTensionAt: string;
  /** Smallest axial force (negative = compression), N, and the member and case. */
  minForce: number | null;
  minForceAt: string;
  utilisation: number | null;
  utilisationAt: string;
  /** Members whose checks fail / that were not checked. */
  failing: number;
  unchecked: number;
}

/** What the schedule lists (ScheduleSpec resolved): shown in the header. */
export interface ScheduleListingInfo {
  list: ScheduleListing;
  /** Labels of the chosen groups (list 'groups'). */
  groups: string[];
  /** Members in the project, and how many are printed in full / summarised / left out. */
  total: number;
  inFull: number;
  summarised: number;
}

/** First natural frequencies of the structure (solver/modes) about the reference case. */
export interface ScheduleFrequencies {
  /** Case the modes are about. */
  case: string;
  modes: { number: number; frequency: number; period: number }[];
  /** Modal notes in words (report-modes.ts), or the reason there are no modes. */
  notes: string[];
}

export interface ScheduleDocument {
  title: string;
  caution: string;
  units: UnitSystem;
  paper: PaperSize;
  header: ScheduleHeader;
  /** Document number (project report.documentNumber; '' when not set). */
  documentNumber: string;
  /** Revision block: the calculation report's revisions (project report.revisions), oldest first. */
  revisions: ReportRevision[];
  listing: ScheduleListingInfo;
  cases: ScheduleCase[];
  /** Members printed in full (cables of the listing), project order. */
  members: ScheduleMemberRow[];
  /** Other members of the listing, one row per group or section. */
  memberSummary: ScheduleMemberSummary[];
  /** First natural frequencies, null when not computed. */
  frequencies: ScheduleFrequencies | null;
  reactions: ScheduleReactionRow[];
  tuning: ScheduleTuning | null;
  temperatureTable: ScheduleTemperatureTable | null;
  /** Overall result of the design checks, null when not run. */
  checksPass: boolean | null;
  /** The design basis, one line per factor with its source (check-text.ts basisLines); null without checks. */
  basis: string[] | null;
  /** Governing result of every check (the same rows as `stayset check` and the app's Checks tab). */
  checkRows: CheckRow[] | null;
  /** Notes for the reader: warnings, assumptions, cases that did not converge. */
  notes: string[];
}

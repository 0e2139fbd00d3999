/**
 * The member tension schedule as data: what the printed schedule (HTML/PDF), the CSV and the
 * renderer's print route all show. Numbers are SI (N, m, Hz, K); formatting is main/common/units.
 * Built by buildSchedule (build-schedule.ts) from project + solution + checks + installation data.
 */
import type { UnitSystem } from '../units/index.ts';
import type { CheckRow } from '../checks/check-text.ts';
import type { MemberKind } from '../../../solver/index.ts';

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

export interface ScheduleDocument {
  title: string;
  caution: string;
  units: UnitSystem;
  paper: PaperSize;
  header: ScheduleHeader;
  cases: ScheduleCase[];
  members: ScheduleMemberRow[];
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

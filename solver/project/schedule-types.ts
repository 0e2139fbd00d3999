/**
 * Project-file types of the printed member tension schedule: what it lists, and the record of
 * the last tuning run it prints. Same conventions as types.ts: SI base units (N, m), dates ISO
 * 8601. Mirrored by the schema in main/common/project/ (definitions "schedule" and
 * "tuningRunRecord"). The revision block is the calculation report's (`report.revisions`,
 * site-types.ts), so both documents print the same revisions.
 */

/**
 * Which members the schedule lists. 'cables' (the default): every cable. 'groups': the members of
 * `groups`. 'all': every member. Cables get a full row each (cut length, installation tension,
 * frequencies, tension per case, checks); other members (bars, beams) listed by the choice are
 * summarised per group (or per section when in no group): count, governing forces, utilisation.
 */
export type ScheduleListing = 'cables' | 'groups' | 'all';

export interface ScheduleSpec {
  /** What the member tables list (default 'cables'). */
  list?: ScheduleListing;
  /** Group ids listed when `list` is 'groups', in print order. */
  groups?: string[];
}

/** One tuning target as it ended in a run (value and limit in `unit`: m, N or a share 0..1). */
export interface TuningRunTarget {
  /** Target kind (sag, tensionShare, noSlack, plumb, reaction). */
  kind: string;
  /** Plain description as the tuner wrote it. */
  label: string;
  value: number;
  limit: number;
  unit: 'm' | 'N' | 'share';
  sense: 'atMost' | 'equal';
  met: boolean;
  /** Member or node that governs the value. */
  governing?: string;
}

/** One tuning variable as a run left it: pretension N, or a factor on unstressed lengths. */
export interface TuningRunVariable {
  group: string;
  by: 'pretension' | 'unstressedLength';
  initial: number;
  final: number;
  atBound?: 'lower' | 'upper';
}

/**
 * The record of an accepted tuning run, kept in `tuning.lastRun` (written by `stayset tune
 * --write` and when the app applies a run). `date` and `summary` are always present; files
 * written before the detailed record have only those two.
 */
export interface TuningRunRecord {
  /** ISO 8601 date (and time) of the run. */
  date: string;
  summary: string;
  status?: 'met' | 'unmet' | 'notConverged';
  targets?: TuningRunTarget[];
  variables?: TuningRunVariable[];
  /** Why targets are not met, as the tuner explained it. */
  diagnosis?: string[];
}

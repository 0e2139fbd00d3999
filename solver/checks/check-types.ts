/**
 * Output of the design checks (runChecks). Forces N, lengths m, ratios dimensionless.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */

export type CheckKind =
  /** T_max / (φ · breakingLoad) > 1. */
  | 'utilisation'
  /** A member of a no-slack group is slack. */
  | 'slack'
  /** Sag above the group's limit. */
  | 'sag'
  /** Node displacement magnitude above its limit. */
  | 'displacement'
  /** Horizontal offset of top relative to base over their height above the limit. */
  | 'tilt'
  /** Support listed in upliftNodes with Fz < 0 (pulled up). */
  | 'uplift'
  /** The case did not converge; nothing of it may be used for design. */
  | 'notConverged';

export interface CheckFailure {
  kind: CheckKind;
  /** Member id (utilisation, slack, sag), node id (displacement, uplift, notConverged: case id), or "base→top" (tilt). */
  id: string;
  /** Governing case or combination id. */
  case: string;
  /** Checked value (N, m or ratio, by kind). */
  value: number;
  /** Its limit in the same unit. */
  limit: number;
  /** value / limit where meaningful, null for yes/no checks (slack, uplift, notConverged). */
  ratio: number | null;
  /** One plain sentence naming the entry and the problem. */
  message: string;
}

export type ItemStatus = 'pass' | 'fail' | 'unchecked';

/** Per-member outcome for highlighting. */
export interface MemberCheck {
  id: string;
  status: ItemStatus;
  /** Highest utilisation over the checked cases (null without a breaking load). */
  utilisation: number | null;
  utilisationCase: string;
  tensionMax: number;
  /** Kinds that failed for this member. */
  failed: CheckKind[];
}

export interface NodeCheck {
  id: string;
  status: ItemStatus;
  failed: CheckKind[];
}

/** Summary of one case or combination. */
export interface CaseCheck {
  id: string;
  converged: boolean;
  pass: boolean;
  /** Highest member utilisation in this case (0 when none is checked). */
  maxUtilisation: number;
  maxUtilisationMember: string;
  failures: number;
}

export interface CheckReport {
  /** True only when every case converged and no check failed. */
  pass: boolean;
  allConverged: boolean;
  resistanceFactor: number;
  /** Worst failure per (kind, id) over all cases, worst ratio first. */
  failures: CheckFailure[];
  /** Notes that are not failures (e.g. members without a breaking load, unknown group ids). */
  warnings: string[];
  cases: CaseCheck[];
  members: MemberCheck[];
  nodes: NodeCheck[];
}

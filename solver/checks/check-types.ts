/**
 * Output of the design checks (runChecks): structured results — a code plus its quantities — that
 * the edges (CLI, app, schedule) turn into words and units with one shared formatter
 * (main/common/checks/check-text.ts). Forces N, lengths m, angles degrees, ratios dimensionless.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { CasePurpose, CheckFormat } from '../project/types.ts';
import type { ResolvedBasis } from './design-basis.ts';

export type CheckCode =
  /** Cable: design tension / design resistance F_Rd (k_e · MBL / divisor). */
  | 'cableResistance'
  /** Cable: tension / (serviceability share · k_e · MBL), serviceability cases, limit state. */
  | 'cableServiceTension'
  /** Cable: lowest end tension (member measure) below the group's minimum; ratio = minimum / tension. */
  | 'minimumTension'
  /** A member of a no-slack group has a slack element (strain-slack). */
  | 'slack'
  /** Sag above the group's limit. */
  | 'sag'
  /** Bar: tension / N_t,Rd. */
  | 'barTension'
  /** Bar: compression / N_b,Rd (flexural buckling). */
  | 'barBuckling'
  /** Beam-column: N/N_Rd + M/M_Rd (linear interaction, beam-column.ts). */
  | 'beamColumn'
  /** Bar: slenderness L_cr / i above its limit (checked once, not per case). */
  | 'slenderness'
  /** Node displacement (horizontal, total or along a direction) above its limit. */
  | 'displacement'
  /** Horizontal offset of top relative to base over their height above the limit. */
  | 'tilt'
  /** Rotation about the vertical of a node set above its limit. */
  | 'twist'
  /** Support listed in upliftNodes with Fz < 0 (pulled up). */
  | 'uplift'
  /** The case did not converge; nothing of it may be used for design. */
  | 'notConverged';

/** What the value and limit measure, for choosing the unit at the edge. */
export type CheckQuantity = 'force' | 'length' | 'ratio' | 'angle' | 'slenderness' | 'none';

export interface CheckResult {
  code: CheckCode;
  format: CheckFormat;
  /** Governing case or combination id ('' for checks that do not depend on a case). */
  case: string;
  purpose: CasePurpose | null;
  /** Member id, node id, "base→top" (tilt), node-set label (twist) or case id (notConverged). */
  item: string;
  quantity: CheckQuantity;
  /** Checked value and its limit in the same unit; ratio = value / limit (minimum tension: limit / value). */
  value: number;
  limit: number;
  /** > 1 fails; null for yes/no checks (slack, uplift, notConverged), which fail when present. */
  ratio: number | null;
  pass: boolean;
  /** Where the limit or formula comes from (basis-defaults.ts, or "project file …"). */
  source: string;
  /** Intermediate quantities for the reader (e.g. chi, lambdaBar, alpha, ke, breakingLoad). */
  detail?: Record<string, number>;
}

/** A note that is not a failure: a code and the items concerned. */
export interface CheckWarning {
  code:
    | 'noBreakingLoad' | 'noYieldStrength' | 'noRadiusOfGyration' | 'terminationNotSet' | 'defaultBasis'
    | 'chordTensionUnsolved' | 'prestressFactorIgnored' | 'noServiceabilityCase' | 'noStrengthCase' | 'noSectionModulus';
  items: string[];
}

export type ItemStatus = 'pass' | 'fail' | 'unchecked';

/** Per-member outcome for highlighting and tables. */
export interface MemberCheck {
  id: string;
  status: ItemStatus;
  /** Highest utilisation over the strength-checked cases (null without resistance data). */
  utilisation: number | null;
  utilisationCase: string;
  /** Tension of that case, N (largest over cases when no utilisation). */
  tensionMax: number;
  /** Codes that failed for this member. */
  failed: CheckCode[];
}

export interface NodeCheck {
  id: string;
  status: ItemStatus;
  failed: CheckCode[];
}

/** Summary of one case or combination. */
export interface CaseCheck {
  id: string;
  purpose: CasePurpose;
  converged: boolean;
  /** False for componentOnly cases (not checked). */
  checked: boolean;
  pass: boolean;
  /**
   * Highest ratio (value / limit, or limit / value for minimum tensions) of any check run in this
   * case, strength and serviceability alike (0 when none has a ratio).
   */
  maxUtilisation: number;
  /** The member or node that ratio belongs to ('' when none). */
  maxUtilisationMember: string;
  failures: number;
}

export interface CheckReport {
  /** True only when every checked case converged and no check failed. */
  pass: boolean;
  allConverged: boolean;
  basis: ResolvedBasis;
  /** Governing result per (code, item) over all cases, worst ratio first (passes and failures). */
  results: CheckResult[];
  /** The failing ones of `results`. */
  failures: CheckResult[];
  warnings: CheckWarning[];
  cases: CaseCheck[];
  members: MemberCheck[];
  nodes: NodeCheck[];
}

/**
 * Design basis of a project (format version 2): what each load case and combination is for, the
 * check format and its factors, and the design data of sections and members that the checks use.
 * Units SI as in types.ts; factors and shares dimensionless. Every default lives in
 * solver/checks/basis-defaults.ts with its source.
 */

/**
 * What a load case or combination is checked for:
 * - ultimate: strength checks (cable resistance, member yield and buckling) — factored actions
 *   in the limit-state format;
 * - serviceability: deformation, sag, slack, minimum and serviceability tension — unfactored;
 * - accidental: strength checks with the accidental factors;
 * - componentOnly: used inside combinations only, never checked or enveloped by itself.
 * Absent: load cases count as serviceability, combinations as ultimate.
 */
export type CasePurpose = 'ultimate' | 'serviceability' | 'accidental' | 'componentOnly';

/**
 * Which action a load case represents, for the combination builder. A "permanent" case holds
 * self-weight (the installed pretension is in every case); the others should hold only their
 * own action (selfWeight false) so combinations count self-weight once.
 */
export type ActionKind = 'permanent' | 'wind' | 'ice' | 'iceWithWind' | 'temperature' | 'accidental';

/** Check formats: limit-state (partial factors) or allowable (safety factors on service states). */
export type CheckFormat = 'limitState' | 'allowable';

export interface DesignBasis {
  format: CheckFormat;
  /** Name of the basis as printed on reports, e.g. "EN 1990 with national annex of …". */
  label?: string;
  /** Limit state: partial factors γ_F on actions (unfavourable unless named favourable). */
  actionFactors?: ActionFactors;
  /** Combination factors ψ0 of accompanying variable actions (both formats). */
  combinationFactors?: CombinationFactors;
  /** Limit state: cable (tension component) resistance factors. */
  cable?: CableResistanceFactors;
  /** Limit state: partial factors of steel members. */
  steel?: SteelMemberFactors;
  /** Allowable format: safety factors. */
  allowable?: AllowableFactors;
}

export interface ActionFactors {
  permanent?: number;
  permanentFavourable?: number;
  /** Only 1 is supported: every case starts from the installed pretension. */
  prestress?: number;
  wind?: number;
  ice?: number;
  temperature?: number;
  accidental?: number;
}

export interface CombinationFactors {
  wind?: number;
  ice?: number;
  temperature?: number;
}

/** F_Rd = k_e · MBL / (breakingFactor · γ_R); serviceability: T ≤ serviceabilityShare · k_e · MBL. */
export interface CableResistanceFactors {
  breakingFactor?: number;
  partialFactor?: number;
  serviceabilityShare?: number;
}

export interface SteelMemberFactors {
  /** γ_M0: resistance of cross-sections (yield). */
  gammaM0?: number;
  /** γ_M1: resistance of members to instability (buckling). */
  gammaM1?: number;
}

export interface AllowableFactors {
  /** Cable tension ≤ k_e · MBL / cableSafetyFactor. */
  cableSafetyFactor?: number;
  /** Member force ≤ resistance (yield or χ·yield) / memberSafetyFactor. */
  memberSafetyFactor?: number;
}

/** End-termination kinds with a recalled efficiency (solver/checks/basis-defaults.ts). */
export type TerminationKind = 'socketMetal' | 'socketResin' | 'swaged' | 'wedgeSocket' | 'clips' | 'preformedGrip';

/** Section shapes the buckling-curve and radius-of-gyration defaults know. */
export type SectionShape = 'solidRound' | 'tubeHotFinished' | 'tubeColdFormed' | 'angle' | 'rolledI' | 'other';

/** EN 1993-1-1 buckling curves. */
export type BucklingCurve = 'a0' | 'a' | 'b' | 'c' | 'd';

/**
 * Minimum tension of every member of a group in serviceability cases: at least the larger of
 * shareOfInstallation × its installation tension and shareOfBreaking × its breaking load.
 */
export interface MinimumTensionRule {
  group: string;
  shareOfInstallation?: number;
  shareOfBreaking?: number;
}

/**
 * Member design data per group: role (slenderness limit default), buckling length as a factor on
 * the member's system length (between its end nodes) or absolute, and a slenderness limit.
 */
export interface MemberDesignRule {
  group: string;
  role?: 'leg' | 'bracing' | 'redundant' | 'other';
  bucklingLengthFactor?: number;
  bucklingLength?: number;
  slendernessLimit?: number;
}

/** Rotation about the vertical of a set of nodes at one level (their plan centroid), degrees. */
export interface TwistLimit {
  nodes: string[];
  limit: number;
}

/**
 * Results of a tensioning-sequence analysis (solver/sequence). Forces N, lengths m, temperatures
 * K, ratios dimensionless. Codes and quantities only; words and units are chosen by main/ and
 * renderer/. Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { AnalysisStatus } from '../results/types.ts';
import type { SettingMethod } from '../project/site-types.ts';

/** What the crew sets on one member in one step. */
export interface MemberSetting {
  member: string;
  setBy: SettingMethod;
  /**
   * force: the tension at the lower end reached when the member is at its unstressed length for
   * this stage, N; length: the mark = stress-free length at the day's temperature, m.
   */
  value: number;
  /** Tolerance band [low, high] of the value (same unit). */
  band: [number, number];
  /** The band in the other quantity: a length band (m) for a force setting, a force band (N) for a length setting. */
  equivalentBand: [number, number];
  /** Change of the value per kelvin of the day's temperature (N/K or m/K), by finite difference through the solver for forces. */
  perKelvin: number;
  /** Tension at the lower end per metre of shortening of this member at this stage, N/m (finite difference). */
  stiffness: number;
  /** Unstressed length the member is set to in this stage, m (at T_ref). */
  unstressedLength: number;
  /** 1 or 2 (second pass of a two-pass sequence). */
  pass: number;
}

/** State of one installed member after a stage. */
export interface StageMemberState {
  member: string;
  /** Tension at the lower end, N. */
  tension: number;
  tensionMax: number;
  /** tensionMax / (φ · breaking load), null without a breaking load. */
  utilisation: number | null;
  slack: boolean;
}

export type SequenceIssue =
  | { code: 'notConverged'; stage: number; status: AnalysisStatus }
  | { code: 'overload'; stage: number; member: string; value: number; limit: number }
  | { code: 'slack'; stage: number; member: string; value: number }
  | { code: 'plumb'; stage: number; value: number; limit: number }
  | { code: 'finalMismatch'; member: string; value: number; design: number };

export type SequenceSuggestion =
  /** The steps in this order (indices into the original steps) pass every stage. */
  | { code: 'reorder'; order: number[] }
  /** Two passes pass every stage: pass 1 sets each member to share × its design strain, pass 2 to the design length. */
  | { code: 'secondPass'; share: number }
  /** A stage is a mechanism: group its members with the next step's or add a temporary restraint. */
  | { code: 'restrainOrGroup'; stage: number }
  /** Nothing tried passed. */
  | { code: 'none' };

export interface SequenceStage {
  /** 1-based stage number. */
  index: number;
  kind: 'step' | 'release';
  /** Index into the steps as run (0-based) for kind 'step'. */
  step: number;
  pass: number;
  /** Members tensioned in this stage (empty for a release). */
  members: string[];
  /** Nodes whose temporary restraint is released in this stage. */
  released: string[];
  converged: boolean;
  status: AnalysisStatus;
  settings: MemberSetting[];
  /** Every member in place with a breaking load or a cable, after the stage. */
  state: StageMemberState[];
  /** Mast tilt ratio after the stage (null without a plumb setting). */
  tilt: number | null;
  issues: SequenceIssue[];
}

export interface SequenceResult {
  id: string;
  /** Day's temperature, K, and the reference temperature, K. */
  temperature: number;
  referenceTemperature: number;
  referenceTemperatureAssumed: boolean;
  /** Step order as run (indices into the spec's steps). */
  order: number[];
  passes: number;
  stages: SequenceStage[];
  /** Tension at the lower end per member in the one-shot design state at the day's temperature, N. */
  design: { member: string; tension: number }[];
  /** Largest |final − design| / max(|design|, 1 % of the largest design tension) over members. */
  finalDifference: number;
  issues: SequenceIssue[];
  ok: boolean;
  suggestions: SequenceSuggestion[];
  resistanceFactor: number;
  plumbLimit: number | null;
}

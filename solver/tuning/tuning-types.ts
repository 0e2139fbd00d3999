/**
 * Types of the pretension tuner (solver/tuning). Forces N, lengths m, shares dimensionless.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { ProjectFile, TuningTarget } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import type { OutcomeMessage } from '../results/message-types.ts';

/**
 * Solves the named cases (load case or combination ids) of a project and returns their results
 * by id. The tuner calls it with projects whose member pretensions it changed. It may throw with
 * a plain message on bad input; a case that does not converge is returned with converged = false.
 */
export type CaseSolveFn = (project: ProjectFile, caseIds: readonly string[]) => Map<string, CaseResult>;

/** One tuning variable resolved against the project. */
export interface ResolvedVariable {
  group: string;
  by: 'pretension' | 'unstressedLength';
  /** Member ids of the group, project order. */
  memberIds: string[];
  /** Starting value: pretension N (mean over the group) or length factor (1 = as in the file). */
  initial: number;
  lower: number;
  upper: number;
  /** Typical size of a change, used to scale the variable (N or factor). */
  scale: number;
  /** Unstressed length per member at factor 1, m (by = 'unstressedLength'). */
  baseUnstressedLength: number[];
}

/** What a target asks for: value ≤ limit, or value = limit. */
export type TargetSense = 'atMost' | 'equal';

/** A target's state in one evaluation. */
export interface TargetValue {
  /** Human-readable quantity, e.g. "sag 0.52 m (member G1-1)". */
  value: number;
  limit: number;
  sense: TargetSense;
  /** Normalised gap g: ≤ 0 means met for 'atMost'; 0 means met for 'equal'. Dimensionless. */
  gap: number;
  /** Member or node that governs the value. */
  governing: string;
  /** Unit of value and limit for display: 'm', 'N', 'share'. */
  unit: 'm' | 'N' | 'share';
}

export interface TargetOutcome {
  index: number;
  /** The target as given (its words are made at the edge: main/common/tuning/tuning-text.ts). */
  target: TuningTarget;
  value: number;
  limit: number;
  unit: 'm' | 'N' | 'share';
  sense: TargetSense;
  governing: string;
  met: boolean;
}

export interface VariableOutcome {
  group: string;
  by: 'pretension' | 'unstressedLength';
  initial: number;
  final: number;
  lower: number;
  upper: number;
  /** 'lower' / 'upper' when the final value sits on a bound. */
  atBound: 'lower' | 'upper' | null;
}

export interface TuningResult {
  /** met: every target met; unmet: converged cases but some target not met; notConverged: a case failed. */
  status: 'met' | 'unmet' | 'notConverged';
  targets: TargetOutcome[];
  variables: VariableOutcome[];
  iterations: number;
  /** Number of multi-case solves made. */
  evaluations: number;
  /** Which targets conflict or cannot be met, and why, as structured notes (words at the edge). */
  diagnosis: TuningNote[];
  /** The project with the final pretensions written in (input untouched). */
  project: ProjectFile;
  /** One-line summary without numbers in units (counts only), a fallback; the edge words it in full. */
  summary: string;
  /** True when the run was stopped by TuneOptions.isCancelled (state = best so far). */
  cancelled: boolean;
}

/**
 * Why a target is not met, or why the run stopped. Refs: `target` / `other` (indices into
 * TuningResult.targets), `group` (tuning variable's group id), `by` ('pretension' |
 * 'unstressedLength'), `bound` ('upper' | 'lower'), `direction` ('up' | 'down': the variable would
 * have to rise or fall), `groups` (every variable's group), `case` and `status` (a case that did
 * not converge). Quantities: `bound` (N for pretension, a factor for lengths: kind 'ratio'), `gap`
 * (share of the limit).
 * - startUnsolved: the starting state could not be solved (case, status)
 * - noInfluence: no variable changes the target (target, groups)
 * - atBound: the target needs a variable past its bound (target, group, by, bound, direction)
 * - conflict: the target needs a variable moved in a direction another binding target forbids
 * - iterationLimit: not met within the iteration limit (target, gap)
 * - trialUnsolved: a trial step could not be solved; stopped at the last state that solved
 * - cancelled: the run was cancelled; the values are the best reached so far
 */
export type TuningNoteCode = 'startUnsolved' | 'noInfluence' | 'atBound' | 'conflict' | 'iterationLimit' | 'trialUnsolved' | 'cancelled';
export type TuningNote = OutcomeMessage<TuningNoteCode>;

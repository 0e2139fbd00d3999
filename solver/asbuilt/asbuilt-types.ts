/**
 * Results of the as-built back-analysis (solver/asbuilt). Forces N, lengths m, temperatures K.
 * Codes and numbers only. Results are for review by a qualified engineer; local codes and
 * licensed practice govern.
 */
import type { CheckReport } from '../checks/check-types.ts';
import type { MeasurementMethod } from '../project/site-types.ts';
import type { ProjectFile } from '../project/types.ts';

/** One reading turned into a lower-end tension with its standard uncertainty. */
export interface TensionObservation {
  member: string;
  method: MeasurementMethod;
  /** The reading as entered (N, Hz or m). */
  reading: number;
  temperature: number;
  /** Lower-end tension implied by the reading, N. */
  tension: number;
  /** Its standard uncertainty, N. */
  sigma: number;
  /** Lower-end tension of the fitted as-built state at the reading's temperature, N. */
  fitted: number;
  /** (fitted − tension) / sigma. */
  normalisedResidual: number;
}

export interface PositionObservation {
  node: string;
  /** 0 = x, 1 = y. */
  axis: 0 | 1;
  temperature: number;
  measured: number;
  sigma: number;
  fitted: number;
  normalisedResidual: number;
}

export interface CableFit {
  member: string;
  designLength: number;
  asBuiltLength: number;
  /** asBuilt − design, m (positive: longer than designed, i.e. looser). */
  lengthDifference: number;
  /** Posterior standard deviation of the as-built length, m. */
  lengthSigma: number;
  /** True when the measurements at least halve the prior uncertainty of this length. */
  identified: boolean;
  /** √(Fisher information) of the measurements on this length, per prior σ (0: no reading sees it). */
  sensitivity: number;
  /** Lower-end tension at the reference temperature: design and as built, N. */
  designTension: number;
  asBuiltTension: number;
  /** |asBuilt − design| ≤ tolerance · design. */
  withinTolerance: boolean;
}

export interface Adjustment {
  member: string;
  /** Change of the unstressed length to make, m (negative: shorten = tighten). */
  lengthChange: number;
  /** Lower-end tension at the reference temperature once every listed adjustment is made, N. */
  targetTension: number;
  /** False when the readings do not identify this cable's length: measure it before adjusting. */
  identified: boolean;
}

export type AsBuiltIssue =
  | { code: 'fitNotConverged'; status: string }
  | { code: 'largeResidual'; index: number; member: string; value: number }
  | { code: 'adjustmentsIncomplete'; members: string[] };

export interface AsBuiltResult {
  id: string;
  referenceTemperature: number;
  tolerance: number;
  lengthUncertainty: number;
  cables: CableFit[];
  observations: TensionObservation[];
  positions: PositionObservation[];
  /** √(Σ r² / m) of the normalised measurement residuals (≈ 1 when the accuracies are right). */
  rmsResidual: number;
  iterations: number;
  /** ∂(observed tension)/∂(length) for each observation (rows) and cable (columns), N/m. */
  tensionSensitivity: number[][];
  adjustments: Adjustment[];
  /** Design checks on the as-built state (every case and combination), null when they could not run. */
  checks: CheckReport | null;
  /** The project with the as-built unstressed lengths written in. */
  asBuilt: ProjectFile;
  issues: AsBuiltIssue[];
}

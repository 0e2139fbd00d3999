/**
 * Project-file types for work on site: tensioning sequences, as-built site measurements and the
 * calculation report's revision block. Same conventions as types.ts: SI base units (m, N, K, Hz),
 * absolute temperatures in K, z up. Mirrored by the schema in main/common/project/ (definitions
 * "sequence", "siteMeasurementSet", "report").
 */
import type { Vec3 } from './types.ts';

/** How the crew sets a cable: by a force reading (jack, dynamometer) or by a length (mark, turnbuckle). */
export type SettingMethod = 'force' | 'length';

export interface TensioningStepSpec {
  /** Members tensioned together in this step (ids). Give `members` or `group`, not both. */
  members?: string[];
  /** A group tensioned together in this step. */
  group?: string;
  /** How the crew sets the members of this step. */
  setBy: SettingMethod;
  label?: string;
}

export interface TemporaryRestraintSpec {
  node: string;
  /** Restrained translations while the restraint is in place (letters of "xyz"). */
  fixed: string;
  /** Released after this step (1-based); default: after the last step. */
  releaseAfterStep?: number;
}

export interface TensioningSequenceSpec {
  id: string;
  label?: string;
  /** Air temperature on the day of tensioning, K (default: meta.referenceTemperature). */
  temperature?: number;
  /** Self-weight acts during erection (default true). */
  selfWeight?: boolean;
  /** Ordered steps. Members in no step are in place before the first step (mast, already-set cables). */
  steps: TensioningStepSpec[];
  temporaryRestraints?: TemporaryRestraintSpec[];
  /** Mast plumb tolerance during erection: horizontal offset of top over height ≤ limit (ratio). */
  plumb?: { base: string; top: string; limit: number };
  /** Tolerance band on a force setting, fraction of the value (default 0.05, common practice). */
  forceTolerance?: number;
  /** Tolerance band on a length setting, m (default 0.005, common practice). */
  lengthTolerance?: number;
}

export type MeasurementMethod = 'dynamometer' | 'frequency' | 'sag';

export interface TensionMeasurementSpec {
  member: string;
  method: MeasurementMethod;
  /** dynamometer: tension at the lower end, N; frequency: Hz; sag: largest vertical sag, m. */
  value: number;
  /** Standard uncertainty of the reading as a fraction of the value (e.g. 0.03 = 3 %). */
  accuracy: number;
  /** Air temperature at the measurement, K. */
  temperature: number;
  /** frequency only: which mode was measured (default the taut-string / first out-of-plane mode). */
  mode?: 'tautString' | 'inPlaneSymmetric' | 'inPlaneAntisymmetric' | 'lowestInPlane';
}

export interface PositionMeasurementSpec {
  node: string;
  /** Measured position [x, y, z], m. */
  at: Vec3;
  /** Standard uncertainty of each horizontal coordinate, m. */
  accuracy: number;
  /** Air temperature at the survey, K. */
  temperature: number;
}

export interface SiteMeasurementSetSpec {
  id: string;
  label?: string;
  /** Date of the measurements (ISO 8601). */
  date?: string;
  tensions: TensionMeasurementSpec[];
  positions?: PositionMeasurementSpec[];
  /** Acceptance band on the tension at the reference state, fraction of the design tension (default 0.1, common practice). */
  tolerance?: number;
  /** Prior uncertainty of each cable's unstressed length (fabrication and fitting), m (default 0.02, common practice). */
  lengthUncertainty?: number;
}

export interface ReportRevision {
  /** Revision mark, e.g. "A", "P01". */
  revision: string;
  /** ISO 8601 date. */
  date: string;
  description: string;
  by?: string;
  checkedBy?: string;
}

export interface ReportSpec {
  /** Document number printed in the page header. */
  documentNumber?: string;
  revisions?: ReportRevision[];
}

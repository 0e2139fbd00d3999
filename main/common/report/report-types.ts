/**
 * The calculation report as data (SI numbers: N, m, Pa, K, Hz); report-html.ts formats it.
 * Built by buildReport from one solve of the project, its checks, the installation data and the
 * tensioning sequences — the same solver functions the app and the CLI call.
 */
import type {
  CheckReport, Envelope, InstallationData, ModalOutcome, ProjectFile, ReportRevision, SequenceResult, SolveReport,
} from '../../../solver/index.ts';
import type { PaperSize } from '../schedule/schedule-types.ts';
import type { UnitSystem } from '../units/index.ts';

/** The governing value of one check over every case and combination. */
export interface GoverningRow {
  /** Check name code: utilisation | minimumTension | sag | displacement | tilt | uplift. */
  check: 'utilisation' | 'minimumTension' | 'sag' | 'displacement' | 'tilt' | 'uplift';
  /** Member, node or "base→top". */
  item: string;
  case: string;
  /** Value (ratio, N or m by check) and its limit (same unit; null when not limited). */
  value: number;
  limit: number | null;
  /** value / limit, or null. */
  ratio: number | null;
  pass: boolean;
}

export interface ReportSource {
  project: ProjectFile;
  report: SolveReport;
  checks: CheckReport;
  installation: InstallationData | null;
  sequences: SequenceResult[];
  /** Modes about the reference case (solver/modes), null when not computed. */
  modes?: ModalOutcome | null;
  /** Plain notes (e.g. why a part is missing). */
  notes?: string[];
}

export interface ReportDocument {
  project: ProjectFile;
  units: UnitSystem;
  paper: PaperSize;
  issueDate: string;
  documentNumber: string;
  revisions: ReportRevision[];
  caution: string;
  model: { nodes: number; supports: number; members: number; cables: number; bars: number; elements: number; dofs: number; sections: number; groups: number };
  report: SolveReport;
  checks: CheckReport;
  envelope: Envelope;
  governing: GoverningRow[];
  installation: InstallationData | null;
  sequences: SequenceResult[];
  modes: ModalOutcome | null;
  notes: string[];
}

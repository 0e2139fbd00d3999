/**
 * The calculation report as data (SI numbers: N, m, Pa, K, Hz); report-html.ts formats it.
 * Built by buildReport from one solve of the project, its checks, the installation data and the
 * tensioning sequences — the same solver functions the app and the CLI call.
 */
import type {
  CheckCode, CheckQuantity, CheckReport, CheckResult, Envelope, InstallationData, ModalOutcome, ProjectFile, ReportRevision, SequenceResult, SolveReport,
} from '../../../solver/index.ts';
import type { PaperSize } from '../schedule/schedule-types.ts';
import type { UnitSystem } from '../units/index.ts';

/** The governing value of one check over every case and combination (governing.ts). */
export interface GoverningRow {
  /**
   * A check code of `checks.results`; 'utilisation': the highest member utilisation
   * (`checks.members`); 'leastTension': the least tension of the no-slack members (envelope).
   */
  check: CheckCode | 'utilisation' | 'leastTension';
  /** Member, node, "base→top" or node-set label. */
  item: string;
  case: string;
  quantity: CheckQuantity;
  /** Value in SI (N, m, ratio, degrees by quantity) and its limit (same unit; null for yes/no checks or none). */
  value: number;
  limit: number | null;
  /** As the check defines it (> 1 fails), or null. */
  ratio: number | null;
  pass: boolean;
  source: string;
  /** The check result the row reads, for rows taken from `checks.results`. */
  result?: CheckResult;
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

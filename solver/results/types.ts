import type { Vec3 } from '../project/types.ts';
import type { BeamMemberEnds } from './structure-result-types.ts';
export type * from './structure-result-types.ts';

/** Why an analysis stopped. Only 'converged' results may be used for design. */
export type AnalysisStatus =
  | 'converged'
  | 'maxIterations'
  | 'singular'
  | 'diverged'
  | 'limitPoint'
  | 'cancelled';

export interface NodeResult {
  id: string;
  /** Deformed position, m. */
  position: Vec3;
  /** Displacement from the modelled position, m. */
  displacement: Vec3;
}

export interface MemberResult {
  id: string;
  /** Largest / smallest element axial force, N (positive = tension). */
  tensionMax: number;
  tensionMin: number;
  /** Axial force of the first / last element (start = at `from`), N. */
  tensionStart: number;
  tensionEnd: number;
  /** True where any element of the member is slack. */
  slack: boolean;
  /**
   * Largest vertical distance between the deformed member and the straight line through its
   * deformed end points, at the same horizontal position, m (0 for a vertical chord).
   */
  sag: number;
  /** Deformed chord length between the end nodes, m. */
  chordLength: number;
  /** Beams: end actions and the largest bending moment. */
  beam?: BeamMemberEnds;
}

export interface ReactionResult {
  node: string;
  /** Force the support (restraint or spring) exerts on the structure, N. */
  force: Vec3;
  /** Moment the support exerts on the structure, N·m (where rotations are restrained or sprung). */
  moment?: Vec3;
}

export interface CaseStats {
  dofs: number;
  iterations: number;
  seconds: number;
  loadSteps: number;
  /** Final relative residual ‖R‖ / ‖F_ref‖. */
  residual: number;
  /** Time in numeric factorisations of the tangent, s (included in `seconds`; always set by the solver). */
  factorSeconds?: number;
  /** Numeric factorisations (≤ iterations: a step deep in the quadratic regime reuses the last one). */
  factorizations?: number;
}

export interface CaseResult {
  id: string;
  converged: boolean;
  status: AnalysisStatus;
  /** Plain-language reason when not converged (names nodes and directions for a mechanism). */
  message?: string;
  /** Members slack in this case (ids). */
  slackMembers: string[];
  nodes: NodeResult[];
  members: MemberResult[];
  reactions: ReactionResult[];
  stats: CaseStats;
}

/** Raw per-node / per-element arrays for drawing and post-processing (not part of the JSON output). */
export interface CaseFields {
  /** Deformed positions of every node including interior ones (3 × nodeCount), m. */
  positions: Float64Array;
  /** Element axial force, N. */
  elementTension: Float64Array;
  /** 1 where the element is slack. */
  elementSlack: Uint8Array;
  /** Beam end actions, 12 per element (empty without beams; see elements/beam/beam-results.ts). */
  elementEndForces?: Float64Array;
}

export interface SolveReport {
  cases: CaseResult[];
  /** Where the time of the whole solve went (set by solveProject). */
  stats?: SolveTimes;
}

/** Wall time of one solveProject call, s. */
export interface SolveTimes {
  /** Model building plus the sparsity pattern, ordering and symbolic factorisation (once per topology). */
  analysisSeconds: number;
  /** Every case: Newton iterations and result extraction (the sum of the cases' stats.seconds). */
  newtonSeconds: number;
  /** All of the solve: analysis + Newton. */
  seconds: number;
}

/** Everything `solveProject` returns: the JSON-able report plus raw fields per case. */
export interface ProjectSolution {
  report: SolveReport;
  /** Same order as report.cases (load cases first, then combinations). */
  fields: CaseFields[];
}

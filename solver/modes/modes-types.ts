/**
 * Results of a modal analysis about a solved case: numbers and codes only (words and units are
 * chosen by the CLI and the app).
 */
import type { Vec3 } from '../project/types.ts';
import type { AnalysisStatus, CaseResult } from '../results/types.ts';

export interface ModeResult {
  /** Mode number, 1 = lowest. */
  number: number;
  /** Natural frequency f = ω / 2π, Hz. */
  frequency: number;
  /** Period 1 / f, s. */
  period: number;
  /** Circular frequency ω, rad/s. */
  angularFrequency: number;
  /** Effective modal mass per global direction x, y, z: (φᵀ M r)² with φᵀ M φ = 1, kg. */
  effectiveMass: Vec3;
  /** Effective modal mass as a share of the movable mass per direction (0..1). */
  effectiveMassShare: Vec3;
  /** Sum of the shares of this and every lower mode per direction (0..1). */
  cumulativeShare: Vec3;
  /** Relative residual of the eigenpair (convergence measure). */
  residual: number;
}

/** A DOF named by its node: a user node id, or member id and interior node number (1-based from `from`). */
export interface DofName {
  node?: string;
  member?: string;
  interior?: number;
  direction: 'x' | 'y' | 'z' | 'rx' | 'ry' | 'rz';
}

/** Facts about the modal model the reader must know. */
export type ModalNote =
  /** Slack members: their mass is lumped to their end nodes, they add no stiffness. */
  | { code: 'slackMembersMassOnly'; members: string[] }
  /** The structure has fewer DOFs with mass than modes were asked for. */
  | { code: 'fewerModesThanRequested'; requested: number; available: number }
  /** The eigen-solver stopped at its largest basis before every mode met the tolerance. */
  | { code: 'modesNotConverged'; worstResidual: number }
  /** The case has wind (a follower load): its load stiffness is not in the tangent, as in the static solve. */
  | { code: 'followerLoadStiffnessOmitted' };

/** Why no modes were computed. */
export type ModalRefusal =
  | { code: 'caseNotConverged'; case: string; status: AnalysisStatus }
  | { code: 'mechanism'; dof: DofName }
  | { code: 'notPositiveDefinite'; negativePivots: number }
  | { code: 'noMass' }
  | { code: 'unknownCase'; case: string };

export interface ModalAnalysis {
  /** Id of the load case or combination the modes are about. */
  case: string;
  modes: ModeResult[];
  /** Mass free to move per direction x, y, z (the reference of the shares), kg. */
  movableMass: Vec3;
  notes: ModalNote[];
  stats: { dofs: number; solves: number; basisSize: number; seconds: number };
}

/**
 * Mode shapes over the model's DOF map (dofs.count each: translations of node i at 3i..3i+2, then
 * rotations), mass-normalised (φᵀ M φ = 1), 0 at DOFs that do not take part.
 */
export interface ModalFields {
  shapes: Float64Array[];
}

export type ModalOutcome =
  | { ok: true; analysis: ModalAnalysis; fields: ModalFields }
  | { ok: false; refusal: ModalRefusal };

/** What `solveModes` returns: the static case it solved first, and the modes about it. */
export interface ModesOfCase {
  caseResult: CaseResult | null;
  modal: ModalOutcome;
}

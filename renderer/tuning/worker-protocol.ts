/**
 * Messages between the renderer and the tuning worker (tuning-worker.ts). Everything is plain,
 * structured-cloneable data: projects are ProjectFile JSON, forces N.
 */
import type { CaseResult, ProjectFile, TuningResult } from '../../solver/index.ts';

export type WorkerRequest =
  /** Build a live resolver (createLiveResolver) for one case and one group; `key` names it. */
  | { type: 'live-init'; key: string; project: ProjectFile; caseId: string; group: string }
  /** Re-solve the resolver `key` with the group at `pretension` N. */
  | { type: 'live-step'; key: string; seq: number; pretension: number }
  /** Run tuneProject on the project (warm session). */
  | { type: 'tune'; project: ProjectFile };

export type WorkerReply =
  | { type: 'live-step'; key: string; seq: number; pretension: number; result: CaseResult; seconds: number; warm: boolean }
  | { type: 'tune-iteration'; iteration: number; x: number[]; cost: number }
  | { type: 'tune-done'; result: TuningResult }
  /** A request failed; `seq` for live steps, -1 otherwise. */
  | { type: 'error'; request: WorkerRequest['type']; seq: number; message: string };

/**
 * Messages between the renderer and the tuning worker (tuning-worker.ts). Everything is plain,
 * structured-cloneable data: projects are ProjectFile JSON, forces N.
 */
import type { CaseResult, ProjectFile, SolveReport, TuningResult } from '../../solver/index.ts';
import type { CheckOutcome } from '../../main/common/checks/check-outcome.ts';

export type WorkerRequest =
  /** Build a live resolver (createLiveResolver) for one case and one group; `key` names it. */
  | { type: 'live-init'; key: string; project: ProjectFile; caseId: string; group: string }
  /** The analysed report the live steps are checked against (live-checks.ts); null: do not check. Kept until the next one. */
  | { type: 'live-report'; report: SolveReport | null }
  /** Re-solve the resolver `key` with the group at `pretension` N (and check, with a live report). */
  | { type: 'live-step'; key: string; seq: number; pretension: number }
  /** Run tuneProject on the project (warm session). */
  | { type: 'tune'; project: ProjectFile };

export type WorkerReply =
  /** `seconds`: the re-solve; `checks`: the design checks of the live report with this case (when there is one). */
  | { type: 'live-step'; key: string; seq: number; pretension: number; result: CaseResult; seconds: number; warm: boolean; checks?: CheckOutcome }
  | { type: 'tune-iteration'; iteration: number; x: number[]; cost: number }
  | { type: 'tune-done'; result: TuningResult }
  /** A request failed; `seq` for live steps, -1 otherwise. */
  | { type: 'error'; request: WorkerRequest['type']; seq: number; message: string };

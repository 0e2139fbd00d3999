/** Progress of a running analysis, reported between Newton iterations. */
export interface SolveProgress {
  caseIndex: number;
  caseCount: number;
  caseId: string;
  iteration: number;
  loadFactor: number;
  /** Relative residual after the iteration. */
  residual: number;
}

export interface SolveControl {
  onProgress?: (p: SolveProgress) => void;
  /** Checked between iterations; return true to stop (outcome 'cancelled'). */
  isCancelled?: () => boolean;
}

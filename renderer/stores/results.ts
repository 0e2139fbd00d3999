/**
 * The last analysis: its state, progress, the SolveReport and the case shown. Large data is kept
 * raw (markRaw/shallowRef) so Vue does not make 20,000 member results reactive.
 *
 * States: idle → running (with progress) → done | failed | cancelled. Results go stale (still shown,
 * marked) when the project changes after the run started.
 */
import { defineStore } from 'pinia';
import { computed, markRaw, ref, shallowRef } from 'vue';
import type { CaseFields, CaseResult, MemberResult, NodeResult, ProjectFile, SolveReport } from '../../solver/index.ts';
import type { AnalysisDone, AnalysisProgress } from '../../main/common/host-contract.ts';
import type { CheckOutcome } from '../../main/common/checks/check-outcome.ts';
import { withLiveCase } from '../tuning/live-checks.ts';

export type AnalysisState = 'idle' | 'running' | 'done' | 'failed' | 'cancelled';

export interface CaseIndex {
  members: Map<string, MemberResult>;
  nodes: Map<string, NodeResult>;
}

export interface LiveOverride {
  caseId: string;
  group: string;
  /** N */
  pretension: number;
  result: CaseResult;
  /**
   * The design checks the tuning worker ran with this step (check-outcome.ts): the report
   * `checksReport` with this case replaced by `result`, checked under `checksProject` with the
   * group's pretension committed. Absent when the worker did not check.
   */
  checks?: CheckOutcome;
  checksProject?: ProjectFile;
  checksReport?: SolveReport;
}

/**
 * The parts of the project the analysis reads: an edit of any of them makes the results stale.
 * Check settings (`checks`, `designBasis`), tuning set-up, site data and display are not among them.
 */
export const ANALYSIS_INPUTS = [
  'nodes', 'members', 'sections', 'loadCases', 'combinations', 'groups', 'panels', 'ancillaries', 'patchWind',
  'memberLoss', 'windDirections', 'iceWithWind', 'unbalancedIce',
] as const satisfies readonly (keyof ProjectFile)[];

export const useResultsStore = defineStore('results', () => {
  const state = ref<AnalysisState>('idle');
  const runId = ref<string | null>(null);
  const progress = shallowRef<AnalysisProgress | null>(null);
  const report = shallowRef<SolveReport | null>(null);
  /** Raw per-case fields when the host provides them (same order as report.cases), else null. */
  const fields = shallowRef<CaseFields[] | null>(null);
  const error = ref<string | null>(null);
  const caseId = ref<string | null>(null);
  /** Project revision the shown results belong to. */
  const resultRevision = ref<number | null>(null);
  const runRevision = ref<number | null>(null);
  /** The project the shown results were computed from (and the one of the running analysis). */
  const resultProject = shallowRef<ProjectFile | null>(null);
  /** The design checks the analysis worker ran on `report` under `resultProject` (null when it sent none). */
  const analysedChecks = shallowRef<CheckOutcome | null>(null);
  let runProject: ProjectFile | null = null;
  /**
   * A live re-solve of one case (tuning slider) shown in place of that case of the report while
   * the slider moves; cleared by the next analysis. `pretension` N of `group`.
   */
  const live = shallowRef<LiveOverride | null>(null);

  const caseIds = computed(() => report.value?.cases.map((c) => c.id) ?? []);
  const currentCase = computed<CaseResult | null>(() => {
    const l = live.value;
    if (l && l.caseId === caseId.value && report.value) return l.result;
    return report.value?.cases.find((c) => c.id === caseId.value) ?? null;
  });
  /** The report with the live case (if any) in place of its analysed result: what checks read. */
  const effectiveReport = computed<SolveReport | null>(() => {
    const r = report.value;
    const l = live.value;
    if (!r || !l) return r;
    return markRaw(withLiveCase(r, l.caseId, l.result));
  });
  const currentFields = computed<CaseFields | null>(() => {
    const r = report.value;
    if (!r || !fields.value || (live.value && live.value.caseId === caseId.value)) return null;
    const i = r.cases.findIndex((c) => c.id === caseId.value);
    return i >= 0 ? fields.value[i] ?? null : null;
  });
  /** Lookup tables for the current case, built once per case. */
  const currentIndex = computed<CaseIndex | null>(() => {
    const c = currentCase.value;
    if (!c) return null;
    return markRaw({
      members: new Map(c.members.map((m) => [m.id, m])),
      nodes: new Map(c.nodes.map((n) => [n.id, n])),
    });
  });
  const progressText = computed(() => {
    const p = progress.value;
    if (state.value !== 'running') return '';
    if (!p) return 'Starting…';
    return `Case ${p.caseIndex + 1} of ${p.caseCount} (${p.caseId}), iteration ${p.iteration}, load ${Math.round(p.loadFactor * 100)} %`;
  });

  function isStale(projectRevision: number): boolean {
    return resultRevision.value !== null && resultRevision.value !== projectRevision;
  }

  /**
   * True when `project` differs from the analysed one in anything the analysis reads
   * (ANALYSIS_INPUTS). Edits are immutable and share unchanged parts, so this compares references.
   */
  function isStaleFor(project: ProjectFile | null): boolean {
    const a = resultProject.value;
    if (!a || !project || !report.value) return false;
    return ANALYSIS_INPUTS.some((k) => a[k] !== project[k]);
  }

  /** The run was requested; its id follows in assignRunId (events may arrive before it). */
  function started(projectRevision: number, project: ProjectFile | null = null): void {
    runProject = project;
    state.value = 'running';
    runId.value = null;
    progress.value = null;
    error.value = null;
    runRevision.value = projectRevision;
  }

  /** Progress events of other runs are ignored. */
  function onProgress(p: AnalysisProgress): void {
    if (state.value === 'running' && (runId.value === null || p.runId === runId.value)) progress.value = markRaw(p);
  }

  /** Attach raw fields fetched after `forReport` arrived; ignored when newer results replaced it. */
  function attachFields(forReport: SolveReport, caseFields: CaseFields[]): void {
    if (report.value !== forReport || caseFields.length !== forReport.cases.length) return;
    fields.value = markRaw(caseFields);
  }

  function onFinished(done: AnalysisDone, doneFields: CaseFields[] | null = null): void {
    if (runId.value !== null && done.runId !== runId.value) return;
    state.value = done.status;
    progress.value = null;
    runId.value = null;
    if (done.status === 'done' && done.report) {
      live.value = null;
      report.value = markRaw(done.report);
      analysedChecks.value = done.checks ? markRaw(done.checks) : null;
      fields.value = doneFields ? markRaw(doneFields) : null;
      resultRevision.value = runRevision.value;
      resultProject.value = runProject;
      if (!caseId.value || !done.report.cases.some((c) => c.id === caseId.value)) caseId.value = done.report.cases[0]?.id ?? null;
    } else if (done.status === 'failed') {
      error.value = done.error ?? 'the analysis failed without a message';
    }
  }

  function assignRunId(id: string): void {
    if (state.value === 'running') runId.value = id;
  }

  function failedToStart(message: string): void {
    state.value = 'failed';
    runId.value = null;
    error.value = message;
  }

  function selectCase(id: string): void {
    if (caseIds.value.includes(id)) caseId.value = id;
  }

  /** Show a live re-solve of `caseId` (ignored without a report that has that case). */
  function setLive(next: LiveOverride): void {
    if (report.value?.cases.some((c) => c.id === next.caseId)) live.value = markRaw(next);
  }

  function clearLive(): void {
    live.value = null;
  }

  function clear(): void {
    live.value = null;
    state.value = 'idle';
    runId.value = null;
    progress.value = null;
    report.value = null;
    analysedChecks.value = null;
    fields.value = null;
    error.value = null;
    caseId.value = null;
    resultRevision.value = null;
    resultProject.value = null;
  }

  return {
    state, runId, progress, report, analysedChecks, resultProject, fields, attachFields, live, effectiveReport, setLive, clearLive, error, caseId, resultRevision, caseIds, currentCase, currentFields,
    currentIndex, progressText, isStale, isStaleFor, started, assignRunId, onProgress, onFinished, failedToStart, selectCase, clear,
  };
});

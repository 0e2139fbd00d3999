/**
 * Design checks and the envelope of the shown results. What is checked (check-outcome.ts): the
 * analysed model under the current check settings; with a live tuning case shown, the report with
 * that case in place under the project with the slider's pretension.
 *
 * Where they run: the analysis worker sends the checks with the solve and the tuning worker with
 * each live slider step, so a run or a slider step does not run them on this thread. They run
 * here only when the check settings (`checks`, `designBasis`) were edited since (no re-solve
 * needed; once per settings edit, cached by its inputs), or when a result came without checks.
 * Each run here leaves a performance mark CHECKS_MARK (counted by tests). Check settings that
 * name missing groups or nodes give a message instead of a report.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { defineStore, storeToRefs } from 'pinia';
import { computed, markRaw } from 'vue';
import type { CheckReport, Envelope, ItemStatus, ProjectFile, SolveReport } from '../../solver/index.ts';
import { envelopeOf } from '../../solver/index.ts';
import { checkOutcome, sameCheckSettings, withCheckSettings, type CheckOutcome } from '../../main/common/checks/check-outcome.ts';
import { useProjectStore } from './project.ts';
import { ANALYSIS_INPUTS, useResultsStore } from './results.ts';

export type { CheckOutcome };

/** Name of the performance mark left by each run of the checks on the UI thread. */
export const CHECKS_MARK = 'stayset:checks-on-ui-thread';

/** Per-item check status for the 3D view (ids → status). */
export interface CheckStatusMaps {
  members: ReadonlyMap<string, ItemStatus>;
  nodes: ReadonlyMap<string, ItemStatus>;
}

const NONE: CheckOutcome = { report: null, error: null };

export const useChecksStore = defineStore('checks', () => {
  const { project } = storeToRefs(useProjectStore());
  const { effectiveReport, report: analysed, live, resultProject, analysedChecks } = storeToRefs(useResultsStore());

  /**
   * The project the shown results and checks are about: the analysed model under the current
   * check settings (the current project before any run). The same object while neither changes,
   * so what is built from it (the results table's rows) is not built again on a model edit.
   */
  let modelCache: ProjectFile | null = null;
  const checkedModel = computed<ProjectFile | null>(() => {
    const p = project.value;
    if (!p) return null;
    const next = withCheckSettings(resultProject.value ?? p, p);
    if (modelCache && next !== modelCache && ANALYSIS_INPUTS.every((k) => modelCache![k] === next[k]) && sameCheckSettings(modelCache, next)) return modelCache;
    modelCache = next;
    return next;
  });

  /** The checks last run here, with what they were run on (model, its check settings, report). */
  let cached: { model: ProjectFile; settings: ProjectFile; report: SolveReport; outcome: CheckOutcome } | null = null;
  function runHere(model: ProjectFile, settings: ProjectFile, report: SolveReport): CheckOutcome {
    if (cached && cached.model === model && cached.report === report && sameCheckSettings(cached.settings, settings)) return cached.outcome;
    performance.mark(CHECKS_MARK);
    const outcome = checkOutcome(withCheckSettings(model, settings), report);
    if (outcome.report) markRaw(outcome.report);
    cached = { model, settings, report, outcome: markRaw(outcome) };
    return cached.outcome;
  }

  const outcome = computed<CheckOutcome>(() => {
    const p = project.value;
    const r = effectiveReport.value;
    if (!p || !r) return NONE;
    const l = live.value;
    if (l) {
      if (l.checks && l.checksProject && l.checksReport === analysed.value && sameCheckSettings(l.checksProject, p)) return l.checks;
      return runHere(p, p, r);
    }
    const model = resultProject.value ?? p;
    const given = analysedChecks.value;
    if (given && resultProject.value && sameCheckSettings(model, p)) return given;
    return runHere(model, p, r);
  });
  const report = computed<CheckReport | null>(() => outcome.value.report);
  const error = computed(() => outcome.value.error);
  const envelope = computed<Envelope | null>(() => (effectiveReport.value ? markRaw(envelopeOf(effectiveReport.value)) : null));
  const statusMaps = computed<CheckStatusMaps | null>(() => {
    const c = report.value;
    if (!c) return null;
    return markRaw({
      members: new Map(c.members.map((m) => [m.id, m.status])),
      nodes: new Map(c.nodes.map((n) => [n.id, n.status])),
    });
  });
  /** 'PASS', 'FAIL', 'INCOMPLETE' (a case did not converge) or null when not checked. */
  const verdict = computed<'PASS' | 'FAIL' | 'INCOMPLETE' | null>(() => {
    const c = report.value;
    if (!c) return null;
    if (!c.allConverged) return 'INCOMPLETE';
    return c.pass ? 'PASS' : 'FAIL';
  });

  return { report, error, envelope, statusMaps, verdict, checkedModel };
});

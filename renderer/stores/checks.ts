/**
 * Design checks and the envelope of the shown results: `runChecks(project, report)` and
 * `envelopeOf(report)` (solver/checks) recomputed whenever the project (its check settings) or
 * the results change, including a live tuning re-solve. Check settings that name missing groups
 * or nodes give a message instead of a report.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { defineStore, storeToRefs } from 'pinia';
import { computed, markRaw } from 'vue';
import type { CheckReport, Envelope, ItemStatus } from '../../solver/index.ts';
import { envelopeOf, runChecks } from '../../solver/index.ts';
import { useProjectStore } from './project.ts';
import { useResultsStore } from './results.ts';

export interface CheckOutcome {
  report: CheckReport | null;
  /** Why there is no report although there are results (bad check settings). */
  error: string | null;
}

/** Per-item check status for the 3D view (ids → status). */
export interface CheckStatusMaps {
  members: ReadonlyMap<string, ItemStatus>;
  nodes: ReadonlyMap<string, ItemStatus>;
}

export const useChecksStore = defineStore('checks', () => {
  const { project } = storeToRefs(useProjectStore());
  const { effectiveReport } = storeToRefs(useResultsStore());

  const outcome = computed<CheckOutcome>(() => {
    const p = project.value;
    const r = effectiveReport.value;
    if (!p || !r) return { report: null, error: null };
    try {
      return { report: markRaw(runChecks(p, r)), error: null };
    } catch (e) {
      return { report: null, error: (e as Error).message };
    }
  });
  const report = computed(() => outcome.value.report);
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

  return { report, error, envelope, statusMaps, verdict };
});

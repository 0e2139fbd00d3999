/**
 * Pretension tuning state: the group and case behind the live slider, the last live step, and
 * the last tuning run (targets, diagnosis). The slider's re-solves and tuning runs happen in a
 * module worker (renderer/tuning); results of a live step are shown through the results store
 * (setLive), so the 3D colours, the member table and the checks follow the slider; the worker runs
 * the design checks with each step (the main thread does not).
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import { defineStore, storeToRefs } from 'pinia';
import { computed, markRaw, ref, shallowRef, watch } from 'vue';
import type { ProjectFile, TargetOutcome, TuningResult } from '../../solver/index.ts';
import { membersOfGroup, referenceCaseId } from '../../solver/index.ts';
import { useProjectStore } from './project.ts';
import { useResultsStore, type LiveOverride } from './results.ts';
import { useSettingsStore } from './settings.ts';
import { targetText, tuningDiagnosisText, tuningSummaryText } from '../../main/common/tuning/tuning-text.ts';
import { LiveChannel, runTuning, type LiveStepOutcome, type TuningRun } from '../tuning/tuning-client.ts';
import { applyTuningResult, applyVariableValues, commitPretension, sliderGroups, type SliderGroup } from '../tuning/tuning-edits.ts';

/** What TuningPanel shows of the last live re-solve (N, m, s). */
export interface LiveSummary {
  converged: boolean;
  seconds: number;
  message?: string;
  tensionMax?: number;
  sag?: number;
}

export function summariseStep(project: ProjectFile, step: LiveStepOutcome): LiveSummary {
  if (!step.result) return { converged: false, seconds: step.seconds, message: step.error ?? 'no result' };
  const r = step.result;
  if (!r.converged) return { converged: false, seconds: step.seconds, message: r.message ?? r.status };
  const ids = membersOfGroup(project, step.group);
  let tensionMax = -Infinity;
  let sag = 0;
  for (const m of r.members) {
    if (!ids.has(m.id)) continue;
    tensionMax = Math.max(tensionMax, m.tensionMax);
    sag = Math.max(sag, m.sag);
  }
  return { converged: true, seconds: step.seconds, tensionMax: Number.isFinite(tensionMax) ? tensionMax : undefined, sag };
}

/** What a live step puts in place of its case in the results store (with the worker's checks), or null without a result. */
export function liveOverrideOf(step: LiveStepOutcome): LiveOverride | null {
  if (!step.result) return null;
  const checked = step.checks ? { checks: step.checks, checksProject: step.checksProject, checksReport: step.checksReport } : {};
  return { caseId: step.caseId, group: step.group, pretension: step.pretension, result: step.result, ...checked };
}

export const useTuningStore = defineStore('tuning', () => {
  const projectStore = useProjectStore();
  const { project, revision } = storeToRefs(projectStore);
  const { units } = storeToRefs(useSettingsStore());
  const results = useResultsStore();

  const selectedGroup = ref('');
  const chosenCase = ref('');
  const lastStep = shallowRef<LiveSummary | null>(null);
  /** Pretension (N) the slider shows while dragging, by group. */
  const dragValue = ref<{ group: string; value: number } | null>(null);
  const busy = ref(false);
  const progress = ref('');
  const lastResult = shallowRef<TuningResult | null>(null);
  const cancelledBest = shallowRef<{ iterations: number; x: number[] } | null>(null);
  const message = ref<{ kind: 'info' | 'error'; text: string } | null>(null);
  let run: TuningRun | null = null;
  let channel: LiveChannel | null = null;
  /** The live result stays shown after the commit that wrote its pretension; any other edit, undo or redo clears it. */
  let keepLiveFor: ProjectFile | null = null;
  watch(project, (p) => {
    if (p !== keepLiveFor) results.clearLive();
    keepLiveFor = null;
  });

  const caseIds = computed(() => (project.value ? [...project.value.loadCases.map((c) => c.id), ...(project.value.combinations ?? []).map((c) => c.id)] : []));
  const caseId = computed(() => {
    if (chosenCase.value && caseIds.value.includes(chosenCase.value)) return chosenCase.value;
    try {
      return project.value ? referenceCaseId(project.value) : '';
    } catch {
      return '';
    }
  });
  const setup = computed<{ groups: SliderGroup[]; error: string | null }>(() => {
    if (!project.value) return { groups: [], error: null };
    try {
      return { groups: sliderGroups(project.value), error: null };
    } catch (e) {
      return { groups: [], error: (e as Error).message };
    }
  });
  // Slider bounds stay as first resolved while the variables are unchanged: the default bounds
  // follow the current pretension (resolveVariables), and the slider must not jump on release.
  let boundsOf: unknown = null;
  const bounds = new Map<string, { min: number; max: number }>();
  const groups = computed<SliderGroup[]>(() => {
    const vars = project.value?.tuning?.variables;
    if (vars !== boundsOf) {
      bounds.clear();
      boundsOf = vars;
    }
    return setup.value.groups.map((g) => {
      let b = bounds.get(g.id);
      if (!b) bounds.set(g.id, (b = { min: g.min, max: g.max }));
      const value = dragValue.value?.group === g.id ? dragValue.value.value : g.value;
      return { ...g, min: b.min, max: b.max, value: Math.min(b.max, Math.max(b.min, value)) };
    });
  });
  /** The last run's targets with their words in the display units. */
  const targets = computed<(TargetOutcome & { label: string })[]>(() => {
    const r = lastResult.value;
    return r ? r.targets.map((t) => ({ ...t, label: targetText(project.value ?? r.project, t.target, units.value) })) : [];
  });
  const diagnosis = computed<string[]>(() => {
    const r = lastResult.value;
    if (cancelledBest.value) return [`Cancelled after ${cancelledBest.value.iterations} iteration(s): the best values so far can be applied.`];
    if (!r) return [];
    const p = project.value ?? r.project;
    return [tuningSummaryText(r, p, units.value), ...tuningDiagnosisText(r, p, units.value)];
  });

  function onStep(step: LiveStepOutcome): void {
    const p = project.value;
    if (!p) return;
    lastStep.value = markRaw(summariseStep(p, step));
    const live = liveOverrideOf(step);
    if (live) results.setLive(live);
  }

  function drag(group: string, pretension: number): void {
    const p = project.value;
    if (!p || !caseId.value) return;
    dragValue.value = { group, value: pretension };
    if (results.caseIds.includes(caseId.value) && results.caseId !== caseId.value) results.selectCase(caseId.value);
    channel ??= new LiveChannel(onStep);
    channel.drag(p, revision.value, caseId.value, group, pretension, results.report);
  }

  function edit(label: string, produce: (p: ProjectFile) => ProjectFile): boolean {
    const r = projectStore.edit(label, produce);
    message.value = r.ok ? null : { kind: 'error', text: r.errors.join(' · ') };
    return r.ok;
  }

  /** Slider released: one undoable edit writing the pretension into every member of the group. */
  function commit(group: string, pretension: number): void {
    dragValue.value = null;
    let made: ProjectFile | null = null;
    const ok = edit(`Pretension of ${group}`, (p) => (made = commitPretension(p, group, pretension)));
    keepLiveFor = made;
    if (ok) {
      message.value = { kind: 'info', text: `Pretension of ${group} set; run the analysis to update every case.` };
    }
  }

  async function tune(): Promise<void> {
    const p = project.value;
    if (!p || busy.value) return;
    busy.value = true;
    progress.value = 'Starting…';
    message.value = null;
    cancelledBest.value = null;
    run = runTuning(p, (it, _x, cost) => { progress.value = `iteration ${it}, cost ${cost.toPrecision(3)}`; });
    const out = await run.promise;
    run = null;
    busy.value = false;
    progress.value = '';
    if (out.kind === 'done') {
      lastResult.value = markRaw(out.result);
      message.value = { kind: out.result.status === 'met' ? 'info' : 'error', text: tuningSummaryText(out.result, p, units.value) };
    } else if (out.kind === 'cancelled') {
      cancelledBest.value = out.x ? { iterations: out.iterations, x: out.x } : null;
      message.value = { kind: 'info', text: out.x ? 'Tuning cancelled.' : 'Tuning cancelled before the first iteration finished: nothing to apply.' };
    } else {
      message.value = { kind: 'error', text: `Tuning failed: ${out.message}` };
    }
  }

  function cancelTuning(): void {
    run?.cancel();
  }

  /** Apply the last run's values (or the best so far of a cancelled run): one undoable edit. */
  function applyResult(): void {
    const best = cancelledBest.value;
    const r = lastResult.value;
    if (best) {
      if (edit('Tuned pretensions (best so far)', (p) => applyVariableValues(p, best.x))) cancelledBest.value = null;
    } else if (r && edit('Tuned pretensions', (p) => applyTuningResult(p, r, new Date().toISOString(), units.value))) {
      message.value = { kind: 'info', text: 'Tuned pretensions written; run the analysis to update every case.' };
    }
  }

  function dispose(): void {
    channel?.dispose();
    channel = null;
    run?.cancel();
  }

  return {
    selectedGroup, chosenCase, caseId, caseIds, groups, setup, lastStep, busy, progress, lastResult, cancelledBest, targets, diagnosis, message,
    drag, commit, tune, cancelTuning, applyResult, dispose,
  };
});

/**
 * Words for the pretension tuner's structured results (solver/tuning): target descriptions,
 * reached values, the notes on unmet targets and the one-line summary, in the display units of
 * main/common/units. Shared by `stayset tune`, the app's tuning panel and the schedule.
 */
import type { ProjectFile, TargetOutcome, TuningNote, TuningResult, TuningTarget } from '../../../solver/index.ts';
import { fixedText, formatWithUnit, messageQuantityText, type UnitSystem } from '../units/index.ts';

const groupLabel = (project: ProjectFile, group: string): string => project.groups?.find((g) => g.id === group)?.label ?? group;

/**
 * "sag ≤ 600 mm in 'dead' for 'guys level 1'", in the display units. Sag limits are the sag kind and
 * plumb tolerances the displacement kind (both mm / in), as the checks' sag and displacement limits.
 */
export function targetText(project: ProjectFile, t: TuningTarget, units: UnitSystem): string {
  switch (t.kind) {
    case 'sag': {
      const lim = 'absolute' in t.limit ? formatWithUnit(t.limit.absolute, 'sag', units) : `span/${fixedText(1 / t.limit.fractionOfSpan, 0)}`;
      return `sag ≤ ${lim} in '${t.case}' for '${groupLabel(project, t.group)}'`;
    }
    case 'tensionShare':
      return `tension share ${formatWithUnit(t.share, 'share', units)} of breaking load at installation for '${groupLabel(project, t.group)}'`;
    case 'noSlack':
      return `no slack in '${t.case}' for '${groupLabel(project, t.group)}'`;
    case 'plumb':
      return `mast top '${t.top}' plumb over '${t.base}' within ${formatWithUnit(t.tolerance, 'displacement', units)} in '${t.case}'`;
    case 'reaction':
      return `reaction at '${t.node}' ≤ ${formatWithUnit(t.limit, 'force', units)} in '${t.case}'`;
  }
}

/** The display kind of a target's value and limit: a share, a sag, a plumb offset (displacement) or a force. */
export function targetValueKind(targetKind: TuningTarget['kind'] | string, unit: TargetOutcome['unit']): 'share' | 'sag' | 'displacement' | 'force' {
  if (unit === 'share') return 'share';
  if (unit === 'm') return targetKind === 'sag' ? 'sag' : 'displacement';
  return 'force';
}

/** A target's value (or limit) with its unit: a share, a sag or plumb offset (mm / in) or a force. */
export function targetValueText(o: Pick<TargetOutcome, 'unit' | 'target'>, v: number, units: UnitSystem): string {
  return formatWithUnit(v, targetValueKind(o.target.kind, o.unit), units);
}

/** The same target words for every target of a result (index order). */
export function targetTexts(project: ProjectFile, r: Pick<TuningResult, 'targets'>, units: UnitSystem): string[] {
  return r.targets.map((o) => targetText(project, o.target, units));
}

const noun = (project: ProjectFile, by: string, group: string) => `the ${by === 'pretension' ? 'pretension' : 'unstressed length'} of '${groupLabel(project, group)}'`;
const moveWord = (by: string, direction: string) => (by === 'pretension' ? (direction === 'up' ? 'higher' : 'lower') : direction === 'up' ? 'longer' : 'shorter');
const ref = (n: TuningNote, k: string): string => String(n.refs[k] ?? '');

/** One note as a sentence, quantities in the display units. */
export function tuningNoteText(n: TuningNote, project: ProjectFile, r: Pick<TuningResult, 'targets'>, units: UnitSystem): string {
  const target = (k: string) => {
    const o = r.targets[Number(n.refs[k])];
    return o ? targetText(project, o.target, units) : `target ${Number(n.refs[k]) + 1}`;
  };
  const bound = () => {
    const q = n.quantities.bound;
    return q.kind === 'ratio' ? `factor ${fixedText(q.value, 4)}` : messageQuantityText(q, units);
  };
  switch (n.code) {
    case 'startUnsolved':
      return `The starting state could not be solved: case '${ref(n, 'case')}' did not converge (${ref(n, 'status')}).`;
    case 'noInfluence':
      return `${target('target')} cannot be met: no tuning variable changes it (${(n.refs.groups as string[]).map((g) => `'${groupLabel(project, g)}'`).join(', ')}); add a variable for a group that acts on it.`;
    case 'atBound':
      return `${target('target')} needs ${noun(project, ref(n, 'by'), ref(n, 'group'))} ${ref(n, 'bound') === 'upper' ? 'above its upper' : 'below its lower'} bound ${bound()}.`;
    case 'conflict':
      return `${target('target')} needs ${noun(project, ref(n, 'by'), ref(n, 'group'))} ${moveWord(ref(n, 'by'), ref(n, 'direction'))}, which ${target('other')} does not allow: the two targets conflict.`;
    case 'iterationLimit':
      return `${target('target')} was not met within the iteration limit (gap ${messageQuantityText(n.quantities.gap, units)} of the limit); try other start values or more variables.`;
    case 'trialUnsolved':
      return `A trial step could not be solved (case '${ref(n, 'case')}' did not converge: ${ref(n, 'status')}); the tuner stopped at the last state that solved.`;
    case 'cancelled':
      return 'The tuning run was cancelled; the values shown are the best reached so far.';
  }
}

/** Every note of a result as sentences. */
export function tuningDiagnosisText(r: Pick<TuningResult, 'targets' | 'diagnosis'>, project: ProjectFile, units: UnitSystem): string[] {
  return r.diagnosis.map((n) => tuningNoteText(n, project, r, units));
}

/** "1 of 2 targets met after 5 iterations (12 solves); not met: sag ≤ …" (also stored as tuning.lastRun.summary). */
export function tuningSummaryText(r: TuningResult, project: ProjectFile, units: UnitSystem): string {
  if (r.status === 'notConverged' && r.targets.length === 0) {
    const start = r.diagnosis.find((n) => n.code === 'startUnsolved');
    return start ? `tuning stopped: case '${ref(start, 'case')}' did not converge (${ref(start, 'status')})` : r.summary;
  }
  const met = r.targets.filter((t) => t.met).length;
  const unmet = r.targets.filter((t) => !t.met).map((t) => targetText(project, t.target, units));
  return `${r.cancelled ? 'cancelled: ' : ''}${met} of ${r.targets.length} targets met after ${r.iterations} iterations (${r.evaluations} solves)`
    + (unmet.length ? `; not met: ${unmet.join('; ')}` : '');
}

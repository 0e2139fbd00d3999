/**
 * Tuning set-up and results as project edits (pure; each returns a new project): the slider
 * groups of TuningPanel, writing one group's pretension (applyVariables), adding and removing
 * tuning variables and targets, and applying a tuning run's final values to the current project.
 */
import type { ProjectFile, TuningResult, TuningSpec, TuningTarget } from '../../solver/index.ts';
import { applyVariables, resolveVariables } from '../../solver/index.ts';
import { tuningRunRecord } from '../../main/common/tuning/tuning-record.ts';
import type { UnitSystem } from '../../main/common/units/index.ts';

export interface SliderGroup {
  id: string;
  label: string;
  /** N */
  value: number;
  min: number;
  max: number;
}

/** One slider per `by: 'pretension'` variable, bounds from resolveVariables. Throws naming the bad entry. */
export function sliderGroups(project: ProjectFile): SliderGroup[] {
  if (!project.tuning?.variables.length) return [];
  const labels = new Map((project.groups ?? []).map((g) => [g.id, g.label ?? g.id]));
  return resolveVariables(project)
    .filter((v) => v.by === 'pretension')
    .map((v) => ({ id: v.group, label: labels.get(v.group) ?? v.group, value: v.initial, min: v.lower, max: v.upper }));
}

/** Write `pretension` N into every member of `group` (the variable must exist and be by pretension). */
export function commitPretension(project: ProjectFile, group: string, pretension: number): ProjectFile {
  if (!(pretension > 0) || !Number.isFinite(pretension)) throw new Error(`tuning: pretension of "${group}" must be a positive force, got ${pretension} N`);
  const v = resolveVariables(project).find((x) => x.group === group && x.by === 'pretension');
  if (!v) throw new Error(`tuning: group "${group}" is not a pretension variable`);
  return applyVariables(project, [v], [pretension]);
}

/**
 * Put a tuning run's final values (matched by group) into `project`, which may have changed
 * since, and keep the run as `tuning.lastRun` (tuningRunRecord, dated `date`, ISO 8601) so the
 * schedule and the report print it; the record's words are in `units` (default: the project's display units).
 */
export function applyTuningResult(project: ProjectFile, result: TuningResult, date: string, units: UnitSystem = project.display?.units === 'US' ? 'US' : 'SI'): ProjectFile {
  const finals = new Map(result.variables.map((v) => [`${v.group}\u0000${v.by}`, v.final]));
  const vars = resolveVariables(project).filter((v) => finals.has(`${v.group}\u0000${v.by}`));
  if (!vars.length) throw new Error('tuning: none of the tuned groups is a tuning variable of the project any more');
  const tuned = applyVariables(project, vars, vars.map((v) => finals.get(`${v.group}\u0000${v.by}`)!));
  return { ...tuned, tuning: { ...(tuned.tuning ?? { variables: [], targets: [] }), lastRun: tuningRunRecord(result, project, units, date) } };
}

/** Values in the order of project.tuning.variables (a cancelled run's best x) → project. */
export function applyVariableValues(project: ProjectFile, x: readonly number[]): ProjectFile {
  const vars = resolveVariables(project);
  if (x.length !== vars.length) throw new Error(`tuning: ${x.length} values for ${vars.length} variables (the set-up changed during the run)`);
  return applyVariables(project, vars, x);
}

function withTuning(project: ProjectFile, spec: TuningSpec): ProjectFile {
  return { ...project, tuning: spec };
}

const emptySpec = (project: ProjectFile): TuningSpec => project.tuning ?? { variables: [], targets: [] };

export function addVariable(project: ProjectFile, group: string, by: 'pretension' | 'unstressedLength' = 'pretension'): ProjectFile {
  const spec = emptySpec(project);
  if (spec.variables.some((v) => v.group === group)) throw new Error(`tuning: group "${group}" is already a variable`);
  return withTuning(project, { ...spec, variables: [...spec.variables, { group, by }] });
}

export function removeVariable(project: ProjectFile, index: number): ProjectFile {
  const spec = emptySpec(project);
  return withTuning(project, { ...spec, variables: spec.variables.filter((_, i) => i !== index) });
}

export function addTarget(project: ProjectFile, target: TuningTarget): ProjectFile {
  const spec = emptySpec(project);
  return withTuning(project, { ...spec, targets: [...spec.targets, target] });
}

export function removeTarget(project: ProjectFile, index: number): ProjectFile {
  const spec = emptySpec(project);
  return withTuning(project, { ...spec, targets: spec.targets.filter((_, i) => i !== index) });
}

/**
 * Set or clear (undefined) the bounds of tuning variable `index`: N for a pretension variable, a
 * factor on the unstressed lengths for a length variable. Throws naming the entry when a bound
 * is not positive or min ≥ max.
 */
export function setVariableBounds(project: ProjectFile, index: number, min: number | undefined, max: number | undefined): ProjectFile {
  const spec = emptySpec(project);
  const v = spec.variables[index];
  if (!v) throw new RangeError(`tuning.variables[${index}] does not exist`);
  for (const [name, b] of [['min', min], ['max', max]] as const) {
    if (b !== undefined && !(b > 0 && Number.isFinite(b))) throw new Error(`tuning.variables[${index}] "${v.group}": ${name} ${b} must be a positive number`);
  }
  if (min !== undefined && max !== undefined && !(min < max)) throw new Error(`tuning.variables[${index}] "${v.group}": min ${min} must be below max ${max}`);
  const next: TuningSpec['variables'][number] = { group: v.group, by: v.by };
  if (min !== undefined) next.min = min;
  if (max !== undefined) next.max = max;
  return withTuning(project, { ...spec, variables: spec.variables.map((x, i) => (i === index ? next : x)) });
}

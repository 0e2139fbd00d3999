/**
 * Pure edits of the design basis (solver/project/design-basis-types.ts): the check format, its
 * label, single factors (unset = the default of solver/checks/basis-defaults.ts with its source),
 * the purpose and action of each load case, and the combinations the builder makes from the
 * actions (solver buildCombinations, as `stayset combine --write` stores them).
 */
import type { ActionKind, BuiltCombinations, CasePurpose, CheckFormat, DesignBasis, LoadCaseSpec, ProjectFile } from '../../solver/index.ts';
import { applyBuiltCombinations, buildCombinations, resolveDesignBasis } from '../../solver/index.ts';

/** The factor groups of a design basis and which format uses each. */
export const FACTOR_GROUPS = [
  { key: 'actionFactors', title: 'Partial factors on actions γ_F', formats: ['limitState'] },
  { key: 'combinationFactors', title: 'Combination factors ψ0', formats: ['limitState', 'allowable'] },
  { key: 'cable', title: 'Cable resistance', formats: ['limitState'] },
  { key: 'steel', title: 'Steel members γ_M', formats: ['limitState'] },
  { key: 'allowable', title: 'Safety factors', formats: ['allowable'] },
] as const satisfies readonly { key: keyof DesignBasis; title: string; formats: readonly CheckFormat[] }[];

export type FactorGroup = (typeof FACTOR_GROUPS)[number]['key'];

function basisOf(project: ProjectFile): DesignBasis {
  return project.designBasis ?? { format: 'limitState' };
}

export function setBasisFormat(project: ProjectFile, format: CheckFormat): ProjectFile {
  return { ...project, designBasis: { ...basisOf(project), format } };
}

export function setBasisLabel(project: ProjectFile, label: string): ProjectFile {
  const b = { ...basisOf(project) };
  if (label.trim() === '') delete b.label;
  else b.label = label;
  return { ...project, designBasis: b };
}

/** Set one factor (undefined: back to the default; an emptied group is removed). */
export function setBasisFactor(project: ProjectFile, group: FactorGroup, key: string, value: number | undefined): ProjectFile {
  if (value !== undefined && !(Number.isFinite(value) && value > 0)) throw new Error(`designBasis.${group}.${key}: ${value} must be a positive number`);
  const b = { ...basisOf(project) } as Record<string, unknown>;
  const g = { ...((b[group] as Record<string, number> | undefined) ?? {}) };
  if (value === undefined) delete g[key];
  else g[key] = value;
  if (Object.keys(g).length) b[group] = g;
  else delete b[group];
  return { ...project, designBasis: b as unknown as DesignBasis };
}

/** Set (or clear with undefined) the purpose or action of load case `caseId`. */
export function setCaseField(project: ProjectFile, caseId: string, key: 'purpose' | 'action', value: CasePurpose | ActionKind | undefined): ProjectFile {
  const i = project.loadCases.findIndex((c) => c.id === caseId);
  if (i < 0) throw new Error(`load case "${caseId}" does not exist`);
  const c = { ...project.loadCases[i] } as Record<string, unknown>;
  if (value === undefined) delete c[key];
  else c[key] = value;
  const loadCases = project.loadCases.slice();
  loadCases[i] = c as unknown as LoadCaseSpec;
  return { ...project, loadCases };
}

/** Set (or clear: ultimate) the purpose of combination `index`. */
export function setCombinationPurpose(project: ProjectFile, index: number, purpose: CasePurpose | undefined): ProjectFile {
  const combinations = (project.combinations ?? []).slice();
  if (!combinations[index]) throw new RangeError(`combinations[${index}] does not exist`);
  const c = { ...combinations[index] };
  if (purpose === undefined) delete c.purpose;
  else c.purpose = purpose;
  combinations[index] = c;
  return { ...project, combinations };
}

export interface BuiltEdit {
  project: ProjectFile;
  built: BuiltCombinations;
}

/**
 * The project with the combinations of its design basis in place of earlier generated ones
 * ("basis/…"; the user's own are kept) and the action cases marked component-only — the same
 * result as `stayset combine --write`. Throws (nothing to combine) naming the problem.
 */
export function buildBasisCombinations(project: ProjectFile, withAccompanying = true): BuiltEdit {
  const built = buildCombinations(project, resolveDesignBasis(project), { withAccompanying });
  if (built.problems.some((p) => p.code === 'noVariableAction')) {
    throw new Error('no load case has a variable or accidental action (set "action" on the cases: wind, ice, temperature, accidental): nothing to combine');
  }
  return { project: applyBuiltCombinations(project, built), built };
}

/** Words for the builder's problems (as the CLI prints them). */
export const BUILD_PROBLEM_TEXT: Record<BuiltCombinations['problems'][number]['code'], string> = {
  noPermanentCase: 'no load case has action "permanent": the combinations hold no self-weight',
  noVariableAction: 'no load case has a variable or accidental action: nothing to combine',
  actionCaseHasSelfWeight: 'these action cases include self-weight (turn it off), so combinations would count it twice',
};

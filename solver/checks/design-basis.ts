/**
 * The design basis in use: the project's `designBasis` with every unset factor filled from
 * basis-defaults.ts, each value carrying its source ("project" when the file sets it). Printed on
 * every check report and schedule.
 */
import type { CasePurpose, CheckFormat, CombinationSpec, DesignBasis, LoadCaseSpec, ProjectFile } from '../project/types.ts';
import {
  ALLOWABLE_DEFAULTS, CABLE_DEFAULTS, COMBINATION_DEFAULTS, LIMIT_STATE_DEFAULTS, STEEL_DEFAULTS,
} from './basis-defaults.ts';
import type { Sourced } from './basis-defaults.ts';
import { actionCasePurpose } from '../analysis/action-purpose.ts';

/** Source text of a value the project file sets. */
export const FROM_PROJECT = 'project file (designBasis)';

export interface ResolvedBasis {
  format: CheckFormat;
  label: string;
  /** True when the project has no designBasis and the limit-state defaults are used. */
  defaulted: boolean;
  actionFactors: Record<keyof typeof LIMIT_STATE_DEFAULTS, Sourced>;
  combinationFactors: Record<keyof typeof COMBINATION_DEFAULTS, Sourced>;
  cable: Record<keyof typeof CABLE_DEFAULTS, Sourced>;
  steel: Record<keyof typeof STEEL_DEFAULTS, Sourced>;
  allowable: Record<keyof typeof ALLOWABLE_DEFAULTS, Sourced>;
}

function fill<K extends string>(defaults: Record<K, Sourced>, given: Partial<Record<K, number>> | undefined): Record<K, Sourced> {
  const out = {} as Record<K, Sourced>;
  for (const k of Object.keys(defaults) as K[]) {
    const v = given?.[k];
    out[k] = typeof v === 'number' ? { value: v, source: FROM_PROJECT } : defaults[k];
  }
  return out;
}

export function resolveDesignBasis(project: ProjectFile): ResolvedBasis {
  const b: DesignBasis = project.designBasis ?? { format: 'limitState' };
  return {
    format: b.format,
    label: b.label ?? (b.format === 'limitState' ? 'limit-state format' : 'allowable format'),
    defaulted: project.designBasis === undefined,
    actionFactors: fill(LIMIT_STATE_DEFAULTS, b.actionFactors),
    combinationFactors: fill(COMBINATION_DEFAULTS, b.combinationFactors),
    cable: fill(CABLE_DEFAULTS, b.cable),
    steel: fill(STEEL_DEFAULTS, b.steel),
    allowable: fill(ALLOWABLE_DEFAULTS, b.allowable),
  };
}

/**
 * Divisor on k_e · MBL giving the cable design resistance: limit state breakingFactor · γ_R
 * (EN 1993-1-11 §6.2 form, recalled), allowable the safety factor.
 */
export function cableResistanceDivisor(basis: ResolvedBasis): number {
  return basis.format === 'limitState'
    ? basis.cable.breakingFactor.value * basis.cable.partialFactor.value
    : basis.allowable.cableSafetyFactor.value;
}

/** Purpose of a load case (absent = serviceability) or combination (absent = ultimate). */
export function purposeOfCase(spec: LoadCaseSpec): CasePurpose {
  return spec.purpose ?? 'serviceability';
}
export function purposeOfCombination(spec: CombinationSpec): CasePurpose {
  return spec.purpose ?? 'ultimate';
}

/** Purpose of a case, combination or design-action case id of the project (undefined for an unknown id). */
export function purposeOf(project: ProjectFile, id: string): CasePurpose | undefined {
  const c = project.loadCases.find((x) => x.id === id);
  if (c) return purposeOfCase(c);
  const k = project.combinations?.find((x) => x.id === id);
  return k ? purposeOfCombination(k) : actionCasePurpose(project, id);
}

/**
 * Which checks a purpose gets under a format. Strength: cable resistance, member yield and
 * buckling, uplift. Serviceability: displacement, tilt, twist, sag, slack, minimum and
 * serviceability tension. Limit state: strength on ultimate and accidental, serviceability on
 * serviceability. Allowable: every non-component case is a service state, so strength is checked
 * on all of them and serviceability on serviceability cases.
 */
export function checksFor(format: CheckFormat, purpose: CasePurpose): { strength: boolean; serviceability: boolean } {
  if (purpose === 'componentOnly') return { strength: false, serviceability: false };
  if (format === 'allowable') return { strength: true, serviceability: purpose === 'serviceability' };
  return { strength: purpose !== 'serviceability', serviceability: purpose === 'serviceability' };
}

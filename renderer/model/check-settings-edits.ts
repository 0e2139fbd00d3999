/**
 * Pure, immutable edits of the check settings bar: the cable resistance factor of the design
 * basis (allowable: safety factor on MBL; limit state: γ_R) and the values of the listed
 * displacement and tilt limits.
 */
import type { CheckSettings, ProjectFile } from '../../solver/index.ts';

function withChecks(project: ProjectFile, checks: CheckSettings): ProjectFile {
  return { ...project, checks };
}

/**
 * The cable factor of the design basis in use: allowable → allowable.cableSafetyFactor (≥ 1),
 * limit state → cable.partialFactor γ_R (> 0). Without a designBasis the limit-state one is made.
 */
export function setCableFactor(project: ProjectFile, value: number): ProjectFile {
  const basis = project.designBasis ?? { format: 'limitState' as const };
  if (basis.format === 'allowable') {
    if (!(value >= 1) || !Number.isFinite(value)) throw new Error(`designBasis.allowable.cableSafetyFactor: ${value} must be at least 1`);
    return { ...project, designBasis: { ...basis, allowable: { ...basis.allowable, cableSafetyFactor: value } } };
  }
  if (!(value > 0) || !Number.isFinite(value)) throw new Error(`designBasis.cable.partialFactor: ${value} must be positive`);
  return { ...project, designBasis: { ...basis, cable: { ...basis.cable, partialFactor: value } } };
}

/** Limit (m) of checks.displacementLimits[index]. */
export function setDisplacementLimit(project: ProjectFile, index: number, limit: number): ProjectFile {
  const list = (project.checks?.displacementLimits ?? []).slice();
  if (!list[index]) throw new RangeError(`checks.displacementLimits[${index}] does not exist`);
  if (!(limit > 0) || !Number.isFinite(limit)) throw new Error(`checks.displacementLimits[${index}] (node "${list[index].node}"): ${limit} m must be a positive length`);
  list[index] = { ...list[index], limit };
  return withChecks(project, { ...project.checks, displacementLimits: list });
}

/** Ratio limit (horizontal offset / height) of checks.tiltLimits[index]. */
export function setTiltLimit(project: ProjectFile, index: number, limit: number): ProjectFile {
  const list = (project.checks?.tiltLimits ?? []).slice();
  if (!list[index]) throw new RangeError(`checks.tiltLimits[${index}] does not exist`);
  if (!(limit > 0) || !Number.isFinite(limit)) throw new Error(`checks.tiltLimits[${index}] (${list[index].base}→${list[index].top}): ${limit} must be a positive ratio`);
  list[index] = { ...list[index], limit };
  return withChecks(project, { ...project.checks, tiltLimits: list });
}

/**
 * Pure, immutable edits of project.checks (CheckSettings) for the check-settings bar: the
 * resistance factor φ and the values of the listed displacement and tilt limits.
 */
import type { CheckSettings, ProjectFile } from '../../solver/index.ts';

function withChecks(project: ProjectFile, checks: CheckSettings): ProjectFile {
  return { ...project, checks };
}

/** φ in (0, 1]; utilisation = T / (φ · breaking load). */
export function setResistanceFactor(project: ProjectFile, phi: number): ProjectFile {
  if (!(phi > 0 && phi <= 1)) throw new Error(`checks.resistanceFactor: ${phi} must be above 0 and at most 1`);
  return withChecks(project, { ...(project.checks ?? {}), resistanceFactor: phi });
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

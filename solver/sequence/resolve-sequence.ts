/**
 * TensioningSequenceSpec → the members of each step, restraints, temperatures and tolerances,
 * checked against the project. Throws with a message naming the entry, e.g.
 * `sequences[0] "erection".steps[2]: member "G9" does not exist`.
 */
import type { ProjectFile } from '../project/types.ts';
import type { SettingMethod, TensioningSequenceSpec } from '../project/site-types.ts';
import { groupExists, membersOfGroup } from '../checks/groups.ts';
import { resistanceFactorOf } from '../checks/check-settings.ts';
import { DEFAULT_REFERENCE_TEMPERATURE } from '../loads/defaults.ts';

/** Force tolerance band, fraction of the value. Common practice (±5 % on a jack or dynamometer reading). */
export const DEFAULT_FORCE_TOLERANCE = 0.05;
/** Length tolerance band, m. Common practice (±5 mm on a mark or turnbuckle setting). */
export const DEFAULT_LENGTH_TOLERANCE = 0.005;

export interface ResolvedSequence {
  id: string;
  steps: { members: string[]; setBy: SettingMethod }[];
  restraints: { node: string; fixed: string; releaseAfterStep: number | null }[];
  temperature: number;
  referenceTemperature: number;
  referenceTemperatureAssumed: boolean;
  selfWeight: boolean;
  plumb: { base: string; top: string; limit: number } | null;
  forceTolerance: number;
  lengthTolerance: number;
  resistanceFactor: number;
}

export function sequenceIndex(project: ProjectFile, id: string): number {
  const i = (project.sequences ?? []).findIndex((s) => s.id === id);
  if (i < 0) throw new Error(`sequence "${id}" does not exist (sequences: ${(project.sequences ?? []).map((s) => `"${s.id}"`).join(', ') || 'none'})`);
  return i;
}

export function resolveSequence(project: ProjectFile, spec: TensioningSequenceSpec, index: number): ResolvedSequence {
  const where = `sequences[${index}] "${spec.id}"`;
  const memberIds = new Set(project.members.map((m) => m.id));
  const nodeIds = new Set(project.nodes.map((n) => n.id));
  const seen = new Map<string, number>();
  if (spec.steps.length === 0) throw new Error(`${where}: has no steps`);
  const steps = spec.steps.map((s, k) => {
    const at = `${where}.steps[${k}]`;
    if ((s.members === undefined) === (s.group === undefined)) throw new Error(`${at}: give either "members" or "group"`);
    let ids: string[];
    if (s.group !== undefined) {
      if (!groupExists(project, s.group)) throw new Error(`${at}: group "${s.group}" does not exist`);
      ids = [...membersOfGroup(project, s.group)];
      if (ids.length === 0) throw new Error(`${at}: group "${s.group}" has no members`);
    } else {
      ids = s.members!;
      if (ids.length === 0) throw new Error(`${at}: "members" is empty`);
      for (const id of ids) if (!memberIds.has(id)) throw new Error(`${at}: member "${id}" does not exist`);
    }
    for (const id of ids) {
      const prev = seen.get(id);
      if (prev !== undefined) throw new Error(`${at}: member "${id}" is already tensioned in step ${prev}`);
      seen.set(id, k);
      const m = project.members.find((x) => x.id === id)!;
      if (m.pretension === undefined && m.unstressedLength === undefined) throw new Error(`${at}: member "${id}" has neither a pretension nor an unstressed length to set`);
    }
    if (s.setBy !== 'force' && s.setBy !== 'length') throw new Error(`${at}: "setBy" must be "force" or "length"`);
    return { members: ids, setBy: s.setBy };
  });
  const restraints = (spec.temporaryRestraints ?? []).map((r, k) => {
    const at = `${where}.temporaryRestraints[${k}]`;
    if (!nodeIds.has(r.node)) throw new Error(`${at}: node "${r.node}" does not exist`);
    if (!/^[xyz]{1,3}$/.test(r.fixed)) throw new Error(`${at}: "fixed" must be letters of xyz, got "${r.fixed}"`);
    if (r.releaseAfterStep !== undefined && !(Number.isInteger(r.releaseAfterStep) && r.releaseAfterStep >= 1 && r.releaseAfterStep <= steps.length)) {
      throw new Error(`${at}: releaseAfterStep ${r.releaseAfterStep} must be a step number from 1 to ${steps.length}`);
    }
    return { node: r.node, fixed: r.fixed, releaseAfterStep: r.releaseAfterStep ?? null };
  });
  if (spec.plumb) for (const n of [spec.plumb.base, spec.plumb.top]) if (!nodeIds.has(n)) throw new Error(`${where}.plumb: node "${n}" does not exist`);
  const positive = (name: string, v: number | undefined) => {
    if (v !== undefined && !(v > 0 && Number.isFinite(v))) throw new Error(`${where}: ${name} must be a positive number, got ${v}`);
  };
  positive('forceTolerance', spec.forceTolerance);
  positive('lengthTolerance', spec.lengthTolerance);
  const tRefGiven = project.meta?.referenceTemperature;
  const referenceTemperature = tRefGiven ?? DEFAULT_REFERENCE_TEMPERATURE;
  const temperature = spec.temperature ?? referenceTemperature;
  if (!(temperature > 0)) throw new Error(`${where}: temperature ${temperature} is not an absolute temperature in K`);
  const tilt = project.checks?.tiltLimits?.[0];
  return {
    id: spec.id, steps, restraints, temperature, referenceTemperature, referenceTemperatureAssumed: tRefGiven === undefined,
    selfWeight: spec.selfWeight ?? true,
    plumb: spec.plumb ?? (tilt ? { base: tilt.base, top: tilt.top, limit: tilt.limit } : null),
    forceTolerance: spec.forceTolerance ?? DEFAULT_FORCE_TOLERANCE,
    lengthTolerance: spec.lengthTolerance ?? DEFAULT_LENGTH_TOLERANCE,
    resistanceFactor: resistanceFactorOf(project.checks),
  };
}

/**
 * Pure, immutable edits of the project's settings that have no table of their own: project
 * information (meta), reference and installation temperatures (K in the file), nodal loads of a
 * load case (N), and the lists of the check settings. Each returns a new project; a bad value
 * throws naming the file entry (the project store turns that into a refused edit).
 */
import type { CheckSettings, NodalLoadSpec, ProjectFile, ProjectMeta, Vec3 } from '../../solver/index.ts';

export type MetaText = 'name' | 'site' | 'client' | 'engineer' | 'notes';

/** Set or clear (empty text) one text field of project.meta. */
export function setMetaText(project: ProjectFile, key: MetaText, text: string): ProjectFile {
  const meta: ProjectMeta = { ...(project.meta ?? {}) };
  if (text.trim() === '') delete meta[key];
  else meta[key] = text;
  return { ...project, meta };
}

/** Design reference temperature, K (undefined clears it). Absolute: must be above 0 K. */
export function setReferenceTemperature(project: ProjectFile, kelvin: number | undefined): ProjectFile {
  const meta: ProjectMeta = { ...(project.meta ?? {}) };
  if (kelvin === undefined) delete meta.referenceTemperature;
  else if (!(kelvin > 0) || !Number.isFinite(kelvin)) throw new Error(`meta.referenceTemperature: ${kelvin} K is not an absolute temperature above 0 K`);
  else meta.referenceTemperature = kelvin;
  return { ...project, meta };
}

/** Installation temperatures of the temperature table, K, ascending (undefined = the default range). */
export function setInstallationTemperatures(project: ProjectFile, kelvins: number[] | undefined): ProjectFile {
  const out = { ...project };
  if (kelvins === undefined || kelvins.length === 0) {
    const rest = { ...(project.installation ?? {}) };
    delete rest.temperatures;
    if (Object.keys(rest).length) out.installation = rest;
    else delete out.installation;
    return out;
  }
  kelvins.forEach((t, i) => { if (!(t > 0) || !Number.isFinite(t)) throw new Error(`installation.temperatures[${i}]: ${t} K is not an absolute temperature above 0 K`); });
  out.installation = { ...(project.installation ?? {}), temperatures: [...kelvins].sort((a, b) => a - b) };
  return out;
}

function caseIndex(project: ProjectFile, caseId: string): number {
  const i = project.loadCases.findIndex((c) => c.id === caseId);
  if (i < 0) throw new Error(`load case "${caseId}" does not exist`);
  return i;
}

function withLoads(project: ProjectFile, i: number, loads: NodalLoadSpec[]): ProjectFile {
  const loadCases = project.loadCases.slice();
  const c = { ...loadCases[i] };
  if (loads.length) c.nodalLoads = loads;
  else delete c.nodalLoads;
  loadCases[i] = c;
  return { ...project, loadCases };
}

/** Add `force` (N) at each of `nodes` in load case `caseId` (a node that already has a load gets a second one). */
export function addNodalLoads(project: ProjectFile, caseId: string, nodes: readonly string[], force: Vec3): ProjectFile {
  if (!nodes.length) throw new Error(`load case "${caseId}": choose at least one node for the load`);
  const i = caseIndex(project, caseId);
  return withLoads(project, i, [...(project.loadCases[i].nodalLoads ?? []), ...nodes.map((node) => ({ node, force: [...force] as Vec3 }))]);
}

/** Replace nodal load `index` of load case `caseId`. */
export function updateNodalLoad(project: ProjectFile, caseId: string, index: number, load: NodalLoadSpec): ProjectFile {
  const i = caseIndex(project, caseId);
  const loads = (project.loadCases[i].nodalLoads ?? []).slice();
  if (!loads[index]) throw new RangeError(`loadCases[${i}].nodalLoads[${index}] does not exist`);
  loads[index] = load;
  return withLoads(project, i, loads);
}

export function removeNodalLoads(project: ProjectFile, caseId: string, indices: readonly number[]): ProjectFile {
  const i = caseIndex(project, caseId);
  const drop = new Set(indices);
  return withLoads(project, i, (project.loadCases[i].nodalLoads ?? []).filter((_, k) => !drop.has(k)));
}

/** The lists of project.checks that the check editor adds to and removes from. */
export type CheckListKey = 'noSlackGroups' | 'sagLimits' | 'displacementLimits' | 'tiltLimits' | 'upliftNodes' | 'minimumTension' | 'memberDesign' | 'twistLimits';
type ListKey = CheckListKey;
type Item<K extends ListKey> = NonNullable<CheckSettings[K]>[number];

/** Append an entry to one list of the check settings. */
export function addCheckEntry<K extends ListKey>(project: ProjectFile, key: K, entry: Item<K>): ProjectFile {
  const checks: CheckSettings = { ...(project.checks ?? {}) };
  const list = [...((checks[key] ?? []) as Item<K>[]), entry];
  (checks as Record<string, unknown>)[key] = list;
  return { ...project, checks };
}

/** Remove entry `index` of one list of the check settings (an emptied list is removed). */
export function removeCheckEntry(project: ProjectFile, key: ListKey, index: number): ProjectFile {
  const checks: CheckSettings = { ...(project.checks ?? {}) };
  const list = ((checks[key] ?? []) as unknown[]).filter((_, i) => i !== index);
  if (list.length) (checks as Record<string, unknown>)[key] = list;
  else delete checks[key];
  return { ...project, checks };
}

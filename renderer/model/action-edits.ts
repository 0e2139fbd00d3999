/**
 * Pure, immutable edits of the design-action lists of a project (solver/project/actions-types.ts):
 * panels, patch wind, member loss, wind directions, ancillaries, and the area loads of a load
 * case. Each returns a new project sharing every part it did not change; an emptied list is
 * removed from the file. Entries are edited field by field through dotted paths ("along.group"),
 * so fields an editor does not know (added to the file format later) are kept as they are.
 */
import type { AreaLoadSpec, ProjectFile } from '../../solver/index.ts';

export type ActionList = 'panels' | 'patchWind' | 'memberLoss' | 'windDirections' | 'ancillaries';
export type ActionEntry<K extends ActionList> = NonNullable<ProjectFile[K]>[number];

/** Names of the lists in messages and titles. */
export const ACTION_TITLES: Record<ActionList, string> = {
  ancillaries: 'Ancillaries',
  patchWind: 'Patch wind',
  memberLoss: 'Member loss',
  windDirections: 'Wind directions',
  panels: 'Panels',
};

export function entriesOf<K extends ActionList>(project: ProjectFile, list: K): ActionEntry<K>[] {
  return (project[list] ?? []) as ActionEntry<K>[];
}

function withList<K extends ActionList>(project: ProjectFile, list: K, rows: ActionEntry<K>[]): ProjectFile {
  const out = { ...project } as Record<string, unknown>;
  if (rows.length) out[list] = rows;
  else delete out[list];
  return out as unknown as ProjectFile;
}

export function addActionEntry<K extends ActionList>(project: ProjectFile, list: K, entry: ActionEntry<K>): ProjectFile {
  return withList(project, list, [...entriesOf(project, list), entry]);
}

export function replaceActionEntry<K extends ActionList>(project: ProjectFile, list: K, index: number, entry: ActionEntry<K>): ProjectFile {
  const rows = entriesOf(project, list).slice();
  if (!rows[index]) throw new RangeError(`${list}[${index}] does not exist`);
  rows[index] = entry;
  return withList(project, list, rows);
}

export function removeActionEntry(project: ProjectFile, list: ActionList, index: number): ProjectFile {
  const rows = entriesOf(project, list);
  if (!rows[index]) throw new RangeError(`${list}[${index}] does not exist`);
  return withList(project, list, rows.filter((_, i) => i !== index) as ActionEntry<typeof list>[]);
}

/** Value at a dotted path of an entry (undefined when any step is missing). */
export function getPath(entry: object, path: string): unknown {
  let at: unknown = entry;
  for (const key of path.split('.')) {
    if (at === null || typeof at !== 'object') return undefined;
    at = (at as Record<string, unknown>)[key];
  }
  return at;
}

/**
 * Copy of `entry` with the value at a dotted path set, or removed when `value` is undefined; an
 * object left empty by a removal is removed too. Other fields are kept untouched.
 */
export function setPath<T extends object>(entry: T, path: string, value: unknown): T {
  const [key, ...rest] = path.split('.');
  const next = { ...entry } as Record<string, unknown>;
  if (rest.length === 0) {
    if (value === undefined) delete next[key];
    else next[key] = value;
    return next as T;
  }
  const inner = next[key];
  const child = setPath(inner !== null && typeof inner === 'object' ? inner : {}, rest.join('.'), value) as Record<string, unknown>;
  if (Object.keys(child).length) next[key] = child;
  else delete next[key];
  return next as T;
}

/** Replace the area loads of load case `caseId` (an empty list removes the key). */
export function setAreaLoads(project: ProjectFile, caseId: string, loads: AreaLoadSpec[]): ProjectFile {
  const i = project.loadCases.findIndex((c) => c.id === caseId);
  if (i < 0) throw new Error(`load case "${caseId}" does not exist`);
  const loadCases = project.loadCases.slice();
  const c = { ...loadCases[i] };
  if (loads.length) c.areaLoads = loads;
  else delete c.areaLoads;
  loadCases[i] = c;
  return { ...project, loadCases };
}

/** The area loads of `caseId` with entry `index` replaced, appended (index = length) or removed (entry undefined). */
export function editAreaLoad(project: ProjectFile, caseId: string, index: number, entry: AreaLoadSpec | undefined): ProjectFile {
  const c = project.loadCases.find((l) => l.id === caseId);
  if (!c) throw new Error(`load case "${caseId}" does not exist`);
  const loads = (c.areaLoads ?? []).slice();
  if (index > loads.length || index < 0) throw new RangeError(`load case "${caseId}": areaLoads[${index}] does not exist`);
  if (entry === undefined) loads.splice(index, 1);
  else loads[index] = entry;
  return setAreaLoads(project, caseId, loads);
}

/**
 * Pure, immutable edits behind the design-data editors: one entry of a check-rule list
 * (checks.minimumTension, .memberDesign, .twistLimits), of the sections, or of a load case's
 * prescribed support displacements. `index` = the list's length appends; `entry` undefined
 * removes. An emptied list is removed from the file; every other field is kept as it is.
 * A problem the file validator does not see (a displacement along a free direction) throws
 * naming the entry; the project store turns that into a refused edit.
 */
import type { CheckSettings, PrescribedDisplacement, ProjectFile, SectionSpec } from '../../solver/index.ts';

export type CheckRuleList = 'minimumTension' | 'memberDesign' | 'twistLimits';

function edited<T>(list: readonly T[], index: number, entry: T | undefined, where: string): T[] {
  if (index < 0 || index > list.length || (index === list.length && entry === undefined)) throw new RangeError(`${where}[${index}] does not exist`);
  const out = list.slice();
  if (entry === undefined) out.splice(index, 1);
  else out[index] = entry;
  return out;
}

export function editCheckRule<K extends CheckRuleList>(project: ProjectFile, key: K, index: number, entry: NonNullable<CheckSettings[K]>[number] | undefined): ProjectFile {
  const rows = edited((project.checks?.[key] ?? []) as NonNullable<CheckSettings[K]>[number][], index, entry, `checks.${key}`);
  const checks = { ...(project.checks ?? {}) } as Record<string, unknown>;
  if (rows.length) checks[key] = rows;
  else delete checks[key];
  const out = { ...project, checks: checks as CheckSettings };
  if (!Object.keys(checks).length) delete (out as Partial<ProjectFile>).checks;
  return out;
}

export function editSection(project: ProjectFile, index: number, entry: SectionSpec | undefined): ProjectFile {
  return { ...project, sections: edited(project.sections, index, entry, 'sections') };
}

const DIRECTIONS = ['x', 'y', 'z', 'rx', 'ry', 'rz'] as const;

/** Directions of `fixed` ("xyzrz" = x, y, z, rz). */
function restrained(fixed: string | undefined): Set<string> {
  const out = new Set<string>();
  const s = fixed ?? '';
  for (let k = 0; k < s.length; k++) {
    if (s[k] === 'r' && k + 1 < s.length) { out.add(s.slice(k, k + 2)); k++; } else out.add(s[k]);
  }
  return out;
}

export function editCaseDisplacement(project: ProjectFile, caseId: string, index: number, entry: PrescribedDisplacement | undefined): ProjectFile {
  const i = project.loadCases.findIndex((c) => c.id === caseId);
  if (i < 0) throw new Error(`load case "${caseId}" does not exist`);
  const where = `loadCases[${i}] "${caseId}" displacements`;
  if (entry) {
    const node = project.nodes.find((n) => n.id === entry.node);
    if (node) {
      const fixed = restrained(node.fixed);
      const free = DIRECTIONS.filter((d) => entry[d] !== undefined && !fixed.has(d));
      if (free.length) throw new Error(`${where}[${index}]: node "${entry.node}" is not restrained in ${free.join(', ')}; add ${free.join(', ')} to its "fixed" to prescribe ${free.length > 1 ? 'them' : 'it'}`);
    }
  }
  const rows = edited(project.loadCases[i].displacements ?? [], index, entry, where);
  const loadCases = project.loadCases.slice();
  const c = { ...loadCases[i] };
  if (rows.length) c.displacements = rows;
  else delete c.displacements;
  loadCases[i] = c;
  return { ...project, loadCases };
}

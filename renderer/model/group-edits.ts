/**
 * Pure, immutable edits of project.groups (GroupSpec: id, label, member ids) for the groups
 * table. Member lists are typed as comma- or newline-separated ids, or taken from the selection.
 */
import type { GroupSpec, ProjectFile } from '../../solver/index.ts';
import { freshId } from './project-edits.ts';

function groups(project: ProjectFile): GroupSpec[] {
  return project.groups ?? [];
}

function replaceAt(project: ProjectFile, index: number, next: GroupSpec): ProjectFile {
  const list = groups(project).slice();
  if (index < 0 || index >= list.length) throw new RangeError(`groups[${index}] does not exist`);
  list[index] = next;
  return { ...project, groups: list };
}

/** Ids from text: separated by commas or new lines, trimmed, blanks and repeats dropped. */
export function parseIdList(text: string): string[] {
  return [...new Set(text.split(/[,\n]/).map((s) => s.trim()).filter(Boolean))];
}

export function setGroupMembers(project: ProjectFile, index: number, members: readonly string[]): ProjectFile {
  const g = groups(project)[index];
  if (!g) throw new RangeError(`groups[${index}] does not exist`);
  return replaceAt(project, index, { ...g, members: [...new Set(members)] });
}

export function setGroupText(project: ProjectFile, index: number, key: 'id' | 'label', text: string): ProjectFile {
  const g = groups(project)[index];
  if (!g) throw new RangeError(`groups[${index}] does not exist`);
  const next: GroupSpec = { ...g };
  if (key === 'id') next.id = text.trim();
  else if (text.trim() === '') delete next.label;
  else next.label = text;
  return replaceAt(project, index, next);
}

/** Append a group "G1", "G2", … holding `members` (e.g. the selected members). */
export function addGroup(project: ProjectFile, members: readonly string[] = []): ProjectFile {
  const g: GroupSpec = { id: freshId('G', groups(project).map((x) => x.id)), members: [...new Set(members)] };
  return { ...project, groups: [...groups(project), g] };
}

export function deleteGroup(project: ProjectFile, index: number): ProjectFile {
  const list = groups(project).filter((_, i) => i !== index);
  const next: ProjectFile = { ...project, groups: list };
  if (list.length === 0) delete next.groups;
  return next;
}

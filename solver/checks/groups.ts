import type { ProjectFile } from '../project/types.ts';

/**
 * Member ids of a group: GroupSpec.members ∪ members whose own `groups` list names the group,
 * in project member order (listed ids that are not members are left out). The id "*" means every
 * member. An unknown group id gives an empty set.
 */
export function membersOfGroup(project: ProjectFile, groupId: string): Set<string> {
  const out = new Set<string>();
  if (groupId === '*') {
    for (const m of project.members) out.add(m.id);
    return out;
  }
  const listed = new Set(project.groups?.find((g) => g.id === groupId)?.members ?? []);
  for (const m of project.members) {
    if (listed.has(m.id) || (m.groups ?? []).includes(groupId)) out.add(m.id);
  }
  return out;
}

/** Union of several groups (see membersOfGroup). */
export function membersOfGroups(project: ProjectFile, groupIds: readonly string[]): Set<string> {
  const out = new Set<string>();
  for (const g of groupIds) for (const id of membersOfGroup(project, g)) out.add(id);
  return out;
}

/** True when the group id is "*" or names a GroupSpec or appears in some member's `groups`. */
export function groupExists(project: ProjectFile, groupId: string): boolean {
  if (groupId === '*') return true;
  if (project.groups?.some((g) => g.id === groupId)) return true;
  return project.members.some((m) => (m.groups ?? []).includes(groupId));
}

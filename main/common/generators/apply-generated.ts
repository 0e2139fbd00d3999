import type { GeneratorRecord, ProjectFile } from '../../../solver/index.ts';
import type { GeneratedParts } from './types.ts';

export interface ApplyOutcome {
  /** A new project (the input is not changed). */
  project: ProjectFile;
  /** Plain notes about user edits that touched replaced parts, each naming the entry. */
  notes: string[];
}

const ownedBy = (recordId: string, id: string) => id.startsWith(`${recordId}/`);

/**
 * Put generated parts into a project, replacing what the same generator record made before:
 * members with generatedBy = record id; nodes, sections and groups whose id starts with
 * "<recordId>/". The user's other edits are kept. A replaced node or section that a user member,
 * nodal load or check still uses, and that the new run no longer makes, is kept (not lost) and
 * reported. User groups lose ids of generated members that no longer exist (reported). The
 * generator record is stored (replacing one with the same id).
 */
export function applyGenerated(project: ProjectFile, record: GeneratorRecord, parts: GeneratedParts): ApplyOutcome {
  const rid = record.id;
  const notes: string[] = [];
  const newNodeIds = new Set(parts.nodes.map((n) => n.id));
  const newSectionIds = new Set(parts.sections.map((s) => s.id));
  const newMemberIds = new Set(parts.members.map((m) => m.id));

  const userMembers = project.members.filter((m) => m.generatedBy !== rid);
  for (const m of userMembers) {
    if (newMemberIds.has(m.id)) throw new Error(`members "${m.id}": a member you added has the id the generator "${rid}" makes; rename it first`);
  }
  const usedNodes = new Map<string, string>();
  userMembers.forEach((m) => { usedNodes.set(m.from, `member "${m.id}"`); usedNodes.set(m.to, `member "${m.id}"`); });
  project.loadCases.forEach((c) => (c.nodalLoads ?? []).forEach((l) => usedNodes.set(l.node, `load case "${c.id}"`)));
  const ch = project.checks;
  (ch?.displacementLimits ?? []).forEach((l) => usedNodes.set(l.node, 'checks.displacementLimits'));
  (ch?.tiltLimits ?? []).forEach((l) => { usedNodes.set(l.base, 'checks.tiltLimits'); usedNodes.set(l.top, 'checks.tiltLimits'); });
  (ch?.upliftNodes ?? []).forEach((n) => usedNodes.set(n, 'checks.upliftNodes'));
  (project.panels ?? []).filter((pa) => !ownedBy(rid, pa.id)).forEach((pa) => pa.nodes.forEach((n) => usedNodes.set(n, `panel "${pa.id}"`)));
  const usedSections = new Map(userMembers.map((m) => [m.section, `member "${m.id}"`] as const));

  const keptNodes = project.nodes.filter((n) => {
    if (!ownedBy(rid, n.id)) return true;
    if (newNodeIds.has(n.id)) return false;
    const user = usedNodes.get(n.id);
    if (user) notes.push(`node "${n.id}" is no longer made by generator "${rid}" but ${user} uses it: kept where it was`);
    return Boolean(user);
  });
  const keptSections = project.sections.filter((s) => {
    if (!ownedBy(rid, s.id)) return true;
    if (newSectionIds.has(s.id)) return false;
    const user = usedSections.get(s.id);
    if (user) notes.push(`section "${s.id}" is no longer made by generator "${rid}" but ${user} uses it: kept`);
    return Boolean(user);
  });
  for (const n of project.nodes) {
    if (!ownedBy(rid, n.id) && newNodeIds.has(n.id)) throw new Error(`nodes "${n.id}": a node you added has an id the generator "${rid}" makes; rename it first`);
  }
  const allMemberIds = new Set([...userMembers.map((m) => m.id), ...newMemberIds]);
  const keptGroups = (project.groups ?? []).filter((g) => !ownedBy(rid, g.id)).map((g) => {
    const lost = g.members.filter((m) => !allMemberIds.has(m));
    if (lost.length) notes.push(`group "${g.id}": ${lost.length} generated member(s) no longer exist and were taken out (e.g. "${lost[0]}")`);
    return lost.length ? { ...g, members: g.members.filter((m) => allMemberIds.has(m)) } : g;
  });

  const generators = [...(project.generators ?? []).filter((r) => r.id !== rid), structuredClone(record)];
  const out: ProjectFile = {
    ...project,
    nodes: [...keptNodes, ...parts.nodes],
    sections: [...keptSections, ...parts.sections],
    members: [...userMembers, ...parts.members],
    groups: [...keptGroups, ...parts.groups],
    generators,
  };
  const panels = [...(project.panels ?? []).filter((pa) => !ownedBy(rid, pa.id)), ...(parts.panels ?? [])];
  if (panels.length > 0 || project.panels) out.panels = panels;
  return { project: out, notes };
}

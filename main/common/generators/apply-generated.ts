import type { GeneratorRecord, GroupSpec, MemberSpec, ProjectFile, Vec3 } from '../../../solver/index.ts';
import type { GeneratedParts } from './types.ts';
import { NodeFollower, nearestMember } from './follow-parts.ts';
import { followCaseLoads, followChecks, followNode, followTuning, type FollowContext } from './follow-references.ts';
import { dropGroupReferences } from './drop-group-references.ts';
import { followPanelRegions } from './follow-panel-regions.ts';
import { generatorNote, type GeneratorNote, type ReattachTarget } from './generator-notes.ts';

/**
 * What to do with the user's parts that use generated parts a re-run no longer makes:
 * 'reattach' to the nearest new part (a member end to the nearest node, a group entry to the
 * nearest new member of the same kind), or 'drop' the reference (the user member is removed, a
 * group entry is taken out).
 */
export type DanglingChoice = 'reattach' | 'drop';

/** One user reference to a generated part the re-run no longer makes. */
export interface DanglingReference {
  /** The user's entry, e.g. `member "bracket"` or `group "mine"`. */
  entry: string;
  /** What it uses, e.g. `node "mast/P30a"`. */
  uses: string;
  /** The nearest new part it would be re-attached to (worded by generator-text.ts reattachText), or null when there is none. */
  reattachTo: ReattachTarget | null;
}

export interface ApplyOutcome {
  /** A new project (the input is not changed). */
  project: ProjectFile;
  /** Exactly what moved, was re-attached, dropped or kept, each naming the entry (structured; words: generator-text.ts). */
  notes: GeneratorNote[];
  /** User references to parts the re-run no longer makes (the choice applied to them is `choice`). */
  dangling: DanglingReference[];
}

/** x, y and z all restrained: a node that stands without any member. */
const pinned = (fixed: string | undefined) => ['x', 'y', 'z'].every((d) => fixed?.includes(d));
const ownedBy = (recordId: string, id: string) => id.startsWith(`${recordId}/`);

/**
 * Put generated parts into a project, replacing what the same generator record made before:
 * members with generatedBy = record id; nodes, sections and groups whose id starts with
 * "<recordId>/". No old generated node is kept. References follow the new run:
 * - loads, displacement/tilt/uplift checks and tuning targets on generated nodes follow by role,
 *   place or pattern (follow-references.ts);
 * - the user's members on generated nodes and the user's groups listing generated members are
 *   re-attached or dropped per `choice` (a member on a node made again at the same place is
 *   untouched); dropping a member also takes out user nodes left without any member;
 * - references to generated groups the run no longer makes are dropped;
 * - a generated section still used by a user member is kept.
 * `oldKeyNodes` are the key nodes of the previous run of this record (for role matching).
 */
export function applyGenerated(project: ProjectFile, record: GeneratorRecord, parts: GeneratedParts, choice: DanglingChoice = 'reattach', oldKeyNodes: Record<string, string> | null = null): ApplyOutcome {
  const rid = record.id;
  const notes: GeneratorNote[] = [];
  const dangling: DanglingReference[] = [];
  const newNodeIds = new Set(parts.nodes.map((n) => n.id));
  const newMemberIds = new Set(parts.members.map((m) => m.id));
  for (const n of project.nodes) {
    if (!ownedBy(rid, n.id) && newNodeIds.has(n.id)) throw new Error(`nodes "${n.id}": a node you added has an id the generator "${rid}" makes; rename it first`);
  }
  let userMembers = project.members.filter((m) => m.generatedBy !== rid);
  for (const m of userMembers) {
    if (newMemberIds.has(m.id)) throw new Error(`members "${m.id}": a member you added has the id the generator "${rid}" makes; rename it first`);
  }
  const oldNodes = new Map(project.nodes.filter((n) => ownedBy(rid, n.id)).map((n) => [n.id, n] as const));
  const follower = new NodeFollower(parts.nodes, oldKeyNodes, parts.keyNodes);
  const ctx: FollowContext = { recordId: rid, oldNodes, newNodes: parts.nodes, follower, notes };

  // The user's members on generated nodes. A re-attached member does not take the same two nodes
  // as another member (two members on one pair of nodes would leave the far node a mechanism).
  const droppedMembers = new Set<string>();
  const pairs = new Set<string>();
  const pairKey = (a: string, b: string) => (a < b ? `${a}\u0000${b}` : `${b}\u0000${a}`);
  for (const m of [...parts.members, ...userMembers]) if (!oldNodes.has(m.from) && !oldNodes.has(m.to)) pairs.add(pairKey(m.from, m.to));
  userMembers = userMembers.flatMap((m) => {
    const ends = (['from', 'to'] as const).filter((k) => oldNodes.has(m[k]));
    if (!ends.length) return [m];
    const gone = ends.filter((k) => !newNodeIds.has(m[k]));
    for (const k of gone) {
      const to = follower.follow(oldNodes.get(m[k])!, 'any');
      dangling.push({ entry: `member "${m.id}"`, uses: `node "${m[k]}"`, reattachTo: to ? { part: 'node', id: to.id, distance: to.distance } : null });
    }
    if (gone.length && choice === 'drop') {
      droppedMembers.add(m.id);
      notes.push(generatorNote('memberDropped', { member: m.id, nodes: gone.map((k) => m[k]) }));
      return [];
    }
    const next: MemberSpec = { ...m };
    for (const k of ends) {
      const other = k === 'from' ? next.to : next.from;
      const avoid = new Set([other, ...parts.nodes.filter((n) => pairs.has(pairKey(n.id, other))).map((n) => n.id)]);
      const id = followNode(ctx, `member "${m.id}" ${k}`, m[k], 'any', avoid);
      if (id === null) { droppedMembers.add(m.id); return []; }
      next[k] = id;
    }
    pairs.add(pairKey(next.from, next.to));
    if (next.from === next.to) {
      droppedMembers.add(m.id);
      notes.push(generatorNote('memberEndsMerge', { member: m.id, node: next.from }));
      return [];
    }
    return [next];
  });

  // User nodes left without any member (after dropping members) would be mechanisms: take them out.
  const used = new Set<string>();
  for (const m of [...userMembers, ...parts.members]) { used.add(m.from); used.add(m.to); }
  const lonely = new Set(droppedMembers.size ? project.nodes.filter((n) => !ownedBy(rid, n.id) && !used.has(n.id) && !pinned(n.fixed)
    && project.members.some((m) => droppedMembers.has(m.id) && (m.from === n.id || m.to === n.id))).map((n) => n.id) : []);
  lonely.forEach((id) => notes.push(generatorNote('nodeRemoved', { node: id })));

  // Groups: the generator's are replaced; the user's lose or re-attach generated members no longer made.
  const oldAt = new Map<string, Vec3>(project.nodes.map((n) => [n.id, n.at]));
  const newAt = new Map<string, Vec3>(parts.nodes.map((n) => [n.id, n.at]));
  const oldGenerated = new Map(project.members.filter((m) => m.generatedBy === rid).map((m) => [m.id, m] as const));
  const userMemberIds = new Set(userMembers.map((m) => m.id));
  const gone = new Set<string>();
  const keptGroups: GroupSpec[] = [];
  for (const g of project.groups ?? []) {
    if (ownedBy(rid, g.id)) continue;
    const members: string[] = [];
    for (const id of g.members) {
      if (userMemberIds.has(id) || newMemberIds.has(id)) { members.push(id); continue; }
      if (droppedMembers.has(id)) { notes.push(generatorNote('groupMemberDropped', { group: g.id, member: id })); continue; }
      const old = oldGenerated.get(id);
      const near = old ? nearestMember(old, oldAt, parts.members, newAt) : null;
      if (old) dangling.push({ entry: `group "${g.id}"`, uses: `member "${id}"`, reattachTo: near ? { part: 'member', id: near.id } : null });
      if (choice === 'reattach' && near) {
        if (!members.includes(near.id)) members.push(near.id);
        notes.push(generatorNote('groupMemberReplaced', { group: g.id, member: id, to: near.id, kind: near.kind }));
      } else notes.push(generatorNote('groupMemberGone', { group: g.id, member: id }));
    }
    if (members.length) keptGroups.push(members.length === g.members.length && members.every((m, i) => m === g.members[i]) ? g : { ...g, members });
    else { gone.add(g.id); notes.push(generatorNote('groupRemoved', { group: g.id })); }
  }
  const newGroupIds = new Set(parts.groups.map((g) => g.id));
  for (const g of project.groups ?? []) if (ownedBy(rid, g.id) && !newGroupIds.has(g.id)) gone.add(g.id);

  const newSectionIds = new Set(parts.sections.map((s) => s.id));
  const usedSections = new Map(userMembers.map((m) => [m.section, m.id] as const));
  const keptSections = project.sections.filter((s) => {
    if (!ownedBy(rid, s.id)) return true;
    if (newSectionIds.has(s.id)) return false;
    const user = usedSections.get(s.id);
    if (user) notes.push(generatorNote('sectionKept', { section: s.id, generator: rid, member: user }));
    return Boolean(user);
  });

  const dropLonely = (l: { node: string }) => !lonely.has(l.node);
  let out: ProjectFile = {
    ...project,
    nodes: [...project.nodes.filter((n) => !ownedBy(rid, n.id) && !lonely.has(n.id)), ...parts.nodes],
    sections: [...keptSections, ...parts.sections],
    members: [...userMembers, ...parts.members],
    groups: [...keptGroups, ...parts.groups],
    loadCases: project.loadCases.map((c) => {
      const loads = followCaseLoads(ctx, c)?.filter(dropLonely);
      return loads === c.nodalLoads || (loads && c.nodalLoads && loads.length === c.nodalLoads.length && loads.every((l, i) => l === c.nodalLoads![i])) ? c : { ...c, nodalLoads: loads };
    }),
    generators: [...(project.generators ?? []).filter((r) => r.id !== rid), structuredClone(record)],
  };
  const checks = followChecks(ctx, project.checks);
  if (checks) {
    out.checks = {
      ...checks,
      ...(checks.displacementLimits ? { displacementLimits: checks.displacementLimits.filter(dropLonely) } : {}),
      ...(checks.upliftNodes ? { upliftNodes: checks.upliftNodes.filter((n) => !lonely.has(n)) } : {}),
    };
  }
  const tuning = followTuning(ctx, project.tuning);
  if (tuning) out.tuning = tuning;
  if (project.ancillaries) {
    // point ancillaries follow their node like loads (role, same place, nearest node)
    out.ancillaries = project.ancillaries.flatMap((a, i) => {
      if (a.node === undefined) return [a];
      const node = followNode(ctx, `ancillaries[${i}] "${a.id}"`, a.node, 'any');
      if (node === null || lonely.has(node)) { notes.push(generatorNote('ancillaryDropped', { entry: `ancillaries[${i}] "${a.id}"` })); return []; }
      return [node === a.node ? a : { ...a, node }];
    });
  }
  out = dropGroupReferences(out, gone, notes);
  if (!out.groups?.length) delete out.groups;
  const newPanels = followPanelRegions((project.panels ?? []).filter((pa) => ownedBy(rid, pa.id)), oldAt, parts.panels ?? [], newAt, notes);
  const userPanels = (project.panels ?? []).filter((pa) => !ownedBy(rid, pa.id)).flatMap((pa) => {
    const nodes = pa.nodes.map((n) => followNode(ctx, `panel "${pa.id}"`, n, 'any'));
    if (nodes.some((n) => n === null || lonely.has(n)) || new Set(nodes).size < nodes.length) {
      notes.push(generatorNote('panelDropped', { panel: pa.id }));
      return [];
    }
    return [nodes.every((n, i) => n === pa.nodes[i]) ? pa : { ...pa, nodes: nodes as string[] }];
  });
  const panels = [...userPanels, ...newPanels];
  if (panels.length > 0 || project.panels) out.panels = panels;
  return { project: out, notes, dangling };
}

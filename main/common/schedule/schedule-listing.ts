/**
 * What the schedule lists (project `schedule`, ScheduleSpec): which members get a full row and
 * which are summarised per group or section, and the summary rows themselves.
 * Default: every cable in full, nothing else. Other members (bars, beams) listed by the choice
 * ('groups' or 'all') are summarised: count, governing axial forces, highest utilisation.
 */
import { membersOfGroup } from '../../../solver/index.ts';
import type { CheckReport, Envelope, MemberKind, ProjectFile, ScheduleSpec } from '../../../solver/index.ts';
import type { ScheduleListingInfo, ScheduleMemberSummary } from './schedule-types.ts';

export interface ScheduleListingChoice {
  info: ScheduleListingInfo;
  /** Member ids printed in full (cables). */
  inFull: Set<string>;
  /** Summary label → member ids, in print order. */
  summarised: Map<string, string[]>;
}

/** Group ids a project knows: `groups` entries and ids named in members' `groups`. */
export function projectGroupIds(project: ProjectFile): string[] {
  return [...new Set([...(project.groups ?? []).map((g) => g.id), ...project.members.flatMap((m) => m.groups ?? [])])];
}

/** Resolve the choice; throws naming the entry for an unknown group or an empty group list. */
export function scheduleListing(project: ProjectFile, spec: ScheduleSpec, groupLabel: (id: string) => string): ScheduleListingChoice {
  const list = spec.list ?? 'cables';
  if (list !== 'cables' && list !== 'groups' && list !== 'all') throw new Error(`schedule.list must be cables, groups or all, got ${JSON.stringify(list)}`);
  const known = projectGroupIds(project);
  const chosen = list === 'groups' ? [...new Set(spec.groups ?? [])] : [];
  if (list === 'groups' && chosen.length === 0) throw new Error('schedule: list "groups" needs at least one group');
  const unknown = chosen.filter((g) => !known.includes(g));
  if (unknown.length) throw new Error(`schedule.groups: group ${unknown.map((g) => JSON.stringify(g)).join(', ')} does not exist (groups: ${known.join(', ') || 'none'})`);

  let listed: Set<string>;
  if (list === 'groups') {
    listed = new Set<string>();
    for (const g of chosen) for (const id of membersOfGroup(project, g)) listed.add(id);
  } else {
    listed = new Set(project.members.filter((m) => list === 'all' || m.kind === 'cable').map((m) => m.id));
  }
  const inFull = new Set<string>();
  const summarised = new Map<string, string[]>();
  // A summarised member goes to the first chosen group holding it (list 'groups'), else the first
  // project group holding it, else its section.
  const order = list === 'groups' ? chosen : known;
  const sets = order.map((g) => ({ label: groupLabel(g), ids: membersOfGroup(project, g) }));
  for (const m of project.members) {
    if (!listed.has(m.id)) continue;
    if (m.kind === 'cable') { inFull.add(m.id); continue; }
    const label = sets.find((s) => s.ids.has(m.id))?.label ?? `section ${m.section}`;
    summarised.set(label, [...(summarised.get(label) ?? []), m.id]);
  }
  const summarisedCount = [...summarised.values()].reduce((n, ids) => n + ids.length, 0);
  return {
    info: { list, groups: chosen.map(groupLabel), total: project.members.length, inFull: inFull.size, summarised: summarisedCount },
    inFull, summarised,
  };
}

/** One summary row per label: count, largest tension, smallest axial force, highest utilisation, with member and case. */
export function summariseMembers(project: ProjectFile, summarised: Map<string, string[]>, env: Envelope, checks: CheckReport | null): ScheduleMemberSummary[] {
  const envById = new Map(env.members.map((m) => [m.id, m]));
  const chkById = new Map((checks?.members ?? []).map((m) => [m.id, m]));
  const kindOf = new Map(project.members.map((m) => [m.id, m.kind]));
  const at = (member: string, c: string) => `${member} · ${c}`;
  return [...summarised].map(([label, ids]) => {
    const row: ScheduleMemberSummary = {
      label, kinds: [...new Set(ids.map((id) => kindOf.get(id)!))] as MemberKind[], count: ids.length,
      maxTension: null, maxTensionAt: '', minForce: null, minForceAt: '', utilisation: null, utilisationAt: '', failing: 0, unchecked: 0,
    };
    for (const id of ids) {
      const e = envById.get(id);
      if (e && (row.maxTension === null || e.tensionMax > row.maxTension)) { row.maxTension = e.tensionMax; row.maxTensionAt = at(id, e.tensionMaxCase); }
      if (e && (row.minForce === null || e.tensionMin < row.minForce)) { row.minForce = e.tensionMin; row.minForceAt = at(id, e.tensionMinCase); }
      const c = chkById.get(id);
      if (c?.utilisation != null && (row.utilisation === null || c.utilisation > row.utilisation)) { row.utilisation = c.utilisation; row.utilisationAt = at(id, c.utilisationCase); }
      if (!c || c.status === 'unchecked') row.unchecked++;
      else if (c.status === 'fail') row.failing++;
    }
    return row;
  });
}

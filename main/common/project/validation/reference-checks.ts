/**
 * Every id a project entry refers to must exist: member ends, sections, groups and generators;
 * load-case nodes and groups; group members; combination cases; check and tuning references.
 * Message form: `members[3] "G2": node "TOP2" does not exist`.
 */
import { entryLabel } from './error-path.ts';
import { entries, idSet, isRec, str, strings } from './doc-access.ts';
import type { Rec } from './doc-access.ts';

interface Known {
  node: Set<string>;
  section: Set<string>;
  member: Set<string>;
  group: Set<string>;
  generator: Set<string>;
  loadCase: Set<string>;
  /** Load cases and combinations. */
  case: Set<string>;
}

const WORD: Record<keyof Known, string> = {
  node: 'node',
  section: 'section',
  member: 'member',
  group: 'group',
  generator: 'generator',
  loadCase: 'load case',
  case: 'case',
};

function knownIds(root: unknown): Known {
  const loadCase = idSet(root, 'loadCases');
  const groups = idSet(root, 'groups');
  // Groups may also be named only in member.groups (MemberSpec.groups).
  for (const { entry } of entries(root, 'members')) for (const g of strings(entry, 'groups')) groups.add(g.value);
  return {
    node: idSet(root, 'nodes'),
    section: idSet(root, 'sections'),
    member: idSet(root, 'members'),
    group: groups,
    generator: idSet(root, 'generators'),
    loadCase,
    case: new Set([...loadCase, ...idSet(root, 'combinations')]),
  };
}

export function referenceErrors(root: unknown): string[] {
  const known = knownIds(root);
  const errors: string[] = [];
  // `where` may be a function: the entry label is then built only for an error (cheap on large files).
  const need = (where: string | (() => string), kind: keyof Known, id: string | undefined, prefix = ''): void => {
    if (id !== undefined && !known[kind].has(id)) {
      const why = kind === 'case' ? ' (no load case or combination has this id)' : '';
      errors.push(`${typeof where === 'string' ? where : where()}: ${prefix}${WORD[kind]} ${JSON.stringify(id)} does not exist${why}`);
    }
  };
  const needAll = (where: string, kind: keyof Known, owner: Rec, key: string, prefix = ''): void => {
    for (const s of strings(owner, key)) need(where, kind, s.value, prefix);
  };

  for (const { index, entry } of entries(root, 'members')) {
    const at = (): string => entryLabel(root, 'members', index);
    need(at, 'node', str(entry, 'from'));
    need(at, 'node', str(entry, 'to'));
    need(at, 'section', str(entry, 'section'));
    need(at, 'generator', str(entry, 'generatedBy'));
  }
  for (const { index, entry } of entries(root, 'loadCases')) {
    const at = entryLabel(root, 'loadCases', index);
    for (const l of entries(entry, 'nodalLoads')) need(at, 'node', str(l.entry, 'node'), `nodalLoads[${l.index}]: `);
    for (const d of entries(entry, 'displacements')) need(at, 'node', str(d.entry, 'node'), `displacements[${d.index}]: `);
    if (isRec(entry.wind)) needAll(at, 'group', entry.wind, 'groups', 'wind: ');
    if (isRec(entry.ice)) needAll(at, 'group', entry.ice, 'groups', 'ice: ');
    if (isRec(entry.ice)) needAll(at, 'member', entry.ice, 'bareMembers', 'ice.bareMembers: ');
  }
  for (const { index, entry } of entries(root, 'groups')) needAll(entryLabel(root, 'groups', index), 'member', entry, 'members');
  for (const { index, entry } of entries(root, 'combinations')) {
    const at = entryLabel(root, 'combinations', index);
    for (const f of entries(entry, 'factors')) need(at, 'loadCase', str(f.entry, 'case'), `factors[${f.index}]: `);
  }
  const checks = isRec(root) ? root.checks : undefined;
  if (isRec(checks)) {
    for (const g of strings(checks, 'noSlackGroups')) if (g.value !== '*') need('checks', 'group', g.value, 'noSlackGroups: ');
    // "*" stands for every cable wherever the checks take a group (solver/checks/groups.ts).
    const needGroup = (g: string | undefined, prefix: string): void => { if (g !== '*') need('checks', 'group', g, prefix); };
    for (const s of entries(checks, 'sagLimits')) needGroup(str(s.entry, 'group'), `sagLimits[${s.index}]: `);
    for (const d of entries(checks, 'displacementLimits')) {
      need('checks', 'node', str(d.entry, 'node'), `displacementLimits[${d.index}]: `);
    }
    for (const t of entries(checks, 'tiltLimits')) {
      need('checks', 'node', str(t.entry, 'base'), `tiltLimits[${t.index}]: `);
      need('checks', 'node', str(t.entry, 'top'), `tiltLimits[${t.index}]: `);
    }
    needAll('checks', 'node', checks, 'upliftNodes', 'upliftNodes: ');
    for (const r of entries(checks, 'minimumTension')) needGroup(str(r.entry, 'group'), `minimumTension[${r.index}]: `);
    for (const r of entries(checks, 'memberDesign')) needGroup(str(r.entry, 'group'), `memberDesign[${r.index}]: `);
    for (const t of entries(checks, 'twistLimits')) needAll('checks', 'node', t.entry, 'nodes', `twistLimits[${t.index}]: `);
  }
  const tuning = isRec(root) ? root.tuning : undefined;
  if (isRec(tuning)) {
    for (const v of entries(tuning, 'variables')) need('tuning', 'group', str(v.entry, 'group'), `variables[${v.index}]: `);
    for (const t of entries(tuning, 'targets')) {
      const prefix = `targets[${t.index}]: `;
      need('tuning', 'group', str(t.entry, 'group'), prefix);
      need('tuning', 'case', str(t.entry, 'case'), prefix);
      need('tuning', 'node', str(t.entry, 'node'), prefix);
      need('tuning', 'node', str(t.entry, 'base'), prefix);
      need('tuning', 'node', str(t.entry, 'top'), prefix);
    }
  }
  const schedule = isRec(root) ? root.schedule : undefined;
  if (isRec(schedule)) {
    needAll('schedule', 'group', schedule, 'groups', 'groups: ');
    if (schedule.list === 'groups' && strings(schedule, 'groups').length === 0) errors.push('schedule: list "groups" needs at least one group in "groups"');
  }
  return errors;
}

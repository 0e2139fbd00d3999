import type { ProjectFile, TuningTarget } from '../../../solver/index.ts';
import { generatorNote, type GeneratorNote } from './generator-notes.ts';

/**
 * Remove every reference to the groups in `gone` (group ids that no longer exist): check settings
 * (no-slack groups, sag limits), tuning variables and group targets, wind and ice groups of load
 * cases, members' own `groups`, and design actions that name a group (member loss by group,
 * unbalanced ice, line ancillaries). Each removal is described in `notes`. Returns a new project.
 */
export function dropGroupReferences(p: ProjectFile, gone: ReadonlySet<string>, notes: GeneratorNote[]): ProjectFile {
  if (gone.size === 0) return p;
  const out: ProjectFile = { ...p };
  const say = (entry: string, g: string) => notes.push(generatorNote('groupReferenceDropped', { entry, group: g }));
  if (p.checks) {
    const ch = { ...p.checks };
    if (ch.noSlackGroups) ch.noSlackGroups = ch.noSlackGroups.filter((g) => (gone.has(g) ? (say('checks.noSlackGroups', g), false) : true));
    if (ch.sagLimits) ch.sagLimits = ch.sagLimits.filter((s, i) => (gone.has(s.group) ? (say(`checks.sagLimits[${i}]`, s.group), false) : true));
    out.checks = ch;
  }
  if (p.tuning) {
    const variables = p.tuning.variables.filter((v, i) => (gone.has(v.group) ? (say(`tuning.variables[${i}]`, v.group), false) : true));
    const targets = p.tuning.targets.filter((t: TuningTarget, i) => ('group' in t && gone.has(t.group) ? (say(`tuning.targets[${i}]`, t.group), false) : true));
    out.tuning = { ...p.tuning, variables, targets };
  }
  out.loadCases = p.loadCases.map((c) => {
    let next = c;
    for (const key of ['wind', 'ice'] as const) {
      const spec = next[key];
      if (!spec?.groups?.some((g) => gone.has(g))) continue;
      spec.groups.filter((g) => gone.has(g)).forEach((g) => say(`load case "${c.id}" ${key}`, g));
      const groups = spec.groups.filter((g) => !gone.has(g));
      const copy = { ...spec } as typeof spec;
      if (groups.length) copy.groups = groups;
      else {
        delete copy.groups;
        notes.push(generatorNote('caseAppliesToAll', { case: c.id, action: key }));
      }
      next = { ...next, [key]: copy };
    }
    return next;
  });
  // design actions: a member loss keeps its listed members; an action that needs the group goes
  if (p.memberLoss) {
    out.memberLoss = p.memberLoss.flatMap((m, i) => {
      if (m.group === undefined || !gone.has(m.group)) return [m];
      say(`memberLoss[${i}] "${m.id}"`, m.group);
      const { group: _g, ...rest } = m;
      return rest.members?.length ? [rest] : (notes.push(generatorNote('memberLossDropped', { entry: `memberLoss[${i}] "${m.id}"` })), []);
    });
  }
  if (p.unbalancedIce) {
    out.unbalancedIce = p.unbalancedIce.filter((u, i) => (gone.has(u.group) ? (say(`unbalancedIce[${i}] "${u.id}"`, u.group), false) : true));
  }
  if (p.ancillaries) {
    out.ancillaries = (out.ancillaries ?? p.ancillaries).filter((a, i) => (a.along && gone.has(a.along.group) ? (say(`ancillaries[${i}] "${a.id}"`, a.along.group), false) : true));
  }
  out.members = p.members.map((m) => {
    if (!m.groups?.some((g) => gone.has(g))) return m;
    const groups = m.groups.filter((g) => !gone.has(g));
    const copy = { ...m };
    if (groups.length) copy.groups = groups;
    else delete copy.groups;
    say(`members "${m.id}" groups`, m.groups.find((g) => gone.has(g))!);
    return copy;
  });
  return out;
}

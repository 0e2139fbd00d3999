/**
 * Load cases made from ice actions (actions-types.ts):
 * - ice with wind (IceWithWindSpec): the ice case with the wind case's wind, per factor pair;
 * - unbalanced ice on guys (UnbalancedIceSpec): the ice case with some guys bare (IceSpec.bareMembers).
 * Both are plain LoadCaseSpecs, solved like any load case (solve-actions.ts).
 */
import type { IceWithWindSpec, LoadCaseSpec, ProjectFile, UnbalancedIceSpec } from '../project/types.ts';
import { membersOfGroup } from '../checks/groups.ts';

/**
 * Default factor pairs: full ice with half the wind pressure, half the ice thickness with full
 * wind. Common practice (a dominant action with a reduced accompanying one); placeholders — the
 * code in force sets the factors.
 */
export const DEFAULT_ICE_WIND_PAIRS: readonly { ice: number; wind: number }[] = [{ ice: 1, wind: 0.5 }, { ice: 0.5, wind: 1 }];

/** The cases of an IceWithWindSpec, "<id> / ice <ice> + wind <wind>" (see the spec). */
export function iceWithWindCases(project: ProjectFile, spec: IceWithWindSpec): LoadCaseSpec[] {
  const ice = project.loadCases.find((c) => c.id === spec.iceCase);
  const wind = project.loadCases.find((c) => c.id === spec.windCase);
  if (!ice?.ice) throw new Error(`iceWithWind "${spec.id}": iceCase "${spec.iceCase}" is not a load case with ice`);
  if (!wind?.wind) throw new Error(`iceWithWind "${spec.id}": windCase "${spec.windCase}" is not a load case with wind`);
  return (spec.pairs ?? DEFAULT_ICE_WIND_PAIRS).map(({ ice: fi, wind: fw }) => ({
    ...ice,
    id: `${spec.id} / ice ${fi} + wind ${fw}`,
    label: `${spec.label ?? spec.id}: ${fi} × ice of "${ice.id}" + ${fw} × wind pressure of "${wind.id}"`,
    ice: { ...ice.ice!, thickness: fi * ice.ice!.thickness },
    wind: { ...wind.wind!, speed: Math.sqrt(fw) * wind.wind!.speed },
    action: 'iceWithWind' as const,
    purpose: spec.purpose ?? ice.purpose,
  }));
}

/** Heights are one guy level when closer than this, m. Common practice: far below any guy spacing. */
const LEVEL_TOLERANCE = 1e-3;

/** Units of an UnbalancedIceSpec: name and member ids, in project order (levels bottom up). */
export function unbalancedIceUnits(project: ProjectFile, spec: UnbalancedIceSpec): { name: string; members: string[] }[] {
  const inGroup = membersOfGroup(project, spec.group);
  const guys = project.members.filter((m) => inGroup.has(m.id));
  if ((spec.by ?? 'guy') === 'guy') return guys.map((m) => ({ name: m.id, members: [m.id] }));
  const z = new Map(project.nodes.map((n) => [n.id, n.at[2]] as const));
  const levels: { z: number; members: string[] }[] = [];
  for (const m of guys) {
    const top = Math.max(z.get(m.from) ?? 0, z.get(m.to) ?? 0);
    const level = levels.find((l) => Math.abs(l.z - top) < LEVEL_TOLERANCE);
    if (level) level.members.push(m.id);
    else levels.push({ z: top, members: [m.id] });
  }
  levels.sort((a, b) => a.z - b.z);
  return levels.map((l) => ({ name: `level ${Math.round(l.z * 1000) / 1000} m`, members: l.members }));
}

/** The cases of an UnbalancedIceSpec, "<id> / <unit> bare" or "<id> / <unit> iced" (see the spec). */
export function unbalancedIceCases(project: ProjectFile, spec: UnbalancedIceSpec): LoadCaseSpec[] {
  const base = project.loadCases.find((c) => c.id === spec.case);
  if (!base?.ice) throw new Error(`unbalancedIce "${spec.id}": case "${spec.case}" is not a load case with ice`);
  const units = unbalancedIceUnits(project, spec);
  const all = units.flatMap((u) => u.members);
  const iced = (spec.pattern ?? 'eachBare') === 'eachIced';
  return units.map((u) => {
    const bare = iced ? all.filter((m) => !u.members.includes(m)) : u.members;
    return {
      ...base,
      id: `${spec.id} / ${u.name} ${iced ? 'iced' : 'bare'}`,
      label: `${spec.label ?? spec.id}: "${base.id}" with ${iced ? `only ${u.name} of the guys iced` : `${u.name} bare`}`,
      ice: { ...base.ice!, bareMembers: [...new Set([...(base.ice!.bareMembers ?? []), ...bare])] },
    };
  });
}

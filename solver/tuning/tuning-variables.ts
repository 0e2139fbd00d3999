/**
 * Tuning variables: one scalar per group (TuningSpec.variables).
 *
 * - by 'pretension': x is the pretension P (N) written into every member of the group
 *   (MemberSpec.pretension = x, unstressedLength removed). Default bounds [0.01·x0, 0.5·MBL]
 *   (common practice: installation tension well below the breaking load), or [0.01·x0, 10·x0]
 *   without a breaking load.
 * - by 'unstressedLength': x is a factor on each member's unstressed length at the start
 *   (MemberSpec.unstressedLength = x · L0, pretension removed); x < 1 shortens (tightens).
 *   L0 = the file's unstressedLength, or from the pretension: L0 = stressFreeLength(Lc, P/A, E)
 *   with Lc the chord between the end nodes (the length that carries P at the chord, see
 *   solver/model/build-model.ts). Default bounds [0.99, 1.01].
 */
import type { MemberSpec, ProjectFile } from '../project/types.ts';
import { membersOfGroup, groupExists } from '../checks/groups.ts';
import type { ResolvedVariable } from './tuning-types.ts';
import { stressFreeLength } from '../model/build-model.ts';

function chordOf(project: ProjectFile, m: MemberSpec): number {
  const a = project.nodes.find((n) => n.id === m.from);
  const b = project.nodes.find((n) => n.id === m.to);
  if (!a || !b) throw new Error(`member "${m.id}": end node "${!a ? m.from : m.to}" does not exist`);
  return Math.hypot(b.at[0] - a.at[0], b.at[1] - a.at[1], b.at[2] - a.at[2]);
}

function sectionOf(project: ProjectFile, m: MemberSpec) {
  const s = project.sections.find((x) => x.id === m.section);
  if (!s) throw new Error(`member "${m.id}": section "${m.section}" does not exist`);
  return s;
}

/**
 * Pretension P (N) a member describes: its own, or the one its unstressed length L0 implies at
 * the chord Lc. Inverse of stressFreeLength (solver/model/build-model.ts): with λ = Lc / L0,
 * P = E A λ (λ² − 1) / 2 (Green–Lagrange strain at the chord, true force).
 */
export function memberPretension(project: ProjectFile, m: MemberSpec): number {
  if (m.pretension !== undefined) return m.pretension;
  if (m.unstressedLength === undefined) return 0;
  const s = sectionOf(project, m);
  const lambda = chordOf(project, m) / m.unstressedLength;
  return (s.E * s.area * lambda * (lambda * lambda - 1)) / 2;
}

/** Unstressed length (m) a member describes (see the file comment). */
export function memberUnstressedLength(project: ProjectFile, m: MemberSpec): number {
  if (m.unstressedLength !== undefined) return m.unstressedLength;
  const s = sectionOf(project, m);
  const p = m.pretension ?? 0;
  return stressFreeLength(chordOf(project, m), p / s.area, s.E);
}

/** Resolve TuningSpec.variables; throws naming the entry on bad input. */
export function resolveVariables(project: ProjectFile): ResolvedVariable[] {
  const spec = project.tuning;
  if (!spec || spec.variables.length === 0) throw new Error('tuning: no variables (tuning.variables is empty)');
  const seen = new Set<string>();
  return spec.variables.map((v, i) => {
    const where = `tuning.variables[${i}] (group "${v.group}")`;
    if (!groupExists(project, v.group)) throw new Error(`${where}: group does not exist`);
    if (seen.has(v.group)) throw new Error(`${where}: the group is already a variable`);
    seen.add(v.group);
    const ids = [...membersOfGroup(project, v.group)];
    if (ids.length === 0) throw new Error(`${where}: group has no members`);
    const members = ids.map((id) => project.members.find((m) => m.id === id)!);
    let initial: number;
    let lower: number;
    let upper: number;
    let scale: number;
    if (v.by === 'pretension') {
      initial = members.reduce((s, m) => s + memberPretension(project, m), 0) / members.length;
      const mbl = Math.min(...members.map((m) => sectionOf(project, m).breakingLoad ?? Infinity));
      lower = v.min ?? Math.max(1, 0.01 * initial);
      upper = v.max ?? (Number.isFinite(mbl) ? 0.5 * mbl : 10 * Math.max(initial, 1));
      scale = Math.max(Math.abs(initial), (upper - lower) / 20, 1);
    } else if (v.by === 'unstressedLength') {
      initial = 1;
      lower = v.min ?? 0.99;
      upper = v.max ?? 1.01;
      scale = 1e-3;
    } else {
      throw new Error(`${where}: "by" must be 'pretension' or 'unstressedLength', got ${JSON.stringify((v as { by: unknown }).by)}`);
    }
    if (!(lower < upper)) throw new Error(`${where}: min ${lower} must be below max ${upper}`);
    if (v.by === 'pretension' && lower <= 0) throw new Error(`${where}: min pretension must be positive, got ${lower}`);
    initial = Math.min(upper, Math.max(lower, initial));
    return {
      group: v.group, by: v.by, memberIds: ids, initial, lower, upper, scale,
      baseUnstressedLength: members.map((m) => memberUnstressedLength(project, m)),
    };
  });
}

/** A copy of the project with the variables set to `values` (the input is not modified). */
export function applyVariables(project: ProjectFile, vars: readonly ResolvedVariable[], values: readonly number[]): ProjectFile {
  const byId = new Map<string, MemberSpec>();
  const members = project.members.map((m) => {
    const copy: MemberSpec = { ...m };
    byId.set(m.id, copy);
    return copy;
  });
  vars.forEach((v, k) => {
    v.memberIds.forEach((id, j) => {
      const m = byId.get(id)!;
      if (v.by === 'pretension') {
        m.pretension = values[k];
        delete m.unstressedLength;
      } else {
        m.unstressedLength = values[k] * v.baseUnstressedLength[j];
        delete m.pretension;
      }
    });
  });
  return { ...project, members };
}

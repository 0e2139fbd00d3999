/**
 * Supports of the project's nodes: restrained directions (the `fixed` string), springs to ground
 * and prescribed displacements, as direction indices 0..5 = x, y, z, rx, ry, rz (global axes).
 */
import type { NodeSpec, ProjectFile, LoadCaseSpec } from '../project/types.ts';
import type { DofMap } from './dof-map.ts';
import { dofOf } from './dof-map.ts';

export const DIRECTION_NAMES = ['x', 'y', 'z', 'rx', 'ry', 'rz'] as const;

/**
 * Directions named by a `fixed` string: tokens x, y, z, rx, ry, rz, each at most once, written
 * together ("xyz" pinned, "xyzrxryrz" clamped, "xyzrz"). Throws on anything else, naming `where`.
 */
export function parseFixed(text: string | undefined, where: string): number[] {
  const dirs: number[] = [];
  const s = text ?? '';
  for (let p = 0; p < s.length; p++) {
    const rot = s[p] === 'r';
    const axis = 'xyz'.indexOf(s[rot ? ++p : p] ?? '');
    if (axis < 0) throw new Error(`${where}: fixed "${text}" may hold only x, y, z, rx, ry, rz`);
    const dir = axis + (rot ? 3 : 0);
    if (dirs.includes(dir)) throw new Error(`${where}: fixed "${text}" names ${DIRECTION_NAMES[dir]} twice`);
    dirs.push(dir);
  }
  return dirs;
}

/** True when the node's supports (restraints or springs) touch a rotation. */
export function supportsTouchRotations(node: NodeSpec): boolean {
  const where = `node "${node.id}"`;
  if (parseFixed(node.fixed, where).some((d) => d >= 3)) return true;
  const sp = node.springs;
  return !!sp && (sp.rx !== undefined || sp.ry !== undefined || sp.rz !== undefined);
}

/** Restraint flags and spring stiffnesses per DOF (springs null when there are none). */
export function supportArrays(project: ProjectFile, dofs: DofMap): { fixed: Uint8Array; springs: Float64Array | null } {
  const fixed = new Uint8Array(dofs.count);
  let springs: Float64Array | null = null;
  project.nodes.forEach((node, i) => {
    const where = `nodes[${i}] "${node.id}"`;
    for (const dir of parseFixed(node.fixed, where)) fixed[dofOf(dofs, i, dir)] = 1;
    if (!node.springs) return;
    DIRECTION_NAMES.forEach((name, dir) => {
      const k = node.springs?.[name];
      if (k === undefined) return;
      if (!(k >= 0 && Number.isFinite(k))) throw new Error(`${where}: springs.${name} must be a finite stiffness ≥ 0, got ${k}`);
      const d = dofOf(dofs, i, dir);
      if (fixed[d]) throw new Error(`${where}: springs.${name} is on a restrained direction; take that letter out of "fixed" or drop the spring`);
      springs ??= new Float64Array(dofs.count);
      springs[d] += k;
    });
  });
  return { fixed, springs };
}

/** Prescribed displacements of a load case as DOF / value pairs (m, rad). */
export function prescribedDisplacements(
  project: ProjectFile, dofs: DofMap, fixed: Uint8Array, spec: LoadCaseSpec,
): { dofs: Int32Array; values: Float64Array } | null {
  const list = spec.displacements ?? [];
  if (list.length === 0) return null;
  const nodeIndex = new Map(project.nodes.map((n, i) => [n.id, i] as const));
  const ds: number[] = [], vs: number[] = [];
  list.forEach((p, k) => {
    const where = `load case "${spec.id}": displacements[${k}]`;
    const i = nodeIndex.get(p.node);
    if (i === undefined) throw new Error(`${where}: node "${p.node}" does not exist`);
    DIRECTION_NAMES.forEach((name, dir) => {
      const v = p[name];
      if (v === undefined) return;
      const d = dofOf(dofs, i, dir);
      if (d < 0 || !fixed[d]) throw new Error(`${where}: node "${p.node}" is not restrained in ${name}; add ${name} to its "fixed" to prescribe it`);
      ds.push(d); vs.push(v);
    });
  });
  return { dofs: Int32Array.from(ds), values: Float64Array.from(vs) };
}

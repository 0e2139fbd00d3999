/**
 * What the 3D view draws besides members and nodes, from the project: panels (loops of nodes
 * carrying area loads, solver/project/actions-types.ts PanelSpec) and ancillaries (AncillarySpec:
 * point items at a node, line items along a group between two heights). Node references are
 * indices into SceneData's nodes; entries naming missing nodes or groups are left out (validation
 * reports them). Pure data; knows nothing of three.js.
 */
import type { ProjectFile } from '../../solver/index.ts';
import { membersOfGroup } from '../../solver/index.ts';

export interface AncillaryLine {
  id: string;
  /** User nodes of the group's members whose modelled height is within [from, to]. */
  nodes: Int32Array;
  /** Heights, m (z of the project file). */
  from: number;
  to: number;
}

export interface ExtrasData {
  /** Panel k's corners are panelNodes[panelOffsets[k] .. panelOffsets[k + 1]). */
  panelOffsets: Int32Array;
  panelNodes: Int32Array;
  /** Node of each point ancillary. */
  pointNodes: Int32Array;
  lines: AncillaryLine[];
}

export function buildExtrasData(project: ProjectFile, nodeIds: readonly string[]): ExtrasData {
  const index = new Map(nodeIds.map((id, i) => [id, i]));
  const offsets = [0];
  const corners: number[] = [];
  for (const panel of project.panels ?? []) {
    const loop = panel.nodes.map((id) => index.get(id));
    if (loop.length < 3 || loop.some((i) => i === undefined)) continue;
    corners.push(...(loop as number[]));
    offsets.push(corners.length);
  }
  const points: number[] = [];
  const lines: AncillaryLine[] = [];
  for (const a of project.ancillaries ?? []) {
    if (a.node !== undefined) {
      const i = index.get(a.node);
      if (i !== undefined) points.push(i);
      continue;
    }
    if (!a.along) continue;
    const members = membersOfGroup(project, a.along.group);
    const lo = Math.min(a.along.from, a.along.to), hi = Math.max(a.along.from, a.along.to);
    const nodes = new Set<number>();
    for (const m of project.members) {
      if (!members.has(m.id)) continue;
      for (const id of [m.from, m.to]) {
        const i = index.get(id);
        const z = i === undefined ? NaN : project.nodes[i].at[2];
        if (i !== undefined && z >= lo - 1e-9 && z <= hi + 1e-9) nodes.add(i);
      }
    }
    if (nodes.size) lines.push({ id: a.id, nodes: Int32Array.from(nodes), from: lo, to: hi });
  }
  return { panelOffsets: Int32Array.from(offsets), panelNodes: Int32Array.from(corners), pointNodes: Int32Array.from(points), lines };
}

/** Vertices (3 per triangle) of the panels' surfaces: each panel a fan of triangles from its corners' mean. */
export function panelVertexCount(data: ExtrasData): number {
  return 3 * data.panelNodes.length;
}

/**
 * Triangle vertices of every panel at the displayed node `positions` (m), relative to `origin`,
 * into `out` (≥ 3 × panelVertexCount floats). Returns the number of vertices written.
 */
export function writePanelTriangles(data: ExtrasData, positions: Float64Array, origin: readonly number[], out: Float32Array): number {
  let v = 0;
  const put = (x: number, y: number, z: number) => { out[3 * v] = x - origin[0]; out[3 * v + 1] = y - origin[1]; out[3 * v + 2] = z - origin[2]; v++; };
  for (let k = 0; k + 1 < data.panelOffsets.length; k++) {
    const a = data.panelOffsets[k], b = data.panelOffsets[k + 1];
    let cx = 0, cy = 0, cz = 0;
    for (let c = a; c < b; c++) { const i = data.panelNodes[c]; cx += positions[3 * i]; cy += positions[3 * i + 1]; cz += positions[3 * i + 2]; }
    cx /= b - a; cy /= b - a; cz /= b - a;
    for (let c = a; c < b; c++) {
      const i = data.panelNodes[c], j = data.panelNodes[c + 1 < b ? c + 1 : a];
      put(cx, cy, cz);
      put(positions[3 * i], positions[3 * i + 1], positions[3 * i + 2]);
      put(positions[3 * j], positions[3 * j + 1], positions[3 * j + 2]);
    }
  }
  return v;
}

/** Plan centroid (x, y, m) of a line ancillary's nodes at the displayed positions. */
export function lineCentre(line: AncillaryLine, positions: Float64Array): [number, number] {
  let x = 0, y = 0;
  for (const i of line.nodes) { x += positions[3 * i]; y += positions[3 * i + 1]; }
  return [x / line.nodes.length, y / line.nodes.length];
}

/**
 * The drawn model as a few long-lived three.js objects, updated in place. Knows nothing of the
 * WebGL renderer, Vue or Pinia (so it runs in Node for tests).
 *
 * Materials are created once, with the drawing, and live as long as it does. Geometry is built
 * again only when the topology changes (node or member ids, or a buffer outgrows its room);
 * otherwise a new SceneData (another case, colour mode, deformation scale, a live re-solve, a
 * frame of a mode animation) is written into the existing BufferAttribute arrays and marked
 * `needsUpdate`, so the GPU buffers are refilled and no shader program is compiled or linked.
 *
 * Drawing: cables as 1-px line segments coloured per vertex, slack members dashed in their own
 * colour, bars and beams as instanced cylinders, nodes as screen-size points, pinned supports
 * (x, y, z restrained) as pyramids under the node, partly restrained ones as flat rings. In colour
 * mode 'checks' nodes that fail a check are large red points drawn over everything. Coordinates
 * are relative to `origin` (the model centre when the topology was built), z up.
 *
 * Objects with nothing to draw stay visible with an empty draw range, so their shader programs
 * are compiled with the first frame (or Viewer3D's warm-up), not at the first selection or the
 * first slack member.
 */
import * as THREE from 'three';
import { allocateLineBuffers, fillLineBuffers, modelCentre, segmentCounts, type LineBuffers, type SegmentBuffer } from './line-buffers.ts';
import type { SceneData } from './scene-data.ts';
import { CHECK_FAIL_COLOUR, SELECTED_COLOUR } from './colour-scale.ts';

/** Every material of the drawing (one each, for its lifetime). */
export interface DrawingMaterials {
  taut: THREE.LineBasicMaterial;
  slack: THREE.LineDashedMaterial;
  bar: THREE.MeshLambertMaterial;
  node: THREE.PointsMaterial;
  failed: THREE.PointsMaterial;
  pinned: THREE.MeshLambertMaterial;
  partial: THREE.MeshLambertMaterial;
  grid: THREE.LineBasicMaterial;
  selectedLine: THREE.LineBasicMaterial;
  selectedNode: THREE.PointsMaterial;
}

/** Counters a test (or the benchmark) reads: how often geometry was built and how often filled in place. */
export interface DrawingStats {
  rebuilds: number;
  inPlaceUpdates: number;
}

const UP = new THREE.Vector3(0, 1, 0);

function sameIds(a: readonly string[], b: readonly string[]): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function sameBytes(a: Uint8Array, b: Uint8Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

export class ModelDrawing {
  /** The model (members, nodes, supports, ground). */
  readonly content = new THREE.Group();
  /** Selection highlight, drawn over the model. */
  readonly overlay = new THREE.Group();
  readonly materials: DrawingMaterials;
  readonly stats: DrawingStats = { rebuilds: 0, inPlaceUpdates: 0 };
  data: SceneData | null = null;
  buffers: LineBuffers | null = null;
  /** Diagonal of the nodes' bounding box when the topology was built, m (10 without nodes). */
  extent = 10;

  private taut: THREE.LineSegments | null = null;
  private slack: THREE.LineSegments | null = null;
  private bars: THREE.InstancedMesh | null = null;
  private nodes: THREE.Points | null = null;
  private failed: THREE.Points | null = null;
  private pinned: THREE.InstancedMesh | null = null;
  private partial: THREE.InstancedMesh | null = null;
  private supportPattern: Uint8Array = new Uint8Array(0);
  private ground: THREE.LineSegments | null = null;
  private selectedLines: THREE.LineSegments | null = null;
  private selectedNodes: THREE.Points | null = null;
  private barRadius = 0.02;

  constructor() {
    this.materials = {
      taut: new THREE.LineBasicMaterial({ vertexColors: true }),
      slack: new THREE.LineDashedMaterial({ vertexColors: true, dashSize: 0.1, gapSize: 0.07 }),
      bar: new THREE.MeshLambertMaterial({ color: 0xffffff }),
      node: new THREE.PointsMaterial({ color: 0xaab4c4, size: 3, sizeAttenuation: false }),
      failed: new THREE.PointsMaterial({ color: new THREE.Color(...CHECK_FAIL_COLOUR), size: 14, sizeAttenuation: false, depthTest: false, transparent: true }),
      pinned: new THREE.MeshLambertMaterial({ color: 0x5fc48a }),
      partial: new THREE.MeshLambertMaterial({ color: 0xf0a35c }),
      grid: new THREE.LineBasicMaterial({ vertexColors: true, toneMapped: false }),
      selectedLine: new THREE.LineBasicMaterial({ color: new THREE.Color(...SELECTED_COLOUR), depthTest: false, transparent: true }),
      selectedNode: new THREE.PointsMaterial({ color: 0xffffff, size: 11, sizeAttenuation: false, depthTest: false, transparent: true }),
    };
  }

  /**
   * Draw `data`. Returns true when geometry was built (new topology), false when the existing
   * buffers were refilled in place.
   */
  update(data: SceneData): boolean {
    const previous = this.data;
    const sameTopology = previous !== null && this.buffers !== null
      && sameIds(previous.nodeIds, data.nodeIds) && sameIds(previous.memberIds, data.memberIds);
    this.data = data;
    if (sameTopology && fillLineBuffers(data, this.buffers!)) {
      this.refresh(data);
      this.stats.inPlaceUpdates++;
      return false;
    }
    this.build(data);
    this.stats.rebuilds++;
    return true;
  }

  /** Highlight selected nodes and members (indices into the SceneData drawn), in place. */
  setSelection(nodes: readonly number[], members: readonly number[]): void {
    const data = this.data, buffers = this.buffers;
    if (!data || !buffers || !this.selectedLines || !this.selectedNodes) return;
    const selected = new Set(members);
    const lineAttr = this.selectedLines.geometry.getAttribute('position') as THREE.BufferAttribute;
    const out = lineAttr.array as Float32Array;
    let n = 0;
    if (selected.size) {
      for (const buf of [buffers.taut, buffers.slack, buffers.bars]) {
        for (let s = 0; s < buf.segmentCount; s++) {
          if (!selected.has(buf.segmentMember[s]) || 6 * (n + 1) > out.length) continue;
          for (let k = 0; k < 6; k++) out[6 * n + k] = buf.positions[6 * s + k];
          n++;
        }
      }
    }
    this.selectedLines.geometry.setDrawRange(0, 2 * n);
    lineAttr.needsUpdate = n > 0;
    const nodeAttr = this.selectedNodes.geometry.getAttribute('position') as THREE.BufferAttribute;
    const p = nodeAttr.array as Float32Array;
    const [ox, oy, oz] = buffers.origin;
    let k = 0;
    for (const i of nodes) {
      if (i < 0 || 3 * i >= data.nodePositions.length || 3 * (k + 1) > p.length) continue;
      p[3 * k] = data.nodePositions[3 * i] - ox;
      p[3 * k + 1] = data.nodePositions[3 * i + 1] - oy;
      p[3 * k + 2] = data.nodePositions[3 * i + 2] - oz;
      k++;
    }
    this.selectedNodes.geometry.setDrawRange(0, k);
    nodeAttr.needsUpdate = k > 0;
  }

  /** Lowest node elevation drawn, relative to the origin (0 without nodes). */
  groundLevel(): number {
    const data = this.data;
    if (!data || !this.buffers) return 0;
    let zMin = Infinity;
    for (let i = 2; i < data.nodePositions.length; i += 3) zMin = Math.min(zMin, data.nodePositions[i]);
    return Number.isFinite(zMin) ? zMin - this.buffers.origin[2] : 0;
  }

  /** The objects drawn now (for tests: the same objects must survive an in-place update). */
  objects(): { taut: THREE.LineSegments | null; slack: THREE.LineSegments | null; bars: THREE.InstancedMesh | null; nodes: THREE.Points | null } {
    return { taut: this.taut, slack: this.slack, bars: this.bars, nodes: this.nodes };
  }

  dispose(): void {
    this.disposeGeometry();
    for (const m of Object.values(this.materials)) (m as THREE.Material).dispose();
  }

  // --- building (new topology) -------------------------------------------------------------

  private build(data: SceneData): void {
    this.disposeGeometry();
    const origin = modelCentre(data);
    const counts = segmentCounts(data);
    // Room for every segment in each buffer, so any split into taut / slack / bars fits later.
    const capacity = Math.max(1, counts[0] + counts[1] + counts[2]);
    this.buffers = allocateLineBuffers(capacity, origin);
    fillLineBuffers(data, this.buffers);
    this.extent = extentOf(data.nodePositions);
    this.barRadius = this.extent * 0.0022;
    this.materials.slack.dashSize = this.extent / 120;
    this.materials.slack.gapSize = this.extent / 160;
    const n = data.nodeIds.length;
    this.materials.node.size = n > 5000 ? 2 : n > 100 ? 3 : 5;

    this.taut = lineObject(this.buffers.taut, this.materials.taut, false);
    this.slack = lineObject(this.buffers.slack, this.materials.slack, true);
    this.bars = new THREE.InstancedMesh(new THREE.CylinderGeometry(1, 1, 1, 6, 1, true), this.materials.bar, capacity);
    this.bars.instanceColor = new THREE.InstancedBufferAttribute(new Float32Array(3 * capacity), 3);
    this.bars.frustumCulled = false;
    const nodeGeometry = new THREE.BufferGeometry();
    nodeGeometry.setAttribute('position', new THREE.BufferAttribute(new Float32Array(Math.max(3, 3 * n)), 3));
    this.nodes = new THREE.Points(nodeGeometry, this.materials.node);
    this.nodes.frustumCulled = false;
    const failedGeometry = new THREE.BufferGeometry();
    failedGeometry.setAttribute('position', new THREE.BufferAttribute(new Float32Array(Math.max(3, 3 * n)), 3));
    this.failed = new THREE.Points(failedGeometry, this.materials.failed);
    this.failed.renderOrder = 9;
    this.failed.frustumCulled = false;
    this.content.add(this.taut, this.slack, this.bars, this.nodes, this.failed);

    const selGeometry = new THREE.BufferGeometry();
    selGeometry.setAttribute('position', new THREE.BufferAttribute(new Float32Array(6 * capacity), 3));
    this.selectedLines = new THREE.LineSegments(selGeometry, this.materials.selectedLine);
    this.selectedLines.renderOrder = 10;
    this.selectedLines.frustumCulled = false;
    const selNodes = new THREE.BufferGeometry();
    selNodes.setAttribute('position', new THREE.BufferAttribute(new Float32Array(Math.max(3, 3 * n)), 3));
    this.selectedNodes = new THREE.Points(selNodes, this.materials.selectedNode);
    this.selectedNodes.renderOrder = 11;
    this.selectedNodes.frustumCulled = false;
    this.overlay.add(this.selectedLines, this.selectedNodes);
    this.setSelection([], []);

    this.ground = this.makeGround();
    this.content.add(this.ground);
    this.refresh(data);
  }

  // --- filling (same topology) -------------------------------------------------------------

  private refresh(data: SceneData): void {
    const buffers = this.buffers!;
    for (const [obj, buf] of [[this.taut!, buffers.taut], [this.slack!, buffers.slack]] as const) {
      obj.geometry.setDrawRange(0, 2 * buf.segmentCount);
      (obj.geometry.getAttribute('position') as THREE.BufferAttribute).needsUpdate = true;
      (obj.geometry.getAttribute('color') as THREE.BufferAttribute).needsUpdate = true;
    }
    writeLineDistances(this.slack!, buffers.slack);
    this.writeBars(buffers.bars);
    this.writePoints(this.nodes!, data.nodePositions, null);
    const showFailed = data.colour === 'checks' && data.failedNodes.length > 0;
    this.writePoints(this.failed!, data.nodePositions, showFailed ? data.failedNodes : new Int32Array(0));
    this.writeSupports(data);
    if (this.ground) this.ground.position.z = this.groundLevel();
  }

  private writeBars(buf: SegmentBuffer): void {
    const mesh = this.bars!;
    const a = new THREE.Vector3(), b = new THREE.Vector3(), d = new THREE.Vector3(), s = new THREE.Vector3();
    const q = new THREE.Quaternion();
    const m = new THREE.Matrix4();
    const c = new THREE.Color();
    const p = buf.positions;
    for (let i = 0; i < buf.segmentCount; i++) {
      a.set(p[6 * i], p[6 * i + 1], p[6 * i + 2]);
      b.set(p[6 * i + 3], p[6 * i + 4], p[6 * i + 5]);
      const len = a.distanceTo(b);
      q.setFromUnitVectors(UP, d.subVectors(b, a).normalize());
      s.set(this.barRadius, len, this.barRadius);
      m.compose(a.add(b).multiplyScalar(0.5), q, s);
      mesh.setMatrixAt(i, m);
      mesh.setColorAt(i, c.setRGB(buf.colours[6 * i], buf.colours[6 * i + 1], buf.colours[6 * i + 2]));
    }
    mesh.count = buf.segmentCount;
    mesh.instanceMatrix.needsUpdate = true;
    if (mesh.instanceColor) mesh.instanceColor.needsUpdate = true;
  }

  /** Positions of `indices` (all nodes when null) into a Points object's existing array. */
  private writePoints(points: THREE.Points, positions: Float64Array, indices: Int32Array | null): void {
    const attr = points.geometry.getAttribute('position') as THREE.BufferAttribute;
    const out = attr.array as Float32Array;
    const [ox, oy, oz] = this.buffers!.origin;
    const count = indices ? indices.length : positions.length / 3;
    for (let k = 0; k < count; k++) {
      const i = indices ? indices[k] : k;
      out[3 * k] = positions[3 * i] - ox;
      out[3 * k + 1] = positions[3 * i + 1] - oy;
      out[3 * k + 2] = positions[3 * i + 2] - oz;
    }
    points.geometry.setDrawRange(0, count);
    attr.needsUpdate = true;
  }

  private writeSupports(data: SceneData): void {
    if (!this.pinned && !this.partial || !sameBytes(this.supportPattern, data.nodeSupport)) this.buildSupports(data);
    const [ox, oy, oz] = this.buffers!.origin;
    const size = this.extent * 0.018;
    const m = new THREE.Matrix4();
    for (const [mesh, level, dz] of [[this.pinned, 2, size / 2], [this.partial, 1, size * 0.2]] as const) {
      if (!mesh) continue;
      let k = 0;
      for (let i = 0; i < data.nodeSupport.length; i++) {
        if (data.nodeSupport[i] !== level) continue;
        mesh.setMatrixAt(k++, m.makeTranslation(data.nodePositions[3 * i] - ox, data.nodePositions[3 * i + 1] - oy, data.nodePositions[3 * i + 2] - oz - dz));
      }
      mesh.instanceMatrix.needsUpdate = true;
    }
  }

  /** Support markers change with the restraints entered (an edit), not with results. */
  private buildSupports(data: SceneData): void {
    for (const mesh of [this.pinned, this.partial]) {
      if (!mesh) continue;
      this.content.remove(mesh);
      mesh.geometry.dispose();
      mesh.dispose();
    }
    this.pinned = this.partial = null;
    this.supportPattern = data.nodeSupport.slice();
    let pinned = 0, partial = 0;
    for (const level of data.nodeSupport) { if (level === 2) pinned++; else if (level === 1) partial++; }
    const size = this.extent * 0.018;
    if (pinned) {
      // A four-sided pyramid with its tip at the node (the cone axis is y; turn it to z, tip up).
      const cone = new THREE.ConeGeometry(size * 0.6, size, 4).rotateX(Math.PI / 2).rotateX(Math.PI);
      this.pinned = new THREE.InstancedMesh(cone, this.materials.pinned, pinned);
      this.pinned.frustumCulled = false;
      this.content.add(this.pinned);
    }
    if (partial) {
      this.partial = new THREE.InstancedMesh(new THREE.TorusGeometry(size * 0.45, size * 0.12, 6, 16), this.materials.partial, partial);
      this.partial.frustumCulled = false;
      this.content.add(this.partial);
    }
  }

  /** A square grid in the x–y plane (lines every power of ten), at the lowest node. */
  private makeGround(): THREE.LineSegments {
    const step = Math.pow(10, Math.floor(Math.log10(this.extent / 4)));
    const divisions = Math.min(200, Math.max(4, Math.round((this.extent * 1.2) / step)));
    const grid = new THREE.GridHelper(divisions * step, divisions, 0x3a4658, 0x2a3444);
    (grid.material as THREE.Material).dispose();
    grid.material = this.materials.grid;
    grid.rotateX(Math.PI / 2);
    grid.position.set(0, 0, this.groundLevel());
    return grid;
  }

  private disposeGeometry(): void {
    for (const group of [this.content, this.overlay]) {
      for (const child of [...group.children]) {
        group.remove(child);
        (child as THREE.Mesh).geometry?.dispose();
        if (child instanceof THREE.InstancedMesh) child.dispose();
      }
    }
    this.taut = this.slack = this.nodes = this.failed = this.selectedNodes = null;
    this.bars = this.pinned = this.partial = null;
    this.selectedLines = this.ground = null;
    this.supportPattern = new Uint8Array(0);
  }
}

function lineObject(buf: SegmentBuffer, material: THREE.Material, dashed: boolean): THREE.LineSegments {
  const g = new THREE.BufferGeometry();
  g.setAttribute('position', new THREE.BufferAttribute(buf.positions, 3));
  g.setAttribute('color', new THREE.BufferAttribute(buf.colours, 3));
  if (dashed) g.setAttribute('lineDistance', new THREE.BufferAttribute(new Float32Array(buf.positions.length / 3), 1));
  const lines = new THREE.LineSegments(g, material);
  lines.frustumCulled = false;
  return lines;
}

/** Dash parameter per vertex: 0 at a segment's start, its length at its end (what computeLineDistances gives LineSegments). */
function writeLineDistances(lines: THREE.LineSegments, buf: SegmentBuffer): void {
  const attr = lines.geometry.getAttribute('lineDistance') as THREE.BufferAttribute;
  const d = attr.array as Float32Array;
  const p = buf.positions;
  for (let s = 0; s < buf.segmentCount; s++) {
    const o = 6 * s;
    d[2 * s] = 0;
    d[2 * s + 1] = Math.hypot(p[o + 3] - p[o], p[o + 4] - p[o + 1], p[o + 5] - p[o + 2]);
  }
  attr.needsUpdate = true;
}

/** Diagonal of the nodes' bounding box, m (at least 1; 10 without nodes). */
export function extentOf(positions: Float64Array): number {
  if (positions.length === 0) return 10;
  const lo = [Infinity, Infinity, Infinity], hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i += 3) {
    for (let k = 0; k < 3; k++) { lo[k] = Math.min(lo[k], positions[i + k]); hi[k] = Math.max(hi[k], positions[i + k]); }
  }
  return Math.max(1, Math.hypot(hi[0] - lo[0], hi[1] - lo[1], hi[2] - lo[2]));
}

/**
 * The 3D view: owns the WebGLRenderer, scene and camera, draws SceneData with a handful of merged
 * objects (never one mesh per member) and renders on demand. Knows nothing of Vue or Pinia.
 *
 * Axes: z up (as the project file). Drawing: cables as 1-px line segments coloured per vertex,
 * slack members dashed in their own colour, bars as instanced cylinders, nodes as screen-size
 * points, pinned supports (x, y, z restrained) as cones under the node, partly restrained supports
 * as flat rings. Selection is an overlay drawn on top. In colour mode 'checks' nodes that fail a
 * check are large red points drawn over everything (one Points object for all of them).
 */
import * as THREE from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import { buildLineBuffers, type LineBuffers, type SegmentBuffer } from './line-buffers.ts';
import { pickAt, type PickHit } from './pick.ts';
import type { SceneData } from './scene-data.ts';
import { CHECK_FAIL_COLOUR, SELECTED_COLOUR } from './colour-scale.ts';
import type { LoadArrows } from './load-arrows.ts';

const LOAD_COLOUR = 0xff9f43;
const WIND_COLOUR = 0x7fd4ff;

const BACKGROUND = 0x1b2330;

export class Viewer3D {
  private readonly renderer: THREE.WebGLRenderer;
  private readonly scene = new THREE.Scene();
  private readonly camera = new THREE.PerspectiveCamera(40, 1, 0.1, 1e5);
  private readonly controls: OrbitControls;
  private readonly content = new THREE.Group();
  private readonly overlay = new THREE.Group();
  /** Load arrows and the wind arrow; their materials live as long as the viewer. */
  private readonly loads = new THREE.Group();
  private readonly loadLineMaterial = new THREE.LineBasicMaterial({ color: LOAD_COLOUR, depthTest: false, transparent: true });
  private readonly loadHeadMaterial = new THREE.MeshBasicMaterial({ color: LOAD_COLOUR, depthTest: false, transparent: true });
  private readonly windMaterial = new THREE.MeshBasicMaterial({ color: WIND_COLOUR, transparent: true, opacity: 0.85 });
  private data: SceneData | null = null;
  private buffers: LineBuffers | null = null;
  private extent = 10;
  private frame = 0;
  private readonly resizeObserver: ResizeObserver;

  constructor(private readonly canvas: HTMLCanvasElement) {
    this.renderer = new THREE.WebGLRenderer({ canvas, antialias: true, preserveDrawingBuffer: true });
    this.renderer.setPixelRatio(Math.min(2, window.devicePixelRatio || 1));
    this.scene.background = new THREE.Color(BACKGROUND);
    this.camera.up.set(0, 0, 1);
    this.camera.position.set(30, -40, 25);
    this.scene.add(new THREE.HemisphereLight(0xffffff, 0x445566, 1.1));
    const sun = new THREE.DirectionalLight(0xffffff, 0.9);
    sun.position.set(1, -2, 3);
    this.scene.add(sun);
    this.scene.add(this.content, this.overlay, this.loads);
    this.controls = new OrbitControls(this.camera, canvas);
    this.controls.enableDamping = false;
    this.controls.screenSpacePanning = true;
    this.controls.addEventListener('change', () => this.requestRender());
    this.resizeObserver = new ResizeObserver(() => this.resize());
    if (canvas.parentElement) this.resizeObserver.observe(canvas.parentElement);
    this.resize();
  }

  /** Replace what is drawn. `keepView` keeps the camera (re-colouring after a run). */
  setScene(data: SceneData, keepView = true): void {
    const first = this.data === null;
    this.data = data;
    this.clearGroup(this.content);
    this.buffers = buildLineBuffers(data);
    this.extent = this.computeExtent(data);
    this.content.add(this.makeLines(this.buffers.taut, false));
    this.content.add(this.makeLines(this.buffers.slack, true));
    const bars = this.makeBars(this.buffers.bars);
    if (bars) this.content.add(bars);
    this.content.add(this.makeNodes(data));
    const failed = this.makeFailedNodes(data);
    if (failed) this.content.add(failed);
    for (const s of this.makeSupports(data)) this.content.add(s);
    this.content.add(this.makeGround(data));
    if (first || !keepView) this.fit();
    this.requestRender();
  }

  /** Highlight selected nodes and members (indices into SceneData). */
  setSelection(nodes: readonly number[], members: readonly number[]): void {
    this.clearGroup(this.overlay);
    const data = this.data;
    const buffers = this.buffers;
    if (!data || !buffers) return;
    const selected = new Set(members);
    const pts: number[] = [];
    for (const buf of [buffers.taut, buffers.slack, buffers.bars]) {
      for (let s = 0; s < buf.segmentCount; s++) {
        if (selected.has(buf.segmentMember[s])) for (let k = 0; k < 6; k++) pts.push(buf.positions[6 * s + k]);
      }
    }
    if (pts.length) {
      const g = new THREE.BufferGeometry();
      g.setAttribute('position', new THREE.Float32BufferAttribute(pts, 3));
      const mat = new THREE.LineBasicMaterial({ color: new THREE.Color(...SELECTED_COLOUR), depthTest: false, transparent: true });
      const lines = new THREE.LineSegments(g, mat);
      lines.renderOrder = 10;
      this.overlay.add(lines);
    }
    if (nodes.length) {
      const [ox, oy, oz] = buffers.origin;
      const p = new Float32Array(3 * nodes.length);
      nodes.forEach((i, k) => {
        p[3 * k] = data.nodePositions[3 * i] - ox;
        p[3 * k + 1] = data.nodePositions[3 * i + 1] - oy;
        p[3 * k + 2] = data.nodePositions[3 * i + 2] - oz;
      });
      const g = new THREE.BufferGeometry();
      g.setAttribute('position', new THREE.BufferAttribute(p, 3));
      const mat = new THREE.PointsMaterial({ color: 0xffffff, size: 11, sizeAttenuation: false, depthTest: false, transparent: true });
      const points = new THREE.Points(g, mat);
      points.renderOrder = 11;
      this.overlay.add(points);
    }
    this.requestRender();
  }

  /**
   * Draw the loads of the shown case: nodal forces as arrows ending at their node (shaft and
   * head), the wind as a flat arrow on the ground on the upwind side pointing where the air flows.
   */
  setLoads(arrows: LoadArrows | null): void {
    this.clearGroup(this.loads, false);
    const origin = this.buffers?.origin;
    if (!arrows || !origin) { this.requestRender(); return; }
    const [ox, oy, oz] = origin;
    if (arrows.count) {
      const pts = new Float32Array(6 * arrows.count);
      const head = this.extent * 0.012;
      const heads = new THREE.InstancedMesh(new THREE.ConeGeometry(head * 0.45, head, 8), this.loadHeadMaterial, arrows.count);
      const up = new THREE.Vector3(0, 1, 0), dir = new THREE.Vector3(), q = new THREE.Quaternion(), m = new THREE.Matrix4(), at = new THREE.Vector3(), one = new THREE.Vector3(1, 1, 1);
      for (let k = 0; k < arrows.count; k++) {
        const t = [arrows.tails[3 * k] - ox, arrows.tails[3 * k + 1] - oy, arrows.tails[3 * k + 2] - oz];
        const h = [arrows.tips[3 * k] - ox, arrows.tips[3 * k + 1] - oy, arrows.tips[3 * k + 2] - oz];
        pts.set([...t, ...h], 6 * k);
        dir.set(h[0] - t[0], h[1] - t[1], h[2] - t[2]).normalize();
        q.setFromUnitVectors(up, dir);
        at.set(h[0], h[1], h[2]).addScaledVector(dir, -head / 2);
        heads.setMatrixAt(k, m.compose(at, q, one));
      }
      const g = new THREE.BufferGeometry();
      g.setAttribute('position', new THREE.BufferAttribute(pts, 3));
      const shafts = new THREE.LineSegments(g, this.loadLineMaterial);
      shafts.renderOrder = 8;
      heads.renderOrder = 8;
      shafts.frustumCulled = false;
      heads.frustumCulled = false;
      this.loads.add(shafts, heads);
    }
    if (arrows.wind && this.data) {
      const a = (arrows.wind.direction * Math.PI) / 180;
      const d = new THREE.Vector2(Math.cos(a), Math.sin(a));
      const r = this.extent * 0.55;
      let zMin = Infinity;
      for (let i = 2; i < this.data.nodePositions.length; i += 3) zMin = Math.min(zMin, this.data.nodePositions[i]);
      const len = this.extent * 0.22, w = len * 0.18;
      const shape = new THREE.Shape();
      shape.moveTo(0, -w / 2); shape.lineTo(len * 0.65, -w / 2); shape.lineTo(len * 0.65, -w * 1.2); shape.lineTo(len, 0);
      shape.lineTo(len * 0.65, w * 1.2); shape.lineTo(len * 0.65, w / 2); shape.lineTo(0, w / 2); shape.closePath();
      const mesh = new THREE.Mesh(new THREE.ShapeGeometry(shape), this.windMaterial);
      mesh.position.set(-d.x * (r + len), -d.y * (r + len), (Number.isFinite(zMin) ? zMin : 0) - oz + this.extent * 0.002);
      mesh.rotation.z = a;
      mesh.frustumCulled = false;
      this.loads.add(mesh);
    }
    this.requestRender();
  }

  /** Frame the whole model (its nodes and member polylines; the ground grid does not count). */
  fit(): void {
    const box = new THREE.Box3();
    const v = new THREE.Vector3();
    for (const buf of this.buffers ? [this.buffers.taut, this.buffers.slack, this.buffers.bars] : []) {
      for (let i = 0; i < buf.positions.length; i += 3) box.expandByPoint(v.set(buf.positions[i], buf.positions[i + 1], buf.positions[i + 2]));
    }
    if (this.data && this.buffers) {
      const [ox, oy, oz] = this.buffers.origin;
      const p = this.data.nodePositions;
      for (let i = 0; i < p.length; i += 3) box.expandByPoint(v.set(p[i] - ox, p[i + 1] - oy, p[i + 2] - oz));
    }
    if (box.isEmpty()) return;
    const centre = box.getCenter(new THREE.Vector3());
    const radius = Math.max(1e-3, box.getSize(new THREE.Vector3()).length() / 2);
    const distance = (radius / Math.sin(THREE.MathUtils.degToRad(this.camera.fov / 2))) * 1.1;
    const dir = new THREE.Vector3(0.75, -1, 0.55).normalize();
    this.camera.position.copy(centre).addScaledVector(dir, distance);
    this.camera.near = Math.max(distance / 1000, 0.01);
    this.camera.far = distance * 20;
    this.camera.updateProjectionMatrix();
    this.controls.target.copy(centre);
    this.controls.update();
    this.requestRender();
  }

  /** What is under the pixel (x, y) of the canvas (CSS px from its top-left), or null. */
  pick(x: number, y: number): PickHit | null {
    if (!this.data || !this.buffers) return null;
    this.camera.updateMatrixWorld();
    const vp = new THREE.Matrix4().multiplyMatrices(this.camera.projectionMatrix, this.camera.matrixWorldInverse);
    const [ox, oy, oz] = this.buffers.origin;
    const nodes = new Float32Array(this.data.nodePositions.length);
    for (let i = 0; i < nodes.length; i += 3) {
      nodes[i] = this.data.nodePositions[i] - ox;
      nodes[i + 1] = this.data.nodePositions[i + 1] - oy;
      nodes[i + 2] = this.data.nodePositions[i + 2] - oz;
    }
    const rect = this.canvas.getBoundingClientRect();
    return pickAt({ viewProjection: vp.elements, width: rect.width, height: rect.height, nodes, segments: [this.buffers.taut, this.buffers.slack, this.buffers.bars] }, x, y);
  }

  requestRender(): void {
    if (this.frame) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = 0;
      this.renderer.render(this.scene, this.camera);
    });
  }

  dispose(): void {
    cancelAnimationFrame(this.frame);
    this.resizeObserver.disconnect();
    this.controls.dispose();
    this.clearGroup(this.content);
    this.clearGroup(this.overlay);
    this.clearGroup(this.loads, false);
    for (const m of [this.loadLineMaterial, this.loadHeadMaterial, this.windMaterial]) m.dispose();
    this.renderer.dispose();
  }

  private resize(): void {
    const parent = this.canvas.parentElement;
    const w = Math.max(1, parent?.clientWidth ?? this.canvas.clientWidth);
    const h = Math.max(1, parent?.clientHeight ?? this.canvas.clientHeight);
    this.renderer.setSize(w, h, true);
    this.camera.aspect = w / h;
    this.camera.updateProjectionMatrix();
    this.requestRender();
  }

  private computeExtent(data: SceneData): number {
    const box = new THREE.Box3();
    const v = new THREE.Vector3();
    for (let i = 0; i < data.nodePositions.length; i += 3) box.expandByPoint(v.set(data.nodePositions[i], data.nodePositions[i + 1], data.nodePositions[i + 2]));
    return box.isEmpty() ? 10 : Math.max(1, box.getSize(v).length());
  }

  private makeLines(buf: SegmentBuffer, dashed: boolean): THREE.LineSegments {
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(buf.positions, 3));
    g.setAttribute('color', new THREE.BufferAttribute(buf.colours, 3));
    const mat = dashed
      ? new THREE.LineDashedMaterial({ vertexColors: true, dashSize: this.extent / 120, gapSize: this.extent / 160 })
      : new THREE.LineBasicMaterial({ vertexColors: true });
    const lines = new THREE.LineSegments(g, mat);
    if (dashed) lines.computeLineDistances();
    lines.frustumCulled = false;
    return lines;
  }

  private makeBars(buf: SegmentBuffer): THREE.InstancedMesh | null {
    if (buf.segmentCount === 0) return null;
    const radius = this.extent * 0.0022;
    const geom = new THREE.CylinderGeometry(1, 1, 1, 6, 1, true);
    const mat = new THREE.MeshLambertMaterial({ color: 0xffffff });
    const mesh = new THREE.InstancedMesh(geom, mat, buf.segmentCount);
    const a = new THREE.Vector3();
    const b = new THREE.Vector3();
    const up = new THREE.Vector3(0, 1, 0);
    const q = new THREE.Quaternion();
    const s = new THREE.Vector3();
    const mtx = new THREE.Matrix4();
    const c = new THREE.Color();
    for (let i = 0; i < buf.segmentCount; i++) {
      const p = buf.positions;
      a.set(p[6 * i], p[6 * i + 1], p[6 * i + 2]);
      b.set(p[6 * i + 3], p[6 * i + 4], p[6 * i + 5]);
      const len = a.distanceTo(b);
      q.setFromUnitVectors(up, b.clone().sub(a).normalize());
      s.set(radius, len, radius);
      mtx.compose(a.add(b).multiplyScalar(0.5), q, s);
      mesh.setMatrixAt(i, mtx);
      mesh.setColorAt(i, c.setRGB(buf.colours[6 * i], buf.colours[6 * i + 1], buf.colours[6 * i + 2]));
    }
    mesh.frustumCulled = false;
    return mesh;
  }

  private makeNodes(data: SceneData): THREE.Points {
    const [ox, oy, oz] = this.buffers!.origin;
    const p = new Float32Array(data.nodePositions.length);
    for (let i = 0; i < p.length; i += 3) {
      p[i] = data.nodePositions[i] - ox;
      p[i + 1] = data.nodePositions[i + 1] - oy;
      p[i + 2] = data.nodePositions[i + 2] - oz;
    }
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(p, 3));
    const size = data.nodeIds.length > 5000 ? 2 : data.nodeIds.length > 100 ? 3 : 5;
    return new THREE.Points(g, new THREE.PointsMaterial({ color: 0xaab4c4, size, sizeAttenuation: false }));
  }

  private makeFailedNodes(data: SceneData): THREE.Points | null {
    if (data.colour !== 'checks' || data.failedNodes.length === 0) return null;
    const [ox, oy, oz] = this.buffers!.origin;
    const p = new Float32Array(3 * data.failedNodes.length);
    data.failedNodes.forEach((i, k) => {
      p[3 * k] = data.nodePositions[3 * i] - ox;
      p[3 * k + 1] = data.nodePositions[3 * i + 1] - oy;
      p[3 * k + 2] = data.nodePositions[3 * i + 2] - oz;
    });
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(p, 3));
    const mat = new THREE.PointsMaterial({ color: new THREE.Color(...CHECK_FAIL_COLOUR), size: 14, sizeAttenuation: false, depthTest: false, transparent: true });
    const points = new THREE.Points(g, mat);
    points.renderOrder = 9;
    points.frustumCulled = false;
    return points;
  }

  private makeSupports(data: SceneData): THREE.Object3D[] {
    const [ox, oy, oz] = this.buffers!.origin;
    const pinned: number[] = [];
    const partial: number[] = [];
    data.nodeSupport.forEach((level, i) => (level === 2 ? pinned : level === 1 ? partial : null)?.push(i));
    const size = this.extent * 0.018;
    const out: THREE.Object3D[] = [];
    const place = (indices: number[], geom: THREE.BufferGeometry, colour: number, dz: number) => {
      if (!indices.length) return;
      const mesh = new THREE.InstancedMesh(geom, new THREE.MeshLambertMaterial({ color: colour }), indices.length);
      const m = new THREE.Matrix4();
      indices.forEach((i, k) => {
        m.makeTranslation(data.nodePositions[3 * i] - ox, data.nodePositions[3 * i + 1] - oy, data.nodePositions[3 * i + 2] - oz - dz);
        mesh.setMatrixAt(k, m);
      });
      mesh.frustumCulled = false;
      out.push(mesh);
    };
    // Pinned: a four-sided pyramid with its tip at the node (the cone axis is y; turn it to z).
    const cone = new THREE.ConeGeometry(size * 0.6, size, 4).rotateX(Math.PI / 2).rotateX(Math.PI);
    place(pinned, cone, 0x5fc48a, size / 2);
    // Partly restrained: a flat ring in the x–y plane under the node.
    const ring = new THREE.TorusGeometry(size * 0.45, size * 0.12, 6, 16);
    place(partial, ring, 0xf0a35c, size * 0.2);
    return out;
  }

  private makeGround(data: SceneData): THREE.GridHelper {
    const [ox, oy, oz] = this.buffers!.origin;
    let zMin = Infinity;
    for (let i = 2; i < data.nodePositions.length; i += 3) zMin = Math.min(zMin, data.nodePositions[i]);
    if (!Number.isFinite(zMin)) zMin = 0;
    const step = Math.pow(10, Math.floor(Math.log10(this.extent / 4)));
    const divisions = Math.min(200, Math.max(4, Math.round((this.extent * 1.2) / step)));
    const grid = new THREE.GridHelper(divisions * step, divisions, 0x3a4658, 0x2a3444);
    grid.rotateX(Math.PI / 2);
    grid.position.set(0, 0, zMin - oz);
    void ox; void oy;
    return grid;
  }

  /** Remove and dispose a group's objects (their geometry; their materials too unless `materials` is false: shared ones). */
  private clearGroup(group: THREE.Group, materials = true): void {
    for (const child of [...group.children]) {
      group.remove(child);
      const obj = child as THREE.Mesh;
      obj.geometry?.dispose();
      if (!materials) continue;
      const mat = obj.material as THREE.Material | THREE.Material[] | undefined;
      if (Array.isArray(mat)) mat.forEach((mm) => mm.dispose());
      else mat?.dispose();
    }
  }
}

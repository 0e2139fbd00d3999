/**
 * The 3D view: owns the WebGLRenderer, scene and camera, draws SceneData through a ModelDrawing
 * (a handful of merged objects, never one mesh per member, updated in place while the topology
 * stays the same) and renders on demand. Knows nothing of Vue or Pinia. Axes: z up (as the
 * project file).
 */
import * as THREE from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import { pickAt, type PickHit } from './pick.ts';
import type { SceneData } from './scene-data.ts';
import type { LoadArrows } from './load-arrows.ts';
import { ModelDrawing } from './model-drawing.ts';
import { ExtrasDrawing } from './extras-drawing.ts';
import type { ExtrasData } from './extras-data.ts';

const LOAD_COLOUR = 0xff9f43;
const WIND_COLOUR = 0x7fd4ff;

const BACKGROUND = 0x1b2330;

export class Viewer3D {
  private readonly renderer: THREE.WebGLRenderer;
  private readonly scene = new THREE.Scene();
  private readonly camera = new THREE.PerspectiveCamera(40, 1, 0.1, 1e5);
  private readonly controls: OrbitControls;
  private readonly drawing = new ModelDrawing();
  /** Panels and ancillaries. */
  private readonly extras = new ExtrasDrawing();
  private extrasData: ExtrasData | null = null;
  /** Load arrows and the wind arrow; their materials live as long as the viewer. */
  private readonly loads = new THREE.Group();
  private readonly loadLineMaterial = new THREE.LineBasicMaterial({ color: LOAD_COLOUR, depthTest: false, transparent: true });
  private readonly loadHeadMaterial = new THREE.MeshBasicMaterial({ color: LOAD_COLOUR, depthTest: false, transparent: true });
  private readonly windMaterial = new THREE.MeshBasicMaterial({ color: WIND_COLOUR, transparent: true, opacity: 0.85 });
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
    this.scene.add(this.drawing.content, this.extras.group, this.drawing.overlay, this.loads);
    this.controls = new OrbitControls(this.camera, canvas);
    this.controls.enableDamping = false;
    this.controls.screenSpacePanning = true;
    this.controls.addEventListener('change', () => this.requestRender());
    this.resizeObserver = new ResizeObserver(() => this.resize());
    if (canvas.parentElement) this.resizeObserver.observe(canvas.parentElement);
    this.resize();
  }

  /** Draw `data`: in place while the topology is the same. `keepView` keeps the camera. */
  setScene(data: SceneData, keepView = true): void {
    const first = this.drawing.data === null;
    this.drawing.update(data);
    this.drawExtras();
    if (first || !keepView) this.fit();
    if (first) this.warmUp();
    this.requestRender();
  }

  /** Panels and ancillaries of the project (drawn at the positions of the scene). */
  setExtras(extras: ExtrasData | null): void {
    this.extrasData = extras;
    this.drawExtras();
    this.requestRender();
  }

  private drawExtras(): void {
    const { data, buffers, extent } = this.drawing;
    this.extras.group.visible = Boolean(this.extrasData && data && buffers);
    if (this.extrasData && data && buffers) this.extras.update(this.extrasData, data, buffers.origin, extent);
  }

  /** Counters of the drawing: geometry builds and in-place updates. */
  get drawingStats(): { rebuilds: number; inPlaceUpdates: number } {
    return { ...this.drawing.stats };
  }

  /** Highlight selected nodes and members (indices into SceneData). */
  setSelection(nodes: readonly number[], members: readonly number[]): void {
    this.drawing.setSelection(nodes, members);
    this.requestRender();
  }

  /**
   * Draw the loads of the shown case: nodal forces as arrows ending at their node (shaft and
   * head), the wind as a flat arrow on the ground on the upwind side pointing where the air flows.
   */
  setLoads(arrows: LoadArrows | null): void {
    this.clearGroup(this.loads);
    const origin = this.drawing.buffers?.origin;
    if (!arrows || !origin) { this.requestRender(); return; }
    const [ox, oy, oz] = origin;
    if (arrows.count) {
      const pts = new Float32Array(6 * arrows.count);
      const head = this.drawing.extent * 0.012;
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
    if (arrows.wind && this.drawing.data) {
      const a = (arrows.wind.direction * Math.PI) / 180;
      const d = new THREE.Vector2(Math.cos(a), Math.sin(a));
      const r = this.drawing.extent * 0.55;
      const len = this.drawing.extent * 0.22, w = len * 0.18;
      const shape = new THREE.Shape();
      shape.moveTo(0, -w / 2); shape.lineTo(len * 0.65, -w / 2); shape.lineTo(len * 0.65, -w * 1.2); shape.lineTo(len, 0);
      shape.lineTo(len * 0.65, w * 1.2); shape.lineTo(len * 0.65, w / 2); shape.lineTo(0, w / 2); shape.closePath();
      const mesh = new THREE.Mesh(new THREE.ShapeGeometry(shape), this.windMaterial);
      mesh.position.set(-d.x * (r + len), -d.y * (r + len), this.drawing.groundLevel() + this.drawing.extent * 0.002);
      mesh.rotation.z = a;
      mesh.frustumCulled = false;
      this.loads.add(mesh);
    }
    this.requestRender();
  }

  /**
   * Compile every shader program the view can need (members, overlay, supports, loads, wind,
   * panels, ancillaries) once, with the first scene: stand-ins for the objects not drawn yet are
   * added, compiled with the real lights and removed. Programs live as long as their materials
   * (the viewer's), so no interaction compiles or links one later.
   */
  private warmUp(): void {
    const line = new THREE.BufferGeometry();
    line.setAttribute('position', new THREE.BufferAttribute(new Float32Array(6), 3));
    const tri = new THREE.BufferGeometry();
    tri.setAttribute('position', new THREE.BufferAttribute(new Float32Array(9), 3));
    const cone = new THREE.ConeGeometry(1, 1, 4);
    const box = new THREE.BoxGeometry(1, 1, 1);
    const standIns = [
      new THREE.LineSegments(line, this.loadLineMaterial),
      new THREE.InstancedMesh(cone, this.loadHeadMaterial, 1),
      new THREE.Mesh(tri, this.windMaterial),
      new THREE.Mesh(tri, this.extras.panelMaterial),
      new THREE.InstancedMesh(box, this.extras.ancillaryMaterial, 1),
      new THREE.InstancedMesh(cone, this.drawing.materials.pinned, 1),
      new THREE.InstancedMesh(box, this.drawing.materials.partial, 1),
    ];
    const holder = new THREE.Group();
    holder.add(...standIns);
    this.scene.add(holder);
    const extrasVisible = this.extras.group.visible;
    this.extras.group.visible = true;
    try {
      this.renderer.compile(this.scene, this.camera);
    } finally {
      this.extras.group.visible = extrasVisible;
      this.scene.remove(holder);
      for (const g of [line, tri, cone, box]) g.dispose();
      for (const o of standIns) if (o instanceof THREE.InstancedMesh) o.dispose();
    }
  }

  /** Frame the whole model (its nodes and member polylines; the ground grid does not count). */
  fit(): void {
    const box = new THREE.Box3();
    const v = new THREE.Vector3();
    const { buffers, data } = this.drawing;
    for (const buf of buffers ? [buffers.taut, buffers.slack, buffers.bars] : []) {
      for (let i = 0; i < 6 * buf.segmentCount; i += 3) box.expandByPoint(v.set(buf.positions[i], buf.positions[i + 1], buf.positions[i + 2]));
    }
    if (data && buffers) {
      const [ox, oy, oz] = buffers.origin;
      const p = data.nodePositions;
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
    const { buffers, data } = this.drawing;
    if (!data || !buffers) return null;
    this.camera.updateMatrixWorld();
    const vp = new THREE.Matrix4().multiplyMatrices(this.camera.projectionMatrix, this.camera.matrixWorldInverse);
    const [ox, oy, oz] = buffers.origin;
    const nodes = new Float32Array(data.nodePositions.length);
    for (let i = 0; i < nodes.length; i += 3) {
      nodes[i] = data.nodePositions[i] - ox;
      nodes[i + 1] = data.nodePositions[i + 1] - oy;
      nodes[i + 2] = data.nodePositions[i + 2] - oz;
    }
    const rect = this.canvas.getBoundingClientRect();
    return pickAt({ viewProjection: vp.elements, width: rect.width, height: rect.height, nodes, segments: [buffers.taut, buffers.slack, buffers.bars] }, x, y);
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
    this.drawing.dispose();
    this.extras.dispose();
    this.clearGroup(this.loads);
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

  /** Remove a group's objects and dispose their geometry (materials are shared and live with the viewer). */
  private clearGroup(group: THREE.Group): void {
    for (const child of [...group.children]) {
      group.remove(child);
      (child as THREE.Mesh).geometry?.dispose();
      if (child instanceof THREE.InstancedMesh) child.dispose();
    }
  }
}

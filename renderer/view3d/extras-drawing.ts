/**
 * Panels and ancillaries in the 3D view, updated in place like ModelDrawing: panels as one
 * translucent mesh (fans of triangles, both sides, drawn without writing depth so members stay
 * visible through them); ancillaries as one instanced box mesh — a cube beside the node of a
 * point item, a slender vertical box over the height range of a line item, placed at the plan
 * centroid of its group's nodes in that range. Materials are made once; geometry again only when
 * the panels or ancillaries (an ExtrasData object) change.
 */
import * as THREE from 'three';
import type { SceneData } from './scene-data.ts';
import { lineCentre, panelVertexCount, writePanelTriangles, type ExtrasData } from './extras-data.ts';

export const PANEL_COLOUR = 0x8fb8de;
export const ANCILLARY_COLOUR = 0xe8d35c;

export class ExtrasDrawing {
  readonly group = new THREE.Group();
  readonly panelMaterial = new THREE.MeshBasicMaterial({ color: PANEL_COLOUR, transparent: true, opacity: 0.2, side: THREE.DoubleSide, depthWrite: false });
  readonly ancillaryMaterial = new THREE.MeshLambertMaterial({ color: ANCILLARY_COLOUR });
  private extras: ExtrasData | null = null;
  private panels: THREE.Mesh | null = null;
  private items: THREE.InstancedMesh | null = null;
  rebuilds = 0;

  /** Draw `extras` at the positions of `scene` (relative to `origin`); `extent` sets the box sizes (m). */
  update(extras: ExtrasData, scene: SceneData, origin: readonly number[], extent: number): void {
    if (extras !== this.extras) this.build(extras);
    if (this.panels) {
      const attr = this.panels.geometry.getAttribute('position') as THREE.BufferAttribute;
      const n = writePanelTriangles(extras, scene.nodePositions, origin, attr.array as Float32Array);
      this.panels.geometry.setDrawRange(0, n);
      attr.needsUpdate = true;
    }
    if (this.items) this.placeItems(extras, scene.nodePositions, origin, extent);
  }

  dispose(): void {
    this.clear();
    this.panelMaterial.dispose();
    this.ancillaryMaterial.dispose();
  }

  private build(extras: ExtrasData): void {
    this.clear();
    this.extras = extras;
    this.rebuilds++;
    const vertices = panelVertexCount(extras);
    if (vertices) {
      const g = new THREE.BufferGeometry();
      g.setAttribute('position', new THREE.BufferAttribute(new Float32Array(3 * vertices), 3));
      this.panels = new THREE.Mesh(g, this.panelMaterial);
      this.panels.frustumCulled = false;
      this.panels.renderOrder = 2;
      this.group.add(this.panels);
    }
    const count = extras.pointNodes.length + extras.lines.length;
    if (count) {
      this.items = new THREE.InstancedMesh(new THREE.BoxGeometry(1, 1, 1), this.ancillaryMaterial, count);
      this.items.frustumCulled = false;
      this.group.add(this.items);
    }
  }

  private placeItems(extras: ExtrasData, p: Float64Array, origin: readonly number[], extent: number): void {
    const mesh = this.items!;
    const m = new THREE.Matrix4();
    const size = extent * 0.012;
    let k = 0;
    for (const i of extras.pointNodes) {
      // Beside the node (half a box out in x and y), so the node and its members stay visible.
      m.makeScale(size, size, size).setPosition(p[3 * i] - origin[0] + size, p[3 * i + 1] - origin[1] + size, p[3 * i + 2] - origin[2]);
      mesh.setMatrixAt(k++, m);
    }
    for (const line of extras.lines) {
      const [x, y] = lineCentre(line, p);
      const h = Math.max(line.to - line.from, size);
      m.makeScale(size * 0.35, size * 0.35, h).setPosition(x - origin[0] + size * 0.6, y - origin[1] + size * 0.6, (line.from + line.to) / 2 - origin[2]);
      mesh.setMatrixAt(k++, m);
    }
    mesh.instanceMatrix.needsUpdate = true;
  }

  private clear(): void {
    for (const child of [...this.group.children]) {
      this.group.remove(child);
      (child as THREE.Mesh).geometry.dispose();
      if (child instanceof THREE.InstancedMesh) child.dispose();
    }
    this.panels = null;
    this.items = null;
    this.extras = null;
  }
}

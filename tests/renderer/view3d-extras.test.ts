/**
 * Panels, ancillaries and the wind of derived cases in the 3D view's data (no WebGL): a panel's
 * fan of triangles covers exactly the panel (area of a planar square = side², elementary
 * geometry); ancillaries sit at their node or over their height range; a wind-direction case
 * (solver windDirectionCases) shows its own turned wind; the extras drawing is filled in place.
 */
import { describe, expect, it } from 'vitest';
import * as THREE from 'three';
import type { ProjectFile } from '../../solver/index.ts';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { buildExtrasData, panelVertexCount, writePanelTriangles } from '../../renderer/view3d/extras-data.ts';
import { ExtrasDrawing } from '../../renderer/view3d/extras-drawing.ts';
import { caseSpecOf, loadArrows } from '../../renderer/view3d/load-arrows.ts';

const project: ProjectFile = {
  format: 'stayset-project', version: 2,
  nodes: [
    { id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [4, 0, 0], fixed: 'xyz' }, { id: 'C', at: [4, 4, 0], fixed: 'xyz' }, { id: 'D', at: [0, 4, 0], fixed: 'xyz' },
    { id: 'M1', at: [0, 0, 10] }, { id: 'M2', at: [0, 0, 20] },
  ],
  sections: [{ id: 's', E: 200e9, area: 1e-3, massPerLength: 8 }],
  members: [
    { id: 'AB', kind: 'cable', from: 'A', to: 'B', section: 's' }, { id: 'BC', kind: 'cable', from: 'B', to: 'C', section: 's' },
    { id: 'mast1', kind: 'bar', from: 'A', to: 'M1', section: 's' }, { id: 'mast2', kind: 'bar', from: 'M1', to: 'M2', section: 's' },
  ],
  groups: [{ id: 'mast', members: ['mast1', 'mast2'] }],
  loadCases: [{ id: 'wind', wind: { speed: 30, direction: 0 } }],
  panels: [{ id: 'P1', nodes: ['A', 'B', 'C', 'D'] }, { id: 'bad', nodes: ['A', 'B', 'nowhere'] }],
  ancillaries: [
    { id: 'dish', kind: 'dish', node: 'M2', dragArea: 1, mass: 50 },
    { id: 'feeder', kind: 'feeder', along: { group: 'mast', from: 5, to: 20 }, dragArea: 0.05, mass: 3 },
  ],
  windDirections: [{ id: 'dirs', case: 'wind', count: 6, azimuth: 0 }],
};

function triangleArea(v: Float32Array, t: number): number {
  const a = new THREE.Vector3(v[9 * t], v[9 * t + 1], v[9 * t + 2]);
  const b = new THREE.Vector3(v[9 * t + 3], v[9 * t + 4], v[9 * t + 5]);
  const c = new THREE.Vector3(v[9 * t + 6], v[9 * t + 7], v[9 * t + 8]);
  return b.sub(a).cross(c.sub(a)).length() / 2;
}

describe('extras of the 3D view', () => {
  const scene = buildSceneData(project, { result: null, deformationScale: 0, colour: 'tension' });
  const extras = buildExtrasData(project, scene.nodeIds);

  it('a panel is a fan of triangles whose areas add up to the panel; a panel naming a missing node is left out', () => {
    expect(extras.panelOffsets.length).toBe(2);
    const out = new Float32Array(3 * panelVertexCount(extras));
    const n = writePanelTriangles(extras, scene.nodePositions, [1, 1, 0], out);
    expect(n).toBe(12);
    let area = 0;
    for (let t = 0; t < n / 3; t++) area += triangleArea(out, t);
    expect(area).toBeCloseTo(16, 6); // 4 m × 4 m
  });

  it('ancillaries: a point item at its node, a line item over the group nodes within its heights', () => {
    expect(Array.from(extras.pointNodes)).toEqual([5]);
    expect(extras.lines).toHaveLength(1);
    expect(Array.from(extras.lines[0].nodes).sort()).toEqual([4, 5]); // M1 (10 m), M2 (20 m); A (0 m) is below 5 m
    expect([extras.lines[0].from, extras.lines[0].to]).toEqual([5, 20]);
  });

  it('the extras drawing keeps its objects when only positions change', () => {
    const d = new ExtrasDrawing();
    d.update(extras, scene, [0, 0, 0], 20);
    const objects = [...d.group.children];
    expect(objects).toHaveLength(2);
    const moved = { ...scene, nodePositions: scene.nodePositions.map((v, i) => v + (i % 3 === 2 ? 1 : 0)) };
    const attr = (objects[0] as THREE.Mesh).geometry.getAttribute('position') as THREE.BufferAttribute;
    const z0 = attr.array[2];
    d.update(extras, moved, [0, 0, 0], 20);
    expect([...d.group.children]).toEqual(objects);
    expect(attr.array[2]).toBeCloseTo(z0 + 1, 6);
    expect(d.rebuilds).toBe(1);
  });

  it('a wind-direction case shows its turned wind; a plain load case its own', () => {
    expect(caseSpecOf(project, 'dirs 120°')?.wind?.direction).toBe(120);
    expect(loadArrows(project, 'dirs 240°', scene.nodeIds, scene.nodePositions, 1).wind?.direction).toBe(240);
    expect(loadArrows(project, 'wind', scene.nodeIds, scene.nodePositions, 1).wind?.direction).toBe(0);
    expect(caseSpecOf(project, 'no such case')).toBeUndefined();
  });
});

/**
 * The 3D view's drawing is updated in place: another case, colour mode, deformation scale or
 * selection on the same model keeps every geometry, BufferAttribute array and material, and
 * rewrites the arrays (marked for upload); only a change of topology builds geometry again, and
 * even then the materials stay (so no shader program is compiled or linked again). Mode animation
 * frames (base + factor × φ, by the definition of a mode shape) go through the same in-place path.
 * Behaviour, not time.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import * as THREE from 'three';
import { buildModel, solveModes, solveProject, type ProjectFile } from '../../solver/index.ts';
import { buildSceneData, type SceneData } from '../../renderer/view3d/scene-data.ts';
import { ModelDrawing } from '../../renderer/view3d/model-drawing.ts';
import { frameBuffer, largestTranslation, modeFrame, readableAmplitude } from '../../renderer/view3d/mode-shape.ts';

const project = JSON.parse(readFileSync(new URL('../e2e/fixtures/demo-mast.stayset.json', import.meta.url), 'utf8')) as ProjectFile;
const solution = solveProject(project);
const model = buildModel(project);
const chains = model.members.map((m) => m.nodeChain);

function scene(caseIndex: number, colour: SceneData['colour'] = 'tension', scale = 20, p: ProjectFile = project): SceneData {
  const shape = p === project ? { fields: solution.fields[caseIndex], start: model.coords, chains } : null;
  return buildSceneData(p, { result: p === project ? solution.report.cases[caseIndex] : null, deformationScale: scale, colour, shape });
}

/** Every material reachable from the drawing's groups. */
function materialsIn(d: ModelDrawing): Set<THREE.Material> {
  const out = new Set<THREE.Material>();
  for (const g of [d.content, d.overlay]) {
    g.traverse((o) => {
      const m = (o as THREE.Mesh).material;
      if (Array.isArray(m)) m.forEach((x) => out.add(x));
      else if (m) out.add(m);
    });
  }
  return out;
}

function positionAttr(o: THREE.Object3D | null): THREE.BufferAttribute {
  return (o as THREE.Mesh).geometry.getAttribute('position') as THREE.BufferAttribute;
}

describe('ModelDrawing updates in place', () => {
  it('a second case on the same model reuses geometry, arrays and materials, and rewrites the arrays', () => {
    expect(solution.report.cases.length).toBeGreaterThanOrEqual(2);
    const d = new ModelDrawing();
    expect(d.update(scene(0))).toBe(true); // first drawing: built
    const first = d.objects();
    const taut = first.taut!;
    const attr = positionAttr(taut);
    const array = attr.array;
    const before = Float32Array.from(array);
    const colours = Float32Array.from((taut.geometry.getAttribute('color') as THREE.BufferAttribute).array);
    const nodeArray = positionAttr(first.nodes).array;
    const nodesBefore = Float32Array.from(nodeArray);
    const version = attr.version;
    const materials = materialsIn(d);

    expect(d.update(scene(1))).toBe(false);
    const second = d.objects();
    expect(second.taut).toBe(taut);
    expect(second.taut!.geometry).toBe(taut.geometry);
    expect(second.taut!.material).toBe(d.materials.taut);
    expect(second.slack).toBe(first.slack);
    expect(second.nodes).toBe(first.nodes);
    expect(positionAttr(second.taut).array).toBe(array);
    expect(positionAttr(second.nodes).array).toBe(nodeArray);
    // The arrays now hold the other case: the top load moves the nodes, and the tensions change the colours.
    expect(attr.version).toBeGreaterThan(version);
    expect(Array.from(array).some((v, i) => v !== before[i])).toBe(true);
    expect(Array.from(nodeArray).some((v, i) => v !== nodesBefore[i])).toBe(true);
    const coloursAfter = (taut.geometry.getAttribute('color') as THREE.BufferAttribute).array;
    expect(Array.from(coloursAfter).some((v, i) => v !== colours[i])).toBe(true);
    expect(materialsIn(d)).toEqual(materials);
    expect(d.stats).toEqual({ rebuilds: 1, inPlaceUpdates: 1 });
  });

  it('colour mode, deformation scale and selection change arrays only', () => {
    const d = new ModelDrawing();
    d.update(scene(1));
    const { taut } = d.objects();
    const materials = materialsIn(d);
    const colour = taut!.geometry.getAttribute('color') as THREE.BufferAttribute;
    const c0 = Float32Array.from(colour.array);
    expect(d.update(scene(1, 'checks'))).toBe(false);
    expect(d.objects().taut).toBe(taut);
    expect(Array.from(colour.array).some((v, i) => v !== c0[i])).toBe(true);
    const p0 = Float32Array.from(positionAttr(taut).array);
    expect(d.update(scene(1, 'checks', 0))).toBe(false);
    expect(Array.from(positionAttr(taut).array).some((v, i) => v !== p0[i])).toBe(true);

    // Selecting member 0 copies its segments into the overlay's existing array.
    const overlayLines = d.overlay.children.find((o) => o instanceof THREE.LineSegments) as THREE.LineSegments;
    const overlayArray = positionAttr(overlayLines).array;
    d.setSelection([0], [0]);
    const segs = d.data!.polyOffsets[1] - d.data!.polyOffsets[0] - 1;
    expect(overlayLines.geometry.drawRange.count).toBe(2 * segs);
    expect(positionAttr(overlayLines).array).toBe(overlayArray);
    d.setSelection([], []);
    expect(overlayLines.geometry.drawRange.count).toBe(0);
    expect(d.overlay.children.find((o) => o instanceof THREE.LineSegments)).toBe(overlayLines);
    expect(materialsIn(d)).toEqual(materials);
  });

  it('a new topology builds geometry again but keeps the materials', () => {
    const d = new ModelDrawing();
    d.update(scene(0));
    const { taut } = d.objects();
    const smaller: ProjectFile = { ...project, members: project.members.slice(1) };
    expect(d.update(scene(0, 'tension', 20, smaller))).toBe(true);
    expect(d.objects().taut).not.toBe(taut);
    expect(d.objects().taut!.material).toBe(d.materials.taut);
    const all = new Set<THREE.Material>(Object.values(d.materials));
    for (const m of materialsIn(d)) expect(all.has(m)).toBe(true);
    expect(d.stats.rebuilds).toBe(2);
  });
});

describe('mode animation frames', () => {
  const modes = solveModes(project, solution.report.cases[0].id, { count: 3 });
  if (!modes.modal.ok) throw new Error('the fixture must have modes');
  const input = { shape: modes.modal.fields.shapes[0], chains, modelNodes: model.coords.length / 3 };

  it('moves nodes and element points by factor × φ and scales the largest movement to a share of the model', () => {
    const base = scene(0);
    const out = frameBuffer(base);
    const f = 0.37;
    modeFrame(base, input, f, out);
    for (let i = 0; i < base.nodeIds.length; i++) {
      for (let k = 0; k < 3; k++) expect(out.nodePositions[3 * i + k]).toBeCloseTo(base.nodePositions[3 * i + k] + f * input.shape[3 * i + k], 12);
    }
    // Members drawn through their element chain follow φ at every element node.
    for (let j = 0; j < base.memberIds.length; j++) {
      const start = base.polyOffsets[j];
      expect(base.polyOffsets[j + 1] - start).toBe(chains[j].length);
      chains[j].forEach((node, p) => {
        for (let k = 0; k < 3; k++) expect(out.polyPoints[3 * (start + p) + k]).toBeCloseTo(base.polyPoints[3 * (start + p) + k] + f * input.shape[3 * node + k], 12);
      });
    }
    const a = readableAmplitude(input, 50, 0.06);
    expect(a * largestTranslation(input)).toBeCloseTo(3, 12);
  });

  it('frames are written into the drawing in place', () => {
    const d = new ModelDrawing();
    const base = scene(0);
    d.update(base);
    const { taut } = d.objects();
    const array = positionAttr(taut).array;
    const out = frameBuffer(base);
    const seen: number[] = [];
    for (let k = 0; k < 5; k++) {
      expect(d.update(modeFrame(base, input, readableAmplitude(input, 30) * Math.sin(k), out))).toBe(false);
      seen.push(array[3]);
    }
    expect(d.objects().taut).toBe(taut);
    expect(positionAttr(taut).array).toBe(array);
    expect(new Set(seen).size).toBeGreaterThan(1);
    expect(d.stats).toEqual({ rebuilds: 1, inPlaceUpdates: 5 });
  });
});

// Net generators make one panel per grid cell or bay, normals up, covering the net; re-running a
// generator replaces its panels and keeps the user's; the panels validate and carry area loads.
import { describe, expect, it } from 'vitest';
import { buildModel } from '../../../../solver/index.ts';
import type { GeneratorRecord, ProjectFile } from '../../../../solver/index.ts';
import { generatorNotesText, runGenerator } from '../../../../main/common/generators/index.ts';
import { validateProject } from '../../../../main/common/project/index.ts';
import { panelShares } from '../../../../solver/loads/panel-geometry.ts';
import { emptyProject, strand } from './fixtures.ts';

const saddle = (outline: 'rectangle' | 'ellipse'): GeneratorRecord => ({
  id: 'canopy', kind: 'saddleNet',
  params: {
    outline, lengthX: 20, lengthY: 14, spacing: 2, highPointHeight: 8, lowPointHeight: 2.5, netTension: 8e3,
    netCable: strand(0.012), edgeCable: strand(0.026), backstay: strand(0.026),
    mast: { E: 2.1e11, area: 3e-3, massPerLength: 24, diameter: 0.22 },
  },
});
const radial: GeneratorRecord = {
  id: 'roof', kind: 'radialNet',
  params: { outerRadius: 12, innerRadius: 2.5, radialCount: 10, outerHeight: 4, mastHeight: 11, radialTension: 15e3,
    radialCable: strand(0.014), ringCable: strand(0.02), hanger: strand(0.014), mast: { E: 2.1e11, area: 3e-3, massPerLength: 24 } },
};

/** Σ of each panel's vector area (z) and of its plan area, m². */
function areas(p: ProjectFile): { vectorZ: number; plan: number } {
  const model = buildModel(p);
  const index = new Map(model.nodeIds.map((id, i) => [id, i] as const));
  const out = new Float64Array(3 * 8);
  let vectorZ = 0, plan = 0;
  for (const panel of p.panels ?? []) {
    const nodes = panel.nodes.map((id) => index.get(id)!);
    panelShares(model.coords, nodes, 'vector', out);
    vectorZ += out.slice(0, 3 * nodes.length).reduce((s, v, i) => (i % 3 === 2 ? s + v : s), 0);
    plan += panelShares(model.coords, nodes, 'plan', out);
  }
  return { vectorZ, plan };
}

describe('panels made by the net generators', () => {
  it('saddle net over a rectangle: one quad per cell, every normal up (vector z-area = plan area)', () => {
    const p = runGenerator(emptyProject(), saddle('rectangle')).project;
    expect(p.panels).toHaveLength(10 * 8); // 20 m / 2 m = 10 bays; 14 m / 2 m = 7 → rounded to an even 8
    const a = areas(p);
    expect(a.vectorZ).toBeCloseTo(a.plan, 9);
    expect(validateProject(p).ok).toBe(true);
  });

  it('saddle net over an ellipse: cells cut by the outline become triangles', () => {
    const p = runGenerator(emptyProject(), saddle('ellipse')).project;
    const sizes = new Set(p.panels!.map((x) => x.nodes.length));
    expect([...sizes].sort()).toEqual([3, 4]);
    const a = areas(p);
    expect(a.vectorZ).toBeCloseTo(a.plan, 9);
  });

  it('radial net: one panel per bay between radials and rings, normals up', () => {
    const p = runGenerator(emptyProject(), radial).project;
    expect(p.panels).toHaveLength(10 * 3);
    const a = areas(p);
    expect(a.vectorZ).toBeCloseTo(a.plan, 9);
  });

  it('re-running replaces the generated panels and keeps the user panels', () => {
    const first = runGenerator(emptyProject(), saddle('rectangle')).project;
    first.panels!.push({ id: 'my panel', nodes: ['canopy/N9-0', 'canopy/N10-0', 'canopy/N10-1'] });
    const again = runGenerator(first, saddle('rectangle')).project;
    expect(again.panels).toHaveLength(10 * 8 + 1);
    expect(again.panels!.filter((x) => x.id === 'my panel')).toHaveLength(1);
    const coarser = runGenerator(first, { ...saddle('rectangle'), params: { ...saddle('rectangle').params, spacing: 4 } });
    // the coarser net (6 × 4 bays) no longer makes N9-0: the user panel's corners move to the nearest new nodes
    expect(generatorNotesText(coarser.notes, 'SI').some((n) => n.includes('panel "my panel"'))).toBe(true);
    expect(validateProject(coarser.project).ok).toBe(true);
  });

  it('regions follow a re-run by place: each new panel takes the region of the nearest old panel', () => {
    const first = runGenerator(emptyProject(), saddle('rectangle')).project;
    const at = new Map(first.nodes.map((n) => [n.id, n.at] as const));
    const cx = (p: { nodes: string[] }, m: Map<string, readonly number[]>) => p.nodes.reduce((s, id) => s + m.get(id)![0], 0) / p.nodes.length;
    for (const panel of first.panels!) panel.region = cx(panel, at) < 0 ? 'west' : 'east';
    const finer = runGenerator(first, { ...saddle('rectangle'), params: { ...saddle('rectangle').params, spacing: 1 } }).project;
    const newAt = new Map(finer.nodes.map((n) => [n.id, n.at] as const));
    for (const panel of finer.panels!) {
      const cx = panel.nodes.reduce((s, id) => s + newAt.get(id)![0], 0) / panel.nodes.length;
      if (Math.abs(cx) > 1.5) expect(panel.region).toBe(cx < 0 ? 'west' : 'east');
    }
  });
});

/**
 * Re-running generators with changed parameters: no orphan part is left, loads and checks follow
 * the new geometry (by role, place or pattern), the user's parts on removed generated parts are
 * listed and re-attached or dropped. References: the validator (every reference resolves), the
 * solver (every case converges, i.e. no mechanism), and statics (a spread nodal load keeps its total).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { GeneratorRecord, ProjectFile } from '../../../../solver/index.ts';
import { solveProject } from '../../../../solver/index.ts';
import { validateProject } from '../../../../main/common/project/index.ts';
import { fitGuyedMastLevels, generatorNotesText, reattachText, runGenerator, type GeneratorNote, type GuyedMastParams } from '../../../../main/common/generators/index.ts';
import { emptyProject, mastRecord } from './fixtures.ts';

/** The notes as the app words them in SI. */
const said = (notes: GeneratorNote[]) => generatorNotesText(notes, 'SI').join('\n');
const demo = (name: string) => JSON.parse(readFileSync(new URL(`../../../../assets/${name}`, import.meta.url), 'utf8')) as ProjectFile;
const valid = (p: ProjectFile) => expect((validateProject(p) as { errors?: string[] }).errors ?? []).toEqual([]);
const converges = (p: ProjectFile, cases?: string[]) => {
  const q = cases ? { ...p, loadCases: p.loadCases.filter((c) => cases.includes(c.id)), combinations: [] } : p;
  for (const c of solveProject(q).report.cases) expect({ id: c.id, status: c.status }).toEqual({ id: c.id, status: 'converged' });
};
/** Every node is on a member (a node on no member is a mechanism). */
const noOrphans = (p: ProjectFile) => {
  const used = new Set(p.members.flatMap((m) => [m.from, m.to]));
  expect(p.nodes.filter((n) => !used.has(n.id)).map((n) => n.id)).toEqual([]);
};

describe('demo mast re-run at 30 m with two guy levels', () => {
  const before = demo('demo-mast.stayset');
  const rec = before.generators![0];
  const params = fitGuyedMastLevels({ ...(rec.params as unknown as GuyedMastParams), height: 30, guyLevels: [15, 29] });
  const out = runGenerator(before, { ...rec, params: params as unknown as Record<string, unknown> });
  it('the per-level lists follow the two levels (the third guy size is dropped)', () => {
    expect((params.guy as unknown[]).length).toBe(2);
  });
  it('leaves no orphan node, validates and every case converges', () => {
    noOrphans(out.project);
    valid(out.project);
    expect(out.project.nodes.filter((n) => n.at[2] > 30.001)).toEqual([]);
    converges(out.project, ['dead', 'wind 90']);
  });
  it('the tilt and displacement checks follow the mast top; the uplift check stays on the base', () => {
    const top = out.project.nodes.filter((n) => n.id.startsWith('mast/P')).reduce((a, b) => (b.at[2] > a.at[2] ? b : a));
    expect(top.at[2]).toBeCloseTo(30, 6);
    expect(out.project.checks!.tiltLimits![0].top).toBe(top.id);
    expect(out.project.checks!.displacementLimits![0].node).toBe(top.id);
    expect(out.project.checks!.upliftNodes).toEqual(['mast/base']);
    expect(said(out.notes)).toMatch(/checks\.tiltLimits\[0\] top: node "mast\/P49a" → "mast\/P\d+a" \(mast top, moved 30\.000 m\)/);
    // the same note in US units: 30 m = 98.425 ft (1 ft = 0.3048 m, NIST SP 811)
    expect(generatorNotesText(out.notes, 'US').join('\n')).toMatch(/\(mast top, moved 98\.425 ft\)/);
  });
  it('a check on the removed third level group is dropped and said so', () => {
    const p = structuredClone(before);
    p.checks!.noSlackGroups = ['mast/guys', 'mast/guys level 3'];
    const o = runGenerator(p, { ...rec, params: params as unknown as Record<string, unknown> });
    expect(o.project.checks!.noSlackGroups).toEqual(['mast/guys']);
    expect(said(o.notes)).toContain('checks.noSlackGroups: group "mast/guys level 3" no longer exists: reference dropped');
    valid(o.project);
  });
});

describe('demo canopy re-run on a finer grid', () => {
  // The demo's snow is an area load on panels; here the snow is 300 N on every free net node, the
  // way a user enters it by hand, to see the nodal loads follow a finer grid.
  const before = demo('demo-canopy.stayset');
  const snowCase = before.loadCases.find((c) => c.id === 'snow')!;
  delete snowCase.areaLoads;
  snowCase.nodalLoads = before.nodes.filter((n) => /^canopy\/N\d+-\d+$/.test(n.id) && !n.fixed).map((n) => ({ node: n.id, force: [0, 0, -300] }));
  const rec = before.generators![0] as GeneratorRecord;
  const out = runGenerator(before, { ...rec, params: { ...rec.params, spacing: 1 } });
  const nodes = new Map(out.project.nodes.map((n) => [n.id, n]));
  it('the snow and covering are area loads on panels: the panels of the new grid cover the net, regions follow', () => {
    expect(out.project.loadCases.find((c) => c.id === 'snow')!.areaLoads).toEqual(before.loadCases.find((c) => c.id === 'snow')!.areaLoads);
    const net = out.project.nodes.filter((n) => /^canopy\/N\d+-\d+$/.test(n.id));
    const corners = new Set(out.project.panels!.flatMap((p) => p.nodes));
    expect(net.every((n) => corners.has(n.id))).toBe(true);
    expect(out.project.panels!.every((p) => p.nodes.every((id) => nodes.has(id)))).toBe(true);
    expect(new Set(out.project.panels!.map((p) => p.region))).toEqual(new Set(['west', 'east']));
  });
  it('validates, leaves no orphan and the snow case converges', () => {
    valid(out.project);
    noOrphans(out.project);
    converges(out.project, ['snow']);
  });
  it('a single load follows to the nearest free node by position', () => {
    const p = structuredClone(before);
    p.loadCases.push({ id: 'point', nodalLoads: [{ node: 'canopy/N3-2', force: [0, 0, -1000] }] });
    const at = p.nodes.find((n) => n.id === 'canopy/N3-2')!.at;
    const o = runGenerator(p, { ...rec, params: { ...rec.params, spacing: 1 } });
    const l = o.project.loadCases.find((c) => c.id === 'point')!.nodalLoads!;
    expect(l).toHaveLength(1);
    const to = o.project.nodes.find((n) => n.id === l[0].node)!;
    const d = Math.hypot(to.at[0] - at[0], to.at[1] - at[1], to.at[2] - at[2]);
    for (const n of o.project.nodes) if (!n.fixed && /N\d/.test(n.id)) expect(Math.hypot(n.at[0] - at[0], n.at[1] - at[1], n.at[2] - at[2])).toBeGreaterThanOrEqual(d - 1e-9);
    expect(said(o.notes)).toMatch(/load case "point" load: node "canopy\/N3-2" → "canopy\/N\d+-\d+" \(nearest free node/);
  });
});

describe('the user’s parts on removed generated parts', () => {
  const first = runGenerator(emptyProject(), mastRecord()).project;
  first.sections.push({ id: 'aerial', E: 2e11, area: 1e-4 });
  first.nodes.push({ id: 'dish', at: [1, 0, 29], fixed: 'y' });
  first.members.push({ id: 'bracket', kind: 'bar', from: 'mast/P30a', to: 'dish', section: 'aerial' });
  first.members.push({ id: 'stay', kind: 'bar', from: 'mast/P29a', to: 'dish', section: 'aerial' });
  first.groups!.push({ id: 'mine', members: ['bracket', 'mast/guy L2-1', 'mast/leg 30a'] });
  const smaller = mastRecord({ height: 28, guyLevels: [14, 28] });

  it('are listed with where they would be re-attached', () => {
    const { dangling } = runGenerator(first, smaller);
    expect(dangling.map((d) => `${d.entry} uses ${d.uses}`)).toEqual([
      'member "bracket" uses node "mast/P30a"', 'member "stay" uses node "mast/P29a"', 'group "mine" uses member "mast/leg 30a"',
    ]);
    expect(reattachText(dangling[0].reattachTo, 'SI')).toBe('node "mast/P28a" (2.000 m away)');
    expect(reattachText(dangling[0].reattachTo, 'US')).toBe('node "mast/P28a" (6.562 ft away)'); // 2 m / 0.3048 m per ft
    expect(reattachText(dangling[2].reattachTo, 'SI')).toBe('member "mast/leg 28a"');
  });
  it('re-attach: member ends go to the nearest new node; no old node is kept', () => {
    const { project: p, notes } = runGenerator(first, smaller, 'reattach');
    expect(p.members.find((m) => m.id === 'bracket')!.from).toBe('mast/P28a');
    expect(p.nodes.some((n) => n.id === 'mast/P30a' || n.id === 'mast/P29a')).toBe(false);
    expect(p.groups!.find((g) => g.id === 'mine')!.members).toEqual(['bracket', 'mast/guy L2-1', 'mast/leg 28a']);
    expect(said(notes)).toMatch(/member "bracket" from: node "mast\/P30a" → "mast\/P28a" \(mast top, moved 2\.000 m\)/);
    // "stay" does not take the same two nodes as "bracket": the next nearest node
    expect(p.members.find((m) => m.id === 'stay')!.from).toBe('mast/P28b'); // 1.12 m away, the next nearest
    valid(p);
    noOrphans(p);
    converges(p, ['dead']);
  });
  it('drop: the members go, and the node left without a member goes with them', () => {
    const { project: p, notes } = runGenerator(first, smaller, 'drop');
    expect(p.members.some((m) => m.id === 'bracket' || m.id === 'stay')).toBe(false);
    expect(p.nodes.some((n) => n.id === 'dish')).toBe(false);
    expect(p.groups!.find((g) => g.id === 'mine')!.members).toEqual(['mast/guy L2-1']);
    expect(said(notes)).toContain('node "dish": no member is left on it: removed');
    valid(p);
    noOrphans(p);
  });
});

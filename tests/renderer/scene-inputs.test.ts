/**
 * The 3D view keeps its scene and load arrows when an edit changes nothing drawn
 * (renderer/view3d/scene-inputs.ts). Checked against the behaviour it stands for: whenever the
 * inputs are called alike, buildSceneData and loadArrows give equal arrays for both; an edit of
 * what is drawn (a member's end, a nodal load, the colour by utilisation after a section edit)
 * is not called alike.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { ProjectFile, SolveReport } from '../../solver/index.ts';
import { solveProject } from '../../solver/index.ts';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { loadArrows } from '../../renderer/view3d/load-arrows.ts';
import { loadsDrawnAlike, membersDrawnAlike, sceneDrawnAlike, type LoadsInputs, type SceneInputs } from '../../renderer/view3d/scene-inputs.ts';

const demo = JSON.parse(readFileSync(new URL('../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;
let report: SolveReport;
beforeAll(() => {
  report = solveProject(demo).report;
});

const withPretension = (p: ProjectFile, factor: number): ProjectFile => ({
  ...p, members: p.members.map((m) => (m.pretension !== undefined && m.id === 'mast/guy L1-1' ? { ...m, pretension: m.pretension * factor } : m)),
});
const inputs = (project: ProjectFile, colour: SceneInputs['colour'] = 'tension'): SceneInputs => ({ project, result: report.cases[1], deformationScale: 20, colour });

describe('scene inputs drawn alike', () => {
  it('a pretension edit draws the same scene (tension and utilisation colours differ in what they read)', () => {
    const edited = withPretension(demo, 1.1);
    expect(membersDrawnAlike(demo.members, edited.members)).toBe(true);
    expect(sceneDrawnAlike(inputs(demo), inputs(edited))).toBe(true);
    expect(buildSceneData(edited, inputs(edited))).toEqual(buildSceneData(demo, inputs(demo)));
    // Utilisation reads the members' design data: any member edit counts there.
    expect(sceneDrawnAlike(inputs(demo, 'utilisation'), inputs(edited, 'utilisation'))).toBe(false);
  });

  it('a member end, a section under utilisation colours or another case is not drawn alike', () => {
    const j = demo.members.findIndex((m) => m.id === 'mast/guy L1-1');
    const other = demo.nodes.find((n) => n.id !== demo.members[j].from && n.id !== demo.members[j].to)!.id;
    const moved: ProjectFile = { ...demo, members: demo.members.map((m, k) => (k === j ? { ...m, to: other } : m)) };
    expect(sceneDrawnAlike(inputs(demo), inputs(moved))).toBe(false);
    expect(buildSceneData(moved, inputs(moved)).polyPoints).not.toEqual(buildSceneData(demo, inputs(demo)).polyPoints);
    const sections: ProjectFile = { ...demo, sections: demo.sections.map((s) => ({ ...s, breakingLoad: s.breakingLoad === undefined ? undefined : s.breakingLoad / 2 })) };
    expect(sceneDrawnAlike(inputs(demo, 'utilisation'), inputs(sections, 'utilisation'))).toBe(false);
    expect(buildSceneData(sections, inputs(sections, 'utilisation')).memberValue).not.toEqual(buildSceneData(demo, inputs(demo, 'utilisation')).memberValue);
    expect(sceneDrawnAlike(inputs(demo), { ...inputs(demo), result: report.cases[2] })).toBe(false);
  });

  it('load arrows: the same case loads at equal positions are alike; a changed nodal load is not', () => {
    const caseId = demo.loadCases.find((c) => c.nodalLoads?.length)?.id ?? demo.loadCases[0].id;
    const a = buildSceneData(demo, inputs(demo));
    const edited = withPretension(demo, 1.1);
    const b = buildSceneData(edited, inputs(edited));
    const li = (project: ProjectFile, positions: Float64Array): LoadsInputs => ({ project, caseId, show: true, positions, geometry: 1 });
    expect(b.nodePositions).not.toBe(a.nodePositions);
    expect(loadsDrawnAlike(li(demo, a.nodePositions), li(edited, b.nodePositions))).toBe(true);
    expect(loadArrows(edited, caseId, b.nodeIds, b.nodePositions, 1)).toEqual(loadArrows(demo, caseId, a.nodeIds, a.nodePositions, 1));
    const node = demo.nodes[demo.nodes.length - 1].id;
    const loaded: ProjectFile = { ...demo, loadCases: demo.loadCases.map((c) => (c.id === caseId ? { ...c, nodalLoads: [...(c.nodalLoads ?? []), { node, force: [1000, 0, 0] as [number, number, number] }] } : c)) };
    expect(loadsDrawnAlike(li(demo, a.nodePositions), li(loaded, a.nodePositions))).toBe(false);
    expect(loadArrows(loaded, caseId, a.nodeIds, a.nodePositions, 1)).not.toEqual(loadArrows(demo, caseId, a.nodeIds, a.nodePositions, 1));
    expect(loadsDrawnAlike(li(demo, a.nodePositions), { ...li(demo, a.nodePositions), geometry: 2 })).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import type { CaseResult, ProjectFile } from '../../solver/index.ts';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { buildLineBuffers } from '../../renderer/view3d/line-buffers.ts';
import { MemberState, SLACK_COLOUR, TENSION_STOPS, scaleColour } from '../../renderer/view3d/colour-scale.ts';
import { pickAt, pointSegmentDistance } from '../../renderer/view3d/pick.ts';

const project: ProjectFile = {
  format: 'stayset-project', version: 2,
  nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [10, 0, 0], fixed: 'z' }, { id: 'C', at: [0, 10, 0] }],
  sections: [{ id: 'S', E: 1e11, area: 1e-4, breakingLoad: 1000 }],
  members: [
    { id: 'C1', kind: 'cable', from: 'A', to: 'B', section: 'S', pretension: 100 },
    { id: 'C2', kind: 'cable', from: 'A', to: 'C', section: 'S', pretension: 100 },
    { id: 'B1', kind: 'bar', from: 'B', to: 'C', section: 'S' },
  ],
  loadCases: [{ id: 'L' }],
};
const mr = (id: string, t: number, slack = false, sag = 0) => ({ id, tensionMax: t, tensionMin: t, tensionStart: t, tensionEnd: t, slack, sag, chordLength: 10 });
const result: CaseResult = {
  id: 'L', converged: true, status: 'converged', slackMembers: ['C2'],
  nodes: [{ id: 'A', position: [0, 0, 0], displacement: [0, 0, 0] }, { id: 'B', position: [10, 0, -0.1], displacement: [0, 0, -0.1] }, { id: 'C', position: [0, 10, 0], displacement: [0, 0, 0] }],
  members: [mr('C1', 500, false, 0.2), mr('C2', 0, true), mr('B1', -50)],
  reactions: [], stats: { dofs: 9, iterations: 1, seconds: 0, loadSteps: 1, residual: 0 },
};

describe('3D view geometry from typed arrays', () => {
  it('draws the model as entered with straight members and support levels', () => {
    const d = buildSceneData(project, { result: null, deformationScale: 1, colour: 'tension' });
    expect(Array.from(d.nodeSupport)).toEqual([2, 1, 0]);
    expect(Array.from(d.polyOffsets)).toEqual([0, 2, 4, 6]);
    expect(Array.from(d.memberState)).toEqual([MemberState.NotAnalysed, MemberState.NotAnalysed, MemberState.NotAnalysed]);
  });

  it('applies the deformation scale and a parabolic sag with the reported mid-span value', () => {
    const d = buildSceneData(project, { result, deformationScale: 10, colour: 'tension', sagPoints: 9 });
    // Node B: z = 0 + 10 × (−0.1)
    expect(d.nodePositions[5]).toBeCloseTo(-1, 12);
    // Parabola y = 4 s t (1 − t) (closed form): at t = 0.5 the drop below the chord equals s.
    const mid = d.polyOffsets[0] + 4;
    const chordMidZ = (0 + -1) / 2;
    expect(d.polyPoints[3 * mid + 2]).toBeCloseTo(chordMidZ - 0.2 * 10, 12);
    expect(Array.from(d.memberState)).toEqual([MemberState.Tension, MemberState.Slack, MemberState.Compression]);
  });

  it('puts slack members in their own buffer with the slack colour, off the tension scale', () => {
    const d = buildSceneData(project, { result, deformationScale: 1, colour: 'tension' });
    const b = buildLineBuffers(d);
    expect(b.taut.segmentCount).toBe(8);
    expect(b.slack.segmentCount).toBe(1);
    expect(b.bars.segmentCount).toBe(1);
    expect(Array.from(b.slack.colours.slice(0, 3))).toEqual(SLACK_COLOUR.map((c) => Math.fround(c)));
    for (let t = 0; t <= 1; t += 0.05) {
      const c = scaleColour(t);
      expect(Math.hypot(c[0] - SLACK_COLOUR[0], c[1] - SLACK_COLOUR[1], c[2] - SLACK_COLOUR[2])).toBeGreaterThan(0.3);
    }
    // The only member in tension is at the top of the range: last stop of the scale.
    expect(b.taut.colours[0]).toBeCloseTo(TENSION_STOPS[2][0], 6);
  });

  it('colours by utilisation: design tension / design resistance (default limit-state basis)', () => {
    const d = buildSceneData(project, { result, deformationScale: 1, colour: 'utilisation' });
    // No designBasis in the project: limit-state format, F_Rd = k_e·MBL/(1.5·γ_R) with k_e = γ_R = 1
    // (solver/checks/basis-defaults.ts), so T = 0.5·MBL is a utilisation of 0.5·1.5 = 0.75.
    expect(d.memberValue[0]).toBeCloseTo(0.75, 12);
  });

  it('picks the nearest node, else the nearest member, in screen space', () => {
    const identity = [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1];
    // With the identity view-projection, x, y ∈ [−1, 1] map to a 200 × 200 canvas.
    const nodes = [0, 0, 0, 0.5, 0.5, 0];
    const segments = [{ positions: [-1, -0.5, 0, 1, -0.5, 0], segmentMember: [4], segmentCount: 1 }];
    expect(pickAt({ viewProjection: identity, width: 200, height: 200, nodes, segments }, 101, 99)).toMatchObject({ kind: 'node', index: 0 });
    expect(pickAt({ viewProjection: identity, width: 200, height: 200, nodes, segments }, 30, 152)).toMatchObject({ kind: 'member', index: 4 });
    expect(pickAt({ viewProjection: identity, width: 200, height: 200, nodes, segments }, 30, 30)).toBeNull();
    expect(pointSegmentDistance(0, 1, -1, 0, 1, 0)).toBe(1);
  });
});

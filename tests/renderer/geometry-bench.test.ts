/**
 * Benchmark: building the 3D view's geometry for a 20,000-member cable net (invented 100 × 100
 * grid) from a report, and the cost of one validated table edit at that size. Prints timings; the
 * bounds are generous so the test fails only on an order-of-magnitude regression.
 */
import { describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import type { CaseResult, MemberSpec, NodeSpec, ProjectFile } from '../../solver/index.ts';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { buildLineBuffers } from '../../renderer/view3d/line-buffers.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';

function net(n: number): { project: ProjectFile; result: CaseResult } {
  const nodes: NodeSpec[] = [];
  const members: MemberSpec[] = [];
  const id = (i: number, j: number) => `N${i}_${j}`;
  for (let i = 0; i <= n; i++) for (let j = 0; j <= n; j++) {
    const edge = i === 0 || j === 0 || i === n || j === n;
    nodes.push({ id: id(i, j), at: [i, j, 0.002 * (i - n / 2) ** 2 - 0.002 * (j - n / 2) ** 2], ...(edge ? { fixed: 'xyz' } : {}) });
  }
  for (let i = 0; i <= n; i++) for (let j = 0; j < n; j++) {
    members.push({ id: `X${i}_${j}`, kind: 'cable', from: id(j, i), to: id(j + 1, i), section: 'S', pretension: 5000 });
    members.push({ id: `Y${i}_${j}`, kind: 'cable', from: id(i, j), to: id(i, j + 1), section: 'S', pretension: 5000 });
  }
  const project: ProjectFile = { format: 'stayset-project', version: 1, nodes, members, sections: [{ id: 'S', E: 1.6e11, area: 1e-4, breakingLoad: 1e5 }], loadCases: [{ id: 'L' }] };
  const result: CaseResult = {
    id: 'L', converged: true, status: 'converged', slackMembers: [],
    nodes: nodes.map((nd) => ({ id: nd.id, position: nd.at, displacement: [0, 0, -0.01] })),
    members: members.map((m, k) => ({ id: m.id, tensionMax: 4000 + (k % 97) * 10, tensionMin: 3900, tensionStart: 4000, tensionEnd: 4000, slack: k % 501 === 0, sag: 0.01, chordLength: 1 })),
    reactions: [], stats: { dofs: 0, iterations: 0, seconds: 0, loadSteps: 0, residual: 0 },
  };
  return { project, result };
}

describe('20,000-member geometry', () => {
  const { project, result } = net(100); // 2 × 101 × 100 = 20,200 members
  it('builds scene data and merged line buffers quickly', () => {
    expect(project.members.length).toBeGreaterThanOrEqual(20000);
    const t0 = performance.now();
    const data = buildSceneData(project, { result, deformationScale: 10, colour: 'tension' });
    const t1 = performance.now();
    const buffers = buildLineBuffers(data);
    const t2 = performance.now();
    console.log(`20k members: scene data ${(t1 - t0).toFixed(0)} ms, line buffers ${(t2 - t1).toFixed(0)} ms, ${buffers.taut.segmentCount + buffers.slack.segmentCount} segments`);
    expect(buffers.slack.segmentCount).toBeGreaterThan(0);
    expect(t2 - t0).toBeLessThan(3000);
  });

  it('one validated table edit at 20,000 members', () => {
    setActivePinia(createPinia());
    const s = useProjectStore();
    s.load({ path: null, name: 'net', project });
    const t0 = performance.now();
    const r = s.updateRowsIn('members', [10], (m) => ({ ...m, pretension: 6000 }), 'p');
    const dt = performance.now() - t0;
    console.log(`20k members: validated edit ${dt.toFixed(0)} ms`);
    expect(r.ok).toBe(true);
    expect(dt).toBeLessThan(5000);
  });
});

/**
 * An invented square cable net for size tests: (n + 1)² nodes on a shallow saddle, edges pinned,
 * 2 n (n + 1) cables; plus a made-up result (tensions vary, every 501st member slack) for drawing.
 */
import type { CaseResult, MemberSpec, NodeSpec, ProjectFile } from '../../solver/index.ts';

export function net(n: number): { project: ProjectFile; result: CaseResult } {
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
  const project: ProjectFile = { format: 'stayset-project', version: 2, nodes, members, sections: [{ id: 'S', E: 1.6e11, area: 1e-4, breakingLoad: 1e5 }], loadCases: [{ id: 'L' }] };
  const result: CaseResult = {
    id: 'L', converged: true, status: 'converged', slackMembers: [],
    nodes: nodes.map((nd) => ({ id: nd.id, position: nd.at, displacement: [0, 0, -0.01] })),
    members: members.map((m, k) => ({ id: m.id, tensionMax: 4000 + (k % 97) * 10, tensionMin: 3900, tensionStart: 4000, tensionEnd: 4000, slack: k % 501 === 0, sag: 0.01, chordLength: 1 })),
    reactions: [], stats: { dofs: 0, iterations: 0, seconds: 0, loadSteps: 0, residual: 0 },
  };
  return { project, result };
}

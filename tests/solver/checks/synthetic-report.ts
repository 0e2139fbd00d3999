import type { CaseResult, MemberResult, NodeResult, ReactionResult, Vec3 } from '../../../solver/index.ts';

/** A hand-written case result (no solver) for testing post-processing arithmetic. */
export function caseResult(
  id: string,
  members: (Partial<MemberResult> & { id: string })[],
  nodes: { id: string; at: Vec3; u: Vec3 }[] = [],
  reactions: ReactionResult[] = [],
  converged = true,
): CaseResult {
  return {
    id, converged, status: converged ? 'converged' : 'maxIterations',
    slackMembers: members.filter((m) => m.slack).map((m) => m.id),
    members: members.map((m) => ({
      tensionMax: 0, tensionMin: 0, tensionStart: 0, tensionEnd: 0, slack: false, sag: 0, chordLength: 10, ...m,
    })),
    nodes: nodes.map((n): NodeResult => ({
      id: n.id, displacement: n.u, position: [n.at[0] + n.u[0], n.at[1] + n.u[1], n.at[2] + n.u[2]],
    })),
    reactions,
    stats: { dofs: 0, iterations: 1, seconds: 0, loadSteps: 1, residual: 0 },
  };
}

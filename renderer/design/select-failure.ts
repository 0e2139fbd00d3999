/**
 * What clicking a check failure does: select the failing member or node (both nodes of a tilt
 * check "base→top"), show its governing case, and colour the 3D view by check outcome.
 */
import type { CheckFailure, ProjectFile } from '../../solver/index.ts';

export interface FailureTarget {
  kind: 'member' | 'node' | null;
  ids: string[];
  caseId: string;
}

/** Member checks name a member, node checks a node, tilt "base→top", notConverged only a case. */
export function failureTarget(project: ProjectFile, f: CheckFailure): FailureTarget {
  if (f.kind === 'notConverged') return { kind: null, ids: [], caseId: f.case };
  if (f.kind === 'tilt') {
    const ids = f.id.split('→').filter((id) => project.nodes.some((n) => n.id === id));
    return { kind: 'node', ids, caseId: f.case };
  }
  const isMember = f.kind === 'utilisation' || f.kind === 'slack' || f.kind === 'sag';
  const table = isMember ? project.members : project.nodes;
  return { kind: isMember ? 'member' : 'node', ids: table.some((r) => r.id === f.id) ? [f.id] : [], caseId: f.case };
}

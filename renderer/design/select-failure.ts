/**
 * What clicking a check result does: select the failing member or node (both nodes of a tilt
 * check "base→top", every node of a twist set), show its governing case, and colour the 3D view
 * by check outcome.
 */
import type { CheckCode, CheckResult, ProjectFile } from '../../solver/index.ts';

export interface FailureTarget {
  kind: 'member' | 'node' | null;
  ids: string[];
  caseId: string;
}

const MEMBER_CODES: readonly CheckCode[] = ['cableResistance', 'cableServiceTension', 'minimumTension', 'slack', 'sag', 'barTension', 'barBuckling', 'beamColumn', 'slenderness'];

/** Member checks name a member, node checks a node, tilt "base→top", twist "a+b+…", notConverged only a case. */
export function failureTarget(project: ProjectFile, f: CheckResult): FailureTarget {
  if (f.code === 'notConverged') return { kind: null, ids: [], caseId: f.case };
  if (f.code === 'tilt' || f.code === 'twist') {
    const ids = f.item.split(f.code === 'tilt' ? '→' : '+').filter((id) => project.nodes.some((n) => n.id === id));
    return { kind: 'node', ids, caseId: f.case };
  }
  const isMember = MEMBER_CODES.includes(f.code);
  const table = isMember ? project.members : project.nodes;
  return { kind: isMember ? 'member' : 'node', ids: table.some((r) => r.id === f.item) ? [f.item] : [], caseId: f.case };
}

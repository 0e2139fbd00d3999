/**
 * Small beam projects for the verification tests (invented dimensions, steel-like values).
 */
import type { LoadCaseSpec, MemberSpec, NodeSpec, ProjectFile, SectionSpec, Vec3 } from '../../../solver/index.ts';

export const E = 210e9, G = 81e9;

/** A section with A, Iy = Iz = I and J = 2I (a round section), stiff in axial unless A is given. */
export function roundSection(id: string, I: number, A: number): SectionSpec {
  return { id, E, G, area: A, Iy: I, Iz: I, J: 2 * I };
}

export function beamProject(nodes: NodeSpec[], members: MemberSpec[], sections: SectionSpec[], loadCases: LoadCaseSpec[]): ProjectFile {
  return { format: 'stayset-project', version: 1, nodes, sections, members, loadCases };
}

/** Nodes on a straight line a → b (n + 1 nodes "N0" … "Nn"), with per-node offsets. */
export function lineNodes(a: Vec3, b: Vec3, n: number, offset: (t: number) => Vec3 = () => [0, 0, 0]): NodeSpec[] {
  return Array.from({ length: n + 1 }, (_, k) => {
    const t = k / n, o = offset(t);
    return { id: `N${k}`, at: [a[0] + t * (b[0] - a[0]) + o[0], a[1] + t * (b[1] - a[1]) + o[1], a[2] + t * (b[2] - a[2]) + o[2]] as Vec3 };
  });
}

/** One beam member per consecutive pair of nodes. */
export function chainMembers(nodes: NodeSpec[], section: string, extra: Partial<MemberSpec> = {}): MemberSpec[] {
  return nodes.slice(1).map((nd, k) => ({ id: `B${k}`, kind: 'beam', from: nodes[k].id, to: nd.id, section, ...extra }));
}

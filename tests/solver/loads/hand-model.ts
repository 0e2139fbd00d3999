import type { AnalysisModel } from '../../../solver/index.ts';
import type { ProjectFile, Vec3 } from '../../../solver/index.ts';
import { buildDofMap } from '../../../solver/model/dof-map.ts';

/**
 * A hand-built AnalysisModel of one-element members (no interior nodes) from a small project,
 * so load functions can be tested without the model builder. Diameter comes from the section.
 */
export function handModel(project: ProjectFile): AnalysisModel {
  const n = project.nodes.length;
  const idx = new Map(project.nodes.map((nd, i) => [nd.id, i] as const));
  const coords = new Float64Array(3 * n);
  const fixed = new Uint8Array(3 * n);
  project.nodes.forEach((nd, i) => {
    coords.set(nd.at, 3 * i);
    for (const [d, c] of ['x', 'y', 'z'].entries()) if (nd.fixed?.includes(c)) fixed[3 * i + d] = 1;
  });
  const ne = project.members.length;
  const m: AnalysisModel = {
    nodeCount: n, userNodeCount: n, nodeIds: project.nodes.map((nd) => nd.id), coords, fixed,
    dofs: buildDofMap(n, new Uint8Array(n)), springs: null, familyBlocks: [],
    elementCount: ne, elemNodes: new Int32Array(2 * ne), elemRefLength: new Float64Array(ne),
    elemS0: new Float64Array(ne), elemE: new Float64Array(ne), elemArea: new Float64Array(ne),
    elemAlpha: new Float64Array(ne), elemTensionOnly: new Uint8Array(ne),
    elemUnstressedLength: new Float64Array(ne), elemMassPerLength: new Float64Array(ne),
    elemDiameter: new Float64Array(ne), elemMember: new Int32Array(ne), members: [],
  };
  project.members.forEach((mem, e) => {
    const si = project.sections.findIndex((s) => s.id === mem.section);
    const s = project.sections[si];
    const a = idx.get(mem.from)!, b = idx.get(mem.to)!;
    m.elemNodes[2 * e] = a; m.elemNodes[2 * e + 1] = b;
    const L = Math.hypot(...([0, 1, 2].map((d) => coords[3 * b + d] - coords[3 * a + d]) as Vec3));
    m.elemRefLength[e] = L; m.elemUnstressedLength[e] = L;
    m.elemE[e] = s.E; m.elemArea[e] = s.area; m.elemDiameter[e] = s.diameter ?? 0;
    m.elemMassPerLength[e] = s.massPerLength ?? 0; m.elemMember[e] = e;
    m.elemTensionOnly[e] = mem.kind === 'cable' ? 1 : 0;
    m.members.push({ id: mem.id, index: e, kind: mem.kind, sectionIndex: si, firstElement: e, elementCount: 1, nodeChain: new Int32Array([a, b]) });
  });
  return m;
}

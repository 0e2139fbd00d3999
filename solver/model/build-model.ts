/**
 * Project → AnalysisModel: numbering, member splitting, element properties and start shapes.
 * Assumes a project that passed validation (main/common/project); throws with a plain message on
 * the few inconsistencies it meets anyway.
 */
import type { MemberSpec, ProjectFile, SectionSpec } from '../project/types.ts';
import type { AnalysisModel, MemberTopology } from './analysis-model.ts';
import { sagStartShape } from './start-shape.ts';
import { STANDARD_GRAVITY } from './constants.ts';
import { buildDofMap } from './dof-map.ts';
import { supportArrays, supportsTouchRotations } from './supports.ts';
import { ELEMENT_FAMILIES } from '../elements/registry.ts';

export function buildModel(project: ProjectFile): AnalysisModel {
  const nodeIndex = new Map<string, number>();
  project.nodes.forEach((n, i) => nodeIndex.set(n.id, i));
  const sectionIndex = new Map<string, number>();
  project.sections.forEach((s, i) => sectionIndex.set(s.id, i));

  const userNodeCount = project.nodes.length;
  let nodeCount = userNodeCount;
  let elementCount = 0;
  for (const m of project.members) {
    const n = segmentsOf(m);
    elementCount += n;
    nodeCount += n - 1;
  }

  const coords = new Float64Array(3 * nodeCount);
  project.nodes.forEach((node, i) => coords.set(node.at, 3 * i));

  const elemNodes = new Int32Array(2 * elementCount);
  const elemRefLength = new Float64Array(elementCount);
  const elemS0 = new Float64Array(elementCount);
  const elemE = new Float64Array(elementCount);
  const elemArea = new Float64Array(elementCount);
  const elemAlpha = new Float64Array(elementCount);
  const elemTensionOnly = new Uint8Array(elementCount);
  const elemUnstressedLength = new Float64Array(elementCount);
  const elemMassPerLength = new Float64Array(elementCount);
  const elemDiameter = new Float64Array(elementCount);
  const elemMember = new Int32Array(elementCount);
  const members: MemberTopology[] = [];

  let nextNode = userNodeCount;
  let e = 0;
  project.members.forEach((m, memberIndex) => {
    const a = lookup(nodeIndex, m.from, m, 'node');
    const b = lookup(nodeIndex, m.to, m, 'node');
    const si = lookup(sectionIndex, m.section, m, 'section');
    const section = project.sections[si];
    const n = segmentsOf(m);
    const xa = coords.subarray(3 * a, 3 * a + 3);
    const xb = coords.subarray(3 * b, 3 * b + 3);
    const chord = Math.hypot(xb[0] - xa[0], xb[1] - xa[1], xb[2] - xa[2]);
    if (!(chord > 0)) throw new Error(`members[${memberIndex}] "${m.id}": from and to are at the same place`);

    const { refLength, s0 } = elementReference(m, section, chord, n);
    const chain = new Int32Array(n + 1);
    chain[0] = a;
    chain[n] = b;
    for (let k = 1; k < n; k++) chain[k] = nextNode++;
    // The start shape follows the stress-free length (for a pretension: the length that carries it).
    placeInteriorNodes(coords, chain, xa, xb, m, section, n * stressFreeLength(refLength, s0, section.E), s0);

    const unstressed = stressFreeLength(refLength, s0, section.E);
    for (let k = 0; k < n; k++, e++) {
      elemNodes[2 * e] = chain[k];
      elemNodes[2 * e + 1] = chain[k + 1];
      elemRefLength[e] = refLength;
      elemS0[e] = s0;
      elemE[e] = section.E;
      elemArea[e] = section.area;
      elemAlpha[e] = section.thermalExpansion ?? 0;
      elemTensionOnly[e] = m.kind === 'cable' ? 1 : 0;
      elemUnstressedLength[e] = unstressed;
      elemMassPerLength[e] = section.massPerLength ?? 0;
      elemDiameter[e] = section.diameter ?? 0;
      elemMember[e] = memberIndex;
    }
    members.push({
      id: m.id, index: memberIndex, kind: m.kind, sectionIndex: si,
      firstElement: e - n, elementCount: n, nodeChain: chain,
    });
  });

  const model: AnalysisModel = {
    nodeCount, userNodeCount, nodeIds: project.nodes.map((n) => n.id), coords,
    dofs: buildDofMap(nodeCount, new Uint8Array(nodeCount)), fixed: new Uint8Array(3 * nodeCount), springs: null,
    elementCount, elemNodes, elemRefLength, elemS0, elemE, elemArea, elemAlpha, elemTensionOnly,
    elemUnstressedLength, elemMassPerLength, elemDiameter, elemMember, members, familyBlocks: [],
  };
  attachFamiliesAndDofs(project, model);
  return model;
}

/**
 * Group the elements by family (registry order), let each family prepare its data, then build the
 * DOF map (rotations where a family or a support needs them), the support arrays and every
 * block's element DOF lists.
 */
function attachFamiliesAndDofs(project: ProjectFile, model: AnalysisModel): void {
  const kindOf = project.members.map((m) => m.kind as string);
  for (const family of ELEMENT_FAMILIES) {
    const kinds = family.kinds as readonly string[];
    const list: number[] = [];
    for (let e = 0; e < model.elementCount; e++) if (kinds.includes(kindOf[model.elemMember[e]])) list.push(e);
    if (list.length === 0) continue;
    const elements = Int32Array.from(list);
    model.familyBlocks.push({ family, elements, data: family.prepare(project, model, elements), elementDofs: new Int32Array(0) });
  }
  const covered = model.familyBlocks.reduce((n, b) => n + b.elements.length, 0);
  if (covered !== model.elementCount) {
    const m = project.members.find((mm) => !ELEMENT_FAMILIES.some((f) => (f.kinds as readonly string[]).includes(mm.kind)));
    throw new Error(`member "${m?.id}": no element family models kind "${m?.kind}"`);
  }
  const mark = new Uint8Array(model.nodeCount);
  for (const block of model.familyBlocks) block.family.markRotations(model, block, mark);
  project.nodes.forEach((node, i) => { if (supportsTouchRotations(node)) mark[i] = 1; });
  model.dofs = buildDofMap(model.nodeCount, mark);
  const { fixed, springs } = supportArrays(project, model.dofs);
  model.fixed = fixed;
  model.springs = springs;
  for (const block of model.familyBlocks) block.elementDofs = block.family.elementDofs(model, block, model.dofs);
}

function segmentsOf(m: MemberSpec): number {
  return Math.max(1, Math.floor(m.segments ?? 1));
}

/**
 * Reference length Lr (m) and initial stress S0 (Pa) of each of the member's n equal elements:
 * pretension P at the modelled chord → Lr = chord/n, S0 = P/A; unstressedLength L0 → Lr = L0/n,
 * S0 = 0; neither → stress-free as modelled.
 */
function elementReference(m: MemberSpec, section: SectionSpec, chord: number, n: number) {
  if (m.pretension !== undefined) return { refLength: chord / n, s0: m.pretension / section.area };
  if (m.unstressedLength !== undefined) return { refLength: m.unstressedLength / n, s0: 0 };
  return { refLength: chord / n, s0: 0 };
}

function placeInteriorNodes(
  coords: Float64Array, chain: Int32Array, xa: Float64Array, xb: Float64Array,
  m: MemberSpec, section: SectionSpec, unstressedLength: number, s0: number,
): void {
  const n = chain.length - 1;
  if (n < 2) return;
  if (m.kind === 'cable' && s0 >= 0) {
    const shape = sagStartShape({
      a: xa, b: xb, unstressedLength, n,
      weightPerLength: (section.massPerLength ?? 0) * STANDARD_GRAVITY, EA: section.E * section.area,
    });
    for (let k = 1; k < n; k++) coords.set(shape.subarray(3 * (k - 1), 3 * k), 3 * chain[k]);
    return;
  }
  for (let k = 1; k < n; k++) {
    const t = k / n;
    for (let q = 0; q < 3; q++) coords[3 * chain[k] + q] = xa[q] + t * (xb[q] - xa[q]);
  }
}

function lookup(index: Map<string, number>, id: string, m: MemberSpec, what: string): number {
  const i = index.get(id);
  if (i === undefined) throw new Error(`member "${m.id}": ${what} "${id}" does not exist`);
  return i;
}

/**
 * Stress-free (cut) length of an element with reference length Lr and initial stress S0, m:
 * the length l_u such that the same element entered by its unstressed length (Lr = l_u, S0 = 0)
 * carries the same force N = A S0 at the modelled length, so pretension and unstressed length
 * round-trip exactly. With λ = Lr / l_u, N = E A λ (λ² − 1) / 2, hence λ (λ² − 1) = 2 S0 / E
 * (Newton from λ = 1 + S0/E; the root is unique for λ > 1/√3).
 */
export function stressFreeLength(Lr: number, S0: number, E: number): number {
  if (S0 === 0) return Lr;
  const target = (2 * S0) / E;
  let lambda = 1 + S0 / E;
  for (let i = 0; i < 50; i++) {
    const f = lambda * (lambda * lambda - 1) - target;
    const step = f / (3 * lambda * lambda - 1);
    lambda -= step;
    if (Math.abs(step) < 1e-15 * lambda) break;
  }
  return Lr / lambda;
}

/**
 * Case results packed for the trip from a helper worker to the thread that shares the cases out
 * (parallel-solve.ts). A structured clone copies every node and member record of every case one
 * object and one string at a time (the 72 cases of the design mast: ~4.7 MB for half of them,
 * 50–150 ms to read back); packed, the numbers of the node and member records travel as
 * transferred Float64Arrays and their ids once, and the records are rebuilt on arrival with the
 * same keys in the same order and the same doubles, so the report is identical to the unpacked one.
 *
 * Layout per case, in the order of the case list: node k → 6 doubles (position, displacement);
 * member k → 7 doubles (tensionMax, tensionMin, tensionStart, tensionEnd, slack as 0/1, sag,
 * chordLength), plus 13 (start fx..mz, end fx..mz, maxBendingMoment) in `beams` for a beam member.
 * A case whose node or member ids differ from the shared lists travels as it is.
 */
import type { BeamEndActions, CaseResult, MemberResult, NodeResult } from '../../solver/index.ts';

export interface PackedCases {
  /** The cases with `nodes` and `members` set to null where they are packed. */
  heads: CaseResult[];
  nodeIds: string[];
  memberIds: string[];
  /** 6 per node per packed case. */
  nodes: Float64Array;
  /** 7 per member per packed case. */
  members: Float64Array;
  /** Per member per packed case: 1 where the member has beam end actions. */
  hasBeam: Uint8Array;
  /** 13 per member with beam end actions, in order. */
  beams: Float64Array;
}

const NODE = 6, MEMBER = 7, BEAM = 13;

function sameIds<T extends { id: string }>(records: T[], ids: string[]): boolean {
  if (records.length !== ids.length) return false;
  for (let k = 0; k < ids.length; k++) if (records[k].id !== ids[k]) return false;
  return true;
}

export function packCases(cases: CaseResult[]): { packed: PackedCases; transfer: ArrayBuffer[] } {
  const nodeIds = cases.length > 0 ? cases[0].nodes.map((n) => n.id) : [];
  const memberIds = cases.length > 0 ? cases[0].members.map((m) => m.id) : [];
  const packable = cases.map((c) => sameIds(c.nodes, nodeIds) && sameIds(c.members, memberIds));
  const count = packable.filter(Boolean).length;
  let beamCount = 0;
  cases.forEach((c, i) => { if (packable[i]) for (const m of c.members) if (m.beam) beamCount++; });
  const nodes = new Float64Array(NODE * nodeIds.length * count);
  const members = new Float64Array(MEMBER * memberIds.length * count);
  const hasBeam = new Uint8Array(memberIds.length * count);
  const beams = new Float64Array(BEAM * beamCount);
  const heads: CaseResult[] = [];
  let n = 0, m = 0, h = 0, b = 0;
  cases.forEach((c, i) => {
    if (!packable[i]) { heads.push(c); return; }
    heads.push({ ...c, nodes: null as unknown as NodeResult[], members: null as unknown as MemberResult[] });
    for (const node of c.nodes) {
      nodes.set(node.position, n); nodes.set(node.displacement, n + 3); n += NODE;
    }
    for (const r of c.members) {
      members[m] = r.tensionMax; members[m + 1] = r.tensionMin; members[m + 2] = r.tensionStart; members[m + 3] = r.tensionEnd;
      members[m + 4] = r.slack ? 1 : 0; members[m + 5] = r.sag; members[m + 6] = r.chordLength;
      m += MEMBER;
      if (r.beam) {
        const { start: s, end: e } = r.beam;
        beams.set([s.fx, s.fy, s.fz, s.mx, s.my, s.mz, e.fx, e.fy, e.fz, e.mx, e.my, e.mz, r.beam.maxBendingMoment], b);
        b += BEAM;
        hasBeam[h] = 1;
      }
      h++;
    }
  });
  return { packed: { heads, nodeIds, memberIds, nodes, members, hasBeam, beams }, transfer: [nodes.buffer, members.buffer, hasBeam.buffer, beams.buffer] };
}

function actions(f: Float64Array, o: number): BeamEndActions {
  return { fx: f[o], fy: f[o + 1], fz: f[o + 2], mx: f[o + 3], my: f[o + 4], mz: f[o + 5] };
}

export function unpackCases(p: PackedCases): CaseResult[] {
  let n = 0, m = 0, h = 0, b = 0;
  const { nodes: nx, members: mx, beams: bx } = p;
  return p.heads.map((head) => {
    if (head.nodes !== null) return head;
    const nodes: NodeResult[] = new Array<NodeResult>(p.nodeIds.length);
    for (let k = 0; k < nodes.length; k++, n += NODE) {
      nodes[k] = { id: p.nodeIds[k], position: [nx[n], nx[n + 1], nx[n + 2]], displacement: [nx[n + 3], nx[n + 4], nx[n + 5]] };
    }
    const members: MemberResult[] = new Array<MemberResult>(p.memberIds.length);
    for (let k = 0; k < members.length; k++, m += MEMBER, h++) {
      const r: MemberResult = {
        id: p.memberIds[k], tensionMax: mx[m], tensionMin: mx[m + 1], tensionStart: mx[m + 2], tensionEnd: mx[m + 3],
        slack: mx[m + 4] === 1, sag: mx[m + 5], chordLength: mx[m + 6],
      };
      if (p.hasBeam[h]) { r.beam = { start: actions(bx, b), end: actions(bx, b + 6), maxBendingMoment: bx[b + 12] }; b += BEAM; }
      members[k] = r;
    }
    return { ...head, nodes, members };
  });
}

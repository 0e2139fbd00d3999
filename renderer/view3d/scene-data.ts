/**
 * What the 3D view draws, as typed arrays (structure of arrays). Built from a project and, when
 * there are results, one case; knows nothing of Vue, Pinia or three.js.
 *
 * Layout:
 * - node i: nodePositions[3i..3i+2] (displayed position, m), nodeSupport[i] (0 free, 1 some
 *   directions restrained, 2 all of x, y, z restrained).
 * - member j: drawn as the polyline polyPoints[3k..] for k in [polyOffsets[j], polyOffsets[j+1]);
 *   memberKind[j] (0 cable, 1 bar, 2 beam), memberState[j] (MemberState), memberValue[j] (what the colour
 *   shows: tension in N or utilisation), memberCheck[j] (CheckState, from the design checks).
 * - nodeCheck[i] (CheckState); failedNodes lists the node indices whose check failed.
 * - colour: the colour mode the arrays were built for.
 *
 * Deformed shape: displayed = modelled + scale × displacement at the user nodes. Between the ends,
 * members follow the solver's interior node positions when the host sent them (`shape`:
 * CaseFields + the model's node chains), else a parabola with the reported sag below the chord
 * (sag × scale): a drawing aid only.
 */
import type { CaseFields, CaseResult, ItemStatus, ProjectFile } from '../../solver/index.ts';
import { CheckState, MemberState } from './colour-scale.ts';

export interface SceneData {
  nodeIds: string[];
  nodePositions: Float64Array;
  nodeSupport: Uint8Array;
  memberIds: string[];
  memberKind: Uint8Array;
  memberState: Uint8Array;
  memberValue: Float64Array;
  polyOffsets: Int32Array;
  polyPoints: Float64Array;
  /** Colour range [min, max] of memberValue over members in tension (min is 0 unless a value is below 0). */
  valueRange: [number, number];
  memberCheck: Uint8Array;
  nodeCheck: Uint8Array;
  failedNodes: Int32Array;
  colour: ColourQuantity;
}

export type ColourQuantity = 'tension' | 'utilisation' | 'kind' | 'checks';

/** Design-check status by member and node id (runChecks' members / nodes lists). */
export interface CheckStatusInput {
  members: ReadonlyMap<string, ItemStatus>;
  nodes: ReadonlyMap<string, ItemStatus>;
}

const CHECK_STATE: Record<ItemStatus, CheckState> = { pass: CheckState.Pass, fail: CheckState.Fail, unchecked: CheckState.Unchecked };

export interface SceneOptions {
  /** Case to draw, or null for the model as entered. */
  result: CaseResult | null;
  deformationScale: number;
  colour: ColourQuantity;
  /** Points per sagging cable polyline drawn from the sag (≥ 2). */
  sagPoints?: number;
  /** Check outcome per item (drawn in colour mode 'checks'). */
  checks?: CheckStatusInput | null;
  /** The solver's shape of `result`'s case: every member follows its element nodes. */
  shape?: SolvedShape | null;
}

/**
 * The solved positions of every node (user and interior, CaseFields.positions) with the start
 * positions they are measured from and each member's node chain (AnalysisModel.coords and
 * members[j].nodeChain, in project member order). Displayed = start + scale × (solved − start).
 */
export interface SolvedShape {
  fields: CaseFields;
  start: Float64Array;
  chains: readonly Int32Array[];
}

export function supportLevel(fixed: string | undefined): number {
  if (!fixed) return 0;
  const translations = fixed.replace(/r[xyz]/g, ''); // rotations are written rx, ry, rz
  return ['x', 'y', 'z'].every((d) => translations.includes(d)) ? 2 : 1;
}

export function buildSceneData(project: ProjectFile, options: SceneOptions): SceneData {
  const { result, deformationScale: scale } = options;
  const sagPoints = Math.max(2, options.sagPoints ?? 9);
  const n = project.nodes.length;
  const nodeIds = project.nodes.map((nd) => nd.id);
  const nodeIndex = new Map<string, number>();
  const nodePositions = new Float64Array(3 * n);
  const nodeSupport = new Uint8Array(n);
  const nodeResults = result ? new Map(result.nodes.map((r) => [r.id, r])) : null;
  for (let i = 0; i < n; i++) {
    const nd = project.nodes[i];
    nodeIndex.set(nd.id, i);
    const d = nodeResults?.get(nd.id)?.displacement;
    for (let k = 0; k < 3; k++) nodePositions[3 * i + k] = nd.at[k] + (d ? scale * d[k] : 0);
    nodeSupport[i] = supportLevel(nd.fixed);
  }

  const m = project.members.length;
  const memberIds = project.members.map((mb) => mb.id);
  const memberKind = new Uint8Array(m);
  const memberState = new Uint8Array(m);
  const memberValue = new Float64Array(m);
  const memberResults = result ? new Map(result.members.map((r) => [r.id, r])) : null;
  const breaking = new Map(project.sections.map((s) => [s.id, s.breakingLoad ?? 0]));
  let lo = Infinity;
  let hi = -Infinity;

  const shape = options.shape && options.shape.chains.length === m && options.shape.fields.positions.length === options.shape.start.length
    ? options.shape : null;
  // First pass: sizes.
  const sags = new Float64Array(m);
  const polyOffsets = new Int32Array(m + 1);
  for (let j = 0; j < m; j++) {
    const mb = project.members[j];
    memberKind[j] = mb.kind === 'bar' ? 1 : mb.kind === 'beam' ? 2 : 0;
    const r = memberResults?.get(mb.id);
    if (r) {
      if (r.slack) memberState[j] = MemberState.Slack;
      else if (mb.kind !== 'cable' && r.tensionMax < 0) memberState[j] = MemberState.Compression;
      else memberState[j] = MemberState.Tension;
      const b = breaking.get(mb.section) ?? 0;
      memberValue[j] = options.colour === 'utilisation' ? (b > 0 ? r.tensionMax / b : 0) : r.tensionMax;
      if (memberState[j] === MemberState.Tension) {
        lo = Math.min(lo, memberValue[j]);
        hi = Math.max(hi, memberValue[j]);
      }
      sags[j] = mb.kind === 'cable' ? r.sag * scale : 0;
    }
    polyOffsets[j + 1] = polyOffsets[j] + (shape ? shape.chains[j].length : sags[j] > 0 ? sagPoints : 2);
  }

  const polyPoints = new Float64Array(3 * polyOffsets[m]);
  for (let j = 0; j < m; j++) {
    const mb = project.members[j];
    const a = nodeIndex.get(mb.from);
    const b = nodeIndex.get(mb.to);
    const start = polyOffsets[j];
    const count = polyOffsets[j + 1] - start;
    if (shape) {
      const chain = shape.chains[j], x = shape.fields.positions, x0 = shape.start;
      for (let p = 0; p < count; p++) {
        const q = 3 * chain[p];
        for (let k = 0; k < 3; k++) polyPoints[3 * (start + p) + k] = x0[q + k] + scale * (x[q + k] - x0[q + k]);
      }
      continue;
    }
    for (let p = 0; p < count; p++) {
      const t = count === 1 ? 0 : p / (count - 1);
      for (let k = 0; k < 3; k++) {
        const pa = a === undefined ? 0 : nodePositions[3 * a + k];
        const pb = b === undefined ? pa : nodePositions[3 * b + k];
        polyPoints[3 * (start + p) + k] = pa + (pb - pa) * t;
      }
      // Parabolic sag below the chord, largest at mid-span: 4 s t (1 − t).
      if (count > 2) polyPoints[3 * (start + p) + 2] -= 4 * sags[j] * t * (1 - t);
    }
  }

  const memberCheck = new Uint8Array(m);
  const nodeCheck = new Uint8Array(n);
  const failed: number[] = [];
  const checks = options.checks;
  if (checks) {
    for (let j = 0; j < m; j++) {
      const st = checks.members.get(memberIds[j]);
      if (st) memberCheck[j] = CHECK_STATE[st];
    }
    for (let i = 0; i < n; i++) {
      const st = checks.nodes.get(nodeIds[i]);
      if (st) nodeCheck[i] = CHECK_STATE[st];
      if (st === 'fail') failed.push(i);
    }
  }

  if (!(lo <= hi)) {
    lo = 0;
    hi = 0;
  }
  // The scale starts at zero when every tension is positive, so colour reads as a share of the largest.
  if (lo > 0) lo = 0;
  return {
    nodeIds, nodePositions, nodeSupport, memberIds, memberKind, memberState, memberValue, polyOffsets, polyPoints, valueRange: [lo, hi],
    memberCheck, nodeCheck, failedNodes: Int32Array.from(failed), colour: options.colour,
  };
}

/**
 * Merged line-segment buffers for the 3D view, built from SceneData in one pass (no per-member
 * objects): three buffers — taut cables, slack cables (drawn dashed) and bars — each with
 * positions (6 floats per segment: start xyz, end xyz, relative to `origin`), per-vertex colours
 * and the member index of every segment (for picking and highlighting).
 *
 * Positions are Float32 relative to the model centre (`origin`) to keep precision for sites with
 * large coordinates. A buffer may be longer than it is used: only the first `segmentCount`
 * segments count (the view keeps its arrays while the model's topology stays the same).
 */
import {
  CHECK_FAIL_COLOUR, CHECK_PASS_COLOUR, CHECK_UNCHECKED_COLOUR, COMPRESSION_COLOUR, CheckState, MemberState, SLACK_COLOUR,
  UNANALYSED_BAR, UNANALYSED_BEAM, UNANALYSED_CABLE, scaleColour, type Rgb,
} from './colour-scale.ts';
import type { SceneData } from './scene-data.ts';

export interface SegmentBuffer {
  positions: Float32Array;
  colours: Float32Array;
  segmentMember: Int32Array;
  segmentCount: number;
}

export interface LineBuffers {
  taut: SegmentBuffer;
  slack: SegmentBuffer;
  bars: SegmentBuffer;
  origin: [number, number, number];
}

type Bucket = 0 | 1 | 2;

function bucketOf(data: SceneData, j: number): Bucket {
  if (data.memberState[j] === MemberState.Slack) return 1;
  return data.memberKind[j] !== 0 ? 2 : 0;
}

function allocate(count: number): SegmentBuffer {
  return { positions: new Float32Array(6 * count), colours: new Float32Array(6 * count), segmentMember: new Int32Array(count), segmentCount: count };
}

/** Centre of the bounding box of the nodes (m). */
export function modelCentre(data: SceneData): [number, number, number] {
  const p = data.nodePositions;
  if (p.length === 0) return [0, 0, 0];
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < p.length; i += 3) {
    for (let k = 0; k < 3; k++) {
      lo[k] = Math.min(lo[k], p[i + k]);
      hi[k] = Math.max(hi[k], p[i + k]);
    }
  }
  return [(lo[0] + hi[0]) / 2, (lo[1] + hi[1]) / 2, (lo[2] + hi[2]) / 2];
}

function copy(c: Rgb, out: Rgb): Rgb {
  out[0] = c[0]; out[1] = c[1]; out[2] = c[2];
  return out;
}

/**
 * Colour mode 'checks': a failing member is red (drawn dashed when slack), a slack member that
 * passes keeps the slack colour, others are green (pass) or grey (not checked / no check run).
 */
function checkColour(data: SceneData, j: number, out: Rgb): Rgb {
  const check = data.memberCheck[j];
  if (check === CheckState.Fail) return copy(CHECK_FAIL_COLOUR, out);
  if (data.memberState[j] === MemberState.Slack) return copy(SLACK_COLOUR, out);
  if (check === CheckState.Pass) return copy(CHECK_PASS_COLOUR, out);
  return copy(CHECK_UNCHECKED_COLOUR, out);
}

export function memberColour(data: SceneData, j: number, out: Rgb): Rgb {
  const state = data.memberState[j];
  if (data.colour === 'checks' && state !== MemberState.NotAnalysed) return checkColour(data, j, out);
  if (state === MemberState.NotAnalysed) {
    const kind = data.memberKind[j];
    const c = kind === 1 ? UNANALYSED_BAR : kind === 2 ? UNANALYSED_BEAM : UNANALYSED_CABLE;
    out[0] = c[0]; out[1] = c[1]; out[2] = c[2];
    return out;
  }
  if (state === MemberState.Slack || state === MemberState.Compression) {
    const c = state === MemberState.Slack ? SLACK_COLOUR : COMPRESSION_COLOUR;
    out[0] = c[0]; out[1] = c[1]; out[2] = c[2];
    return out;
  }
  const [lo, hi] = data.valueRange;
  return scaleColour(hi > lo ? (data.memberValue[j] - lo) / (hi - lo) : 1, out);
}

/** Segments per buffer (taut, slack, bars) that `data` needs. */
export function segmentCounts(data: SceneData): [number, number, number] {
  const counts: [number, number, number] = [0, 0, 0];
  for (let j = 0; j < data.memberIds.length; j++) counts[bucketOf(data, j)] += data.polyOffsets[j + 1] - data.polyOffsets[j] - 1;
  return counts;
}

/** Empty buffers with room for `capacity` segments each (so any split into taut, slack and bars fits). */
export function allocateLineBuffers(capacity: number, origin: [number, number, number]): LineBuffers {
  const empty = () => ({ ...allocate(capacity), segmentCount: 0 });
  return { taut: empty(), slack: empty(), bars: empty(), origin };
}

/**
 * Write `data` into existing buffers (their arrays are kept: the 3D view's BufferAttributes hold
 * them). Returns false, writing nothing, when a buffer has too little room.
 */
export function fillLineBuffers(data: SceneData, out: LineBuffers): boolean {
  const counts = segmentCounts(data);
  const buffers = [out.taut, out.slack, out.bars];
  for (let b = 0; b < 3; b++) if (6 * counts[b] > buffers[b].positions.length) return false;
  const m = data.memberIds.length;
  const fill = [0, 0, 0];
  const colour: Rgb = [0, 0, 0];
  const pts = data.polyPoints;
  const [ox, oy, oz] = out.origin;
  for (let j = 0; j < m; j++) {
    const bucket = bucketOf(data, j);
    const buf = buffers[bucket];
    memberColour(data, j, colour);
    const end = data.polyOffsets[j + 1];
    for (let p = data.polyOffsets[j]; p < end - 1; p++) {
      const s = fill[bucket]++;
      const o = 6 * s;
      buf.positions[o] = pts[3 * p] - ox;
      buf.positions[o + 1] = pts[3 * p + 1] - oy;
      buf.positions[o + 2] = pts[3 * p + 2] - oz;
      buf.positions[o + 3] = pts[3 * p + 3] - ox;
      buf.positions[o + 4] = pts[3 * p + 4] - oy;
      buf.positions[o + 5] = pts[3 * p + 5] - oz;
      for (let v = 0; v < 2; v++) {
        buf.colours[o + 3 * v] = colour[0];
        buf.colours[o + 3 * v + 1] = colour[1];
        buf.colours[o + 3 * v + 2] = colour[2];
      }
      buf.segmentMember[s] = j;
    }
  }
  for (let b = 0; b < 3; b++) buffers[b].segmentCount = counts[b];
  return true;
}

/** Buffers of exactly the size `data` needs. */
export function buildLineBuffers(data: SceneData, origin: [number, number, number] = modelCentre(data)): LineBuffers {
  const counts = segmentCounts(data);
  const out: LineBuffers = { taut: allocate(counts[0]), slack: allocate(counts[1]), bars: allocate(counts[2]), origin };
  fillLineBuffers(data, out);
  return out;
}

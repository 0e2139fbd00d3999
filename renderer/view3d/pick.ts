/**
 * Screen-space picking: project nodes and segment end points with the camera's view-projection
 * matrix and take the nearest within a pixel tolerance. O(n) per click, no GPU read-back, works
 * on merged buffers of any size.
 *
 * `viewProjection` is a 4×4 matrix in column-major order (three.js Matrix4.elements). Positions
 * are in the same frame the matrix expects (the view's origin-relative frame). Pixel coordinates:
 * x right, y down, (0, 0) at the top-left corner of a `width` × `height` canvas.
 */
export interface PickHit {
  kind: 'node' | 'member';
  index: number;
  /** Distance from the cursor, px. */
  distance: number;
}

function project(m: ArrayLike<number>, x: number, y: number, z: number, w: number, h: number, out: Float64Array): boolean {
  const cx = m[0] * x + m[4] * y + m[8] * z + m[12];
  const cy = m[1] * x + m[5] * y + m[9] * z + m[13];
  const cw = m[3] * x + m[7] * y + m[11] * z + m[15];
  if (cw <= 1e-9) return false; // behind the camera
  out[0] = ((cx / cw + 1) / 2) * w;
  out[1] = ((1 - cy / cw) / 2) * h;
  return true;
}

/** Distance from point (px, py) to the segment (ax, ay)–(bx, by). */
export function pointSegmentDistance(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(1, Math.max(0, ((px - ax) * dx + (py - ay) * dy) / len2)) : 0;
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

export interface PickInput {
  viewProjection: ArrayLike<number>;
  width: number;
  height: number;
  /** Node positions, 3 per node. */
  nodes: ArrayLike<number>;
  /** Segment buffers: 6 floats per segment and the member of each segment. */
  segments: { positions: ArrayLike<number>; segmentMember: ArrayLike<number>; segmentCount: number }[];
  nodeTolerancePx?: number;
  memberTolerancePx?: number;
}

/** Nodes win over members when both are within tolerance (they sit on member ends). */
export function pickAt(input: PickInput, x: number, y: number): PickHit | null {
  const { viewProjection: m, width: w, height: h } = input;
  const nodeTol = input.nodeTolerancePx ?? 7;
  const memberTol = input.memberTolerancePx ?? 6;
  const a = new Float64Array(2);
  const b = new Float64Array(2);
  let best: PickHit | null = null;
  const nodes = input.nodes;
  for (let i = 0; 3 * i < nodes.length; i++) {
    if (!project(m, nodes[3 * i], nodes[3 * i + 1], nodes[3 * i + 2], w, h, a)) continue;
    const d = Math.hypot(a[0] - x, a[1] - y);
    if (d <= nodeTol && (!best || d < best.distance)) best = { kind: 'node', index: i, distance: d };
  }
  if (best) return best;
  for (const seg of input.segments) {
    const p = seg.positions;
    for (let s = 0; s < seg.segmentCount; s++) {
      const o = 6 * s;
      if (!project(m, p[o], p[o + 1], p[o + 2], w, h, a)) continue;
      if (!project(m, p[o + 3], p[o + 4], p[o + 5], w, h, b)) continue;
      const d = pointSegmentDistance(x, y, a[0], a[1], b[0], b[1]);
      if (d <= memberTol && (!best || d < best.distance)) best = { kind: 'member', index: seg.segmentMember[s], distance: d };
    }
  }
  return best;
}

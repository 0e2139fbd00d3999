/**
 * One frame of a vibration mode animation: the drawn SceneData moved by factor × φ, where φ is a
 * mode shape over the model's DOF map (solver/modes: translations of model node i at 3i..3i+2,
 * user nodes first in project order, then interior nodes; rotations after and ignored here).
 *
 * Members follow φ at their element nodes when the drawn polyline has one point per node of the
 * member's chain (AnalysisModel.members[j].nodeChain); otherwise φ is interpolated linearly
 * between the member's end nodes. Frames are written into `out` (same topology as `base`), so an
 * animation allocates nothing per frame. Knows nothing of three.js.
 */
import type { SceneData } from './scene-data.ts';

export interface ModeShapeInput {
  /** Mode shape over the model's DOFs (mass-normalised; only its direction and relative size matter here). */
  shape: Float64Array;
  /** Node chain of every member (model node indices from `from` to `to`), in project member order. */
  chains: readonly Int32Array[];
  /** Number of model nodes (user + interior): translations are the first 3 × modelNodes entries. */
  modelNodes: number;
}

/** Largest translation |φ_i| over the model's nodes (0 for a shape without translations). */
export function largestTranslation(input: ModeShapeInput): number {
  const { shape, modelNodes } = input;
  let max = 0;
  for (let i = 0; i < modelNodes && 3 * i + 2 < shape.length; i++) max = Math.max(max, Math.hypot(shape[3 * i], shape[3 * i + 1], shape[3 * i + 2]));
  return max;
}

/**
 * Factor that makes the largest translation `share` of the model size `extent` (m): a readable
 * animation whatever the normalisation of φ.
 */
export function readableAmplitude(input: ModeShapeInput, extent: number, share = 0.06): number {
  const max = largestTranslation(input);
  return max > 0 ? (share * extent) / max : 0;
}

/** A SceneData with its own position arrays, to be filled by `modeFrame`. */
export function frameBuffer(base: SceneData): SceneData {
  return { ...base, nodePositions: new Float64Array(base.nodePositions.length), polyPoints: new Float64Array(base.polyPoints.length) };
}

/** Write base + factor × φ into `out` (made by frameBuffer(base)) and return it. */
export function modeFrame(base: SceneData, input: ModeShapeInput, factor: number, out: SceneData): SceneData {
  const { shape, chains, modelNodes } = input;
  const phi = (node: number, k: number) => (node >= 0 && node < modelNodes ? shape[3 * node + k] : 0);
  const n = base.nodeIds.length;
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < 3; k++) out.nodePositions[3 * i + k] = base.nodePositions[3 * i + k] + factor * phi(i, k);
  }
  const m = base.memberIds.length;
  for (let j = 0; j < m; j++) {
    const start = base.polyOffsets[j];
    const count = base.polyOffsets[j + 1] - start;
    const chain = chains[j];
    if (!chain || chain.length === 0) {
      out.polyPoints.set(base.polyPoints.subarray(3 * start, 3 * (start + count)), 3 * start);
      continue;
    }
    const along = chain.length === count;
    const a = chain[0], b = chain[chain.length - 1];
    for (let p = 0; p < count; p++) {
      const t = count === 1 ? 0 : p / (count - 1);
      for (let k = 0; k < 3; k++) {
        const d = along ? phi(chain[p], k) : phi(a, k) + (phi(b, k) - phi(a, k)) * t;
        out.polyPoints[3 * (start + p) + k] = base.polyPoints[3 * (start + p) + k] + factor * d;
      }
    }
  }
  return out;
}

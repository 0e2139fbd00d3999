/**
 * DOF map: which degrees of freedom each node carries and where they sit in the global vectors.
 *
 * Layout (flat typed arrays, built once per topology):
 * - Translations of node i are DOFs 3i, 3i+1, 3i+2 (x, y, z, m) for every node, so every
 *   3 × nodeCount array (positions, nodal loads) lines up with the first 3 × nodeCount DOFs.
 * - Rotations exist only at nodes a rotational element end or a rotational restraint/spring
 *   touches; they follow all translations: node i's rotations are rotationOffset[i] + 0, 1, 2
 *   (total rotation vector components about x, y, z, rad), in node order.
 * - nodeDofCount[i] is 3 or 6. dofNode / dofDirection give each DOF's node and direction
 *   (0..2 = x, y, z translation; 3..5 = rotation about x, y, z).
 * Every group of 3 consecutive DOFs belongs to one node, so the linear algebra's node blocks
 * (blockSize 3) stay valid whether or not rotations are present.
 */
export interface DofMap {
  nodeCount: number;
  /** Total number of DOFs. */
  count: number;
  /** 3 × nodeCount: the translational DOFs (and the length of position arrays). */
  translationCount: number;
  nodeDofCount: Int32Array;
  /** First rotational DOF of each node, or -1 where the node has no rotations. */
  rotationOffset: Int32Array;
  dofNode: Int32Array;
  dofDirection: Uint8Array;
}

/** DOF map for nodeCount nodes, rotations where hasRotation[i] is 1. */
export function buildDofMap(nodeCount: number, hasRotation: Uint8Array): DofMap {
  const translationCount = 3 * nodeCount;
  const nodeDofCount = new Int32Array(nodeCount);
  const rotationOffset = new Int32Array(nodeCount).fill(-1);
  let next = translationCount;
  for (let i = 0; i < nodeCount; i++) {
    nodeDofCount[i] = 3;
    if (hasRotation[i]) { rotationOffset[i] = next; next += 3; nodeDofCount[i] = 6; }
  }
  const dofNode = new Int32Array(next);
  const dofDirection = new Uint8Array(next);
  for (let i = 0; i < nodeCount; i++) {
    for (let q = 0; q < 3; q++) {
      dofNode[3 * i + q] = i; dofDirection[3 * i + q] = q;
      const r = rotationOffset[i];
      if (r >= 0) { dofNode[r + q] = i; dofDirection[r + q] = 3 + q; }
    }
  }
  return { nodeCount, count: next, translationCount, nodeDofCount, rotationOffset, dofNode, dofDirection };
}

/** DOF of node i in direction 0..5 (x, y, z, rx, ry, rz), or -1 when the node has no such DOF. */
export function dofOf(map: DofMap, node: number, direction: number): number {
  if (direction < 3) return 3 * node + direction;
  const r = map.rotationOffset[node];
  return r < 0 ? -1 : r + direction - 3;
}

/**
 * Nodal moments (3 × nodeCount, N·m, global axes) onto the rotation DOFs of a DOF vector. A moment
 * acts on the node's total rotation vector: exact for rotation about a fixed axis and the moment
 * itself for small rotations (it is conservative, its potential −M·θ).
 */
import type { DofMap } from '../model/dof-map.ts';

export function addNodalMoments(dofs: DofMap, moments: Float64Array, f: Float64Array): void {
  for (let i = 0; i < dofs.nodeCount; i++) {
    const r = dofs.rotationOffset[i];
    if (r < 0) continue;
    for (let q = 0; q < 3; q++) f[r + q] += moments[3 * i + q];
  }
}

/**
 * The eigenproblem about a solved state, over whatever element families and DOF map the model has:
 * - K: the consistent tangent of every family (and springs) at the converged displacements and
 *   the case's temperature, assembled as Newton does (assembly/assemble.ts). Members slack at that
 *   state (any element slack) add no stiffness: their elements are assembled with zero area.
 * - M: the families' lumped mass (assembly/lumped-mass.ts: member mass + the case's ice), plus added
 *   node masses and the ancillaries with the case's ice on them (CaseLoads.ancillaryMass); a slack member's mass is lumped to its two end nodes (half each), its interior
 *   nodes carry none and leave the problem.
 * - free: every DOF not restrained, minus the interior nodes of slack members.
 * Member mass is present whether or not the case applies self-weight (mass is not a load).
 */
import type { Workspace } from '../analysis/workspace.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import type { ProjectFile } from '../project/types.ts';
import type { EigenProblem } from './eigen-problem.ts';
import { assemble, createElementState } from '../assembly/assemble.ts';
import { lumpedMass } from '../assembly/lumped-mass.ts';
import { nodeMassPerDof } from '../loads/node-mass.ts';

export interface ModalModel {
  problem: EigenProblem;
  /** Per DOF: 0, 1, 2 for translations along x, y, z; −1 for rotations. */
  direction: Int8Array;
  /** Indices (in model.members) of members counted with their mass only. */
  massOnly: number[];
}

/**
 * @param u converged displacements and rotations (dofs.count), m and rad
 * @param elementSlack 1 where an element is slack at that state
 */
export function modalModel(
  ws: Workspace, project: ProjectFile, loads: CaseLoads, u: Float64Array, elementSlack: Uint8Array,
): ModalModel {
  const { model, pattern } = ws;
  const n = model.dofs.count;
  const free = new Uint8Array(n);
  for (let d = 0; d < n; d++) free[d] = model.fixed[d] ? 0 : 1;

  const massOnly: number[] = [];
  for (let k = 0; k < model.members.length; k++) {
    const member = model.members[k];
    for (let j = 0; j < member.elementCount; j++) {
      if (elementSlack[member.firstElement + j]) { massOnly.push(k); break; }
    }
  }

  // Stiffness, with the slack members' elements switched off (area 0) for this one assembly.
  const savedArea: number[] = [];
  for (const k of massOnly) {
    const member = model.members[k];
    for (let j = 0; j < member.elementCount; j++) {
      savedArea.push(model.elemArea[member.firstElement + j]);
      model.elemArea[member.firstElement + j] = 0;
    }
  }
  const stiffness = new Float64Array(pattern.rowIdx.length);
  try {
    assemble(model, pattern, ws.startVectors, u, loads.temperatureChange, new Float64Array(n), createElementState(model), stiffness);
  } finally {
    let s = 0;
    for (const k of massOnly) {
      const member = model.members[k];
      for (let j = 0; j < member.elementCount; j++) model.elemArea[member.firstElement + j] = savedArea[s++];
    }
  }

  const mass = lumpedMass(model, loads.extraMassPerLength);
  const added = nodeMassPerDof(model, project);
  for (let d = 0; d < added.length; d++) mass[d] += added[d];
  if (loads.ancillaryMass) {
    for (let i = 0; i < model.nodeCount; i++) for (let q = 0; q < 3; q++) mass[3 * i + q] += loads.ancillaryMass[i];
  }
  for (const k of massOnly) {
    const chain = model.members[k].nodeChain;
    const a = chain[0], b = chain[chain.length - 1];
    for (let i = 1; i < chain.length - 1; i++) {
      for (let q = 0; q < 3; q++) {
        const d = 3 * chain[i] + q;
        mass[3 * a + q] += 0.5 * mass[d];
        mass[3 * b + q] += 0.5 * mass[d];
        mass[d] = 0;
        free[d] = 0;
      }
    }
  }

  const direction = new Int8Array(n);
  for (let d = 0; d < n; d++) direction[d] = model.dofs.dofDirection[d] < 3 ? model.dofs.dofDirection[d] : -1;
  return {
    problem: { n, colPtr: pattern.colPtr, rowIdx: pattern.rowIdx, stiffness, mass, free, blockSize: 3 },
    direction, massOnly,
  };
}

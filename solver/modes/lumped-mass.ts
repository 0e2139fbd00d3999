/**
 * Lumped translational mass of the truss/cable family per DOF, kg: each element's mass
 * (mass per unstressed length + ice mass per length) × its unstressed length, half to each end
 * node in x, y and z — the same lumping as the element weight (solver/assembly/assemble.ts) —
 * plus added node masses. A member in `massOnly` (slack) lumps its whole mass to its two end
 * nodes: its interior nodes carry none and leave the eigenproblem.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';

export function trussLumpedMass(
  model: AnalysisModel, extraMassPerLength: Float64Array | null, nodeMass: Float64Array | null,
  massOnly: ReadonlySet<number>,
): Float64Array {
  const mass = new Float64Array(3 * model.nodeCount);
  const add = (node: number, m: number) => { for (let q = 0; q < 3; q++) mass[3 * node + q] += m; };
  for (const member of model.members) {
    const chain = member.nodeChain;
    for (let k = 0; k < member.elementCount; k++) {
      const e = member.firstElement + k;
      const m = (model.elemMassPerLength[e] + (extraMassPerLength ? extraMassPerLength[e] : 0)) * model.elemUnstressedLength[e];
      if (m === 0) continue;
      if (massOnly.has(member.index)) {
        add(chain[0], m / 2);
        add(chain[chain.length - 1], m / 2);
      } else {
        add(model.elemNodes[2 * e], m / 2);
        add(model.elemNodes[2 * e + 1], m / 2);
      }
    }
  }
  if (nodeMass) for (let d = 0; d < mass.length; d++) mass[d] += nodeMass[d];
  return mass;
}

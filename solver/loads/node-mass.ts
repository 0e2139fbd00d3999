/**
 * Added lumped masses at nodes (NodeSpec.mass, kg): their weight as fixed-direction nodal loads.
 * Weight = −g · mass along z (N), applied with member self-weight (same switch, same factor).
 */
import type { ProjectFile } from '../project/types.ts';
import type { AnalysisModel } from '../model/analysis-model.ts';
import { STANDARD_GRAVITY } from '../model/constants.ts';

/** Adds −factor · g · mass to the z force of every user node with a mass (f: 3 × nodeCount, N). */
export function addNodeMassWeight(model: AnalysisModel, project: ProjectFile, factor: number, f: Float64Array): void {
  project.nodes.forEach((node, i) => {
    if (node.mass && i < model.userNodeCount) f[3 * i + 2] -= factor * STANDARD_GRAVITY * node.mass;
  });
}

/** Added node masses per DOF (3 × nodeCount, kg; the same mass in x, y and z). */
export function nodeMassPerDof(model: AnalysisModel, project: ProjectFile): Float64Array {
  const m = new Float64Array(3 * model.nodeCount);
  project.nodes.forEach((node, i) => {
    if (node.mass && i < model.userNodeCount) m[3 * i] = m[3 * i + 1] = m[3 * i + 2] = node.mass;
  });
  return m;
}

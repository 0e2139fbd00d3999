/**
 * Load case / combination → CaseLoads on an AnalysisModel.
 * Nodal loads go to user nodes, with the weight of added node masses when self-weight is on;
 * member self-weight, ice mass and temperature are carried as data and applied by the analysis; wind becomes a follower load (solver/loads/wind.ts).
 */
import type { CombinationSpec, LoadCaseSpec, ProjectFile } from '../project/types.ts';
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { CaseLoads, FollowerLoad } from './case-loads.ts';
import { createWindLoad } from './wind.ts';
import { iceMassPerLength } from './ice.ts';
import { addNodeMassWeight } from './node-mass.ts';

export function resolveCaseLoads(model: AnalysisModel, project: ProjectFile, spec: LoadCaseSpec): CaseLoads {
  const nodal = new Float64Array(3 * model.nodeCount);
  const nodeIndex = new Map(model.nodeIds.map((id, i) => [id, i] as const));
  for (const load of spec.nodalLoads ?? []) {
    const i = nodeIndex.get(load.node);
    if (i === undefined) throw new Error(`load case "${spec.id}": node "${load.node}" does not exist`);
    for (let q = 0; q < 3; q++) nodal[3 * i + q] += load.force[q];
  }
  if (spec.selfWeight ?? true) addNodeMassWeight(model, project, 1, nodal);
  return {
    nodal,
    selfWeight: spec.selfWeight ?? true,
    gravityFactor: 1,
    extraMassPerLength: spec.ice ? iceMassPerLength(model, project, spec.ice) : null,
    temperatureChange: spec.temperatureChange ?? 0,
    follower: spec.wind ? createWindLoad(model, project, spec) : null,
  };
}

/**
 * A combination Σ fᵢ · caseᵢ as one set of loads (solved as its own nonlinear case):
 * nodal loads, wind and ΔT scale by fᵢ; member self-weight takes the summed factor of the cases
 * that include it; ice mass scales with its case's factor.
 */
export function resolveCombinationLoads(
  model: AnalysisModel, project: ProjectFile, combination: CombinationSpec,
): CaseLoads {
  const nodal = new Float64Array(3 * model.nodeCount);
  let gravityFactor = 0;
  let extra: Float64Array | null = null;
  let temperatureChange = 0;
  const followers: { load: FollowerLoad; factor: number }[] = [];
  for (const { case: caseId, factor } of combination.factors) {
    const spec = project.loadCases.find((c) => c.id === caseId);
    if (!spec) throw new Error(`combination "${combination.id}": load case "${caseId}" does not exist`);
    const loads = resolveCaseLoads(model, project, spec);
    for (let d = 0; d < nodal.length; d++) nodal[d] += factor * loads.nodal[d];
    if (loads.selfWeight) gravityFactor += factor;
    if (loads.extraMassPerLength) {
      extra ??= new Float64Array(model.elementCount);
      for (let e = 0; e < extra.length; e++) extra[e] += factor * loads.extraMassPerLength[e];
    }
    temperatureChange += factor * loads.temperatureChange;
    if (loads.follower) followers.push({ load: loads.follower, factor });
  }
  const follower: FollowerLoad | null = followers.length === 0 ? null : {
    accumulate(x, f, out) { for (const p of followers) p.load.accumulate(x, f * p.factor, out); },
  };
  return {
    nodal, selfWeight: gravityFactor !== 0, gravityFactor: gravityFactor === 0 ? 1 : gravityFactor, extraMassPerLength: extra,
    temperatureChange, follower,
  };
}

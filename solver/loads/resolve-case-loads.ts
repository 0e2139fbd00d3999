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
import { prescribedDisplacements } from '../model/supports.ts';
import { withAreaLoads } from './panel-loads.ts';
import { ancillaryNodalMass, withAncillaryLoads } from './ancillary-loads.ts';
import { addNodeMassWeight } from './node-mass.ts';

export function resolveCaseLoads(model: AnalysisModel, project: ProjectFile, spec: LoadCaseSpec): CaseLoads {
  const nodal = new Float64Array(3 * model.nodeCount);
  let moments: Float64Array | null = null;
  const nodeIndex = new Map(model.nodeIds.map((id, i) => [id, i] as const));
  for (const load of spec.nodalLoads ?? []) {
    const i = nodeIndex.get(load.node);
    if (i === undefined) throw new Error(`load case "${spec.id}": node "${load.node}" does not exist`);
    for (let q = 0; q < 3; q++) nodal[3 * i + q] += load.force[q];
    if (load.moment && load.moment.some((v) => v !== 0)) {
      if (model.dofs.rotationOffset[i] < 0) {
        throw new Error(`load case "${spec.id}": node "${load.node}" has no rotations (no beam or rotational support there) to take a moment`);
      }
      moments ??= new Float64Array(3 * model.nodeCount);
      for (let q = 0; q < 3; q++) moments[3 * i + q] += load.moment[q];
    }
  }
  if (spec.selfWeight ?? true) addNodeMassWeight(model, project, 1, nodal);
  return withAncillaryLoads(model, project, spec, withAreaLoads(model, project, spec, {
    nodal,
    selfWeight: spec.selfWeight ?? true,
    gravityFactor: 1,
    extraMassPerLength: spec.ice ? iceMassPerLength(model, project, spec.ice) : null,
    temperatureChange: spec.temperatureChange ?? 0,
    follower: spec.wind ? createWindLoad(model, project, spec) : null,
    moments,
    prescribed: prescribedDisplacements(project, model.dofs, model.fixed, spec),
  }));
}

/** The loads of the load case or combination with this id; null when there is none. */
export function resolveNamedCaseLoads(model: AnalysisModel, project: ProjectFile, id: string): CaseLoads | null {
  const spec = project.loadCases.find((c) => c.id === id);
  if (spec) return resolveCaseLoads(model, project, spec);
  const combination = (project.combinations ?? []).find((c) => c.id === id);
  return combination ? resolveCombinationLoads(model, project, combination) : null;
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
  let moments: Float64Array | null = null;
  const prescribed = new Map<number, number>();
  let gravityFactor = 0;
  let extra: Float64Array | null = null;
  let temperatureChange = 0;
  const followers: { load: FollowerLoad; factor: number }[] = [];
  // ancillary mass once, plus each case's ancillary ice × its factor (as member ice mass)
  const bareAncillaries = (project.ancillaries ?? []).length > 0 ? ancillaryNodalMass(model, project) : null;
  const ancillaryMass = bareAncillaries ? Float64Array.from(bareAncillaries) : null;
  for (const { case: caseId, factor } of combination.factors) {
    const spec = project.loadCases.find((c) => c.id === caseId);
    if (!spec) throw new Error(`combination "${combination.id}": load case "${caseId}" does not exist`);
    const loads = resolveCaseLoads(model, project, spec);
    for (let d = 0; d < nodal.length; d++) nodal[d] += factor * loads.nodal[d];
    if (loads.moments) {
      moments ??= new Float64Array(3 * model.nodeCount);
      for (let d = 0; d < moments.length; d++) moments[d] += factor * loads.moments[d];
    }
    if (loads.prescribed) {
      loads.prescribed.dofs.forEach((d, k) => prescribed.set(d, (prescribed.get(d) ?? 0) + factor * loads.prescribed!.values[k]));
    }
    if (loads.selfWeight) gravityFactor += factor;
    if (loads.extraMassPerLength) {
      extra ??= new Float64Array(model.elementCount);
      for (let e = 0; e < extra.length; e++) extra[e] += factor * loads.extraMassPerLength[e];
    }
    temperatureChange += factor * loads.temperatureChange;
    if (loads.follower) followers.push({ load: loads.follower, factor });
    if (ancillaryMass && bareAncillaries && loads.ancillaryMass) {
      for (let i = 0; i < ancillaryMass.length; i++) ancillaryMass[i] += factor * (loads.ancillaryMass[i] - bareAncillaries[i]);
    }
  }
  const follower: FollowerLoad | null = followers.length === 0 ? null : {
    accumulate(x, f, out) { for (const p of followers) p.load.accumulate(x, f * p.factor, out); },
  };
  return {
    nodal, selfWeight: gravityFactor !== 0, gravityFactor: gravityFactor === 0 ? 1 : gravityFactor, extraMassPerLength: extra,
    temperatureChange, follower, moments, ancillaryMass,
    prescribed: prescribed.size === 0 ? null : { dofs: Int32Array.from(prescribed.keys()), values: Float64Array.from(prescribed.values()) },
  };
}

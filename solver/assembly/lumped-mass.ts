/**
 * Lumped mass per DOF over whatever DOF map the model has: every family adds its elements' mass
 * (kg on translations, kg·m² on rotations; see each family's `lumpedMass`). `extraMassPerLength`
 * (kg/m of unstressed length per element, e.g. ice) is added to the members' own mass.
 */
import type { AnalysisModel } from '../model/analysis-model.ts';

export function lumpedMass(model: AnalysisModel, extraMassPerLength: Float64Array | null = null): Float64Array {
  const mass = new Float64Array(model.dofs.count);
  for (const block of model.familyBlocks) block.family.lumpedMass(model, block, extraMassPerLength, mass);
  return mass;
}

/**
 * As-built back-analysis of one set of site measurements (project.siteMeasurements):
 * readings → tensions (observations.ts) → fitted unstressed lengths (fit-lengths.ts) → which
 * lengths the readings identify (identifiability.ts) → the as-built state at the reference
 * temperature, the design checks re-run on it (every case and combination) → the fewest length
 * adjustments that bring every cable within tolerance (adjustments.ts).
 * Fitted cables: every cable with a design length when there are at most MAX_FITTED_CABLES,
 * otherwise the measured cables only (the rest held at their design lengths).
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { ProjectFile } from '../project/types.ts';
import type { AsBuiltIssue, AsBuiltResult, CableFit } from './asbuilt-types.ts';
import { designUnstressedLengths, withUnstressedLengths } from '../sequence/design-lengths.ts';
import { lowerEnd } from '../sequence/stage-evaluation.ts';
import { installationData } from '../installation/installation-data.ts';
import { referenceCaseId } from '../tuning/reference-case.ts';
import { solveProject } from '../analysis/solve-project.ts';
import { runChecks } from '../checks/run-checks.ts';
import { DEFAULT_REFERENCE_TEMPERATURE } from '../loads/defaults.ts';
import { observedTensions } from './observations.ts';
import { fitLengths, type ObservedPosition } from './fit-lengths.ts';
import { identifiability } from './identifiability.ts';
import { planAdjustments } from './adjustments.ts';

export const MAX_FITTED_CABLES = 30;
/** Defaults, common practice: tension acceptance ±10 % of design; fabrication length uncertainty 20 mm. */
export const DEFAULT_ASBUILT_TOLERANCE = 0.1;
export const DEFAULT_LENGTH_UNCERTAINTY = 0.02;
/**
 * Length differences below this many posterior σ are not adjusted: they cannot be told from the
 * measurement noise (2σ ≈ 95 % two-sided for a Gaussian estimate).
 */
export const ADJUSTMENT_SIGMAS = 2;
/** A normalised residual beyond this flags the reading (3σ). */
export const LARGE_RESIDUAL = 3;

export function runAsBuilt(project: ProjectFile, setId: string): AsBuiltResult {
  const sets = project.siteMeasurements ?? [];
  const index = sets.findIndex((s) => s.id === setId);
  if (index < 0) throw new Error(`site measurement set "${setId}" does not exist (siteMeasurements: ${sets.map((s) => `"${s.id}"`).join(', ') || 'none'})`);
  const set = sets[index];
  const where = `siteMeasurements[${index}] "${set.id}"`;
  const tolerance = set.tolerance ?? DEFAULT_ASBUILT_TOLERANCE;
  const sigmaL = set.lengthUncertainty ?? DEFAULT_LENGTH_UNCERTAINTY;
  const tRef = project.meta?.referenceTemperature ?? DEFAULT_REFERENCE_TEMPERATURE;
  const L0 = designUnstressedLengths(project);
  const design = withUnstressedLengths(project, L0);
  const refSpec = project.loadCases.find((c) => c.id === referenceCaseId(project))!;
  const inst = installationData(design, { temperatures: [] });
  const geometry = new Map(inst.members.filter((m) => L0.has(m.id)).map((m) => [m.id, m]));
  const designTension = new Map(inst.members.map((m) => [m.id, m.installationTension]));
  const tensions = observedTensions(set, where, geometry, designTension);
  const positions: ObservedPosition[] = (set.positions ?? []).flatMap((p, i) => {
    const node = project.nodes.find((n) => n.id === p.node);
    if (!node) throw new Error(`${where}.positions[${i}]: node "${p.node}" does not exist`);
    return ([0, 1] as const).map((axis) => ({ node: p.node, axis, temperature: p.temperature, measured: p.at[axis], sigma: p.accuracy }));
  });
  if (tensions.length + positions.length === 0) throw new Error(`${where}: has no readings`);
  const cables = design.members.filter((m) => m.kind === 'cable' && L0.has(m.id)).map((m) => m.id);
  const measured = new Set(tensions.map((t) => t.member));
  const unknowns = cables.length <= MAX_FITTED_CABLES ? cables : cables.filter((id) => measured.has(id));

  const issues: AsBuiltIssue[] = [];
  const fit = fitLengths({ design, L0, unknowns, tensions, positions, referenceCase: refSpec, referenceTemperature: tRef, sigmaL });
  if (!fit.ok) issues.push({ code: 'fitNotConverged', status: 'notConverged' });
  const ident = identifiability(fit.jacobian, unknowns.length);
  const asBuiltLengths = new Map(L0);
  unknowns.forEach((id, k) => asBuiltLengths.set(id, fit.lengths[k]));
  const asBuilt = withUnstressedLengths(project, asBuiltLengths);

  const refProject = (lengths: ReadonlyMap<string, number>): ProjectFile => ({ ...withUnstressedLengths(project, lengths), loadCases: [refSpec], combinations: undefined });
  const solveRef = (lengths: ReadonlyMap<string, number>) => {
    const p = refProject(lengths);
    const c = solveProject(p).report.cases[0];
    return c.converged ? new Map(c.members.map((m) => [m.id, lowerEnd(p, m)])) : null;
  };
  const designRef = solveRef(L0)!;
  const asBuiltRef = solveRef(asBuiltLengths) ?? new Map<string, number>();

  const fits: CableFit[] = unknowns.map((id, k) => {
    const d = designRef.get(id)!, a = asBuiltRef.get(id) ?? NaN;
    return {
      member: id, designLength: L0.get(id)!, asBuiltLength: fit.lengths[k], lengthDifference: fit.lengths[k] - L0.get(id)!,
      lengthSigma: ident.posteriorSigma[k] * sigmaL, identified: ident.identified[k], sensitivity: ident.sensitivity[k],
      designTension: d, asBuiltTension: a, withinTolerance: Math.abs(a - d) <= tolerance * Math.max(Math.abs(d), 1),
    };
  });
  const observations = tensions.map((o, i) => ({ ...o, fitted: fit.tensionFit[i], normalisedResidual: (fit.tensionFit[i] - o.tension) / o.sigma }));
  const positionFits = positions.map((o, i) => ({ ...o, fitted: fit.positionFit[i], normalisedResidual: (fit.positionFit[i] - o.measured) / o.sigma }));
  [...observations].forEach((o) => { if (Math.abs(o.normalisedResidual) > LARGE_RESIDUAL) issues.push({ code: 'largeResidual', index: o.index, member: o.member, value: o.normalisedResidual }); });
  const residuals = [...observations.map((o) => o.normalisedResidual), ...positionFits.map((o) => o.normalisedResidual)];
  const rmsResidual = Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / Math.max(residuals.length, 1));
  const sigmas = [...tensions.map((t) => t.sigma), ...positions.map((p) => p.sigma)];
  const tensionSensitivity = tensions.map((_, i) => unknowns.map((_, k) => (fit.jacobian[i]?.[k] ?? 0) * sigmas[i] / sigmaL));

  const plan = planAdjustments({
    cables: unknowns, design: L0, designTension: designRef, asBuilt: asBuiltLengths, tolerance, solve: solveRef, start: asBuiltRef,
    minimumChange: new Map(fits.map((f) => [f.member, ADJUSTMENT_SIGMAS * f.lengthSigma])),
  });
  const identifiedById = new Map(fits.map((f) => [f.member, f.identified]));
  for (const a of plan.adjustments) a.identified = identifiedById.get(a.member) ?? false;
  if (plan.remaining.length) issues.push({ code: 'adjustmentsIncomplete', members: plan.remaining });
  let checks = null;
  try {
    checks = runChecks(asBuilt, solveProject(asBuilt).report);
  } catch {
    checks = null;
  }
  return {
    id: set.id, referenceTemperature: tRef, tolerance, lengthUncertainty: sigmaL, cables: fits, observations, positions: positionFits,
    rmsResidual, iterations: fit.iterations, tensionSensitivity, adjustments: plan.adjustments, checks, asBuilt, issues,
  };
}

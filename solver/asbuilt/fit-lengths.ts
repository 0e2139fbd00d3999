/**
 * Weighted least-squares fit of as-built unstressed lengths through the nonlinear solver.
 *
 * Unknowns: a factor f_k on the design length L0_k of each fitted cable, scaled by the prior
 * uncertainty (u_k = (f_k − 1)·L0_k / σ_L), so one unit of u is one prior standard deviation.
 * Residuals (all dimensionless): (predicted − observed)/σ for every tension and position reading,
 * each predicted by a full nonlinear solve of the reference case at the reading's temperature,
 * and u_k for every cable (the prior: lengths as designed ± σ_L). Minimised with the bounded
 * Levenberg–Marquardt of solver/tuning (finite-difference sensitivities, each a warm-started
 * re-solve of one model), stopped when the cost falls by less than 1e-9 relatively per iteration.
 * This is the maximum a-posteriori estimate under Gaussian errors (e.g. Tarantola, Inverse Problem
 * Theory, SIAM 2005, ch. 3).
 */
import type { LoadCaseSpec, ProjectFile } from '../project/types.ts';
import type { ResolvedVariable } from '../tuning/tuning-types.ts';
import { createWarmSession } from '../tuning/warm-session.ts';
import { solveBoundedLeastSquares } from '../tuning/levenberg-marquardt.ts';
import { lowerEnd } from '../sequence/stage-evaluation.ts';
import type { ObservedTension } from './observations.ts';

export interface ObservedPosition { node: string; axis: 0 | 1; temperature: number; measured: number; sigma: number }

export interface FitInput {
  /** The design project written by unstressed lengths (solver/sequence/design-lengths.ts). */
  design: ProjectFile;
  L0: ReadonlyMap<string, number>;
  unknowns: readonly string[];
  tensions: readonly ObservedTension[];
  positions: readonly ObservedPosition[];
  referenceCase: LoadCaseSpec;
  referenceTemperature: number;
  sigmaL: number;
}

export interface FitOutput {
  /** Fitted length per unknown, m. */
  lengths: number[];
  tensionFit: number[];
  positionFit: number[];
  /** ∂(normalised measurement residual)/∂u, rows = tension then position readings. */
  jacobian: number[][];
  iterations: number;
  ok: boolean;
}

const caseId = (t: number) => `as built at ${t.toFixed(3)} K`;

export function fitLengths(input: FitInput): FitOutput {
  const temps = [...new Set([...input.tensions.map((t) => t.temperature), ...input.positions.map((p) => p.temperature)])];
  const ref = input.referenceCase;
  const project: ProjectFile = {
    ...input.design,
    loadCases: temps.map((t) => ({ ...ref, id: caseId(t), temperatureChange: (ref.temperatureChange ?? 0) + t - input.referenceTemperature })),
    combinations: undefined,
  };
  const vars: ResolvedVariable[] = input.unknowns.map((id) => {
    const L0 = input.L0.get(id)!;
    return { group: id, by: 'unstressedLength', memberIds: [id], initial: 1, lower: 0.95, upper: 1.05, scale: input.sigmaL / L0, baseUnstressedLength: [L0] };
  });
  const session = createWarmSession(project, vars, temps.map(caseId));
  const predict = (x: readonly number[]) => {
    const res = session(x);
    for (const r of res.values()) if (!r.converged) return null;
    const tensionFit = input.tensions.map((o) => lowerEnd(project, res.get(caseId(o.temperature))!.members.find((m) => m.id === o.member)!));
    const positionFit = input.positions.map((o) => res.get(caseId(o.temperature))!.nodes.find((n) => n.id === o.node)!.position[o.axis]);
    return { tensionFit, positionFit };
  };
  const m = input.tensions.length + input.positions.length;
  const gaps = (x: readonly number[]) => {
    const p = predict(x);
    if (!p) return null;
    return [
      ...input.tensions.map((o, i) => (p.tensionFit[i] - o.tension) / o.sigma),
      ...input.positions.map((o, i) => (p.positionFit[i] - o.measured) / o.sigma),
      ...vars.map((v, k) => (x[k] - 1) / v.scale),
    ];
  };
  let lastCost = Infinity, stalled = false;
  const lm = solveBoundedLeastSquares({
    x0: vars.map(() => 1), lower: vars.map((v) => v.lower), upper: vars.map((v) => v.upper), scale: vars.map((v) => v.scale),
    senses: [...Array(m + vars.length)].map(() => 'equal' as const), evaluate: gaps,
  }, {
    maxIterations: 25, equalityTolerance: 1e-9,
    onIteration: (_i, _x, cost) => { stalled = Number.isFinite(lastCost) && lastCost - cost <= 1e-9 * lastCost; lastCost = cost; },
    isCancelled: () => stalled,
  });
  const final = predict(lm.x);
  return {
    lengths: vars.map((v, k) => lm.x[k] * v.baseUnstressedLength[0]),
    tensionFit: final?.tensionFit ?? [], positionFit: final?.positionFit ?? [],
    jacobian: (lm.jacobian ?? []).slice(0, m),
    iterations: lm.iterations, ok: !!final && !!lm.gaps,
  };
}

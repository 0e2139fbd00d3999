/**
 * Pretension tuning of a project: resolves TuningSpec variables and targets, runs the bounded
 * Levenberg–Marquardt (levenberg-marquardt.ts) with every evaluation a nonlinear re-solve of the
 * cases the targets name (warm session by default, or the injected CaseSolveFn), and explains unmet targets
 * (conflict-diagnosis.ts). The input project is not modified.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { membersOfGroup } from '../checks/groups.ts';
import { applyVariables, memberPretension, resolveVariables } from './tuning-variables.ts';
import { evaluateTarget, targetCases, validateTarget } from './target-evaluation.ts';
import { finiteDifferenceJacobian, isMet, solveBoundedLeastSquares, type GapProblem, type LmOptions } from './levenberg-marquardt.ts';
import { diagnoseTargets } from './conflict-diagnosis.ts';
import { createWarmSession } from './warm-session.ts';
import type { CaseSolveFn, TargetValue, TuningNote, TuningResult, VariableOutcome } from './tuning-types.ts';

export interface TuneOptions extends LmOptions {
  /**
   * How to solve the cases of an edited project. Default: a warm session (warm-session.ts) that
   * keeps one model and warm-starts every case; pass solveNamedCases to rebuild and solve the
   * edited project from scratch each time (slower, the reference path).
   */
  solveCases?: CaseSolveFn;
}

export function tuneProject(project: ProjectFile, options: TuneOptions = {}): TuningResult {
  const spec = project.tuning;
  if (!spec) throw new Error('project has no "tuning" section: add tuning.variables and tuning.targets');
  if (spec.targets.length === 0) throw new Error('tuning: no targets (tuning.targets is empty)');
  spec.targets.forEach((t, i) => validateTarget(project, t, i));
  const vars = resolveVariables(project);
  const caseIds = [...new Set(spec.targets.flatMap((t) => targetCases(project, t)))];
  const margin = options.margin ?? 0.01;
  const eqTol = options.equalityTolerance ?? 1e-3;

  const scales = new Map<string, number>();
  const tensionScale = (group: string): number => {
    let s = scales.get(group);
    if (s === undefined) {
      const ids = [...membersOfGroup(project, group)];
      const ms = ids.map((id) => project.members.find((m) => m.id === id)!);
      s = ms.reduce((acc, m) => acc + Math.abs(memberPretension(project, m)), 0) / Math.max(1, ms.length);
      if (!(s > 0)) s = 1000;
      scales.set(group, s);
    }
    return s;
  };

  const session = options.solveCases ? null : createWarmSession(project, vars, caseIds);
  const solveAt = (x: number[]): Map<string, CaseResult> =>
    session ? session(x) : options.solveCases!(applyVariables(project, vars, x), caseIds);
  const cache = new Map<string, { values: TargetValue[] } | { failure: { case: string; status: string } }>();
  const evaluateAt = (x: number[]) => {
    const key = x.map((v) => v.toPrecision(15)).join(',');
    let hit = cache.get(key);
    if (!hit) {
      const results = solveAt(x);
      const bad = [...results.values()].find((r) => !r.converged);
      hit = bad
        ? { failure: { case: bad.id, status: bad.status } }
        : { values: spec.targets.map((t) => evaluateTarget(project, t, results, tensionScale)) };
      cache.set(key, hit);
    }
    return hit;
  };
  let lastFailure = { case: '', status: '' };
  const problem: GapProblem = {
    x0: vars.map((v) => v.initial),
    lower: vars.map((v) => v.lower),
    upper: vars.map((v) => v.upper),
    scale: vars.map((v) => v.scale),
    senses: spec.targets.map((t) => (t.kind === 'tensionShare' ? 'equal' : 'atMost')),
    evaluate: (x) => {
      const e = evaluateAt(x);
      if ('failure' in e) { lastFailure = e.failure; return null; }
      return e.values.map((v) => v.gap);
    },
  };
  const lm = solveBoundedLeastSquares(problem, options);
  const variables: VariableOutcome[] = vars.map((v, k) => ({
    group: v.group, by: v.by, initial: v.initial, final: lm.x[k], lower: v.lower, upper: v.upper,
    atBound: lm.x[k] <= v.lower ? 'lower' : lm.x[k] >= v.upper ? 'upper' : null,
  }));
  const tuned = applyVariables(project, vars, lm.x);
  if (!lm.gaps) {
    const diagnosis: TuningNote[] = [{ code: 'startUnsolved', quantities: {}, refs: { ...lastFailure } }];
    return {
      status: 'notConverged', targets: [], variables, iterations: 0, evaluations: lm.evaluations,
      diagnosis, project: tuned, summary: `tuning stopped: case '${lastFailure.case}' did not converge (${lastFailure.status})`, cancelled: false,
    };
  }
  const final = evaluateAt(lm.x) as { values: TargetValue[] };
  const met = final.values.map((v, i) => isMet(v.gap, problem.senses[i], eqTol));
  const targets = final.values.map((v, i) => ({
    index: i, target: spec.targets[i], value: v.value, limit: v.limit, unit: v.unit,
    sense: v.sense, governing: v.governing, met: met[i],
  }));
  const diagnosis: TuningNote[] = [];
  if (met.some((m) => !m)) {
    const J = finiteDifferenceJacobian(problem, lm.x, lm.gaps, options.fdStep ?? 1e-3) ?? lm.jacobian;
    if (J) {
      diagnosis.push(...diagnoseTargets({
        senses: problem.senses, gaps: lm.gaps, met, jacobian: J, margin,
        variables: vars.map((v, k) => ({ group: v.group, by: v.by, value: lm.x[k], lower: v.lower, upper: v.upper })),
      }));
    }
    if (lm.failedEvaluation) diagnosis.push({ code: 'trialUnsolved', quantities: {}, refs: { ...lastFailure } });
  }
  const metCount = met.filter(Boolean).length;
  if (lm.cancelled) diagnosis.push({ code: 'cancelled', quantities: {}, refs: {} });
  const summary = `${lm.cancelled ? 'cancelled: ' : ''}${metCount} of ${met.length} targets met after ${lm.iterations} iterations (${lm.evaluations} solves)` +
    (metCount < met.length ? `; not met: target${met.length - metCount === 1 ? '' : 's'} ${met.map((m, i) => (m ? '' : String(i + 1))).filter(Boolean).join(', ')}` : '');
  return {
    status: metCount === met.length ? 'met' : 'unmet', targets, variables, iterations: lm.iterations,
    evaluations: lm.evaluations, diagnosis, project: tuned, summary, cancelled: lm.cancelled,
  };
}

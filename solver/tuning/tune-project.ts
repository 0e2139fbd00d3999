/**
 * Pretension tuning of a project: resolves TuningSpec variables and targets, runs the bounded
 * Levenberg–Marquardt (levenberg-marquardt.ts) with every evaluation a nonlinear re-solve of the
 * cases the targets name, and explains unmet targets (conflict-diagnosis.ts). The input project is
 * not modified.
 *
 * The cases are solved by a strategy (tuning-case-solver.ts): by default one case session in this
 * thread (model and workspace kept), or one injected through TuneOptions.caseSolver (e.g. worker
 * threads). Every solve of an evaluation starts from the solutions at the current point (the start,
 * then each accepted step; the start itself from the pretensioned start shape), so the solves of
 * an evaluation — the cases, and the finite-difference columns of the Jacobian — depend on nothing
 * but their own input, and every strategy that solves the same tasks gives the same run.
 * `tuneProject` runs synchronously; `tuneProjectAsync` awaits a strategy that answers with promises.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { ProjectFile, TuningSpec } from '../project/types.ts';
import { applyVariables, resolveVariables } from './tuning-variables.ts';
import { targetCases, validateTarget } from './target-evaluation.ts';
import {
  differencePoints, isMet, jacobianFromDifferences, leastSquaresSteps, runSteps, type GapProblemShape, type GapReply, type LmOptions,
} from './levenberg-marquardt.ts';
import { diagnoseTargets } from './conflict-diagnosis.ts';
import {
  createSerialCaseSolver, rebuildCaseSolver, type TuningBatch, type TuningBatchResult, type TuningCaseSolver,
  type TuningCaseSolverFactory, type TuningSolveSetup,
} from './tuning-case-solver.ts';
import type { CaseSolveFn, TargetValue, TuningNote, TuningResult, VariableOutcome } from './tuning-types.ts';

export interface TuneOptions extends LmOptions {
  /**
   * How to solve the cases of an edited project from scratch each time (the reference path,
   * slower: applyVariables + e.g. solveNamedCases). Used when `caseSolver` is not given.
   */
  solveCases?: CaseSolveFn;
  /** The strategy that solves the cases (tuning-case-solver.ts). Default createSerialCaseSolver. */
  caseSolver?: TuningCaseSolverFactory;
}

interface Prepared { setup: TuningSolveSetup; spec: TuningSpec }

/** Validates the tuning section and resolves variables and cases; throws naming the entry. */
function prepareTuning(project: ProjectFile): Prepared {
  const spec = project.tuning;
  if (!spec) throw new Error('project has no "tuning" section: add tuning.variables and tuning.targets');
  if (spec.targets.length === 0) throw new Error('tuning: no targets (tuning.targets is empty)');
  spec.targets.forEach((t, i) => validateTarget(project, t, i));
  const variables = resolveVariables(project);
  const caseIds = [...new Set(spec.targets.flatMap((t) => targetCases(project, t)))];
  return { setup: { project, variables, caseIds }, spec };
}

function strategyOf(options: TuneOptions): TuningCaseSolverFactory {
  return options.caseSolver ?? (options.solveCases ? rebuildCaseSolver(options.solveCases) : createSerialCaseSolver);
}

type Evaluation = { values: TargetValue[] } | { failure: { case: string; status: string } };

/** The whole run as a generator of solve batches (see the file comment). */
function* tuningSteps({ setup, spec }: Prepared, options: TuneOptions): Generator<TuningBatch, TuningResult, TuningBatchResult> {
  const { project, variables: vars, caseIds } = setup;
  const margin = options.margin ?? 0.01;
  const eqTol = options.equalityTolerance ?? 1e-3;

  const keyOf = (x: readonly number[]): string => x.map((v) => v.toPrecision(15)).join(',');
  const cache = new Map<string, Evaluation>();
  /** Warm starts of every solve: the solutions at the current point (replaced, never edited). */
  let starts = new Map<string, Float64Array>();
  /** Solutions of the last batch's points whose cases all converged, by point key. */
  let lastPositions = new Map<string, Map<string, Float64Array>>();

  /** Target values at each point; the points not evaluated before are solved in one batch. */
  function* evaluatePoints(points: readonly number[][]): Generator<TuningBatch, Evaluation[], TuningBatchResult> {
    const keys = points.map(keyOf);
    const fresh: number[] = [];
    keys.forEach((k, i) => { if (!cache.has(k) && !fresh.some((j) => keys[j] === k)) fresh.push(i); });
    if (fresh.length > 0) {
      const solved = yield { points: fresh.map((i) => points[i]), starts };
      lastPositions = new Map();
      fresh.forEach((i, j) => {
        const tasks = solved.slice(j * caseIds.length, (j + 1) * caseIds.length);
        const bad = tasks.find((s) => !s.converged);
        if (bad) {
          cache.set(keys[i], { failure: { case: bad.caseId, status: bad.status } });
          return;
        }
        const values = new Array<TargetValue>(spec.targets.length);
        for (const task of tasks) for (const [k, v] of task.targets) values[k] = v;
        cache.set(keys[i], { values });
        lastPositions.set(keys[i], new Map(caseIds.map((id, c) => [id, tasks[c].positions!])));
      });
    }
    return keys.map((k) => cache.get(k)!);
  }

  let lastFailure = { case: '', status: '' };
  const gapsOf = (evaluations: Evaluation[]): GapReply => {
    const failed = evaluations.find((e) => 'failure' in e);
    if (failed && 'failure' in failed) lastFailure = failed.failure;
    return evaluations.map((e) => ('failure' in e ? null : e.values.map((v) => v.gap)));
  };
  const problem: GapProblemShape = {
    x0: vars.map((v) => v.initial),
    lower: vars.map((v) => v.lower),
    upper: vars.map((v) => v.upper),
    scale: vars.map((v) => v.scale),
    senses: spec.targets.map((t) => (t.kind === 'tensionShare' ? 'equal' : 'atMost')),
    accept: (x) => { starts = lastPositions.get(keyOf(x)) ?? starts; },
  };
  const steps = leastSquaresSteps(problem, options);
  let step = steps.next();
  while (!step.done) step = steps.next(gapsOf(yield* evaluatePoints(step.value)));
  const lm = step.value;

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
  const final = (yield* evaluatePoints([lm.x]))[0] as { values: TargetValue[] };
  const met = final.values.map((v, i) => isMet(v.gap, problem.senses[i], eqTol));
  const targets = final.values.map((v, i) => ({
    index: i, target: spec.targets[i], value: v.value, limit: v.limit, unit: v.unit,
    sense: v.sense, governing: v.governing, met: met[i],
  }));
  const diagnosis: TuningNote[] = [];
  if (met.some((m) => !m)) {
    const { points, steps: fd } = differencePoints(problem, lm.x, options.fdStep ?? 1e-3);
    const J = jacobianFromDifferences(problem, lm.gaps, gapsOf(yield* evaluatePoints(points)), fd) ?? lm.jacobian;
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

const isPromise = <T>(v: T | Promise<T>): v is Promise<T> => typeof (v as { then?: unknown }).then === 'function';

/** Tunes in this thread; the strategy (TuneOptions.caseSolver) must answer synchronously. */
export function tuneProject(project: ProjectFile, options: TuneOptions = {}): TuningResult {
  const prepared = prepareTuning(project);
  const solver: TuningCaseSolver = strategyOf(options)(prepared.setup);
  return runSteps(tuningSteps(prepared, options), (batch) => {
    const out = solver.solveBatch(batch);
    if (isPromise(out)) throw new Error('tuneProject: the case solver answers asynchronously; use tuneProjectAsync');
    return out;
  });
}

/** Tunes with a strategy that may answer asynchronously (worker threads); same numbers as tuneProject. */
export async function tuneProjectAsync(project: ProjectFile, options: TuneOptions = {}): Promise<TuningResult> {
  const prepared = prepareTuning(project);
  const solver: TuningCaseSolver = strategyOf(options)(prepared.setup);
  const steps = tuningSteps(prepared, options);
  let step = steps.next();
  while (!step.done) step = steps.next(await solver.solveBatch(step.value));
  return step.value;
}

/**
 * How the cases of a project are shared out among threads (parallel-solve.ts): their ids in
 * report order, the dynamic claim of the next case, and how many threads to use.
 *
 * Claims: one Int32Array over a SharedArrayBuffer, slot 0 the index of the next unclaimed case
 * (in caseIds order), slot p ≥ 1 the cases participant p has claimed. A participant counts its
 * claim in its own slot before it takes an index and takes the count back when no case was left,
 * so once slot 0 has passed the last case, a participant whose slot reads 0 holds no case and
 * can be stopped without losing anything.
 */
import { availableParallelism } from 'node:os';
import type { ProjectFile } from '../../solver/index.ts';

/** Load cases, then combinations, in file order (the order of solveProject's report). */
export function caseIds(project: ProjectFile, only?: readonly string[]): string[] {
  const ids = [...project.loadCases.map((c) => c.id), ...(project.combinations ?? []).map((c) => c.id)];
  return only ? ids.filter((id) => only.includes(id)) : ids;
}

/** A claim buffer for `participants` threads (see the file comment). */
export function createClaims(participants: number): SharedArrayBuffer {
  return new SharedArrayBuffer(4 * (participants + 1));
}

/** The next case for participant `slot` (≥ 1), or undefined when every case is taken. */
export function caseClaimer(ids: readonly string[], claims: SharedArrayBuffer, slot: number): () => string | undefined {
  const view = new Int32Array(claims);
  return () => {
    Atomics.add(view, slot, 1);
    const k = Atomics.add(view, 0, 1);
    if (k < ids.length) return ids[k];
    Atomics.sub(view, slot, 1);
    return undefined;
  };
}

/** Cases participant `slot` has claimed so far. */
export function claimedBy(claims: SharedArrayBuffer, slot: number): number {
  return Atomics.load(new Int32Array(claims), slot);
}

/** Threads for `cases` cases: STAYSET_WORKERS if set, else the available cores (at most the cases). */
export function defaultWorkerCount(cases: number, env: Record<string, string | undefined> = process.env): number {
  const forced = Number(env.STAYSET_WORKERS);
  const n = Number.isInteger(forced) && forced >= 1 ? forced : availableParallelism();
  return Math.max(1, Math.min(n, cases));
}

/**
 * Smallest predicted work (translational DOFs × case solves) for which helper threads are started
 * by default. A new worker thread pays its start (loading the bundle, building the model) and runs
 * its first cases before V8 has optimised the solver, while both threads' compiler and collector
 * threads compete for the cores: on the 2-core build machine two threads were slower than one for
 * the 72-case design benchmark models (1,350 and 2,007 DOFs: 97,000 and 145,000 DOF-cases, about
 * 0.6 and 1.3 s serial) and 1.2–1.6× faster for 288 cases of the 2,007-DOF canopy (578,000 DOF-cases,
 * about 5 s serial; measured in one run, DEVELOPERS.md "Benchmarks"). The threshold sits between.
 */
export const PARALLEL_MIN_WORK = 350_000;

/** Translational DOFs the project's model will have: 3 per node, 3 per interior node of a member split into segments. */
export function translationalDofs(project: ProjectFile): number {
  let nodes = project.nodes.length;
  for (const m of project.members) nodes += Math.max(1, Math.floor(m.segments ?? 1)) - 1;
  return 3 * nodes;
}

/**
 * Threads worth starting for `solves` case solves of `project`: STAYSET_WORKERS when set (the
 * user's choice, kept even for small runs); otherwise one when the predicted work is below
 * PARALLEL_MIN_WORK, else the available cores (at most the solves).
 */
export function workerCountFor(project: ProjectFile, solves: number, env: Record<string, string | undefined> = process.env): number {
  const forced = Number(env.STAYSET_WORKERS);
  if (Number.isInteger(forced) && forced >= 1) return Math.max(1, Math.min(forced, solves));
  if (translationalDofs(project) * solves < PARALLEL_MIN_WORK) return 1;
  return defaultWorkerCount(solves, env);
}

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

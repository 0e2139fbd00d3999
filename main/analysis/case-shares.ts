/**
 * How the cases of a project are shared out among worker threads (parallel-solve.ts): their
 * ids in report order, round-robin shares, and how many threads to use.
 */
import { availableParallelism } from 'node:os';
import type { ProjectFile } from '../../solver/index.ts';

/** Load cases, then combinations, in file order (the order of solveProject's report). */
export function caseIds(project: ProjectFile, only?: readonly string[]): string[] {
  const ids = [...project.loadCases.map((c) => c.id), ...(project.combinations ?? []).map((c) => c.id)];
  return only ? ids.filter((id) => only.includes(id)) : ids;
}

/** Case i goes to share i mod workers. */
export function splitCases(ids: readonly string[], workers: number): string[][] {
  const parts = Array.from({ length: Math.max(1, Math.min(workers, ids.length)) }, () => [] as string[]);
  ids.forEach((id, i) => parts[i % parts.length].push(id));
  return parts;
}

/** Threads for `cases` cases: STAYSET_WORKERS if set, else the available cores (at most the cases). */
export function defaultWorkerCount(cases: number, env: Record<string, string | undefined> = process.env): number {
  const forced = Number(env.STAYSET_WORKERS);
  const n = Number.isInteger(forced) && forced >= 1 ? forced : availableParallelism();
  return Math.max(1, Math.min(n, cases));
}

/**
 * Argument checks for every StaysetHost method, run by the host (Electron main or web host)
 * before it does anything. A renderer is never trusted: each argument is checked for type,
 * size and shape, and projects go through the full project validation.
 *
 * Each check returns either the typed arguments or one message naming the argument and the
 * problem, e.g. `save: argument 1 (path) must be a non-empty string`.
 */
import type { ProjectFile } from '../../solver/index.ts';
import type { HostMethodName } from './web-protocol.ts';
import { validateProject } from './project/index.ts';
import { checkSiteRequest, type SiteRequest } from './site/site-run.ts';

export type Checked<T> = { ok: true; value: T } | { ok: false; error: string };

/** Longest path accepted, characters (Windows long paths stay well below this). */
export const MAX_PATH_LENGTH = 4096;
export const MAX_TITLE_LENGTH = 300;

/** Arguments of each method after validation. */
export interface HostArgs {
  kind: [];
  openInitial: [];
  open: [path: string | undefined];
  save: [path: string, project: ProjectFile];
  saveAs: [project: ProjectFile, path: string | undefined];
  recentProjects: [];
  listRecovery: [];
  recover: [id: string];
  autosave: [path: string | null, project: ProjectFile];
  discardRecovery: [path: string | null];
  runAnalysis: [project: ProjectFile];
  cancelAnalysis: [runId: string];
  caseFields: [runId: string, caseIndex: number];
  printSchedule: [project: ProjectFile, path: string | undefined];
  setDirty: [dirty: boolean, title: string];
  printReady: [];
  runSite: [project: ProjectFile, request: SiteRequest];
  cancelSite: [];
  printSiteDocument: [project: ProjectFile, request: SiteRequest, path: string | undefined];
}

class ArgError extends Error {}

function fail(method: string, index: number, name: string, problem: string): never {
  throw new ArgError(`${method}: argument ${index + 1} (${name}) ${problem}`);
}

export function checkPath(method: string, index: number, value: unknown): string {
  if (typeof value !== 'string' || value.length === 0) fail(method, index, 'path', 'must be a non-empty string');
  if (value.length > MAX_PATH_LENGTH) fail(method, index, 'path', `is longer than ${MAX_PATH_LENGTH} characters`);
  if (value.includes('\0')) fail(method, index, 'path', 'contains a NUL character');
  return value;
}

function optionalPath(method: string, index: number, value: unknown): string | undefined {
  return value === undefined || value === null ? undefined : checkPath(method, index, value);
}

function nullablePath(method: string, index: number, value: unknown): string | null {
  return value === null || value === undefined ? null : checkPath(method, index, value);
}

/** Recovery ids and run ids: lowercase hex, 8–64 characters. */
export const ID_PATTERN = /^[0-9a-f]{8,64}$/;

function checkId(method: string, index: number, name: string, value: unknown): string {
  if (typeof value !== 'string' || !ID_PATTERN.test(value)) fail(method, index, name, 'must be an id of 8–64 hex digits');
  return value;
}

export function checkProject(method: string, index: number, value: unknown): ProjectFile {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) fail(method, index, 'project', 'must be a project object');
  const outcome = validateProject(value);
  if (!outcome.ok) {
    const shown = outcome.errors.slice(0, 5).join('; ');
    const more = outcome.errors.length > 5 ? ` (and ${outcome.errors.length - 5} more)` : '';
    fail(method, index, 'project', `is not a valid project: ${shown}${more}`);
  }
  return value as ProjectFile;
}

function siteRequest(method: string, index: number, value: unknown, documentOnly = false): SiteRequest {
  const r = checkSiteRequest(value);
  if (!r.ok) fail(method, index, 'request', r.error);
  if (documentOnly && r.value.kind !== 'crewSheet' && r.value.kind !== 'report') fail(method, index, 'request', 'must be a crewSheet or report request');
  return r.value;
}

function checkCount(method: string, args: unknown[], max: number): void {
  if (args.length > max) throw new ArgError(`${method}: expected at most ${max} argument(s), got ${args.length}`);
}

type Checkers = { [M in HostMethodName]: (a: unknown[]) => HostArgs[M] };

const checkers: Checkers = {
  kind: (a) => (checkCount('kind', a, 0), []),
  openInitial: (a) => (checkCount('openInitial', a, 0), []),
  open: (a) => (checkCount('open', a, 1), [optionalPath('open', 0, a[0])]),
  save: (a) => (checkCount('save', a, 2), [checkPath('save', 0, a[0]), checkProject('save', 1, a[1])]),
  saveAs: (a) => (checkCount('saveAs', a, 2), [checkProject('saveAs', 0, a[0]), optionalPath('saveAs', 1, a[1])]),
  recentProjects: (a) => (checkCount('recentProjects', a, 0), []),
  listRecovery: (a) => (checkCount('listRecovery', a, 0), []),
  recover: (a) => (checkCount('recover', a, 1), [checkId('recover', 0, 'id', a[0])]),
  autosave: (a) => (checkCount('autosave', a, 2), [nullablePath('autosave', 0, a[0]), checkProject('autosave', 1, a[1])]),
  discardRecovery: (a) => (checkCount('discardRecovery', a, 1), [nullablePath('discardRecovery', 0, a[0])]),
  runAnalysis: (a) => (checkCount('runAnalysis', a, 1), [checkProject('runAnalysis', 0, a[0])]),
  cancelAnalysis: (a) => (checkCount('cancelAnalysis', a, 1), [checkId('cancelAnalysis', 0, 'runId', a[0])]),
  caseFields: (a) => {
    checkCount('caseFields', a, 2);
    const runId = checkId('caseFields', 0, 'runId', a[0]);
    if (!Number.isInteger(a[1]) || (a[1] as number) < 0) fail('caseFields', 1, 'caseIndex', 'must be a whole number ≥ 0');
    return [runId, a[1] as number];
  },
  printSchedule: (a) => (checkCount('printSchedule', a, 2), [checkProject('printSchedule', 0, a[0]), optionalPath('printSchedule', 1, a[1])]),
  setDirty: (a) => {
    checkCount('setDirty', a, 2);
    if (typeof a[0] !== 'boolean') fail('setDirty', 0, 'dirty', 'must be true or false');
    if (typeof a[1] !== 'string') fail('setDirty', 1, 'title', 'must be a string');
    if (a[1].length > MAX_TITLE_LENGTH) fail('setDirty', 1, 'title', `is longer than ${MAX_TITLE_LENGTH} characters`);
    return [a[0], a[1]];
  },
  printReady: (a) => (checkCount('printReady', a, 0), []),
  runSite: (a) => (checkCount('runSite', a, 2), [checkProject('runSite', 0, a[0]), siteRequest('runSite', 1, a[1])]),
  cancelSite: (a) => (checkCount('cancelSite', a, 0), []),
  printSiteDocument: (a) => (checkCount('printSiteDocument', a, 3),
    [checkProject('printSiteDocument', 0, a[0]), siteRequest('printSiteDocument', 1, a[1], true), optionalPath('printSiteDocument', 2, a[2])]),
};

/** Validate the raw arguments of one method call. `args` must be an array. */
export function validateHostArgs<M extends HostMethodName>(method: M, args: unknown): Checked<HostArgs[M]> {
  if (!Array.isArray(args)) return { ok: false, error: `${method}: arguments must be an array` };
  try {
    return { ok: true, value: checkers[method](args) as HostArgs[M] };
  } catch (e) {
    if (e instanceof ArgError) return { ok: false, error: e.message };
    throw e;
  }
}

/** A host's implementation of every method, taking validated arguments. */
export type HostHandlers = {
  [M in HostMethodName]: (...args: HostArgs[M]) => Promise<Awaited<ReturnType<import('./host-contract.ts').StaysetHost[M]>>>;
};

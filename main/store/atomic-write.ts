/**
 * Crash-safe file replacement.
 *
 * Sequence (POSIX rename semantics; the target is only ever replaced by rename, so at every
 * instant it is either the complete old file or the complete new one):
 *   1. write the new content to a temp file beside the target (same directory, unique name),
 *      fsync it and close it;
 *   2. if a backup is wanted and the target exists: hard-link the target to a temp name and
 *      rename that over `<name>.bak` (falls back to copy + fsync where links are unsupported);
 *   3. rename the temp file over the target;
 *   4. fsync the directory so the rename itself is durable (skipped where the OS refuses it).
 * On any failure the temp file is removed and the target is untouched.
 *
 * Temp files are named `.<name>.<pid>-<random>.stayset-tmp`. The next write of the same target
 * removes only leftovers of processes that no longer run (or of this process, when not in
 * flight), so two processes writing one file never remove each other's temp file. Writes to
 * one target from this process are queued (never interleaved).
 *
 * What the replaced file had is kept (write-keep.ts): a symlink is written through to its
 * target, mode and owner carry over, a read-only file is refused. With `expect`, the write is
 * refused when the target on disk is no longer the file that was read (lost-update guard).
 */
import { randomBytes } from 'node:crypto';
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { currentStamp, sameStamp, stampOf, type FileStamp } from './file-stamp.ts';
import { checkReplaceable, keepModeAndOwner, resolveWriteTarget, WriteRefusedError } from './write-keep.ts';

export const TEMP_SUFFIX = '.stayset-tmp';
export const BACKUP_SUFFIX = '.bak';

export interface AtomicWriteOptions {
  /** Keep the replaced file as `<target>.bak`. Default false. */
  backup?: boolean;
  /**
   * The target as it was read (its stamp), or null for "must not exist": when the file on disk
   * is something else by the time of the rename, nothing is written (WriteRefusedError 'changed').
   */
  expect?: FileStamp | null;
}

/** Temp files of this process's writes in progress (resolved paths). */
const inFlight = new Set<string>();

export function tempPathFor(target: string, pid = process.pid): string {
  const dir = path.dirname(target);
  return path.join(dir, `.${path.basename(target)}.${pid}-${randomBytes(6).toString('hex')}${TEMP_SUFFIX}`);
}

/** The writer's pid of a temp file of `target` (null for the older pid-less form), or undefined when it is none. */
function tempOwner(target: string, fileName: string): number | null | undefined {
  const prefix = `.${path.basename(target)}.`;
  if (!fileName.startsWith(prefix) || !fileName.endsWith(TEMP_SUFFIX)) return undefined;
  const middle = fileName.slice(prefix.length, -TEMP_SUFFIX.length);
  const m = /^(?:(\d+)-)?[0-9a-f]{12}$/.exec(middle);
  if (!m) return undefined;
  return m[1] === undefined ? null : Number(m[1]);
}

export function isTempFileOf(target: string, fileName: string): boolean {
  return tempOwner(target, fileName) !== undefined;
}

function processRuns(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM'; // runs, under another user
  }
}

/** Older pid-less temp files count as left over after this long, ms. */
const LEGACY_TEMP_AGE_MS = 10 * 60_000;

async function isLeftover(target: string, file: string, name: string): Promise<boolean> {
  const pid = tempOwner(target, name);
  if (pid === undefined) return false;
  if (pid === null) {
    try {
      return Date.now() - (await fs.stat(file)).mtimeMs > LEGACY_TEMP_AGE_MS;
    } catch {
      return false;
    }
  }
  if (pid === process.pid) return !inFlight.has(file);
  return !processRuns(pid);
}

/**
 * Remove temp files that writers which no longer run left beside `target` (and this process's
 * own leftovers); another running writer's temp file is left alone. Returns how many were removed.
 */
export async function removeStaleTemps(target: string): Promise<number> {
  const dir = path.dirname(target);
  let names: string[];
  try {
    names = await fs.readdir(dir);
  } catch {
    return 0;
  }
  let removed = 0;
  for (const name of names) {
    const file = path.join(dir, name);
    if (!(await isLeftover(target, file, name))) continue;
    await fs.rm(file, { force: true });
    removed++;
  }
  return removed;
}

/** Write, sync and close `file`; its stamp as written (kept by the rename that follows). */
async function writeAndSync(file: string, data: string | Uint8Array, keep: (h: fs.FileHandle) => Promise<void>): Promise<FileStamp> {
  const handle = await fs.open(file, 'wx', 0o666);
  try {
    await keep(handle);
    await handle.writeFile(data);
    await handle.sync();
    return stampOf(await handle.stat());
  } finally {
    await handle.close();
  }
}

async function syncDirectory(dir: string): Promise<void> {
  let handle: fs.FileHandle | undefined;
  try {
    handle = await fs.open(dir, 'r');
    await handle.sync();
  } catch {
    // Windows cannot open or fsync a directory; rename is still atomic there (MoveFileEx).
  } finally {
    await handle?.close();
  }
}

async function exists(file: string): Promise<boolean> {
  try {
    await fs.lstat(file);
    return true;
  } catch {
    return false;
  }
}

async function keepBackup(target: string): Promise<void> {
  const backup = target + BACKUP_SUFFIX;
  const staging = tempPathFor(backup);
  inFlight.add(staging);
  try {
    await fs.link(target, staging);
  } catch {
    await fs.copyFile(target, staging);
    const h = await fs.open(staging, 'r+');
    try { await h.sync(); } finally { await h.close(); }
  }
  try {
    await renameWithRetry(staging, backup);
  } catch (e) {
    await fs.rm(staging, { force: true });
    inFlight.delete(staging);
    throw e;
  }
  // When a killed save left the backup as a hard link to the target itself, staging and backup are
  // the same file and POSIX rename() does nothing, leaving staging behind: remove that extra link.
  await fs.rm(staging, { force: true });
  inFlight.delete(staging);
}

const queues = new Map<string, Promise<unknown>>();

/**
 * Replace `target` (or the file its symlinks lead to) with `data` atomically (see the module
 * comment). Refusals throw WriteRefusedError with a message for the user.
 */
export async function writeFileAtomic(target: string, data: string | Uint8Array, options: AtomicWriteOptions = {}): Promise<FileStamp> {
  const key = await resolveWriteTarget(target);
  const previous = queues.get(key) ?? Promise.resolve();
  const next = previous.catch(() => undefined).then(() => replaceFile(key, data, options));
  queues.set(key, next);
  const forget = (): void => {
    if (queues.get(key) === next) queues.delete(key);
  };
  next.then(forget, forget);
  return next;
}

/** Errors a virus scanner or indexer holding the file briefly can cause on Windows. */
const TRANSIENT = new Set(['EPERM', 'EBUSY', 'EACCES']);

async function renameWithRetry(from: string, to: string, attempts = 6): Promise<void> {
  for (let i = 1; ; i++) {
    try {
      return await fs.rename(from, to);
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code ?? '';
      if (process.platform !== 'win32' || !TRANSIENT.has(code) || i >= attempts) throw e;
      await new Promise((r) => setTimeout(r, 40 * i));
    }
  }
}

async function replaceFile(target: string, data: string | Uint8Array, options: AtomicWriteOptions): Promise<FileStamp> {
  await removeStaleTemps(target);
  await removeStaleTemps(target + BACKUP_SUFFIX);
  const old = await checkReplaceable(target);
  const temp = tempPathFor(target);
  inFlight.add(temp);
  let written: FileStamp;
  try {
    written = await writeAndSync(temp, data, (h) => keepModeAndOwner(h, old, path.basename(target)));
    if (options.expect !== undefined) await checkUnchanged(target, options.expect);
    if (options.backup && (await exists(target))) await keepBackup(target);
    await renameWithRetry(temp, target);
  } catch (e) {
    await fs.rm(temp, { force: true });
    throw e;
  } finally {
    inFlight.delete(temp);
  }
  await syncDirectory(path.dirname(target));
  return written;
}

async function checkUnchanged(target: string, expected: FileStamp | null): Promise<void> {
  const now = await currentStamp(target);
  const same = expected === null ? now === null : now !== null && sameStamp(now, expected);
  if (same) return;
  const name = path.basename(target);
  throw new WriteRefusedError('changed', expected === null
    ? `${name} was created by someone else since; it was not replaced.`
    : `${name} changed on disk since it was read (another program or window saved it); it was not overwritten, so that version is kept. Reopen it to see the changes, or save under another name.`);
}

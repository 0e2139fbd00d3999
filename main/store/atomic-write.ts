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
 * Leftover temp files from a killed process are named `.<name>.<random>.stayset-tmp` and are
 * removed by the next write of the same target. Writes to one target from this process are
 * queued (never interleaved); one writing process per file is assumed.
 */
import { randomBytes } from 'node:crypto';
import { promises as fs } from 'node:fs';
import path from 'node:path';

export const TEMP_SUFFIX = '.stayset-tmp';
export const BACKUP_SUFFIX = '.bak';

export interface AtomicWriteOptions {
  /** Keep the replaced file as `<target>.bak`. Default false. */
  backup?: boolean;
}

export function tempPathFor(target: string): string {
  const dir = path.dirname(target);
  return path.join(dir, `.${path.basename(target)}.${randomBytes(6).toString('hex')}${TEMP_SUFFIX}`);
}

export function isTempFileOf(target: string, fileName: string): boolean {
  const prefix = `.${path.basename(target)}.`;
  return fileName.startsWith(prefix) && fileName.endsWith(TEMP_SUFFIX)
    && /^[0-9a-f]{12}$/.test(fileName.slice(prefix.length, -TEMP_SUFFIX.length));
}

/** Remove temp files a killed writer left beside `target`. Returns how many were removed. */
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
    if (!isTempFileOf(target, name)) continue;
    await fs.rm(path.join(dir, name), { force: true });
    removed++;
  }
  return removed;
}

async function writeAndSync(file: string, data: string | Uint8Array): Promise<void> {
  const handle = await fs.open(file, 'wx', 0o644);
  try {
    await handle.writeFile(data);
    await handle.sync();
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
    throw e;
  }
  // When a killed save left the backup as a hard link to the target itself, staging and backup are
  // the same file and POSIX rename() does nothing, leaving staging behind: remove that extra link.
  await fs.rm(staging, { force: true });
}

const queues = new Map<string, Promise<void>>();

/** Replace `target` with `data` atomically (see the module comment). */
export function writeFileAtomic(target: string, data: string | Uint8Array, options: AtomicWriteOptions = {}): Promise<void> {
  const key = path.resolve(target);
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

async function replaceFile(target: string, data: string | Uint8Array, options: AtomicWriteOptions): Promise<void> {
  await removeStaleTemps(target);
  await removeStaleTemps(target + BACKUP_SUFFIX);
  const temp = tempPathFor(target);
  try {
    await writeAndSync(temp, data);
    if (options.backup && (await exists(target))) await keepBackup(target);
    await renameWithRetry(temp, target);
  } catch (e) {
    await fs.rm(temp, { force: true });
    throw e;
  }
  await syncDirectory(path.dirname(target));
}

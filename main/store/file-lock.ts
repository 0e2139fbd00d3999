/**
 * A lock file for read-modify-write of small shared files (the recent list) by several
 * processes: `<file>.lock` created exclusively (O_EXCL) holding the owner's pid. A lock whose
 * owner no longer runs, or older than `staleMs`, is broken. Waits with a short random back-off
 * up to `timeoutMs`, then throws (the caller reports, never hangs).
 */
import { promises as fs } from 'node:fs';

export interface LockOptions {
  staleMs?: number;
  timeoutMs?: number;
}

function runs(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

async function isStale(lock: string, staleMs: number): Promise<boolean> {
  try {
    const [text, st] = await Promise.all([fs.readFile(lock, 'utf8'), fs.stat(lock)]);
    const pid = Number(text.trim());
    if (Date.now() - st.mtimeMs > staleMs) return true;
    return Number.isInteger(pid) && pid > 0 && pid !== process.pid && !runs(pid);
  } catch {
    return false; // gone already, or being written: try again
  }
}

/** Run `job` while holding `<file>.lock`. */
export async function withFileLock<T>(file: string, job: () => Promise<T>, options: LockOptions = {}): Promise<T> {
  const lock = `${file}.lock`;
  const staleMs = options.staleMs ?? 10_000;
  const deadline = Date.now() + (options.timeoutMs ?? 5_000);
  for (;;) {
    try {
      const handle = await fs.open(lock, 'wx');
      try {
        await handle.writeFile(String(process.pid));
      } finally {
        await handle.close();
      }
      break;
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw e;
      if (await isStale(lock, staleMs)) {
        await fs.rm(lock, { force: true });
        continue;
      }
      if (Date.now() > deadline) throw new Error(`${lock} is held by another process`);
      await new Promise((r) => setTimeout(r, 5 + Math.random() * 20));
    }
  }
  try {
    return await job();
  } finally {
    await fs.rm(lock, { force: true });
  }
}

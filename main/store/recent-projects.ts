/**
 * The recent-projects list: a small JSON file (`recent-projects.json`) in the user data folder,
 * newest first, deduplicated by resolved path, capped at `RECENT_LIMIT` entries. A missing or
 * damaged list reads as empty (it is a convenience, never a reason to fail). Updates are
 * read-modify-write under a lock file (file-lock.ts), so two processes (desktop and web host, two
 * windows) do not lose each other's entries; a failed update throws for the caller to report.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import type { RecentEntry } from '../common/host-contract.ts';
import { writeFileAtomic } from './atomic-write.ts';
import { withFileLock } from './file-lock.ts';
import { readRegularFile } from './read-regular-file.ts';

export const RECENT_LIMIT = 12;
export const RECENT_FILE = 'recent-projects.json';

function samePath(a: string, b: string): boolean {
  return process.platform === 'win32' || process.platform === 'darwin' ? a.toLowerCase() === b.toLowerCase() : a === b;
}

function isEntry(v: unknown): v is RecentEntry {
  const e = v as RecentEntry;
  return typeof e === 'object' && e !== null && typeof e.path === 'string' && typeof e.name === 'string' && typeof e.openedAt === 'string';
}

/** Put `entry` first, drop older duplicates of its path, keep at most `limit`. Pure. */
export function addRecent(list: RecentEntry[], entry: RecentEntry, limit = RECENT_LIMIT): RecentEntry[] {
  return [entry, ...list.filter((e) => !samePath(e.path, entry.path))].slice(0, limit);
}

export class RecentProjects {
  private readonly file: string;
  /** Updates run one after another (read-modify-write). */
  private chain: Promise<unknown> = Promise.resolve();
  constructor(userDataDir: string) {
    this.file = path.join(userDataDir, RECENT_FILE);
  }

  private serial<T>(job: () => Promise<T>): Promise<T> {
    const next = this.chain.catch(() => undefined).then(job);
    this.chain = next;
    return next;
  }

  async list(): Promise<RecentEntry[]> {
    try {
      const read = await readRegularFile(this.file, RECENT_FILE, 1024 * 1024);
      if (!read.ok) return [];
      const data: unknown = JSON.parse(read.bytes.toString('utf8'));
      return Array.isArray(data) ? data.filter(isEntry).slice(0, RECENT_LIMIT) : [];
    } catch {
      return [];
    }
  }

  add(projectPath: string, now = new Date()): Promise<RecentEntry[]> {
    return this.serial(async () => {
      const resolved = path.resolve(projectPath);
      await fs.mkdir(path.dirname(this.file), { recursive: true });
      return withFileLock(this.file, async () => {
        const next = addRecent(await this.list(), { path: resolved, name: path.basename(resolved), openedAt: now.toISOString() });
        await writeFileAtomic(this.file, JSON.stringify(next, null, 2) + '\n');
        return next;
      });
    });
  }

  remove(projectPath: string): Promise<void> {
    return this.serial(async () => {
      const resolved = path.resolve(projectPath);
      if (!(await this.list()).some((e) => samePath(e.path, resolved))) return;
      await withFileLock(this.file, async () => {
        const list = await this.list();
        const next = list.filter((e) => !samePath(e.path, resolved));
        if (next.length !== list.length) await writeFileAtomic(this.file, JSON.stringify(next, null, 2) + '\n');
      });
    });
  }
}

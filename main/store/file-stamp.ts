/**
 * What a file was when it was read, to tell later whether it changed on disk since (lost-update
 * guard). Device and inode change when a file is replaced by rename (every atomic save, ours or
 * another program's); size and modification time change when it is rewritten in place.
 */
import type { Stats } from 'node:fs';
import { promises as fs } from 'node:fs';

export interface FileStamp {
  dev: number;
  ino: number;
  size: number;
  mtimeMs: number;
}

export function stampOf(st: Stats): FileStamp {
  return { dev: st.dev, ino: st.ino, size: st.size, mtimeMs: st.mtimeMs };
}

export function sameStamp(a: FileStamp, b: FileStamp): boolean {
  return a.dev === b.dev && a.ino === b.ino && a.size === b.size && a.mtimeMs === b.mtimeMs;
}

/** The stamp of `file` now (symlinks followed), or null when it does not exist or cannot be stat'ed. */
export async function currentStamp(file: string): Promise<FileStamp | null> {
  try {
    return stampOf(await fs.stat(file));
  } catch {
    return null;
  }
}

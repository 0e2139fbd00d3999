/**
 * What an atomic save keeps of the file it replaces (atomic-write.ts): the replacement is a new
 * inode renamed over the old one, so without care it would get default permissions, the writer as
 * owner, and would replace a symlink instead of the file it points to, and rename(2) would even
 * replace a file its owner made read-only (only the folder's permissions are checked).
 *
 * - symlinks: the write goes to the file the link points to (followed to the end, also when that
 *   file does not exist yet); the link stays a link. The web host resolves the same way.
 * - permissions: the new file gets the old file's mode bits exactly (umask does not apply).
 * - owner and group: kept when the process may set them (root, or the group for a member);
 *   a file of another owner that could not be kept is not replaced (WriteRefusedError 'owner').
 * - read-only: a file with no write bit at all, or one this process may not write
 *   (access(2) W_OK), is not replaced (WriteRefusedError 'readOnly').
 * POSIX only; on Windows mode and owner are left to the OS (ACLs are inherited from the folder).
 */
import { constants, promises as fs, type Stats } from 'node:fs';
import path from 'node:path';

export type WriteRefusal = 'readOnly' | 'owner' | 'notRegular' | 'changed';

export class WriteRefusedError extends Error {
  constructor(readonly refusal: WriteRefusal, message: string) {
    super(message);
    this.name = 'WriteRefusedError';
  }
}

const POSIX = process.platform !== 'win32';

/** The file a write to `target` must replace: `target` itself, or where its symlinks lead. */
export async function resolveWriteTarget(target: string): Promise<string> {
  let current = path.resolve(target);
  for (let hops = 0; hops < 40; hops++) {
    let st: Stats;
    try {
      st = await fs.lstat(current);
    } catch {
      return current; // a new file (or a dangling link's destination)
    }
    if (!st.isSymbolicLink()) return current;
    current = path.resolve(path.dirname(current), await fs.readlink(current));
  }
  throw new WriteRefusedError('notRegular', `${path.basename(target)}: too many levels of symbolic links`);
}

/** Stats of the file about to be replaced (null when there is none), or a refusal. */
export async function checkReplaceable(real: string): Promise<Stats | null> {
  let st: Stats;
  try {
    st = await fs.stat(real);
  } catch {
    return null;
  }
  const name = path.basename(real);
  if (!st.isFile()) throw new WriteRefusedError('notRegular', `${name} is not a regular file; it was not replaced.`);
  if (POSIX) {
    let writable = (st.mode & 0o222) !== 0;
    if (writable) {
      try {
        await fs.access(real, constants.W_OK);
      } catch {
        writable = false;
      }
    }
    if (!writable) {
      throw new WriteRefusedError('readOnly', `${name} is read-only (permissions ${(st.mode & 0o777).toString(8)}); it was not replaced. Make it writable, or save under another name.`);
    }
  }
  return st;
}

/** Give the new file (open as `handle`) the mode and, where permitted, the owner of `old`. */
export async function keepModeAndOwner(handle: fs.FileHandle, old: Stats | null, name: string): Promise<void> {
  if (!POSIX || old === null) return;
  await handle.chmod(old.mode & 0o7777);
  const uid = process.getuid?.() ?? -1;
  const gid = process.getgid?.() ?? -1;
  if (old.uid === uid && old.gid === gid) return;
  try {
    await handle.chown(old.uid, old.gid);
  } catch {
    if (old.uid !== uid) {
      throw new WriteRefusedError('owner', `${name} belongs to another user (uid ${old.uid}); replacing it would make it yours, so it was not replaced. Save under another name.`);
    }
    // Our file in a group we may not set: keep what we can (the group falls back to ours).
  }
  // chown may clear set-id bits: put the mode back.
  await handle.chmod(old.mode & 0o7777);
}

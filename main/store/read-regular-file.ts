/**
 * Reading a file the user named, safely: regular files only (a FIFO would block forever,
 * /dev/zero never ends, a folder is not a project) and at most MAX_PROJECT_FILE_BYTES
 * (main/common/limits/file-limits.ts), checked before reading and again while reading (a file
 * that grows is cut off, not followed). The file is opened non-blocking, so opening a FIFO returns
 * at once; its type is then checked on the open descriptor (no race with a rename in between).
 * Used by the CLI (sync) and by the project store for both hosts (async).
 */
import { closeSync, constants, fstatSync, openSync, promises as fs, readSync, statSync, type Stats } from 'node:fs';
import { byteLimitText, MAX_PROJECT_FILE_BYTES } from '../common/limits/file-limits.ts';
import { stampOf, type FileStamp } from './file-stamp.ts';

export type RegularRead =
  | { ok: true; bytes: Buffer; stamp: FileStamp }
  | { ok: false; reason: 'missing' | 'notRegular' | 'tooLarge' | 'unreadable'; error: string };

const OPEN_FLAGS = constants.O_RDONLY | (constants.O_NONBLOCK ?? 0);

function kindOf(st: Stats): string {
  if (st.isDirectory()) return 'a folder';
  if (st.isFIFO()) return 'a named pipe (FIFO)';
  if (st.isCharacterDevice() || st.isBlockDevice()) return 'a device';
  if (st.isSocket()) return 'a socket';
  return 'not a regular file';
}

/** The refusal for a non-regular or oversized file, or null when `st` may be read. */
function refusal(name: string, st: Stats, limit: number): RegularRead | null {
  if (!st.isFile()) return { ok: false, reason: 'notRegular', error: `${name}: is ${kindOf(st)}, not a project file; only regular files are read` };
  if (st.size > limit) return tooLarge(name, st.size, limit);
  return null;
}

function tooLarge(name: string, size: number, limit: number): RegularRead {
  return { ok: false, reason: 'tooLarge', error: `${name}: ${size.toLocaleString('en-US')} bytes or more is larger than the ${byteLimitText(limit)} limit on project files` };
}

/** A buffer of `length` bytes holding the first `used` bytes of `buf`. */
function grown(buf: Buffer, used: number, length: number): Buffer {
  const next = Buffer.allocUnsafe(length);
  buf.copy(next, 0, 0, used);
  return next;
}

function failure(name: string, e: unknown): RegularRead {
  const code = (e as NodeJS.ErrnoException).code;
  if (code === 'ENOENT') return { ok: false, reason: 'missing', error: `${name}: no such file` };
  if (code === 'EISDIR') return { ok: false, reason: 'notRegular', error: `${name}: is a folder, not a project file; only regular files are read` };
  if (code === 'EACCES' || code === 'EPERM') return { ok: false, reason: 'unreadable', error: `${name}: permission denied` };
  return { ok: false, reason: 'unreadable', error: `${name}: cannot be read (${code ?? (e as Error).message})` };
}

/** Read `file` (named `name` in messages) if it is a regular file within `limit` bytes. */
export function readRegularFileSync(file: string, name: string, limit = MAX_PROJECT_FILE_BYTES): RegularRead {
  let fd: number | undefined;
  try {
    const before = refusal(name, statSync(file), limit);
    if (before) return before;
    fd = openSync(file, OPEN_FLAGS);
    const st = fstatSync(fd);
    const refused = refusal(name, st, limit);
    if (refused) return refused;
    let buf: Buffer = Buffer.allocUnsafe(Math.min(limit, st.size) + 1);
    let length = 0;
    for (;;) {
      if (length === buf.length) {
        // The file grew while being read: follow it up to the limit, not beyond.
        if (length > limit) return tooLarge(name, length, limit);
        buf = grown(buf, length, Math.min(limit + 1, 2 * length));
      }
      const n = readSync(fd, buf, length, buf.length - length, null);
      if (n === 0) break;
      length += n;
    }
    return { ok: true, bytes: buf.subarray(0, length), stamp: stampOf(st) };
  } catch (e) {
    return failure(name, e);
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

/** Async readRegularFileSync (the hosts: never blocks the event loop on a FIFO or a device). */
export async function readRegularFile(file: string, name: string, limit = MAX_PROJECT_FILE_BYTES): Promise<RegularRead> {
  let handle: fs.FileHandle | undefined;
  try {
    const before = refusal(name, await fs.stat(file), limit);
    if (before) return before;
    handle = await fs.open(file, OPEN_FLAGS);
    const st = await handle.stat();
    const refused = refusal(name, st, limit);
    if (refused) return refused;
    let buf: Buffer = Buffer.allocUnsafe(Math.min(limit, st.size) + 1);
    let length = 0;
    for (;;) {
      if (length === buf.length) {
        // The file grew while being read: follow it up to the limit, not beyond.
        if (length > limit) return tooLarge(name, length, limit);
        buf = grown(buf, length, Math.min(limit + 1, 2 * length));
      }
      const { bytesRead } = await handle.read(buf, length, buf.length - length, null);
      if (bytesRead === 0) break;
      length += bytesRead;
    }
    return { ok: true, bytes: buf.subarray(0, length), stamp: stampOf(st) };
  } catch (e) {
    return failure(name, e);
  } finally {
    await handle?.close();
  }
}

/**
 * Reading and writing `.stayset` project files (JSON, format of main/common/project).
 *
 * Overwrite policy (also stated in main/common/host-contract.ts):
 * - `save`   replaces a file only when it is absent or currently reads as a valid project of the
 *            current format version. A file that is unreadable, corrupt, of an unknown or newer
 *            format, or of an older version (it would be migrated) is left untouched and the save
 *            is refused with a message that says why and suggests Save As.
 * - `saveAs` is the user's explicit choice of a path (a dialog on the desktop, a typed path on
 *            the web host): it replaces whatever is there. Both keep the previous file as `.bak`.
 * - lost update: `save` also refuses when the file changed on disk since this process read or
 *            wrote it (another program or window saved it); Save As replaces it deliberately.
 * Writes are atomic and keep mode, owner, read-only and symlinks (atomic-write.ts, write-keep.ts).
 */
import path from 'node:path';
import type { ProjectFile } from '../../solver/index.ts';
import type { HostResult, OpenedProject } from '../common/host-contract.ts';
import { parseProjectText, serializeProject } from '../common/project/index.ts';
import { writeFileAtomic } from './atomic-write.ts';
import { currentStamp, sameStamp, type FileStamp } from './file-stamp.ts';
import { WriteRefusedError } from './write-keep.ts';
import { readRegularFile } from './read-regular-file.ts';
import { MAX_PROJECT_FILE_BYTES } from '../common/limits/file-limits.ts';

export const PROJECT_EXTENSION = '.stayset';
/** Largest project file read, bytes: the limit shared by every edition. */
export const MAX_PROJECT_BYTES = MAX_PROJECT_FILE_BYTES;

export type SaveMode = 'save' | 'saveAs';

export type ReadOutcome =
  | { ok: true; opened: OpenedProject }
  | { ok: false; reason: 'missing' | 'unreadable' | 'invalid'; error: string };

/** Add `.stayset` to a path without an extension; other extensions are left as given. */
export function withProjectExtension(file: string): string {
  return path.extname(file) === '' ? file + PROJECT_EXTENSION : file;
}

export function hasProjectExtension(file: string): boolean {
  return path.extname(file).toLowerCase() === PROJECT_EXTENSION;
}

function describeErrors(errors: string[]): string {
  const shown = errors.slice(0, 8).join('\n  ');
  return errors.length > 8 ? `${shown}\n  … and ${errors.length - 8} more` : shown;
}

/** Read and validate a project file. Never throws for file or content problems. */
export async function readProjectFile(file: string): Promise<ReadOutcome> {
  const name = path.basename(file);
  const read = await readRegularFile(file, name);
  if (!read.ok) {
    const reason = read.reason === 'missing' ? 'missing' : 'unreadable';
    return { ok: false, reason, error: reason === 'missing' ? `${name}: file not found (${file})` : read.error };
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(read.bytes);
  } catch {
    return { ok: false, reason: 'invalid', error: `${name} is not UTF-8 text, so not a Stayset project; the file was not changed.` };
  }
  const parsed = parseProjectText(text);
  if (!parsed.ok) {
    return { ok: false, reason: 'invalid', error: `${name} is not a usable Stayset project; the file was not changed:\n  ${describeErrors(parsed.errors)}` };
  }
  const opened: OpenedProject = { path: path.resolve(file), name, project: parsed.project };
  if (parsed.migratedFrom !== undefined) opened.migratedFrom = parsed.migratedFrom;
  else rememberStamp(file, read.stamp);
  return { ok: true, opened };
}

/**
 * Files this process last read as valid current-version projects or wrote itself, by resolved
 * path, with their stamp then (file-stamp.ts). Save compares the file on disk with it: unchanged
 * → no need to re-read it (a 6 MB project takes about half a second to validate); changed → it
 * was saved by someone else since, and Save refuses rather than lose that version.
 */
const knownGood = new Map<string, FileStamp>();

function rememberStamp(file: string, stamp: FileStamp): void {
  knownGood.set(path.resolve(file), stamp);
}

/** The stamp of `file` as this process last read or wrote it, if it did. */
export function knownStamp(file: string): FileStamp | undefined {
  return knownGood.get(path.resolve(file));
}

/** Adopt `stamp` as the version of `file` the user's edits start from (recovery of an autosave). */
export function adoptKnownStamp(file: string, stamp: FileStamp): void {
  rememberStamp(file, stamp);
}

export function changedOnDiskMessage(file: string): string {
  return `${path.basename(file)} changed on disk since it was opened or last saved here (another program or window saved it). `
    + 'Save will not overwrite that version: reopen the file to see it, or use Save As to choose where your version goes.';
}

/** Why `save` may not replace `file`, or null when it may. */
export async function saveRefusal(file: string): Promise<string | null> {
  const known = knownStamp(file);
  if (known) {
    const now = await currentStamp(file);
    if (now === null || sameStamp(now, known)) return null;
    return changedOnDiskMessage(file);
  }
  const current = await readProjectFile(file);
  if (current.ok) {
    if (current.opened.migratedFrom === undefined) return null;
    return `${path.basename(file)} is in the older format version ${current.opened.migratedFrom}; `
      + 'Save would upgrade it and older Stayset versions could not open it any more. Use Save As '
      + '(choosing the same file replaces it and keeps the old one as .bak).';
  }
  if (current.reason === 'missing') return null;
  return `${path.basename(file)} could not be read as a Stayset project, so Save will not replace it. `
    + `Use Save As to write elsewhere or to replace it deliberately. (${current.error.split('\n')[0]})`;
}

/** Save a project atomically, keeping a `.bak` of the file it replaces. */
export async function writeProjectFile(file: string, project: ProjectFile, mode: SaveMode): Promise<HostResult<{ path: string }>> {
  const target = path.resolve(file);
  if (!hasProjectExtension(target)) return { ok: false, error: `${path.basename(target)}: project files must end in ${PROJECT_EXTENSION}` };
  if (mode === 'save') {
    const refusal = await saveRefusal(target);
    if (refusal) return { ok: false, error: refusal };
  }
  let text: string;
  try {
    text = serializeProject(project);
  } catch (e) {
    return { ok: false, error: `The project could not be written as text: ${(e as Error).message}` };
  }
  try {
    // Save: the file must still be the version this process knows (checked again just before the rename).
    const expect = mode === 'save' ? knownStamp(target) : undefined;
    rememberStamp(target, await writeFileAtomic(target, text, { backup: true, expect }));
  } catch (e) {
    if (e instanceof WriteRefusedError) return { ok: false, error: e.refusal === 'changed' ? changedOnDiskMessage(target) : e.message };
    const code = (e as NodeJS.ErrnoException).code;
    return { ok: false, error: `Saving ${path.basename(target)} failed (${code ?? (e as Error).message}); the previous file is unchanged.` };
  }
  return { ok: true, value: { path: target } };
}

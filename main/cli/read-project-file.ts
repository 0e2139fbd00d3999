/**
 * Reads and validates a project file from disk for a command. Every message starts with the
 * file name as typed, e.g. `mast.stayset.json: members[3] "G2": node "TOP2" does not exist`.
 * Only regular files within the shared size limit are read (main/store/read-regular-file.ts).
 */
import { isUtf8 } from 'node:buffer';
import { resolve } from 'node:path';
import { parseProjectText } from '../common/project/index.ts';
import type { ProjectFile } from '../../solver/index.ts';
import type { CliIO } from './cli-io.ts';
import { modelBudgetMessage } from './model-budget-guard.ts';
import { readRegularFileSync } from '../store/read-regular-file.ts';
import type { FileStamp } from '../store/file-stamp.ts';
import { plausibilityWarnings } from '../common/project/plausibility/plausibility-warnings.ts';

export type ReadProjectOutcome =
  | { ok: true; project: ProjectFile; migratedFrom?: number; /** The file as read (lost-update guard of tune --write). */ stamp?: FileStamp }
  | { ok: false; errors: string[] };

export function readProjectFile(name: string, cwd: string): ReadProjectOutcome {
  const read = readRegularFileSync(resolve(cwd, name), name);
  if (!read.ok) return { ok: false, errors: [read.error] };
  const bytes = read.bytes;
  // Checked, then decoded (both native and fast; a fatal TextDecoder takes several times longer
  // on the tens of megabytes of a large net).
  if (!isUtf8(bytes)) return { ok: false, errors: [`${name}: is not UTF-8 text (is it a project file?)`] };
  const text = bytes.toString('utf8');
  const parsed = parseProjectText(text);
  if (!parsed.ok) return { ok: false, errors: parsed.errors.map((m) => `${name}: ${m}`) };
  return { ...parsed, stamp: read.stamp };
}

/**
 * readProjectFile for a command that solves: on failure, or when the model would exceed the size
 * budget, every message goes to stderr and null comes back (exit 2). Plausibility warnings
 * (values outside the ranges of real members, main/common/project/plausibility) go to stderr as
 * `FILE: warning: …` and do not stop the command.
 */
export function readProjectOrReport(name: string, io: CliIO): Extract<ReadProjectOutcome, { ok: true }> | null {
  const read = readProjectFile(name, io.cwd);
  const errors = read.ok ? [modelBudgetMessage(name, read.project)].filter((m): m is string => m !== null) : read.errors;
  if (read.ok && errors.length === 0) {
    for (const w of plausibilityWarnings(read.project)) io.err(`${name}: warning: ${w}\n`);
    return read;
  }
  for (const m of errors) io.err(`${m}\n`);
  return null;
}

/**
 * Autosave recovery files, one per project, in a per-user recovery folder.
 *
 * Each entry is `<id>.json` = `{ "path": string|null, "name": string, "savedAt": ISO time,
 * "projectText": <serialised project> }`, written atomically. The id is the first 24 hex digits
 * of SHA-256 of the resolved project path (or of "untitled" for a never-saved project), so a
 * project has at most one recovery file and its id is stable across runs.
 *
 * While a project has unsaved changes the renderer calls autosave(); after a successful save
 * (or when the user discards changes) discardRecovery() removes the entry. Entries that are left
 * at the next start are the ones a crash interrupted: listRecovery() offers them.
 */
import { createHash } from 'node:crypto';
import { promises as fs } from 'node:fs';
import path from 'node:path';
import type { ProjectFile } from '../../solver/index.ts';
import type { HostResult, OpenedProject, RecoveryEntry } from '../common/host-contract.ts';
import { parseProjectText, serializeProject } from '../common/project/index.ts';
import { TEMP_SUFFIX, writeFileAtomic } from './atomic-write.ts';
import { readRegularFile } from './read-regular-file.ts';
import { MAX_PROJECT_FILE_BYTES, REQUEST_MARGIN_BYTES } from '../common/limits/file-limits.ts';

interface RecoveryFile {
  path: string | null;
  name: string;
  savedAt: string;
  projectText: string;
}

export function recoveryIdFor(projectPath: string | null): string {
  const key = projectPath === null ? 'untitled' : `file:${path.resolve(projectPath)}`;
  return createHash('sha256').update(key).digest('hex').slice(0, 24);
}

function isRecoveryFile(v: unknown): v is RecoveryFile {
  const r = v as RecoveryFile;
  return typeof r === 'object' && r !== null && (r.path === null || typeof r.path === 'string')
    && typeof r.name === 'string' && typeof r.savedAt === 'string' && typeof r.projectText === 'string';
}

export class RecoveryStore {
  constructor(private readonly dir: string) {}

  private fileFor(id: string): string {
    return path.join(this.dir, `${id}.json`);
  }

  async autosave(projectPath: string | null, project: ProjectFile, now = new Date()): Promise<RecoveryEntry> {
    const id = recoveryIdFor(projectPath);
    const resolved = projectPath === null ? null : path.resolve(projectPath);
    const name = resolved === null ? (project.meta?.name ?? 'Untitled') : path.basename(resolved);
    const record: RecoveryFile = { path: resolved, name, savedAt: now.toISOString(), projectText: serializeProject(project) };
    await fs.mkdir(this.dir, { recursive: true });
    await writeFileAtomic(this.fileFor(id), JSON.stringify(record));
    return { id, path: resolved, name, savedAt: record.savedAt };
  }

  private async readRecord(id: string): Promise<RecoveryFile | null> {
    try {
      const read = await readRegularFile(this.fileFor(id), `${id}.json`, MAX_PROJECT_FILE_BYTES + REQUEST_MARGIN_BYTES);
      if (!read.ok) return null;
      const data: unknown = JSON.parse(read.bytes.toString('utf8'));
      return isRecoveryFile(data) ? data : null;
    } catch {
      return null;
    }
  }

  /** Entries newest first; unreadable entries are skipped (and kept on disk for inspection). */
  async list(): Promise<RecoveryEntry[]> {
    let names: string[];
    try {
      names = await fs.readdir(this.dir);
    } catch {
      return [];
    }
    const entries: RecoveryEntry[] = [];
    for (const file of names) {
      if (!file.endsWith('.json') || file.endsWith(TEMP_SUFFIX)) continue;
      const id = file.slice(0, -'.json'.length);
      const r = await this.readRecord(id);
      if (r) entries.push({ id, path: r.path, name: r.name, savedAt: r.savedAt });
    }
    return entries.sort((a, b) => b.savedAt.localeCompare(a.savedAt));
  }

  /** The autosaved project; `path` is the original file so that Save goes back to it. */
  async recover(id: string): Promise<HostResult<OpenedProject>> {
    const r = await this.readRecord(id);
    if (!r) return { ok: false, error: `Recovery entry ${id} does not exist or cannot be read.` };
    const parsed = parseProjectText(r.projectText);
    if (!parsed.ok) return { ok: false, error: `Recovery entry for ${r.name} is damaged: ${parsed.errors.slice(0, 3).join('; ')}` };
    const opened: OpenedProject = { path: r.path, name: r.name, project: parsed.project };
    if (parsed.migratedFrom !== undefined) opened.migratedFrom = parsed.migratedFrom;
    return { ok: true, value: opened };
  }

  async discard(projectPath: string | null): Promise<void> {
    await fs.rm(this.fileFor(recoveryIdFor(projectPath)), { force: true });
  }
}

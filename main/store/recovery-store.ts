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
 *
 * Nothing of another session is lost: autosave never overwrites a recovery file this process did
 * not write or recover itself (one a crash left, or another window's) — that file is first set
 * aside under a new id, so both are offered; discard removes only this process's own files. The
 * record keeps `baseStamp`, the stamp of the project file the edits started from, so that Save
 * after recover() still refuses to overwrite a file changed on disk since (project-files.ts).
 */
import { createHash, randomBytes } from 'node:crypto';
import { promises as fs } from 'node:fs';
import path from 'node:path';
import type { ProjectFile } from '../../solver/index.ts';
import type { HostResult, OpenedProject, RecoveryEntry } from '../common/host-contract.ts';
import { parseProjectText, serializeProject } from '../common/project/index.ts';
import { TEMP_SUFFIX, writeFileAtomic } from './atomic-write.ts';
import { readRegularFile } from './read-regular-file.ts';
import { currentStamp, sameStamp, type FileStamp } from './file-stamp.ts';
import { adoptKnownStamp, knownStamp } from './project-files.ts';
import { MAX_PROJECT_FILE_BYTES, REQUEST_MARGIN_BYTES } from '../common/limits/file-limits.ts';

interface RecoveryFile {
  path: string | null;
  name: string;
  savedAt: string;
  projectText: string;
  /** Stamp of the project file when the edits started (lost-update guard after recovery). */
  baseStamp?: FileStamp;
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
  /** Recovery files this process wrote or recovered, by id, with their stamp then. */
  private readonly own = new Map<string, FileStamp>();
  constructor(private readonly dir: string) {}

  /** Move a recovery file this process does not own out of the way, under a new id. */
  private async setAsideForeign(id: string): Promise<void> {
    const file = this.fileFor(id);
    const now = await currentStamp(file);
    const mine = this.own.get(id);
    if (now === null || (mine !== undefined && sameStamp(now, mine))) return;
    await fs.rename(file, this.fileFor(id + randomBytes(4).toString('hex')));
  }

  private fileFor(id: string): string {
    return path.join(this.dir, `${id}.json`);
  }

  async autosave(projectPath: string | null, project: ProjectFile, now = new Date()): Promise<RecoveryEntry> {
    const id = recoveryIdFor(projectPath);
    const resolved = projectPath === null ? null : path.resolve(projectPath);
    const name = resolved === null ? (project.meta?.name ?? 'Untitled') : path.basename(resolved);
    const record: RecoveryFile = { path: resolved, name, savedAt: now.toISOString(), projectText: serializeProject(project) };
    const base = resolved === null ? undefined : knownStamp(resolved);
    if (base) record.baseStamp = base;
    await fs.mkdir(this.dir, { recursive: true });
    await this.setAsideForeign(id);
    this.own.set(id, await writeFileAtomic(this.fileFor(id), JSON.stringify(record)));
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
    if (r.path !== null && r.baseStamp && knownStamp(r.path) === undefined) adoptKnownStamp(r.path, r.baseStamp);
    // The recovered entry is now this session's: its next autosave replaces it, discard removes it.
    if (id !== recoveryIdFor(r.path)) await this.adoptSetAside(id, r.path);
    else await this.adopt(id);
    return { ok: true, value: opened };
  }

  private async adopt(id: string): Promise<void> {
    const stamp = await currentStamp(this.fileFor(id));
    if (stamp) this.own.set(id, stamp);
  }

  /** A set-aside entry that was recovered takes its project's id; what was there is set aside. */
  private async adoptSetAside(id: string, projectPath: string | null): Promise<void> {
    const target = recoveryIdFor(projectPath);
    if (await currentStamp(this.fileFor(target))) {
      await fs.rename(this.fileFor(target), this.fileFor(target + randomBytes(4).toString('hex')));
    }
    await fs.rename(this.fileFor(id), this.fileFor(target));
    await this.adopt(target);
  }

  /** Remove this project's recovery file if this process wrote or recovered it. */
  async discard(projectPath: string | null): Promise<void> {
    const id = recoveryIdFor(projectPath);
    const mine = this.own.get(id);
    const now = await currentStamp(this.fileFor(id));
    if (mine === undefined || now === null || !sameStamp(now, mine)) return;
    await fs.rm(this.fileFor(id), { force: true });
    this.own.delete(id);
  }
}

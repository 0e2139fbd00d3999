/**
 * Project file operations shared by both hosts (desktop and web): open with the recent list,
 * save / save as with the overwrite policy of project-files.ts, autosave recovery.
 * Paths given here are already authorised by the host (dialog, granted path, root folder).
 */
import path from 'node:path';
import type { ProjectFile } from '../../solver/index.ts';
import type { HostResult, OpenedProject, RecentEntry, RecoveryEntry } from '../common/host-contract.ts';
import { readProjectFile, withProjectExtension, writeProjectFile } from './project-files.ts';
import { RecentProjects } from './recent-projects.ts';
import { RecoveryStore } from './recovery-store.ts';

export interface ProjectServiceOptions {
  /** Folder for recent-projects.json. */
  userDataDir: string;
  /** Folder for autosave recovery files; default `<userDataDir>/recovery`. */
  recoveryDir?: string;
}

export class ProjectService {
  readonly recent: RecentProjects;
  readonly recovery: RecoveryStore;

  constructor(options: ProjectServiceOptions) {
    this.recent = new RecentProjects(options.userDataDir);
    this.recovery = new RecoveryStore(options.recoveryDir ?? path.join(options.userDataDir, 'recovery'));
  }

  /** Read a project; on success it goes to the top of the recent list unless `remember` is false. */
  async open(file: string, remember = true): Promise<HostResult<OpenedProject>> {
    const read = await readProjectFile(file);
    if (!read.ok) {
      if (read.reason === 'missing') await this.recent.remove(file).catch(() => undefined);
      return { ok: false, error: read.error };
    }
    if (remember) {
      const warning = await this.tryRecent(read.opened.path ?? file);
      if (warning) read.opened.warnings = [...(read.opened.warnings ?? []), warning];
    }
    return { ok: true, value: read.opened };
  }

  /** Put a path on the recent list; the list is a convenience: a failure is a warning, never an error. */
  private async tryRecent(file: string): Promise<string | null> {
    try {
      await this.recent.add(file);
      return null;
    } catch (e) {
      return `The recent-projects list could not be updated (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); the project itself is fine.`;
    }
  }

  async save(file: string, project: ProjectFile): Promise<HostResult<{ path: string }>> {
    const result = await writeProjectFile(file, project, 'save');
    if (result.ok) await this.recovery.discard(result.value.path).catch(() => undefined);
    return result;
  }

  /** Save to a path the user chose; `.stayset` is appended when the name has no extension. */
  async saveAs(file: string, project: ProjectFile): Promise<HostResult<{ path: string; name: string }>> {
    const result = await writeProjectFile(withProjectExtension(file), project, 'saveAs');
    if (!result.ok) return result;
    await this.tryRecent(result.value.path);
    await this.recovery.discard(result.value.path).catch(() => undefined);
    return { ok: true, value: { path: result.value.path, name: path.basename(result.value.path) } };
  }

  recentProjects(): Promise<RecentEntry[]> {
    return this.recent.list();
  }

  listRecovery(): Promise<RecoveryEntry[]> {
    return this.recovery.list();
  }

  recover(id: string): Promise<HostResult<OpenedProject>> {
    return this.recovery.recover(id);
  }

  /** Write the recovery file; a failure comes back as a message (recovery is then not available). */
  async autosave(file: string | null, project: ProjectFile): Promise<HostResult<{ savedAt: string }>> {
    try {
      const entry = await this.recovery.autosave(file, project);
      return { ok: true, value: { savedAt: entry.savedAt } };
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code ?? (e as Error).message;
      return { ok: false, error: `Autosave failed (${code}): unsaved changes cannot be recovered after a crash until this is fixed. Save the project to keep your changes.` };
    }
  }

  discardRecovery(file: string | null): Promise<void> {
    return this.recovery.discard(file);
  }
}

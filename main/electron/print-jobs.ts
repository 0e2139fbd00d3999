/**
 * Bookkeeping for hidden print windows (no Electron runtime): which window prints which project,
 * and a promise that settles when that window's renderer calls printReady().
 */
import type { ProjectFile } from '../../solver/index.ts';
import type { OpenedProject } from '../common/host-contract.ts';

interface Job {
  opened: OpenedProject;
  ready: () => void;
  timer: ReturnType<typeof setTimeout>;
}

export class PrintJobs {
  private readonly jobs = new Map<number, Job>();

  /** Register a print window; resolves when it reports ready, rejects after `timeoutMs`. */
  add(webContentsId: number, project: ProjectFile, timeoutMs: number): Promise<void> {
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`the schedule view did not report ready within ${timeoutMs / 1000} s`)), timeoutMs);
      this.jobs.set(webContentsId, {
        opened: { path: null, name: project.meta?.name ?? 'Untitled', project },
        ready: () => {
          clearTimeout(timer);
          resolve();
        },
        timer,
      });
    });
  }

  has(webContentsId: number): boolean {
    return this.jobs.has(webContentsId);
  }

  /** What openInitial() returns in a print window. */
  projectFor(webContentsId: number): OpenedProject | null {
    return this.jobs.get(webContentsId)?.opened ?? null;
  }

  markReady(webContentsId: number): void {
    this.jobs.get(webContentsId)?.ready();
  }

  remove(webContentsId: number): void {
    const job = this.jobs.get(webContentsId);
    if (job) clearTimeout(job.timer);
    this.jobs.delete(webContentsId);
  }
}

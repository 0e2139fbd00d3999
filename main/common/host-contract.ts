/**
 * The one typed contract between the renderer and whatever hosts it: the Electron main process
 * (through the preload) or the loopback web host (over HTTP). Every method is async; events are
 * subscriptions named onDidX that return an unsubscribe function.
 *
 * The renderer reaches a host only through `renderer/host/client.ts`; no raw channel strings
 * anywhere else. Arguments are validated on the host side by `main/common/host-validation.ts`.
 */
import type { ProjectFile, SolveReport } from '../../solver/index.ts';

/** A project as the host hands it over: the validated document plus where it lives. */
export interface OpenedProject {
  /** Absolute path on disk, or null for a new, never-saved project. */
  path: string | null;
  /** File name for display (no directories). */
  name: string;
  project: ProjectFile;
  /** Set when the file was migrated from an older format version on load. */
  migratedFrom?: number;
}

export interface RecentEntry {
  path: string;
  name: string;
  /** ISO 8601 time of last open. */
  openedAt: string;
}

export interface RecoveryEntry {
  /** Path of the project the recovery file belongs to (null for an untitled project). */
  path: string | null;
  name: string;
  /** ISO 8601 time of the autosave. */
  savedAt: string;
  /** Opaque id to pass to recover(). */
  id: string;
}

export type HostResult<T> = { ok: true; value: T } | { ok: false; error: string };

export interface AnalysisProgress {
  runId: string;
  caseIndex: number;
  caseCount: number;
  caseId: string;
  iteration: number;
  loadFactor: number;
}

export interface AnalysisDone {
  runId: string;
  status: 'done' | 'cancelled' | 'failed';
  report?: SolveReport;
  error?: string;
}

export interface StaysetHost {
  /** Which host this is, for the status line. */
  kind(): Promise<'desktop' | 'web'>;
  /** The demo project bundled in assets/ (by file name) or the project the app was started with. */
  openInitial(): Promise<HostResult<OpenedProject> | null>;
  /** Show an open dialog (desktop) or open a path (web: path is required). */
  open(path?: string): Promise<HostResult<OpenedProject> | null>;
  /** Save to the project's path; atomic with backup. */
  save(path: string, project: ProjectFile): Promise<HostResult<{ path: string }>>;
  /** Ask for a new path (desktop dialog; web: path is required), then save. */
  saveAs(project: ProjectFile, path?: string): Promise<HostResult<{ path: string; name: string }> | null>;
  recentProjects(): Promise<RecentEntry[]>;
  /** Recovery files left by a crash. */
  listRecovery(): Promise<RecoveryEntry[]>;
  recover(id: string): Promise<HostResult<OpenedProject>>;
  /** Write the autosave for a project with unsaved changes (path null for untitled). */
  autosave(path: string | null, project: ProjectFile): Promise<void>;
  /** Forget the autosave after a successful save or on discard. */
  discardRecovery(path: string | null): Promise<void>;
  /** Run every case (and combination) of the project off the UI thread. */
  runAnalysis(project: ProjectFile): Promise<{ runId: string }>;
  cancelAnalysis(runId: string): Promise<void>;
  onDidProgress(listener: (p: AnalysisProgress) => void): () => void;
  onDidFinishAnalysis(listener: (d: AnalysisDone) => void): () => void;
  /** Print the schedule route to PDF (desktop: printToPDF and a save dialog). */
  printSchedule(project: ProjectFile, path?: string): Promise<HostResult<{ path: string }> | null>;
  /** Menu commands from the OS menu (desktop) — 'save', 'open', 'undo', … */
  onDidMenuCommand(listener: (command: MenuCommand) => void): () => void;
  /** Tell the host whether there are unsaved changes (quit prompt, window title). */
  setDirty(dirty: boolean, title: string): Promise<void>;
}

export type MenuCommand =
  | 'new'
  | 'open'
  | 'save'
  | 'saveAs'
  | 'undo'
  | 'redo'
  | 'print'
  | 'run'
  | 'fit';

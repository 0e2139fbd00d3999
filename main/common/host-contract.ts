/**
 * The one typed contract between the renderer and whatever hosts it: the Electron main process
 * (through the preload) or the loopback web host (over HTTP). Every method is async; events are
 * subscriptions named onDidX that return an unsubscribe function.
 *
 * The renderer reaches a host only through `renderer/host/client.ts`; no raw channel strings
 * anywhere else. Arguments are validated on the host side by `main/common/host-validation.ts`.
 *
 * Implementations:
 * - desktop: `main/electron/preload.ts` exposes this interface as `window.stayset` (one frozen
 *   object); `main/electron/ipc-handlers.ts` serves it in the main process.
 * - web: `main/common/web-host-client.ts` (`createWebHostClient({ token })`) over HTTP + SSE to
 *   `main/web/` (routes in `main/common/web-protocol.ts`). The token comes from `location.hash`
 *   (`#token=...`), see `readTokenFromHash` in web-host-client.ts.
 *
 * Contract notes (changes since the first draft are marked "added"):
 * - Methods returning `HostResult | null`: null means the user cancelled a dialog (desktop only).
 * - Arguments must be plain data: on the desktop they cross contextBridge + structured clone, which
 *   refuses Vue reactive proxies ("could not be cloned"). Pass a plain copy of the project
 *   (e.g. `JSON.parse(JSON.stringify(project))` or a deep `toRaw`). The web client JSON-encodes anyway.
 * - save(path) only replaces a file that currently reads as a current-version Stayset project (or
 *   does not exist). A file that is corrupt, of an unknown/newer format, or of an older format
 *   version (migrated on load) is never overwritten by save(): the error says so, and the renderer
 *   should offer Save As. saveAs to a path the user explicitly chose replaces anything, always
 *   keeping the previous file as `<name>.bak`.
 * - Desktop: save(path) is accepted only for paths the host handed out (opened, chosen in a dialog,
 *   recent, recovered); anything else is refused.
 * - Web: open/saveAs need a path, relative to the project root folder or absolute inside it;
 *   files of the bundled assets/ open read-only (save() to them is refused; use saveAs).
 * - added: onDidRequestOpen — the OS asked to open a file (Open Recent menu, file association,
 *   second instance). The renderer settles its unsaved changes first, then calls open(path).
 * - added: quit/close with unsaved changes (after setDirty(true)) shows Save / Don't save / Cancel
 *   in the desktop host. On Save the host sends the menu command 'save'; once the renderer's save
 *   succeeds and it calls setDirty(false), the window closes. A cancelled or failed save keeps it open.
 * - runAnalysis: one run at a time per host; starting a run cancels the previous one (its
 *   onDidFinishAnalysis says 'cancelled'). A cancelled run may still carry the partial report.
 *   Progress is rate-limited (about 20 updates per second, always one when a case starts).
 * - Menu 'undo' / 'redo' (CmdOrCtrl+Z, Ctrl+Y / Cmd+Shift+Z) are sent as commands, also while a
 *   text field has focus: the renderer decides whether they mean the field or the project history.
 * - Recent list and recovery files live in the per-user data folder shared by both editions
 *   (main/store/user-dirs.ts).
 * - printSchedule (desktop) opens a hidden window at `index.html#/schedule?print=1` whose
 *   openInitial() returns the project to print; the renderer calls `printReady()` there when the
 *   schedule is laid out (added), then the host writes the PDF. Web: returns ok:false with a hint
 *   to use the browser's own Print on the schedule view.
 * - added: runSite runs a tensioning sequence, an as-built back-analysis or builds a printable
 *   document (crew sheet, calculation report) in a worker (main/common/site/site-run.ts); one at a
 *   time per host: a new runSite or cancelSite ends the previous one, whose promise then resolves
 *   ok:false saying it was cancelled. Bad input (an unknown sequence, …) resolves ok:false naming it.
 * - added: printSiteDocument (desktop) builds the crew sheet or report the same way and prints it
 *   to a PDF chosen in a save dialog. Web: ok:false with a hint to print the shown document with
 *   the browser.
 */
import type { CaseFields, ProjectFile, SolveReport } from '../../solver/index.ts';
import type { SiteOutcome, SiteRequest } from './site/site-run.ts';
import type { CheckOutcome } from './checks/check-outcome.ts';

/** A project as the host hands it over: the validated document plus where it lives. */
export interface OpenedProject {
  /** Absolute path on disk, or null for a new, never-saved project. */
  path: string | null;
  /** File name for display (no directories). */
  name: string;
  project: ProjectFile;
  /** Set when the file was migrated from an older format version on load. */
  migratedFrom?: number;
  /** added: things that went wrong beside the open itself (e.g. the recent list could not be written). */
  warnings?: string[];
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
  /** The design checks of `report` under the run project's check settings, computed with the solve (check-outcome.ts). */
  checks?: CheckOutcome;
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
  /**
   * Write the autosave for a project with unsaved changes (path null for untitled). changed:
   * returns ok:false with the reason when the recovery file could not be written, so the app
   * can say that recovery is not available (desktop: only for paths the host handed out).
   */
  autosave(path: string | null, project: ProjectFile): Promise<HostResult<{ savedAt: string }>>;
  /** Forget the autosave after a successful save or on discard. */
  discardRecovery(path: string | null): Promise<void>;
  /** Run every case (and combination) of the project off the UI thread. */
  runAnalysis(project: ProjectFile): Promise<{ runId: string }>;
  cancelAnalysis(runId: string): Promise<void>;
  /**
   * Raw per-element fields of case `caseIndex` (report order) of a finished run: deformed
   * positions of every node including cable interior nodes, element tensions, slack flags.
   * Hosts keep the last few runs; null when the run or case is not (or no longer) known.
   */
  caseFields(runId: string, caseIndex: number): Promise<CaseFields | null>;
  onDidProgress(listener: (p: AnalysisProgress) => void): () => void;
  onDidFinishAnalysis(listener: (d: AnalysisDone) => void): () => void;
  /** Print the schedule route to PDF (desktop: printToPDF and a save dialog). */
  printSchedule(project: ProjectFile, path?: string): Promise<HostResult<{ path: string }> | null>;
  /** Menu commands from the OS menu (desktop) — 'save', 'open', 'undo', … */
  onDidMenuCommand(listener: (command: MenuCommand) => void): () => void;
  /** Tell the host whether there are unsaved changes (quit prompt, window title). */
  setDirty(dirty: boolean, title: string): Promise<void>;
  /** added: the OS asked to open a file; settle unsaved changes, then call open(path). */
  onDidRequestOpen(listener: (path: string) => void): () => void;
  /** added: in the hidden print window, the schedule is laid out and may be printed now. */
  printReady(): Promise<void>;
  /** added: a sequence, an as-built fit or a printable document, computed off the UI thread. */
  runSite(project: ProjectFile, request: SiteRequest): Promise<HostResult<SiteOutcome>>;
  /** added: end the running runSite, if any. */
  cancelSite(): Promise<void>;
  /** added: print a crew sheet or the report to PDF (desktop: save dialog; null when cancelled). */
  printSiteDocument(project: ProjectFile, request: SiteRequest, path?: string): Promise<HostResult<{ path: string }> | null>;
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

/**
 * The StaysetHost methods as the desktop performs them, with the OS parts (dialogs, PDF, window
 * title) injected so this runs and is tested in plain Node. ipc-handlers.ts connects it to IPC.
 */
import path from 'node:path';
import type { CaseFields, ProjectFile } from '../../solver/index.ts';
import type { HostResult, OpenedProject } from '../common/host-contract.ts';
import type { SiteOutcome, SiteRequest } from '../common/site/site-run.ts';
import type { HostHandlers } from '../common/host-validation.ts';
import type { ProjectService } from '../store/project-service.ts';
import { hasProjectExtension } from '../store/project-files.ts';
import { GrantedPaths } from './granted-paths.ts';
import type { QuitGuard } from './quit-guard.ts';

export interface DesktopDialogs {
  /** Absolute path of a project to open, or null when cancelled. */
  chooseProjectToOpen(): Promise<string | null>;
  /** Absolute path to save a project to (OS confirms overwrite), or null when cancelled. */
  chooseProjectSavePath(suggestedName: string): Promise<string | null>;
  choosePdfPath(suggestedName: string): Promise<string | null>;
}

export interface DesktopHostDeps {
  projects: ProjectService;
  analysis: { start(project: ProjectFile): { runId: string }; cancel(runId: string): void; caseFields(runId: string, caseIndex: number): CaseFields | null };
  dialogs: DesktopDialogs;
  granted: GrantedPaths;
  quit: QuitGuard;
  /** Start file (command line / file association) or the bundled demo; null for none. */
  initialPath: () => string | null;
  /** Bundled demo folder: its files open read-only (save goes to Save As). */
  assetsDir: string | null;
  printPdf: (project: ProjectFile, pdfPath: string) => Promise<HostResult<{ path: string }>>;
  /** Site requests in a worker (main/analysis/site-runner.ts). */
  site?: { run(project: ProjectFile, request: SiteRequest): Promise<HostResult<SiteOutcome>>; cancel(): void };
  /** Print a standalone HTML document to a PDF file. */
  printHtml?: (html: string, pdfPath: string) => Promise<HostResult<{ path: string }>>;
  /** Window title and close decisions follow setDirty; may close the window. */
  onDirtyChanged: (dirty: boolean, title: string) => void;
}

const NO_SITE = 'This host has no worker for sequences, as-built fits and printed documents.';

function isInAssets(deps: DesktopHostDeps, file: string): boolean {
  if (!deps.assetsDir) return false;
  const rel = path.relative(deps.assetsDir, path.resolve(file));
  return rel !== '' && !rel.startsWith('..') && !path.isAbsolute(rel);
}

function baseName(project: ProjectFile): string {
  return (project.meta?.name ?? 'Untitled').replace(/[\\/:*?"<>|]+/g, ' ').trim() || 'Untitled';
}

export function createDesktopHandlers(deps: DesktopHostDeps): HostHandlers {
  const openFile = async (file: string): Promise<HostResult<OpenedProject>> => {
    const demo = isInAssets(deps, file);
    const result = await deps.projects.open(file, !demo);
    if (result.ok && !demo) deps.granted.grant(result.value.path ?? file);
    return result;
  };

  /** A path from the page: granted, offered by the system, or on the recent list. */
  const mayOpenByPath = async (file: string): Promise<boolean> => {
    if (deps.granted.mayOpen(file)) return true;
    const probe = new GrantedPaths();
    probe.grant(file);
    return (await deps.projects.recentProjects()).some((r) => probe.has(r.path));
  };

  return {
    kind: async () => 'desktop',
    openInitial: async () => {
      const file = deps.initialPath();
      return file ? openFile(file) : null;
    },
    open: async (file) => {
      if (file !== undefined) {
        if (!path.isAbsolute(file) || !hasProjectExtension(file)) return { ok: false, error: `"${file}" is not an absolute path to a .stayset file` };
        if (!(await mayOpenByPath(file))) {
          return { ok: false, error: `Open "${file}" refused: the page may open only files chosen in the Open dialog, on the recent list, or given to Stayset by the system. Use Open….` };
        }
        return openFile(file);
      }
      const chosen = await deps.dialogs.chooseProjectToOpen();
      return chosen === null ? null : openFile(chosen);
    },
    save: async (file, project) => {
      if (isInAssets(deps, file)) {
        deps.quit.onSaveAbandoned();
        return { ok: false, error: `${path.basename(file)} is a bundled demo and read-only; use Save As to keep your own copy.` };
      }
      if (!deps.granted.has(file)) {
        deps.quit.onSaveAbandoned();
        return { ok: false, error: `Save to "${file}" refused: the file was not opened or chosen in this session. Use Save As.` };
      }
      const result = await deps.projects.save(file, project);
      if (!result.ok) deps.quit.onSaveAbandoned();
      return result;
    },
    saveAs: async (project, suggested) => {
      const name = suggested ? path.basename(suggested) : `${baseName(project)}.stayset`;
      const chosen = await deps.dialogs.chooseProjectSavePath(name);
      if (chosen === null) {
        deps.quit.onSaveAbandoned();
        return null;
      }
      if (isInAssets(deps, chosen)) {
        deps.quit.onSaveAbandoned();
        return { ok: false, error: 'The bundled demo folder is read-only; choose another folder.' };
      }
      const result = await deps.projects.saveAs(chosen, project);
      if (result.ok) deps.granted.grant(result.value.path);
      else deps.quit.onSaveAbandoned();
      return result;
    },
    recentProjects: () => deps.projects.recentProjects(),
    listRecovery: () => deps.projects.listRecovery(),
    recover: async (id) => {
      const result = await deps.projects.recover(id);
      if (result.ok && result.value.path && !isInAssets(deps, result.value.path)) deps.granted.grant(result.value.path);
      return result;
    },
    autosave: async (file, project) => {
      if (file !== null && !deps.granted.has(file)) {
        return { ok: false, error: `Autosave for "${file}" refused: the file was not opened or chosen in this session.` };
      }
      deps.quit.lastAutosavePath = file;
      return deps.projects.autosave(file, project);
    },
    discardRecovery: (file) => deps.projects.discardRecovery(file),
    runAnalysis: async (project) => deps.analysis.start(project),
    cancelAnalysis: async (runId) => deps.analysis.cancel(runId),
    caseFields: async (runId, caseIndex) => deps.analysis.caseFields(runId, caseIndex),
    printSchedule: async (project, suggested) => {
      const pdf = await deps.dialogs.choosePdfPath(suggested ? path.basename(suggested) : `${baseName(project)} tension schedule.pdf`);
      return pdf === null ? null : deps.printPdf(project, pdf);
    },
    setDirty: async (dirty, title) => deps.onDirtyChanged(dirty, title),
    printReady: async () => undefined,
    runSite: async (project, request) => (deps.site ? deps.site.run(project, request) : { ok: false, error: NO_SITE }),
    cancelSite: async () => deps.site?.cancel(),
    printSiteDocument: async (project, request, suggested) => {
      if (!deps.site || !deps.printHtml) return { ok: false, error: NO_SITE };
      const built = await deps.site.run(project, request);
      if (!built.ok) return built;
      if (built.value.kind !== 'document') return { ok: false, error: 'printSiteDocument: the request did not make a document' };
      const pdf = await deps.dialogs.choosePdfPath(suggested ? path.basename(suggested) : `${built.value.title}.pdf`);
      return pdf === null ? null : deps.printHtml(built.value.html, pdf);
    },
  };
}

/**
 * The StaysetHost methods as the web host performs them: the same project store and analysis
 * runner as the desktop, with paths confined by PathPolicy instead of file dialogs.
 */
import path from 'node:path';
import type { HostResult, OpenedProject } from '../common/host-contract.ts';
import type { HostHandlers } from '../common/host-validation.ts';
import type { AnalysisRunner } from '../analysis/analysis-runner.ts';
import type { SiteRunner } from '../analysis/site-runner.ts';
import type { ProjectService } from '../store/project-service.ts';
import type { PathPolicy } from './path-policy.ts';

export interface WebHostServiceOptions {
  projects: ProjectService;
  runner: AnalysisRunner;
  site: SiteRunner;
  paths: PathPolicy;
  /** Project opened by openInitial() (a demo or a path from the command line), or null. */
  initialPath: string | null;
}

const NEEDS_PATH = 'The browser edition has no file dialog: give the file path (relative to the project folder).';

export function createWebHostHandlers(o: WebHostServiceOptions): HostHandlers {
  const openPath = async (input: string): Promise<HostResult<OpenedProject>> => {
    const verdict = await o.paths.forRead(input);
    if (!verdict.ok) return verdict;
    return o.projects.open(verdict.path, !verdict.readOnly);
  };

  return {
    kind: async () => 'web',
    openInitial: async () => (o.initialPath ? openPath(o.initialPath) : null),
    open: async (input) => (input === undefined ? { ok: false, error: NEEDS_PATH } : openPath(input)),
    save: async (input, project) => {
      const verdict = await o.paths.forWrite(input);
      if (!verdict.ok) return verdict;
      return o.projects.save(verdict.path, project);
    },
    saveAs: async (project, input) => {
      if (input === undefined) return { ok: false, error: NEEDS_PATH };
      const target = path.extname(input) === '' ? `${input}.stayset` : input;
      const verdict = await o.paths.forNewFile(target);
      if (!verdict.ok) return verdict;
      return o.projects.saveAs(verdict.path, project);
    },
    recentProjects: () => o.projects.recentProjects(),
    listRecovery: () => o.projects.listRecovery(),
    recover: (id) => o.projects.recover(id),
    autosave: (file, project) => o.projects.autosave(file, project),
    discardRecovery: (file) => o.projects.discardRecovery(file),
    runAnalysis: async (project) => o.runner.start(project),
    cancelAnalysis: async (runId) => o.runner.cancel(runId),
    caseFields: async (runId, caseIndex) => o.runner.caseFields(runId, caseIndex),
    printSchedule: async () => ({ ok: false, error: "The browser edition prints with the browser: open the Schedule view and use the browser's Print (Ctrl+P), choosing \"Save as PDF\"." }),
    setDirty: async () => undefined,
    printReady: async () => undefined,
    runSite: (project, request) => o.site.run(project, request),
    cancelSite: async () => o.site.cancel(),
    printSiteDocument: async () => ({ ok: false, error: "The browser edition prints with the browser: show the document and use its Print button or the browser's Print (Ctrl+P), choosing \"Save as PDF\"." }),
  };
}

/**
 * What the buttons, shortcuts and OS menu commands do: open, save, save as, undo/redo, run and
 * cancel the analysis, autosave. Talks to the host through renderer/host/client.ts and to the
 * stores; no three.js here.
 */
import { ref, shallowRef, watch } from 'vue';
import type { CaseFields, ProjectFile, SolveReport } from '../../solver/index.ts';
import type { HostResult, OpenedProject, RecentEntry, RecoveryEntry, StaysetHost } from '../../main/common/host-contract.ts';
import { getHost } from '../host/client.ts';
import { useProjectStore } from '../stores/project.ts';
import { useResultsStore } from '../stores/results.ts';
import { useSelectionStore } from '../stores/selection.ts';
import { useSettingsStore } from '../stores/settings.ts';
import { isoDate, scheduleParts, schedulePageFrom, type ScheduleParts, type SchedulePage } from '../schedule/schedule-document.ts';
import { paperForUnits } from '../../main/common/schedule/paper.ts';
import { blankProject } from '../model/new-project.ts';
import type { GeneratorKind } from '../generators/generator-defaults.ts';

/** Interval of the autosave check, ms (it writes only when the unsaved content changed). */
export const AUTOSAVE_MS = 10_000;

export type Phase = 'starting' | 'empty' | 'loading' | 'ready' | 'noHost';

/** A one-line notice at the top (save done, save refused, …). */
export interface Notice {
  kind: 'info' | 'error';
  text: string;
}

export function createAppActions(hostOverride?: StaysetHost) {
  const projectStore = useProjectStore();
  const results = useResultsStore();
  const selection = useSelectionStore();
  const settings = useSettingsStore();
  const phase = ref<Phase>('starting');
  const hostKind = ref<'desktop' | 'web' | '—'>('—');
  const notice = shallowRef<Notice | null>(null);
  const openErrors = shallowRef<string[]>([]);
  const recents = shallowRef<RecentEntry[]>([]);
  const recovery = shallowRef<RecoveryEntry[]>([]);
  /** Set when the user must type a path (web Save As / Open). */
  const pathPrompt = shallowRef<{ purpose: 'open' | 'saveAs'; suggestion: string } | null>(null);
  /** The tension schedule shown over the main screen, or null. */
  const schedule = shallowRef<SchedulePage | null>(null);
  /** The Generate dialog is open. */
  const generating = ref(false);
  /** Generator kind the Generate dialog opens with (null: the project's first record's kind). */
  const generateKind = ref<GeneratorKind | null>(null);
  /** The New project dialog is open. */
  const creating = ref(false);
  let host: StaysetHost | null = hostOverride ?? null;
  let autosaveTimer: ReturnType<typeof setInterval> | null = null;
  let lastAutosaveError: string | null = null;
  const unsubscribers: (() => void)[] = [];

  /**
   * The solver's deformed positions (cable interior nodes included), tensions and slack flags of
   * every case of a finished run, fetched after the report so the view draws the real cable
   * shapes. A host that no longer has the run answers null; drawing then falls back to the report.
   */
  async function fetchCaseFields(runId: string, report: SolveReport): Promise<void> {
    try {
      const all = await Promise.all(report.cases.map((_, i) => h().caseFields(runId, i)));
      if (all.every((f) => f !== null)) results.attachFields(report, all as CaseFields[]);
    } catch {
      // keep the report-only drawing
    }
  }

  function h(): StaysetHost {
    if (!host) host = getHost();
    return host;
  }

  function say(kind: Notice['kind'], text: string): void {
    notice.value = { kind, text };
  }

  function adopt(result: HostResult<OpenedProject> | null): boolean {
    if (!result) return false;
    if (!result.ok) {
      openErrors.value = result.error.split('\n').filter(Boolean);
      phase.value = projectStore.project ? 'ready' : 'empty';
      return false;
    }
    openErrors.value = [];
    projectStore.load(result.value);
    results.clear();
    selection.clear();
    const d = result.value.project.display;
    if (d?.units) settings.setUnits(d.units);
    if (d?.deformationScale !== undefined) settings.setDeformationScale(d.deformationScale);
    phase.value = 'ready';
    if (result.value.migratedFrom) say('info', `Converted from format version ${result.value.migratedFrom}; Save As to keep the original file untouched.`);
    if (result.value.warnings?.length) say('error', result.value.warnings.join(' '));
    void syncDirty();
    return true;
  }

  async function start(): Promise<void> {
    try {
      hostKind.value = await h().kind();
    } catch (e) {
      phase.value = 'noHost';
      say('error', (e as Error).message);
      return;
    }
    unsubscribers.push(
      h().onDidProgress((p) => results.onProgress(p)),
      h().onDidFinishAnalysis((d) => {
        results.onFinished(d);
        if (d.status === 'failed') say('error', `Analysis failed: ${d.error ?? 'no message'}`);
        if (d.status === 'done' && d.report) void fetchCaseFields(d.runId, d.report);
      }),
      h().onDidMenuCommand((c) => void menuCommand(c)),
      h().onDidRequestOpen((p) => void openPath(p)),
    );
    autosaveTimer = setInterval(() => void autosave(), AUTOSAVE_MS);
    phase.value = 'loading';
    const [initial, rec, rcv] = await Promise.all([
      h().openInitial().catch((e: Error) => ({ ok: false as const, error: e.message })),
      h().recentProjects().catch(() => []),
      h().listRecovery().catch(() => []),
    ]);
    recents.value = rec;
    recovery.value = rcv;
    if (!adopt(initial)) phase.value = 'empty';
  }

  function stop(): void {
    for (const u of unsubscribers.splice(0)) u();
    if (autosaveTimer) clearInterval(autosaveTimer);
  }

  async function openDemo(): Promise<void> {
    phase.value = 'loading';
    const r = await h().openInitial();
    if (!r) {
      phase.value = projectStore.project ? 'ready' : 'empty';
      say('error', 'This host was started without a demo or initial project: open a file instead.');
      return;
    }
    adopt(r);
  }

  /** Open a project file; `confirmed`: the user already agreed to discard unsaved changes (asked once). */
  async function openPath(path?: string, confirmed = false): Promise<void> {
    if (!confirmed && projectStore.dirty && !window.confirm(`Discard unsaved changes to ${projectStore.name}?`)) return;
    if (!path && hostKind.value === 'web') {
      pathPrompt.value = { purpose: 'open', suggestion: '' };
      return;
    }
    const previous = phase.value;
    phase.value = 'loading';
    try {
      const r = await h().open(path);
      if (!r) phase.value = previous;
      else adopt(r);
    } catch (e) {
      phase.value = projectStore.project ? 'ready' : 'empty';
      openErrors.value = [(e as Error).message];
    }
  }

  /** Open the New project dialog (after confirming that unsaved changes may be discarded). */
  function askNew(): void {
    if (projectStore.dirty && !window.confirm(`Discard unsaved changes to ${projectStore.name}?`)) return;
    creating.value = true;
  }

  /** A new, never-saved project: blank, or blank with the Generate dialog open on `start`. */
  function createProject(name: string, start: 'blank' | GeneratorKind): void {
    creating.value = false;
    const project = blankProject(name);
    adopt({ ok: true, value: { path: null, name: `${project.meta!.name}.stayset`, project } });
    projectStore.markUnsaved();
    if (start !== 'blank') {
      generateKind.value = start;
      generating.value = true;
    }
  }

  async function recover(id: string): Promise<void> {
    phase.value = 'loading';
    if (adopt(await h().recover(id))) say('info', 'Recovered unsaved changes from the last session. Save to keep them.');
  }

  async function syncDirty(): Promise<void> {
    try {
      await h().setDirty(projectStore.dirty, projectStore.title || 'Stayset');
    } catch {
      /* the title is cosmetic */
    }
  }

  async function save(): Promise<boolean> {
    const p = projectStore.project;
    if (!p) return false;
    if (!projectStore.path || projectStore.migratedFrom) return saveAs();
    const r = await h().save(projectStore.path, p).catch((e: Error) => ({ ok: false as const, error: e.message }));
    if (!r.ok) {
      say('error', `Not saved: ${r.error}. Use Save As to write a new file.`);
      return false;
    }
    projectStore.markSaved(r.value.path, undefined, p);
    await h().discardRecovery(r.value.path).catch(() => undefined);
    say('info', `Saved ${projectStore.name}`);
    await syncDirty();
    return true;
  }

  async function saveAs(path?: string): Promise<boolean> {
    const p = projectStore.project;
    if (!p) return false;
    if (!path && hostKind.value === 'web') {
      const stem = projectStore.name.replace(/\.stayset(\.json)?$/, '');
      pathPrompt.value = { purpose: 'saveAs', suggestion: `${stem}${projectStore.path ? '-copy' : ''}.stayset` };
      return false;
    }
    const r = await h().saveAs(p, path).catch((e: Error) => ({ ok: false as const, error: e.message }));
    if (!r) return false;
    if (!r.ok) {
      say('error', `Not saved: ${r.error}`);
      return false;
    }
    const oldPath = projectStore.path;
    projectStore.markSaved(r.value.path, r.value.name, p);
    await h().discardRecovery(oldPath).catch(() => undefined);
    say('info', `Saved as ${r.value.name}`);
    await syncDirty();
    return true;
  }

  async function answerPathPrompt(path: string | null): Promise<void> {
    const prompt = pathPrompt.value;
    pathPrompt.value = null;
    if (!prompt || !path) return;
    if (prompt.purpose === 'open') await openPath(path, true);
    else await saveAs(path);
  }

  /** The document the last autosave wrote (autosave posts only when the content changed since). */
  let autosaved: ProjectFile | null = null;

  /**
   * Write a recovery copy when there are unsaved changes that differ from the last autosave. A
   * document that does not validate (a new project before its first member) is not sent: the
   * host refuses it. A failed autosave is said once per distinct reason (recovery is then not
   * available) and retried at the next tick.
   */
  async function autosave(): Promise<boolean> {
    const p = projectStore.project;
    if (!p || !projectStore.dirty || p === autosaved || projectStore.problems.length) return false;
    autosaved = p;
    const r = await h().autosave(projectStore.path, p).catch((e: Error) => ({ ok: false as const, error: e.message }));
    if (r && !r.ok) {
      autosaved = null;
      if (r.error !== lastAutosaveError) say('error', r.error);
    }
    lastAutosaveError = r && !r.ok ? r.error : null;
    return true;
  }

  async function run(): Promise<void> {
    const p = projectStore.project;
    if (!p || results.state === 'running') return;
    if (projectStore.problems.length) {
      say('error', 'Fix the problems listed above before running the analysis.');
      return;
    }
    if (projectStore.warnings.length) {
      const w = projectStore.warnings;
      say('info', `Check ${w.length === 1 ? 'this input' : `these ${w.length} inputs`} (the run goes ahead): ${w.slice(0, 3).join('; ')}${w.length > 3 ? ' …' : ''}`);
    }
    results.started(projectStore.revision, p);
    try {
      const { runId } = await h().runAnalysis(p);
      results.assignRunId(runId);
    } catch (e) {
      results.failedToStart((e as Error).message);
      say('error', `Analysis did not start: ${(e as Error).message}`);
    }
  }

  async function cancel(): Promise<void> {
    if (results.state === 'running' && results.runId) await h().cancelAnalysis(results.runId).catch(() => undefined);
  }

  function undo(): void {
    if (projectStore.undo()) void syncDirty();
  }

  function redo(): void {
    if (projectStore.redo()) void syncDirty();
  }

  const fitRequests = ref(0);

  async function menuCommand(command: string): Promise<void> {
    switch (command) {
      case 'save': await save(); break;
      case 'saveAs': await saveAs(); break;
      case 'open': await openPath(); break;
      case 'undo': undo(); break;
      case 'redo': redo(); break;
      case 'run': await run(); break;
      case 'fit': fitRequests.value++; break;
      case 'generate': generating.value = Boolean(projectStore.project); break;
      case 'print': await print(); break;
      case 'new': askNew(); break;
    }
  }

  /**
   * Show the schedule of the current results with the installation data (cut lengths,
   * installation tensions, temperature table); browser edition: print it with the browser.
   */
  function showSchedule(): void {
    const p = projectStore.project;
    if (!p) return;
    if (!results.report || results.isStaleFor(p)) {
      say('error', 'Run the analysis first: the schedule is built from current results.');
      return;
    }
    try {
      scheduleFrom = { report: results.report, parts: scheduleParts(p, results.report, true) };
      layOutSchedule(p);
    } catch (e) {
      say('error', `The schedule could not be built: ${(e as Error).message}`);
    }
  }

  /** Solver parts of the shown schedule, for the results they were made from. */
  let scheduleFrom: { report: SolveReport; parts: ScheduleParts } | null = null;
  function layOutSchedule(p: ProjectFile): void {
    if (!scheduleFrom) return;
    schedule.value = schedulePageFrom(p, scheduleFrom.parts, { units: settings.units, paper: paperForUnits(settings.units), issueDate: isoDate(new Date()) });
  }
  // Print settings edited while the schedule is shown (listing, revisions): lay it out again from
  // the same results; an edit that changes the analysis closes it (the results no longer apply).
  watch(() => projectStore.project, (p) => {
    if (!schedule.value) { scheduleFrom = null; return; }
    if (!p || !scheduleFrom || results.report !== scheduleFrom.report || results.isStaleFor(p)) {
      schedule.value = null;
      scheduleFrom = null;
      if (p) say('info', 'The schedule was closed: the model changed since the analysis. Run it again, then print.');
      return;
    }
    try {
      layOutSchedule(p);
    } catch (e) {
      say('error', `The schedule could not be laid out: ${(e as Error).message}`);
    }
  });

  async function print(): Promise<void> {
    const p = projectStore.project;
    if (!p) return;
    if (hostKind.value === 'web') {
      showSchedule();
      return;
    }
    // The print window lays the schedule out in the project's display units and on their paper:
    // give it the units shown here, so the PDF reads as the screen does.
    const shown: ProjectFile = { ...p, display: { ...p.display, units: settings.units } };
    const r = await h().printSchedule(shown).catch((e: Error) => ({ ok: false as const, error: e.message }));
    if (r && !r.ok) say('error', r.error);
    else if (r) say('info', `Schedule written to ${r.value.path}`);
  }

  /** Ctrl/Cmd+S, Shift+Ctrl/Cmd+S, Ctrl/Cmd+Z, Ctrl/Cmd+Y or Shift+Ctrl/Cmd+Z, F5 = run. */
  function onKeydown(e: KeyboardEvent): void {
    const mod = e.ctrlKey || e.metaKey;
    const key = e.key.toLowerCase();
    const inField = e.target instanceof HTMLInputElement || e.target instanceof HTMLSelectElement || e.target instanceof HTMLTextAreaElement;
    if (mod && key === 's') {
      e.preventDefault();
      void (e.shiftKey ? saveAs() : save());
    } else if (mod && key === 'z' && !inField) {
      e.preventDefault();
      if (e.shiftKey) redo();
      else undo();
    } else if (mod && key === 'y' && !inField) {
      e.preventDefault();
      redo();
    } else if (e.key === 'F5') {
      e.preventDefault();
      void run();
    }
  }

  return {
    phase, hostKind, notice, openErrors, recents, recovery, pathPrompt, fitRequests, schedule, generating, generateKind, creating, askNew, createProject,
    start, showSchedule, stop, openDemo, openPath, recover, save, saveAs, answerPathPrompt, autosave, run, cancel, undo, redo,
    menuCommand, print, onKeydown, syncDirty, say,
  };
}

export type AppActions = ReturnType<typeof createAppActions>;


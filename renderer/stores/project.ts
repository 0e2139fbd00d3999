/**
 * The project being edited: the ProjectFile (SI, immutable snapshots), where it lives, the dirty
 * flag and undo/redo. Every change goes through `edit()` (or the table helpers built on it), which
 * validates the would-be document and records history; a refused edit changes nothing.
 */
import { defineStore } from 'pinia';
import { computed, shallowRef, ref } from 'vue';
import type { ProjectFile } from '../../solver/index.ts';
import type { OpenedProject } from '../../main/common/host-contract.ts';
import { EditHistory } from '../model/edit-history.ts';
import { checkEdit, validationErrors } from '../model/validate-edit.ts';
import { plausibilityWarnings } from '../../main/common/project/plausibility/plausibility-warnings.ts';
import { appendRow, deleteRows, updateRows } from '../model/project-edits.ts';
import type { TableName, TableRow } from '../model/table-names.ts';

export type EditOutcome = { ok: true } | { ok: false; errors: string[] };

export const HISTORY_CAP = 200;

export const useProjectStore = defineStore('project', () => {
  const project = shallowRef<ProjectFile | null>(null);
  /** The document as last opened or saved; dirty = the current one is a different object. */
  const savedProject = shallowRef<ProjectFile | null>(null);
  const path = ref<string | null>(null);
  const name = ref('');
  const migratedFrom = ref<number | null>(null);
  /** Validation messages of the current document (shown in the error banner). */
  const problems = shallowRef<string[]>([]);
  /**
   * Plausibility warnings of a valid document (values outside the ranges of real members or
   * sites, main/common/project/plausibility): shown before a run; never block an edit or a run.
   */
  const warnings = computed(() => (project.value && problems.value.length === 0 ? plausibilityWarnings(project.value) : []));
  /** Bumped on every change of `project`; cheap to watch. */
  const revision = ref(0);
  const history = new EditHistory<ProjectFile>(HISTORY_CAP);
  const historyTick = ref(0);

  const dirty = computed(() => project.value !== null && project.value !== savedProject.value);
  const canUndo = computed(() => (historyTick.value, history.undoCount > 0));
  const canRedo = computed(() => (historyTick.value, history.redoCount > 0));
  const undoLabel = computed(() => (historyTick.value, history.undoLabel));
  const redoLabel = computed(() => (historyTick.value, history.redoLabel));
  const title = computed(() => (project.value ? `${name.value || 'Untitled'}${dirty.value ? ' •' : ''}` : ''));

  /** Validation messages by document: each document is validated once (edits, undo and redo reuse them). */
  const problemsOf = new WeakMap<ProjectFile, string[]>();
  /** Number of full validations run (the responsiveness benchmark and tests read it). */
  let validations = 0;
  function validated(p: ProjectFile): string[] {
    let list = problemsOf.get(p);
    if (!list) {
      validations++;
      list = validationErrors(p);
      problemsOf.set(p, list);
    }
    return list;
  }

  function setCurrent(next: ProjectFile | null): void {
    project.value = next;
    problems.value = next ? validated(next) : [];
    revision.value++;
    historyTick.value++;
  }

  /** Take over a project handed over by the host (open, recover, initial). Clears history. */
  function load(opened: OpenedProject): void {
    history.clear();
    path.value = opened.path;
    name.value = opened.name;
    migratedFrom.value = opened.migratedFrom ?? null;
    savedProject.value = opened.migratedFrom !== undefined ? null : opened.project;
    setCurrent(opened.project);
  }

  function close(): void {
    history.clear();
    path.value = null;
    name.value = '';
    savedProject.value = null;
    setCurrent(null);
  }

  /**
   * Apply `produce` to the current project. Refused (nothing changes) when it adds validation
   * messages; `table`/`rows` say which rows the edit touches so their messages come first.
   */
  function edit(label: string, produce: (p: ProjectFile) => ProjectFile, table?: TableName, rows: readonly number[] = []): EditOutcome {
    const current = project.value;
    if (!current) return { ok: false, errors: ['no project is open'] };
    let next: ProjectFile;
    try {
      next = produce(current);
    } catch (e) {
      return { ok: false, errors: [(e as Error).message] };
    }
    if (next === current) return { ok: true };
    const check = checkEdit(current, next, table ?? 'nodes', rows, problems.value);
    validations++;
    problemsOf.set(next, check.after);
    if (!check.ok) return { ok: false, errors: check.errors };
    history.record(current, label);
    setCurrent(next);
    return { ok: true };
  }

  function updateRowsIn<K extends TableName>(table: K, indices: readonly number[], update: (row: TableRow[K], i: number) => TableRow[K], label: string): EditOutcome {
    return edit(label, (p) => updateRows(p, table, indices, update), table, indices);
  }

  function addRow<K extends TableName>(table: K, row: TableRow[K], label = 'Add row'): EditOutcome {
    const index = project.value ? (project.value[table] as unknown[]).length : 0;
    return edit(label, (p) => appendRow(p, table, row), table, [index]);
  }

  function removeRows(table: TableName, indices: readonly number[], label = 'Delete rows'): EditOutcome {
    return edit(label, (p) => deleteRows(p, table, indices), table, []);
  }

  function undo(): boolean {
    if (!project.value) return false;
    const entry = history.undo(project.value, '');
    if (!entry) return false;
    setCurrent(entry.state);
    return true;
  }

  function redo(): boolean {
    if (!project.value) return false;
    const entry = history.redo(project.value);
    if (!entry) return false;
    setCurrent(entry.state);
    return true;
  }

  /** After a successful save: the current document is now what is on disk at `savedPath`. */
  function markSaved(savedPath: string, savedName?: string, saved: ProjectFile | null = project.value): void {
    path.value = savedPath;
    if (savedName) name.value = savedName;
    migratedFrom.value = null;
    savedProject.value = saved;
    historyTick.value++;
  }

  /** A new project that was never saved: dirty until Save As. */
  function markUnsaved(): void {
    savedProject.value = null;
    historyTick.value++;
  }

  return {
    markUnsaved, validationCount: () => validations,
    project, path, name, migratedFrom, problems, warnings, revision, dirty, title,
    canUndo, canRedo, undoLabel, redoLabel,
    load, close, edit, updateRowsIn, addRow, removeRows, undo, redo, markSaved,
  };
});

/**
 * Pure, immutable edits of project.combinations (CombinationSpec: id, label, factors case × factor)
 * for the combinations table: the table shows one column per load case, a blank cell = the case
 * is not in the combination. Every function returns a new project; the input is not changed.
 */
import type { CombinationSpec, ProjectFile } from '../../solver/index.ts';
import { freshId } from './project-edits.ts';

function combos(project: ProjectFile): CombinationSpec[] {
  return project.combinations ?? [];
}

function replaceAt(project: ProjectFile, index: number, next: CombinationSpec): ProjectFile {
  const list = combos(project).slice();
  if (index < 0 || index >= list.length) throw new RangeError(`combinations[${index}] does not exist`);
  list[index] = next;
  return { ...project, combinations: list };
}

/** Factor of `caseId` in combination `index`, or null when the case is not in it. */
export function factorOf(c: CombinationSpec, caseId: string): number | null {
  const f = c.factors.find((x) => x.case === caseId);
  return f ? f.factor : null;
}

/**
 * Set (factor a number) or remove (null) the factor of `caseId` in combination `index`. The
 * factors keep the load-case order of the project so the file reads like the table.
 */
export function setFactor(project: ProjectFile, index: number, caseId: string, factor: number | null): ProjectFile {
  const c = combos(project)[index];
  if (!c) throw new RangeError(`combinations[${index}] does not exist`);
  if (factor !== null && !Number.isFinite(factor)) throw new Error(`combinations[${index}] "${c.id}": factor of "${caseId}" must be a number`);
  const others = c.factors.filter((x) => x.case !== caseId);
  const all = factor === null ? others : [...others, { case: caseId, factor }];
  const order = new Map(project.loadCases.map((lc, i) => [lc.id, i]));
  all.sort((a, b) => (order.get(a.case) ?? 1e9) - (order.get(b.case) ?? 1e9));
  return replaceAt(project, index, { ...c, factors: all });
}

export function setCombinationText(project: ProjectFile, index: number, key: 'id' | 'label', text: string): ProjectFile {
  const c = combos(project)[index];
  if (!c) throw new RangeError(`combinations[${index}] does not exist`);
  const next: CombinationSpec = { ...c };
  if (key === 'id') next.id = text.trim();
  else if (text.trim() === '') delete next.label;
  else next.label = text;
  return replaceAt(project, index, next);
}

/** Append a combination "C1", "C2", … with factor 1 on the first load case. */
export function addCombination(project: ProjectFile): ProjectFile {
  const ids = [...project.loadCases.map((c) => c.id), ...combos(project).map((c) => c.id)];
  const first = project.loadCases[0];
  const c: CombinationSpec = { id: freshId('C', ids), factors: first ? [{ case: first.id, factor: 1 }] : [] };
  return { ...project, combinations: [...combos(project), c] };
}

export function deleteCombination(project: ProjectFile, index: number): ProjectFile {
  const list = combos(project).filter((_, i) => i !== index);
  const next: ProjectFile = { ...project, combinations: list };
  if (list.length === 0) delete next.combinations;
  return next;
}

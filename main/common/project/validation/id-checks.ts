/**
 * Unique ids: within each top-level list, and across load cases and combinations (both are
 * "cases" for results, `--case` and tuning targets, so they share one name space).
 */
import { entryLabel } from './error-path.ts';
import { entries, str } from './doc-access.ts';

const ID_LISTS = ['nodes', 'sections', 'members', 'loadCases', 'groups', 'combinations', 'generators'] as const;

export function duplicateIdErrors(root: unknown): string[] {
  const errors: string[] = [];
  for (const list of ID_LISTS) {
    const firstAt = new Map<string, number>();
    for (const { index, entry } of entries(root, list)) {
      const id = str(entry, 'id');
      if (id === undefined) continue;
      const first = firstAt.get(id);
      if (first === undefined) firstAt.set(id, index);
      else errors.push(`${entryLabel(root, list, index)}: id ${JSON.stringify(id)} is already used by ${list}[${first}]`);
    }
  }
  const caseAt = new Map<string, number>();
  for (const { index, entry } of entries(root, 'loadCases')) {
    const id = str(entry, 'id');
    if (id !== undefined && !caseAt.has(id)) caseAt.set(id, index);
  }
  for (const { index, entry } of entries(root, 'combinations')) {
    const id = str(entry, 'id');
    const lc = id === undefined ? undefined : caseAt.get(id);
    if (lc !== undefined) {
      errors.push(
        `${entryLabel(root, 'combinations', index)}: id ${JSON.stringify(id)} is already used by load case loadCases[${lc}]`,
      );
    }
  }
  return errors;
}

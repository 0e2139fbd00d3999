/**
 * Inline validation of table edits with the file validator's own messages: the would-be document
 * is checked by `validateProject` (main/common/project) and only messages that the edit *adds* are
 * reported, those naming the edited row first. The renderer refuses to commit an edit that adds any.
 */
import type { ProjectFile } from '../../solver/index.ts';
import { validateProject } from '../../main/common/project/index.ts';
import type { TableName } from './table-names.ts';

export function validationErrors(project: ProjectFile): string[] {
  const outcome = validateProject(project) as { ok: boolean; errors?: string[] };
  return outcome.ok ? [] : (outcome.errors ?? ['the project is not valid']);
}

/** True when `message` is about row `index` of `table` (validator paths look like `members[3] …`). */
export function concernsRow(message: string, table: TableName, index: number): boolean {
  return message.startsWith(`${table}[${index}]`);
}

export interface EditCheck {
  ok: boolean;
  /** Messages the edit introduces, those about `rows` first. */
  errors: string[];
  /** Every validation message of the edited document (so the caller need not validate it again). */
  after: string[];
}

/**
 * Compare validation of `before` and `after`. `rows` are the edited row indices of `table`.
 * Messages already present before the edit do not block it (they are shown in the banner).
 */
export function checkEdit(before: ProjectFile, after: ProjectFile, table: TableName, rows: readonly number[], beforeErrors?: string[]): EditCheck {
  const old = new Set(beforeErrors ?? validationErrors(before));
  const all = validationErrors(after);
  const added = all.filter((m) => !old.has(m));
  const mine = added.filter((m) => rows.some((r) => concernsRow(m, table, r)));
  const others = added.filter((m) => !mine.includes(m));
  return { ok: added.length === 0, errors: [...mine, ...others], after: all };
}

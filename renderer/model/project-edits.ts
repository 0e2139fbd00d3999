/**
 * Pure, immutable edits of a ProjectFile: each returns a new project and shares every part it did
 * not change with the old one (so history snapshots are cheap, and `a !== b` means "changed").
 */
import type { ProjectFile } from '../../solver/index.ts';
import { rowsOf, type TableName, type TableRow } from './table-names.ts';

/** Replace rows at `indices` by `update(row)`. */
export function updateRows<K extends TableName>(
  project: ProjectFile,
  table: K,
  indices: readonly number[],
  update: (row: TableRow[K], index: number) => TableRow[K],
): ProjectFile {
  const rows = rowsOf(project, table).slice();
  for (const i of indices) {
    if (i < 0 || i >= rows.length) throw new RangeError(`${table}[${i}] does not exist`);
    rows[i] = update(rows[i], i);
  }
  return { ...project, [table]: rows };
}

export function appendRow<K extends TableName>(project: ProjectFile, table: K, row: TableRow[K]): ProjectFile {
  return { ...project, [table]: [...rowsOf(project, table), row] };
}

export function deleteRows(project: ProjectFile, table: TableName, indices: readonly number[]): ProjectFile {
  const drop = new Set(indices);
  return { ...project, [table]: rowsOf(project, table).filter((_, i) => !drop.has(i)) };
}

/** Copy of `row` with `key` set, or removed when `value` is undefined (optional fields). */
export function withField<T extends object>(row: T, key: string, value: unknown): T {
  const next = { ...row } as Record<string, unknown>;
  if (value === undefined) delete next[key];
  else next[key] = value;
  return next as T;
}

/** An id not used yet in `existing`: prefix + smallest free number ("N1", "N2", …). */
export function freshId(prefix: string, existing: Iterable<string>): string {
  const used = new Set(existing);
  for (let k = 1; ; k++) {
    const id = `${prefix}${k}`;
    if (!used.has(id)) return id;
  }
}

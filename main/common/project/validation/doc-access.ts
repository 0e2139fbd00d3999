/**
 * Defensive readers for a document that may not match the schema yet: semantic checks run
 * alongside the schema check (so the user sees every problem at once) and must never throw.
 */

export type Rec = Record<string, unknown>;

export function isRec(v: unknown): v is Rec {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Entries of a list property that are objects, with their index in the list. */
export function entries(owner: unknown, key: string): { index: number; entry: Rec }[] {
  const list = isRec(owner) ? owner[key] : undefined;
  if (!Array.isArray(list)) return [];
  const out: { index: number; entry: Rec }[] = [];
  for (let index = 0; index < list.length; index++) {
    const entry: unknown = list[index];
    if (isRec(entry)) out.push({ index, entry });
  }
  return out;
}

/** String items of a list property (other items are the schema's business). */
export function strings(owner: unknown, key: string): { index: number; value: string }[] {
  const list = isRec(owner) ? owner[key] : undefined;
  if (!Array.isArray(list)) return [];
  const out: { index: number; value: string }[] = [];
  for (let index = 0; index < list.length; index++) {
    const value: unknown = list[index];
    if (typeof value === 'string') out.push({ index, value });
  }
  return out;
}

export function str(entry: Rec, key: string): string | undefined {
  const v = entry[key];
  return typeof v === 'string' ? v : undefined;
}

export function num(entry: Rec, key: string): number | undefined {
  const v = entry[key];
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

/** The ids of the object entries of a top-level list. */
export function idSet(root: unknown, key: string): Set<string> {
  const ids = new Set<string>();
  for (const { entry } of entries(root, key)) {
    const id = str(entry, 'id');
    if (id !== undefined) ids.add(id);
  }
  return ids;
}

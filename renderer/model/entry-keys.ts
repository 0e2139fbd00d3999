/**
 * Stable keys for the rows of a file list whose identity is its order (check rules, actions,
 * sections, support displacements): the file carries no row id, so the list's editor keys its rows
 * here, on the renderer side. A key follows its entry through edits, removals, additions and
 * undo/redo, so a row's open state and its DOM (a half-typed field) stay with the entry and never
 * slide onto the next row when a middle one is removed.
 *
 * The project store keeps immutable snapshots and the pure edits replace only what they change, so:
 * - an entry that is the same object as before keeps its key;
 * - an entry seen before (undo or redo brings back the old objects) gets its old key back;
 * - an entry edited in place (a new object where the list kept its length) takes the key of the
 *   entry it replaced at that index;
 * - anything else is new and gets a fresh key.
 */
export class EntryKeys {
  private readonly seen = new WeakMap<object, number>();
  private lastEntries: readonly object[] = [];
  private lastKeys: number[] = [];
  private next = 1;
  /** Keys handed out by the last `keysOf` that had never been seen before (added entries). */
  fresh: ReadonlySet<number> = new Set();

  /** One key per entry, in list order; distinct within the list. */
  keysOf(entries: readonly object[]): number[] {
    const keys: (number | undefined)[] = new Array(entries.length);
    const used = new Set<number>();
    const take = (i: number, k: number) => { keys[i] = k; used.add(k); };
    // 1. The same object as in the last list; then one seen before (undo/redo brings it back).
    const lastIndex = new Map<object, number>();
    this.lastEntries.forEach((e, i) => { if (!lastIndex.has(e)) lastIndex.set(e, i); });
    entries.forEach((e, i) => {
      const j = lastIndex.get(e);
      if (j !== undefined && !used.has(this.lastKeys[j])) take(i, this.lastKeys[j]);
    });
    entries.forEach((e, i) => {
      const k = this.seen.get(e);
      if (keys[i] === undefined && k !== undefined && !used.has(k)) take(i, k);
    });
    // 2. Edited in place: the list kept its length and the entry at this index was replaced.
    if (entries.length === this.lastEntries.length) {
      entries.forEach((_, i) => {
        const k = this.lastKeys[i];
        if (keys[i] === undefined && !used.has(k) && !entries.includes(this.lastEntries[i])) take(i, k);
      });
    }
    // 3. New entries.
    const fresh = new Set<number>();
    entries.forEach((_, i) => {
      if (keys[i] === undefined) { take(i, this.next); fresh.add(this.next); this.next++; }
    });
    const out = keys as number[];
    entries.forEach((e, i) => this.seen.set(e, out[i]));
    this.lastEntries = entries.slice();
    this.lastKeys = out;
    this.fresh = fresh;
    return out;
  }
}

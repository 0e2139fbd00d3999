/**
 * Undo/redo as a list of immutable snapshots. Edits never mutate a ProjectFile in place (see
 * project-edits.ts), so a snapshot is just a reference and unchanged parts are shared between
 * snapshots: memory grows with what changed, not with the model size.
 */
export interface HistoryEntry<T> {
  state: T;
  /** What the edit that produced this state did, for the Undo/Redo tooltips. */
  label: string;
}

export class EditHistory<T> {
  private past: HistoryEntry<T>[] = [];
  private future: HistoryEntry<T>[] = [];

  /** @param cap most undo steps kept; the oldest are dropped first. */
  constructor(private readonly cap = 200) {}

  /** Record that `previous` was replaced by a new state through the edit `label`. */
  record(previous: T, label: string): void {
    this.past.push({ state: previous, label });
    if (this.past.length > this.cap) this.past.splice(0, this.past.length - this.cap);
    this.future = [];
  }

  /** Step back: returns the state to restore, or null. `current` goes onto the redo list. */
  undo(current: T, currentLabel: string): HistoryEntry<T> | null {
    const entry = this.past.pop();
    if (!entry) return null;
    this.future.push({ state: current, label: entry.label || currentLabel });
    return entry;
  }

  redo(current: T): HistoryEntry<T> | null {
    const entry = this.future.pop();
    if (!entry) return null;
    this.past.push({ state: current, label: entry.label });
    return entry;
  }

  clear(): void {
    this.past = [];
    this.future = [];
  }

  get undoLabel(): string | null {
    return this.past.length ? this.past[this.past.length - 1].label : null;
  }

  get redoLabel(): string | null {
    return this.future.length ? this.future[this.future.length - 1].label : null;
  }

  get undoCount(): number {
    return this.past.length;
  }

  get redoCount(): number {
    return this.future.length;
  }
}

/**
 * Factors of start tangents, kept across the cases solved on one workspace.
 *
 * Every case starts from the pretensioned state (u = 0). There the tangent depends on the model
 * and on λ·ΔT only: it holds no load stiffness (wind is a follower load left out of the tangent,
 * weight and nodal loads are fixed in direction). So the 72 cases of the design benchmark, at three
 * temperatures, meet three distinct start tangents. A start tangent equal bit for bit to one
 * already factorised gets that factor back (SparseLDL.restoreFactor) instead of a new numeric
 * factorisation: the same numbers, so every result is unchanged to the last bit. The key is the
 * tangent itself, not λ·ΔT, so a changed prestress (setElementPrestress) can never hit an old entry.
 */
import type { FactorSnapshot, SparseLDL } from '../linalg/index.ts';

interface Entry { bits: Int32Array; tolerance: number; snapshot: FactorSnapshot; size: number }

export class StartFactorCache {
  private entries: Entry[] = [];

  /**
   * @param maxEntries factors kept (the least recently used one is dropped first)
   * @param maxDoubles storage of all entries together, in doubles (factor plus key; 4 M = 32 MB):
   *   fewer entries are kept for larger models, none where one alone exceeds it (the largest nets)
   */
  constructor(private readonly maxEntries = 4, private readonly maxDoubles = 4_000_000) {}

  /** Makes a kept factor of exactly these tangent values current; false when there is none. */
  reuse(ldl: SparseLDL, values: Float64Array, tolerance: number): boolean {
    if (this.entries.length === 0) return false;
    const bits = bitsOf(values);
    for (let k = 0; k < this.entries.length; k++) {
      const entry = this.entries[k];
      if (entry.tolerance !== tolerance || entry.snapshot.owner !== ldl || !sameBits(entry.bits, bits)) continue;
      ldl.restoreFactor(entry.snapshot);
      if (k > 0) { this.entries.splice(k, 1); this.entries.unshift(entry); }
      return true;
    }
    return false;
  }

  /** Keeps the factor just computed from these values (call right after a successful factor). */
  remember(ldl: SparseLDL, values: Float64Array, tolerance: number): void {
    const size = ldl.factorStorage + values.length;
    if (size > this.maxDoubles) return;
    const snapshot = ldl.saveFactor();
    if (!snapshot) return;
    this.entries.unshift({ bits: bitsOf(values).slice(), tolerance, snapshot, size });
    let total = 0;
    for (let k = 0; k < this.entries.length; k++) {
      total += this.entries[k].size;
      if (k >= this.maxEntries || total > this.maxDoubles) { this.entries.length = k; break; }
    }
  }

  clear(): void { this.entries = []; }
}

/** The doubles' bit patterns (so −0 and 0, or two NaNs, are told apart as the factor would). */
function bitsOf(values: Float64Array): Int32Array {
  return new Int32Array(values.buffer, values.byteOffset, 2 * values.length);
}

function sameBits(a: Int32Array, b: Int32Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

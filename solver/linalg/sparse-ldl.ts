import { validatePattern, adjacencyGraph, type SymmetricPattern } from './symmetric-pattern.ts';
import { invertPermutation } from './permutation.ts';
import { permutedUpper } from './permuted-upper.ts';
import { blockOrdering, type OrderingMethod } from './block-ordering.ts';
import { groupDofs, uniformBlocks, validateBlocks } from './dof-groups.ts';
import type { FactorBackend } from './factor-backend.ts';
import { SimplicialBackend } from './simplicial-backend.ts';
import { SupernodalLDL } from './supernodal-ldl.ts';
import { dropDecoupledEntries, gatherKeptValues } from './decoupled-dofs.ts';
import { supernodalStructure, supernodalScatter } from './supernodal-symbolic.ts';

export interface SparseLDLOptions {
  /** DOFs per node when every node has the same number (3 for truss/cable models; 1 = plain). Default 3. */
  blockSize?: number;
  /**
   * First DOF of each node (ascending, last entry n), for nodes with different DOF counts (3 or 6);
   * overrides blockSize. The orderings and the symbolic analysis work on these node blocks.
   */
  blockStart?: ArrayLike<number>;
  /**
   * Fill-reducing ordering: 'auto' (default: AMD and nested dissection, the one with the smaller
   * nnz(L) kept), 'amd', 'nd' or 'natural'.
   */
  ordering?: OrderingMethod;
  /** Numeric kernel: 'supernodal' (default, fast) or 'simplicial' (up-looking, the reference). */
  kernel?: 'supernodal' | 'simplicial';
  /** Supernodal kernel: merge small supernodes into their parents (explicit zeros). Default false:
   *  no measurable gain on the benchmark nets, 9 % more storage. */
  relaxedSupernodes?: boolean;
  /**
   * 1 for a DOF whose off-diagonal entries are all zero by value (e.g. a restrained DOF kept as an
   * identity row): its couplings are left out of ordering and factor (less fill), and factor()
   * refuses values where one of them is not zero. Length n; default none.
   */
  decoupledDofs?: ArrayLike<number>;
}

/** A copy of a numeric factor (SparseLDL.saveFactor), valid for the SparseLDL that made it. */
export interface FactorSnapshot {
  readonly owner: object;
  readonly arrays: Float64Array[];
  readonly negatives: number;
}

/** Default pivot tolerance: a pivot smaller than 1e-12 of its original diagonal counts as zero. */
export const DEFAULT_PIVOT_TOLERANCE = 1e-12;
const TINY = 1e-300;

/**
 * Sparse symmetric LDLᵀ factorisation without pivoting, for tangent stiffness matrices that are
 * refactorised many times with one sparsity pattern. D may have negative entries (indefinite K);
 * a (near) zero pivot is reported, not hidden.
 *
 * Pipeline: DOF groups of the node blocks (dof-groups.ts) → fill-reducing ordering of the group
 * graph, AMD or nested dissection by predicted fill (block-ordering.ts) → postorder of the
 * elimination tree → symbolic analysis (column counts, storage) → numeric factor per tangent → solve.
 * Sources: T. A. Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4;
 * Amestoy, Davis & Duff, SIAM J. Matrix Anal. Appl. 17(4), 1996 (AMD).
 */
export class SparseLDL {
  readonly n: number;
  /** nnz(L) including the diagonal. */
  readonly factorNonzeros: number;
  /** perm[k] = original index of permuted row/column k. */
  readonly perm: Int32Array;
  /** The ordering analyse used, and nnz(L) predicted for every ordering it tried. */
  readonly ordering: { chosen: 'amd' | 'nd' | 'natural'; predicted: { amd?: number; nd?: number; natural?: number } };
  private readonly backend: FactorBackend;
  private readonly pattern: SymmetricPattern;
  private readonly nnzA: number;
  /** With decoupledDofs: original entry → entry of the reduced pattern (-1 = dropped), and its values. */
  private readonly keep: Int32Array | null;
  private readonly reducedValues: Float64Array | null;
  private readonly work: Float64Array;
  private readonly nonFinite = new Int32Array(1);
  private negatives = 0;
  private factored = false;

  private constructor(
    pattern: SymmetricPattern, perm: Int32Array, backend: FactorBackend, keep: Int32Array | null, reducedNnz: number,
    ordering: SparseLDL['ordering'],
  ) {
    const n = pattern.n;
    this.ordering = ordering;
    this.keep = keep;
    this.reducedValues = keep ? new Float64Array(reducedNnz) : null;
    this.n = n;
    this.perm = perm;
    this.backend = backend;
    this.pattern = pattern;
    this.factorNonzeros = backend.factorNonzeros;
    this.nnzA = pattern.colPtr[n];
    this.work = new Float64Array(n);
  }

  /**
   * Symbolic analysis: ordering + structure; allocates all workspaces. The elimination order is
   * the chosen ordering followed by a postorder of its elimination tree (same fill; 'natural' is
   * therefore natural up to that postorder). The pattern must not change afterwards.
   */
  static analyse(original: SymmetricPattern, options: SparseLDLOptions = {}): SparseLDL {
    validatePattern(original);
    const n = original.n;
    const reduction = options.decoupledDofs ? dropDecoupledEntries(original, options.decoupledDofs) : null;
    const pattern = reduction ? reduction.reduced : original;
    const blockSize = options.blockSize ?? 3;
    if (!Number.isInteger(blockSize) || blockSize < 1) throw new Error(`SparseLDL: blockSize must be a positive integer, got ${blockSize}`);
    const method = options.ordering ?? 'auto';
    if (!['auto', 'amd', 'nd', 'natural'].includes(method)) throw new Error(`SparseLDL: unknown ordering '${String(method)}'`);
    const blocks = options.blockStart ?? uniformBlocks(n, blockSize);
    validateBlocks(n, blocks);
    const graph = adjacencyGraph(pattern);
    const ord = blockOrdering(n, groupDofs(n, graph, blocks), method);
    const perm = ord.perm;
    const kernel = options.kernel ?? 'supernodal';
    if (kernel !== 'supernodal' && kernel !== 'simplicial') throw new Error(`SparseLDL: unknown kernel '${String(kernel)}'`);
    const pinv = invertPermutation(perm);
    const { parent, counts } = ord;
    let backend: FactorBackend;
    if (kernel === 'simplicial') {
      backend = new SimplicialBackend(n, permutedUpper(pattern, pinv), parent, counts);
    } else {
      const st = supernodalStructure(n, ord.groups, parent, counts, options.relaxedSupernodes ?? false);
      backend = new SupernodalLDL(st, supernodalScatter(st, pattern.colPtr, pattern.rowIdx, pinv));
    }
    return new SparseLDL(original, perm, backend, reduction ? reduction.keep : null, pattern.colPtr[n], { chosen: ord.chosen, predicted: ord.predicted });
  }

  /**
   * Numeric factorisation of values (aligned with pattern.rowIdx, lower triangle).
   * Returns -1 on success, or the ORIGINAL index of the first pivot with
   * |d| <= pivotTolerance · max(|a_jj|, tiny) (a zero pivot: mechanism).
   */
  factor(values: Float64Array, pivotTolerance = DEFAULT_PIVOT_TOLERANCE): number {
    if (values.length !== this.nnzA) {
      throw new Error(`SparseLDL.factor: values has ${values.length} entries, the pattern has ${this.nnzA}`);
    }
    if (!(pivotTolerance >= 0 && pivotTolerance < 1)) {
      throw new Error(`SparseLDL.factor: pivotTolerance must be in [0, 1), got ${pivotTolerance}`);
    }
    this.factored = false;
    let v = values;
    if (this.keep && this.reducedValues) {
      // One pass gathers the kept values and finds the first non-finite entry (checkFinite's).
      const bad = gatherKeptValues(this.keep, values, this.reducedValues, this.nonFinite);
      if (this.nonFinite[0] >= 0) this.throwNonFinite(values, this.nonFinite[0]);
      if (bad >= 0) throw new Error(`SparseLDL.factor: entry ${this.entryName(bad)} couples a DOF declared decoupled but is ${values[bad]}, not 0`);
      v = this.reducedValues;
    } else {
      this.checkFinite(values);
    }
    const k = this.backend.factor(v, pivotTolerance, TINY);
    if (k >= 0) return this.perm[k];
    this.negatives = this.backend.negativeCount();
    this.factored = true;
    return -1;
  }

  /** Throws, naming the first entry (row, column) that is NaN or infinite. */
  private checkFinite(values: Float64Array): void {
    let bad = -1;
    for (let q = 0; q < values.length; q++) if (values[q] - values[q] !== 0) { bad = q; break; } // NaN or ±∞
    if (bad >= 0) this.throwNonFinite(values, bad);
  }

  private throwNonFinite(values: Float64Array, bad: number): never {
    this.factored = false;
    throw new Error(`SparseLDL.factor: matrix entry ${this.entryName(bad)} is ${values[bad]}; the tangent must be finite`);
  }

  /** "(row, column)" of original entry q. */
  private entryName(q: number): string {
    const { colPtr, rowIdx } = this.pattern;
    let j = 0;
    while (colPtr[j + 1] <= q) j++;
    return `(${rowIdx[q]}, ${j})`;
  }

  /** Doubles a snapshot of the numeric factor holds (saveFactor). */
  get factorStorage(): number {
    let size = 0;
    for (const a of this.backend.factorArrays()) size += a.length;
    return size;
  }

  /**
   * A copy of the last successful factor (null when there is none), to be put back with
   * restoreFactor on this object: a later solve then gives what it gave right after that
   * factor(), bit for bit, without factorising again.
   */
  saveFactor(): FactorSnapshot | null {
    if (!this.factored) return null;
    return { owner: this, arrays: this.backend.factorArrays().map((a) => a.slice()), negatives: this.negatives };
  }

  /** Makes a snapshot of saveFactor the current factor again (no allocation). */
  restoreFactor(snapshot: FactorSnapshot): void {
    if (snapshot.owner !== this) throw new Error('SparseLDL.restoreFactor: the snapshot belongs to another factorisation');
    const arrays = this.backend.factorArrays();
    for (let k = 0; k < arrays.length; k++) arrays[k].set(snapshot.arrays[k]);
    this.negatives = snapshot.negatives;
    this.factored = true;
  }

  /** Number of negative entries of D after the last successful factor. */
  get negativePivots(): number { return this.negatives; }

  /** Solve K x = b with the last factor; x may be the same array as b. No allocation. */
  solve(b: Float64Array, x: Float64Array): void {
    if (!this.factored) throw new Error('SparseLDL.solve: no successful factorisation to solve with');
    const { n, perm, work } = this;
    if (b.length < n || x.length < n) throw new Error(`SparseLDL.solve: vectors must have ${n} entries`);
    for (let k = 0; k < n; k++) work[k] = b[perm[k]];
    this.backend.solveInPlace(work);
    for (let k = 0; k < n; k++) x[perm[k]] = work[k];
  }
}

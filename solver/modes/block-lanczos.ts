/**
 * Lowest modes of K φ = ω² M φ (K symmetric positive definite on the free DOFs, M lumped ≥ 0) by
 * block Lanczos on the inverted operator Op = K⁻¹ M with full M-reorthogonalisation, i.e. the
 * shift-invert spectral transformation at shift 0: the eigenvalues θ = 1/ω² of Op are largest for
 * the lowest modes and well separated, so a Krylov basis a few times the wanted count suffices.
 * Sources: Ericsson & Ruhe, Math. Comp. 35 (1980) (spectral transformation Lanczos); Grimes,
 * Lewis & Simon, SIAM J. Matrix Anal. Appl. 15 (1994) (shifted block Lanczos for vibration
 * problems); Parlett, The Symmetric Eigenvalue Problem (1998), ch. 13 (full reorthogonalisation).
 *
 * The basis is built vector by vector (block Arnoldi in the M inner product, block size b: vector
 * j expands into vector j + b), orthogonalised twice against every earlier vector (Daniel, Gragg,
 * Kaufman & Stewart 1976). Rayleigh–Ritz on the expanded vectors gives Ritz pairs (θ, y) whose
 * residual ‖Op y − θ y‖_M is read off the coefficients of the not yet expanded vectors. A block of b
 * random start vectors finds eigenvalues of multiplicity up to b (symmetric masts have pairs).
 * Massless DOFs have infinite frequencies: the start block is passed through Op once, which keeps
 * every basis vector in Op's range, so they never appear.
 */
import { SparseLDL } from '../linalg/index.ts';
import { symmetricEigen } from './dense-symmetric-eigen.ts';
import type { EigenOptions, EigenOutcome, EigenProblem } from './eigen-problem.ts';

export function lowestModes(problem: EigenProblem, options: EigenOptions): EigenOutcome {
  const { n, colPtr, rowIdx, mass, free } = problem;
  const notFree = new Uint8Array(n);
  let massive = 0;
  for (let d = 0; d < n; d++) {
    notFree[d] = free[d] ? 0 : 1;
    if (free[d] && mass[d] > 0) massive++;
  }
  if (massive === 0) return { ok: false, failure: { code: 'noMass' } };

  const ldl = SparseLDL.analyse({ n, colPtr, rowIdx }, { blockSize: problem.blockSize ?? 3, decoupledDofs: notFree });
  const pivot = ldl.factor(freeStiffness(problem), options.pivotTolerance ?? 1e-11);
  if (pivot >= 0) return { ok: false, failure: { code: 'mechanism', dof: pivot } };
  if (ldl.negativePivots > 0) return { ok: false, failure: { code: 'notPositiveDefinite', negativePivots: ldl.negativePivots } };

  const want = Math.min(Math.max(1, Math.floor(options.count)), massive);
  const block = Math.max(1, Math.min(options.krylovBlock ?? 3, want));
  const maxBasis = Math.min(massive, Math.max(want + block, options.maxBasis ?? Math.max(4 * want + 6, want + 60)));
  const tolerance = options.tolerance ?? 1e-9;
  const space = new KrylovSpace(n, mass, free, ldl, maxBasis, options.seed ?? 1);

  for (let k = 0; k < block && space.size < maxBasis; k++) space.addRandom();
  let expanded = 0;
  let nextCheck = Math.min(maxBasis, want + block);
  let ritz: RitzPairs | null = null;
  while (expanded < space.size) {
    space.expand(expanded++);
    // A full basis (short of the whole space) cannot store the next expansion: stop there.
    const last = expanded === space.size || (space.size >= maxBasis && maxBasis < massive);
    if (expanded < nextCheck && !last) continue;
    ritz = rayleighRitz(space, expanded, want);
    if (ritz.worst <= tolerance || last) break;
    nextCheck = expanded + Math.max(block, Math.ceil(expanded / 6));
  }
  ritz ??= rayleighRitz(space, expanded, want);
  return { ok: true, solution: ritzSolution(space, ritz, expanded, want, tolerance, massive) };
}

/** K restricted to the free DOFs: couplings of other DOFs zeroed, their diagonal 1. */
function freeStiffness(p: EigenProblem): Float64Array {
  const values = new Float64Array(p.stiffness.length);
  for (let j = 0; j < p.n; j++) {
    for (let q = p.colPtr[j]; q < p.colPtr[j + 1]; q++) {
      const i = p.rowIdx[q];
      if (p.free[i] && p.free[j]) values[q] = p.stiffness[q];
      else if (i === j) values[q] = 1;
    }
  }
  return values;
}

/** M-orthonormal Krylov basis V and the coefficients H (h[i][j] = v_iᵀ M Op v_j). */
class KrylovSpace {
  readonly basis: Float64Array[] = [];
  /** M v_i of each basis vector. */
  private readonly massBasis: Float64Array[] = [];
  readonly h: Float64Array;
  solves = 0;
  private readonly scratch: Float64Array;
  private state: number;

  constructor(
    readonly n: number, private readonly mass: Float64Array, private readonly free: Uint8Array,
    private readonly ldl: SparseLDL, readonly capacity: number, seed: number,
  ) {
    this.h = new Float64Array(capacity * capacity);
    this.scratch = new Float64Array(n);
    this.state = (seed >>> 0) || 1;
  }

  get size(): number { return this.basis.length; }

  coefficient(i: number, j: number): number { return this.h[i * this.capacity + j]; }

  /** w = Op x = K⁻¹ (M x). */
  private apply(x: Float64Array, w: Float64Array): void {
    const { mass, scratch } = this;
    for (let d = 0; d < this.n; d++) scratch[d] = mass[d] * x[d];
    this.ldl.solve(scratch, w);
    for (let d = 0; d < this.n; d++) if (!this.free[d]) w[d] = 0;
    this.solves++;
  }

  /** Expand basis vector j: orthogonalise Op v_j against the basis, append it (or a fresh random vector). */
  expand(j: number): void {
    const w = new Float64Array(this.n);
    this.apply(this.basis[j], w);
    const before = this.mNorm(w);
    const after = this.orthogonalise(w, j);
    if (after > 1e-10 * before && this.size < this.capacity) {
      this.h[this.size * this.capacity + j] = after;
      this.push(w, after);
    } else if (this.size < this.capacity) {
      this.addRandom(); // invariant subspace found: continue with a fresh direction
    }
  }

  /** Append Op r for a pseudo-random r at the massive DOFs, orthonormalised. */
  addRandom(): void {
    const r = new Float64Array(this.n), w = new Float64Array(this.n);
    for (let attempt = 0; attempt < 8; attempt++) {
      for (let d = 0; d < this.n; d++) r[d] = this.free[d] && this.mass[d] > 0 ? this.random() - 0.5 : 0;
      this.apply(r, w);
      const before = this.mNorm(w);
      const after = this.orthogonalise(w, -1);
      if (after > 1e-8 * before) { this.push(w, after); return; }
    }
  }

  /**
   * Gram–Schmidt in the M inner product, repeated once when the first pass cancelled more than
   * 1 − 1/√2 of the norm (the DGKS criterion); records coefficients in column j (≥ 0).
   */
  private orthogonalise(w: Float64Array, j: number): number {
    const n = this.n;
    let norm = this.mNorm(w);
    for (let pass = 0; pass < 2; pass++) {
      const before = norm;
      for (let i = 0; i < this.basis.length; i++) {
        const mv = this.massBasis[i], v = this.basis[i];
        let c = 0;
        for (let d = 0; d < n; d++) c += mv[d] * w[d];
        if (j >= 0) this.h[i * this.capacity + j] += c;
        for (let d = 0; d < n; d++) w[d] -= c * v[d];
      }
      norm = this.mNorm(w);
      if (norm > Math.SQRT1_2 * before) break;
    }
    return norm;
  }

  private push(w: Float64Array, norm: number): void {
    const mv = new Float64Array(this.n);
    for (let d = 0; d < this.n; d++) { w[d] /= norm; mv[d] = this.mass[d] * w[d]; }
    this.basis.push(w);
    this.massBasis.push(mv);
  }

  private mNorm(w: Float64Array): number {
    let s = 0;
    for (let d = 0; d < this.n; d++) s += this.mass[d] * w[d] * w[d];
    return Math.sqrt(s);
  }

  /** Uniform in [0, 1) (mulberry32). */
  private random(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }
}

interface RitzPairs {
  /** θ of the wanted pairs, descending. */
  theta: Float64Array;
  /** Coefficient vectors (m entries each) in the basis. */
  coefficients: Float64Array[];
  /** Relative residuals. */
  residual: Float64Array;
  worst: number;
}

/** Ritz pairs from the first m (expanded) basis vectors; residuals from the rows beyond m. */
function rayleighRitz(space: KrylovSpace, m: number, want: number): RitzPairs {
  const t = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < m; j++) t[i * m + j] = 0.5 * (space.coefficient(i, j) + space.coefficient(j, i));
  }
  const { values, vectors } = symmetricEigen(t, m);
  const count = Math.min(want, m);
  const theta = new Float64Array(count), residual = new Float64Array(count);
  const coefficients: Float64Array[] = [];
  let worst = 0;
  for (let k = 0; k < count; k++) {
    const s = new Float64Array(m);
    for (let l = 0; l < m; l++) s[l] = vectors[l * m + k];
    let r2 = 0;
    for (let i = m; i < space.size; i++) {
      let r = 0;
      for (let l = 0; l < m; l++) r += space.coefficient(i, l) * s[l];
      r2 += r * r;
    }
    theta[k] = values[k];
    residual[k] = values[k] > 0 ? Math.sqrt(r2) / values[k] : Infinity;
    coefficients.push(s);
    worst = Math.max(worst, residual[k]);
  }
  if (count < want) worst = Infinity;
  return { theta, coefficients, residual, worst };
}

function ritzSolution(
  space: KrylovSpace, ritz: RitzPairs, m: number, want: number, tolerance: number, massiveDofs: number,
) {
  const count = ritz.theta.length;
  const eigenvalues = new Float64Array(count);
  const vectors: Float64Array[] = [];
  for (let k = 0; k < count; k++) {
    eigenvalues[k] = 1 / ritz.theta[k];
    const y = new Float64Array(space.n), s = ritz.coefficients[k];
    for (let l = 0; l < m; l++) {
      const v = space.basis[l], c = s[l];
      for (let d = 0; d < space.n; d++) y[d] += c * v[d];
    }
    vectors.push(y);
  }
  return {
    eigenvalues, vectors, residuals: ritz.residual,
    converged: count === want && ritz.worst <= tolerance,
    solves: space.solves, basisSize: space.size, massiveDofs,
  };
}

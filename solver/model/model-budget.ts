/**
 * Size of the analysis model a project makes, estimated before anything is built, and the budget
 * it is checked against. Pure and cheap: O(members + nodes) plus an ordering of the graph of the
 * user's nodes only (each member condensed to one edge), never of the split model.
 *
 * Estimate (every DOF kept, see DEVELOPERS.md "Linear algebra" and solver/model/dof-map.ts):
 * - nodes = user nodes + Σ (segments − 1); elements = Σ segments; DOFs = 3 · nodes + 3 · rotating
 *   nodes, where a node rotates (6 DOFs) when a beam member ends there without a full pin
 *   ("xyz" released), lies inside a beam member (every interior node of a split beam), or its
 *   supports restrain or spring a rotation — the rule of buildModel's DOF map.
 * - factor L in 3×3 node blocks: the interior nodes of a member chain have degree 2 and are
 *   eliminated first by minimum degree, each leaving 2 off-diagonal blocks in L (its chain
 *   neighbour and the far end node), and the edge between the member's end nodes as fill; the
 *   remaining graph of user nodes is ordered by the solver's own AMD and its column counts taken
 *   (Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4). Scalar nnz(L) including
 *   the diagonal = Σ over off-diagonal blocks of d_col · d_row + Σ over nodes of d(d + 1)/2 (the
 *   lower triangle of each diagonal block), d = 3 or 6 DOFs of the node; the row node of a user
 *   graph block is taken with 6 DOFs when the column node or any of its neighbours rotates.
 * - memory (bytes): per node, per element and per factor entry, with the coefficients below
 *   (typed arrays of the model, pattern, workspace and per-case results; JS object overhead of the
 *   project itself is not counted).
 */
import type { ProjectFile } from '../project/types.ts';
import { approximateMinimumDegree } from '../linalg/amd.ts';
import { columnCounts, eliminationTree } from '../linalg/elimination-tree.ts';
import { invertPermutation, permuteGraph } from '../linalg/permutation.ts';
import { supportsTouchRotations } from './supports.ts';

export interface ModelBudget {
  /** Largest number of degrees of freedom solved. */
  maxDofs: number;
  /** Largest predicted nnz of the LDLᵀ factor (scalar entries, diagonal included). */
  maxFactorNonzeros: number;
  /** Largest predicted memory of the solve, bytes. */
  maxBytes: number;
}

/**
 * Defaults (common practice for this program, not a standard): 300,000 DOFs is about 100 times
 * the demo mast at its usual division; the factor and memory limits keep a solve well inside
 * 2 GB of address space for the worker that runs it.
 */
export const DEFAULT_MODEL_BUDGET: Readonly<ModelBudget> = Object.freeze({
  maxDofs: 300_000,
  maxFactorNonzeros: 40_000_000,
  maxBytes: 1_500_000_000,
});

/** Bytes per node: coordinates, restraints, ~10 Newton vectors, ordering arrays. */
export const BYTES_PER_NODE = 400;
/** Bytes per element: 11 property arrays, 21 pattern slots (value + index + map). */
export const BYTES_PER_ELEMENT = 450;
/** Bytes per factor entry: value (8) and row index (4). */
export const BYTES_PER_FACTOR_ENTRY = 12;
/** Bytes per node and per element and case of kept results (positions; tension + slack flag). */
export const RESULT_BYTES_PER_NODE_CASE = 24;
export const RESULT_BYTES_PER_ELEMENT_CASE = 9;

export interface SizeDriver {
  /** Index into project.members. */
  member: number;
  id: string;
  segments: number;
  /** DOFs this member adds (3 per interior node, 6 for a beam's). */
  dofs: number;
}

export interface ModelSizeEstimate {
  nodes: number;
  elements: number;
  dofs: number;
  factorNonzeros: number;
  bytes: number;
  /** Load cases plus combinations (each keeps its result arrays). */
  cases: number;
  /** Members adding the most DOFs, largest first (at most 3; none when no member is split). */
  drivers: SizeDriver[];
}

export type BudgetItem = 'dofs' | 'factorNonzeros' | 'bytes';

export type BudgetVerdict =
  | { ok: true; estimate: ModelSizeEstimate }
  | { ok: false; estimate: ModelSizeEstimate; budget: ModelBudget; exceeded: BudgetItem[] };

function segmentCount(s: number | undefined): number {
  return Number.isFinite(s) ? Math.max(1, Math.floor(s as number)) : 1;
}

/** Letters x, y and z all released: a full pin, so the beam does not use that end's rotations. */
function fullPin(text: string | undefined): boolean {
  return !!text && ['x', 'y', 'z'].every((c) => text.includes(c));
}

/** 1 for every user node that carries rotations (see the module comment). */
function rotatingUserNodes(project: ProjectFile, index: Map<string, number>): Uint8Array {
  const mark = new Uint8Array(project.nodes.length);
  for (const m of project.members) {
    if (m.kind !== 'beam') continue;
    const a = index.get(m.from), b = index.get(m.to);
    if (a !== undefined && !fullPin(m.releases?.start)) mark[a] = 1;
    if (b !== undefined && !fullPin(m.releases?.end)) mark[b] = 1;
  }
  project.nodes.forEach((node, i) => {
    try {
      if (supportsTouchRotations(node)) mark[i] = 1;
    } catch { /* a malformed `fixed` is refused by buildModel with its own message */ }
  });
  return mark;
}

/**
 * Scalar entries of the off-diagonal blocks of L for the graph of user nodes with one edge per
 * connected pair (node DOFs 3 or 6 from `rotating`).
 */
function userGraphFactorEntries(project: ProjectFile, index: Map<string, number>, rotating: Uint8Array): number {
  const n = project.nodes.length;
  const { ptr, idx } = userGraph(project, index);
  const perm = approximateMinimumDegree(n, ptr, idx);
  const pinv = invertPermutation(perm);
  const pg = permuteGraph(ptr, idx, perm, pinv);
  const parent = eliminationTree(n, pg.ptr, pg.idx);
  const counts = columnCounts(n, pg.ptr, pg.idx, parent);
  let entries = 0;
  for (let k = 0; k < n; k++) {
    const v = perm[k];
    let rowDofs = rotating[v] ? 6 : 3;
    for (let q = ptr[v]; q < ptr[v + 1] && rowDofs === 3; q++) if (rotating[idx[q]]) rowDofs = 6;
    entries += counts[k] * (rotating[v] ? 6 : 3) * rowDofs;
  }
  return entries;
}

/**
 * Adjacency of the user nodes, one edge per connected pair (both directions), each list in the
 * order the members name the pair first; typed arrays only (linear in members + nodes).
 */
function userGraph(project: ProjectFile, index: Map<string, number>): { ptr: Int32Array; idx: Int32Array } {
  const n = project.nodes.length;
  const members = project.members;
  const ends = new Int32Array(2 * members.length);
  const deg = new Int32Array(n);
  let pairs = 0;
  for (const m of members) {
    const a = index.get(m.from), b = index.get(m.to);
    if (a === undefined || b === undefined || a === b) continue;
    ends[2 * pairs] = a; ends[2 * pairs + 1] = b;
    pairs++;
    deg[a]++; deg[b]++;
  }
  const start = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) start[i + 1] = start[i] + deg[i];
  const fill = start.slice(0, n);
  const all = new Int32Array(start[n]);
  for (let k = 0; k < pairs; k++) {
    const a = ends[2 * k], b = ends[2 * k + 1];
    all[fill[a]++] = b;
    all[fill[b]++] = a;
  }
  // Drop repeated pairs, keeping each neighbour's first appearance.
  const seen = new Int32Array(n).fill(-1);
  const ptr = new Int32Array(n + 1);
  let len = 0;
  for (let v = 0; v < n; v++) {
    for (let q = start[v]; q < start[v + 1]; q++) {
      const u = all[q];
      if (seen[u] !== v) { seen[u] = v; all[len++] = u; }
    }
    ptr[v + 1] = len;
  }
  return { ptr, idx: all.slice(0, len) };
}

/** Estimate the size of the model `project` makes (see the module comment). */
export function estimateModelSize(project: ProjectFile, budget: ModelBudget = DEFAULT_MODEL_BUDGET): ModelSizeEstimate {
  const index = new Map<string, number>();
  project.nodes.forEach((node, i) => index.set(node.id, i));
  const rotating = rotatingUserNodes(project, index);
  let nodes = project.nodes.length;
  let rotatingNodes = 0;
  for (let i = 0; i < rotating.length; i++) rotatingNodes += rotating[i];
  let elements = 0;
  let chainEntries = 0;
  const split: SizeDriver[] = [];
  project.members.forEach((m, i) => {
    const s = segmentCount(m.segments);
    const d = m.kind === 'beam' ? 6 : 3;
    elements += s;
    nodes += s - 1;
    if (d === 6) rotatingNodes += s - 1;
    // Each interior node leaves 2 off-diagonal blocks (d × d) and its diagonal block.
    chainEntries += (s - 1) * (2 * d * d + (d * (d + 1)) / 2);
    if (s > 1) split.push({ member: i, id: m.id, segments: s, dofs: d * (s - 1) });
  });
  split.sort((a, b) => b.dofs - a.dofs || a.member - b.member);
  // The ordering of the user graph is skipped when the user nodes alone exceed the budget (the
  // verdict is then decided by the DOFs; the factor figure is a lower bound).
  const userEntries = 3 * project.nodes.length <= budget.maxDofs ? userGraphFactorEntries(project, index, rotating) : 9 * project.members.length;
  let userDiagonal = 0;
  for (let i = 0; i < rotating.length; i++) userDiagonal += rotating[i] ? 21 : 6;
  const factorNonzeros = chainEntries + userEntries + userDiagonal;
  const cases = project.loadCases.length + (project.combinations?.length ?? 0);
  const bytes = nodes * (BYTES_PER_NODE + RESULT_BYTES_PER_NODE_CASE * cases)
    + elements * (BYTES_PER_ELEMENT + RESULT_BYTES_PER_ELEMENT_CASE * cases)
    + BYTES_PER_FACTOR_ENTRY * factorNonzeros;
  return { nodes, elements, dofs: 3 * nodes + 3 * rotatingNodes, factorNonzeros, bytes, cases, drivers: split.slice(0, 3) };
}

/** Check a project against a budget before building its model. */
export function checkModelBudget(project: ProjectFile, budget: ModelBudget = DEFAULT_MODEL_BUDGET): BudgetVerdict {
  const estimate = estimateModelSize(project, budget);
  const exceeded: BudgetItem[] = [];
  if (estimate.dofs > budget.maxDofs) exceeded.push('dofs');
  if (estimate.factorNonzeros > budget.maxFactorNonzeros) exceeded.push('factorNonzeros');
  if (estimate.bytes > budget.maxBytes) exceeded.push('bytes');
  return exceeded.length === 0 ? { ok: true, estimate } : { ok: false, estimate, budget: { ...budget }, exceeded };
}

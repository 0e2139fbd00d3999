/**
 * Approximate minimum degree ordering on a (possibly weighted) undirected graph, written from the
 * algorithm description of P. R. Amestoy, T. A. Davis and I. S. Duff, "An approximate minimum
 * degree ordering algorithm", SIAM J. Matrix Anal. Appl. 17(4), 1996, pp. 886–905:
 *  - quotient graph: each uneliminated variable i keeps A_i (variable neighbours) and E_i
 *    (adjacent elements); each element e keeps L_e (its variables);
 *  - element absorption when a pivot is eliminated, and aggressive absorption of any element e
 *    with |L_e \ L_p| = 0;
 *  - approximate external degree  d_i = min( n_left − |i|,  d_i_old + |L_p \ i|,
 *    |A_i \ i| + |L_p \ i| + Σ_{e ∈ E_i \ p} |L_e \ L_p| ), with |L_e \ L_p| counted for all e
 *    in one pass over the variables of L_p (the paper's eq. (4) and Algorithm 2);
 *  - indistinguishable variables found by hashing (A_i, E_i) and merged into supervariables;
 *  - mass elimination of variables adjacent to the pivot element only.
 * Dense rows get no special treatment (structural models have none: a node couples to its few neighbours).
 *
 * Input: adjacency of the graph without self loops (ptr/idx, both directions), vertex weights
 * (e.g. DOFs per node; weight 1 = plain AMD). Output: perm, perm[k] = vertex eliminated k-th.
 * The ordering phase allocates freely; it runs once per sparsity pattern.
 *
 * Code shape: the state lives in one object and every step is a module-level function (no
 * closures made per call), so the optimised code of one call serves the next (the orderings call
 * this hundreds of times) and each compiled unit stays small.
 */

const VARIABLE = 0;
const ELEMENT = 1;
const DEAD = 2;

interface AmdState {
  n: number;
  /** Weight of each supervariable (0 once absorbed or eliminated). */
  nv: Int32Array;
  status: Uint8Array;
  /** A_i only ever shrinks: it lives in place in aIdx[aStart[i] .. aStart[i] + aLen[i]). */
  aIdx: Int32Array; aStart: Int32Array; aLen: Int32Array;
  /** E_i: segments of ePool, moved to the end of the pool with twice the capacity when full. */
  ePool: Int32Array; eStart: Int32Array; eLen: Int32Array; eCap: Int32Array; eTop: number;
  /** L_e: written once into lPool when e is formed. */
  lPool: Int32Array; lStart: Int32Array; lLen: Int32Array; lTop: number;
  Lsize: Int32Array;
  deg: Int32Array;
  /** Degree buckets: doubly linked lists, head[d]. */
  head: Int32Array; next: Int32Array; prev: Int32Array;
  /** Member lists of supervariables (for the output order). */
  mHead: Int32Array; mTail: Int32Array; mNext: Int32Array;
  perm: Int32Array; out: number;
  mark: Int32Array; extTag: Int32Array; ext: Int32Array; partial: Int32Array; cmp: Int32Array;
  hashOf: Int32Array; hHead: Int32Array; hNext: Int32Array;
  Lp: Int32Array;
  tag: number; nleft: number; mindeg: number;
}

export function approximateMinimumDegree(
  n: number, ptr: Int32Array, idx: Int32Array, weight?: Int32Array,
): Int32Array {
  const st = createState(n, ptr, idx, weight);
  while (st.nleft > 0) {
    while (st.head[st.mindeg] === -1) st.mindeg++;
    eliminate(st, st.head[st.mindeg]);
  }
  return st.perm;
}

function createState(n: number, ptr: Int32Array, idx: Int32Array, weight?: Int32Array): AmdState {
  const nv = weight ? Int32Array.from(weight) : new Int32Array(n).fill(1);
  let total = 0;
  for (let i = 0; i < n; i++) total += nv[i];
  const aIdx = new Int32Array(ptr[n]);
  const aStart = new Int32Array(n), aLen = new Int32Array(n);
  const deg = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    let d = 0, len = 0;
    aStart[i] = ptr[i];
    for (let q = ptr[i]; q < ptr[i + 1]; q++) {
      const j = idx[q];
      if (j !== i) { aIdx[ptr[i] + len++] = j; d += nv[j]; }
    }
    aLen[i] = len;
    deg[i] = d;
  }
  const mHead = new Int32Array(n), mTail = new Int32Array(n);
  for (let i = 0; i < n; i++) { mHead[i] = i; mTail[i] = i; }
  const st: AmdState = {
    n, nv, status: new Uint8Array(n),
    aIdx, aStart, aLen,
    ePool: new Int32Array(Math.max(16, 4 * n)), eStart: new Int32Array(n), eLen: new Int32Array(n), eCap: new Int32Array(n), eTop: 0,
    lPool: new Int32Array(Math.max(16, ptr[n])), lStart: new Int32Array(n), lLen: new Int32Array(n), lTop: 0,
    Lsize: new Int32Array(n), deg,
    head: new Int32Array(total + 1).fill(-1), next: new Int32Array(n).fill(-1), prev: new Int32Array(n).fill(-1),
    mHead, mTail, mNext: new Int32Array(n).fill(-1),
    perm: new Int32Array(n), out: 0,
    mark: new Int32Array(n), extTag: new Int32Array(n), ext: new Int32Array(n), partial: new Int32Array(n), cmp: new Int32Array(n),
    hashOf: new Int32Array(n), hHead: new Int32Array(n).fill(-1), hNext: new Int32Array(n),
    Lp: new Int32Array(n),
    tag: 0, nleft: total, mindeg: 0,
  };
  for (let i = 0; i < n; i++) insert(st, i, deg[i]);
  return st;
}

function insert(st: AmdState, i: number, d: number): void {
  const { head, next, prev } = st;
  st.deg[i] = d;
  const h = head[d];
  next[i] = h; prev[i] = -1;
  if (h !== -1) prev[h] = i;
  head[d] = i;
}

function remove(st: AmdState, i: number): void {
  const { head, next, prev } = st;
  const a = prev[i], b = next[i];
  if (a !== -1) next[a] = b; else head[st.deg[i]] = b;
  if (b !== -1) prev[b] = a;
}

function appendE(st: AmdState, i: number, e: number): void {
  const { eStart, eLen, eCap } = st;
  if (eLen[i] === eCap[i]) {
    const cap = Math.max(4, 2 * eCap[i]);
    if (st.eTop + cap > st.ePool.length) {
      const grown = new Int32Array(2 * (st.eTop + cap));
      grown.set(st.ePool.subarray(0, st.eTop));
      st.ePool = grown;
    }
    st.ePool.copyWithin(st.eTop, eStart[i], eStart[i] + eLen[i]);
    eStart[i] = st.eTop; eCap[i] = cap; st.eTop += cap;
  }
  st.ePool[eStart[i] + eLen[i]++] = e;
}

function emit(st: AmdState, i: number): void {
  const { mHead, mNext, perm } = st;
  for (let v = mHead[i]; v !== -1; v = mNext[v]) perm[st.out++] = v;
}

/** Eliminates pivot p: element formation, degree update, supervariables. */
function eliminate(st: AmdState, p: number): void {
  remove(st, p);
  st.status[p] = ELEMENT;
  const lpLen = formElement(st, p);
  emit(st, p);
  st.nleft -= st.nv[p];
  for (let t = 0; t < lpLen; t++) remove(st, st.Lp[t]);
  externalSizes(st, lpLen);
  const keepLen = pruneAndHash(st, p, lpLen);
  mergeSupervariables(st, keepLen);
  finishElement(st, p, keepLen);
}

/** L_p = (A_p ∪ ⋃_{e∈E_p} L_e) \ {p} into st.Lp (returns its length); absorbs the elements of E_p. */
function formElement(st: AmdState, p: number): number {
  const { status, mark, aIdx, aStart, aLen, eStart, eLen, ePool, lPool, lStart, lLen, Lp } = st;
  const tag = ++st.tag;
  mark[p] = tag;
  let lpLen = 0;
  for (let q = aStart[p], qe = q + aLen[p]; q < qe; q++) {
    const j = aIdx[q];
    if (status[j] === VARIABLE && mark[j] !== tag) { mark[j] = tag; Lp[lpLen++] = j; }
  }
  for (let t = eStart[p], te = t + eLen[p]; t < te; t++) {
    const e = ePool[t];
    if (status[e] !== ELEMENT) continue;
    for (let u = lStart[e], ue = u + lLen[e]; u < ue; u++) {
      const j = lPool[u];
      if (status[j] === VARIABLE && mark[j] !== tag) { mark[j] = tag; Lp[lpLen++] = j; }
    }
    status[e] = DEAD;
  }
  aLen[p] = 0; eLen[p] = 0;
  return lpLen;
}

/** |L_e \ L_p| for every element adjacent to L_p (ext, stamped by extTag). */
function externalSizes(st: AmdState, lpLen: number): void {
  const { Lp, nv, eStart, eLen, ePool, status, extTag, ext, Lsize } = st;
  const tag = st.tag;
  for (let t = 0; t < lpLen; t++) {
    const i = Lp[t], w = nv[i];
    for (let u = eStart[i], ue = u + eLen[i]; u < ue; u++) {
      const e = ePool[u];
      if (status[e] !== ELEMENT) continue;
      if (extTag[e] !== tag) { extTag[e] = tag; ext[e] = Lsize[e]; }
      ext[e] -= w;
    }
  }
}

/**
 * Prunes A_i and E_i in place, partial degrees, mass elimination, hash buckets; the variables
 * kept are compacted to the front of st.Lp (returns their number).
 */
function pruneAndHash(st: AmdState, p: number, lpLen: number): number {
  const { Lp, eStart, eLen, status, ext, aStart, aLen, aIdx, mark, nv, partial, hashOf, hNext, hHead, n } = st;
  const tag = st.tag;
  let keepLen = 0;
  for (let t = 0; t < lpLen; t++) {
    const i = Lp[t];
    let d = 0, h = p, ne = 0;
    const e0 = eStart[i];
    const ePool = st.ePool;
    for (let u = e0, ue = e0 + eLen[i]; u < ue; u++) {
      const e = ePool[u];
      if (status[e] !== ELEMENT) continue;
      const de = ext[e];
      if (de > 0) { d += de; ePool[e0 + ne++] = e; h += e; } else status[e] = DEAD; // aggressive absorption
    }
    eLen[i] = ne;
    appendE(st, i, p);
    let na = 0;
    const a0 = aStart[i];
    for (let q = a0, qe = a0 + aLen[i]; q < qe; q++) {
      const j = aIdx[q];
      if (status[j] === VARIABLE && mark[j] !== tag) { aIdx[a0 + na++] = j; d += nv[j]; h += j; }
    }
    aLen[i] = na;
    if (d === 0) {
      // Mass elimination: i is adjacent to element p only, eliminate it together with p.
      emit(st, i);
      st.nleft -= nv[i];
      nv[i] = 0;
      status[i] = DEAD;
      aLen[i] = 0; eLen[i] = 0;
      continue;
    }
    partial[i] = d; // degree outside L_p
    const b = h % n;
    hashOf[i] = b;
    hNext[i] = hHead[b];
    hHead[b] = i;
    Lp[keepLen++] = i;
  }
  return keepLen;
}

/** Supervariable detection: same hash bucket, then equal (A_i, E_i). */
function mergeSupervariables(st: AmdState, keepLen: number): void {
  const { Lp, hashOf, hHead, hNext, status, aLen, eLen, aStart, aIdx, eStart, cmp, nv, mNext, mTail, mHead, deg } = st;
  const ePool = st.ePool;
  for (let t = 0; t < keepLen; t++) {
    const b = hashOf[Lp[t]];
    let i = hHead[b];
    if (i === -1) continue; // bucket already done
    hHead[b] = -1;
    for (; i !== -1; i = hNext[i]) {
      if (status[i] !== VARIABLE) continue;
      let marked = false;
      let tag = st.tag;
      for (let j = hNext[i]; j !== -1; j = hNext[j]) {
        if (status[j] !== VARIABLE || aLen[j] !== aLen[i] || eLen[j] !== eLen[i]) continue;
        if (!marked) {
          tag = ++st.tag;
          for (let q = aStart[i], qe = q + aLen[i]; q < qe; q++) cmp[aIdx[q]] = tag;
          for (let u = eStart[i], ue = u + eLen[i]; u < ue; u++) cmp[ePool[u]] = tag;
          marked = true;
        }
        let same = true;
        for (let q = aStart[j], qe = q + aLen[j]; q < qe && same; q++) if (cmp[aIdx[q]] !== tag) same = false;
        for (let u = eStart[j], ue = u + eLen[j]; u < ue && same; u++) if (cmp[ePool[u]] !== tag) same = false;
        if (!same) continue;
        nv[i] += nv[j];
        nv[j] = 0;
        status[j] = DEAD;
        aLen[j] = 0; eLen[j] = 0;
        mNext[mTail[i]] = mHead[j];
        mTail[i] = mTail[j];
        deg[i] = Math.min(deg[i], deg[j]);
      }
    }
  }
}

/** Element p's variable list and weight; final approximate degrees of its variables. */
function finishElement(st: AmdState, p: number, keepLen: number): void {
  const { Lp, status, nv, lStart, lLen, Lsize, deg, partial } = st;
  if (st.lTop + keepLen > st.lPool.length) {
    const grown = new Int32Array(2 * (st.lTop + keepLen));
    grown.set(st.lPool.subarray(0, st.lTop));
    st.lPool = grown;
  }
  const lPool = st.lPool;
  let lTop = st.lTop;
  lStart[p] = lTop;
  let lpw = 0;
  for (let t = 0; t < keepLen; t++) {
    const i = Lp[t];
    if (status[i] === VARIABLE) { lPool[lTop++] = i; lpw += nv[i]; }
  }
  st.lTop = lTop;
  lLen[p] = lTop - lStart[p];
  Lsize[p] = lpw;
  const nleft = st.nleft;
  for (let u = lStart[p]; u < lTop; u++) {
    const i = lPool[u];
    const w = nv[i];
    let d = Math.min(deg[i], partial[i]) + lpw - w;
    d = Math.min(d, nleft - w);
    if (d < 0) d = 0;
    insert(st, i, d);
    if (d < st.mindeg) st.mindeg = d;
  }
}

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
 */

const VARIABLE = 0;
const ELEMENT = 1;
const DEAD = 2;

export function approximateMinimumDegree(
  n: number, ptr: Int32Array, idx: Int32Array, weight?: Int32Array,
): Int32Array {
  const nv = weight ? Int32Array.from(weight) : new Int32Array(n).fill(1);
  let total = 0;
  for (let i = 0; i < n; i++) total += nv[i];
  const status = new Uint8Array(n);
  // A_i only ever shrinks: it lives in place in aIdx[aStart[i] .. aStart[i] + aLen[i]).
  const aIdx = new Int32Array(ptr[n]);
  const aStart = new Int32Array(n), aLen = new Int32Array(n);
  // E_i: segments of ePool (eStart, eLen, capacity eCap), moved to the end of the pool with
  // twice the capacity when full. L_e: written once into lPool (lStart, lLen) when e is formed.
  let ePool = new Int32Array(Math.max(16, 4 * n));
  const eStart = new Int32Array(n), eLen = new Int32Array(n), eCap = new Int32Array(n);
  let eTop = 0;
  let lPool = new Int32Array(Math.max(16, ptr[n]));
  const lStart = new Int32Array(n), lLen = new Int32Array(n);
  let lTop = 0;
  const appendE = (i: number, e: number): void => {
    if (eLen[i] === eCap[i]) {
      const cap = Math.max(4, 2 * eCap[i]);
      if (eTop + cap > ePool.length) {
        const grown = new Int32Array(2 * (eTop + cap));
        grown.set(ePool.subarray(0, eTop));
        ePool = grown;
      }
      ePool.copyWithin(eTop, eStart[i], eStart[i] + eLen[i]);
      eStart[i] = eTop; eCap[i] = cap; eTop += cap;
    }
    ePool[eStart[i] + eLen[i]++] = e;
  };
  const Lsize = new Int32Array(n);
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
  // Degree buckets: doubly linked lists, head[d].
  const head = new Int32Array(total + 1).fill(-1);
  const next = new Int32Array(n).fill(-1);
  const prev = new Int32Array(n).fill(-1);
  const insert = (i: number, d: number): void => {
    deg[i] = d;
    const h = head[d];
    next[i] = h; prev[i] = -1;
    if (h !== -1) prev[h] = i;
    head[d] = i;
  };
  const remove = (i: number): void => {
    const a = prev[i], b = next[i];
    if (a !== -1) next[a] = b; else head[deg[i]] = b;
    if (b !== -1) prev[b] = a;
  };
  for (let i = 0; i < n; i++) insert(i, deg[i]);
  // Member lists of supervariables (for the output order).
  const mHead = new Int32Array(n), mTail = new Int32Array(n), mNext = new Int32Array(n).fill(-1);
  for (let i = 0; i < n; i++) { mHead[i] = i; mTail[i] = i; }
  const perm = new Int32Array(n);
  let out = 0;
  const emit = (i: number): void => { for (let v = mHead[i]; v !== -1; v = mNext[v]) perm[out++] = v; };

  const mark = new Int32Array(n);
  const extTag = new Int32Array(n);
  const ext = new Int32Array(n);
  const partial = new Int32Array(n);
  const cmp = new Int32Array(n);
  const hashOf = new Int32Array(n);
  const hHead = new Int32Array(n).fill(-1), hNext = new Int32Array(n);
  const Lp = new Int32Array(n);
  let tag = 0;
  let nleft = total;
  let mindeg = 0;

  while (nleft > 0) {
    while (head[mindeg] === -1) mindeg++;
    const p = head[mindeg];
    remove(p);
    status[p] = ELEMENT;
    // ---- form L_p = (A_p ∪ ⋃_{e∈E_p} L_e) \ {p}; absorb the elements of E_p ----
    tag++;
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
    emit(p);
    nleft -= nv[p];
    for (let t = 0; t < lpLen; t++) remove(Lp[t]);
    // ---- |L_e \ L_p| for every element adjacent to L_p ----
    for (let t = 0; t < lpLen; t++) {
      const i = Lp[t], w = nv[i];
      for (let u = eStart[i], ue = u + eLen[i]; u < ue; u++) {
        const e = ePool[u];
        if (status[e] !== ELEMENT) continue;
        if (extTag[e] !== tag) { extTag[e] = tag; ext[e] = Lsize[e]; }
        ext[e] -= w;
      }
    }
    // ---- prune A_i and E_i (in place), partial degrees, mass elimination, hash buckets ----
    let keepLen = 0;
    for (let t = 0; t < lpLen; t++) {
      const i = Lp[t];
      let d = 0, h = p, ne = 0;
      const e0 = eStart[i];
      for (let u = e0, ue = e0 + eLen[i]; u < ue; u++) {
        const e = ePool[u];
        if (status[e] !== ELEMENT) continue;
        const de = ext[e];
        if (de > 0) { d += de; ePool[e0 + ne++] = e; h += e; } else status[e] = DEAD; // aggressive absorption
      }
      eLen[i] = ne;
      appendE(i, p);
      let na = 0;
      const a0 = aStart[i];
      for (let q = a0, qe = a0 + aLen[i]; q < qe; q++) {
        const j = aIdx[q];
        if (status[j] === VARIABLE && mark[j] !== tag) { aIdx[a0 + na++] = j; d += nv[j]; h += j; }
      }
      aLen[i] = na;
      if (d === 0) {
        // Mass elimination: i is adjacent to element p only, eliminate it together with p.
        emit(i);
        nleft -= nv[i];
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
    // ---- supervariable detection: same hash bucket, then equal (A_i, E_i) ----
    for (let t = 0; t < keepLen; t++) {
      const b = hashOf[Lp[t]];
      let i = hHead[b];
      if (i === -1) continue; // bucket already done
      hHead[b] = -1;
      for (; i !== -1; i = hNext[i]) {
        if (status[i] !== VARIABLE) continue;
        let marked = false;
        for (let j = hNext[i]; j !== -1; j = hNext[j]) {
          if (status[j] !== VARIABLE || aLen[j] !== aLen[i] || eLen[j] !== eLen[i]) continue;
          if (!marked) {
            tag++;
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
    // ---- final approximate degrees, element p ----
    if (lTop + keepLen > lPool.length) {
      const grown = new Int32Array(2 * (lTop + keepLen));
      grown.set(lPool.subarray(0, lTop));
      lPool = grown;
    }
    lStart[p] = lTop;
    let lpw = 0;
    for (let t = 0; t < keepLen; t++) {
      const i = Lp[t];
      if (status[i] === VARIABLE) { lPool[lTop++] = i; lpw += nv[i]; }
    }
    lLen[p] = lTop - lStart[p];
    Lsize[p] = lpw;
    for (let u = lStart[p], ue = lTop; u < ue; u++) {
      const i = lPool[u];
      const w = nv[i];
      let d = Math.min(deg[i], partial[i]) + lpw - w;
      d = Math.min(d, nleft - w);
      if (d < 0) d = 0;
      insert(i, d);
      if (d < mindeg) mindeg = d;
    }
  }
  return perm;
}

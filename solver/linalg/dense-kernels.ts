/**
 * Dense matrix–vector kernels on column-major blocks stored inside one Float64Array (the
 * supernode storage). Plain scalar loops, unrolled by hand so V8 keeps the weights in registers;
 * no allocation.
 */

/**
 * tmp[0..len) = Σ_t w[t] · Lx[off + t·ld + (0..len)] — a dense matrix–vector product over k
 * columns of leading dimension ld, unrolled by four columns.
 */
export function accumulateColumns(
  Lx: Float64Array, off: number, ld: number, w: Float64Array, k: number, tmp: Float64Array, len: number,
): void {
  let t = 0;
  if (k >= 4) {
    {
      const w0 = w[0], w1 = w[1], w2 = w[2], w3 = w[3];
      const o0 = off, o1 = off + ld, o2 = off + 2 * ld, o3 = off + 3 * ld;
      for (let i = 0; i < len; i++) tmp[i] = Lx[o0 + i] * w0 + Lx[o1 + i] * w1 + Lx[o2 + i] * w2 + Lx[o3 + i] * w3;
    }
    t = 4;
    for (; t + 4 <= k; t += 4) {
      const w0 = w[t], w1 = w[t + 1], w2 = w[t + 2], w3 = w[t + 3];
      const o0 = off + t * ld, o1 = o0 + ld, o2 = o1 + ld, o3 = o2 + ld;
      for (let i = 0; i < len; i++) tmp[i] += Lx[o0 + i] * w0 + Lx[o1 + i] * w1 + Lx[o2 + i] * w2 + Lx[o3 + i] * w3;
    }
  } else {
    for (let i = 0; i < len; i++) tmp[i] = 0;
  }
  for (; t + 2 <= k; t += 2) {
    const w0 = w[t], w1 = w[t + 1];
    const o0 = off + t * ld, o1 = o0 + ld;
    for (let i = 0; i < len; i++) tmp[i] += Lx[o0 + i] * w0 + Lx[o1 + i] * w1;
  }
  for (; t < k; t++) {
    const w0 = w[t];
    const o0 = off + t * ld;
    for (let i = 0; i < len; i++) tmp[i] += Lx[o0 + i] * w0;
  }
}

/**
 * tmp[i] = Σ_t w[t] · Lx[off + t·ld + i] and tmp2[i] = Σ_t w2[t] · Lx[off + t·ld + i], i < len:
 * two dense matrix–vector products sharing the loads of the matrix, unrolled by two columns.
 */
export function accumulateColumnsTwice(
  Lx: Float64Array, off: number, ld: number, w: Float64Array, w2: Float64Array, k: number,
  tmp: Float64Array, tmp2: Float64Array, len: number,
): void {
  for (let i = 0; i < len; i++) { tmp[i] = 0; tmp2[i] = 0; }
  let t = 0;
  for (; t + 4 <= k; t += 4) {
    const a0 = w[t], a1 = w[t + 1], a2 = w[t + 2], a3 = w[t + 3];
    const b0 = w2[t], b1 = w2[t + 1], b2 = w2[t + 2], b3 = w2[t + 3];
    const o0 = off + t * ld, o1 = o0 + ld, o2 = o1 + ld, o3 = o2 + ld;
    for (let i = 0; i < len; i++) {
      const x0 = Lx[o0 + i], x1 = Lx[o1 + i], x2 = Lx[o2 + i], x3 = Lx[o3 + i];
      tmp[i] += x0 * a0 + x1 * a1 + x2 * a2 + x3 * a3;
      tmp2[i] += x0 * b0 + x1 * b1 + x2 * b2 + x3 * b3;
    }
  }
  for (; t + 2 <= k; t += 2) {
    const a0 = w[t], a1 = w[t + 1], b0 = w2[t], b1 = w2[t + 1];
    const o0 = off + t * ld, o1 = o0 + ld;
    for (let i = 0; i < len; i++) {
      const x0 = Lx[o0 + i], x1 = Lx[o1 + i];
      tmp[i] += x0 * a0 + x1 * a1;
      tmp2[i] += x0 * b0 + x1 * b1;
    }
  }
  if (t < k) {
    const a0 = w[t], b0 = w2[t];
    const o0 = off + t * ld;
    for (let i = 0; i < len; i++) {
      const x0 = Lx[o0 + i];
      tmp[i] += x0 * a0;
      tmp2[i] += x0 * b0;
    }
  }
}

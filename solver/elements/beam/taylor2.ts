/**
 * Second-order forward-mode automatic differentiation in 9 variables: every number carries its
 * value, gradient and (symmetric, packed) Hessian with respect to the variables x_0 … x_8, so one
 * evaluation of a function gives f, ∇f and ∇²f exactly up to round-off — no step size, no
 * truncation (truncated Taylor arithmetic; Griewank & Walther, Evaluating Derivatives, 2nd ed.,
 * SIAM 2008, ch. 13). The beam element uses it for the exact gradient and Hessian of its energy.
 *
 * Storage: one module-scope Float64Array "tape"; a number is STRIDE consecutive entries
 * [value, g_0 … g_8, h_00 h_01 … h_08 h_11 … h_88] at a handle (index into the tape). `tReset()`
 * frees every handle; nothing allocates. A 3-vector is 3 consecutive numbers (component k at
 * handle + STRIDE·k).
 */
export const NV = 9;
const NH = (NV * (NV + 1)) / 2;
export const STRIDE = 1 + NV + NH;
const CAPACITY = 1200;
export const T = new Float64Array(STRIDE * CAPACITY);
let top = 0;
/** Entries in use per number: STRIDE with Hessians, 1 + NV for gradients only. */
let len = STRIDE;

/** Packed Hessian pair (i, j ≤ … ) → entry offset, and back. */
export const PAIR_I = new Int8Array(NH);
export const PAIR_J = new Int8Array(NH);
export const PAIR_OF = new Int8Array(NV * NV);
{
  let p = 0;
  for (let i = 0; i < NV; i++) for (let j = i; j < NV; j++) { PAIR_I[p] = i; PAIR_J[p] = j; PAIR_OF[NV * i + j] = p; PAIR_OF[NV * j + i] = p; p++; }
}
const G0 = 1, H0 = 1 + NV;

/** Free every handle; `withHessian` false skips the Hessian parts (gradient-only evaluations). */
export function tReset(withHessian = true): void { top = 0; len = withHessian ? STRIDE : 1 + NV; }

function alloc(count = 1): number {
  const r = top;
  top += STRIDE * count;
  if (top > T.length) throw new Error('second-order tape overflow');
  return r;
}

export function tConst(v: number): number {
  const r = alloc();
  T.fill(0, r, r + len);
  T[r] = v;
  return r;
}

/** Variable k with value v (gradient e_k, Hessian 0). */
export function tVar(v: number, k: number): number {
  const r = tConst(v);
  T[r + G0 + k] = 1;
  return r;
}

export function add(a: number, b: number): number {
  const r = alloc();
  for (let p = 0; p < len; p++) T[r + p] = T[a + p] + T[b + p];
  return r;
}

export function sub(a: number, b: number): number {
  const r = alloc();
  for (let p = 0; p < len; p++) T[r + p] = T[a + p] - T[b + p];
  return r;
}

/** a · s for a plain number s. */
export function scale(a: number, s: number): number {
  const r = alloc();
  for (let p = 0; p < len; p++) T[r + p] = s * T[a + p];
  return r;
}

/** a + s · b for a plain number s. */
export function addScaled(a: number, b: number, s: number): number {
  const r = alloc();
  for (let p = 0; p < len; p++) T[r + p] = T[a + p] + s * T[b + p];
  return r;
}

/** Add a plain constant to the value. */
export function shift(a: number, s: number): number {
  const r = alloc();
  for (let p = 0; p < len; p++) T[r + p] = T[a + p];
  T[r] += s;
  return r;
}

export function mul(a: number, b: number): number {
  const r = alloc();
  const a0 = T[a], b0 = T[b];
  T[r] = a0 * b0;
  for (let k = 0; k < NV; k++) T[r + G0 + k] = a0 * T[b + G0 + k] + T[a + G0 + k] * b0;
  if (len === STRIDE) for (let p = 0; p < NH; p++) {
    const i = G0 + PAIR_I[p], j = G0 + PAIR_J[p];
    T[r + H0 + p] = a0 * T[b + H0 + p] + T[a + H0 + p] * b0 + T[a + i] * T[b + j] + T[a + j] * T[b + i];
  }
  return r;
}

/** f(a) for a scalar function with value f0, derivative f1 and second derivative f2 at a's value. */
export function chain(a: number, f0: number, f1: number, f2: number): number {
  const r = alloc();
  T[r] = f0;
  for (let k = 0; k < NV; k++) T[r + G0 + k] = f1 * T[a + G0 + k];
  if (len === STRIDE) for (let p = 0; p < NH; p++) {
    T[r + H0 + p] = f1 * T[a + H0 + p] + f2 * T[a + G0 + PAIR_I[p]] * T[a + G0 + PAIR_J[p]];
  }
  return r;
}

export function inv(a: number): number {
  const x = T[a];
  return chain(a, 1 / x, -1 / (x * x), 2 / (x * x * x));
}

export function sqrt(a: number): number {
  const s = Math.sqrt(T[a]);
  return chain(a, s, 0.5 / s, -0.25 / (s * T[a]));
}

/** Power series Σ c_k t^k (coefficients c) of a, through `chain`. */
export function series(a: number, c: readonly number[]): number {
  const t = T[a];
  let f0 = 0, f1 = 0, f2 = 0;
  for (let k = c.length - 1; k >= 0; k--) {
    f2 = f2 * t + 2 * f1;
    f1 = f1 * t + f0;
    f0 = f0 * t + c[k];
  }
  return chain(a, f0, f1, f2);
}

/** Gradient entry k and Hessian entry (i, j) of a number. */
export function gradientOf(a: number, k: number): number { return T[a + G0 + k]; }
export function hessianOf(a: number, i: number, j: number): number { return T[a + H0 + PAIR_OF[NV * i + j]]; }

// ---- 3-vectors (3 consecutive numbers) ----

export function vec(x: number, y: number, z: number): number {
  const r = alloc(3);
  T.copyWithin(r, x, x + len);
  T.copyWithin(r + STRIDE, y, y + len);
  T.copyWithin(r + 2 * STRIDE, z, z + len);
  return r;
}

/** Component k of vector v. */
export function at(v: number, k: number): number { return v + STRIDE * k; }

export function dot(a: number, b: number): number {
  return add(add(mul(a, b), mul(a + STRIDE, b + STRIDE)), mul(a + 2 * STRIDE, b + 2 * STRIDE));
}

export function cross(a: number, b: number): number {
  const S = STRIDE;
  return vec(
    sub(mul(a + S, b + 2 * S), mul(a + 2 * S, b + S)),
    sub(mul(a + 2 * S, b), mul(a, b + 2 * S)),
    sub(mul(a, b + S), mul(a + S, b)),
  );
}

/** v · s for a scalar number s. */
export function vscale(v: number, s: number): number {
  return vec(mul(v, s), mul(v + STRIDE, s), mul(v + 2 * STRIDE, s));
}

/** c0 · v0 + c1 · v1 for vectors with plain coefficients. */
export function combine2(v0: number, v1: number, c0: number, c1: number): number {
  const r = alloc(3);
  for (let k = 0; k < 3 * STRIDE; k += STRIDE) {
    for (let p = k; p < k + len; p++) T[r + p] = c0 * T[v0 + p] + c1 * T[v1 + p];
  }
  return r;
}

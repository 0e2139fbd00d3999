/**
 * Strain energy of the 3D two-node co-rotational beam-column, written in second-order Taylor
 * arithmetic (taylor2.ts) so that one evaluation yields Π, ∇Π and ∇²Π exactly (up to round-off).
 *
 * Variables x (9): Δ = u_b − u_a (relative displacement of the ends from the start state, m),
 * θ_a, θ_b (total rotation vectors of the end nodes, rad — the additive parametrisation of
 * Battini & Pacoste 2002, which makes the tangent symmetric and the Newton update a plain sum).
 * The current end-to-end vector is d = X + Δ (X = start vector, a constant). The chord strain uses
 * |d|² − Lr² = c0 + 2X·Δ + Δ·Δ with c0 = |X|² − Lr² computed once (0 when Lr is the modelled
 * length to round-off), so its round-off scales with Δ, not with the length: light loads on axially
 * stiff beams still converge to a relative residual of 1e-10.
 *
 * Kinematics (Battini & Pacoste, "Co-rotational beam elements with warping effects in instability
 * problems", CMAME 191 (2002) 1755–1789, §2; Crisfield 1991 vol. 1 for the 2D original):
 *   R_i = exp(θ_i) (Rodrigues: R e = cos|θ| e + (1−cos|θ|)/|θ|² θ(θ·e) + sin|θ|/|θ| θ×e),
 *   start frame E0 = [e1 e2 e3] (e1 along the element, e2 from the orientation vector),
 *   co-rotated frame: r1 = d/|d|, q = w_a R_a e2 + w_b R_b e2, r3 = r1×q/|r1×q|, r2 = r3×r1
 *   (w = 0 at an end whose rotations are all released, else 1),
 *   local end rotations θ̄_i = log(R_rᵀ R_i E0) (small: |θ̄| < π/2 is assumed).
 * Local element (Euler–Bernoulli, linear in θ̄, plus the axial terms of the truss):
 *   e   = (|d|² − Lr²)/(2Lr²) + a_y + a_z − αΔT           axial strain (Green–Lagrange chord strain
 *         plus the shallow-arch bowing term a = (2θ̄₁² − θ̄₁θ̄₂ + 2θ̄₂²)/30 per bending plane:
 *         ∫ w′²/2 dx / L of the cubic deflection — Pacoste & Eriksson 1997, CMAME 144; recalled)
 *   Π   = A Lr (S0 e + E e²/2)                               axial (S0: initial 2nd PK stress, Pa)
 *       + (2EI/Lr)(θ̄₁² + θ̄₁θ̄₂ + θ̄₂²)   per plane (about local y: θ̄_y, I_y; about z: θ̄_z, I_z)
 *       + (GJ/(2Lr))(θ̄₂ₓ − θ̄₁ₓ)²                          torsion (St Venant)
 * The bowing term gives the consistent geometric stiffness N·L/30·[4 −1; −1 4] of the cubic
 * element, so the element captures P-δ within itself, not only through chord rotation (P-Δ).
 * A released end rotation (pin) in a plane is condensed out of the linear bending energy
 * (θ̄_released = −θ̄_other/2: 1.5EI/L θ̄²; bowing θ̄²/10); a torsion release drops the torsion term.
 *
 * Why Euler–Bernoulli: mast legs, tubes, poles and struts are slender (shear deformation is a few
 * per cent of bending deflection at span/depth > 10), the 7-DOF local element keeps the
 * co-rotational energy small and free of shear locking. A lattice stick model whose bracing is
 * shear-flexible is therefore somewhat too stiff in shear: model the lattice in 3D when that matters.
 */
import {
  T, tReset, tConst, tVar, add, sub, mul, scale, addScaled, shift, inv, sqrt, series, chain, vec, at, dot, cross, vscale, combine2,
} from './taylor2.ts';

/** Release bits: end a about local x (torsion), y, z; end b the same. */
export const RELEASE_AX = 1, RELEASE_AY = 2, RELEASE_AZ = 4, RELEASE_BX = 8, RELEASE_BY = 16, RELEASE_BZ = 32;
export const RELEASE_A_ALL = 7, RELEASE_B_ALL = 56;

/** Constants of one element (plain numbers), filled by the caller. */
export interface BeamConstants {
  /** Start frame columns e1, e2, e3 (global components), 9 entries. */
  frame: Float64Array;
  /** Start vector X = X_b − X_a, m (3 entries). */
  start: Float64Array;
  Lr: number; S0: number; E: number; A: number; thermalStrain: number;
  EIy: number; EIz: number; GJ: number;
  releases: number;
}

/**
 * Local quantities of the last evaluation (plain values): [|d|, θ̄a x, y, z, θ̄b x, y, z, e].
 */
export const LOCAL = new Float64Array(8);

// Rodrigues coefficient series in t = |θ|²: sin s / s and (1 − cos s)/s², s = √t.
const SIN_OVER = [1, -1 / 6, 1 / 120, -1 / 5040, 1 / 362880, -1 / 39916800];
const ONE_MINUS_COS = [1 / 2, -1 / 24, 1 / 720, -1 / 40320, 1 / 3628800, -1 / 479001600];
// atan(√w)/√w = Σ (−1)^k w^k / (2k + 1).
const ATAN_OVER = [1, -1 / 3, 1 / 5, -1 / 7, 1 / 9, -1 / 11, 1 / 13];

/** Energy Π (J) as a taylor2 handle (value, gradient and — unless withHessian is false — Hessian) at x (9). */
export function beamEnergy(c: BeamConstants, x: Float64Array, withHessian = true): number {
  tReset(withHessian);
  const X = c.start;
  const delta = vec(tVar(x[0], 0), tVar(x[1], 1), tVar(x[2], 2));
  const d = vec(shift(at(delta, 0), X[0]), shift(at(delta, 1), X[1]), shift(at(delta, 2), X[2]));
  const ta = vec(tVar(x[3], 3), tVar(x[4], 4), tVar(x[5], 5));
  const tb = vec(tVar(x[6], 6), tVar(x[7], 7), tVar(x[8], 8));
  const f = c.frame;
  const rel = c.releases;
  const wa = (rel & RELEASE_A_ALL) === RELEASE_A_ALL ? 0 : 1;
  const wb = (rel & RELEASE_B_ALL) === RELEASE_B_ALL ? 0 : 1;

  // R_i E0 column by column.
  rotatedFrame(ta, f, COLS_A);
  rotatedFrame(tb, f, COLS_B);
  const ln = sqrt(dot(d, d));
  const r1 = vscale(d, inv(ln));
  const q = combine2(COLS_A[1], COLS_B[1], wa, wb);
  const c13 = cross(r1, q);
  const r3 = vscale(c13, inv(sqrt(dot(c13, c13))));
  const r2 = cross(r3, r1);
  FRAME[0] = r1; FRAME[1] = r2; FRAME[2] = r3;

  const tha = localRotation(COLS_A);
  const thb = localRotation(COLS_B);
  const ax = at(tha, 0), ay = at(tha, 1), az = at(tha, 2), bx = at(thb, 0), by = at(thb, 1), bz = at(thb, 2);

  const Lr = c.Lr;
  let c0 = X[0] * X[0] + X[1] * X[1] + X[2] * X[2] - Lr * Lr;
  if (Math.abs(c0) <= 1e-14 * Lr * Lr) c0 = 0;
  const stretch = add(scale(add(add(scale(at(delta, 0), X[0]), scale(at(delta, 1), X[1])), scale(at(delta, 2), X[2])), 2), dot(delta, delta));
  const chord = scale(shift(stretch, c0), 0.5 / (Lr * Lr));
  let e = shift(chord, -c.thermalStrain);
  let bend = tConst(0);
  for (let plane = 0; plane < 2; plane++) {
    const p = plane === 0 ? ay : az, qb = plane === 0 ? by : bz, EI = plane === 0 ? c.EIy : c.EIz;
    const relA = plane === 0 ? RELEASE_AY : RELEASE_AZ, relB = plane === 0 ? RELEASE_BY : RELEASE_BZ;
    const freeA = (rel & relA) === 0, freeB = (rel & relB) === 0;
    if (freeA && freeB) {
      const pp = mul(p, p), pq = mul(p, qb), qq = mul(qb, qb);
      e = add(e, scale(add(scale(add(pp, qq), 2), scale(pq, -1)), 1 / 30));
      bend = add(bend, scale(add(add(pp, pq), qq), (2 * EI) / Lr));
    } else if (freeA || freeB) {
      const s = freeA ? p : qb;
      const ss = mul(s, s);
      e = add(e, scale(ss, 0.1));
      bend = add(bend, scale(ss, (1.5 * EI) / Lr));
    }
  }
  let energy = add(bend, scale(add(scale(e, c.S0), scale(mul(e, e), 0.5 * c.E)), c.A * Lr));
  if ((rel & (RELEASE_AX | RELEASE_BX)) === 0) {
    const tw = sub(bx, ax);
    energy = add(energy, scale(mul(tw, tw), c.GJ / (2 * Lr)));
  }
  LOCAL[0] = T[ln];
  for (let k = 0; k < 3; k++) { LOCAL[1 + k] = T[at(tha, k)]; LOCAL[4 + k] = T[at(thb, k)]; }
  LOCAL[7] = T[e];
  return energy;
}

/** Handles of R_a E0 and R_b E0 columns, and of the co-rotated frame r1, r2, r3. */
const COLS_A = new Int32Array(3);
const COLS_B = new Int32Array(3);
const FRAME = new Int32Array(3);

/** out[k] = Rb(g, θ) e_k for the three start-frame columns e_k (f, 9 entries). */
function rotatedFrame(th: number, f: Float64Array, out: Int32Array): void {
  const t = dot(th, th);
  const small = T[t] < 1e-2;
  const a = small ? series(t, SIN_OVER) : sinOver(t);
  const b = small ? series(t, ONE_MINUS_COS) : oneMinusCos(t);
  const c0 = shift(scale(mul(b, t), -1), 1); // cos|θ| = 1 − b t
  for (let k = 0; k < 3; k++) out[k] = rotate(th, a, b, c0, f[3 * k], f[3 * k + 1], f[3 * k + 2]);
}

/** R e = c0 e + b θ (θ·e) + a θ×e for a plain vector e. */
function rotate(th: number, a: number, b: number, c0: number, ex: number, ey: number, ez: number): number {
  const tx = at(th, 0), ty = at(th, 1), tz = at(th, 2);
  const te = add(add(scale(tx, ex), scale(ty, ey)), scale(tz, ez));
  const bte = mul(b, te);
  const cx = addScaled(scale(ty, ez), tz, -ey);
  const cy = addScaled(scale(tz, ex), tx, -ez);
  const cz = addScaled(scale(tx, ey), ty, -ex);
  const x = add(add(scale(c0, ex), mul(bte, tx)), mul(a, cx));
  const y = add(add(scale(c0, ey), mul(bte, ty)), mul(a, cy));
  const z = add(add(scale(c0, ez), mul(bte, tz)), mul(a, cz));
  return vec(x, y, z);
}

/** θ̄ = log(R̄), R̄_mn = r_m · g_n (g = rotated start-frame columns), via skew part and trace. */
function localRotation(g: Int32Array): number {
  const vx = scale(sub(Rb(g, 2, 1), Rb(g, 1, 2)), 0.5);
  const vy = scale(sub(Rb(g, 0, 2), Rb(g, 2, 0)), 0.5);
  const vz = scale(sub(Rb(g, 1, 0), Rb(g, 0, 1)), 0.5);
  const cosine = scale(shift(add(add(Rb(g, 0, 0), Rb(g, 1, 1)), Rb(g, 2, 2)), -1), 0.5);
  const v = vec(vx, vy, vz);
  const ic = inv(cosine);
  const w = mul(dot(v, v), mul(ic, ic));
  const h = T[w] < 1e-3 ? series(w, ATAN_OVER) : atanOver(w);
  return vscale(v, mul(h, ic));
}

/** R̄_mn = r_m · g_n. */
function Rb(g: Int32Array, m: number, n: number): number {
  return dot(FRAME[m], g[n]);
}

/** sin s / s, s = √t, with its t-derivatives (t ≥ 1e-2). */
function sinOver(t: number): number {
  const x = T[t], s = Math.sqrt(x), sn = Math.sin(s), cs = Math.cos(s);
  const s3 = s * x, s5 = s3 * x;
  return chain(t, sn / s, (s * cs - sn) / (2 * s3), -sn / (4 * s3) - (3 * cs) / (4 * x * x) + (3 * sn) / (4 * s5));
}

/** (1 − cos s)/s², s = √t, with its t-derivatives (t ≥ 1e-2). */
function oneMinusCos(t: number): number {
  const x = T[t], s = Math.sqrt(x), sn = Math.sin(s), cs = Math.cos(s), omc = 1 - cs;
  const s5 = s * x * x;
  return chain(t, omc / x, sn / (2 * s * x) - omc / (x * x), cs / (4 * x * x) - (1.25 * sn) / s5 + (2 * omc) / (x * x * x));
}

/** atan(√w)/√w with its w-derivatives (w ≥ 1e-3). */
function atanOver(w: number): number {
  const x = T[w], r = Math.sqrt(x), h = Math.atan(r) / r, p = 1 / (1 + x);
  const h1 = (p - h) / (2 * x);
  return chain(w, h, h1, -(p * p + 3 * h1) / (2 * x));
}

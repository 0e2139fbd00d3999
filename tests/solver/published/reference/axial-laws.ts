/**
 * Axial force–stretch laws for a straight cable segment, written independently of the solver so
 * that tests can compare the solver against them.
 *
 * Notation: EA axial rigidity (N); Lr reference length (m); S0 stress at the reference length (Pa,
 * given here as the force A·S0, N); l current length (m); λ = l / Lr; T axial force (N, tension > 0).
 *
 * 1. Linear stretch (Hooke on the unstressed length), the law of the classical elastic cable
 *    theory: dp/ds = 1 + T/EA, i.e. λ = 1 + T/EA with Lr = L0 (Irvine, Cable Structures, 1981,
 *    ch. 2, the elastic catenary, applied here per straight segment; section recalled from
 *    memory, not read).
 *
 * 2. Total-Lagrangian truss with Green–Lagrange strain ε = (λ² − 1)/2 and second Piola–Kirchhoff
 *    stress S = S0 + E ε. The true axial force is T = A S λ (force per reference area A times the
 *    stretch), so T = A S0 λ + EA λ (λ² − 1)/2 (Crisfield, Non-linear Finite Element Analysis of
 *    Solids and Structures, vol. 1, 1991, §3.3; Bonet & Wood, Nonlinear Continuum Mechanics for
 *    Finite Element Analysis, 2nd ed., 2008, §7.4 for the S–ε pair). With S0 = 0 and Lr = L0 this
 *    differs from law 1 by T_GL / T_lin = λ (λ + 1)/2 = 1 + 1.5 ε + O(ε²) at equal stretch.
 *
 * Both laws are tension-only here (T = 0 when the formula gives T < 0), as cables are.
 */

/** A segment's material description: reference length (m), rigidity EA (N) and force A·S0 (N). */
export interface SegmentLaw {
  kind: 'linear' | 'greenLagrange';
  /** Reference length, m: the unstressed length L0 for 'linear'; Lr for 'greenLagrange'. */
  Lr: number;
  /** Axial rigidity E·A, N. */
  EA: number;
  /** A·S0, N: the stress at the reference length times the area (0 for an unstressed reference). */
  AS0?: number;
}

/** Axial force T (N) at current length l (m); zero when the cable would be in compression. */
export function axialForce(law: SegmentLaw, l: number): number {
  const lambda = l / law.Lr;
  const t = law.kind === 'linear'
    ? law.EA * (lambda - 1)
    : (law.AS0 ?? 0) * lambda + 0.5 * law.EA * lambda * (lambda * lambda - 1);
  return t > 0 ? t : 0;
}

/**
 * Current length l (m) at which the segment carries tension T > 0 (N): the inverse of axialForce.
 * For the Green–Lagrange law this is the root λ > 1/√3 of λ³ + (2 s0 − 1) λ − 2 t = 0
 * (t = T/EA, s0 = AS0/EA), found by Newton's method from the linear estimate; the cubic is
 * increasing there, so the iteration converges monotonically after the first step.
 */
export function lengthAtTension(law: SegmentLaw, T: number): number {
  const t = T / law.EA;
  if (law.kind === 'linear') return law.Lr * (1 + t);
  const s0 = (law.AS0 ?? 0) / law.EA;
  let lambda = 1 + t - s0;
  for (let i = 0; i < 60; i++) {
    const f = lambda * lambda * lambda + (2 * s0 - 1) * lambda - 2 * t;
    const df = 3 * lambda * lambda + 2 * s0 - 1;
    const step = f / df;
    lambda -= step;
    if (Math.abs(step) < 1e-15 * lambda) break;
  }
  return law.Lr * lambda;
}

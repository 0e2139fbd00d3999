/**
 * A cable with point loads between two fixed supports: the solver against the elastic funicular
 * polygon (reference/funicular-polygon.ts, written independently of the solver).
 *
 * Model (invented): span 60 m, support B 6 m above A, five segments with unstressed lengths
 * 13.0, 12.5, 12.0, 12.5, 13.2 m (sum 63.2 m against a 60.3 m chord), one element per segment,
 * EA = 160 GPa · 150 mm² = 24 MN, no self-weight, joint loads below. Tensions reach ~ 117 kN,
 * strains ε ~ 5e-3 — large for a strand, chosen so the difference between axial laws is visible.
 *
 * Checks and the differences expected:
 * 1. Same axial law in the reference as in the solver (TL truss, Green–Lagrange strain, see
 *    reference/axial-laws.ts): the two solve the same equations, point loads sit at joints and
 *    segments are straight, so there is no discretisation error. Expected agreement: the Newton
 *    tolerances (solver relative residual ≤ 1e-9, reference closure ≤ 1e-12 · span) — we allow
 *    1e-7 relative on tensions and 1e-6 m on positions.
 * 2. Classical linear stretch λ = 1 + T/EA (Irvine, Cable Structures, 1981): at equal stretch the
 *    laws differ in tension by T_GL/T_lin − 1 = 1.5 ε + O(ε²). Under given loads the geometry
 *    adjusts instead: at equal tension the stretched lengths differ by only 1.5 ε² (λ_GL = 1 + ε
 *    − 1.5 ε² + …), which the sag geometry turns into a tension difference of a few times that
 *    (≈ 2.6e-4 here, measured). We require 1.5 ε_max² < |ΔT/T| < 3 ε_max.
 * 3. Statics: the support reactions balance the applied loads (exact up to the solver residual).
 */
import { describe, expect, it } from 'vitest';
import { solveProject, type ProjectFile } from '../../../solver/index.ts';
import { solveFunicular, type FunicularProblem } from './reference/funicular-polygon.ts';
import type { SegmentLaw } from './reference/axial-laws.ts';

const E = 160e9, AREA = 1.5e-4, EA = E * AREA;
const B: [number, number] = [60, 6];
const L0 = [13.0, 12.5, 12.0, 12.5, 13.2];

/** Builds the project; joint j + 1 starts on a parabola under the chord (a plausible, wrong shape). */
function project(loads: [number, number][]): ProjectFile {
  const n = L0.length;
  const total = L0.reduce((a, b) => a + b, 0);
  let s = 0;
  const joints = [] as ProjectFile['nodes'];
  for (let j = 1; j < n; j++) {
    s += L0[j - 1];
    const t = s / total;
    joints.push({ id: `J${j}`, at: [t * B[0], 0, t * B[1] - 4 * 5 * t * (1 - t)], fixed: 'y' });
  }
  const ids = ['A', ...joints.map((j) => j.id), 'B'];
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, ...joints, { id: 'B', at: [B[0], 0, B[1]], fixed: 'xyz' }],
    sections: [{ id: 'strand', E, area: AREA }],
    members: L0.map((len, i) => ({
      id: `S${i + 1}`, kind: 'cable' as const, from: ids[i], to: ids[i + 1], section: 'strand', unstressedLength: len,
    })),
    loadCases: [{
      id: 'points', selfWeight: false,
      nodalLoads: loads.map(([fx, fz], j) => ({ node: `J${j + 1}`, force: [fx, 0, fz] as [number, number, number] })),
    }],
  };
}

function reference(kind: SegmentLaw['kind'], loads: [number, number][]) {
  const problem: FunicularProblem = {
    b: B, loads, guess: [150e3, -50e3],
    segments: L0.map((len) => ({ kind, Lr: len, EA })),
  };
  return solveFunicular(problem);
}

function solve(loads: [number, number][]) {
  const c = solveProject(project(loads)).report.cases[0];
  expect(c.converged, c.message).toBe(true);
  return c;
}

const VERTICAL: [number, number][] = [[0, -20e3], [0, -35e3], [0, -15e3], [0, -25e3]];
const WITH_SIDE_PULL: [number, number][] = [[8e3, -20e3], [0, -35e3], [-5e3, -15e3], [12e3, -25e3]];

describe('elastic funicular polygon, five segments, point loads', () => {
  for (const [label, loads] of [['vertical loads', VERTICAL], ['loads with horizontal parts', WITH_SIDE_PULL]] as const) {
    it(`${label}: solver = reference with the same Green–Lagrange law`, () => {
      const c = solve(loads);
      const ref = reference('greenLagrange', loads);
      expect(ref.closure).toBeLessThan(1e-9);
      ref.tensions.forEach((T, i) => {
        const m = c.members.find((mm) => mm.id === `S${i + 1}`)!;
        expect(Math.abs(m.tensionMax / T - 1)).toBeLessThan(1e-7);
        expect(m.slack).toBe(false);
      });
      for (let j = 1; j < L0.length; j++) {
        const p = c.nodes.find((nd) => nd.id === `J${j}`)!.position;
        expect(Math.abs(p[0] - ref.joints[j][0])).toBeLessThan(1e-6);
        expect(Math.abs(p[2] - ref.joints[j][1])).toBeLessThan(1e-6);
        expect(p[1]).toBe(0);
      }
      // The support at A pulls with −f_1 (the reaction balances the first segment's force).
      const rA = c.reactions.find((r) => r.node === 'A')!.force;
      expect(Math.abs(-rA[0] / ref.H - 1)).toBeLessThan(1e-7);
      expect(Math.abs(-rA[2] - ref.V)).toBeLessThan(1e-7 * ref.H);
    });
  }

  it('the linear-stretch law of the classical theory differs in tension by more than 1.5 ε² and less than 3 ε', () => {
    const c = solve(VERTICAL);
    const lin = reference('linear', VERTICAL);
    const epsMax = Math.max(...lin.tensions) / EA;
    expect(epsMax).toBeGreaterThan(3e-3); // the case is meant to make the difference visible
    let largest = 0;
    lin.tensions.forEach((T, i) => {
      const d = Math.abs(c.members[i].tensionMax / T - 1);
      largest = Math.max(largest, d);
      expect(d).toBeLessThan(3 * epsMax);
    });
    // Not identical either: at least the equal-tension length difference 1.5 ε² shows.
    expect(largest).toBeGreaterThan(1.5 * epsMax * epsMax);
  });

  it('support reactions balance the applied loads', () => {
    const c = solve(WITH_SIDE_PULL);
    const sum = [0, 0, 0];
    for (const r of c.reactions) for (let q = 0; q < 3; q++) sum[q] += r.force[q];
    const applied = WITH_SIDE_PULL.reduce((a, [fx, fz]) => [a[0] + fx, a[1] + fz], [0, 0]);
    expect(Math.abs(sum[0] + applied[0])).toBeLessThan(1e-6 * 95e3);
    expect(Math.abs(sum[2] + applied[1])).toBeLessThan(1e-6 * 95e3);
  });
});

describe('funicular reference checked against closed forms', () => {
  it('inextensible limit, symmetric three-segment cable: H = P / tan θ, cos θ = (span − a)/(2a)', () => {
    // Statics of a symmetric polygon with two equal loads P and three equal segments a: the middle
    // segment is horizontal, the outer ones fall at θ with 2a cos θ + a = span.
    const a = 10, span = 24, P = 10e3;
    const theta = Math.acos((span - a) / (2 * a));
    const ref = solveFunicular({
      b: [span, 0], loads: [[0, -P], [0, -P]], guess: [1e4, -1e4],
      segments: [0, 1, 2].map(() => ({ kind: 'linear' as const, Lr: a, EA: 1e15 })),
    });
    expect(Math.abs(ref.H / (P / Math.tan(theta)) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(ref.tensions[0] / (P / Math.sin(theta)) - 1)).toBeLessThan(1e-9);
  });

  it('one load on a taut level wire: T sin θ = P/2 with l = L0 (1 + T/EA)', () => {
    // Two equal segments, central load P; closed form solved here by bisection on θ.
    const L0h = 10, span = 20, P = 2e3, EAw = 5e6;
    const g = (th: number) => L0h * (1 + P / (2 * Math.sin(th) * EAw)) * Math.cos(th) - span / 2;
    let lo = 1e-6, hi = 0.5;
    for (let i = 0; i < 200; i++) { const mid = 0.5 * (lo + hi); if (g(mid) > 0) lo = mid; else hi = mid; }
    const th = 0.5 * (lo + hi);
    const ref = solveFunicular({
      b: [span, 0], loads: [[0, -P]], guess: [1e4, -1e3],
      segments: [{ kind: 'linear', Lr: L0h, EA: EAw }, { kind: 'linear', Lr: L0h, EA: EAw }],
    });
    expect(Math.abs(ref.tensions[0] / (P / (2 * Math.sin(th))) - 1)).toBeLessThan(1e-9);
  });
});

import { describe, expect, it } from 'vitest';
import type { CaseResult, ProjectFile, Vec3 } from '../../../solver/index.ts';
import { solveProject } from '../../../solver/index.ts';
import { dynamicFactorOf, stepResponsePeak } from '../../../solver/loads/member-loss.ts';

/**
 * Peak of x(t) for m x'' + c x' + k x = k (unit step, x(0) = x'(0) = 0) by RK4 with small steps —
 * the damped single-degree-of-freedom oscillator integrated numerically.
 */
function integratedPeak(zeta: number): number {
  const w = 2 * Math.PI, dt = 1e-4;
  let x = 0, v = 0, peak = 0;
  const acc = (xx: number, vv: number) => w * w * (1 - xx) - 2 * zeta * w * vv;
  for (let t = 0; t < 3; t += dt) {
    const k1x = v, k1v = acc(x, v);
    const k2x = v + 0.5 * dt * k1v, k2v = acc(x + 0.5 * dt * k1x, v + 0.5 * dt * k1v);
    const k3x = v + 0.5 * dt * k2v, k3v = acc(x + 0.5 * dt * k2x, v + 0.5 * dt * k2v);
    const k4x = v + dt * k3v, k4v = acc(x + dt * k3x, v + dt * k3v);
    x += (dt / 6) * (k1x + 2 * k2x + 2 * k3x + k4x);
    v += (dt / 6) * (k1v + 2 * k2v + 2 * k3v + k4v);
    peak = Math.max(peak, x);
  }
  return peak;
}

describe('dynamic amplification of a sudden release', () => {
  it('1 + exp(−πζ/√(1−ζ²)) is the peak of the damped step response (checked by integrating the SDOF equation)', () => {
    for (const zeta of [0, 0.02, 0.05, 0.2, 0.5]) expect(stepResponsePeak(zeta)).toBeCloseTo(integratedPeak(zeta), 6);
    expect(dynamicFactorOf({})).toBe(2);
    expect(dynamicFactorOf({ dynamicFactor: 1.5, dampingRatio: undefined })).toBe(1.5);
  });
});

/**
 * One free node N (moving along x only) held between a bar N→A (toward −x) and a cable N→B
 * (toward +x), both pretensioned to T: the bar is the spring k = EA/L of a single-degree-of-freedom
 * system. Losing the cable releases the force T.
 */
function sdof(dampingRatio: number): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [-4, 0, 0], fixed: 'xyz' }, { id: 'N', at: [0, 0, 0], fixed: 'yz' }, { id: 'B', at: [6, 0, 0], fixed: 'xyz' }],
    sections: [{ id: 's', E: 2e11, area: 1e-4 }],
    members: [
      { id: 'spring', kind: 'bar', from: 'A', to: 'N', section: 's', pretension: 10e3 },
      { id: 'guy', kind: 'cable', from: 'N', to: 'B', section: 's', pretension: 10e3 },
    ],
    loadCases: [{ id: 'dead', selfWeight: false }],
    memberLoss: [{ id: 'loss', fromCase: 'dead', members: ['guy'], dampingRatio }],
  };
}

describe('member loss: single degree of freedom against the closed form', () => {
  for (const zeta of [0, 0.05]) {
    it(`ζ = ${zeta}: the peak displacement is DAF × T/k, the bar force goes from T to (1 − DAF) T`, () => {
      const T = 10e3, E = 2e11, A = 1e-4, L = 4, daf = stepResponsePeak(zeta);
      const rep = solveProject(sdof(zeta)).report;
      const c = rep.cases.find((x) => x.id === 'loss / guy')!;
      expect(c.converged).toBe(true);
      expect(c.members.map((m) => m.id)).toEqual(['spring']);
      const N = c.members[0].tensionMax;
      expect(N).toBeCloseTo((1 - daf) * T, 6);
      // exact bar law of the element (Green–Lagrange, S = S0 + E(l² − L²)/(2L²), N = A S l/L) solved for N = (1 − DAF) T
      const force = (l: number) => A * (T / A + (E * (l * l - L * L)) / (2 * L * L)) * (l / L);
      let lo = 0.9 * L, hi = L;
      for (let i = 0; i < 200; i++) { const mid = 0.5 * (lo + hi); if (force(mid) > (1 - daf) * T) hi = mid; else lo = mid; }
      const u = c.nodes.find((n) => n.id === 'N')!.displacement[0];
      expect(u).toBeCloseTo(lo - L, 12);
      // small strain: the linear closed form of the SDOF release, peak = DAF · T / k (the bar law is
      // linear to O(strain); strain here ≤ DAF · T/EA = 1e-3)
      expect(Math.abs(-u - (daf * T) / ((E * A) / L)) / ((daf * T) / ((E * A) / L))).toBeLessThan(2e-3);
    });
  }
});

/** A bar mast pinned at its base with one level of three straight guys at 120°, all very stiff. */
function guyedMast(load: Vec3, dynamicFactor: number): ProjectFile {
  const H = 30, R = 20, P = 10e3;
  const lg = Math.hypot(H, R);
  const angles = [90, 210, 330];
  return {
    format: 'stayset-project', version: 2,
    nodes: [
      { id: 'base', at: [0, 0, 0], fixed: 'xyz' }, { id: 'top', at: [0, 0, H] },
      ...angles.map((a, i) => ({ id: `anchor ${i + 1}`, at: [R * Math.cos((a * Math.PI) / 180), R * Math.sin((a * Math.PI) / 180), 0] as Vec3, fixed: 'xyz' })),
    ],
    sections: [{ id: 'stiff', E: 2e14, area: 2e-4 }],
    members: [
      { id: 'mast', kind: 'bar', from: 'base', to: 'top', section: 'stiff', pretension: (-3 * P * H) / lg },
      ...angles.map((_, i) => ({ id: `G${i + 1}`, kind: 'cable' as const, from: 'top', to: `anchor ${i + 1}`, section: 'stiff', pretension: P })),
    ],
    loadCases: [{ id: 'wind', selfWeight: false, nodalLoads: [{ node: 'top', force: load }] }],
    memberLoss: [{ id: 'rupture', fromCase: 'wind', members: ['G1'], dynamicFactor }],
  };
}

/** Forces of three members meeting at a node that balance a load F: Σ N_k u_k + F = 0 (Cramer's rule). */
function nodeStatics(u: Vec3[], F: Vec3): Vec3 {
  const det = (a: Vec3, b: Vec3, c: Vec3) => a[0] * (b[1] * c[2] - b[2] * c[1]) - b[0] * (a[1] * c[2] - a[2] * c[1]) + c[0] * (a[1] * b[2] - a[2] * b[1]);
  const r = F.map((x) => -x) as Vec3;
  const D = det(u[0], u[1], u[2]);
  return [det(r, u[1], u[2]) / D, det(u[0], r, u[2]) / D, det(u[0], u[1], r) / D];
}

describe('member loss: a guyed mast whose remaining guys balance by statics', () => {
  const unit = (to: Vec3): Vec3 => { const d: Vec3 = [to[0], to[1], to[2] - 30]; const l = Math.hypot(...d); return d.map((x) => x / l) as Vec3; };
  const uMast = unit([0, 0, 0]);
  const u2 = unit([20 * Math.cos((210 * Math.PI) / 180), 20 * Math.sin((210 * Math.PI) / 180), 0]);
  const u3 = unit([20 * Math.cos((330 * Math.PI) / 180), 20 * Math.sin((330 * Math.PI) / 180), 0]);
  const u1 = unit([0, 20, 0]);
  const get = (r: CaseResult, id: string) => r.members.find((m) => m.id === id)!.tensionMax;

  for (const daf of [1, 2]) {
    it(`DAF ${daf}: mast and the two remaining guys carry load + (1 − DAF) × released force (three-member node statics)`, () => {
      const F: Vec3 = [0, 6e3, 0];
      const rep = solveProject(guyedMast(F, daf)).report;
      const intact = rep.cases.find((c) => c.id === 'wind')!;
      const lost = rep.cases.find((c) => c.id === 'rupture / G1')!;
      expect(lost.converged).toBe(true);
      const T1 = get(intact, 'G1');
      const load = F.map((f, q) => f + (1 - daf) * T1 * u1[q]) as Vec3;
      const [nMast, n2, n3] = nodeStatics([uMast, u2, u3], load);
      expect(n2).toBeGreaterThan(0);
      expect(n3).toBeGreaterThan(0);
      // members 1e5 times stiffer than steel: geometry changes ~1e-7, so undeformed statics hold to 1e-5
      expect(Math.abs(get(lost, 'G2') - n2) / n2).toBeLessThan(1e-5);
      expect(Math.abs(get(lost, 'G3') - n3) / n3).toBeLessThan(1e-5);
      expect(Math.abs(get(lost, 'mast') - nMast) / Math.abs(nMast)).toBeLessThan(1e-5);
      // reactions balance the applied load (statics of the whole)
      const sum = [0, 1, 2].map((q) => lost.reactions.reduce((s, r) => s + r.force[q], 0) + load[q]);
      sum.forEach((s) => expect(Math.abs(s)).toBeLessThan(1e-6 * 1e4));
      // the removed guy does not appear; its anchor (still a support) carries nothing
      expect(lost.members.some((m) => m.id === 'G1')).toBe(false);
      expect(Math.hypot(...lost.reactions.find((r) => r.node === 'anchor 1')!.force)).toBe(0);
    });
  }

  it('fields keep the full model layout: the removed guy is drawn slack with zero force', () => {
    const sol = solveProject(guyedMast([0, 6e3, 0], 2));
    const k = sol.report.cases.findIndex((c) => c.id === 'rupture / G1');
    expect(sol.fields[k].elementTension.length).toBe(sol.fields[0].elementTension.length);
    expect(sol.fields[k].elementSlack[1]).toBe(1);
    expect(sol.fields[k].elementTension[1]).toBe(0);
  });
});

/**
 * Shallow two-bar (von Mises) truss with Green–Lagrange strain: bars from (±a, 0, 0) to the apex
 * (0, 0, h), vertical load P down at the apex, apex deflection w (down). With L0² = a² + h²,
 *   ε = (w² − 2 h w) / (2 L0²),   P(w) = (EA / L0³) · w (h − w)(2h − w),
 * limit load P_lim = (EA / L0³) · 2h³ / (3√3) at w = h (1 − 1/√3).
 * Derived from the TL truss energy (e.g. Crisfield, Non-linear Finite Element Analysis of Solids
 * and Structures, vol. 1, 1991, §3.1, the shallow truss with Green strain); closed form, exact.
 */
import { describe, expect, it } from 'vitest';
import { solveProject, type ProjectFile } from '../../solver/index.ts';

const a = 10, h = 0.5, E = 200e9, A = 1e-3;
const L0 = Math.hypot(a, h);
const EA = E * A;
const P = (w: number) => (EA / L0 ** 3) * w * (h - w) * (2 * h - w);
const Plim = ((EA / L0 ** 3) * 2 * h ** 3) / (3 * Math.sqrt(3));

function truss(load: number): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [
      { id: 'L', at: [-a, 0, 0], fixed: 'xyz' }, { id: 'R', at: [a, 0, 0], fixed: 'xyz' },
      { id: 'TOP', at: [0, 0, h], fixed: 'y' },
    ],
    sections: [{ id: 'bar', E, area: A }],
    members: [
      { id: 'B1', kind: 'bar', from: 'L', to: 'TOP', section: 'bar' },
      { id: 'B2', kind: 'bar', from: 'R', to: 'TOP', section: 'bar' },
    ],
    loadCases: [{ id: 'P', selfWeight: false, nodalLoads: [{ node: 'TOP', force: [0, 0, -load] }] }],
  };
}

describe('shallow two-bar truss, Green–Lagrange strain', () => {
  it.each([0.2, 0.5, 0.8, 0.95])('follows the analytic load–deflection curve at %s × P_lim', (share) => {
    const c = solveProject(truss(share * Plim)).report.cases[0];
    expect(c.converged).toBe(true);
    const w = -c.nodes.find((n) => n.id === 'TOP')!.displacement[2];
    expect(w).toBeLessThan(h * (1 - 1 / Math.sqrt(3))); // on the stable, pre-limit branch
    expect(P(w) / (share * Plim)).toBeCloseTo(1, 8);
    // Bar force from equilibrium at the apex: 2 N (h − w)/l = −P (compression).
    const l = Math.hypot(a, h - w);
    expect(c.members[0].tensionMax).toBeCloseTo((-share * Plim * l) / (2 * (h - w)), 3);
  });

  it.each([1.05, 3])('stops at the limit load instead of snapping through (%s × P_lim)', (share) => {
    const c = solveProject(truss(share * Plim)).report.cases[0];
    expect(c.converged).toBe(false);
    expect(c.status).toBe('limitPoint');
    expect(c.message).toMatch(/limit point/);
    // The load factor reached is the limit load, within the smallest load step.
    const reached = Number(/load factor ([0-9.]+)/.exec(c.message!)![1]) * share;
    expect(reached).toBeGreaterThan(0.99);
    expect(reached).toBeLessThanOrEqual(1.0005);
  });
});

/**
 * The beam-column against closed forms (sources beside each check). Steel-like invented values;
 * the structure is solved by the full nonlinear solver (solveProject).
 */
import { describe, expect, it } from 'vitest';
import { solveProject, type CaseResult, type ProjectFile } from '../../../solver/index.ts';
import { beamProject, chainMembers, lineNodes, roundSection, E } from './beam-models.ts';

const I = 1e-6, EI = E * I;

function solve(p: ProjectFile): CaseResult {
  const r = solveProject(p).report.cases[0];
  expect(r.status).toBe('converged');
  return r;
}

describe('cantilever under an end moment rolls into a circular arc (radius EI/M; e.g. Timoshenko & Gere 1961, §1.1 elastica; Battini & Pacoste 2002 use the same test)', () => {
  it.each([[0.5], [1]])('tip rotation %s·π', (frac) => {
    const L = 10, n = 16;
    const M = (frac * Math.PI * EI) / L;
    const nodes = lineNodes([0, 0, 0], [L, 0, 0], n);
    nodes[0].fixed = 'xyzrxryrz';
    const r = solve(beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', I, 1e-2)],
      [{ id: 'm', selfWeight: false, nodalLoads: [{ node: `N${n}`, force: [0, 0, 0], moment: [0, -M, 0] }] }]));
    const R = EI / M, th = (M * L) / EI;
    const tip = r.nodes[n].position;
    expect(Math.abs(tip[0] - R * Math.sin(th)) / R).toBeLessThan(1e-4);
    expect(Math.abs(tip[2] - R * (1 - Math.cos(th))) / R).toBeLessThan(1e-4);
    // Every node on the circle through the root with its centre at (0, 0, R).
    for (const nd of r.nodes) expect(Math.abs(Math.hypot(nd.position[0], nd.position[2] - R) - R) / R).toBeLessThan(1e-4);
    // The support reacts with the opposite moment and no force.
    expect(r.reactions[0].moment![1]).toBeCloseTo(M, 3);
    expect(Math.hypot(...r.reactions[0].force)).toBeLessThan(1e-6 * M);
  });
});

/** Pinned column along z with a half-sine imperfection a0 in x, axial load P at the top. */
function imperfectColumn(n: number, a0: number, P: number): ProjectFile {
  const L = 10;
  const nodes = lineNodes([0, 0, 0], [0, 0, L], n, (t) => [a0 * Math.sin(Math.PI * t), 0, 0]);
  nodes[0].fixed = 'xyzrz';
  nodes[n].fixed = 'xy';
  // A large area: the closed form assumes an inextensible column.
  return beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', I, 1)],
    [{ id: 'P', selfWeight: false, nodalLoads: [{ node: `N${n}`, force: [0, 0, -P] }] }]);
}

describe('pinned column with an initial half-sine imperfection (Timoshenko & Gere 1961, §1.11: a = a0/(1 − P/Pcr))', () => {
  const L = 10, Pcr = (Math.PI ** 2 * EI) / L ** 2, a0 = L / 10000;
  it.each([[0.5], [0.8], [0.95]])('P = %s Pcr', (ratio) => {
    const r = solve(imperfectColumn(16, a0, ratio * Pcr));
    const mid = r.nodes[8].position[0];
    expect(mid / (a0 / (1 - ratio))).toBeCloseTo(1, 2);
  });
});

/** Simply supported beam along x, axial compression P, lateral Q at midspan; n elements. */
function beamColumn(n: number, P: number, Q: number): ProjectFile {
  const L = 8;
  const nodes = lineNodes([0, 0, 0], [L, 0, 0], n);
  nodes[0].fixed = 'xyzrx';
  nodes[n].fixed = 'yz';
  // A large area: the closed form assumes an inextensible member (with A = 1e-3 m² the shortening
  // under P moves the answer by ~1e-4 at 0.3 Pcr).
  return beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', I, 1)],
    [{ id: 'PQ', selfWeight: false, nodalLoads: [{ node: `N${n}`, force: [-P, 0, 0] }, { node: `N${n / 2}`, force: [0, 0, -Q] }] }]);
}

/** Timoshenko & Gere 1961, §1.2: δ = Q L³/(48 EI) · 3 (tan u − u)/u³, u = (L/2)·√(P/EI). */
function exactBeamColumn(P: number, Q: number, L: number): number {
  const u = (L / 2) * Math.sqrt(P / EI);
  return ((Q * L ** 3) / (48 * EI)) * (3 * (Math.tan(u) - u)) / u ** 3;
}

describe('beam-column: lateral load amplified by axial compression (Timoshenko & Gere 1961, §1.2)', () => {
  const L = 8, Pcr = (Math.PI ** 2 * EI) / L ** 2, Q = 10;
  it.each([[0.3], [0.6], [0.9]])('P = %s Pcr: exact series and ≈ 1/(1 − P/Pcr)', (ratio) => {
    const r = solve(beamColumn(16, ratio * Pcr, Q));
    const delta = -r.nodes[8].displacement[2];
    expect(delta / exactBeamColumn(ratio * Pcr, Q, L)).toBeCloseTo(1, 3);
    // The amplification factor of the textbook approximation, within 3 % (its own error).
    expect(Math.abs(delta / ((Q * L ** 3) / (48 * EI)) * (1 - ratio) - 1)).toBeLessThan(0.03);
  });

  it('converges with mesh refinement at about h⁴ (the bowing term gives the consistent geometric stiffness)', () => {
    const P = 0.9 * Pcr, exact = exactBeamColumn(P, Q, L);
    const err = [2, 4, 8].map((n) => Math.abs(-solve(beamColumn(n, P, Q)).nodes[n / 2].displacement[2] - exact) / exact);
    // Measured: 5.6e-2, 4.1e-3, 2.7e-4 — ratios of about 14 per halving (h⁴ would be 16).
    expect(err[0] / err[1]).toBeGreaterThan(10);
    expect(err[1] / err[2]).toBeGreaterThan(10);
    expect(err[2]).toBeLessThan(5e-4);
  });
});

describe('elastic supports and statics (closed forms of linear beam theory, e.g. Roark\'s Formulas for Stress and Strain, 8th ed., table 8.1)', () => {
  it('simply supported beam on two springs: δ_mid = PL³/(48EI) + P/(2k)', () => {
    const L = 6, n = 4, P = 1000, k = 2e5;
    const nodes = lineNodes([0, 0, 0], [L, 0, 0], n);
    nodes[0].fixed = 'xyrx'; nodes[0].springs = { z: k };
    nodes[n].fixed = 'y'; nodes[n].springs = { z: k };
    const r = solve(beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', I, 1e-2)],
      [{ id: 'P', selfWeight: false, nodalLoads: [{ node: 'N2', force: [0, 0, -P] }] }]));
    expect(-r.nodes[2].displacement[2] / ((P * L ** 3) / (48 * EI) + P / (2 * k))).toBeCloseTo(1, 3);
    const springForce = r.reactions.map((re) => re.force[2]).reduce((a, b) => a + b, 0);
    expect(springForce).toBeCloseTo(P, 3);
  });

  it('cantilever on a rotational spring: δ_tip = PL³/(3EI) + PL²/k_θ; base moment PL', () => {
    const L = 4, n = 4, P = 200, kr = 5e5;
    const nodes = lineNodes([0, 0, 0], [L, 0, 0], n);
    nodes[0].fixed = 'xyzrxrz'; nodes[0].springs = { ry: kr };
    const r = solve(beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', I, 1e-2)],
      [{ id: 'P', selfWeight: false, nodalLoads: [{ node: `N${n}`, force: [0, 0, -P] }] }]));
    expect(-r.nodes[n].displacement[2] / ((P * L ** 3) / (3 * EI) + (P * L ** 2) / kr)).toBeCloseTo(1, 3);
    expect(Math.abs(r.reactions[0].moment![1])).toBeCloseTo(P * L, 0);
  });

  it('fixed-base portal frame under a sway load (slope-deflection, e.g. Hibbeler, Structural Analysis, ch. 11)', () => {
    const h = 4, b = 6, H = 100, n = 4;
    const left = lineNodes([0, 0, 0], [0, 0, h], n).map((nd) => ({ ...nd, id: `L${nd.id}` }));
    const right = lineNodes([b, 0, 0], [b, 0, h], n).map((nd) => ({ ...nd, id: `R${nd.id}` }));
    const beam = lineNodes([0, 0, h], [b, 0, h], n).slice(1, n).map((nd) => ({ ...nd, id: `B${nd.id}` }));
    left[0].fixed = 'xyzrxryrz'; right[0].fixed = 'xyzrxryrz';
    const beamChain = [left[n], ...beam, right[n]];
    const members = [
      ...chainMembers(left, 's').map((m) => ({ ...m, id: `L${m.id}` })),
      ...chainMembers(right, 's').map((m) => ({ ...m, id: `R${m.id}` })),
      ...chainMembers(beamChain, 's').map((m) => ({ ...m, id: `T${m.id}` })),
    ];
    const r = solve(beamProject([...left, ...right, ...beam], members, [roundSection('s', I, 1)],
      [{ id: 'H', selfWeight: false, nodalLoads: [{ node: `LN${n}`, force: [H, 0, 0] }] }]));
    // Antisymmetric sway Δ with joint rotations θ: joint balance θ(4ic + 6ib) = 6 ic Δ/h and
    // storey shear H = (2 ic/h)(12 Δ/h − 6 θ), ic = EI/h, ib = EI/b.
    const ic = EI / h, ib = EI / b;
    const delta = H / ((2 * ic / h) * (12 / h - (6 * 6 * ic) / (h * (4 * ic + 6 * ib))));
    expect(r.nodes.find((nd) => nd.id === `LN${n}`)!.displacement[0] / delta).toBeCloseTo(1, 3);
  });

  it('settlement of the prop of a propped cantilever: prop reaction 3EIΔ/L³', () => {
    const L = 5, n = 4, settle = -0.01;
    const nodes = lineNodes([0, 0, 0], [L, 0, 0], n);
    nodes[0].fixed = 'xyzrxryrz'; nodes[n].fixed = 'yz';
    const r = solve(beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', I, 1e-2)],
      [{ id: 'S', selfWeight: false, displacements: [{ node: `N${n}`, z: settle }] }]));
    expect(r.nodes[n].displacement[2]).toBeCloseTo(settle, 12);
    expect(r.reactions[1].force[2] / ((3 * EI * -settle) / L ** 3)).toBeCloseTo(-1, 3);
  });

  it('a pin (end release) turns a fixed-fixed beam into a propped cantilever: fixed-end moment 3PL/16', () => {
    const L = 6, P = 1000;
    const nodes = lineNodes([0, 0, 0], [L, 0, 0], 2);
    nodes[0].fixed = 'xyzrxryrz'; nodes[2].fixed = 'yzrxryrz'; // free along the axis: no membrane action
    const members = chainMembers(nodes, 's');
    members[1].releases = { end: 'yz' };
    const r = solve(beamProject(nodes, members, [roundSection('s', I, 1e-2)],
      [{ id: 'P', selfWeight: false, nodalLoads: [{ node: 'N1', force: [0, 0, -P] }] }]));
    expect(Math.abs(r.reactions[0].moment![1]) / ((3 * P * L) / 16)).toBeCloseTo(1, 3);
    expect(Math.abs(r.reactions[1].moment![1])).toBeLessThan(1e-6 * P * L);
    // Horizontal member: local y = global z (default orientation), so vertical bending is about local z.
    expect(r.members[1].beam!.end.mz).toBe(0);
    expect(Math.abs(r.members[0].beam!.start.mz) / ((3 * P * L) / 16)).toBeCloseTo(1, 3);
  });
});

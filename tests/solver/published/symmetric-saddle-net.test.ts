/**
 * A pretensioned four-joint saddle net (12 cables, 3D) against its symmetry-reduced equilibrium
 * (reference/symmetric-saddle-net.ts, three unknowns, written independently of the solver).
 *
 * Model (invented): joints at (±6, ±6, 0) m; sag cables along x anchored at (±18, ±6, +3) m, hog
 * cables along y anchored at (±6, ±18, −3) m; EA = 160 GPa · 150 mm² = 24 MN; no self-weight.
 * Pretension at the modelled geometry: 60 kN in every outer segment and 60 kN · 12/√153 =
 * 58.2 kN in every middle segment — the modelled shape is then in equilibrium (at each joint the
 * outer segments' horizontal parts equal the middle ones and the vertical parts of the sag and hog
 * outer segments cancel), as a form-found net is.
 *
 * Expected agreement: the reference uses the solver's axial law (TL truss, Green–Lagrange,
 * S = S0 + E ε from the modelled length, force T = A S λ), so the only differences are the two
 * Newton tolerances: we allow 1e-7 of the largest tension on each tension and 1e-7 m on
 * displacements. Under a strong uplift the sag cables' outer segments go slack (tension-only in
 * both the solver and the reference).
 * A second variant gives each segment an unstressed length instead (S0 = 0 from L0): same check.
 */
import { describe, expect, it } from 'vitest';
import { solveProject, type ProjectFile, type Vec3 } from '../../../solver/index.ts';
import { solveSaddleNet, type SaddleNetGeometry, type SaddleNetLaws } from './reference/symmetric-saddle-net.ts';
import type { SegmentLaw } from './reference/axial-laws.ts';

const E = 160e9, AREA = 1.5e-4, EA = E * AREA;
const G: SaddleNetGeometry = { b: 6, c: 18, hs: 3, hh: 3 };
const OUTER = Math.hypot(G.c - G.b, G.hs); // √153 m
const MIDDLE = 2 * G.b;
const P_OUTER = 60e3;
const P_MIDDLE = (P_OUTER * (G.c - G.b)) / OUTER;

type Spec = { pretension: number } | { unstressedLength: number };

/** Joint id by quadrant signs. */
const J = (sx: number, sy: number) => `J${sx > 0 ? 'p' : 'm'}${sy > 0 ? 'p' : 'm'}`;

function project(outer: Spec, middle: Spec, force: Vec3): ProjectFile {
  const nodes: ProjectFile['nodes'] = [];
  const members: ProjectFile['members'] = [];
  const loads: { node: string; force: Vec3 }[] = [];
  for (const sx of [1, -1]) for (const sy of [1, -1]) {
    nodes.push({ id: J(sx, sy), at: [sx * G.b, sy * G.b, 0] });
    loads.push({ node: J(sx, sy), force: [sx * force[0], sy * force[1], force[2]] });
  }
  const cable = (id: string, from: string, to: string, spec: Spec) =>
    members.push({ id, kind: 'cable', from, to, section: 'strand', ...spec });
  for (const s of [1, -1]) {
    // sag line along x at y = s·b, hog line along y at x = s·b
    nodes.push({ id: `SA${s}+`, at: [G.c, s * G.b, G.hs], fixed: 'xyz' }, { id: `SA${s}-`, at: [-G.c, s * G.b, G.hs], fixed: 'xyz' });
    nodes.push({ id: `HA${s}+`, at: [s * G.b, G.c, -G.hh], fixed: 'xyz' }, { id: `HA${s}-`, at: [s * G.b, -G.c, -G.hh], fixed: 'xyz' });
    cable(`S${s}o+`, `SA${s}+`, J(1, s), outer);
    cable(`S${s}m`, J(1, s), J(-1, s), middle);
    cable(`S${s}o-`, J(-1, s), `SA${s}-`, outer);
    cable(`H${s}o+`, `HA${s}+`, J(s, 1), outer);
    cable(`H${s}m`, J(s, 1), J(s, -1), middle);
    cable(`H${s}o-`, J(s, -1), `HA${s}-`, outer);
  }
  return {
    format: 'stayset-project', version: 2, nodes, members,
    sections: [{ id: 'strand', E, area: AREA }],
    loadCases: [{ id: 'joints', selfWeight: false, nodalLoads: loads }],
  };
}

function laws(outer: SegmentLaw, middle: SegmentLaw): SaddleNetLaws {
  return { sagOuter: outer, sagMiddle: middle, hogOuter: outer, hogMiddle: middle };
}

function compare(p: ProjectFile, l: SaddleNetLaws, force: Vec3) {
  const c = solveProject(p).report.cases[0];
  expect(c.converged, c.message).toBe(true);
  const ref = solveSaddleNet(G, l, force);
  const tension = (id: string) => c.members.find((m) => m.id === id)!.tensionMax;
  const pairs: [string, number][] = [
    ['S1o+', ref.tensions.sagOuter], ['S1m', ref.tensions.sagMiddle],
    ['H1o+', ref.tensions.hogOuter], ['H1m', ref.tensions.hogMiddle],
    // mirror images carry the same forces
    ['S-1o-', ref.tensions.sagOuter], ['H-1m', ref.tensions.hogMiddle],
  ];
  const Tmax = Math.max(...pairs.map(([, T]) => T));
  for (const [id, T] of pairs) {
    expect(Math.abs(tension(id) - T)).toBeLessThan(1e-7 * Tmax);
    expect(c.members.find((m) => m.id === id)!.slack).toBe(T === 0);
  }
  const d = c.nodes.find((n) => n.id === J(1, 1))!.displacement;
  const dm = c.nodes.find((n) => n.id === J(-1, -1))!.displacement;
  for (let q = 0; q < 3; q++) expect(Math.abs(d[q] - ref.displacement[q])).toBeLessThan(1e-7);
  expect(Math.abs(dm[0] + ref.displacement[0])).toBeLessThan(1e-7);
  expect(Math.abs(dm[1] + ref.displacement[1])).toBeLessThan(1e-7);
  expect(Math.abs(dm[2] - ref.displacement[2])).toBeLessThan(1e-7);
  return { c, ref };
}

const pre = (T: number, Lr: number): SegmentLaw => ({ kind: 'greenLagrange', Lr, EA, AS0: T });

describe('pretensioned saddle net, 4 joints, 12 cables', () => {
  it('prestress alone: the modelled shape is in equilibrium and nothing moves', () => {
    const { ref } = compare(
      project({ pretension: P_OUTER }, { pretension: P_MIDDLE }, [0, 0, 0]),
      laws(pre(P_OUTER, OUTER), pre(P_MIDDLE, MIDDLE)), [0, 0, 0]);
    expect(Math.hypot(...ref.displacement)).toBeLessThan(1e-9);
  });

  it('30 kN down at every joint', () => {
    const { ref } = compare(
      project({ pretension: P_OUTER }, { pretension: P_MIDDLE }, [0, 0, -30e3]),
      laws(pre(P_OUTER, OUTER), pre(P_MIDDLE, MIDDLE)), [0, 0, -30e3]);
    expect(ref.displacement[2]).toBeLessThan(-0.05); // a real, nonlinear deflection
    expect(ref.tensions.sagOuter).toBeGreaterThan(P_OUTER);
    expect(ref.tensions.hogOuter).toBeLessThan(P_OUTER);
  });

  it('12 kN uplift with outward pulls at every joint', () => {
    const force: Vec3 = [4e3, 3e3, 12e3];
    const { ref } = compare(
      project({ pretension: P_OUTER }, { pretension: P_MIDDLE }, force),
      laws(pre(P_OUTER, OUTER), pre(P_MIDDLE, MIDDLE)), force);
    expect(ref.displacement[2]).toBeGreaterThan(0);
  });

  it('60 kN uplift: the sag cables\' outer segments go slack, the hog cables carry the load', () => {
    const force: Vec3 = [0, 0, 60e3];
    const { c, ref } = compare(
      project({ pretension: P_OUTER }, { pretension: P_MIDDLE }, force),
      laws(pre(P_OUTER, OUTER), pre(P_MIDDLE, MIDDLE)), force);
    expect(ref.tensions.sagOuter).toBe(0);
    expect(c.slackMembers.sort()).toEqual(['S-1o+', 'S-1o-', 'S1o+', 'S1o-']);
    // The uplift goes to the hog anchors: their reactions pull down by the total 4 × 60 kN.
    const hogDown = c.reactions.filter((r) => r.node.startsWith('HA')).reduce((a, r) => a + r.force[2], 0);
    expect(Math.abs(hogDown + 4 * 60e3)).toBeLessThan(1e-3);
  });

  it('segments given by unstressed lengths (0.3 % short of the modelled lengths), 30 kN down', () => {
    const Lo = OUTER * 0.997, Lm = MIDDLE * 0.997;
    const lin = (Lr: number): SegmentLaw => ({ kind: 'greenLagrange', Lr, EA });
    compare(project({ unstressedLength: Lo }, { unstressedLength: Lm }, [0, 0, -30e3]), laws(lin(Lo), lin(Lm)), [0, 0, -30e3]);
  });
});

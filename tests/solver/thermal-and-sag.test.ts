import { describe, expect, it } from 'vitest';
import { solveProject, STANDARD_GRAVITY, type ProjectFile } from '../../solver/index.ts';
import { singleCable, STRAND } from './helpers.ts';

const EA = STRAND.E * STRAND.area;

describe('temperature in a taut cable', () => {
  // A straight weightless cable between fixed points with pretension T0 at the modelled length:
  // ε stays 0, so S = S0 − E α ΔT and T(ΔT) = T0 − EA α ΔT, slack from ΔT = T0 / (EA α).
  // Closed form from the constitutive law (Irvine, Cable Structures, 1981, §3.6 for the thermal term).
  const T0 = 20e3;
  const alpha = STRAND.thermalExpansion;
  const dTslack = T0 / (EA * alpha);
  const project = (dT: number): ProjectFile => ({
    ...singleCable([30, 0, 0], { segments: 4, pretension: T0 }, { ...STRAND, massPerLength: 0 }),
    loadCases: [{ id: 'heat', selfWeight: false, temperatureChange: dT }],
  });

  it.each([-20, 0, 10, 0.9 * dTslack])('T = T0 − EAαΔT at ΔT = %s K', (dT) => {
    const c = solveProject(project(dT)).report.cases[0];
    expect(c.converged).toBe(true);
    expect(c.members[0].tensionMax).toBeCloseTo(T0 - EA * alpha * dT, 4);
    expect(c.members[0].slack).toBe(false);
  });

  it('goes slack beyond ΔT = T0 / (EA α) and carries nothing', () => {
    const c = solveProject(project(1.1 * dTslack)).report.cases[0];
    expect(c.converged).toBe(true);
    expect(c.members[0].slack).toBe(true);
    expect(c.members[0].tensionMax).toBe(0);
    expect(c.slackMembers).toEqual(['C']);
  });

  it('re-engages when cooled again (each case starts from the pretensioned state)', () => {
    const p = project(1.1 * dTslack);
    p.loadCases.push({ id: 'cool', selfWeight: false, temperatureChange: -10 });
    const [hot, cool] = solveProject(p).report.cases;
    expect(hot.members[0].slack).toBe(true);
    expect(cool.members[0].slack).toBe(false);
    expect(cool.members[0].tensionMax).toBeCloseTo(T0 + EA * alpha * 10, 4);
  });
});

/** Unstressed length of a member pretensioned to T at length l: l/λ with λ(λ² − 1)/2 = T/EA (Green–Lagrange). */
function unstressed(l: number, T: number): number {
  let lo = 1, hi = 2;
  for (let i = 0; i < 200; i++) { const mid = 0.5 * (lo + hi); if ((mid * (mid * mid - 1)) / 2 < T / EA) lo = mid; else hi = mid; }
  return l / (0.5 * (lo + hi));
}

describe('pretension and unstressed length round-trip', () => {
  it('a member entered by its reported cut length carries the same pretension at the modelled geometry', () => {
    const T = 60e3, l = 50;
    const weightless = { ...STRAND, massPerLength: 0 };
    const byForce = solveProject(singleCable([l, 0, 0], { pretension: T }, weightless)).report.cases[0];
    const byLength = solveProject(singleCable([l, 0, 0], { unstressedLength: unstressed(l, T) }, weightless)).report.cases[0];
    expect(byForce.members[0].tensionMax).toBeCloseTo(T, 6);
    expect(byLength.members[0].tensionMax / T).toBeCloseTo(1, 10);
  });
});

describe('parabolic sag, small-sag limit', () => {
  // Level cable, sag d = w l² / (8 H) for small sag (Irvine 1981, §1.2, the shallow parabola).
  it.each([20e3, 60e3])('matches w l²/(8H) with H the horizontal reaction (T = %s N)', (T) => {
    const l = 40;
    const c = solveProject(singleCable([l, 0, 0], { segments: 40, pretension: T })).report.cases[0];
    expect(c.converged).toBe(true);
    const H = -c.reactions.find((r) => r.node === 'A')!.force[0];
    // Load per horizontal length: weight of the unstressed length l/λ, λ(λ² − 1) = 2T/EA, over l.
    const lu = unstressed(l, T);
    const w = (STRAND.massPerLength * STANDARD_GRAVITY * lu) / l;
    // Relative error of the parabola is O((d/l)²) ≈ 1e-5 here; the lumped chain is exact at the nodes.
    expect(c.members[0].sag / ((w * l * l) / (8 * H))).toBeCloseTo(1, 4);
    // Vertical reactions carry half the weight each (symmetry).
    const Va = c.reactions.find((r) => r.node === 'A')!.force[2];
    expect(Va / ((STRAND.massPerLength * STANDARD_GRAVITY * lu) / 2)).toBeCloseTo(1, 8);
  });
});

describe('what cannot converge says why', () => {
  it('a node held by nothing is a mechanism naming the node and directions', () => {
    const p = singleCable([10, 0, 0], { pretension: 1e3 });
    p.nodes.push({ id: 'LOOSE', at: [5, 5, 5] });
    p.loadCases[0].nodalLoads = [{ node: 'LOOSE', force: [0, 0, -10] }];
    const c = solveProject(p).report.cases[0];
    expect(c.converged).toBe(false);
    expect(c.status).toBe('singular');
    expect(c.message).toMatch(/node "LOOSE" direction x/);
    expect(JSON.stringify(c)).not.toMatch(/NaN|Infinity|null/);
  });

  it('a bar pendulum free to swing out of plane is a mechanism', () => {
    const p: ProjectFile = {
      format: 'stayset-project', version: 2,
      nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [0, 0, -2] }],
      sections: [{ id: 'rod', E: 200e9, area: 1e-4 }],
      members: [{ id: 'R', kind: 'bar', from: 'A', to: 'B', section: 'rod' }],
      loadCases: [{ id: 'pull', selfWeight: false, nodalLoads: [{ node: 'B', force: [0, 0, -100] }] }],
    };
    const c = solveProject(p).report.cases[0];
    expect(c.status).toBe('singular');
    expect(c.message).toMatch(/node "B" direction [xy]/);
  });
});

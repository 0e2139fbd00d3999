/**
 * Large 3D rotations of the beam-column against an independent general FE code: CalculiX 2.20
 * (`ccx`, Debian package calculix-ccx), geometrically nonlinear (NLGEOM), quadratic beams B32R.
 * The structure is the 45° circular bend cantilever loaded out of its plane (the problem of
 * Bathe & Bolourchi 1979, Int. J. Numer. Meth. Eng. 14, used since as a co-rotational beam test;
 * its published figures are not used here, both results are computed).
 * Bend radius 100, square section 1 × 1, E = 1e7, ν = 0 (G = E/2), tip load 600 along z: tip
 * displacements of order half the radius with rotations near 60°.
 *
 * CalculiX expands a beam section into 3D solids; a solid section expanded this way twists with
 * the polar moment of area (no warping), which the first check measures on a straight cantilever
 * (J = bh(b² + h²)/12 = 1/6 for 1 × 1); the bend is then solved with that J. Its shear flexibility
 * (B32R is a Timoshenko beam) is about 0.05 % of the tip deflection here: the tolerance is 0.2 %.
 * Figures seen with CalculiX 2.20 (16 B32R elements) at P = 600: tip (−23.567, −13.604, 53.476).
 */
import { describe, expect, it } from 'vitest';
import { solveProject, type NodeSpec, type ProjectFile } from '../../../solver/index.ts';
import { runCcx, SKIP_REFERENCE_CODES } from '../reference/calculix/run-ccx.ts';

const R = 100, E = 1e7, G = E / 2, P = 600;
const ARC = Math.PI / 4;

function arcPoint(t: number): [number, number, number] {
  return [R * Math.sin(ARC * t), R - R * Math.cos(ARC * t), 0];
}

/** The CalculiX deck: 16 quadratic beams (33 nodes), load in 20 equal increments. */
function bendDeck(): string {
  const ne = 16, nn = 2 * ne + 1;
  const nodes = Array.from({ length: nn }, (_, k) => `${k + 1}, ${arcPoint(k / (nn - 1)).map((v) => v.toPrecision(15)).join(', ')}`);
  const elements = Array.from({ length: ne }, (_, e) => `${e + 1}, ${2 * e + 1}, ${2 * e + 2}, ${2 * e + 3}`);
  return ['*NODE, NSET=Nall', ...nodes, '*ELEMENT, TYPE=B32R, ELSET=EB', ...elements,
    '*MATERIAL, NAME=M', '*ELASTIC', `${E}, 0.0`,
    '*BEAM SECTION, ELSET=EB, MATERIAL=M, SECTION=RECT', '1.0, 1.0', '0., 0., 1.',
    '*BOUNDARY', '1, 1, 6, 0.',
    '*STEP, NLGEOM, INC=1000', '*STATIC, DIRECT', '0.05, 1.0',
    '*CLOAD', `${nn}, 3, ${P}`, '*NODE PRINT, NSET=Nall', 'U', '*END STEP', ''].join('\n');
}

/** Straight cantilever of length 40 with a rigid arm of 1 at its tip, unit load at the arm's end. */
function torsionDeck(): string {
  const ne = 8, nn = 2 * ne + 1, L = 40;
  const nodes = Array.from({ length: nn }, (_, k) => `${k + 1}, ${(L * k) / (nn - 1)}, 0, 0`);
  return ['*NODE, NSET=Nall', ...nodes, `100, ${L}, 0.5, 0`, `101, ${L}, 1.0, 0`,
    '*ELEMENT, TYPE=B32R, ELSET=EB', ...Array.from({ length: ne }, (_, e) => `${e + 1}, ${2 * e + 1}, ${2 * e + 2}, ${2 * e + 3}`),
    '*ELEMENT, TYPE=B32R, ELSET=ARM', `50, ${nn}, 100, 101`,
    '*MATERIAL, NAME=M', '*ELASTIC', `${E}, 0.0`, '*MATERIAL, NAME=RIGID', '*ELASTIC', '1.0E14, 0.0',
    '*BEAM SECTION, ELSET=EB, MATERIAL=M, SECTION=RECT', '1.0, 1.0', '0., 0., 1.',
    '*BEAM SECTION, ELSET=ARM, MATERIAL=RIGID, SECTION=RECT', '1.0, 1.0', '0., 0., 1.',
    '*BOUNDARY', '1, 1, 6, 0.', '*STEP', '*STATIC', '*CLOAD', '101, 3, 1.', '*NODE PRINT, NSET=Nall', 'U', '*END STEP', ''].join('\n');
}

function stayset(load: number, J: number, n = 32): [number, number, number] {
  const nodes: NodeSpec[] = Array.from({ length: n + 1 }, (_, k) => ({ id: `N${k}`, at: arcPoint(k / n) }));
  nodes[0].fixed = 'xyzrxryrz';
  const p: ProjectFile = {
    format: 'stayset-project', version: 2, nodes,
    sections: [{ id: 's', E, G, area: 1, Iy: 1 / 12, Iz: 1 / 12, J }],
    members: nodes.slice(1).map((nd, k) => ({ id: `B${k}`, kind: 'beam', from: nodes[k].id, to: nd.id, section: 's', orientation: [0, 0, 1] })),
    loadCases: [{ id: 'P', selfWeight: false, nodalLoads: [{ node: `N${n}`, force: [0, 0, load] }] }],
  };
  const r = solveProject(p).report.cases[0];
  expect(r.status).toBe('converged');
  return r.nodes[n].displacement as [number, number, number];
}

describe.skipIf(SKIP_REFERENCE_CODES)('45° bend cantilever against CalculiX (large 3D rotations)', () => {
  it('the expanded 1 × 1 section twists with the polar moment J = 1/6 in CalculiX', () => {
    const h = runCcx(torsionDeck(), 101), tip = runCcx(torsionDeck(), 17);
    const twist = h[0].u[2] - tip[0].u[2]; // arm of length 1: z offset of its end over the tip
    expect((40 / (G * twist)) / (1 / 6)).toBeCloseTo(1, 3);
  });

  it('tip displacements along the load path agree within 0.2 %', () => {
    const history = runCcx(bendDeck(), 33);
    const check = (t: number) => {
      const ref = history.find((h) => Math.abs(h.time - t) < 1e-9)!.u;
      const ours = stayset(t * P, 1 / 6);
      const size = Math.hypot(...ref);
      for (let k = 0; k < 3; k++) expect(Math.abs(ours[k] - ref[k]) / size).toBeLessThan(2e-3);
    };
    check(0.25);
    check(0.5);
    check(1);
  });
});

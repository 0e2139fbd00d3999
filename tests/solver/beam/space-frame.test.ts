/**
 * The beam-column in space: bending about both axes coupled with torsion. Checked against the
 * unit-load (virtual work) method of linear beam theory, e.g. Hibbeler, Structural Analysis,
 * ch. 9, "method of virtual work: beams and frames", applied to a bent cantilever. Invented values.
 */
import { describe, expect, it } from 'vitest';
import { solveProject, type CaseResult, type NodeSpec, type ProjectFile } from '../../../solver/index.ts';
import { beamProject, chainMembers, E, G } from './beam-models.ts';

function solve(p: ProjectFile): CaseResult {
  const r = solveProject(p).report.cases[0];
  expect(r.status).toBe('converged');
  return r;
}

/**
 * An L-shaped cantilever: arm a from the fixed base along +x, then arm b along +y, a load P in −z
 * at the free tip. Unit-load method (bending about the horizontal axis and torsion of arm a):
 *   δ_z = P b³/(3 E I) + P a³/(3 E I) + P b² a/(G J)
 * the last term the twist of arm a (torque P b over length a) swinging arm b through b.
 */
function bentCantilever(a: number, b: number, n: number): ProjectFile {
  const nodes: NodeSpec[] = [];
  for (let k = 0; k <= n; k++) nodes.push({ id: `N${k}`, at: [(a * k) / n, 0, 0] });
  for (let k = 1; k <= n; k++) nodes.push({ id: `N${n + k}`, at: [a, (b * k) / n, 0] });
  nodes[0].fixed = 'xyzrxryrz';
  return beamProject(nodes, chainMembers(nodes, 's'), [{ id: 's', E, G, area: 4e-3, Iy: I, Iz: I, J }],
    [{ id: 'P', selfWeight: false, nodalLoads: [{ node: `N${2 * n}`, force: [0, 0, -P] }] }]);
}
const I = 2e-6, J = 1.3e-6, P = 50;

describe('bent cantilever: bending coupled with torsion (unit-load method)', () => {
  it('tip deflection P b³/3EI + P a³/3EI + P b² a/GJ at a small load', () => {
    const a = 3, b = 2, n = 6;
    const r = solve(bentCantilever(a, b, n));
    const expected = (P * b ** 3) / (3 * E * I) + (P * a ** 3) / (3 * E * I) + (P * b * b * a) / (G * J);
    expect(-r.nodes[2 * n].displacement[2] / expected).toBeCloseTo(1, 4);
  });

  it('base reactions balance the tip load about the displaced tip (statics in the deformed state)', () => {
    const a = 3, b = 2, n = 4;
    const r = solve(bentCantilever(a, b, n));
    const base = r.reactions.find((re) => re.node === 'N0')!;
    expect(base.force[2]).toBeCloseTo(P, 6);
    // Equilibrium in the deformed configuration: the support moment balances r × F of the tip load
    // about the base, r = (a + u_x, b + u_y, u_z) the displaced tip, F = (0, 0, −P):
    // r × F = (−P r_y, P r_x, 0); the support supplies the opposite.
    const u = r.nodes[2 * n].displacement;
    expect(base.moment![0]).toBeCloseTo(P * (b + u[1]), 6);
    expect(base.moment![1]).toBeCloseTo(-P * (a + u[0]), 6);
    expect(Math.abs(base.moment![2])).toBeLessThan(1e-6);
  });
});

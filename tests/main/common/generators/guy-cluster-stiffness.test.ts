import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../../solver/index.ts';
import { solveProject } from '../../../../solver/index.ts';
import { generateGuyedMast } from '../../../../main/common/generators/guyed-mast.ts';
import { applyGenerated } from '../../../../main/common/generators/apply-generated.ts';

/**
 * Lateral stiffness of one guy level against the classical guy-cluster result.
 *
 * Derivation: a straight pretensioned bar/cable of length L, unit vector e, axial stiffness EA/L
 * and tension T has the tangent stiffness k = (EA/L) e eᵀ + (T/L)(I − e eᵀ) (the standard
 * material + geometric stiffness of a truss element; the geometric term is the taut-string limit of
 * Irvine, Cable Structures (1981), ch. 2, for negligible sag). For guy j at inclination θ to the
 * horizontal and plan angle ψ_j, e_x = cos θ cos ψ_j; summing over n ≥ 3 guys equally spaced in plan
 * with Σ cos² ψ_j = n/2:
 *   k_x = Σ (EA/L) e_x² + (T/L)(1 − e_x²) = (n/2)[(EA/L) cos²θ + (T/L)(1 + sin²θ)].
 * The mast is a pinned bar of height h with axial force N (< 0 in compression), adding N/h
 * (the same element tangent, the P-Δ term). Guys have no self-weight and high pretension, so sag
 * effects vanish. Tolerance 0.4 %: the Total Lagrangian axial tangent is (EA + T)/L rather than
 * EA/L (a T/EA = 0.2 % difference on the material term) plus the finite probe load. Dropping either
 * pretension term (T/L or N/h) moves k by 3–6 %, so the check can fail.
 */
function singleLevel(n: 3 | 4, azimuth0: number): { project: ProjectFile; expected: number; top: string } {
  const h = 30, R = 10, EA = 1.6e11 * 1.5e-4, T = 48e3; // steep guys, T/EA = 2e-3: the pretension terms are ≈ 3 % and 6 % of k
  const params = {
    height: h, guyLevels: [h], guysPerLevel: n, anchorRadius: R, anchorOrientation: azimuth0,
    mastModel: 'singleBar' as const, faceWidth: 0.5,
    leg: { E: 2.1e11, area: 2e-3 },
    guy: { E: 1.6e11, area: 1.5e-4, breakingLoad: 200e3 }, guySegments: 10, pretension: T,
  };
  const parts = generateGuyedMast('m', params);
  const base: ProjectFile = { format: 'stayset-project', version: 2, nodes: [], sections: [], members: [], loadCases: [] };
  const project = applyGenerated(base, { id: 'm', kind: 'guyedMast', params }, parts).project;
  const L = Math.hypot(h, R), sinT = h / L, cosT = R / L;
  const N = -n * T * sinT; // mast compression that balances the guys at the modelled geometry
  project.members.find((m) => m.id === 'm/mast 1')!.pretension = N;
  const kGuys = (n / 2) * ((EA / L) * cosT ** 2 + (T / L) * (1 + sinT ** 2));
  return { project, expected: kGuys + N / h, top: parts.keyNodes.top };
}

describe('generated guy level: lateral stiffness', () => {
  for (const [n, az, dir] of [[3, 0, 0], [3, 0, 90], [4, 15, 0], [3, 30, 45]] as const) {
    it(`${n} guys, first at ${az}°, load toward ${dir}°`, () => {
      const { project, expected, top } = singleLevel(n, az);
      const P = 50;
      const a = (dir * Math.PI) / 180;
      project.loadCases = [
        { id: 'none', selfWeight: false },
        { id: 'push', selfWeight: false, nodalLoads: [{ node: top, force: [P * Math.cos(a), P * Math.sin(a), 0] }] },
      ];
      const sol = solveProject(project);
      expect(sol.report.cases.every((c) => c.converged)).toBe(true);
      const u0 = sol.report.cases[0].nodes.find((x) => x.id === top)!.displacement;
      const u1 = sol.report.cases[1].nodes.find((x) => x.id === top)!.displacement;
      expect(Math.hypot(...u0)).toBeLessThan(1e-6); // the modelled state is in equilibrium
      const along = (u1[0] - u0[0]) * Math.cos(a) + (u1[1] - u0[1]) * Math.sin(a);
      const k = P / along;
      expect(Math.abs(k - expected) / expected).toBeLessThan(4e-3);
    });
  }
});

import { describe, expect, it } from 'vitest';
import { solveModes } from '../../../solver/index.ts';
import type { ModeResult, NodeSpec, ProjectFile } from '../../../solver/index.ts';

/**
 * Euler–Bernoulli beam frequencies (closed forms, e.g. Blevins, Formulas for Natural Frequency
 * and Mode Shape, 1979, ch. 8 — recalled, check against the source; Timoshenko, Young & Weaver,
 * Vibration Problems in Engineering, ch. 5, for the axially loaded beam):
 *   simply supported:  ω_n = (nπ/L)² √(EI/μ)
 *   cantilever:        ω_1 = (1.87510407/L)² √(EI/μ), β₁L the first root of cos βL cosh βL = −1
 *   simply supported under axial compression P:  ω_1² = ω_0² (1 − P/P_cr), P_cr = π² EI/L²,
 *   so the frequency falls to zero at the Euler load.
 * The beams are slender (L/r = 400: shear and rotary inertia change ω by ~1e-5) and split into
 * 40 elements with lumped mass (error O(h²): measured 8e-5·n² simply supported, 3e-4 cantilever).
 */
const E = 210e9, G = 81e9, L = 10, I = 2e-7, A = 5e-3, MU = 40;
const EI = E * I;
const N = 40;

function beam(support: (nodes: NodeSpec[]) => void, axial = 0): ProjectFile {
  const nodes: NodeSpec[] = Array.from({ length: N + 1 }, (_, k) => ({ id: `N${k}`, at: [(k * L) / N, 0, 0] }));
  support(nodes);
  return {
    format: 'stayset-project', version: 1, nodes,
    sections: [{ id: 's', E, G, area: A, Iy: I, Iz: I, J: 2 * I, massPerLength: MU }],
    members: nodes.slice(1).map((nd, k) => ({ id: `B${k}`, kind: 'beam', from: nodes[k].id, to: nd.id, section: 's', orientation: [0, 0, 1] })),
    loadCases: [{ id: 'c', selfWeight: false, nodalLoads: axial ? [{ node: `N${N}`, force: [-axial, 0, 0] }] : [] }],
  };
}

const pinned = (nodes: NodeSpec[]) => { nodes[0].fixed = 'xyzrx'; nodes[N].fixed = 'yz'; };
const clamped = (nodes: NodeSpec[]) => { nodes[0].fixed = 'xyzrxryrz'; };

/** Distinct angular frequencies of the non-axial modes, and how many modes share each. */
function bending(modes: ModeResult[]): { omega: number; count: number }[] {
  const out: { omega: number; count: number }[] = [];
  for (const m of modes) {
    if (m.effectiveMassShare[0] > 0.5) continue; // axial
    const last = out[out.length - 1];
    if (last && Math.abs(m.angularFrequency / last.omega - 1) <= 1e-6) last.count++;
    else out.push({ omega: m.angularFrequency, count: 1 });
  }
  return out;
}

function omegas(p: ProjectFile, count = 8): { omega: number; count: number }[] {
  const { caseResult, modal } = solveModes(p, 'c', { count });
  expect(caseResult?.converged).toBe(true);
  if (!modal.ok) throw new Error(modal.refusal.code);
  return bending(modal.analysis.modes);
}

describe('beam frequencies (Euler–Bernoulli closed forms)', () => {
  it('simply supported: ω_n = (nπ/L)² √(EI/μ), n = 1, 2, 3, each a pair (two bending planes)', () => {
    const w = omegas(beam(pinned));
    for (let n = 1; n <= 3; n++) {
      const exact = ((n * Math.PI) / L) ** 2 * Math.sqrt(EI / MU);
      expect(Math.abs(w[n - 1].omega / exact - 1)).toBeLessThan(2e-4 * n * n);
      expect(w[n - 1].count).toBe(2);
    }
  });

  it('cantilever: ω_1 = (1.8751/L)² √(EI/μ)', () => {
    const w = omegas(beam(clamped), 4);
    expect(Math.abs(w[0].omega / ((1.87510407 / L) ** 2 * Math.sqrt(EI / MU)) - 1)).toBeLessThan(1e-3);
  });

  it('axially loaded: ω² = ω0² (1 − P/P_cr), falling toward zero at the Euler load', () => {
    const Pcr = (Math.PI ** 2 * EI) / L ** 2;
    const w0 = omegas(beam(pinned), 2)[0].omega;
    for (const ratio of [0.5, 0.9, 0.98]) {
      const w = omegas(beam(pinned, ratio * Pcr), 2)[0].omega;
      // (ω/ω0)²: the discretisation errors of ω0 and of P_cr largely cancel (measured 4e-6).
      expect(Math.abs((w / w0) ** 2 - (1 - ratio))).toBeLessThan(2e-5);
    }
  });
});

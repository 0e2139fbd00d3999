import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { solveModes, stressFreeLength } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

const EA = 200e9 * 1e-4;

/**
 * Node B on a massless bar from pinned A along x (B held in y and z), plus a one-element cable from
 * B to a pinned C: one axial DOF, the closed form of the undamped oscillator f = √(k/m) / 2π.
 */
function oscillator(cable: Partial<ProjectFile['members'][number]>): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [
      { id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [2, 0, 0], fixed: 'yz', mass: 30 },
      { id: 'C', at: [6, 0, 0], fixed: 'xyz' },
    ],
    sections: [{ id: 'rod', E: 200e9, area: 1e-4 }, { id: 'rope', E: 100e9, area: 1e-4, massPerLength: 5 }],
    members: [
      { id: 'R', kind: 'bar', from: 'A', to: 'B', section: 'rod' },
      { id: 'S', kind: 'cable', from: 'B', to: 'C', section: 'rope', ...cable },
    ],
    loadCases: [{ id: 'rest', selfWeight: false }],
  };
}

describe('modes about a solved case', () => {
  it('a slack cable adds its mass (half to each end) and no stiffness, and the result says so', () => {
    const { modal } = solveModes(oscillator({ unstressedLength: 4.5 }), 'rest', { count: 1 });
    if (!modal.ok) throw new Error(modal.refusal.code);
    // k = EA/L of the bar alone; m = node mass + half the cable mass (5 kg/m × 4.5 m / 2).
    const k = EA / 2, m = 30 + (5 * 4.5) / 2;
    expect(modal.analysis.modes[0].frequency / (Math.sqrt(k / m) / (2 * Math.PI))).toBeCloseTo(1, 10);
    expect(modal.analysis.notes).toContainEqual({ code: 'slackMembersMassOnly', members: ['S'] });
  });

  it('a taut cable adds its axial stiffness at the solved state and half its mass', () => {
    const P = 1e3;
    const { caseResult, modal } = solveModes(oscillator({ pretension: P }), 'rest', { count: 3 });
    if (!modal.ok || !caseResult) throw new Error('not solved');
    expect(modal.analysis.notes).toEqual([{ code: 'fewerModesThanRequested', requested: 3, available: 1 }]);
    // Axial stiffness of a TL truss at length l (reference Lr, force N): E A l² / Lr³ + N / l
    // (the 3×3 block of truss-tl.ts along the bar; Crisfield 1991, vol. 1, ch. 3).
    const dx = caseResult.nodes.find((n) => n.id === 'B')!.displacement[0];
    const [bar, rope] = caseResult.members;
    const lb = 2 + dx, lc = 4 - dx;
    const k = (EA * lb * lb) / 8 + bar.tensionMax / lb + (100e9 * 1e-4 * lc * lc) / 64 + rope.tensionMax / lc;
    const m = 30 + (5 * stressFreeLength(4, P / 1e-4, 100e9)) / 2;
    expect(modal.analysis.modes[0].frequency / (Math.sqrt(k / m) / (2 * Math.PI))).toBeCloseTo(1, 10);
    // Near the closed form of the unloaded state, k ≈ EA/2 + (E A + P)/4.
    expect(k / (EA / 2 + (100e9 * 1e-4 + P) / 4)).toBeCloseTo(1, 3);
  });

  it('refuses a case that did not converge, and an unknown case', () => {
    const p = oscillator({ pretension: 1e3 });
    p.nodes.push({ id: 'LOOSE', at: [1, 1, 1] });
    p.loadCases[0].nodalLoads = [{ node: 'LOOSE', force: [0, 0, -10] }];
    const r = solveModes(p, 'rest');
    expect(r.caseResult?.converged).toBe(false);
    expect(r.modal).toEqual({ ok: false, refusal: { code: 'caseNotConverged', case: 'rest', status: 'singular' } });
    expect(solveModes(p, 'storm').modal).toEqual({ ok: false, refusal: { code: 'unknownCase', case: 'storm' } });
  });

  it('the demo mast: frequencies ascend, pairs by symmetry, shares within [0, 1], combinations accepted', () => {
    const mast = JSON.parse(readFileSync(fileURLToPath(new URL('../../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;
    mast.combinations = [{ id: 'dead + cold', factors: [{ case: 'dead', factor: 1 }, { case: 'cold', factor: 1 }] }];
    delete mast.ancillaries; // its point items sit on one leg and would break the 120° symmetry
    const { modal } = solveModes(mast, 'dead + cold', { count: 12 });
    if (!modal.ok) throw new Error(modal.refusal.code);
    const f = modal.analysis.modes.map((m) => m.frequency);
    for (let k = 1; k < f.length; k++) expect(f[k]).toBeGreaterThanOrEqual(f[k - 1] * (1 - 1e-12));
    // The mast and its guys are symmetric under a 120° rotation: modes that sway come in pairs.
    const paired = f.filter((x, k) => f.some((y, j) => j !== k && Math.abs(y - x) <= 1e-6 * x));
    expect(paired.length).toBeGreaterThanOrEqual(4);
    for (const m of modal.analysis.modes) {
      for (let q = 0; q < 3; q++) {
        expect(m.cumulativeShare[q]).toBeGreaterThanOrEqual(0);
        expect(m.cumulativeShare[q]).toBeLessThanOrEqual(1 + 1e-12);
      }
      expect(m.residual).toBeLessThan(1e-9);
    }
  });
});

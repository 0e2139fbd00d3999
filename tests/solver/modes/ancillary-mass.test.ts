import { describe, expect, it } from 'vitest';
import { solveModes } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

/**
 * Ancillaries vibrate with the structure: their mass (and the case's ice on them) is in the modal
 * mass. Checked against closed forms of a single degree of freedom:
 * - spring–mass: a massless bar of axial stiffness k = EA/L carrying a mass M at its free end,
 *   ω² = k / M (any structural-dynamics text, e.g. Chopra, Dynamics of Structures, ch. 1);
 * - massless cantilever with a tip mass: tip stiffness k = 3EI/L³ (Euler–Bernoulli statics),
 *   ω² = 3EI / (M L³) — exact for a massless beam (Rayleigh's quotient with the static deflected
 *   shape gives the same value).
 */
const E = 210e9, A = 4e-4, L = 5, M = 120;

function spring(ancillary: Partial<NonNullable<ProjectFile['ancillaries']>[number]>, ice?: number): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 3], fixed: 'xyz' }, { id: 'B', at: [L, 0, 3], fixed: 'yz' }],
    sections: [{ id: 's', E, area: A }],
    members: [{ id: 'bar', kind: 'bar', from: 'A', to: 'B', section: 's' }],
    loadCases: [{ id: 'c', selfWeight: false, ...(ice ? { ice: { thickness: ice } } : {}) }],
    ancillaries: [{ id: 'box', kind: 'antenna', node: 'B', dragArea: 0.5, mass: M, ...ancillary }],
  };
}

const firstOmega = (p: ProjectFile): number => {
  const { modal } = solveModes(p, 'c', { count: 1 });
  if (!modal.ok) throw new Error(modal.refusal.code);
  return modal.analysis.modes[0].angularFrequency;
};

describe('ancillaries in the modal mass (closed forms)', () => {
  it('spring–mass: ω = √(EA / (L M)) with the ancillary as the mass', () => {
    expect(firstOmega(spring({}))).toBeCloseTo(Math.sqrt((E * A) / (L * M)), 6);
  });

  it('iced: the ancillary ice mass iceMass · t joins M (ω² = k / (M + iceMass · t))', () => {
    const w = firstOmega(spring({ iceMass: 2000 }, 0.02));
    expect(w).toBeCloseTo(Math.sqrt((E * A) / (L * (M + 2000 * 0.02))), 6);
  });

  it('combination: ancillary mass once, its ice scaled with the iced case\'s factor', () => {
    const p = spring({ iceMass: 2000 });
    p.loadCases.push({ id: 'iced', selfWeight: false, ice: { thickness: 0.02 } });
    p.combinations = [{ id: 'k', factors: [{ case: 'c', factor: 1 }, { case: 'iced', factor: 0.5 }] }];
    const { modal } = solveModes(p, 'k', { count: 1 });
    if (!modal.ok) throw new Error(modal.refusal.code);
    expect(modal.analysis.modes[0].angularFrequency).toBeCloseTo(Math.sqrt((E * A) / (L * (M + 0.5 * 2000 * 0.02))), 6);
  });

  it('massless cantilever with a tip-mass ancillary: ω² = 3EI / (M L³)', () => {
    const I = 8e-6, Lc = 6, Mt = 250;
    const p: ProjectFile = {
      format: 'stayset-project', version: 2,
      nodes: [{ id: 'base', at: [0, 0, 0], fixed: 'xyzrxryrz' }, { id: 'tip', at: [0, 0, Lc] }],
      sections: [{ id: 'tube', E, G: 81e9, area: 3e-3, Iy: I, Iz: I, J: 2 * I }],
      members: [{ id: 'pole', kind: 'beam', from: 'base', to: 'tip', section: 'tube', orientation: [1, 0, 0] }],
      loadCases: [{ id: 'c', selfWeight: false }],
      ancillaries: [{ id: 'dish', kind: 'dish', node: 'tip', dragArea: 1, mass: Mt }],
    };
    const { modal } = solveModes(p, 'c', { count: 2 });
    if (!modal.ok) throw new Error(modal.refusal.code);
    const exact = Math.sqrt((3 * E * I) / (Mt * Lc ** 3));
    // two bending planes, equal stiffness: a pair at the same frequency
    expect(modal.analysis.modes[0].angularFrequency).toBeCloseTo(exact, 6);
    expect(modal.analysis.modes[1].angularFrequency).toBeCloseTo(exact, 6);
  });
});

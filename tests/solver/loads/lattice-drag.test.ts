import { describe, expect, it } from 'vitest';
import type { LoadCaseSpec, ProjectFile, SectionSpec } from '../../../solver/index.ts';
import { latticeForceCoefficient } from '../../../solver/index.ts';
import { createWindLoad, windDragWidths } from '../../../solver/loads/wind.ts';
import { iceMassPerLength } from '../../../solver/loads/ice.ts';
import { validateProject } from '../../../main/common/project/index.ts';
import { handModel } from './hand-model.ts';

/**
 * Lattice face force coefficient C_f(φ) in the drag. The curve is the one recalled from
 * EN 1993-3-1 Annex B (see solver/loads/lattice-force-coefficient.ts):
 *   flat:  C_f = 1.76 C1 (1 − C2 φ + φ²);   round: C_f = C1 (1 − C2 φ) + (C1 + 0.875) φ²,
 *   C1 = 1.9, C2 = 1.4 triangular; C1 = 2.25, C2 = 1.5 square.
 * The numbers below are that arithmetic done by hand.
 */

function panel(lattice: SectionSpec['lattice'], diameter?: number): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 10], fixed: 'xyz' }, { id: 'B', at: [0, 0, 11.25] }],
    sections: [{ id: 'leg', E: 2.1e11, area: 5.57e-4, ...(diameter ? { diameter } : {}), lattice }],
    members: [{ id: 'panel', kind: 'bar', from: 'A', to: 'B', section: 'leg' }],
    loadCases: [],
  };
}
const uniform = (ice?: number): LoadCaseSpec => ({
  id: 'w', wind: { direction: 0, speed: 30, profile: { kind: 'uniform' }, airDensity: 1.225 }, ...(ice ? { ice: { thickness: ice } } : {}),
});

describe('lattice force coefficient C_f(φ) (EN 1993-3-1 Annex B, recalled)', () => {
  it('curve points by hand', () => {
    // triangular, flat, φ = 0.2: 1.76 · 1.9 · (1 − 0.28 + 0.04) = 2.54144
    expect(latticeForceCoefficient(0.2, 'triangular', 'flat')).toBeCloseTo(2.54144, 10);
    // square, flat, φ = 0.3: 1.76 · 2.25 · (1 − 0.45 + 0.09) = 2.5344
    expect(latticeForceCoefficient(0.3, 'square', 'flat')).toBeCloseTo(2.5344, 10);
    // triangular, round, φ = 0.2: 1.9 · 0.72 + 2.775 · 0.04 = 1.479
    expect(latticeForceCoefficient(0.2, 'triangular', 'round')).toBeCloseTo(1.479, 10);
    // square, round, φ = 0.5: 2.25 · 0.25 + 3.125 · 0.25 = 1.34375
    expect(latticeForceCoefficient(0.5, 'square', 'round')).toBeCloseTo(1.34375, 10);
  });

  it('one panel, 1.25 m of a triangular lattice of round members, φ = 0.2, b = 0.6 m, V = 30 m/s: F = ½ρV² C_f φ b h', () => {
    const p = panel({ faceWidth: 0.6, solidity: 0.2, plan: 'triangular', members: 'round' });
    const m = handModel(p);
    expect(windDragWidths(m, p, uniform())[0]).toBeCloseTo(1.479 * 0.2 * 0.6, 12);
    const f = new Float64Array(6);
    createWindLoad(m, p, uniform()).accumulate(m.coords, 1, f);
    // ½ · 1.225 · 900 · 1.479 · 0.2 · 0.6 · 1.25 = 122.2948125 N (hand arithmetic)
    expect(f[0] + f[3]).toBeCloseTo(122.2948125, 8);
  });

  it('defaults: triangular plan, flat members; an explicit dragFactor wins; share scales; share 0 takes no wind', () => {
    const m = (lat: SectionSpec['lattice']) => { const p = panel(lat); return windDragWidths(handModel(p), p, uniform())[0]; };
    expect(m({ faceWidth: 0.6, solidity: 0.2 })).toBeCloseTo(2.54144 * 0.12, 12);
    expect(m({ faceWidth: 0.6, solidity: 0.2, dragFactor: 2 })).toBeCloseTo(2 * 0.12, 12);
    expect(m({ faceWidth: 0.6, solidity: 0.2, members: 'round', share: 1 / 3 })).toBeCloseTo(1.479 * 0.12 / 3, 12);
    expect(m({ faceWidth: 0.6, solidity: 0.2, share: 0 })).toBe(0);
    expect(m({ faceWidth: 0.6, solidity: 0 })).toBe(0);
  });

  it('ice: members d = 48.3 mm under t = 20 mm raise φ to φ(d + 2t)/d and count as round', () => {
    // φ_iced = 0.2 · 88.3 / 48.3 = 0.365631; C_f = 1.9 (1 − 1.4 φ) + 2.775 φ² = 1.298400
    const p = panel({ faceWidth: 0.6, solidity: 0.2 }, 0.0483);
    const m = handModel(p);
    const w = windDragWidths(m, p, uniform(0.02))[0];
    expect(w).toBeCloseTo(1.2984 * 0.3656315 * 0.6, 5);
    const f = new Float64Array(6);
    createWindLoad(m, p, uniform(0.02)).accumulate(m.coords, 1, f);
    expect(f[0] + f[3]).toBeCloseTo(0.5 * 1.225 * 900 * w * 1.25, 8);
    // memberWidth wins over the diameter; without either the lattice face takes no ice
    const q = panel({ faceWidth: 0.6, solidity: 0.2, memberWidth: 0.0483 });
    expect(windDragWidths(handModel(q), q, uniform(0.02))[0]).toBeCloseTo(w, 12);
    const r = panel({ faceWidth: 0.6, solidity: 0.2 });
    expect(windDragWidths(handModel(r), r, uniform(0.02))[0]).toBeCloseTo(2.54144 * 0.12, 12);
    // ice mass only on a diameter (annulus ρπt(D + t)); memberWidth alone places no mass
    expect(iceMassPerLength(handModel(q), q, { thickness: 0.02 })[0]).toBe(0);
    expect(iceMassPerLength(m, p, { thickness: 0.02 })[0]).toBeCloseTo(900 * Math.PI * 0.02 * (0.0483 + 0.02), 10);
  });

  it('new lattice fields are validated with messages naming the entry', () => {
    const bad = panel({ faceWidth: 0.6, solidity: 0.2, plan: 'hexagonal' as never, members: 'tube' as never, memberWidth: -1, share: 1.5 });
    const v = validateProject(bad);
    expect(v.ok).toBe(false);
    const text = v.ok ? '' : v.errors.join('\n');
    expect(text).toMatch(/sections\[0\].*plan.*triangular or square/);
    expect(text).toMatch(/sections\[0\].*members.*flat or round/);
    expect(text).toMatch(/sections\[0\].*memberWidth/);
    expect(text).toMatch(/sections\[0\].*share.*between 0 and 1/);
  });
});

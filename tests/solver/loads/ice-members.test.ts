import { describe, expect, it } from 'vitest';
import type { AncillarySpec, ProjectFile } from '../../../solver/index.ts';
import { solveProject, STANDARD_GRAVITY } from '../../../solver/index.ts';
import { validateProject } from '../../../main/common/project/index.ts';

/**
 * Ice on members that are not cables (lattice legs and bracing, beams) and on ancillaries.
 * Closed form of a uniform radial coat t on a round member of diameter d over length L (the
 * annulus between two circles, plane geometry):
 *   m = ρ_ice · π ((d + 2t)² − d²) / 4 · L
 * Its weight reaches the supports (statics: Σ Fz of the reactions = total weight).
 */
const RHO = 900, T = 0.02, g = STANDARD_GRAVITY;
const annulus = (d: number, t: number) => (Math.PI * ((d + 2 * t) ** 2 - d * d)) / 4;

function frame(ancillaries: AncillarySpec[] = []): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [
      { id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [4, 0, 0], fixed: 'xyz' }, { id: 'C', at: [2, 0, 2], fixed: 'y' },
      { id: 'P', at: [8, 0, 0], fixed: 'xyzrxryrz' }, { id: 'Q', at: [8, 0, 6] },
    ],
    sections: [
      { id: 'leg', E: 2.1e11, area: 5.57e-4, diameter: 0.0483, lattice: { faceWidth: 0.6, solidity: 0.2, share: 1 / 3 } },
      { id: 'brace', E: 2.1e11, area: 2.38e-4, diameter: 0.0269, lattice: { faceWidth: 0.6, solidity: 0.2, share: 0 } },
      { id: 'tube', E: 2.1e11, G: 8.1e10, area: 3e-3, Iy: 8e-6, Iz: 8e-6, J: 1.6e-5, diameter: 0.168 },
    ],
    members: [
      { id: 'AC', kind: 'bar', from: 'A', to: 'C', section: 'brace', groups: ['lattice'] },
      { id: 'BC', kind: 'bar', from: 'B', to: 'C', section: 'leg', groups: ['lattice'] },
      { id: 'pole', kind: 'beam', from: 'P', to: 'Q', section: 'tube', orientation: [1, 0, 0], segments: 4 },
    ],
    loadCases: [
      { id: 'iced', selfWeight: false, ice: { thickness: T } },
      { id: 'lattice only', selfWeight: false, ice: { thickness: T, groups: ['lattice'] } },
      { id: 'bare brace', selfWeight: false, ice: { thickness: T, bareMembers: ['AC'] } },
      { id: 'iced wind', selfWeight: false, ice: { thickness: T }, wind: { direction: 90, speed: 25, profile: { kind: 'uniform' }, groups: ['lattice'] } },
      { id: 'bare wind', selfWeight: false, wind: { direction: 90, speed: 25, profile: { kind: 'uniform' }, groups: ['lattice'] } },
    ],
    ancillaries,
  };
}
// wind on the lattice only (its nodes are held across the wind), so the pole's deflection under
// the ancillaries changes no member drag and the differences are the ancillaries' own
const sumF = (p: ProjectFile, id: string, q: number) => solveProject(p).report.cases.find((c) => c.id === id)!.reactions.reduce((s, r) => s + r.force[q], 0);

describe('ice on lattice members and beams: weight ρπ((d + 2t)² − d²)/4 · L per member', () => {
  const p = frame();
  it('bracing (lattice share 0), lattice leg and beam each carry their coat', () => {
    const L = 2 * Math.SQRT2;
    const expected = g * RHO * (annulus(0.0269, T) * L + annulus(0.0483, T) * L + annulus(0.168, T) * 6);
    expect(sumF(p, 'iced', 2)).toBeCloseTo(expected, 6);
  });
  it('ice.groups selects the iced members; ice.bareMembers leaves some bare', () => {
    const L = 2 * Math.SQRT2;
    expect(sumF(p, 'lattice only', 2)).toBeCloseTo(g * RHO * (annulus(0.0269, T) + annulus(0.0483, T)) * L, 6);
    expect(sumF(p, 'bare brace', 2)).toBeCloseTo(g * RHO * (annulus(0.0483, T) * L + annulus(0.168, T) * 6), 6);
  });
});

describe('ice on ancillaries by their iceBehaviour', () => {
  const q = 0.5 * 1.225 * 25 * 25;
  it('coat on a point item: drag area × (w + 2t)/w and mass ρπt(w + t) · length', () => {
    // antenna: C_fA = 0.4 m², body 0.2 m wide and 2 m long; t = 20 mm → 0.4 · 0.24/0.2 = 0.48 m²
    const p = frame([{ id: 'ant', kind: 'antenna', node: 'Q', dragArea: 0.4, mass: 30, iceBehaviour: 'coat', coatWidth: 0.2, coatLength: 2 }]);
    expect(validateProject(p).ok).toBe(true);
    const members = sumF(frame(), 'iced', 2);
    expect(sumF(p, 'iced', 2) - members).toBeCloseTo(g * RHO * Math.PI * T * (0.2 + T) * 2, 6);
    const windOnMembers = sumF(frame(), 'iced wind', 1);
    expect(-(sumF(p, 'iced wind', 1) - windOnMembers)).toBeCloseTo(q * 0.4 * (0.2 + 2 * T) / 0.2, 6);
    expect(-(sumF(p, 'bare wind', 1) - sumF(frame(), 'bare wind', 1))).toBeCloseTo(q * 0.4, 6);
  });
  it('coat on a line item ices per metre of height; "none" takes no ice', () => {
    // feeder along the whole pole (0 … 6 m), a 0.05 m wide body
    const p = frame([
      { id: 'feeder', kind: 'feeder', along: { group: 'poles', from: 0, to: 6 }, dragArea: 0.06, mass: 2, iceBehaviour: 'coat', coatWidth: 0.05 },
      { id: 'radome', kind: 'antenna', node: 'Q', dragArea: 0.5, mass: 40, iceBehaviour: 'none' },
    ]);
    p.members[2].groups = ['poles'];
    expect(validateProject(p).ok).toBe(true);
    expect(sumF(p, 'iced', 2) - sumF(frame(), 'iced', 2)).toBeCloseTo(g * RHO * Math.PI * T * (0.05 + T) * 6, 6);
    expect(-(sumF(p, 'iced wind', 1) - sumF(frame(), 'iced wind', 1))).toBeCloseTo(q * (0.06 * 6 * (0.05 + 2 * T) / 0.05 + 0.5), 6);
  });
  it('messages name the entry', () => {
    const p = frame([
      { id: 'a', kind: 'antenna', node: 'Q', dragArea: 0.4, mass: 30, iceBehaviour: 'coat' },
      { id: 'b', kind: 'feeder', along: { group: 'lattice', from: 0, to: 2 }, dragArea: 0.1, mass: 2, iceBehaviour: 'coat', coatWidth: 0.05, coatLength: 3 },
      { id: 'c', kind: 'dish', node: 'Q', dragArea: 1, mass: 50, iceBehaviour: 'none', iceMass: 100 },
      { id: 'd', kind: 'dish', node: 'Q', dragArea: 1, mass: 50, iceBehaviour: 'frosty' as never },
    ]);
    const v = validateProject(p);
    const text = v.ok ? '' : v.errors.join('\n');
    expect(text).toMatch(/ancillaries\[0\] "a": iceBehaviour "coat" needs coatWidth/);
    expect(text).toMatch(/ancillaries\[0\] "a": iceBehaviour "coat" on a point item needs coatLength/);
    expect(text).toMatch(/ancillaries\[1\] "b": coatLength applies to point items only/);
    expect(text).toMatch(/ancillaries\[2\] "c": iceDragArea and iceMass apply to iceBehaviour "perThickness" only/);
    expect(text).toMatch(/ancillaries\[3\].*iceBehaviour.*perThickness, coat, none/);
  });
});

import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { buildModel, DEFAULT_ICE_WIND_PAIRS, runChecks, solveProject, STANDARD_GRAVITY } from '../../../solver/index.ts';
import { runGenerator } from '../../../main/common/generators/index.ts';
import { validateProject } from '../../../main/common/project/index.ts';

const g = STANDARD_GRAVITY, RHO = 900;
/** Ice annulus mass per length ρπt(d + t) = ρπ((d + 2t)² − d²)/4 (plane geometry). */
const annulus = (d: number, t: number) => RHO * Math.PI * t * (d + t);

/**
 * Ice with wind: two round bars in the x–z plane, wind toward +y (normal to both, and taken by
 * the supports without deflection: C is held in y). Hand check per pair (f_ice, f_wind):
 *   Σ Fy = −f_wind · ½ρV² · Σ 1.2 (d + 2 f_ice t) L      (drag on the iced diameter, Cd 1.2 default)
 *   Σ Fz = g · Σ ρπ f_ice t (d + f_ice t) L              (weight of the reduced ice)
 */
function frame(): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [4, 0, 0], fixed: 'xyz' }, { id: 'C', at: [2, 0, 2], fixed: 'y' }],
    sections: [{ id: 'd40', E: 2.1e11, area: 4e-4, diameter: 0.04 }, { id: 'd60', E: 2.1e11, area: 6e-4, diameter: 0.06 }],
    members: [{ id: 'AC', kind: 'bar', from: 'A', to: 'C', section: 'd40' }, { id: 'BC', kind: 'bar', from: 'B', to: 'C', section: 'd60' }],
    loadCases: [
      { id: 'ice', selfWeight: false, ice: { thickness: 0.03 }, purpose: 'ultimate' },
      { id: 'storm', selfWeight: false, wind: { direction: 90, speed: 30, profile: { kind: 'uniform' } } },
    ],
    iceWithWind: [{ id: 'IW', iceCase: 'ice', windCase: 'storm' }],
  };
}

describe('ice with wind (pairs of factors)', () => {
  const p = frame();
  const rep = solveProject(p).report;
  const L = 2 * Math.SQRT2, q = 0.5 * 1.225 * 900;
  it('default pairs are full ice + half wind pressure and half ice + full wind (common practice, stated as such)', () => {
    expect(DEFAULT_ICE_WIND_PAIRS).toEqual([{ ice: 1, wind: 0.5 }, { ice: 0.5, wind: 1 }]);
    expect(rep.cases.map((c) => c.id)).toEqual(['ice', 'storm', 'IW / ice 1 + wind 0.5', 'IW / ice 0.5 + wind 1']);
  });
  for (const [fi, fw] of [[1, 0.5], [0.5, 1]]) {
    it(`ice ${fi} + wind ${fw}: wind on the iced diameters, weight of the reduced ice (hand check)`, () => {
      const c = rep.cases.find((x) => x.id === `IW / ice ${fi} + wind ${fw}`)!;
      const t = fi * 0.03;
      const sum = (k: number) => c.reactions.reduce((s, r) => s + r.force[k], 0);
      // the drag acts on the current length: the bars shorten ~1e-6 under the ice weight
      const drag = -fw * q * 1.2 * ((0.04 + 2 * t) + (0.06 + 2 * t)) * L;
      expect(Math.abs(sum(1) / drag - 1)).toBeLessThan(1e-5);
      expect(sum(2)).toBeCloseTo(g * (annulus(0.04, t) + annulus(0.06, t)) * L, 6);
    });
  }
  it('the cases take the ice case\'s purpose (or the spec\'s) and are checked like it', () => {
    const check = runChecks(p, rep);
    expect(check.cases.find((c) => c.id === 'IW / ice 1 + wind 0.5')!.purpose).toBe('ultimate');
    const q2 = frame();
    q2.iceWithWind![0].purpose = 'serviceability';
    expect(runChecks(q2, solveProject(q2).report).cases.find((c) => c.id === 'IW / ice 0.5 + wind 1')!.purpose).toBe('serviceability');
  });
  it('messages name the entry', () => {
    const bad = frame();
    bad.iceWithWind = [
      { id: 'storm', iceCase: 'storm', windCase: 'ice' },
      { id: 'X', iceCase: 'nope', windCase: 'storm', pairs: [{ ice: 1, wind: 1 }, { ice: 1, wind: 1 }] },
    ];
    const v = validateProject(bad);
    const text = v.ok ? '' : v.errors.join('\n');
    expect(text).toMatch(/iceWithWind\[0\] "storm": id "storm" is already used/);
    expect(text).toMatch(/iceWithWind\[0\] "storm": iceCase: load case "storm" has no ice/);
    expect(text).toMatch(/iceWithWind\[0\] "storm": windCase: load case "ice" has no wind/);
    expect(text).toMatch(/iceWithWind\[1\] "X": iceCase: load case "nope" does not exist/);
    expect(text).toMatch(/iceWithWind\[1\] "X": pairs\[1\]: the same pair is listed twice/);
  });
});

/**
 * Unbalanced ice on guys: a guyed mast with 3 guys on each of 2 levels; "guy ice" ices the guys
 * only. With one guy bare, the reactions lose exactly that guy's ice weight (ρπt(d + t) times its
 * unstressed length: statics), and the mast, balanced by symmetry under uniform ice, leans.
 */
function mast(): ProjectFile {
  const base: ProjectFile = {
    format: 'stayset-project', version: 2, nodes: [], sections: [], members: [],
    loadCases: [{ id: 'guy ice', selfWeight: false, ice: { thickness: 0.025, groups: ['m/guys'] } }],
  };
  const p = runGenerator(base, {
    id: 'm', kind: 'guyedMast',
    params: {
      height: 24, guyLevels: [12, 24], guysPerLevel: 3, anchorRadius: 16, faceWidth: 0.5, panelHeight: 1,
      leg: { E: 2.1e11, area: 8e-4 }, bracing: { E: 2.1e11, area: 2e-4 }, guy: { E: 1.6e11, area: 2e-4, breakingLoad: 300e3, diameter: 0.018 }, guySegments: 6,
    },
  }).project;
  p.unbalancedIce = [
    { id: 'U', case: 'guy ice', group: 'm/guys' },
    { id: 'UL', case: 'guy ice', group: 'm/guys', by: 'level', pattern: 'eachIced' },
  ];
  return p;
}

describe('unbalanced ice on guys (iced and bare guys, common practice)', () => {
  const p = mast();
  expect(validateProject(p).ok).toBe(true);
  const rep = solveProject(p).report;
  const model = buildModel(p);
  const guyIce = (id: string) => {
    const m = model.members.find((x) => x.id === id)!;
    let l0 = 0;
    for (let e = m.firstElement; e < m.firstElement + m.elementCount; e++) l0 += model.elemUnstressedLength[e];
    return g * annulus(0.018, 0.025) * l0;
  };
  const guys = p.groups!.find((x) => x.id === 'm/guys')!.members;
  const sumFz = (id: string) => rep.cases.find((c) => c.id === id)!.reactions.reduce((s, r) => s + r.force[2], 0);
  // centroid of the three top leg nodes (one corner alone moves when the triangle turns or swells)
  const top = (id: string) => {
    const nodes = rep.cases.find((c) => c.id === id)!.nodes.filter((n) => /^m\/P24[abc]$/.test(n.id));
    expect(nodes.length).toBe(3);
    return [0, 1, 2].map((k) => nodes.reduce((s, n) => s + n.displacement[k], 0) / 3);
  };

  it('one case per guy ("eachBare") and per level ("eachIced")', () => {
    const ids = rep.cases.map((c) => c.id);
    for (const gid of guys) expect(ids).toContain(`U / ${gid} bare`);
    expect(ids).toContain('UL / level 12 m iced');
    expect(ids).toContain('UL / level 24 m iced');
    expect(rep.cases.every((c) => c.converged)).toBe(true);
  });

  it('a bare guy removes exactly its ice weight from the reactions (statics)', () => {
    const all = guys.reduce((s, gid) => s + guyIce(gid), 0);
    expect(sumFz('guy ice')).toBeCloseTo(all, 4);
    for (const gid of guys) expect(sumFz(`U / ${gid} bare`)).toBeCloseTo(all - guyIce(gid), 4);
    const level12 = guys.filter((gid) => p.members.find((m) => m.id === gid)!.to.includes('P12') || p.members.find((m) => m.id === gid)!.from.includes('P12'));
    expect(level12.length).toBe(3);
    expect(sumFz('UL / level 12 m iced')).toBeCloseTo(level12.reduce((s, gid) => s + guyIce(gid), 0), 4);
  });

  it('uniform ice leaves the mast plumb by symmetry; one bare guy makes it lean', () => {
    const h = (d: number[]) => Math.hypot(d[0], d[1]);
    expect(h(top('guy ice'))).toBeLessThan(1e-6);
    for (const gid of guys) expect(h(top(`U / ${gid} bare`))).toBeGreaterThan(1e-5);
  });

  it('messages name the entry', () => {
    const bad = mast();
    bad.unbalancedIce = [{ id: 'V', case: 'nope', group: 'nobody' }];
    const v = validateProject(bad);
    const text = v.ok ? '' : v.errors.join('\n');
    expect(text).toMatch(/unbalancedIce\[0\] "V": case: load case "nope" does not exist/);
    expect(text).toMatch(/unbalancedIce\[0\] "V": group "nobody" does not exist/);
  });
});

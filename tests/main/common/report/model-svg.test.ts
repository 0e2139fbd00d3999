/**
 * The report's model pictures are orthographic projections: a node's drawn position is a linear
 * function of its coordinates at one scale in both views, and the deformed shape is the model
 * plus the node displacements times the printed magnification.
 */
import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../../solver/index.ts';
import { magnification, modelSvg } from '../../../../main/common/report/model-svg.ts';

/** A 10 m post held by one guy to an anchor 10 m away in x (invented). */
function post(): ProjectFile {
  return {
    version: 2,
    nodes: [{ id: 'base', at: [0, 0, 0], fixed: 'xyz' }, { id: 'top', at: [0, 0, 10] }, { id: 'anchor', at: [10, 0, 0], fixed: 'xyz' }],
    sections: [{ id: 's', E: 2e11, A: 1e-4 }],
    members: [{ id: 'mast', from: 'base', to: 'top', section: 's', kind: 'bar' }, { id: 'guy', from: 'top', to: 'anchor', section: 's', kind: 'cable' }],
    loadCases: [{ id: 'dead' }],
  } as unknown as ProjectFile;
}

const lines = (svg: string) => [...svg.matchAll(/<line x1="([\d.-]+)" y1="([\d.-]+)" x2="([\d.-]+)" y2="([\d.-]+)" stroke="([^"]+)"/g)].map((m) => ({ a: [Number(m[1]), Number(m[2])], b: [Number(m[3]), Number(m[4])], colour: m[5] }));

describe('model pictures', () => {
  it('chooses round magnifications of at least 1', () => {
    expect(magnification(0.01, 60)).toBe(200); // 0.04·60/0.01 = 240 → 200
    expect(magnification(0.5, 10)).toBe(1); // already visible
    expect(magnification(0, 10)).toBe(1);
    expect(magnification(0.003, 10)).toBe(100); // 133 → 100
  });

  it('draws the model as entered at one scale in elevation and plan', () => {
    const svg = modelSvg(post(), 300);
    const [elevation] = svg.split('Plan (x–y)');
    const el = lines(elevation);
    const mast = el[0], guy = el[1];
    // The mast is vertical (same x on the sheet), the guy spans 10 m across as the mast spans 10 m up: one scale.
    expect(mast.a[0]).toBeCloseTo(mast.b[0], 6);
    const scaleUp = Math.abs(mast.a[1] - mast.b[1]), scaleAcross = Math.abs(guy.b[0] - guy.a[0]);
    expect(scaleAcross).toBeCloseTo(scaleUp, 0);
  });

  it('the scale bar is a round length in the display unit: 2 m (SI), 5 ft (US), each drawn at its true length', () => {
    const bar = (svg: string) => {
      const m = /aria-label="scale bar"><line x1="2" y1="8" x2="([\d.]+)"[\s\S]*?>([\d.]+ (?:m|ft))<\/text>/.exec(svg)!;
      return { px: Number(m[1]) - 2, label: m[2] };
    };
    const si = bar(modelSvg(post(), 300)), us = bar(modelSvg(post(), 300, null, 'US'));
    expect(si.label).toBe('2 m'); // span 10 m: the largest 1-2-5 step ≤ span/5
    expect(us.label).toBe('5 ft'); // 10 m = 32.8 ft: span/5 = 6.6 ft → 5 ft
    // 5 ft = 1.524 m (1 ft = 0.3048 m, NIST SP 811): the two bars keep the ratio of their lengths (to the 0.1 px drawn)
    expect(us.px / si.px).toBeCloseTo(1.524 / 2, 2);
  });

  it('draws the deformed shape as the model plus magnified displacements, in the plane of the sway', () => {
    const nodes = [
      { id: 'base', position: [0, 0, 0], displacement: [0, 0, 0] },
      { id: 'top', position: [0, 0.02, 10], displacement: [0, 0.02, 0] },
      { id: 'anchor', position: [10, 0, 0], displacement: [0, 0, 0] },
    ] as never;
    const svg = modelSvg(post(), 300, { caseId: 'wind y', nodes });
    const factor = magnification(0.02, 10);
    expect(svg).toContain(`displacements × ${factor}`);
    expect(svg).toContain('at 90° from x'); // sway along y: the elevation looks along x
    const [elevation] = svg.split('Plan (x–y)');
    const el = lines(elevation);
    const asEntered = el.filter((l) => l.colour === '#999'), deformed = el.filter((l) => l.colour === '#000');
    const px = Math.abs(asEntered[0].a[1] - asEntered[0].b[1]) / 10; // sheet units per metre
    // The top moved factor · 0.02 m sideways on the sheet; the base did not move.
    expect(deformed[0].b[0] - asEntered[0].b[0]).toBeCloseTo(factor * 0.02 * px, 0);
    expect(deformed[0].a[0]).toBeCloseTo(asEntered[0].a[0], 6);
  });
});

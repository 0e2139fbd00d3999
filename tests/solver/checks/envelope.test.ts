import { describe, expect, it } from 'vitest';
import { envelopeOf } from '../../../solver/index.ts';
import { caseResult } from './synthetic-report.ts';

// Envelope arithmetic checked by hand on three written cases (max / min / argmax by inspection).
const report = {
  cases: [
    caseResult('dead', [{ id: 'G1', tensionMax: 10e3, tensionMin: 9e3, sag: 0.2 }, { id: 'G2', tensionMax: 10e3, tensionMin: 9.5e3 }],
      [{ id: 'TOP', at: [0, 0, 60], u: [0.01, 0, -0.02] }], [{ node: 'A1', force: [100, 0, -5e3] }]),
    caseResult('wind', [{ id: 'G1', tensionMax: 25e3, tensionMin: 24e3, sag: 0.1 }, { id: 'G2', tensionMax: 2e3, tensionMin: -0, slack: true, sag: 1.5 }],
      [{ id: 'TOP', at: [0, 0, 60], u: [0.3, 0.4, 0] }], [{ node: 'A1', force: [-300, 50, -12e3] }]),
    caseResult('bad', [{ id: 'G1', tensionMax: 1e9 }], [], [], false),
  ],
};

describe('envelopeOf', () => {
  const env = envelopeOf(report);
  it('keeps converged cases only', () => {
    expect(env.cases).toEqual(['dead', 'wind']);
    expect(env.skipped).toEqual(['bad']);
  });
  it('member max/min tension, max sag, slack cases with the governing case', () => {
    const g1 = env.members.find((m) => m.id === 'G1')!;
    expect([g1.tensionMax, g1.tensionMaxCase, g1.tensionMin, g1.tensionMinCase]).toEqual([25e3, 'wind', 9e3, 'dead']);
    expect([g1.sagMax, g1.sagMaxCase]).toEqual([0.2, 'dead']);
    const g2 = env.members.find((m) => m.id === 'G2')!;
    expect(g2.slackCases).toEqual(['wind']);
    expect([g2.sagMax, g2.sagMaxCase]).toEqual([1.5, 'wind']);
  });
  it('node displacement magnitude: |(0.3, 0.4, 0)| = 0.5 m', () => {
    expect(env.nodes[0].displacementMax).toBeCloseTo(0.5, 12);
    expect(env.nodes[0].displacementMaxCase).toBe('wind');
  });
  it('reaction component extremes and magnitude', () => {
    const r = env.reactions[0];
    expect(r.max).toEqual([100, 50, -5e3]);
    expect(r.maxCase).toEqual(['dead', 'wind', 'dead']);
    expect(r.min).toEqual([-300, 0, -12e3]);
    expect(r.minCase).toEqual(['wind', 'dead', 'wind']);
    expect(r.magnitudeMax).toBeCloseTo(Math.hypot(300, 50, 12e3), 9);
  });
  it('a support without restrained rotations has no moment extremes', () => {
    expect(env.reactions[0].moment).toBeUndefined();
  });
  it('support moments (beam models): per-component extremes with their cases, by inspection', () => {
    const withMoments = envelopeOf({
      cases: [
        caseResult('dead', [], [], [{ node: 'B', force: [0, 0, 1e3], moment: [200, -50, 0] }]),
        caseResult('wind', [], [], [{ node: 'B', force: [10, 0, 1e3], moment: [-700, 30, 5] }]),
      ],
    });
    expect(withMoments.reactions[0].moment).toEqual({ max: [200, 30, 5], maxCase: ['dead', 'wind', 'wind'], min: [-700, -50, 0], minCase: ['wind', 'dead', 'dead'] });
  });
  it('restricts to named cases', () => {
    expect(envelopeOf(report, ['dead']).members[0].tensionMax).toBe(10e3);
  });
});

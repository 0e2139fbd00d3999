// Messages from structured results read in the user's display units: a check result and a tuning
// note rendered in kN and in kip, displacements in mm / in.
import { describe, expect, it } from 'vitest';
import type { CheckResult, ProjectFile, TuningResult } from '../../../../solver/index.ts';
import { checkRow } from '../../../../main/common/checks/check-text.ts';
import { targetText, targetValueText, tuningNoteText } from '../../../../main/common/tuning/tuning-text.ts';

const result = (over: Partial<CheckResult>): CheckResult => ({
  code: 'cableResistance', format: 'limitState', case: 'storm', purpose: 'ultimate', item: 'G1', quantity: 'force',
  value: 44482.216152605, limit: 88964.43230521, ratio: 0.5, pass: true, source: 'test', ...over,
});

describe('a check message in the display units', () => {
  it('cable resistance in kN and in kip (1 kip = 4448.2216152605 N, NIST SP 811 Appendix B.8)', () => {
    const si = checkRow(result({}), 'SI');
    expect(si.value).toBe('44.48 kN');
    expect(si.limit).toBe('≤ 88.96 kN');
    const us = checkRow(result({}), 'US');
    expect(us.value).toBe('10.000 kip'); // 44482.216152605 N = 10 kip exactly
    expect(us.limit).toBe('≤ 20.000 kip');
    expect(us.ratio).toBe('0.500');
  });

  it('a displacement check in mm (SI) and in (US), never in m', () => {
    const r = result({ code: 'displacement', quantity: 'length', item: 'TOP', value: 0.0635, limit: 0.05, ratio: 1.27, pass: false, purpose: 'serviceability' });
    expect(checkRow(r, 'SI')).toMatchObject({ value: '63.5 mm', limit: '≤ 50.0 mm', ratio: '1.270', verdict: 'FAIL' });
    // 0.0635 m = 2.5 in exactly (1 in = 0.0254 m, NIST SP 811).
    expect(checkRow(r, 'US')).toMatchObject({ value: '2.500 in', limit: '≤ 1.969 in' });
  });

  it('a sag check in the sag kind: whole mm (SI), in to 0.01 (US)', () => {
    const r = result({ code: 'sag', quantity: 'length', value: 0.6096, limit: 1, ratio: 0.6096 });
    expect(checkRow(r, 'SI')).toMatchObject({ value: '610 mm', limit: '≤ 1000 mm' });
    expect(checkRow(r, 'US').value).toBe('24.00 in'); // 0.6096 m = 24 in exactly (1 in = 0.0254 m, NIST SP 811)
  });
});

describe('a tuning note in the display units', () => {
  const project = { groups: [{ id: 'g1', label: 'guys level 1' }] } as unknown as ProjectFile;
  const run = { targets: [{ index: 0, target: { kind: 'reaction', node: 'A1', case: 'dead', limit: 50e3 }, value: 60e3, limit: 50e3, unit: 'N', sense: 'atMost', governing: 'A1', met: false }] } as unknown as TuningResult;
  const note = { code: 'atBound', quantities: { bound: { value: 22241.1080763025, kind: 'force' } }, refs: { target: '0', group: 'g1', by: 'pretension', bound: 'upper', direction: 'up' } } as const;

  it('in kN', () => {
    expect(tuningNoteText(note, project, run, 'SI')).toBe("reaction at 'A1' ≤ 50.00 kN in 'dead' needs the pretension of 'guys level 1' above its upper bound 22.24 kN.");
  });
  it('in kip (22241.1080763025 N = 5 kip exactly)', () => {
    expect(tuningNoteText(note, project, run, 'US')).toBe("reaction at 'A1' ≤ 11.240 kip in 'dead' needs the pretension of 'guys level 1' above its upper bound 5.000 kip.");
  });
});

describe('tuning targets: sag limits and plumb tolerances in mm / in, reactions in kN / kip', () => {
  const project = { groups: [{ id: 'g1', label: 'guys level 1' }] } as unknown as ProjectFile;
  const plumb = { kind: 'plumb', base: 'B', top: 'T', case: 'dead', tolerance: 0.0254 } as const;
  const sag = { kind: 'sag', group: 'g1', case: 'dead', limit: { absolute: 0.3048 } } as const;

  it('a plumb tolerance of 0.0254 m reads 25.4 mm and 1.000 in (1 in = 0.0254 m, NIST SP 811), never m', () => {
    expect(targetText(project, plumb, 'SI')).toBe("mast top 'T' plumb over 'B' within 25.4 mm in 'dead'");
    expect(targetText(project, plumb, 'US')).toBe("mast top 'T' plumb over 'B' within 1.000 in in 'dead'");
  });
  it('a sag limit of 0.3048 m reads 305 mm and 12.00 in (1 ft = 12 in = 0.3048 m)', () => {
    expect(targetText(project, sag, 'SI')).toBe("sag ≤ 305 mm in 'dead' for 'guys level 1'");
    expect(targetText(project, sag, 'US')).toBe("sag ≤ 12.00 in in 'dead' for 'guys level 1'");
  });
  it('reached values follow the target: sag and plumb offsets in mm, reactions in kN', () => {
    expect(targetValueText({ unit: 'm', target: sag }, 0.41249, 'SI')).toBe('412 mm');
    expect(targetValueText({ unit: 'm', target: plumb }, 0.01234, 'SI')).toBe('12.3 mm');
    expect(targetValueText({ unit: 'N', target: { kind: 'reaction', node: 'A', case: 'dead', limit: 1 } }, 12345.6, 'US')).toBe('2.775 kip');
  });
});

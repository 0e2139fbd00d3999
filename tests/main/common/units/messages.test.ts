// Messages from structured results read in the user's display units: a check result and a tuning
// note rendered in kN and in kip, displacements in mm / in.
import { describe, expect, it } from 'vitest';
import type { CheckResult, ProjectFile, TuningResult } from '../../../../solver/index.ts';
import { checkRow } from '../../../../main/common/checks/check-text.ts';
import { tuningNoteText } from '../../../../main/common/tuning/tuning-text.ts';

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

  it('a sag check stays a length (m / ft)', () => {
    const r = result({ code: 'sag', quantity: 'length', value: 0.6096, limit: 1, ratio: 0.6096 });
    expect(checkRow(r, 'SI').value).toBe('0.610 m');
    expect(checkRow(r, 'US').value).toBe('2.000 ft'); // 0.6096 m = 2 ft exactly
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

/**
 * Host-side checks of site requests from the page: each refusal names the argument and the
 * problem; a valid request passes through typed.
 */
import { describe, expect, it } from 'vitest';
import { validateHostArgs } from '../../../main/common/host-validation.ts';
import { sampleMast } from '../../main/store/sample-project.ts';

describe('runSite / printSiteDocument arguments', () => {
  const p = sampleMast();
  it('accepts the four kinds of request', () => {
    for (const r of [{ kind: 'sequence', id: 's' }, { kind: 'asbuilt', id: 'a' }, { kind: 'crewSheet', id: 's', units: 'SI', paper: 'a4', issueDate: '2026-12-02' }, { kind: 'report', units: 'US', paper: 'letter', issueDate: '2026-12-02' }]) {
      expect(validateHostArgs('runSite', [p, r]).ok, JSON.stringify(r)).toBe(true);
    }
  });
  it('names the argument and the problem', () => {
    expect(validateHostArgs('runSite', [p, { kind: 'delete' }])).toEqual({ ok: false, error: 'runSite: argument 2 (request) kind must be one of sequence, asbuilt, crewSheet, report' });
    expect(validateHostArgs('runSite', [p, { kind: 'sequence', id: '' }])).toMatchObject({ ok: false, error: expect.stringContaining('argument 2 (request) id must be a non-empty string') });
    expect(validateHostArgs('runSite', [p, { kind: 'sequence', id: 'x', path: '/etc' }])).toMatchObject({ ok: false, error: expect.stringContaining('unknown field(s) path') });
    expect(validateHostArgs('runSite', [p, { kind: 'report', units: 'SI', paper: 'a4', issueDate: 'today' }])).toMatchObject({ ok: false, error: expect.stringContaining('issueDate must be a date YYYY-MM-DD') });
    expect(validateHostArgs('runSite', [{ nodes: 1 }, { kind: 'sequence', id: 'x' }])).toMatchObject({ ok: false, error: expect.stringContaining('runSite: argument 1 (project) is not a valid project') });
    expect(validateHostArgs('printSiteDocument', [p, { kind: 'sequence', id: 'x' }])).toEqual({ ok: false, error: 'printSiteDocument: argument 2 (request) must be a crewSheet or report request' });
  });
});

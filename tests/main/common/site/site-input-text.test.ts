/**
 * Input problems the site computations find while they run are structured (OutcomeError) and read
 * in the display units, naming the reading: a frequency no tension fits (as-built readings of the
 * demo mast) in kN and in kip; the installation table's temperature range in °C and °F.
 * Conversions: 1 kip = 4448.2216152605 N, °F = °C × 9/5 + 32 (NIST SP 811 Appendix B, 4.2.1.1).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { OutcomeError, runAsBuilt, type ProjectFile } from '../../../../solver/index.ts';
import { runSiteRequest } from '../../../../main/common/site/site-run.ts';
import { siteInputText } from '../../../../main/common/site/site-input-text.ts';
import { checkSiteRequest } from '../../../../main/common/site/site-run.ts';

const demo = JSON.parse(readFileSync(new URL('../../../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;

describe('a site reading no tension fits', () => {
  const p = structuredClone(demo);
  const set = p.siteMeasurements![0];
  const k = set.tensions.findIndex((t) => t.method === 'frequency');
  set.tensions[k] = { ...set.tensions[k], value: 1e5 }; // far above any taut-string frequency of a guy

  it('the solver throws it structured, naming the reading and the member', () => {
    let thrown: unknown;
    try { runAsBuilt(p, set.id); } catch (e) { thrown = e; }
    expect(thrown).toBeInstanceOf(OutcomeError);
    const o = (thrown as OutcomeError).outcome;
    expect(o.code).toBe('noTensionForFrequency');
    expect(o.refs).toMatchObject({ member: set.tensions[k].member, mode: 'tautString' });
    expect(String(o.refs.entry)).toContain(`tensions[${k}]`);
    expect(o.quantities.frequency).toEqual({ value: 1e5, kind: 'frequency' });
  });

  it('the site request words it in the units asked for: kN (SI), kip (US)', () => {
    const si = () => runSiteRequest(p, { kind: 'asbuilt', id: set.id, units: 'SI' });
    const us = () => runSiteRequest(p, { kind: 'asbuilt', id: set.id, units: 'US' });
    const member = set.tensions[k].member.replace(/[/]/g, '\\/');
    expect(si).toThrow(new RegExp(`tensions\\[${k}\\]: no tension of member "${member}" between [\\d.]+ kN and [\\d.]+ kN gives the measured 100000\\.000 Hz in the taut-string mode`));
    expect(us).toThrow(/between [\d.]+ kip and [\d.]+ kip gives the measured 100000\.000 Hz/);
    expect(si).not.toThrow(/ N and /);
  });
});

describe('words of the installation table range', () => {
  const m = { code: 'temperatureOutsideTable', quantities: { temperature: { value: 253.15, kind: 'temperature' }, low: { value: 263.15, kind: 'temperature' }, high: { value: 313.15, kind: 'temperature' } }, refs: { member: 'G1' } } as const;
  it('in °C and in °F (−20 °C = −4 °F, −10 °C = 14 °F, 40 °C = 104 °F)', () => {
    expect(siteInputText(m, 'SI')).toBe('site check of member "G1": -20.0 °C is outside the installation table (-10.0 °C … 40.0 °C)');
    expect(siteInputText(m, 'US')).toBe('site check of member "G1": -4.0 °F is outside the installation table (14.0 °F … 104.0 °F)');
  });
});

describe('site requests carry the units their problems are worded in', () => {
  it('sequence and as-built requests take optional units SI or US', () => {
    expect(checkSiteRequest({ kind: 'asbuilt', id: 'a', units: 'US' }).ok).toBe(true);
    expect(checkSiteRequest({ kind: 'sequence', id: 's' }).ok).toBe(true);
    expect(checkSiteRequest({ kind: 'asbuilt', id: 'a', units: 'mm' })).toEqual({ ok: false, error: 'units must be "SI" or "US"' });
  });
});

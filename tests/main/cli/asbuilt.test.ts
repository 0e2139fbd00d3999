/**
 * `stayset asbuilt` on the demo mast. Its readings were made (tests/fixtures/demos/site.ts) from a
 * state with guys L1-2 25 mm long, L2-2 30 mm short and L3-1 20 mm long, rounded: the command must
 * find those three and nothing else.
 */
import { describe, expect, it } from 'vitest';
import { runStayset } from './run-stayset.ts';

describe('stayset asbuilt', () => {
  it('finds the mis-cut guys of the demo readings and lists the adjustments (exit 3: action needed)', () => {
    const r = runStayset(['asbuilt', 'assets/demo-mast.stayset', '--json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(3);
    const json = JSON.parse(r.stdout);
    expect(json.disclaimer).toContain('qualified engineer');
    const set = json.sets[0];
    const offsets = Object.fromEntries(set.cables.map((c: { member: string; lengthDifference: number }) => [c.member, c.lengthDifference]));
    expect(offsets['mast/guy L1-2']).toBeCloseTo(0.025, 2);
    expect(offsets['mast/guy L2-2']).toBeCloseTo(-0.03, 2);
    expect(offsets['mast/guy L3-1']).toBeCloseTo(0.02, 2);
    expect(set.adjustments.map((a: { member: string }) => a.member).sort()).toEqual(['mast/guy L1-2', 'mast/guy L2-2', 'mast/guy L3-1']);
    expect(set.checks.pass).toBe(true);
  });

  it('prints tables with the caution, and names an unknown set', () => {
    const bad = runStayset(['asbuilt', 'assets/demo-mast.stayset', '--set', 'nope']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('site measurement set "nope" does not exist');
    const none = runStayset(['asbuilt', 'assets/demo-canopy.stayset']);
    expect(none.code).toBe(2);
    expect(none.stderr).toContain('no site measurements');
  });
});

// `stayset solve` on a project with member groups prints a summary first: per group the governing
// tension (largest over members and converged cases), the smallest tension, the highest
// utilisation and the slack cases, guys before mast bars. Each figure is checked against the
// per-member JSON of `solve --json` and `check --json` (the same run's own detailed output),
// rounded to the printed precision (kN with 2 decimals, utilisation with 3).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CaseResult, MemberCheck, ProjectFile } from '../../../solver/index.ts';
import { fixture, runStayset } from './run-stayset.ts';
import { pinBaseMeltProject } from '../../e2e/fixtures/pin-base-mast.ts';

const KESTREL = fixture('kestrel-moor-mast.stayset.json');

function rowOf(out: string, label: string): string[] {
  const line = out.split('\n').find((l) => l.trim().startsWith(`${label} `));
  expect(line, `a row for ${label}`).toBeDefined();
  return line!.trim().split(/\s{2,}/);
}

describe('stayset solve (group summary)', () => {
  it('prints per group the governing tension, smallest tension, utilisation and slack cases', () => {
    const text = runStayset(['solve', KESTREL]);
    expect(text.code).toBe(0);
    expect(text.stderr).toBe('');
    const cases = (JSON.parse(runStayset(['solve', KESTREL, '--json']).stdout) as { cases: CaseResult[] }).cases;
    const checkMembers = (JSON.parse(runStayset(['check', KESTREL, '--json']).stdout) as { check: { members: MemberCheck[] } }).check.members;

    const guys = ['G1', 'G2', 'G3'];
    const all = cases.flatMap((c) => c.members.filter((m) => guys.includes(m.id)).map((m) => ({ c: c.id, m })));
    const hi = all.reduce((a, b) => (b.m.tensionMax > a.m.tensionMax ? b : a));
    const lo = all.reduce((a, b) => (b.m.tensionMin < a.m.tensionMin ? b : a));
    const util = Math.max(...checkMembers.filter((m) => guys.includes(m.id)).map((m) => m.utilisation ?? 0));
    const slack = [...new Set(all.filter((x) => x.m.slack).map((x) => x.c))];

    const row = rowOf(text.stdout, 'All guys');
    expect(row.slice(0, 5)).toEqual(['All guys', '3 cable', (hi.m.tensionMax / 1000).toFixed(2), hi.m.id, hi.c]);
    expect(row.slice(5, 7)).toEqual([(lo.m.tensionMin / 1000).toFixed(2), lo.c]);
    expect(row[7]).toBe(util.toFixed(3));
    const failing = checkMembers.filter((m) => guys.includes(m.id) && m.status === 'fail').length;
    expect(row[row.length - 2]).toBe(failing > 0 ? `FAIL (${failing})` : 'pass');
    expect(row[row.length - 1]).toBe(slack.length === 0 ? 'never' : slack.slice(0, 3).join(', '));

    // The mast is in no group: it gets a row of its own, after the guys.
    const mast = rowOf(text.stdout, '(members in no group)');
    expect(mast[1]).toBe('1 bar');
    expect(text.stdout.indexOf('(members in no group)')).toBeGreaterThan(text.stdout.indexOf('All guys'));

    // No per-member tables in the summary; it says how to get them, and keeps the caution last.
    expect(text.stdout).not.toContain('T start kN');
    expect(text.stdout).toContain(`stayset solve ${KESTREL} --full`);
    expect(text.stdout).toContain('All 4 case(s) converged.');
    expect(text.stdout.trimEnd().endsWith('Do not use results of an analysis that did not converge.')).toBe(true);
  });

  it('--full prints the per-member tables instead, and --json is the same with or without --full', () => {
    const full = runStayset(['solve', KESTREL, '--full']);
    expect(full.code).toBe(0);
    expect(full.stdout).toContain('T start kN');
    expect(full.stdout).not.toContain('Member groups over');
    const a = JSON.parse(runStayset(['solve', KESTREL, '--json']).stdout) as { cases: CaseResult[] };
    const b = JSON.parse(runStayset(['solve', KESTREL, '--json', '--full']).stdout) as { cases: CaseResult[] };
    const strip = (cs: CaseResult[]) => cs.map((c) => ({ ...c, stats: undefined }));
    expect(strip(b.cases)).toEqual(strip(a.cases));
  });

  it('on the demo mast, the guy groups come before the mast bar groups', () => {
    const r = runStayset(['solve', 'assets/demo-mast.stayset', '--case', 'dead', '--case', 'cold']);
    expect(r.code).toBe(0);
    const at = (label: string) => r.stdout.indexOf(`\n  ${label} `);
    for (const guys of ['guys level 1', 'guys level 2', 'guys level 3', 'all guys']) {
      expect(at(guys)).toBeGreaterThan(0);
      expect(at(guys)).toBeLessThan(at('mast legs'));
      expect(at(guys)).toBeLessThan(at('mast bracing'));
    }
    expect(rowOf(r.stdout, 'mast legs')[1]).toBe('147 bar');
  });
});

describe('stayset solve (group summary) with a case that did not converge', () => {
  it('names the case and its reason, leaves it out of the group rows, and no group reads "pass"; exit 1', () => {
    // The demo mast on a single pin; its "melt" case makes the guys slack: a mechanism (tests/e2e/fixtures).
    const file = path.join(mkdtempSync(path.join(os.tmpdir(), 'stayset-melt-')), 'melt.stayset');
    writeFileSync(file, JSON.stringify(pinBaseMeltProject(JSON.parse(readFileSync('assets/demo-mast.stayset', 'utf8')) as ProjectFile)));
    const r = runStayset(['solve', file]);
    expect(r.code).toBe(1);
    const cases = (JSON.parse(runStayset(['solve', file, '--json']).stdout) as { cases: CaseResult[] }).cases;
    const melt = cases.find((c) => c.id === 'melt')!;
    expect(melt.converged).toBe(false);
    expect(r.stdout).toContain(`NOT CONVERGED (${melt.status})`);
    expect(r.stdout).toContain(melt.message!);
    expect(r.stdout).toContain('Left out (did not converge): melt.');
    // The governing tension of the guys comes from the converged cases only.
    const guys = cases.filter((c) => c.converged).flatMap((c) => c.members.filter((m) => m.id.startsWith('mast/guy L')).map((m) => ({ c: c.id, m })));
    const hi = guys.reduce((a, b) => (b.m.tensionMax > a.m.tensionMax ? b : a));
    expect(rowOf(r.stdout, 'all guys').slice(2, 5)).toEqual([(hi.m.tensionMax / 1000).toFixed(2), hi.m.id, hi.c]);
    const verdicts = ['guys level 1', 'all guys', 'mast legs'].map((g) => rowOf(r.stdout, g)[rowOf(r.stdout, g).length - 2]);
    expect(verdicts.every((v) => v !== 'pass')).toBe(true);
    expect(r.stdout).toContain('1 of 3 case(s) did NOT converge: melt.');
  });
});

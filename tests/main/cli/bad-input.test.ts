// Bad input: exit status 2, messages on stderr naming the file, the entry and the problem, and
// nothing at all on stdout.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fixture, runStayset } from './run-stayset.ts';

function expectBadInput(args: string[], ...messages: string[]): void {
  const r = runStayset(args);
  expect(r.code).toBe(2);
  expect(r.stdout).toBe('');
  for (const m of messages) expect(r.stderr).toContain(m);
}

describe('stayset solve on bad files', () => {
  const f = (name: string) => fixture(name);
  it.each([
    ['bad-missing-node.stayset.json', 'members[2] "G2": node "TOP2" does not exist'],
    ['bad-duplicate-id.stayset.json', 'members[3] "G1": id "G1" is already used by members[1]'],
    ['bad-fixed-letters.stayset.json', 'nodes[2] "AN1": "fixed" must be made of the letters x, y, z (translations) and rx, ry, rz (rotations), each at most once (got "xxz")'],
    ['bad-both-lengths.stayset.json', 'members[1] "G1": give either "pretension" or "unstressedLength", not both'],
    ['bad-typo-property.stayset.json', 'members[1] "G1": unknown property "pretention" (did you mean "pretension"?)'],
    ['bad-newer-version.stayset.json', 'this file was written by a newer Stayset (format version 3); this version reads up to 2'],
    ['bad-other-format.stayset.json', 'this is not a Stayset project file'],
    ['bad-truncated.stayset.json', 'the file is truncated: it ends at line'],
    ['bad-empty.stayset.json', 'the file is empty'],
    ['bad-not-json.stayset.json', 'not valid JSON at line 1, column 1'],
  ])('%s', (name, message) => {
    expectBadInput(['solve', f(name)], `${f(name)}: `, message);
  });

  it('lists every problem of a file, one per line', () => {
    const r = runStayset(['solve', f('bad-many-problems.stayset.json')]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trimEnd().split('\n');
    expect(lines).toHaveLength(6);
    expect(lines.every((l) => l.startsWith(`${f('bad-many-problems.stayset.json')}: `))).toBe(true);
  });

  it('a file that is not UTF-8 is refused by name; a UTF-8 byte-order mark is accepted', () => {
    // UTF-8 (RFC 3629): the lone byte 0xE9 (é in Latin-1) is not a valid sequence.
    const dir = mkdtempSync(join(tmpdir(), 'stayset-utf8-'));
    try {
      const latin1 = join(dir, 'latin1.stayset.json');
      writeFileSync(latin1, Buffer.concat([Buffer.from('{"format": "stayset-project", "note": "'), Buffer.from([0xe9]), Buffer.from('"}')]));
      expectBadInput(['validate', latin1], `${latin1}: is not UTF-8 text`);
      const bom = join(dir, 'bom.stayset.json');
      writeFileSync(bom, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), readFileSync(f('axial-bar.stayset.json'))]));
      expect(runStayset(['validate', bom]).code).toBe(0);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('missing file and a folder instead of a file', () => {
    expectBadInput(['solve', 'no-such-project.stayset.json'], 'no-such-project.stayset.json: no such file');
    expectBadInput(['solve', 'tests/fixtures/projects'], 'tests/fixtures/projects: is a folder, not a project file');
  });

  it('bad options and arguments', () => {
    const ok = f('axial-bar.stayset.json');
    expectBadInput(['solve'], 'stayset: solve: solve needs a project FILE', 'Usage: stayset solve FILE');
    expectBadInput(['solve', ok, ok], 'solve takes one FILE (got 2)');
    expectBadInput(['solve', ok, '--jsno'], 'unknown option "--jsno"');
    expectBadInput(['solve', ok, '--case'], 'option "--case" needs a value');
    expectBadInput(['solve', ok, '--json=yes'], 'option "--json" takes no value');
    expectBadInput(['solve', ok, '--case', 'storm'], 'unknown case "storm" (the file has: pull)');
  });
});

describe('stayset validate', () => {
  it('a valid file: summary line, exit 0', () => {
    const r = runStayset(['validate', fixture('kestrel-moor-mast.stayset.json')]);
    expect(r).toEqual({
      code: 0,
      stdout: `${fixture('kestrel-moor-mast.stayset.json')}: valid: 5 nodes, 4 members, 2 sections, 3 load cases, 1 combination\n`,
      stderr: '',
    });
  });

  it('an invalid file: every message on stderr, exit 2; --json also reports them on stdout', () => {
    const bad = fixture('bad-many-problems.stayset.json');
    const r = runStayset(['validate', bad]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(6);
    const j = runStayset(['validate', bad, '--json']);
    expect(j.code).toBe(2);
    const out = JSON.parse(j.stdout) as { valid: boolean; errors: string[] };
    expect(out.valid).toBe(false);
    expect(out.errors).toEqual(r.stderr.trimEnd().split('\n'));
  });
});

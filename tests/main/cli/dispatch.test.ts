// The dispatcher: help, version, unknown commands and options.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { REPO_ROOT, runStayset } from './run-stayset.ts';

describe('stayset dispatcher', () => {
  it('--help lists the commands on stdout, exit 0', () => {
    const r = runStayset(['--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Commands:\n\s+solve\s+analyse a project file/);
    expect(r.stdout).toContain('qualified engineer');
    expect(r.stderr).toBe('');
  });

  it('help solve and solve --help show the command help', () => {
    for (const args of [['help', 'solve'], ['solve', '--help']]) {
      const r = runStayset(args);
      expect(r.code).toBe(0);
      expect(r.stdout.startsWith('Usage: stayset solve FILE [--full] [--json] [--case ID ...]')).toBe(true);
      expect(r.stdout).toContain('Exit status:');
    }
  });

  it('--version prints the package version', () => {
    const pkg = JSON.parse(readFileSync(`${REPO_ROOT}package.json`, 'utf8')) as { version: string };
    const r = runStayset(['--version']);
    expect(r).toEqual({ code: 0, stdout: `stayset ${pkg.version}\n`, stderr: '' });
  });

  it('unknown command, unknown option, help for an unknown command, no arguments: exit 2', () => {
    const cases: [string[], string][] = [
      [['solv', 'x.json'], 'stayset: unknown command "solv" (did you mean "solve"?)'],
      [['--frobnicate'], 'stayset: unknown option "--frobnicate"'],
      [['help', 'frobnicate'], 'stayset: unknown command "frobnicate"'],
      [[], 'Usage:'],
    ];
    for (const [args, message] of cases) {
      const r = runStayset(args);
      expect(r.code).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr).toContain(message);
    }
  });
});

describe('stayset from another folder', () => {
  it('finds its sources relative to the bin and resolves FILE against the working folder', async () => {
    const { tmpdir } = await import('node:os');
    const { mkdtempSync, copyFileSync } = await import('node:fs');
    const dir = mkdtempSync(`${tmpdir()}/stayset-cli-`);
    copyFileSync(`${REPO_ROOT}tests/fixtures/projects/axial-bar.stayset.json`, `${dir}/bar.stayset.json`);
    const before = readFileSync(`${dir}/bar.stayset.json`, 'utf8');
    const r = runStayset(['solve', 'bar.stayset.json', '--json'], dir);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).cases[0].id).toBe('pull');
    expect(readFileSync(`${dir}/bar.stayset.json`, 'utf8')).toBe(before);
  });
});

// `stayset check`: pass/fail summary and exit statuses 0 / 1 / 2 / 3, run through the real bin.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { fixture, runStayset } from './run-stayset.ts';

const dir = mkdtempSync(path.join(tmpdir(), 'stayset-check-'));
const canopy = (): ProjectFile => JSON.parse(readFileSync('assets/demo-canopy.stayset', 'utf8')) as ProjectFile;
function writeProject(name: string, p: ProjectFile): string {
  const f = path.join(dir, name);
  writeFileSync(f, JSON.stringify(p));
  return f;
}

describe('stayset check', () => {
  it('passes the demo canopy: exit 0, summary table, caution line', () => {
    const r = runStayset(['check', 'assets/demo-canopy.stayset']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/CHECK PASSED/);
    expect(r.stdout).toMatch(/Highest utilisation/);
    expect(r.stdout).toContain('for review by a qualified engineer; local codes and licensed practice govern');
  });

  it('a failed check gives exit 3 and names the member, case and ratio', () => {
    const p = canopy();
    p.designBasis = { format: 'allowable', allowable: { cableSafetyFactor: 10 } };
    const r = runStayset(['check', writeProject('tight.stayset', p)]);
    expect(r.code).toBe(3);
    expect(r.stdout).toMatch(/CHECK FAILED: \d+ failure/);
    expect(r.stdout).toMatch(/cable resistance\s+canopy\/\S+/);
  });

  it('--json gives the check report with the worst failures and the disclaimer', () => {
    const p = canopy();
    p.checks = { displacementLimits: [{ node: 'canopy/N11-0', limit: 0.05 }] };
    const r = runStayset(['check', writeProject('disp.stayset', p), '--json']);
    expect(r.code).toBe(3);
    const out = JSON.parse(r.stdout);
    const f = out.check.failures.find((x: { code: string }) => x.code === 'displacement');
    expect(f.item).toBe('canopy/N11-0');
    expect(f.source).toBe('project file (checks.displacementLimits)');
    expect(f.case).toBe('snow');
    expect(f.ratio).toBeCloseTo(f.value / 0.05, 9);
    expect(out.disclaimer).toMatch(/qualified engineer/);
  });

  it('check settings naming a missing group: exit 2, message names the entry', () => {
    const p = canopy();
    p.checks = { noSlackGroups: ['canopy/nothing'] };
    const r = runStayset(['check', writeProject('badgroup.stayset', p)]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/noSlackGroups.*group "canopy\/nothing" does not exist/);
  });

  it('missing file: exit 2', () => {
    const r = runStayset(['check', 'no-such.stayset']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('no-such.stayset: no such file');
  });

  it('a case that does not converge: exit 1', () => {
    const r = runStayset(['check', fixture('mechanism-free-node.stayset.json')]);
    expect(r.code).toBe(1);
  });
});

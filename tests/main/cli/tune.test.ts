import { describe, expect, it } from 'vitest';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fixture, REPO_ROOT, runStayset } from './run-stayset.ts';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- free-form edits of a JSON fixture
function copyOfMast(edit?: (p: any) => void): { dir: string; file: string } {
  const dir = mkdtempSync(join(tmpdir(), 'stayset-tune-'));
  const file = join(dir, 'mast.stayset.json');
  copyFileSync(join(REPO_ROOT, fixture('kestrel-moor-mast.stayset.json')), file);
  if (edit) {
    const p = JSON.parse(readFileSync(file, 'utf8'));
    edit(p);
    writeFileSync(file, JSON.stringify(p, null, 2));
  }
  return { dir, file };
}

describe('stayset tune', () => {
  it('meets a tension-share target, writes the pretensions atomically and keeps a .bak', () => {
    const { file } = copyOfMast((p) => { p.tuning.targets = [{ kind: 'tensionShare', group: 'guys', share: 0.12 }]; });
    const before = readFileSync(file, 'utf8');
    const r = runStayset(['tune', file, '--write', '--json']);
    expect(r.stderr).toContain('tuned pretensions written');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.status).toBe('met');
    expect(out.targets[0].value).toBeCloseTo(0.12, 3);
    expect(out.disclaimer).toMatch(/qualified engineer/);
    expect(readFileSync(`${file}.bak`, 'utf8')).toBe(before);
    const saved = JSON.parse(readFileSync(file, 'utf8'));
    for (const m of saved.members.filter((x: { groups?: string[] }) => x.groups?.includes('guys'))) {
      expect(m.pretension).toBeCloseTo(out.variables[0].final, 6);
    }
    expect(saved.tuning.lastRun.summary).toContain('1 of 1 targets met');
    // A second run starts at the tuned state: already met, no iteration needed.
    const again = runStayset(['tune', file, '--json']);
    expect(again.code).toBe(0);
    expect(JSON.parse(again.stdout).iterations).toBe(0);
  });

  it('exits 3 and explains when a target cannot be met within the bounds', () => {
    const { file } = copyOfMast((p) => { p.tuning.targets = [{ kind: 'sag', group: 'guys', case: 'dead', limit: { absolute: 0.01 } }]; });
    const r = runStayset(['tune', file]);
    expect(r.code).toBe(3);
    expect(r.stdout).toMatch(/above its upper bound 40\.00 kN/);
    expect(r.stdout).toMatch(/NO/);
  });

  it('exits 2 on bad input, naming the entry, and writes nothing', () => {
    const { file } = copyOfMast((p) => { p.tuning.variables[0].group = 'stays'; });
    const before = readFileSync(file, 'utf8');
    const r = runStayset(['tune', file, '--write']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/variables\[0\].*"stays".*does not exist/);
    expect(r.stdout).toBe('');
    expect(readFileSync(file, 'utf8')).toBe(before);
    expect(existsSync(`${file}.bak`)).toBe(false);
    const none = copyOfMast((p) => { delete p.tuning; });
    const r2 = runStayset(['tune', none.file]);
    expect(r2.code).toBe(2);
    expect(r2.stderr).toMatch(/no "tuning" section/);
  });

  it('exits 1 and writes nothing when a case does not converge', () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-tune-'));
    const file = join(dir, 'mech.stayset.json');
    const p = JSON.parse(readFileSync(join(REPO_ROOT, fixture('mechanism-free-node.stayset.json')), 'utf8'));
    p.members[0].groups = ['rods'];
    // No pretension: the bar gives node B no sideways stiffness (a mechanism at the start).
    p.members[0].kind = 'cable';
    p.tuning = { variables: [{ group: 'rods', by: 'pretension', min: 1e-6, max: 1e-3 }], targets: [{ kind: 'noSlack', group: 'rods', case: 'dead' }] };
    writeFileSync(file, JSON.stringify(p));
    const before = readFileSync(file, 'utf8');
    const r = runStayset(['tune', file, '--write']);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/did not converge/);
    expect(readFileSync(file, 'utf8')).toBe(before);
    expect(existsSync(`${file}.bak`)).toBe(false);
  });

  it('prints kip in the tables when the project displays US units (1 kip = 4448.2216152605 N, NIST SP 811)', () => {
    const { file } = copyOfMast((p) => { p.display = { units: 'US' }; });
    const r = runStayset(['tune', file]);
    expect(r.code).toBe(0);
    // 15 kN pretension = 15000 / 4448.2216152605 = 3.372 kip (0.001 kip: the force precision in kip).
    expect(r.stdout).toMatch(/3\.372 kip/);
  });

  it('tunes the demo mast on two threads to the serial run\'s output, bit for bit (STAYSET_WORKERS=1 is the serial run)', () => {
    const demo = join(REPO_ROOT, 'assets', 'demo-mast.stayset');
    const saved = process.env.STAYSET_WORKERS;
    const run = (workers: string) => { process.env.STAYSET_WORKERS = workers; return runStayset(['tune', demo, '--json']); };
    try {
      const serial = run('1');
      const two = run('2');
      expect(serial.code).toBe(0);
      expect(two.code).toBe(0);
      expect(two.stdout).toBe(serial.stdout);
      expect(JSON.parse(two.stdout).status).toBe('met');
    } finally {
      if (saved === undefined) delete process.env.STAYSET_WORKERS;
      else process.env.STAYSET_WORKERS = saved;
    }
  });
});

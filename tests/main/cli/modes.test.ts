// `stayset modes` end to end: a one-DOF spring–mass against its closed form, the refusals and
// the caution line.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { ModalAnalysis, ProjectFile } from '../../../solver/index.ts';
import { fixture, runStayset } from './run-stayset.ts';

const EA = 200e9 * 1e-4, L = 2, MASS = 50;

/** A massless bar A–B along x, B carrying a node mass and held in y and z: one axial DOF. */
function springMassFile(): string {
  const project: ProjectFile = {
    format: 'stayset-project', version: 1,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [L, 0, 0], fixed: 'yz', mass: MASS }],
    sections: [{ id: 'rod', E: 200e9, area: 1e-4 }],
    members: [{ id: 'R', kind: 'bar', from: 'A', to: 'B', section: 'rod' }],
    loadCases: [{ id: 'rest', selfWeight: false }],
  };
  const file = join(mkdtempSync(join(tmpdir(), 'stayset-modes-')), 'spring.stayset');
  writeFileSync(file, JSON.stringify(project));
  return file;
}

describe('stayset modes', () => {
  it('one spring, one mass: f = √(k/m) / 2π with k = EA/L (closed form of the undamped oscillator); fewer modes than asked is said', () => {
    const r = runStayset(['modes', springMassFile(), '--case', 'rest', '-n', '3', '--json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { modes: ModalAnalysis; disclaimer: string };
    expect(out.disclaimer).toMatch(/qualified engineer/);
    expect(out.modes.modes).toHaveLength(1);
    expect(out.modes.modes[0].frequency / (Math.sqrt(EA / L / MASS) / (2 * Math.PI))).toBeCloseTo(1, 10);
    expect(out.modes.modes[0].effectiveMassShare).toEqual([1, 0, 0].map((v) => expect.closeTo(v, 10)));
    expect(out.modes.notes).toContainEqual({ code: 'fewerModesThanRequested', requested: 3, available: 1 });
  });

  it('prints a table with the caution', () => {
    const r = runStayset(['modes', springMassFile(), '--case', 'rest']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/f Hz/);
    expect(r.stdout).toMatch(/qualified engineer/);
  });

  it('refuses a case that did not converge, with the reason, exit 1', () => {
    const r = runStayset(['modes', fixture('mechanism-free-node.stayset.json'), '--case', 'dead']);
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/no modes: case "dead" did not converge \(singular\)/);
  });

  it('bad input: no --case, an unknown case, a bad count (exit 2)', () => {
    const file = springMassFile();
    expect(runStayset(['modes', file]).code).toBe(2);
    const unknown = runStayset(['modes', file, '--case', 'storm']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/unknown case "storm"/);
    expect(runStayset(['modes', file, '--case', 'rest', '-n', '0']).stderr).toMatch(/--count must be a whole number/);
  });
});

// What a valid project file looks like: the reference example, the full demo fixture, and the
// letter rule for "fixed" (each of x, y, z at most once, any order; common practice for naming
// restrained translations).
import { describe, expect, it } from 'vitest';
import { parseProjectText, validateProject } from '../../../../main/common/project/index.ts';
import { SPEC_SUBSET, fixtureJson, fixtureText } from './fixtures.ts';

function withFixed(fixed: string): unknown {
  const doc = JSON.parse(SPEC_SUBSET) as { nodes: { fixed?: string }[] };
  doc.nodes[0].fixed = fixed;
  return doc;
}

describe('valid project files', () => {
  it('accepts the reference example exactly as written and keeps it unchanged (no defaults filled in)', () => {
    const r = parseProjectText(SPEC_SUBSET);
    expect(r).toEqual({ ok: true, project: JSON.parse(SPEC_SUBSET) });
  });

  it('accepts the demo mast with every optional section', () => {
    const doc = fixtureJson('kestrel-moor-mast.stayset.json');
    for (const key of ['meta', 'groups', 'combinations', 'checks', 'tuning', 'installation', 'display']) {
      expect(doc).toHaveProperty(key);
    }
    const r = parseProjectText(fixtureText('kestrel-moor-mast.stayset.json'));
    expect(r.ok ? [] : r.errors).toEqual([]);
  });

  it('accepts wind, ice, generators and every tuning target kind', () => {
    // eslint-disable-next-line @typescript-eslint/no-explicit-any -- a document edited freely
    const doc = fixtureJson('kestrel-moor-mast.stayset.json') as Record<string, any>;
    doc.loadCases.push({
      id: 'storm',
      wind: { direction: 90, speed: 30, profile: { kind: 'log', roughnessLength: 0.05 }, airDensity: 1.25, groups: ['guys'] },
      ice: { thickness: 0.01, density: 900, groups: ['guys'] },
    });
    doc.loadCases.push({ id: 'breeze', wind: { direction: 0, speed: 10, profile: { kind: 'power', exponent: 0.14 } } });
    doc.loadCases.push({ id: 'calm', wind: { direction: 0, speed: 0, profile: { kind: 'uniform' } } });
    doc.sections[0].lattice = { faceWidth: 0.6, solidity: 0.25, dragFactor: 2.2 };
    doc.generators = [{ id: 'gen1', kind: 'guyedMast', params: { height: 30, levels: [1, 2] } }];
    doc.members[0].generatedBy = 'gen1';
    doc.tuning.targets.push({ kind: 'tensionShare', group: 'guys', share: 0.1 });
    doc.tuning.targets.push({ kind: 'reaction', node: 'BASE', case: 'storm', limit: 80000 });
    doc.tuning.lastRun = { date: '2024-05-01T10:00:00Z', summary: 'invented' };
    const r = validateProject(doc);
    expect(r.ok ? [] : r.errors).toEqual([]);
  });

  it.each(['', 'x', 'z', 'xy', 'yx', 'xyz', 'zyx', 'yz'])('fixed "%s" is accepted', (fixed) => {
    expect(validateProject(withFixed(fixed)).ok).toBe(true);
  });

  it.each(['xx', 'xyzx', 'a', 'X', 'x y', 'xyzz'])('fixed "%s" is rejected', (fixed) => {
    const r = validateProject(withFixed(fixed));
    expect(r.ok ? [] : r.errors).toEqual([
      `nodes[0] "A": "fixed" must be made of the letters x, y, z (translations) and rx, ry, rz (rotations), each at most once (got ${JSON.stringify(fixed)})`,
    ]);
  });

  it('does not change the object it validates', () => {
    const doc = fixtureJson('kestrel-moor-mast.stayset.json');
    const copy = structuredClone(doc);
    validateProject(doc);
    expect(doc).toEqual(copy);
  });
});

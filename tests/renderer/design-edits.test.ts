/**
 * Edits behind the combinations, groups and check-settings editors, through the project store:
 * accepted edits are undoable single steps; edits the file validator (main/common/project)
 * rejects are refused with its message and change nothing.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { addCombination, deleteCombination, factorOf, setFactor } from '../../renderer/model/combination-edits.ts';
import { addGroup, parseIdList, setGroupMembers } from '../../renderer/model/group-edits.ts';
import { setCableFactor, setTiltLimit } from '../../renderer/model/check-settings-edits.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;

describe('combination, group and check-setting edits', () => {
  beforeEach(() => setActivePinia(createPinia()));
  const loaded = () => {
    const s = useProjectStore();
    s.load({ path: '/projects/demo.stayset', name: 'demo.stayset', project: demo });
    return s;
  };

  it('sets, orders and removes combination factors; one undo step each', () => {
    const s = loaded();
    const combo = demo.combinations![0];
    expect(s.edit('Factor', (p) => setFactor(p, 0, 'wind 0', 0.9)).ok).toBe(true);
    const c = s.project!.combinations![0];
    expect(factorOf(c, 'wind 0')).toBe(0.9);
    // Factors follow the project's load-case order ('dead', 'wind 0', …, 'gust 90 only').
    expect(c.factors.map((f) => f.case)).toEqual(['dead', 'wind 0', 'gust 90 only']);
    expect(s.edit('Remove', (p) => setFactor(p, 0, 'dead', null)).ok).toBe(true);
    expect(factorOf(s.project!.combinations![0], 'dead')).toBeNull();
    s.undo();
    s.undo();
    expect(s.project!.combinations![0]).toEqual(combo);
  });

  it('adds a combination with a fresh id and deletes it', () => {
    const s = loaded();
    s.edit('Add', addCombination);
    const added = s.project!.combinations!.at(-1)!;
    expect(added.id).toBe('C1');
    expect(added.factors).toEqual([{ case: 'dead', factor: 1 }]);
    s.edit('Delete', (p) => deleteCombination(p, p.combinations!.length - 1));
    expect(s.project!.combinations).toEqual(demo.combinations);
  });

  it('refuses a combination id that a load case already has, with the validator message', () => {
    const s = loaded();
    const before = s.project;
    const r = s.edit('Rename', (p) => ({ ...p, combinations: p.combinations!.map((c, i) => (i === 0 ? { ...c, id: 'dead' } : c)) }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.join('\n')).toMatch(/dead/);
    expect(s.project).toBe(before);
  });

  it('groups: parses id lists, refuses unknown members, adds from a selection', () => {
    expect(parseIdList(' a, b\nc,, a ')).toEqual(['a', 'b', 'c']);
    const s = loaded();
    const r = s.edit('Members', (p) => setGroupMembers(p, 2, ['mast/guy L1-1', 'no such member']));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.join('\n')).toContain('no such member');
    expect(s.edit('Add group', (p) => addGroup(p, ['mast/guy L1-1', 'mast/guy L2-1'])).ok).toBe(true);
    expect(s.project!.groups!.at(-1)).toEqual({ id: 'G1', members: ['mast/guy L1-1', 'mast/guy L2-1'] });
  });

  it('check settings: the cable factor of the basis, tilt limit stored as a ratio', () => {
    const allowable = { ...demo, designBasis: { format: 'allowable' as const } };
    expect(() => setCableFactor(allowable, 0.5)).toThrow(/designBasis.allowable.cableSafetyFactor: 0.5 must be at least 1/);
    expect(setCableFactor(allowable, 2.5).designBasis).toEqual({ format: 'allowable', allowable: { cableSafetyFactor: 2.5 } });
    const limit = { ...demo, designBasis: undefined };
    expect(() => setCableFactor(limit, 0)).toThrow(/designBasis.cable.partialFactor/);
    expect(setCableFactor(limit, 0.9).designBasis).toEqual({ format: 'limitState', cable: { partialFactor: 0.9 } });
    expect(setTiltLimit(demo, 0, 1 / 250).checks!.tiltLimits![0]).toEqual({ base: 'mast/base', top: 'mast/P49a', limit: 0.004 });
    expect(allowable.designBasis).toEqual({ format: 'allowable' }); // input untouched
  });
});

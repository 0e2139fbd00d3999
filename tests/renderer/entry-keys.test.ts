/**
 * Stable row keys of the file lists edited by EntryList (renderer/model/entry-keys.ts), driven
 * through the project store's real edits, undo and redo on the check rules: removing a middle rule
 * leaves the keys of the rules around it unchanged, and undo brings the removed rule back with its
 * own key — so an open row (or a half-typed field) never slides onto its neighbour. The behaviour
 * checked is Vue's keyed list rule: a row's DOM and state follow its key (vuejs.org, "Maintaining
 * State with key").
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { toRaw } from 'vue';
import type { ProjectFile } from '../../solver/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { editCheckRule } from '../../renderer/model/design-data-edits.ts';
import { EntryKeys } from '../../renderer/model/entry-keys.ts';
import { mastWithoutOwnActions } from './editor-demos.ts';

const mast = mastWithoutOwnActions();
const groups = mast.groups!.map((g) => g.id).slice(0, 3);

describe('stable keys of check-rule rows', () => {
  beforeEach(() => setActivePinia(createPinia()));

  const rules = (p: ProjectFile | null) => (p?.checks?.minimumTension ?? []).map((r) => toRaw(r) as object);

  it('remove a middle rule, undo, redo: the other rows keep their keys, the restored row gets its own back', () => {
    expect(groups.length).toBe(3);
    const store = useProjectStore();
    store.load({ path: '/p/p.stayset', name: 'p.stayset', project: mast });
    const keys = new EntryKeys();
    for (const [k, g] of groups.entries()) {
      const r = store.edit(`add ${g}`, (p) => editCheckRule(p, 'minimumTension', k, { group: g, shareOfInstallation: 0.1 * (k + 1) }));
      expect(r.ok).toBe(true);
      keys.keysOf(rules(store.project));
    }
    const before = keys.keysOf(rules(store.project));
    expect(new Set(before).size).toBe(3);
    const [first, middle, last] = before;

    expect(store.edit('remove middle', (p) => editCheckRule(p, 'minimumTension', 1, undefined)).ok).toBe(true);
    expect(rules(store.project).map((r) => (r as { group: string }).group)).toEqual([groups[0], groups[2]]);
    expect(keys.keysOf(rules(store.project))).toEqual([first, last]);
    expect(keys.fresh.size).toBe(0);

    expect(store.undo()).toBe(true);
    expect(keys.keysOf(rules(store.project))).toEqual([first, middle, last]);
    expect(keys.fresh.size).toBe(0); // brought back, not added: it does not open as a new row

    expect(store.redo()).toBe(true);
    expect(keys.keysOf(rules(store.project))).toEqual([first, last]);
  });

  it('an edited rule keeps its key; an added rule gets a fresh one; removing the first shifts no key', () => {
    const store = useProjectStore();
    store.load({ path: '/p/p.stayset', name: 'p.stayset', project: mast });
    const keys = new EntryKeys();
    for (const [k, g] of groups.entries()) store.edit(`add ${g}`, (p) => editCheckRule(p, 'minimumTension', k, { group: g, shareOfInstallation: 0.1 }));
    const [a, b, c] = keys.keysOf(rules(store.project));
    store.edit('edit middle', (p) => editCheckRule(p, 'minimumTension', 1, { group: groups[1], shareOfBreaking: 0.05 }));
    expect(keys.keysOf(rules(store.project))).toEqual([a, b, c]);
    store.edit('add', (p) => editCheckRule(p, 'minimumTension', 3, { group: groups[0], shareOfBreaking: 0.02 }));
    const withAdded = keys.keysOf(rules(store.project));
    expect(withAdded.slice(0, 3)).toEqual([a, b, c]);
    expect(keys.fresh).toEqual(new Set([withAdded[3]]));
    expect([a, b, c]).not.toContain(withAdded[3]);
    store.edit('remove first', (p) => editCheckRule(p, 'minimumTension', 0, undefined));
    expect(keys.keysOf(rules(store.project))).toEqual([b, c, withAdded[3]]);
  });

  it('two equal entries still get distinct keys', () => {
    const keys = new EntryKeys();
    const e = { group: 'g' };
    const k = keys.keysOf([e, e, { group: 'g' }]);
    expect(new Set(k).size).toBe(3);
  });
});

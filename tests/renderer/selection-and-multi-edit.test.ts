import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { useSelectionStore } from '../../renderer/stores/selection.ts';
import { MEMBER_COLUMNS } from '../../renderer/tables/columns.ts';
import { parseCell } from '../../renderer/tables/cell-edit.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../e2e/fixtures/demo-mast.stayset.json', import.meta.url)), 'utf8')) as ProjectFile;

describe('selection and multi-row edits', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('selects, toggles additively and prunes ids that no longer exist', () => {
    const s = useSelectionStore();
    s.select('member', ['GL1']);
    expect(s.single).toEqual({ kind: 'member', id: 'GL1' });
    s.select('member', ['GL2', 'GL1'], true);
    expect([...s.memberIds]).toEqual(['GL2']);
    s.select('node', ['TOP']);
    expect(s.memberIds.size).toBe(0);
    s.prune(new Set(['BASE']), new Set());
    expect(s.count).toBe(0);
  });

  it('sets one column for several rows in one undoable step; pretension clears unstressed length', () => {
    const p = useProjectStore();
    p.load({ path: null, name: 'demo', project: demo });
    const col = MEMBER_COLUMNS.find((c) => c.key === 'pretension')!;
    const parsed = parseCell(col, '10.5 kN', 'SI', 'members pretension');
    expect(parsed).toEqual({ ok: true, value: 10500 });
    const upper = [3, 5, 7]; // GU1, GU2, GU3
    const r = p.updateRowsIn('members', upper, (m) => col.set!(m, parsed.ok ? parsed.value : 0), 'Pretension of 3 members');
    expect(r.ok).toBe(true);
    expect(upper.map((i) => p.project!.members[i].pretension)).toEqual([10500, 10500, 10500]);
    const ul = MEMBER_COLUMNS.find((c) => c.key === 'unstressedLength')!;
    const r2 = p.updateRowsIn('members', [3], (m) => ul.set!(m, 47.1), 'Unstressed length of GU1');
    expect(r2.ok).toBe(true);
    expect(p.project!.members[3].pretension).toBeUndefined();
    expect(p.project!.members[3].unstressedLength).toBe(47.1);
    p.undo();
    p.undo();
    expect(p.project!.members[3].pretension).toBe(12000);
  });

  it('refuses whole-number columns with fractions and names the field', () => {
    const seg = MEMBER_COLUMNS.find((c) => c.key === 'segments')!;
    expect(parseCell(seg, '2.5', 'SI', 'members[1] "M" segments')).toEqual({ ok: false, error: 'members[1] "M" segments: "2.5" is not a whole number ≥ 1' });
  });
});

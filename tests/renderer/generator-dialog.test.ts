/**
 * What the Generate dialog applies: a new guyed-mast record placed beside the model (no new node
 * closer than the clearance to an existing one), under an id no existing part prefix uses, is
 * one undoable edit accepted by the file validator; re-running the demo's own record replaces
 * exactly its parts (runGenerator, main/common/generators) and keeps a user member.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { GeneratorRecord, ProjectFile } from '../../solver/index.ts';
import { runGenerator, type GuyedMastParams } from '../../main/common/generators/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { besideModel, defaultGuyedMast, defaultRadialNet, defaultSaddleNet, newRecordId } from '../../renderer/generators/generator-defaults.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;

describe('Generate dialog edits', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('a new mast beside the model is one validated, undoable step', () => {
    const s = useProjectStore();
    s.load({ path: '/p/demo.stayset', name: 'demo.stayset', project: demo });
    const id = newRecordId(demo, 'guyedMast');
    expect(id).toBe('mast 1'); // "mast" is taken by the demo's record and its part prefix
    const base = besideModel(demo, 40);
    const record: GeneratorRecord = { id, kind: 'guyedMast', params: defaultGuyedMast(base) as unknown as Record<string, unknown> };
    const r = s.edit(`Generate ${id}`, (p) => runGenerator(p, record).project);
    expect(r).toEqual({ ok: true });
    const added = s.project!.nodes.filter((n) => n.id.startsWith(`${id}/`));
    expect(added.length).toBeGreaterThan(0);
    let closest = Infinity;
    for (const a of added) for (const b of demo.nodes) closest = Math.min(closest, Math.hypot(a.at[0] - b.at[0], a.at[1] - b.at[1], a.at[2] - b.at[2]));
    // Demo anchors sit 42 m from the axis; new anchors 16 m from a base 40 m past the largest x.
    expect(closest).toBeGreaterThan(20);
    s.undo();
    expect(s.project).toBe(demo);
  });

  it('re-running the demo record with new levels replaces its parts and keeps a user member', () => {
    const user = { id: 'my stay', kind: 'cable' as const, from: 'mast/A1', to: 'mast/P16a', section: 'mast/guy L1', pretension: 5000 };
    const withUser: ProjectFile = { ...demo, members: [...demo.members, user] };
    const rec = demo.generators![0];
    const params = { ...(rec.params as unknown as GuyedMastParams), guySegments: 6 };
    const out = runGenerator(withUser, { ...rec, params: params as unknown as Record<string, unknown> });
    expect(out.project.members.find((m) => m.id === 'my stay')).toEqual(user);
    expect(out.project.members.filter((m) => m.generatedBy === rec.id).length).toBe(demo.members.filter((m) => m.generatedBy === rec.id).length);
    expect(out.project.members.find((m) => m.id === 'mast/guy L1-1')!.segments).toBe(6);
  });

  it('the canopy defaults are accepted by their generators', () => {
    for (const [kind, params] of [['saddleNet', defaultSaddleNet([0, 60, 0])], ['radialNet', defaultRadialNet([0, -60, 0])]] as const) {
      const out = runGenerator(demo, { id: newRecordId(demo, kind), kind, params: params as unknown as Record<string, unknown> });
      expect(out.project.members.length).toBeGreaterThan(demo.members.length);
    }
  });
});

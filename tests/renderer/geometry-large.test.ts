/**
 * Scale: building the 3D view's geometry for a 20,000-member cable net (invented 100 × 100 grid)
 * from a report, and one validated table edit at that size. Behaviour only (no clock).
 */
import { describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { buildLineBuffers } from '../../renderer/view3d/line-buffers.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { net } from './net-fixture.ts';

describe('20,000-member geometry', () => {
  const { project, result } = net(100); // 2 × 101 × 100 = 20,200 members
  it('builds scene data and merged line buffers', () => {
    expect(project.members.length).toBeGreaterThanOrEqual(20000);
    const data = buildSceneData(project, { result, deformationScale: 10, colour: 'tension' });
    const buffers = buildLineBuffers(data);
    expect(buffers.slack.segmentCount).toBeGreaterThan(0);
    expect(buffers.taut.segmentCount).toBeGreaterThan(0);
  });

  it('one validated table edit at 20,000 members', () => {
    setActivePinia(createPinia());
    const s = useProjectStore();
    s.load({ path: null, name: 'net', project });
    const r = s.updateRowsIn('members', [10], (m) => ({ ...m, pretension: 6000 }), 'p');
    expect(r.ok).toBe(true);
    expect(s.project!.members[10].pretension).toBe(6000);
  });
});

/**
 * Benchmark: building the 3D view's geometry for a 20,000-member cable net (invented 100 × 100
 * grid) from a report, and the cost of one validated table edit at that size. Prints timings; the
 * bounds are generous so the test fails only on an order-of-magnitude regression.
 */
import { describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';
import { buildLineBuffers } from '../../renderer/view3d/line-buffers.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { net } from './net-fixture.ts';

describe('20,000-member geometry', () => {
  const { project, result } = net(100); // 2 × 101 × 100 = 20,200 members
  it('builds scene data and merged line buffers quickly', () => {
    expect(project.members.length).toBeGreaterThanOrEqual(20000);
    const t0 = performance.now();
    const data = buildSceneData(project, { result, deformationScale: 10, colour: 'tension' });
    const t1 = performance.now();
    const buffers = buildLineBuffers(data);
    const t2 = performance.now();
    console.log(`20k members: scene data ${(t1 - t0).toFixed(0)} ms, line buffers ${(t2 - t1).toFixed(0)} ms, ${buffers.taut.segmentCount + buffers.slack.segmentCount} segments`);
    expect(buffers.slack.segmentCount).toBeGreaterThan(0);
    expect(t2 - t0).toBeLessThan(3000);
  });

  it('one validated table edit at 20,000 members', () => {
    setActivePinia(createPinia());
    const s = useProjectStore();
    s.load({ path: null, name: 'net', project });
    const t0 = performance.now();
    const r = s.updateRowsIn('members', [10], (m) => ({ ...m, pretension: 6000 }), 'p');
    const dt = performance.now() - t0;
    console.log(`20k members: validated edit ${dt.toFixed(0)} ms`);
    expect(r.ok).toBe(true);
    expect(dt).toBeLessThan(5000);
  });
});

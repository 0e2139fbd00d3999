// The 3D view with beam-columns and rotational supports: rotation letters (rx, ry, rz) do not
// count as translations, beams are their own kind and are drawn with the bar lines.
import { describe, expect, it } from 'vitest';
import { buildSceneData, supportLevel } from '../../renderer/view3d/scene-data.ts';
import { buildLineBuffers } from '../../renderer/view3d/line-buffers.ts';
import type { ProjectFile } from '../../solver/index.ts';

describe('scene data with beams', () => {
  it('support level reads translations only', () => {
    expect(supportLevel('xyrz')).toBe(1);
    expect(supportLevel('xyzrxryrz')).toBe(2);
    expect(supportLevel('rxryrz')).toBe(1);
  });

  it('a beam member is kind 2 and drawn among the bars', () => {
    const p: ProjectFile = {
      format: 'stayset-project', version: 1,
      nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyzrxryrz' }, { id: 'B', at: [0, 0, 5] }, { id: 'C', at: [4, 0, 0], fixed: 'xyz' }],
      sections: [{ id: 's', E: 2e11, G: 8e10, area: 1e-3, Iy: 1e-6, Iz: 1e-6, J: 2e-6 }, { id: 'g', E: 1.6e11, area: 1e-4 }],
      members: [{ id: 'M', kind: 'beam', from: 'A', to: 'B', section: 's' }, { id: 'G', kind: 'cable', from: 'B', to: 'C', section: 'g' }],
      loadCases: [{ id: 'd' }],
    };
    const data = buildSceneData(p, { result: null, deformationScale: 1, colour: 'tension' });
    expect(Array.from(data.memberKind)).toEqual([2, 0]);
    const buffers = buildLineBuffers(data);
    expect(buffers.bars.segmentCount).toBe(1);
    expect(buffers.taut.segmentCount).toBe(1);
  });
});

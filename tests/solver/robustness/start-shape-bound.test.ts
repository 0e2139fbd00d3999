import { describe, expect, it } from 'vitest';
import { buildModel, stressFreeLength } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

/**
 * The start shape of a cable never sags more than its stress-free length allows: a polygon of
 * length s between points a chord l apart lies within √((s/2)² − (l/2)²) of the chord's midpoint
 * perpendicular (the ellipse bound: every point p has |pA| + |pB| ≤ s). The start shape may be
 * stretched by the strain its weight causes (≤ 0.3 % here, the heavy case), so s = L0 (1 + 1e-2).
 * Before the bound, a 0.01 N pretension started 367 km below the chord.
 */
function project(member: Partial<ProjectFile['members'][number]>, massPerLength: number, E = 160e9): ProjectFile {
  return {
    format: 'stayset-project', version: 1,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [40, 0, 30], fixed: 'xyz' }],
    sections: [{ id: 's', E, area: 1.5e-4, massPerLength }],
    members: [{ id: 'C', kind: 'cable', from: 'A', to: 'B', section: 's', segments: 20, ...member }],
    loadCases: [{ id: 'dead' }],
  };
}

describe('cable start shape', () => {
  const cases: [string, Partial<ProjectFile['members'][number]>, number][] = [
    ['pretension 0.01 N', { pretension: 0.01 }, 1.2],
    ['pretension 1 N', { pretension: 1 }, 1.2],
    ['pretension 0', { pretension: 0 }, 1.2],
    ['pretension 1 N, heavy', { pretension: 1 }, 50],
    ['L0 = 1.3 × chord', { unstressedLength: 65 }, 1.2],
    ['L0 = chord, weightless', { unstressedLength: 50 }, 0],
  ];
  it.each(cases)('%s: every node within the bound of its stress-free length', (_name, member, mass) => {
    const p = project(member, mass);
    const model = buildModel(p);
    const n = 20;
    const L0 = member.unstressedLength ?? n * stressFreeLength(50 / n, (member.pretension ?? 0) / 1.5e-4, 160e9);
    const s = L0 * (1 + 1e-2);
    for (let i = 0; i < model.nodeCount; i++) {
      const x = model.coords.subarray(3 * i, 3 * i + 3);
      const dA = Math.hypot(x[0], x[1], x[2]), dB = Math.hypot(x[0] - 40, x[1], x[2] - 30);
      expect(dA + dB).toBeLessThanOrEqual(s);
    }
  });
});

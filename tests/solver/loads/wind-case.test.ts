// The per-case wind (solver/loads/wind-case.ts and the follower load of wind.ts) against its
// reference formulas: windSpeedAt (power law, log law, uniform; wind-profile.ts) and
// elementDragForce (½ ρ Cd D |V_n| V_n l, wind.ts), which it must reproduce bit for bit.
import { describe, expect, it } from 'vitest';
import type { LoadCaseSpec, ProjectFile, WindSpec } from '../../../solver/index.ts';
import { createWindLoad, elementDragForce, windDragWidths } from '../../../solver/loads/wind.ts';
import { handModel } from './hand-model.ts';

const winds: WindSpec[] = [
  { direction: 30, speed: 31 },
  { direction: 200, speed: 27, profile: { kind: 'power', exponent: 0.16 }, airDensity: 1.2 },
  { direction: -45, speed: 40, profile: { kind: 'log', roughnessLength: 0.3 } },
  { direction: 90, speed: 25, profile: { kind: 'uniform' } },
];

describe('per-case wind', () => {
  it('the follower load is exactly the sum of elementDragForce, half to each end', () => {
    const p: ProjectFile = {
      format: 'stayset-project', version: 2,
      nodes: [{ id: 'A', at: [0, 0, 20], fixed: 'xyz' }, { id: 'B', at: [3, 10, 24], fixed: 'xyz' }, { id: 'C', at: [0, 0, 0], fixed: 'xyz' }, { id: 'D', at: [10, -2, 10] }],
      sections: [{ id: 'rope', E: 1.6e11, area: 2e-4, diameter: 0.02 }],
      members: [
        { id: 'm1', kind: 'cable', from: 'A', to: 'B', section: 'rope', segments: 4 },
        { id: 'm2', kind: 'cable', from: 'C', to: 'D', section: 'rope', segments: 3 },
        { id: 'm3', kind: 'cable', from: 'D', to: 'B', section: 'rope', segments: 2 },
      ],
      loadCases: [],
    };
    const m = handModel(p);
    for (const wind of winds) {
      const c: LoadCaseSpec = { id: 'w', wind };
      // A deformed geometry, not the start positions.
      const x = Float64Array.from(m.coords, (v, i) => v + 0.3 * Math.sin(1.7 * i));
      const got = new Float64Array(3 * m.nodeCount);
      createWindLoad(m, p, c).accumulate(x, 1.35, got);
      const want = new Float64Array(3 * m.nodeCount);
      const widths = windDragWidths(m, p, c);
      const fe = new Float64Array(3);
      for (let e = 0; e < m.elementCount; e++) {
        if (!(widths[e] > 0)) continue;
        const i = m.elemNodes[2 * e], j = m.elemNodes[2 * e + 1];
        elementDragForce(x.subarray(3 * i, 3 * i + 3), x.subarray(3 * j, 3 * j + 3), widths[e], wind, fe);
        for (let d = 0; d < 3; d++) { want[3 * i + d] += 0.5 * 1.35 * fe[d]; want[3 * j + d] += 0.5 * 1.35 * fe[d]; }
      }
      expect(Array.from(got)).toEqual(Array.from(want));
    }
  });
});

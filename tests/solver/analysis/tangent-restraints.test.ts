/**
 * The assembled tangent (solver/assembly/assemble.ts) of a small braced frame of bars and cables
 * with restrained and free DOFs, at a displaced state, against a dense matrix summed here from
 * the closed-form TL bar block k = (A/Lr)[(E/Lr²) d dᵀ + S I] (Crisfield, Non-linear Finite
 * Element Analysis of Solids and Structures, vol. 1, 1991, ch. 3): restrained DOFs are identity
 * rows and columns, every free–free entry equals the reference sum.
 */
import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { buildModel } from '../../../solver/model/build-model.ts';
import { createWorkspace } from '../../../solver/analysis/workspace.ts';
import { assemble, CABLE_STRESS_FLOOR_RATIO } from '../../../solver/assembly/assemble.ts';

const frame: ProjectFile = {
  format: 'stayset-project', version: 2,
  nodes: [
    { id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [4, 0, 0], fixed: 'xz' },
    { id: 'C', at: [0, 3, 0], fixed: 'z' }, { id: 'D', at: [1, 1, 5] }, { id: 'E', at: [3, 2, 4] },
  ],
  sections: [{ id: 'tube', E: 2.1e11, area: 8e-4 }, { id: 'rope', E: 1.5e11, area: 1.2e-4 }],
  members: [
    { id: 'AD', kind: 'bar', from: 'A', to: 'D', section: 'tube' },
    { id: 'BD', kind: 'bar', from: 'B', to: 'D', section: 'tube' },
    { id: 'CD', kind: 'bar', from: 'C', to: 'D', section: 'tube' },
    { id: 'DE', kind: 'bar', from: 'D', to: 'E', section: 'tube' },
    { id: 'BE', kind: 'cable', from: 'B', to: 'E', section: 'rope', pretension: 5e3 },
    { id: 'CE', kind: 'cable', from: 'C', to: 'E', section: 'rope', pretension: 3e3 },
    { id: 'AB', kind: 'bar', from: 'A', to: 'B', section: 'tube' },
  ],
  loadCases: [],
};

describe('assembled tangent with restraints', () => {
  it('is the closed-form sum at free DOFs and an identity at restrained ones', () => {
    const model = buildModel(frame);
    const ws = createWorkspace(model);
    const n = model.dofs.count;
    const u = Float64Array.from({ length: n }, (_, d) => (model.fixed[d] ? 0 : 0.004 * Math.sin(1.3 * d + 0.2)));
    assemble(model, ws.pattern, ws.startVectors, u, 0, new Float64Array(n), ws.elements, ws.values);

    const dense = Array.from({ length: n }, () => new Float64Array(n));
    for (let e = 0; e < model.elementCount; e++) {
      const a = model.elemNodes[2 * e], b = model.elemNodes[2 * e + 1];
      const d = [0, 1, 2].map((q) => ws.startVectors[3 * e + q] + u[3 * b + q] - u[3 * a + q]);
      const Lr = model.elemRefLength[e], E = model.elemE[e], A = model.elemArea[e];
      const S = model.elemS0[e] + E * (0.5 * (d[0] ** 2 + d[1] ** 2 + d[2] ** 2 - Lr * Lr)) / (Lr * Lr);
      const cable = model.elemTensionOnly[e] === 1;
      const material = cable && S < 0 ? 0 : E / (Lr * Lr);
      const geometric = cable && S < CABLE_STRESS_FLOOR_RATIO * E ? CABLE_STRESS_FLOOR_RATIO * E : S;
      for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) {
        const k = (A / Lr) * (material * d[r] * d[c] + (r === c ? geometric : 0));
        dense[3 * a + r][3 * a + c] += k; dense[3 * b + r][3 * b + c] += k;
        dense[3 * a + r][3 * b + c] -= k; dense[3 * b + r][3 * a + c] -= k;
      }
    }

    const { colPtr, rowIdx } = ws.pattern;
    let checkedFree = 0, checkedRestrained = 0;
    for (let j = 0; j < n; j++) {
      for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
        const i = rowIdx[q], v = ws.values[q];
        if (model.fixed[i] || model.fixed[j]) {
          expect(v, `entry (${i}, ${j})`).toBe(i === j ? 1 : 0);
          checkedRestrained++;
        } else {
          expect(Math.abs(v - dense[i][j]), `entry (${i}, ${j})`).toBeLessThanOrEqual(1e-12 * Math.abs(dense[j][j]));
          checkedFree++;
        }
      }
    }
    expect(checkedRestrained).toBeGreaterThan(model.fixed.reduce((s, f) => s + f, 0));
    expect(checkedFree).toBeGreaterThan(0);
  });
});

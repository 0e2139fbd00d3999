/**
 * The lumped mass over the families' DOF map: total translational mass equals Σ mass per length ×
 * length in every direction (conservation); beam rotary inertia by HRZ lumping (Hinton, Rock &
 * Zienkiewicz 1976: μL³/78 per end about the bending axes; recalled).
 */
import { describe, expect, it } from 'vitest';
import { buildModel, lumpedMass } from '../../../solver/index.ts';
import { beamProject, chainMembers, lineNodes, roundSection } from './beam-models.ts';

describe('lumped mass', () => {
  it('beam plus cable: translational mass sums to the members\' mass; rotations only at beam nodes', () => {
    const nodes = lineNodes([0, 0, 0], [0, 0, 10], 2);
    nodes[0].fixed = 'xyzrxryrz';
    nodes.push({ id: 'A', at: [8, 0, 0], fixed: 'xyz' });
    const s = { ...roundSection('s', 1e-6, 1e-3), massPerLength: 20 };
    const members = [...chainMembers(nodes.slice(0, 3), 's'), { id: 'G', kind: 'cable' as const, from: 'N2', to: 'A', section: 'g', segments: 4 }];
    const p = beamProject(nodes, members, [s, { id: 'g', E: 1.6e11, area: 1e-4, massPerLength: 1 }], [{ id: 'd' }]);
    const model = buildModel(p);
    const m = lumpedMass(model);
    expect(m.length).toBe(model.dofs.count);
    const total = 20 * 10 + 1 * Math.hypot(8, 10);
    for (let q = 0; q < 3; q++) {
      let sum = 0;
      for (let i = 0; i < model.nodeCount; i++) sum += m[3 * i + q];
      expect(sum).toBeCloseTo(total, 9);
    }
    expect(Array.from(model.dofs.rotationOffset).filter((r) => r >= 0).length).toBe(3); // N0, N1, N2
    const rMid = model.dofs.rotationOffset[1];
    expect(m[rMid]).toBeCloseTo(2 * (20 * 5 ** 3) / 78, 9); // bending axis x of the vertical member
  });
});

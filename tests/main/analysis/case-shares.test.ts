/**
 * How many threads a run starts by default (case-shares.ts): helper threads only for runs large
 * enough to repay a worker's start (translational DOFs × case solves ≥ PARALLEL_MIN_WORK), the
 * user's STAYSET_WORKERS always obeyed. DOF counts by the model's definition (DEVELOPERS.md: 3 per
 * node, members split into `segments` elements with segments − 1 interior nodes).
 */
import { describe, expect, it } from 'vitest';
import { availableParallelism } from 'node:os';
import type { ProjectFile } from '../../../solver/index.ts';
import { buildModel } from '../../../solver/index.ts';
import { PARALLEL_MIN_WORK, translationalDofs, workerCountFor } from '../../../main/analysis/case-shares.ts';

function guyedPole(segments: number): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'B', at: [0, 0, 0], fixed: 'xyz' }, { id: 'T', at: [0, 0, 20], fixed: 'xy' }, { id: 'A', at: [15, 0, 0], fixed: 'xyz' }],
    sections: [{ id: 's', E: 1.6e11, area: 1e-4, massPerLength: 0.8 }, { id: 'p', E: 2.1e11, area: 2e-3 }],
    members: [
      { id: 'pole', kind: 'bar', from: 'B', to: 'T', section: 'p' },
      { id: 'guy', kind: 'cable', from: 'A', to: 'T', section: 's', pretension: 5e3, segments },
    ],
    loadCases: [{ id: 'dead' }],
  };
}

describe('threads a run starts by default', () => {
  it('counts the translational DOFs the model will have', () => {
    for (const segments of [1, 8, 40]) {
      const p = guyedPole(segments);
      expect(translationalDofs(p)).toBe(3 * (3 + segments - 1));
      expect(translationalDofs(p)).toBe(3 * buildModel(p).coords.length / 3);
    }
  });

  it('one thread below the work threshold, the cores above it, STAYSET_WORKERS always', () => {
    const p = guyedPole(40); // 126 DOFs
    const dofs = translationalDofs(p);
    const few = Math.floor((PARALLEL_MIN_WORK - 1) / dofs);
    const many = Math.ceil(PARALLEL_MIN_WORK / dofs);
    expect(workerCountFor(p, few, {})).toBe(1);
    expect(workerCountFor(p, many, {})).toBe(Math.min(availableParallelism(), many));
    expect(workerCountFor(p, few, { STAYSET_WORKERS: '2' })).toBe(2);
    expect(workerCountFor(p, 1, { STAYSET_WORKERS: '4' })).toBe(1); // never more threads than solves
    expect(workerCountFor(p, few, { STAYSET_WORKERS: 'x' })).toBe(1);
  });
});

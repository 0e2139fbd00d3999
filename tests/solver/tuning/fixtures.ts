import type { ProjectFile } from '../../../solver/project/types.ts';

/**
 * A single steel strand between two pinned supports 100 m apart (invented example), split into
 * 16 elements: 26 mm strand, E = 160 GPa, A = 400 mm², 3.3 kg/m, MBL 560 kN (typical of a
 * spiral strand of that size; values rounded, common practice). One dead-load case.
 */
export function singleSpan(pretension: number, heightDifference = 0): ProjectFile {
  return {
    format: 'stayset-project',
    version: 2,
    meta: { name: 'Test span', referenceTemperature: 283.15 },
    nodes: [
      { id: 'A', at: [0, 0, 0], fixed: 'xyz' },
      { id: 'B', at: [100, 0, heightDifference], fixed: 'xyz' },
    ],
    sections: [{ id: 'S26', E: 160e9, area: 400e-6, massPerLength: 3.3, breakingLoad: 560e3, thermalExpansion: 12e-6 }],
    members: [{ id: 'C1', kind: 'cable', from: 'A', to: 'B', section: 'S26', segments: 16, pretension, groups: ['span'] }],
    groups: [{ id: 'span', label: 'main span', members: ['C1'] }],
    loadCases: [{ id: 'dead', label: 'Dead load', selfWeight: true }],
  };
}

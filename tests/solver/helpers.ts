import type { ProjectFile } from '../../solver/index.ts';

/** A steel strand section (invented but typical values) for tests. */
export const STRAND = { id: 'strand', E: 160e9, area: 1.5e-4, massPerLength: 1.2, breakingLoad: 180e3, thermalExpansion: 1.2e-5, diameter: 0.016 };

/** One cable between two pinned supports A (origin) and B. */
export function singleCable(b: [number, number, number], member: Partial<ProjectFile['members'][number]>, section = STRAND): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: b, fixed: 'xyz' }],
    sections: [section],
    members: [{ id: 'C', kind: 'cable', from: 'A', to: 'B', section: section.id, ...member }],
    loadCases: [{ id: 'dead', selfWeight: true }],
  };
}

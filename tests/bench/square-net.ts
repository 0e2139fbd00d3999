/**
 * Benchmark model: a flat pretensioned square net of N × N cells (spacing `cell` m) in the
 * plane z = 0, cables along the grid lines between neighbouring nodes, every boundary node fixed,
 * under self-weight plus a uniform downward nodal load on the free nodes. An invented test
 * structure for speed measurements, not a design.
 */
import type { ProjectFile } from '../../solver/index.ts';

export function squareNetProject(cells: number, options: { cell?: number; pretension?: number; nodalLoad?: number } = {}): ProjectFile {
  const cell = options.cell ?? 1;
  const pretension = options.pretension ?? 50e3;
  const load = options.nodalLoad ?? 500;
  const id = (i: number, j: number) => `N${i}_${j}`;
  const nodes: ProjectFile['nodes'] = [];
  const members: ProjectFile['members'] = [];
  const loads: { node: string; force: [number, number, number] }[] = [];
  for (let i = 0; i <= cells; i++) {
    for (let j = 0; j <= cells; j++) {
      const boundary = i === 0 || j === 0 || i === cells || j === cells;
      nodes.push({ id: id(i, j), at: [i * cell, j * cell, 0], ...(boundary ? { fixed: 'xyz' } : {}) });
      if (!boundary) loads.push({ node: id(i, j), force: [0, 0, -load] });
      if (i < cells && j > 0 && j < cells) members.push({ id: `X${i}_${j}`, kind: 'cable', from: id(i, j), to: id(i + 1, j), section: 'strand', pretension });
      if (j < cells && i > 0 && i < cells) members.push({ id: `Y${i}_${j}`, kind: 'cable', from: id(i, j), to: id(i, j + 1), section: 'strand', pretension });
    }
  }
  return {
    format: 'stayset-project', version: 2, nodes,
    sections: [{ id: 'strand', E: 160e9, area: 1.5e-4, massPerLength: 1.2, breakingLoad: 180e3, diameter: 0.016 }],
    members,
    loadCases: [{ id: 'dead+load', selfWeight: true, nodalLoads: loads }],
  };
}

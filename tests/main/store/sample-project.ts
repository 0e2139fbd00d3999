/**
 * Invented test projects (no real site): a three-guy mast modelled as a bar on a pinned base
 * with pretensioned cable guys, and a scalable flat cable grid for large-file tests.
 */
import type { ProjectFile } from '../../../solver/index.ts';

/** A 30 m mast: bar from the pinned base to the head, three guys at 120° to anchors 20 m out. */
export function sampleMast(pretension = 20_000): ProjectFile {
  const anchors = [0, 120, 240].map((deg, i) => {
    const a = (deg * Math.PI) / 180;
    return { id: `A${i + 1}`, at: [20 * Math.cos(a), 20 * Math.sin(a), 0] as [number, number, number], fixed: 'xyz' };
  });
  return {
    format: 'stayset-project',
    version: 2,
    meta: { name: 'Test mast Ridgeback Hill', referenceTemperature: 288.15 },
    nodes: [{ id: 'BASE', at: [0, 0, 0], fixed: 'xyz' }, { id: 'HEAD', at: [0, 0, 30] }, ...anchors],
    sections: [
      { id: 'MAST', E: 210e9, area: 4e-3, massPerLength: 31.4 },
      { id: 'GUY', E: 160e9, area: 1.5e-4, massPerLength: 1.25, breakingLoad: 250e3, diameter: 0.016 },
    ],
    members: [
      { id: 'M1', kind: 'bar', from: 'BASE', to: 'HEAD', section: 'MAST' },
      ...anchors.map((n, i) => ({ id: `G${i + 1}`, kind: 'cable' as const, from: 'HEAD', to: n.id, section: 'GUY', segments: 8, pretension })),
    ],
    loadCases: [
      { id: 'SW', label: 'Self-weight' },
      { id: 'HX', label: 'Head load +x', nodalLoads: [{ node: 'HEAD', force: [5_000, 0, 0] }] },
    ],
  };
}

/**
 * A flat n × n grid of cables with fixed edges; several MB of JSON for n ≈ 250. `tag` goes into
 * meta.notes so two versions differ in content and length.
 */
export function largeGrid(n: number, tag: string): ProjectFile {
  const nodes: ProjectFile['nodes'] = [];
  const members: ProjectFile['members'] = [];
  const id = (i: number, j: number) => `N${i}_${j}`;
  for (let i = 0; i <= n; i++) {
    for (let j = 0; j <= n; j++) {
      const edge = i === 0 || j === 0 || i === n || j === n;
      nodes.push(edge ? { id: id(i, j), at: [i, j, 0], fixed: 'xyz' } : { id: id(i, j), at: [i, j, 0] });
      if (i < n) members.push({ id: `X${i}_${j}`, kind: 'cable', from: id(i, j), to: id(i + 1, j), section: 'C', pretension: 1000 });
      if (j < n) members.push({ id: `Y${i}_${j}`, kind: 'cable', from: id(i, j), to: id(i, j + 1), section: 'C', pretension: 1000 });
    }
  }
  return {
    format: 'stayset-project',
    version: 2,
    meta: { name: `Grid ${tag}`, notes: tag.repeat(50) },
    nodes,
    sections: [{ id: 'C', E: 150e9, area: 1e-4 }],
    members,
    loadCases: [{ id: 'SW' }],
  };
}

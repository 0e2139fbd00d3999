/** The 3D view draws members through the solver's own node positions when the host sent them. */
import { describe, expect, it } from 'vitest';
import { buildModel, solveProject, type ProjectFile } from '../../solver/index.ts';
import { buildSceneData } from '../../renderer/view3d/scene-data.ts';

const project: ProjectFile = {
  format: 'stayset-project', version: 2,
  nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [40, 0, 30], fixed: 'xyz' }],
  sections: [{ id: 'strand', E: 160e9, area: 1.5e-4, massPerLength: 1.2 }],
  members: [{ id: 'G1', kind: 'cable', from: 'A', to: 'B', section: 'strand', segments: 10, unstressedLength: 52 }],
  loadCases: [{ id: 'dead' }],
};

describe('solved shape in the 3D view', () => {
  const model = buildModel(project);
  const solution = solveProject(project);
  const shape = { fields: solution.fields[0], start: model.coords, chains: model.members.map((m) => m.nodeChain) };

  it('at scale 1 the polyline is the solver’s element chain, with the reported sag', () => {
    const d = buildSceneData(project, { result: solution.report.cases[0], deformationScale: 1, colour: 'tension', shape });
    expect(d.polyOffsets[1] - d.polyOffsets[0]).toBe(11);
    const chain = model.members[0].nodeChain;
    for (let p = 0; p < 11; p++) {
      for (let k = 0; k < 3; k++) expect(d.polyPoints[3 * p + k]).toBeCloseTo(shape.fields.positions[3 * chain[p] + k], 12);
    }
    // Largest vertical distance below the chord at the same plan position equals the reported sag.
    let sag = 0;
    for (let p = 1; p < 10; p++) sag = Math.max(sag, (30 / 40) * d.polyPoints[3 * p] - d.polyPoints[3 * p + 2]);
    expect(sag).toBeCloseTo(solution.report.cases[0].members[0].sag, 9);
  });

  it('at scale 0 it is the start shape the displacements are measured from', () => {
    const d = buildSceneData(project, { result: solution.report.cases[0], deformationScale: 0, colour: 'tension', shape });
    const chain = model.members[0].nodeChain;
    for (let p = 0; p < 11; p++) expect(d.polyPoints[3 * p + 2]).toBeCloseTo(model.coords[3 * chain[p] + 2], 12);
  });

  it('falls back to the drawn parabola when the shape does not fit the project', () => {
    const d = buildSceneData(project, { result: solution.report.cases[0], deformationScale: 1, colour: 'tension', shape: { ...shape, chains: [] } });
    expect(d.polyOffsets[1] - d.polyOffsets[0]).toBe(9);
  });
});

/**
 * Beam input that cannot be analysed is refused with a message naming the entry; a beam carrying
 * only axial load and temperature behaves exactly like the truss element (same TL strain law).
 */
import { describe, expect, it } from 'vitest';
import { buildModel, solveProject } from '../../../solver/index.ts';
import { beamProject, lineNodes, chainMembers, roundSection } from './beam-models.ts';

function cantilever() {
  const nodes = lineNodes([0, 0, 0], [0, 0, 5], 1);
  nodes[0].fixed = 'xyzrxryrz';
  return beamProject(nodes, chainMembers(nodes, 's'), [roundSection('s', 1e-6, 1e-3)], [{ id: 'd' }]);
}

describe('beam input', () => {
  it('refuses an orientation parallel to the member axis', () => {
    const p = cantilever();
    p.members[0].orientation = [0, 0, 2];
    expect(() => buildModel(p)).toThrow('members[0] "B0": orientation [0, 0, 2] is parallel to the member axis');
  });

  it('refuses a section without a beam property, naming member and section', () => {
    const p = cantilever();
    delete p.sections[0].J;
    expect(() => buildModel(p)).toThrow('members[0] "B0": a beam needs G, Iy, Iz, J on its section; sections[0] "s" has no positive J');
  });

  it('refuses torsion released at both ends (so a beam always keeps some rotation at one end)', () => {
    const p = cantilever();
    p.members[0].releases = { start: 'x', end: 'x' };
    expect(() => buildModel(p)).toThrow('members[0] "B0": torsion (x) is released at both ends');
    p.members[0].releases = { start: 'xyz', end: 'xyz' };
    expect(() => buildModel(p)).toThrow('torsion (x) is released at both ends');
  });

  it('refuses a moment on a node without rotations and a prescribed displacement on a free direction', () => {
    const p = cantilever();
    p.nodes.push({ id: 'T', at: [3, 0, 0], fixed: 'xyz' });
    p.sections.push({ id: 'bar', E: 2e11, area: 1e-4 });
    p.members.push({ id: 'G', kind: 'bar', from: 'N1', to: 'T', section: 'bar' });
    p.loadCases = [{ id: 'm', nodalLoads: [{ node: 'T', force: [0, 0, 0], moment: [1, 0, 0] }] }];
    expect(() => solveProject(p)).toThrow('load case "m": node "T" has no rotations');
    p.loadCases = [{ id: 's', displacements: [{ node: 'N1', z: 0.01 }] }];
    expect(() => solveProject(p)).toThrow('load case "s": displacements[0]: node "N1" is not restrained in z');
  });

  it('an axially loaded, heated beam gives the truss element\'s force and stretch', () => {
    const run = (kind: 'beam' | 'bar') => {
      const p = cantilever();
      p.members[0].kind = kind;
      p.sections[0].thermalExpansion = 1.2e-5;
      p.nodes[1].fixed = kind === 'bar' ? 'xy' : 'xyrxryrz';
      p.loadCases = [{ id: 'T', selfWeight: false, temperatureChange: 30, nodalLoads: [{ node: 'N1', force: [0, 0, 5e4] }] }];
      return solveProject(p).report.cases[0];
    };
    const beam = run('beam'), bar = run('bar');
    expect(beam.members[0].tensionMax).toBeCloseTo(bar.members[0].tensionMax, 6);
    expect(beam.nodes[1].displacement[2]).toBeCloseTo(bar.nodes[1].displacement[2], 12);
  });
});

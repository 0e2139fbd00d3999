/**
 * Synthetic round trip of the as-built back-analysis on a small guyed lattice mast: perturb the
 * guys' unstressed lengths, simulate the site readings of that state with the nonlinear solver,
 * add noise of the stated accuracy (a fixed list of standard-normal draws, so the test is
 * repeatable), fit, and require every length back within three posterior standard deviations
 * (the usual 3σ band of a Gaussian estimate), the residuals consistent with the noise, and the
 * adjustments to name exactly the perturbed guys that put a tension out of tolerance.
 */
import { describe, expect, it } from 'vitest';
import { designUnstressedLengths, runAsBuilt, solveProject, withUnstressedLengths, type ProjectFile } from '../../../solver/index.ts';
import { smallMast } from '../sequence/small-mast.ts';

const truthOffsets: Record<string, number> = { 'm/guy L1-1': 0.03, 'm/guy L1-2': -0.01, 'm/guy L2-1': 0.025, 'm/guy L2-3': -0.012 };
const noise = [0.62, -1.13, 0.27, 1.41, -0.48, -0.91, 0.15, 0.83, -0.36, 1.02, -1.27, 0.44, 0.09, -0.71, 0.58];

function lowerEndTensions(p: ProjectFile, temperature: number): { tension: Map<string, number>; at: Map<string, number[]> } {
  const c = solveProject({ ...p, loadCases: [{ id: 'x', temperatureChange: temperature - 288.15 }] }).report.cases[0];
  expect(c.converged).toBe(true);
  const z = (id: string) => p.nodes.find((n) => n.id === id)!.at[2];
  const tension = new Map(c.members.map((m) => {
    const s = p.members.find((x) => x.id === m.id)!;
    return [m.id, z(s.from) <= z(s.to) ? m.tensionStart : m.tensionEnd];
  }));
  return { tension, at: new Map(c.nodes.map((n) => [n.id, n.position])) };
}

describe('as-built back-analysis: synthetic round trip', () => {
  it('recovers perturbed guy lengths within the noise and plans the adjustments', () => {
    const project = smallMast();
    const L0 = designUnstressedLengths(project);
    const truth = new Map(L0);
    for (const [id, d] of Object.entries(truthOffsets)) truth.set(id, L0.get(id)! + d);
    const asBuilt = withUnstressedLengths(project, truth);
    const cold = lowerEndTensions(asBuilt, 281.15), warm = lowerEndTensions(asBuilt, 295.15);
    const guys = project.members.filter((m) => m.kind === 'cable').map((m) => m.id);
    let k = 0;
    const acc = 0.02;
    const tensions = guys.flatMap((id) => [
      { member: id, method: 'dynamometer' as const, value: cold.tension.get(id)! * (1 + acc * noise[k++]), accuracy: acc, temperature: 281.15 },
    ]);
    tensions.push({ member: guys[0], method: 'dynamometer', value: warm.tension.get(guys[0])! * (1 + acc * noise[k++]), accuracy: acc, temperature: 295.15 });
    const heads = [...new Set(project.members.filter((m) => m.kind === 'cable').map((m) => m.to))].slice(0, 1)
      .concat(project.members.filter((m) => m.id === 'm/guy L2-1' || m.id === 'm/guy L1-1').map((m) => m.to));
    const sigmaXY = 0.003;
    const positions = [...new Set(heads)].map((node) => {
      const p = cold.at.get(node)!;
      return { node, at: [p[0] + sigmaXY * noise[k++], p[1] + sigmaXY * noise[k++], p[2]] as [number, number, number], accuracy: sigmaXY, temperature: 281.15 };
    });
    project.siteMeasurements = [{ id: 'synthetic', tensions, positions, tolerance: 0.1 }];

    const r = runAsBuilt(project, 'synthetic');
    for (const c of r.cables) {
      const err = c.asBuiltLength - truth.get(c.member)!;
      expect(Math.abs(err), `${c.member}: error ${err} vs σ ${c.lengthSigma}`).toBeLessThan(3 * c.lengthSigma);
      expect(c.lengthSigma).toBeLessThan(0.01);
      expect(c.identified).toBe(true);
    }
    expect(r.rmsResidual).toBeGreaterThan(0.1);
    expect(r.rmsResidual).toBeLessThan(2);
    const adjusted = new Set(r.adjustments.map((a) => a.member));
    for (const a of r.adjustments) expect(Object.keys(truthOffsets)).toContain(a.member);
    expect(adjusted.size).toBeGreaterThan(0);
    expect(r.issues.filter((i) => i.code === 'adjustmentsIncomplete')).toEqual([]);
    expect(r.checks).not.toBeNull();
  });

  it('readings of one level alone leave the other level unidentified', () => {
    const project = smallMast();
    const one = project.members.filter((m) => m.id.startsWith('m/guy L1-'));
    project.siteMeasurements = [{ id: 'partial', tensions: one.map((m) => ({ member: m.id, method: 'dynamometer' as const, value: 9000, accuracy: 0.02, temperature: 288.15 })) }];
    const r = runAsBuilt(project, 'partial');
    const level2 = r.cables.filter((c) => c.member.startsWith('m/guy L2-'));
    expect(level2.length).toBe(3);
    for (const c of level2) expect(c.identified, c.member).toBe(false);
  });
});

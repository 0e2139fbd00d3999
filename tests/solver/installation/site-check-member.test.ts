import { describe, expect, it } from 'vitest';
import { installationData } from '../../../solver/installation/installation-data.ts';
import { checkMemberFrequency, checkMemberSag, targetTensionAt } from '../../../solver/installation/site-check-member.ts';
import { buildModel, createWorkspace, resolveCaseLoads, solveCase } from '../../../solver/index.ts';
import { singleSpan } from '../tuning/fixtures.ts';

const project = singleSpan(30e3, 20);
const data = installationData(project);

/** The member solved at ΔT from T_ref with the real solver (reference for the checks below). */
function solvedAt(deltaT: number) {
  const model = buildModel(project);
  const loads = resolveCaseLoads(model, project, project.loadCases[0]);
  return solveCase(createWorkspace(model), 'dead', { ...loads, temperatureChange: deltaT });
}

describe('site checks against the installation table', () => {
  it('interpolates the target between table temperatures close to a full solve', () => {
    // 12.5 °C lies between the 10 °C and 15 °C rows; the full solve at that temperature is the reference.
    const T = 285.65;
    const s = solvedAt(T - 283.15).result.members[0];
    // Linear interpolation over 5 K of a gently curved T(ΔT): within 0.05 %.
    expect(targetTensionAt(data, 'C1', T) / s.tensionStart).toBeCloseTo(1, 3);
    expect(() => targetTensionAt(data, 'C1', 200)).toThrow(/outside the installation table/);
    expect(() => targetTensionAt(data, 'nope', 283.15)).toThrow(/member "nope"/);
  });

  it('a reading taken from the solved state gives back the table tension (frequency and sag)', () => {
    // The solver's state at 25 °C stands in for the site: its sag and its taut-string frequency
    // f = (1/2L)√(T/m) (Irvine 1981, ch. 4) with the solver's mid-length tension.
    const T = 298.15;
    const sol = solvedAt(T - 283.15);
    const m = sol.result.members[0];
    const midTension = sol.fields.elementTension[8];
    const f = Math.sqrt(midTension / 3.3) / (2 * m.chordLength);
    const byFreq = checkMemberFrequency(data, 'C1', T, f);
    expect(byFreq.targetTension / m.tensionStart).toBeCloseTo(1, 6);
    expect(Math.abs(byFreq.relativeDifference)).toBeLessThan(0.005);
    const bySag = checkMemberSag(data, 'C1', T, m.sag);
    expect(Math.abs(bySag.relativeDifference)).toBeLessThan(0.005);
    // A cable 10 % slacker reads low: tension implied by the frequency of 0.9 T.
    const slack = checkMemberFrequency(data, 'C1', T, f * Math.sqrt(0.9));
    expect(slack.relativeDifference).toBeCloseTo(-0.1, 2);
  });
});

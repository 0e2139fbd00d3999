import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { buildModel, envelopeOf, runChecks, solveProject } from '../../../solver/index.ts';
import { elementDragForce } from '../../../solver/loads/wind.ts';

const E = 2e11, A = 1e-4, L = 5;

/** Bar A→B along x; A pinned, B free along x only. Statically determinate: N = applied force. */
function bar(): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [L, 0, 0], fixed: 'yz' }],
    sections: [{ id: 's', E, area: A, yieldStrength: 235e6, thermalExpansion: 1.2e-5 }],
    members: [{ id: 'AB', kind: 'bar', from: 'A', to: 'B', section: 's' }],
    loadCases: [
      { id: 'a', selfWeight: false, nodalLoads: [{ node: 'B', force: [1000, 0, 0] }] },
      { id: 'b', selfWeight: false, nodalLoads: [{ node: 'B', force: [2000, 0, 0] }] },
    ],
    designBasis: { format: 'allowable', allowable: { cableSafetyFactor: 2 } },
    combinations: [{ id: 'c', factors: [{ case: 'a', factor: 1.5 }, { case: 'b', factor: 0.5 }] }],
  };
}

describe('combination and envelope arithmetic on a single bar', () => {
  it('1.5·(1 kN) + 0.5·(2 kN) = 2.5 kN; stretch from the element law', () => {
    const rep = solveProject(bar()).report;
    const c = rep.cases.find((x) => x.id === 'c')!;
    // Statics: a two-force member carries the applied 2.5 kN.
    expect(c.members[0].tensionMax).toBeCloseTo(2500, 6);
    expect(c.reactions.find((r) => r.node === 'A')!.force[0]).toBeCloseTo(-2500, 6);
    // Element law N = EA ε l / L with ε = (l² − L²)/(2L²): solve for l by Newton (hand algebra).
    let l = L;
    for (let k = 0; k < 50; k++) {
      const f = E * A * ((l * l - L * L) / (2 * L * L)) * (l / L) - 2500;
      const df = E * A * ((3 * l * l - L * L) / (2 * L * L * L));
      l -= f / df;
    }
    expect(c.nodes.find((n) => n.id === 'B')!.displacement[0]).toBeCloseTo(l - L, 12);
    const env = envelopeOf(rep);
    expect([env.members[0].tensionMax, env.members[0].tensionMaxCase]).toEqual([expect.closeTo(2500, 6), 'c']);
    expect([env.members[0].tensionMin, env.members[0].tensionMinCase]).toEqual([expect.closeTo(1000, 6), 'a']);
    // Bar tension in the allowable format: 2.5 kN / (A f_y / Ω) = 2500 / (1e-4 · 235e6 / 1.67) (hand arithmetic).
    expect(runChecks(bar(), rep).members[0].utilisation).toBeCloseTo(2500 / ((1e-4 * 235e6) / 1.67), 8);
  });

  it('temperature change scales in a combination: fixed-fixed bar N = −EAα(f·ΔT)', () => {
    const p = bar();
    p.nodes[1].fixed = 'xyz';
    p.nodes.push({ id: 'C', at: [L, 1, 0], fixed: 'xz' });
    p.members.push({ id: 'BC', kind: 'bar', from: 'B', to: 'C', section: 's' });
    p.loadCases = [{ id: 'cold', selfWeight: false, temperatureChange: -40 }];
    p.combinations = [{ id: 'half cold', factors: [{ case: 'cold', factor: 0.5 }] }];
    const rep = solveProject(p).report;
    // Restrained bar, no change of length: S = E (0 − αΔT), N = A S (hand: 2e11·1e-4·1.2e-5·20 = 4800 N).
    const half = rep.cases.find((x) => x.id === 'half cold')!.members.find((m) => m.id === 'AB')!;
    expect(half.tensionMax).toBeCloseTo(E * A * 1.2e-5 * 20, 6);
    expect(rep.cases[0].members.find((m) => m.id === 'AB')!.tensionMax).toBeCloseTo(E * A * 1.2e-5 * 40, 6);
  });

  it('wind in a combination: reactions balance the drag on the deformed cable, scaled by the factor', () => {
    const p: ProjectFile = {
      format: 'stayset-project', version: 2,
      nodes: [{ id: 'P', at: [0, 0, 10], fixed: 'xyz' }, { id: 'Q', at: [0, 12, 10], fixed: 'xyz' }],
      sections: [{ id: 'rope', E: 1.6e11, area: 1e-4, diameter: 0.015 }],
      members: [{ id: 'R', kind: 'cable', from: 'P', to: 'Q', section: 'rope', segments: 6, pretension: 30e3 }],
      loadCases: [{ id: 'w', selfWeight: false, wind: { direction: 0, speed: 30, profile: { kind: 'uniform' } } }],
      combinations: [{ id: 'w2', factors: [{ case: 'w', factor: 2 }] }],
    };
    const sol = solveProject(p);
    const chain = buildModel(p).members[0].nodeChain;
    sol.report.cases.forEach((c, k) => {
      const x = sol.fields[k].positions;
      const wind = p.loadCases[0].wind!;
      let drag = 0;
      const f = new Float64Array(3);
      for (let e = 0; e < 6; e++) {
        const a = x.subarray(3 * chain[e], 3 * chain[e] + 3), b = x.subarray(3 * chain[e + 1], 3 * chain[e + 1] + 3);
        elementDragForce(a, b, 1.2 * 0.015, wind, f);
        drag += f[0];
      }
      const factor = c.id === 'w2' ? 2 : 1;
      const sumRx = c.reactions.reduce((s, r) => s + r.force[0], 0);
      // Statics: the supports take the whole drag on the deformed cable.
      expect(sumRx).toBeCloseTo(-factor * drag, 6);
      // ≈ ½ρ Cd D V² L for a taut straight cable (q = ½·1.225·30²) within 1 % (small deflection).
      expect(Math.abs(-sumRx - factor * 0.5 * 1.225 * 900 * 1.2 * 0.015 * 12) / (factor * 0.5 * 1.225 * 900 * 1.2 * 0.015 * 12)).toBeLessThan(1e-2);
    });
  });
});

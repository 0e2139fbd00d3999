/**
 * As-built fit of a single cable between fixed supports from one dynamometer reading.
 *
 * 1. Elastic catenary (Irvine, Cable Structures, 1981, §2.2; tests/solver/reference): the reading
 *    is the catenary tension of a cable of known unstressed length L0 at the first element's mid
 *    coordinate s = L0/(2n) (the solver reports element forces, see elastic-catenary.test.ts). The
 *    fit must return L0: differences come from the discretisation (O(1/n²)) and from the material
 *    law (Irvine's 1 + T/EA stretch vs Green–Lagrange, 1.5·T/EA in tension ≈ 1e-3 here), both far
 *    below 0.1 mm of length here.
 * 2. Ernst's equivalent (tangent) modulus: H. J. Ernst, "Der E-Modul von Seilen unter
 *    Berücksichtigung des Durchhanges", Der Bauingenieur 40 (1965) 52–55:
 *        E_eq = E / (1 + (γ l)² E / (12 σ³)),
 *    γ = weight per unit volume of the cable (w / A, N/m³), l = horizontal projection of the chord,
 *    σ = T / A the cable stress. The chord's axial stiffness is E_eq A / L, so the sensitivity of
 *    the tension to the unstressed length is ∂T/∂L0 ≈ −E_eq A / L (shortening the cable by δ at a
 *    fixed chord acts as stretching the chord by δ). Ernst's formula is parabolic (small sag) and
 *    uses one stress for the whole cable: agreement to a few per cent is expected.
 */
import { describe, expect, it } from 'vitest';
import { runAsBuilt, STANDARD_GRAVITY, type ProjectFile } from '../../../solver/index.ts';
import { elasticCatenary } from '../reference/elastic-catenary.ts';
import { STRAND } from '../helpers.ts';

const n = 40;
const w = STRAND.massPerLength * STANDARD_GRAVITY;
const EA = STRAND.E * STRAND.area;

function cable(h: number, v: number, designL0: number, reading: number, lengthUncertainty: number): ProjectFile {
  return {
    format: 'stayset-project', version: 1, meta: { referenceTemperature: 288.15 },
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [h, 0, v], fixed: 'xyz' }],
    sections: [STRAND],
    members: [{ id: 'C', kind: 'cable', from: 'A', to: 'B', section: 'strand', segments: n, unstressedLength: designL0 }],
    loadCases: [{ id: 'dead' }],
    siteMeasurements: [{ id: 'site', tensions: [{ member: 'C', method: 'dynamometer', value: reading, accuracy: 1e-4, temperature: 288.15 }], lengthUncertainty }],
  };
}

describe('as-built fit of a single cable', () => {
  it('recovers the unstressed length of the elastic catenary from one tension reading', () => {
    const h = 40, v = 30, L0 = 49.985;
    const ref = elasticCatenary(h, v, L0, w, EA);
    const reading = Math.hypot(ref.H, ref.V0 + (w * L0) / (2 * n));
    const r = runAsBuilt(cable(h, v, L0 + 0.02, reading, 0.05), 'site');
    expect(r.cables[0].identified).toBe(true);
    expect(Math.abs(r.cables[0].asBuiltLength - L0)).toBeLessThan(1e-4);
    expect(Math.abs(r.cables[0].lengthDifference + 0.02)).toBeLessThan(1e-4);
    expect(Math.abs(r.observations[0].normalisedResidual)).toBeLessThan(1);
  });

  it('the tension sensitivity to length is −E_eq·A/L with Ernst’s equivalent modulus', () => {
    const h = 100, v = 10, L0 = 100.45;
    const ref = elasticCatenary(h, v, L0, w, EA);
    const tensionA = Math.hypot(ref.H, ref.V0 + (w * L0) / (2 * n));
    const r = runAsBuilt(cable(h, v, L0 + 0.005, tensionA, 0.05), 'site');
    const L = Math.hypot(h, v);
    const sigma = Math.hypot(ref.H, ref.V0 + (w * L0) / 2) / STRAND.area; // mid-length stress
    const gamma = w / STRAND.area;
    const ernst = STRAND.E / (1 + ((gamma * h) ** 2 * STRAND.E) / (12 * sigma ** 3));
    expect(ernst).toBeLessThan(0.8 * STRAND.E); // sag matters: a real test of the correction
    const k = -r.tensionSensitivity[0][0];
    expect(Math.abs(k / ((ernst * STRAND.area) / L) - 1)).toBeLessThan(0.03);
  });
});

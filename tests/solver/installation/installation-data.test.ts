import { describe, expect, it } from 'vitest';
import { installationData, defaultInstallationTemperatures, DEFAULT_REFERENCE_TEMPERATURE } from '../../../solver/installation/installation-data.ts';
import { installationNoteText } from '../../../main/common/report/installation-text.ts';
import { fixedEndTension } from '../../../solver/installation/thermal-tension.ts';
import { findBracketedRoot } from '../../../solver/installation/bracketed-root.ts';
import { singleSpan } from '../tuning/fixtures.ts';

const EA = 160e9 * 400e-6;
const ALPHA = 12e-6;

describe('installation temperature table (full nonlinear solves)', () => {
  it('default temperatures are −20 °C … +40 °C in 5 °C steps', () => {
    const t = defaultInstallationTemperatures();
    expect(t.length).toBe(13);
    expect(t[0]).toBeCloseTo(253.15, 9);
    expect(t[12]).toBeCloseTo(313.15, 9);
  });

  it('straight weightless cable between fixed points: T(ΔT) = T0 − EA α ΔT (thermal strain, closed form)', () => {
    const p = singleSpan(50e3);
    p.sections[0].massPerLength = 0;
    p.members[0].segments = 4;
    const data = installationData(p);
    expect(data.referenceTemperature).toBe(283.15);
    for (const row of data.table) {
      expect(row.converged).toBe(true);
      const expected = 50e3 - EA * ALPHA * row.deltaT;
      expect(row.tensions[0] / expected).toBeCloseTo(1, 8);
      // The per-member approximation (engineering strain on L0) differs from the solver's
      // Green–Lagrange law only at second order in the strain (here < 0.1 %).
      expect(fixedEndTension({ chord: 100, inclination: 0, unstressedLength: data.members[0].cutLength, axialStiffness: EA, massPerLength: 0, thermalExpansion: ALPHA }, row.deltaT) / expected).toBeCloseTo(1, 2);
    }
  });

  it('sagging cable: the per-member approximation agrees with the full solve within 1 %', () => {
    const p = singleSpan(30e3, 20);
    const data = installationData(p);
    const m = data.members[0];
    for (const row of data.table) {
      const approx = fixedEndTension({
        chord: Math.hypot(100, 20), inclination: Math.atan2(20, 100), unstressedLength: m.cutLength,
        axialStiffness: EA, massPerLength: 3.3, thermalExpansion: ALPHA,
      }, row.deltaT);
      // The full solve reports the lower-end tension; the approximation the chord-direction (mid)
      // tension. Along a cable T rises with height by w·Δz (Irvine 1981, ch. 1), so the lower end
      // carries about w·h/2 less.
      const lowerEnd = approx - (3.3 * 9.80665 * 20) / 2;
      expect(Math.abs(lowerEnd / row.tensions[0] - 1)).toBeLessThan(0.005);
    }
    // Colder means tighter (the cable shortens between fixed points).
    expect(data.table[0].tensions[0]).toBeGreaterThan(data.table[12].tensions[0]);
  });

  it('cut length and tension agree with the elastic catenary (Irvine 1981, ch. 2, level supports)', () => {
    // Irvine's elastic catenary, symmetric level span ℓ with total weight W = m g L0:
    //   ℓ = H L0 / EA + (2H / w) asinh(W / (2H)),  w = m g
    const p = singleSpan(20e3);
    p.members[0].segments = 40;
    const data = installationData(p);
    const L0 = data.members[0].cutLength;
    const w = 3.3 * 9.80665;
    const span = (H: number) => (H * L0) / EA + ((2 * H) / w) * Math.asinh((w * L0) / (2 * H)) - 100;
    const H = findBracketedRoot(span, 100, 1e6);
    // Tension at the lowest point of a level catenary is H; the solver's mid-span element is nearly horizontal.
    const sol = data.members[0];
    expect(sol.frequencies).not.toBeNull();
    const vertical = (w * L0) / 2;
    const endTension = Math.hypot(H, vertical); // tension at a support of the catenary
    expect(sol.installationTension / endTension).toBeCloseTo(1, 2);
  });

  it('warns when the reference temperature is missing and rejects a temperature that is not in K', () => {
    const p = singleSpan(20e3);
    delete p.meta!.referenceTemperature;
    const data = installationData(p, { temperatures: [283.15] });
    expect(data.referenceTemperatureAssumed).toBe(true);
    expect(data.warnings).toEqual([{ code: 'referenceTemperatureAssumed', quantities: { temperature: { value: DEFAULT_REFERENCE_TEMPERATURE, kind: 'temperature' } }, refs: {} }]);
    // Worded at the edge in the display units (°C = K − 273.15; °F = °C × 9/5 + 32, NIST SP 811).
    expect(installationNoteText(data.warnings[0], 'SI')).toMatch(/referenceTemperature is not set: \d+\.\d °C assumed/);
    expect(installationNoteText(data.warnings[0], 'US')).toMatch(/°F assumed/);
    expect(() => installationData(p, { temperatures: [-5] })).toThrow(/installation\.temperatures\[0\]/);
  });
});

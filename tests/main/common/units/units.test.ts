// The one unit module (main/common/units): exact conversions and the precision rule.
import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import {
  KINDS, NEWTONS_PER_KIP, METRES_PER_FOOT, decimalsOf, entryText, formatValue, formatWithUnit, fromDisplay, toDisplay,
  type QuantityKind,
} from '../../../../main/common/units/index.ts';

const reference = create(all, {}); // an independent, general-purpose unit library

describe('conversion factors against their exact definitions', () => {
  it('kip and foot (NIST SP 811, 2008, Appendix B.8: 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m, exact)', () => {
    expect(NEWTONS_PER_KIP).toBe(4448.2216152605);
    expect(METRES_PER_FOOT).toBe(0.3048);
    expect(toDisplay(4448.2216152605, 'force', 'US')).toBe(1);
    expect(fromDisplay(1, 'force', 'US')).toBe(4448.2216152605);
    expect(toDisplay(0.3048, 'length', 'US')).toBe(1);
    // mathjs (reference library): lbf is defined from the pound and standard gravity.
    expect(fromDisplay(1, 'force', 'US')).toBeCloseTo(1000 * reference.unit(1, 'lbf').toNumber('N'), 9);
  });

  it('inch, pound, psf and mph (NIST SP 811 Appendix B: 1 in = 0.0254 m, 1 lb = 0.45359237 kg, 1 mph = 0.44704 m/s)', () => {
    expect(fromDisplay(1, 'displacement', 'US')).toBe(0.0254);
    expect(fromDisplay(1, 'mass', 'US')).toBe(0.45359237);
    expect(fromDisplay(1, 'speed', 'US')).toBe(0.44704);
    // 1 psf = 1 lbf/ft² = 47.880259 Pa (NIST SP 811 Appendix B.8, pound-force per square foot).
    expect(fromDisplay(1, 'pressure', 'US')).toBeCloseTo(47.880259, 6);
    // 1 ksi = 6.894757 MPa (NIST SP 811 Appendix B.8, kip per square inch).
    expect(fromDisplay(1, 'stress', 'US')).toBeCloseTo(6.894757e6, 0);
    // 1 lb/ft = 1.488164 kg/m (NIST SP 811 Appendix B.8, pound per foot).
    expect(fromDisplay(1, 'massPerLength', 'US')).toBeCloseTo(1.488164, 6);
    expect(fromDisplay(1, 'moment', 'US')).toBeCloseTo(reference.evaluate('1000 lbf * ft').toNumber('N m'), 9);
  });

  it('the editors\' kinds: strength and shear modulus in ksi, in⁴, cm⁴, ft², ft²/ft (exact from in, ft, lbf; mathjs as reference)', () => {
    const ksi = reference.evaluate('1000 lbf / inch^2').toNumber('Pa');
    expect(fromDisplay(1, 'strength', 'US')).toBeCloseTo(ksi, 6);
    expect(fromDisplay(1, 'shearModulus', 'US')).toBeCloseTo(ksi, 6);
    expect(fromDisplay(1, 'strength', 'SI')).toBe(1e6);
    expect(fromDisplay(1, 'shearModulus', 'SI')).toBe(1e9);
    // 1 in⁴ = 0.0254⁴ m⁴ = 41.62314256 cm⁴ (exact from 1 in = 2.54 cm).
    expect(fromDisplay(1, 'secondMoment', 'US')).toBe(0.0254 ** 4);
    expect(toDisplay(fromDisplay(1, 'secondMoment', 'US'), 'secondMoment', 'SI')).toBeCloseTo(41.62314256, 8);
    expect(fromDisplay(1, 'dragArea', 'US')).toBeCloseTo(reference.unit(1, 'ft^2').toNumber('m^2'), 12);
    expect(fromDisplay(1, 'dragAreaPerLength', 'US')).toBe(0.3048);
    expect(KINDS.moment.units.US.label).toBe('kip·ft');
    expect(KINDS.pressure.units.US.label).toBe('psf');
  });

  it('temperatures: °C = K − 273.15, °F = °C × 9/5 + 32; a difference of 1 °F = 5/9 K (NIST SP 811 4.2.1.1, B.9)', () => {
    expect(toDisplay(273.15, 'temperature', 'SI')).toBe(0);
    expect(toDisplay(373.15, 'temperature', 'US')).toBeCloseTo(212, 12);
    expect(toDisplay(233.15, 'temperature', 'US')).toBeCloseTo(-40, 12);
    expect(fromDisplay(32, 'temperature', 'US')).toBeCloseTo(273.15, 12);
    expect(fromDisplay(18, 'temperatureChange', 'US')).toBeCloseTo(10, 12);
    expect(formatWithUnit(293.15, 'temperature', 'US')).toBe('68.0 °F');
  });

  it('round-trips every kind in both systems', () => {
    for (const kind of Object.keys(KINDS) as QuantityKind[]) {
      for (const system of ['SI', 'US'] as const) {
        expect(fromDisplay(toDisplay(123.456, kind, system), kind, system)).toBeCloseTo(123.456, 9);
      }
    }
  });
});

describe('one precision rule per kind', () => {
  it('decimals resolve the kind’s resolution in each display unit (forces 10 N, lengths 1 mm, displacements 0.1 mm)', () => {
    expect(decimalsOf('force', 'SI')).toBe(2); // 0.01 kN = 10 N
    expect(decimalsOf('force', 'US')).toBe(3); // 0.001 kip = 4.4 N ≤ 10 N, 0.01 kip = 44 N would not resolve it
    expect(decimalsOf('length', 'SI')).toBe(3);
    expect(decimalsOf('length', 'US')).toBe(3); // 0.001 ft = 0.3 mm
    expect(decimalsOf('displacement', 'SI')).toBe(1);
    expect(decimalsOf('displacement', 'US')).toBe(3); // 0.001 in = 0.025 mm
    expect(decimalsOf('thermalExpansion', 'SI')).toBeNull();
    for (const kind of Object.keys(KINDS) as QuantityKind[]) {
      const p = KINDS[kind].precision;
      if (!('resolution' in p)) continue;
      for (const system of ['SI', 'US'] as const) {
        const d = decimalsOf(kind, system)!;
        const step = 10 ** -d * (KINDS[kind].units[system].toBase);
        // The printed step resolves the resolution, and one decimal fewer would not (unless 0 decimals).
        expect(step).toBeLessThanOrEqual(p.resolution * (1 + 1e-9));
        if (d > 0) expect(step * 10).toBeGreaterThan(p.resolution);
      }
    }
  });

  it('the same value prints the same way wherever it is shown', () => {
    expect(formatValue(12345.6, 'force', 'SI')).toBe('12.35');
    expect(formatWithUnit(12345.6, 'force', 'SI')).toBe('12.35 kN');
    expect(formatWithUnit(12345.6, 'force', 'US')).toBe('2.775 kip');
    expect(formatWithUnit(-0.001, 'force', 'SI')).toBe('0.00 kN'); // never "-0.00"
    expect(formatWithUnit(null, 'force', 'SI')).toBe('—');
    expect(formatWithUnit(Number.NaN, 'length', 'SI')).toBe('—');
    expect(formatWithUnit(1.2e-5, 'thermalExpansion', 'SI')).toBe('1.2e-5 1/K');
    expect(formatWithUnit(0.5, 'share', 'SI')).toBe('50.0 %');
    expect(formatWithUnit(1.5, 'angle', 'US')).toBe('1.500°');
  });

  it('displacements in mm (SI) and in (US)', () => {
    expect(formatWithUnit(0.01234, 'displacement', 'SI')).toBe('12.3 mm');
    expect(formatWithUnit(0.0254, 'displacement', 'US')).toBe('1.000 in');
    expect(formatWithUnit(0.01234, 'length', 'SI')).toBe('0.012 m');
  });

  it('sags in whole mm (SI) and in to 0.01 in (US): a resolution of 1 mm (common practice for taped sags)', () => {
    expect(decimalsOf('sag', 'SI')).toBe(0);
    expect(decimalsOf('sag', 'US')).toBe(2); // 0.01 in = 0.254 mm ≤ 1 mm; 0.1 in = 2.54 mm would not resolve it
    expect(formatWithUnit(0.6124, 'sag', 'SI')).toBe('612 mm');
    expect(formatWithUnit(0.6096, 'sag', 'US')).toBe('24.00 in');
  });

  it('entry text keeps six significant digits so an edited field reads back its value', () => {
    expect(entryText(12000, 'force', 'SI')).toBe('12');
    expect(entryText(4448.2216152605 * 3.25, 'force', 'US')).toBe('3.25');
    expect(entryText(293.15, 'temperature', 'SI')).toBe('20');
    expect(entryText(undefined, 'force', 'SI')).toBe('');
  });
});

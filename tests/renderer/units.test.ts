import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import { parseQuantity } from '../../renderer/units/parse-quantity.ts';
import { KINDS, entryText, fromDisplay, type QuantityKind } from '../../main/common/units/index.ts';

// Exact factors: NIST SP 811 (2008), Appendix B.8/B.9 and the 1959 international yard and pound
// agreement: 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N.
const IN = 0.0254;
const LBF = 4.4482216152605;
const reference = create(all, {}); // an independent, unmodified mathjs instance

describe('unit-aware entry', () => {
  it('converts quantities with units to SI', () => {
    expect(parseQuantity('12 kN', 'force', 'SI', 'f')).toEqual({ ok: true, value: 12000 });
    expect(parseQuantity('250 mm', 'length', 'US', 'f')).toEqual({ ok: true, value: 0.25 });
    const e = parseQuantity('160 GPa', 'modulus', 'SI', 'f');
    expect(e.ok && e.value).toBe(160e9);
    const m = parseQuantity('1.2 kg/m', 'massPerLength', 'SI', 'f');
    expect(m.ok && m.value).toBeCloseTo(1.2, 12);
  });

  it('evaluates 3/8 in to the exact inch factor', () => {
    const r = parseQuantity('3/8 in', 'smallLength', 'SI', 'f');
    // NIST SP 811: 1 in = 0.0254 m exactly.
    expect(r.ok && r.value).toBeCloseTo((3 / 8) * IN, 15);
    // Cross-check with an unmodified mathjs instance.
    expect(r.ok && r.value).toBeCloseTo(reference.unit(3 / 8, 'in').toNumber('m'), 15);
  });

  it('takes plain numbers in the display unit of the column', () => {
    expect(parseQuantity('12', 'force', 'SI', 'f')).toEqual({ ok: true, value: 12000 });
    const kip = parseQuantity('1', 'force', 'US', 'f');
    // 1 kip = 1000 lbf = 4448.2216152605 N exactly (NIST SP 811).
    expect(kip.ok && kip.value).toBeCloseTo(1000 * LBF, 9);
    const ft = parseQuantity('10', 'length', 'US', 'f');
    expect(ft.ok && ft.value).toBeCloseTo(3.048, 12);
  });

  it('uses the exact kip (mathjs built-in kip is rounded)', () => {
    const r = parseQuantity('2 kip', 'force', 'SI', 'f');
    expect(r.ok && r.value).toBeCloseTo(2000 * LBF, 9);
    expect(reference.unit(1, 'lbf').toNumber('N')).toBeCloseTo(LBF, 12);
  });

  it('ksi matches lbf/in² from the reference mathjs', () => {
    const r = parseQuantity('29000 ksi', 'modulus', 'SI', 'f');
    expect(r.ok && r.value).toBeCloseTo(reference.evaluate('29000000 lbf/in^2').toNumber('Pa'), 0);
  });

  it('converts temperature differences without offset (1 °F = 5/9 K)', () => {
    // NIST SP 811 B.9: a temperature interval of 1 °F equals 5/9 K.
    const r = parseQuantity('18 degF', 'temperatureChange', 'SI', 'f');
    expect(r.ok && r.value).toBeCloseTo(10, 12);
    const alpha = parseQuantity('6.5e-6 1/°F', 'thermalExpansion', 'SI', 'f');
    expect(alpha.ok && alpha.value).toBeCloseTo(1.17e-5, 15);
  });

  it('names the field and both dimensions when the unit is wrong', () => {
    const r = parseQuantity('12 kN', 'length', 'SI', 'members[2] "G1" unstressed length');
    expect(r).toEqual({ ok: false, error: 'members[2] "G1" unstressed length: "12 kN" is a force, not a length' });
  });

  it('refuses function calls and junk with a message', () => {
    const r = parseQuantity('import(1)', 'length', 'SI', 'x');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.error).toMatch(/^x: /);
    expect(parseQuantity('', 'length', 'SI', 'x')).toEqual({ ok: false, error: 'x: a value is required' });
    expect(parseQuantity('1,5', 'length', 'SI', 'x').ok).toBe(false);
  });

  it('formats SI values back in the display unit and re-parses them unchanged', () => {
    for (const kind of Object.keys(KINDS) as QuantityKind[]) {
      if (kind === 'count') continue;
      for (const system of ['SI', 'US'] as const) {
        const si = fromDisplay(3.7, kind, system);
        const text = entryText(si, kind, system);
        const back = parseQuantity(text, kind, system, 'f');
        expect(back.ok && back.value).toBeCloseTo(si, 9);
      }
    }
  });
});

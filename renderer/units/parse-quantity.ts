/**
 * Unit-aware parsing of what the user types into a numeric cell.
 *
 * - A plain number ("12", "-3.5e2") is taken in the column's display unit.
 * - A number with a unit or a small expression ("12 kN", "3/8 in", "250 mm", "160 GPa",
 *   "1.2 kg/m", "2 * 6.5 m") is evaluated by mathjs and converted to SI; the unit must have the
 *   column's dimension, else the message names the field and both dimensions.
 * - Temperature changes and thermal expansion coefficients take an optional K / °C / °F suffix
 *   (differences only: 1 °F = 5/9 K, no offset).
 * Function calls and anything but numbers, unit names and + − × ÷ ^ ( ) are refused.
 */
import { unitMath } from './math-instance.ts';
import { KINDS, displayUnit, fromDisplay, type QuantityKind, type UnitSystem } from '../../main/common/units/index.ts';

/**
 * The SI unit of each kind as a mathjs expression, for typed quantities with units; '' for kinds
 * entered as plain numbers only (temperatures, counts) or by the delta rule (parseDelta).
 */
const MATH_SI_UNIT: Record<QuantityKind, string> = {
  force: 'N', moment: 'N m', length: 'm', displacement: 'm', smallLength: 'm', sag: 'm', area: 'm^2',
  stress: 'Pa', strength: 'Pa', modulus: 'Pa', shearModulus: 'Pa', secondMoment: 'm^4', dragArea: 'm^2', dragAreaPerLength: 'm',
  period: 's', pressure: 'Pa', massPerLength: 'kg/m', mass: 'kg', speed: 'm/s', frequency: 'Hz',
  temperature: '', temperatureChange: '', thermalExpansion: '', angle: '', ratio: '', share: '', slenderness: '', count: '',
};

export type ParseResult = { ok: true; value: number } | { ok: false; error: string };

const ALLOWED = /^[0-9a-zA-Z\s.,/*^()+\-°²³]*$/;
const FUNCTION_CALL = /[a-zA-Z_]\s*\(/;
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

function fail(field: string, message: string): ParseResult {
  return { ok: false, error: `${field}: ${message}` };
}

/** The noun of the first known kind whose SI unit has the same dimension as `unit`. */
function dimensionNoun(unit: { equalBase(u: unknown): boolean }): string {
  const m = unitMath();
  for (const [kind, info] of Object.entries(KINDS)) {
    const si = MATH_SI_UNIT[kind as QuantityKind];
    if (si && unit.equalBase(m.unit(si))) return info.noun;
  }
  return 'a quantity of another dimension';
}

function parseDelta(text: string, kind: QuantityKind, system: UnitSystem, field: string): ParseResult {
  const perUnit = kind === 'thermalExpansion';
  const match = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*(?:(1?\s*\/\s*)?(K|°C|degC|C|°F|degF|F))?$/i.exec(text);
  if (!match) {
    return fail(field, `"${text}" is not ${KINDS[kind].noun} (type a number, optionally with ${perUnit ? '1/K or 1/°F' : 'K, °C or °F'})`);
  }
  const value = Number(match[1]);
  const suffix = match[3];
  if (suffix && perUnit !== Boolean(match[2])) {
    return fail(field, `"${text}" is not ${KINDS[kind].noun}: expected ${perUnit ? 'a unit like 1/K' : 'a unit like K'}`);
  }
  let kelvinPerUnit: number;
  if (!suffix) kelvinPerUnit = kind === 'temperatureChange' ? displayUnit(kind, system).toBase : 1 / displayUnit(kind, system).toBase;
  else kelvinPerUnit = /F$/i.test(suffix) ? 5 / 9 : 1;
  // ΔT [K] = value × K-per-unit; α [1/K] = value / K-per-unit.
  return { ok: true, value: perUnit ? value / kelvinPerUnit : value * kelvinPerUnit };
}

/**
 * Parse `text` as a quantity of `kind`, plain numbers in the display unit of `system`.
 * `field` names the entry in messages, e.g. `Member "G1" unstressed length`.
 */
export function parseQuantity(text: string, kind: QuantityKind, system: UnitSystem, field: string): ParseResult {
  const trimmed = text.trim();
  if (trimmed === '') return fail(field, 'a value is required');
  if (kind === 'temperatureChange' || kind === 'thermalExpansion') return parseDelta(trimmed, kind, system, field);
  if (PLAIN_NUMBER.test(trimmed)) {
    return { ok: true, value: fromDisplay(Number(trimmed), kind, system) };
  }
  if (!ALLOWED.test(trimmed) || FUNCTION_CALL.test(trimmed)) {
    return fail(field, `"${trimmed}" is not a number or a quantity like "12 kN"`);
  }
  if (trimmed.includes(',')) return fail(field, `"${trimmed}": use a point as the decimal separator`);
  const m = unitMath();
  let result: unknown;
  try {
    result = m.evaluate(trimmed.replace(/²/g, '^2').replace(/³/g, '^3'));
  } catch (e) {
    return fail(field, `"${trimmed}" is not understood (${(e as Error).message})`);
  }
  const info = KINDS[kind];
  if (typeof result === 'number') {
    if (!Number.isFinite(result)) return fail(field, `"${trimmed}" is not a finite number`);
    return { ok: true, value: fromDisplay(result, kind, system) };
  }
  if (m.isUnit(result)) {
    const siUnit = MATH_SI_UNIT[kind];
    if (!siUnit) return fail(field, `"${trimmed}" has a unit, but this field is ${info.noun} without unit`);
    const si = m.unit(siUnit);
    if (!result.equalBase(si)) {
      return fail(field, `"${trimmed}" is ${dimensionNoun(result)}, not ${info.noun}`);
    }
    const value = result.toNumber(siUnit);
    if (!Number.isFinite(value)) return fail(field, `"${trimmed}" is not a finite quantity`);
    return { ok: true, value };
  }
  return fail(field, `"${trimmed}" is not a number or a quantity like "12 kN"`);
}

/**
 * Base value → text in the display unit of a unit system, by the one precision rule of each kind
 * (quantity-kinds.ts). Every table, message and printed page formats through these functions.
 */
import { KINDS, displayUnit, type QuantityKind, type UnitSystem } from './quantity-kinds.ts';

/** What a missing or non-finite value prints as. */
export const MISSING = '—';

/** Base value → number in the display unit. */
export function toDisplay(base: number, kind: QuantityKind, system: UnitSystem): number {
  const u = displayUnit(kind, system);
  return (base - (u.offset ?? 0)) / u.toBase;
}

/** Number in the display unit → base value. */
export function fromDisplay(display: number, kind: QuantityKind, system: UnitSystem): number {
  const u = displayUnit(kind, system);
  return display * u.toBase + (u.offset ?? 0);
}

/** Decimals of a kind in a system: ⌈−log10(resolution / toBase)⌉, at least 0; null for significant-digit kinds. */
export function decimalsOf(kind: QuantityKind, system: UnitSystem): number | null {
  const p = KINDS[kind].precision;
  if (!('resolution' in p)) return null;
  const step = p.resolution / displayUnit(kind, system).toBase;
  return Math.max(0, Math.ceil(-Math.log10(step) - 1e-9));
}

/** Fixed decimals; never "-0.00" (a value that rounds to zero prints unsigned). */
export function fixedText(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const s = value.toFixed(decimals);
  return Number(s) === 0 ? (0).toFixed(decimals) : s;
}

/** Significant digits, trailing zeros dropped, exponent outside 1e-4 … 1e9: 1.2e-5, 12000, 0.009525. */
export function significantText(value: number, digits: number): string {
  if (!Number.isFinite(value)) return MISSING;
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-4 && abs < 1e9) return String(Number(value.toPrecision(digits)));
  return value.toExponential(Math.max(0, digits - 1)).replace(/\.?0+e/, 'e');
}

/** A value of `kind` as a number in the display unit, by the kind's precision rule ('—' when missing). */
export function formatValue(base: number | null | undefined, kind: QuantityKind, system: UnitSystem): string {
  if (base === null || base === undefined || !Number.isFinite(base)) return MISSING;
  const v = toDisplay(base, kind, system);
  const d = decimalsOf(kind, system);
  if (d !== null) return fixedText(v, d);
  return significantText(v, (KINDS[kind].precision as { significant: number }).significant);
}

/** "12.50 kN", "4.2 mm", "0.870" — value and unit label ('—' when missing). */
export function formatWithUnit(base: number | null | undefined, kind: QuantityKind, system: UnitSystem): string {
  const text = formatValue(base, kind, system);
  const label = displayUnit(kind, system).label;
  if (text === MISSING || !label) return text;
  return label === '°' ? `${text}°` : `${text} ${label}`;
}

/**
 * Text for an editable field: enough digits (6 significant) that reading it back gives the value
 * to 1 part in 10⁶, trailing zeros dropped; '' when missing. Not a display precision.
 */
export function entryText(base: number | null | undefined, kind: QuantityKind, system: UnitSystem): string {
  if (base === null || base === undefined) return '';
  const v = toDisplay(base, kind, system);
  return significantText(Number(v.toPrecision(12)), 6);
}

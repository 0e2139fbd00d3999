/**
 * SI value → text in the display unit, for cells and labels. Plain numbers (no unit text) so a
 * cell can be edited and re-parsed in the same display unit without change.
 */
import { displayUnit, type QuantityKind, type UnitSystem } from './quantity-kinds.ts';

/** Value in the display unit (SI value ÷ factor). */
export function toDisplay(si: number, kind: QuantityKind, system: UnitSystem): number {
  return si / displayUnit(kind, system).toSI;
}

/** Round to `digits` significant figures and drop trailing zeros: 12000 → "12000", 0.0095250 → "0.009525". */
export function formatNumber(value: number, digits = 6): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-4 && abs < 1e9) {
    return String(Number(value.toPrecision(digits)));
  }
  return value.toExponential(Math.max(0, digits - 1)).replace(/\.?0+e/, 'e');
}

export function formatQuantity(si: number | undefined, kind: QuantityKind, system: UnitSystem, digits = 6): string {
  if (si === undefined || si === null) return '';
  return formatNumber(toDisplay(si, kind, system), digits);
}

/** "12.5 kN" — value and unit label, for read-only displays. */
export function formatWithUnit(si: number, kind: QuantityKind, system: UnitSystem, digits = 4): string {
  const label = displayUnit(kind, system).label;
  const text = formatNumber(toDisplay(si, kind, system), digits);
  return label ? `${text} ${label}` : text;
}

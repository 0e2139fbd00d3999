/**
 * Turning typed text into a cell value (unit-aware for quantities) and into a table edit.
 * A refused edit returns messages and changes nothing; the cell keeps the typed text visible.
 */
import { entryText, type UnitSystem } from '../../main/common/units/index.ts';
import { parseQuantity } from '../units/parse-quantity.ts';
import type { CellValue, Column } from './columns.ts';

export type CellParse = { ok: true; value: CellValue } | { ok: false; error: string };

/** `field` names the cell in messages, e.g. `members[3] "G2" pretension`. */
export function parseCell<R>(column: Column<R>, text: string, units: UnitSystem, fieldName: string): CellParse {
  const trimmed = text.trim();
  if (trimmed === '' && column.optional) return { ok: true, value: undefined };
  switch (column.type) {
    case 'text':
      if (trimmed === '') return { ok: false, error: `${fieldName}: a value is required` };
      return { ok: true, value: trimmed };
    case 'choice':
      if (!column.choices?.includes(trimmed)) return { ok: false, error: `${fieldName}: "${trimmed}" is not one of ${column.choices?.join(', ')}` };
      return { ok: true, value: trimmed };
    case 'flag':
      return { ok: true, value: trimmed === 'true' };
    case 'quantity': {
      const r = parseQuantity(trimmed, column.kind ?? 'count', units, fieldName);
      if (!r.ok) return r;
      if (column.integer && (!Number.isInteger(r.value) || r.value < 1)) return { ok: false, error: `${fieldName}: "${trimmed}" is not a whole number ≥ 1` };
      return { ok: true, value: r.value };
    }
    default:
      return { ok: false, error: `${fieldName}: this column is read-only` };
  }
}

/** Cell text for display and editing (quantities in the display unit, without the unit label). */
export function cellText<R>(column: Column<R>, row: R, units: UnitSystem): string {
  const v = column.get(row);
  if (v === undefined || v === null) return '';
  if (column.type === 'quantity' && typeof v === 'number') return entryText(v, column.kind ?? 'count', units);
  return String(v);
}

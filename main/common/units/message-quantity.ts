/** A quantity of a structured solver message (MessageQuantity, SI) in the display units. */
import type { MessageQuantity } from '../../../solver/index.ts';
import { formatWithUnit } from './format-quantity.ts';
import type { QuantityKind, UnitSystem } from './quantity-kinds.ts';

/** Every message kind is a display kind (checked by the compiler). */
const asKind = (k: MessageQuantity['kind']): QuantityKind => k;

export function messageQuantityText(q: MessageQuantity, units: UnitSystem): string {
  return formatWithUnit(q.value, asKind(q.kind), units);
}

/**
 * Structured outcome messages: the solver says what happened as a code, the numbers involved
 * (each in its SI base unit, tagged with its kind) and the ids it refers to. Words and display
 * units are chosen at the edge (main/common: one words module per topic, units from
 * main/common/units), so a message reads in the user's display units.
 */

/** Kinds of message quantities (a subset of main/common/units QuantityKind; SI base units). */
export type MessageQuantityKind =
  | 'force' | 'length' | 'displacement' | 'share' | 'ratio' | 'temperature' | 'temperatureChange' | 'frequency' | 'count';

export interface MessageQuantity {
  /** SI base value: N, m, K, Hz; shares and ratios dimensionless. */
  value: number;
  kind: MessageQuantityKind;
}

export interface OutcomeMessage<C extends string = string> {
  code: C;
  quantities: Record<string, MessageQuantity>;
  /** Ids and code words the message refers to: member, node, group, case ids, target indices. */
  refs: Record<string, string | string[]>;
}

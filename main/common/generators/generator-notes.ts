/**
 * What a generator run says, as structured messages (solver/results/message-types.ts): a code,
 * the ids it refers to and the numbers involved in SI with their kind (distances and positions m,
 * forces N). The words, in the user's display units, are made at the edge by generator-text.ts,
 * so a note reads "moved 98.425 ft" in US units and "moved 30.000 m" in SI.
 */
import type { MessageQuantity, OutcomeMessage } from '../../../solver/index.ts';

export type GeneratorNoteCode =
  // members, nodes, groups, sections, ancillaries and panels of the user (apply-generated.ts)
  | 'memberDropped' | 'memberEndsMerge' | 'nodeRemoved'
  | 'groupMemberDropped' | 'groupMemberReplaced' | 'groupMemberGone' | 'groupRemoved'
  | 'sectionKept' | 'ancillaryDropped' | 'panelDropped' | 'panelRegionsCarried'
  // references to groups the run no longer makes (drop-group-references.ts)
  | 'groupReferenceDropped' | 'caseAppliesToAll' | 'memberLossDropped'
  // references to nodes following the new geometry (follow-references.ts)
  | 'nodeUnplaced' | 'nodeFollowed' | 'nodeMoved' | 'loadsStay' | 'loadsSpread'
  // parameter problems with numbers (generators' input checks)
  | 'levelAboveTop' | 'backStaysCannotBalance';

export type GeneratorNote = OutcomeMessage<GeneratorNoteCode>;

export function generatorNote(code: GeneratorNoteCode, refs: GeneratorNote['refs'], quantities: Record<string, MessageQuantity> = {}): GeneratorNote {
  return { code, quantities, refs };
}

/** A length quantity, m. */
export const metres = (value: number): MessageQuantity => ({ value, kind: 'length' });
/** A force quantity, N. */
export const newtons = (value: number): MessageQuantity => ({ value, kind: 'force' });
/** A count. */
export const count = (value: number): MessageQuantity => ({ value, kind: 'count' });

/** The three components of a vector as quantities `${name}0`, `${name}1`, `${name}2`. */
export function vectorQuantities(name: string, v: readonly number[], of: (x: number) => MessageQuantity): Record<string, MessageQuantity> {
  return { [`${name}0`]: of(v[0]), [`${name}1`]: of(v[1]), [`${name}2`]: of(v[2]) };
}

/** Where a user's entry that used a part the new run no longer makes would be re-attached. */
export interface ReattachTarget {
  part: 'node' | 'member';
  id: string;
  /** Distance from the old node to the new one, m (nodes only). */
  distance?: number;
}

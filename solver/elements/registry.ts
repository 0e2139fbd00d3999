/**
 * The element families the solver knows, in assembly order. Adding a family = its folder under
 * solver/elements/ and one line here.
 */
import type { ElementFamily } from './family.ts';
import { trussFamily } from './truss/truss-family.ts';
import { beamFamily } from './beam/beam-family.ts';

export const ELEMENT_FAMILIES: readonly ElementFamily[] = [trussFamily, beamFamily];

/** The family modelling a member kind. */
export function familyOfKind(kind: string): ElementFamily {
  const f = ELEMENT_FAMILIES.find((fam) => (fam.kinds as readonly string[]).includes(kind));
  if (!f) throw new Error(`no element family models members of kind "${kind}"`);
  return f;
}

/**
 * Words for the generators' structured notes and parameter problems (generator-notes.ts), in the
 * display units of main/common/units: distances and positions as lengths (m / ft), forces as
 * forces (kN / kip). Shared by the Generate dialog and every other place that shows a run's notes.
 */
import { formatValue, formatWithUnit, unitLabel, type UnitSystem } from '../units/index.ts';
import type { GeneratorNote, ReattachTarget } from './generator-notes.ts';

const ref = (n: GeneratorNote, k: string): string => String(n.refs[k] ?? '');
const list = (n: GeneratorNote, k: string): string[] => {
  const v = n.refs[k];
  return Array.isArray(v) ? v : v === undefined ? [] : [v];
};
const len = (n: GeneratorNote, k: string, units: UnitSystem) => formatWithUnit(n.quantities[k]?.value, 'length', units);

/** "(12.500, 0.000, 40.000) m" from quantities `${name}0..2` of kind length. */
function position(n: GeneratorNote, name: string, units: UnitSystem): string {
  return `(${[0, 1, 2].map((k) => formatValue(n.quantities[`${name}${k}`]?.value, 'length', units)).join(', ')}) ${unitLabel('length', units)}`;
}
/** "(1.00, 0.00, -2.50) kN" from quantities `${name}0..2` of kind force. */
function forceVector(n: GeneratorNote, name: string, units: UnitSystem): string {
  return `(${[0, 1, 2].map((k) => formatValue(n.quantities[`${name}${k}`]?.value, 'force', units)).join(', ')}) ${unitLabel('force', units)}`;
}
const wantWord = (want: string) => (want === 'free' ? 'free node' : want === 'support' ? 'support' : 'node');

/** How a followed node was found: "at the same place", "nearest free node, 1.250 m from (…) m", "mast top, moved 30.000 m". */
function howText(n: GeneratorNote, units: UnitSystem): string {
  const how = ref(n, 'how');
  if (how === 'same') return 'at the same place';
  if (how === 'nearest') return `nearest ${wantWord(ref(n, 'want'))}, ${len(n, 'distance', units)} from ${position(n, 'from', units)}`;
  return `${how}, moved ${len(n, 'distance', units)}`;
}

/** One note or parameter problem as a sentence naming its entry, numbers in the display units. */
export function generatorNoteText(n: GeneratorNote, units: UnitSystem): string {
  const entry = ref(n, 'entry');
  switch (n.code) {
    case 'memberDropped':
      return `member "${ref(n, 'member')}": dropped (it used ${list(n, 'nodes').map((id) => `node "${id}"`).join(' and ')}, which the new run does not make)`;
    case 'memberEndsMerge':
      return `member "${ref(n, 'member')}": both ends would be node "${ref(n, 'node')}": dropped`;
    case 'nodeRemoved':
      return `node "${ref(n, 'node')}": no member is left on it: removed (with its loads and checks)`;
    case 'groupMemberDropped':
      return `group "${ref(n, 'group')}": member "${ref(n, 'member')}" was dropped: taken out`;
    case 'groupMemberReplaced':
      return `group "${ref(n, 'group')}": member "${ref(n, 'member')}" → "${ref(n, 'to')}" (nearest new ${ref(n, 'kind')})`;
    case 'groupMemberGone':
      return `group "${ref(n, 'group')}": member "${ref(n, 'member')}" no longer exists: taken out`;
    case 'groupRemoved':
      return `group "${ref(n, 'group')}": no member left: removed`;
    case 'sectionKept':
      return `section "${ref(n, 'section')}" is no longer made by generator "${ref(n, 'generator')}" but member "${ref(n, 'member')}" uses it: kept`;
    case 'ancillaryDropped':
      return `${entry}: dropped (its node is gone)`;
    case 'panelDropped':
      return `panel "${ref(n, 'panel')}": its corners no longer make a loop of distinct nodes: dropped`;
    case 'panelRegionsCarried':
      return `panels: ${formatValue(n.quantities.count?.value, 'count', units)} new panels took the region (${list(n, 'regions').map((r) => `"${r}"`).join(', ')}) of the nearest old panel`;
    case 'groupReferenceDropped':
      return `${entry}: group "${ref(n, 'group')}" no longer exists: reference dropped`;
    case 'caseAppliesToAll':
      return `load case "${ref(n, 'case')}" ${ref(n, 'action')}: no group left, so it now applies to every member`;
    case 'memberLossDropped':
      return `${entry}: no member left to remove: dropped`;
    case 'nodeUnplaced':
      return `${entry}: node "${ref(n, 'node')}" is no longer made and no ${ref(n, 'want') === 'support' ? 'support' : 'node'} of the new run can take its place: reference dropped`;
    case 'nodeFollowed':
      return `${entry}: node "${ref(n, 'node')}" → "${ref(n, 'to')}" (${howText(n, units)})`;
    case 'nodeMoved':
      return `${entry}: stays on node "${ref(n, 'node')}" (${ref(n, 'how')}), which moved ${len(n, 'distance', units)}`;
    case 'loadsStay':
      return `${entry}: the ${formatValue(n.quantities.count?.value, 'count', units)} equal loads on every free "${ref(n, 'pattern')}" node stay on the same ${formatValue(n.quantities.nodes?.value, 'count', units)} nodes`;
    case 'loadsSpread':
      return `${entry}: ${formatValue(n.quantities.count?.value, 'count', units)} equal loads ${forceVector(n, 'force', units)} on every free "${ref(n, 'pattern')}" node → the ${formatValue(n.quantities.nodes?.value, 'count', units)} such nodes of the new run, ${forceVector(n, 'each', units)} each (same total ${forceVector(n, 'total', units)})`;
    case 'levelAboveTop':
      return `${entry}: ${len(n, 'level', units)} is above the mast height ${len(n, 'height', units)}`;
    case 'backStaysCannotBalance':
      return `${entry}: back-stays cannot balance the net pull with this layout (mast ${formatWithUnit(n.quantities.mast?.value, 'force', units)}, stays ${formatWithUnit(n.quantities.stayA?.value, 'force', units)}, ${formatWithUnit(n.quantities.stayB?.value, 'force', units)}); move the back-stay anchors behind the mast`;
  }
}

/** Every note of a run as sentences. */
export function generatorNotesText(notes: readonly GeneratorNote[], units: UnitSystem): string[] {
  return notes.map((n) => generatorNoteText(n, units));
}

/** A parameter problem: plain words (no quantities) or a structured note. */
export function generatorProblemText(p: string | GeneratorNote, units: UnitSystem): string {
  return typeof p === 'string' ? p : generatorNoteText(p, units);
}

/** Where a dangling reference would be re-attached: `node "mast/P28a" (2.000 m away)`, `member "x"`. */
export function reattachText(to: ReattachTarget | null, units: UnitSystem): string | null {
  if (!to) return null;
  return to.distance === undefined ? `${to.part} "${to.id}"` : `${to.part} "${to.id}" (${formatWithUnit(to.distance, 'length', units)} away)`;
}

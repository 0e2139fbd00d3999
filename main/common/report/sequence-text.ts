/**
 * Words for the tensioning-sequence codes (solver/sequence): issues and suggestions as sentences
 * in the chosen units, for the CLI, the crew sheet and the calculation report.
 */
import type { SequenceIssue, SequenceResult, SequenceSuggestion } from '../../../solver/index.ts';
import { fixedText, formatValue, unitLabels, type UnitSystem } from '../units/index.ts';
import { tiltText } from '../checks/check-text.ts';

export function sequenceIssueText(i: SequenceIssue, units: UnitSystem): string {
  const l = unitLabels(units);
  switch (i.code) {
    case 'notConverged':
      return `stage ${i.stage}: no equilibrium (${i.status}) — the structure is a mechanism or cannot carry the stage`;
    case 'overload':
      return `stage ${i.stage}: "${i.member}" at ${formatValue(i.value, 'force', units)} ${l.force} exceeds φ·MBL = ${formatValue(i.limit, 'force', units)} ${l.force}`;
    case 'slack':
      return `stage ${i.stage}: "${i.member}" is slack (${formatValue(i.value, 'force', units)} ${l.force})`;
    case 'plumb':
      return `stage ${i.stage}: mast out of plumb, tilt ${tiltText(i.value)} beyond the tolerance ${tiltText(i.limit)}`;
    case 'finalMismatch':
      return `final state: "${i.member}" reads ${formatValue(i.value, 'force', units)} ${l.force}, the design state ${formatValue(i.design, 'force', units)} ${l.force}`;
  }
}

export function sequenceSuggestionText(s: SequenceSuggestion, r: SequenceResult, stepLabel: (i: number) => string): string {
  switch (s.code) {
    case 'reorder':
      return `Reorder the steps: ${s.order.map(stepLabel).join(' → ')} (simulated: every stage passes).`;
    case 'secondPass':
      return `Tension in two passes: first every cable to about ${fixedText(s.share * 100, 0)} % of its design strain (the first-pass lengths), then every cable to its design length (simulated: every stage passes).`;
    case 'restrainOrGroup':
      return `Stage ${s.stage} has no stable equilibrium: tension its cables together with the next step's, or hold the mast with a temporary restraint (temporary guys) until the opposing cables are in.`;
    case 'none':
      return `No reordering or second pass tried passes every stage (${r.issues.length} issue(s)); change the sequence, add temporary restraints or review the limits.`;
  }
}

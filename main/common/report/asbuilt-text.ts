/** Words for the as-built back-analysis codes (solver/asbuilt), for the CLI and the report. */
import type { AsBuiltIssue } from '../../../solver/index.ts';

export function asBuiltIssueText(i: AsBuiltIssue): string {
  switch (i.code) {
    case 'fitNotConverged':
      return 'the fit did not converge (a trial state could not be solved); the lengths shown are the last that solved';
    case 'largeResidual':
      return `reading ${i.index + 1} on "${i.member}" is ${Math.abs(i.value).toFixed(1)} standard deviations from the fitted state: check the reading, its method and accuracy`;
    case 'adjustmentsIncomplete':
      return `no adjustment of identified lengths brings ${i.members.map((m) => `"${m}"`).join(', ')} within tolerance: measure more cables or review the tolerance`;
  }
}

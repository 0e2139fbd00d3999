/**
 * Words for the codes of a modal analysis (solver/modes): refusals and notes, for the CLI and the
 * app. Units: frequencies Hz, masses kg.
 */
import type { CaseResult, DofName, ModalNote, ModalRefusal } from '../../../solver/index.ts';

export function dofText(dof: DofName): string {
  if (dof.node !== undefined) return `node "${dof.node}" direction ${dof.direction}`;
  if (dof.member !== undefined) return `interior node ${dof.interior} of member "${dof.member}" direction ${dof.direction}`;
  return `direction ${dof.direction}`;
}

export function refusalText(refusal: ModalRefusal, caseResult: CaseResult | null): string {
  switch (refusal.code) {
    case 'caseNotConverged':
      return `no modes: case "${refusal.case}" did not converge (${refusal.status})` +
        `${caseResult?.message ? `: ${caseResult.message}` : ''}; modes exist only about an equilibrium`;
    case 'mechanism':
      return `no modes: the structure is a mechanism at the solved state, free to move at ${dofText(refusal.dof)} ` +
        '(slack members add no stiffness); add supports or members there';
    case 'notPositiveDefinite':
      return `no modes: the tangent stiffness at the solved state has ${refusal.negativePivots} negative pivot(s): the equilibrium is not stable`;
    case 'noMass':
      return 'no modes: no free node carries mass (give sections a mass per length or nodes a mass)';
    case 'unknownCase':
      return `no load case or combination "${refusal.case}"`;
  }
}

export function noteText(note: ModalNote): string {
  switch (note.code) {
    case 'slackMembersMassOnly':
      return `slack at this state, counted with their mass only (lumped to their end nodes) and no stiffness: ${note.members.join(', ')}`;
    case 'fewerModesThanRequested':
      return `only ${note.available} modes exist (nodes with mass × directions), ${note.requested} were asked for`;
    case 'modesNotConverged':
      return `the eigen-solver stopped before every mode met its tolerance (worst relative residual ${note.worstResidual.toExponential(1)}); treat the highest modes with care`;
    case 'followerLoadStiffnessOmitted':
      return 'the case has wind: the stiffness of the wind load itself (and aerodynamic damping) is not included';
  }
}

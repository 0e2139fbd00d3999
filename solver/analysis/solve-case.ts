/**
 * One analysis case on a prepared workspace: Newton equilibrium, then the reported quantities.
 */
import type { CaseLoads } from '../loads/case-loads.ts';
import type { CaseFields, CaseResult } from '../results/types.ts';
import type { SolveControl } from './progress.ts';
import type { Workspace } from './workspace.ts';
import { DEFAULT_NEWTON_OPTIONS, evaluateState, solveEquilibrium, type CaseTag, type NewtonOptions } from './newton.ts';
import { nowMs } from './clock.ts';
import { untensionedMechanismDof } from './untensioned-mechanism.ts';
import { describeDof, memberResults, nodeResults, reactionResults } from '../results/extract.ts';

export interface SolveCaseOptions {
  control?: SolveControl;
  newton?: Partial<NewtonOptions>;
  /** Warm start: positions (3 × nodeCount, m) of a nearby solution; falls back to a cold start. */
  start?: Float64Array;
  tag?: CaseTag;
}

export interface CaseSolution {
  result: CaseResult;
  fields: CaseFields;
  /** Displacements and rotations from the start state at the end (dofs.count), m and rad. */
  displacements?: Float64Array;
}

export function solveCase(ws: Workspace, id: string, loads: CaseLoads, options: SolveCaseOptions = {}): CaseSolution {
  const t0 = nowMs();
  const newton = { ...DEFAULT_NEWTON_OPTIONS, ...options.newton };
  const tag = options.tag ?? { caseIndex: 0, caseCount: 1, caseId: id };
  const out = solveEquilibrium(ws, loads, newton, options.control ?? {}, tag, options.start);
  const untensioned = out.status === 'converged' ? untensionedMechanismDof(ws, loads, out.u, newton.pivotTolerance) : -1;
  if (untensioned >= 0) Object.assign(out, { status: 'singular', singularDofs: [untensioned] });
  const model = ws.model;
  const converged = out.status === 'converged';
  // A converged solve ends on an evaluation at out.u and λ = 1, so ws already holds that state
  // (forces, element state, residual); any other outcome restored u and is evaluated again.
  const residual = converged ? out.residual : evaluateState(ws, loads, out.u);
  const positions = new Float64Array(model.coords);
  for (let d = 0; d < positions.length; d++) positions[d] += out.u[d];
  const fields: CaseFields = {
    positions,
    elementTension: new Float64Array(ws.elements.tension),
    elementSlack: new Uint8Array(ws.elements.slack),
  };
  if (ws.elements.endForces.length > 0) fields.elementEndForces = new Float64Array(ws.elements.endForces);
  const members = memberResults(model, positions, fields.elementTension, fields.elementSlack, fields.elementEndForces);
  let freeDofs = 0;
  for (let d = 0; d < model.fixed.length; d++) if (!model.fixed[d]) freeDofs++;
  const result: CaseResult = {
    id,
    converged,
    status: out.status,
    slackMembers: members.filter((m) => m.slack).map((m) => m.id),
    nodes: nodeResults(model, positions),
    members,
    reactions: reactionResults(model, ws.fInt, ws.fExt, out.u),
    stats: {
      dofs: freeDofs, iterations: out.iterations, loadSteps: out.loadSteps,
      seconds: (nowMs() - t0) / 1000, residual: converged ? residual : out.residual,
      factorSeconds: out.factorSeconds, factorizations: out.factorizations,
    },
  };
  if (!converged) result.message = explain(ws, out.status, out.loadFactor, out.singularDofs, untensioned >= 0);
  return { result, fields, displacements: out.u };
}

function explain(ws: Workspace, status: CaseResult['status'], loadFactor: number, dofs?: number[], untensioned = false): string {
  const at = `at load factor ${loadFactor.toFixed(3)}`;
  switch (status) {
    case 'singular': {
      const names = (dofs ?? []).slice(0, 12).map((d) => describeDof(ws.model, d));
      const more = dofs && dofs.length > 12 ? ` and ${dofs.length - 12} more` : '';
      if (untensioned) {
        return `mechanism ${at}: in equilibrium, but held only by cables without tension, so it is free to move at ${names.join(', ')}${more}; give those cables pretension, weight or load, or add members there`;
      }
      return `mechanism ${at}: the structure is free to move at ${names.join(', ')}${more}; add supports or members there`;
    }
    case 'limitPoint':
      return `limit point ${at}: the tangent stiffness lost positive definiteness (buckling or snap-through); the load cannot be carried in this configuration`;
    case 'diverged':
      return `diverged ${at}: the Newton iterations blew up even with the smallest load steps; check the loads, supports and pretensions`;
    case 'maxIterations':
      return `not converged ${at}: Newton iterations did not reach the residual tolerance within the iteration limit even with the smallest load steps`;
    case 'cancelled':
      return `cancelled ${at}`;
    default:
      return '';
  }
}

/**
 * Modes about a solved case of the truss/cable model: the tangent stiffness of the pretensioned,
 * loaded structure at its converged state and the lumped mass (member self-mass — present whether or
 * not the case applies self-weight —, the case's ice mass, added node masses).
 * Slack members (any element slack at the solved state) add mass, lumped to their end nodes, and
 * no stiffness; their interior nodes leave the eigenproblem. The eigen-solver itself
 * (block-lanczos.ts) sees only a sparse tangent, a mass per DOF and the free DOFs.
 */
import type { Workspace } from '../analysis/workspace.ts';
import type { CaseSolution } from '../analysis/solve-case.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import type { ProjectFile, Vec3 } from '../project/types.ts';
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { DofName, ModalNote, ModalOutcome, ModeResult } from './modes-types.ts';
import { nowMs } from '../analysis/clock.ts';
import { nodeMassPerDof } from '../loads/node-mass.ts';
import { trussTangent } from './truss-tangent.ts';
import { trussLumpedMass } from './lumped-mass.ts';
import { lowestModes } from './block-lanczos.ts';
import { effectiveModalMasses } from './modal-mass.ts';

export interface ModeOptions {
  /** Number of lowest modes (default 10). */
  count?: number;
  /** Eigen-solver tolerance on the relative residual (default 1e-9). */
  tolerance?: number;
}

export const DEFAULT_MODE_COUNT = 10;

export function modesOfSolvedCase(
  ws: Workspace, project: ProjectFile, loads: CaseLoads, solved: CaseSolution, options: ModeOptions = {},
): ModalOutcome {
  const t0 = nowMs();
  const { model, pattern } = ws;
  const { result, fields } = solved;
  if (!result.converged) return { ok: false, refusal: { code: 'caseNotConverged', case: result.id, status: result.status } };

  const massOnly = new Set<number>();
  const skip = new Uint8Array(model.elementCount);
  const free = new Uint8Array(3 * model.nodeCount);
  for (let d = 0; d < free.length; d++) free[d] = model.fixed[d] ? 0 : 1;
  for (const member of model.members) {
    let slack = false;
    for (let k = 0; k < member.elementCount; k++) if (fields.elementSlack[member.firstElement + k]) slack = true;
    if (!slack) continue;
    massOnly.add(member.index);
    for (let k = 0; k < member.elementCount; k++) skip[member.firstElement + k] = 1;
    for (let k = 1; k < member.nodeChain.length - 1; k++) free.fill(0, 3 * member.nodeChain[k], 3 * member.nodeChain[k] + 3);
  }

  const stiffness = trussTangent(model, pattern, fields.positions, loads.temperatureChange, skip);
  const mass = trussLumpedMass(model, loads.extraMassPerLength, nodeMassPerDof(model, project), massOnly);
  const requested = Math.max(1, Math.floor(options.count ?? DEFAULT_MODE_COUNT));
  const out = lowestModes(
    { n: pattern.n, colPtr: pattern.colPtr, rowIdx: pattern.rowIdx, stiffness, mass, free, blockSize: 3 },
    { count: requested, tolerance: options.tolerance },
  );
  if (!out.ok) {
    const f = out.failure;
    return { ok: false, refusal: f.code === 'mechanism' ? { code: 'mechanism', dof: nameDof(model, f.dof) } : f };
  }
  const s = out.solution;
  const direction = new Int8Array(mass.length);
  for (let d = 0; d < direction.length; d++) direction[d] = d % 3;
  const { effective, movable } = effectiveModalMasses(s.vectors, mass, free, direction);
  const cumulative: Vec3 = [0, 0, 0];
  const modes: ModeResult[] = Array.from(s.eigenvalues, (lambda, k) => {
    const omega = Math.sqrt(Math.max(lambda, 0));
    const share = effective[k].map((m, q) => (movable[q] > 0 ? m / movable[q] : 0)) as Vec3;
    for (let q = 0; q < 3; q++) cumulative[q] += share[q];
    return {
      number: k + 1, frequency: omega / (2 * Math.PI), period: omega > 0 ? (2 * Math.PI) / omega : Infinity,
      angularFrequency: omega, effectiveMass: effective[k], effectiveMassShare: share,
      cumulativeShare: [...cumulative] as Vec3, residual: s.residuals[k],
    };
  });

  const notes: ModalNote[] = [];
  if (massOnly.size > 0) notes.push({ code: 'slackMembersMassOnly', members: model.members.filter((m) => massOnly.has(m.index)).map((m) => m.id) });
  if (s.eigenvalues.length < requested) notes.push({ code: 'fewerModesThanRequested', requested, available: s.eigenvalues.length });
  if (!s.converged) notes.push({ code: 'modesNotConverged', worstResidual: Math.max(...s.residuals) });
  if (loads.follower) notes.push({ code: 'followerLoadStiffnessOmitted' });
  let dofs = 0;
  for (let d = 0; d < free.length; d++) dofs += free[d];
  return {
    ok: true,
    analysis: {
      case: result.id, modes, movableMass: movable, notes,
      stats: { dofs, solves: s.solves, basisSize: s.basisSize, seconds: (nowMs() - t0) / 1000 },
    },
    fields: { shapes: s.vectors },
  };
}

/** A DOF by its node: user node id, or member and interior node number. */
export function nameDof(model: AnalysisModel, dof: number): DofName {
  const node = Math.floor(dof / 3);
  const direction = (['x', 'y', 'z'] as const)[dof % 3];
  if (node < model.userNodeCount) return { node: model.nodeIds[node], direction };
  for (const m of model.members) {
    const k = m.nodeChain.indexOf(node);
    if (k > 0) return { member: m.id, interior: k, direction };
  }
  return { direction };
}

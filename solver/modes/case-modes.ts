/**
 * Modes about a solved case: the tangent stiffness of the pretensioned, loaded structure at its
 * converged state and the lumped mass (modal-model.ts), the lowest modes by block Lanczos
 * (block-lanczos.ts, which sees only a sparse tangent, a mass per DOF and the free DOFs), and the
 * effective modal masses. Slack members add mass and no stiffness, and the result says so.
 */
import type { Workspace } from '../analysis/workspace.ts';
import type { CaseSolution } from '../analysis/solve-case.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import type { ProjectFile, Vec3 } from '../project/types.ts';
import type { AnalysisModel } from '../model/analysis-model.ts';
import type { DofName, ModalNote, ModalOutcome, ModeResult } from './modes-types.ts';
import { nowMs } from '../analysis/clock.ts';
import { modalModel } from './modal-model.ts';
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
  const { model } = ws;
  const { result, fields } = solved;
  if (!result.converged) return { ok: false, refusal: { code: 'caseNotConverged', case: result.id, status: result.status } };
  const u = solved.displacements ?? translationsOnly(model, fields.positions);
  const { problem, direction, massOnly } = modalModel(ws, project, loads, u, fields.elementSlack);
  const { mass, free } = problem;

  const requested = Math.max(1, Math.floor(options.count ?? DEFAULT_MODE_COUNT));
  const out = lowestModes(problem, { count: requested, tolerance: options.tolerance });
  if (!out.ok) {
    const f = out.failure;
    return { ok: false, refusal: f.code === 'mechanism' ? { code: 'mechanism', dof: nameDof(model, f.dof) } : f };
  }
  const s = out.solution;
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
  if (massOnly.length > 0) notes.push({ code: 'slackMembersMassOnly', members: massOnly.map((k) => model.members[k].id) });
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

/** u from positions for a model without rotations. */
function translationsOnly(model: AnalysisModel, positions: Float64Array): Float64Array {
  if (model.dofs.count !== model.dofs.translationCount) throw new Error('modes: the solved state lacks its rotations (CaseSolution.displacements)');
  const u = new Float64Array(model.dofs.count);
  for (let d = 0; d < u.length; d++) u[d] = positions[d] - model.coords[d];
  return u;
}

/** A DOF by its node: user node id, or member and interior node number; rotations as rx, ry, rz. */
export function nameDof(model: AnalysisModel, dof: number): DofName {
  const node = model.dofs.dofNode[dof];
  const direction = (['x', 'y', 'z', 'rx', 'ry', 'rz'] as const)[model.dofs.dofDirection[dof]];
  if (node < model.userNodeCount) return { node: model.nodeIds[node], direction };
  for (const m of model.members) {
    const k = m.nodeChain.indexOf(node);
    if (k > 0) return { member: m.id, interior: k, direction };
  }
  return { direction };
}

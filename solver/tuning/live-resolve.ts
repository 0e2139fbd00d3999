/**
 * Live re-solve for a pretension slider: one case of one model, re-solved whenever one group's
 * pretension changes, warm-starting Newton from the previous solution (solveCase `start`).
 *
 * The model and workspace (sparsity pattern, symbolic factorisation) are built once. A change
 * sets, for every element of the group's members, Lr = chord/n and S0 = P/A — the same state
 * `buildModel` makes from MemberSpec.pretension = P (solver/model/build-model.ts) — and refreshes
 * the workspace's λ = 0 internal force, so a cold-start fall-back stays exact.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseFields, CaseResult } from '../results/types.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveNamedCaseLoads } from '../loads/resolve-case-loads.ts';
import { memberStartChord } from '../model/analysis-model.ts';
import { createWorkspace, setElementPrestress } from '../analysis/workspace.ts';
import { solveCase } from '../analysis/solve-case.ts';
import { membersOfGroup, groupExists } from '../checks/groups.ts';
import { nowMs } from '../analysis/clock.ts';

export interface LiveStep {
  result: CaseResult;
  fields: CaseFields;
  /** Wall time of the re-solve, s. */
  seconds: number;
  /** True when the warm start converged directly (no load stepping from the start shape). */
  warm: boolean;
}

export interface LiveResolver {
  readonly caseId: string;
  readonly group: string;
  /** Set the group's pretension, N (> 0), and re-solve the case. */
  setPretension(pretension: number): LiveStep;
  /** Forget the previous solution (next step is a cold start). */
  reset(): void;
}

export function createLiveResolver(project: ProjectFile, caseId: string, group: string): LiveResolver {
  if (!groupExists(project, group)) throw new Error(`live tuning: group "${group}" does not exist`);
  const model = buildModel(project);
  const loads = resolveNamedCaseLoads(model, project, caseId);
  if (!loads) throw new Error(`live tuning: case "${caseId}" does not exist`);
  const ws = createWorkspace(model);
  const ids = membersOfGroup(project, group);
  const elements: number[] = [];
  const chordShare: number[] = [];
  for (const m of model.members) {
    if (!ids.has(m.id)) continue;
    const chord = memberStartChord(model, m);
    for (let e = m.firstElement; e < m.firstElement + m.elementCount; e++) {
      elements.push(e);
      chordShare.push(chord / m.elementCount);
    }
  }
  let previous: Float64Array | undefined;

  return {
    caseId,
    group,
    reset() { previous = undefined; },
    setPretension(pretension: number): LiveStep {
      if (!(pretension > 0) || !Number.isFinite(pretension)) throw new Error(`live tuning: pretension must be a positive force in N, got ${pretension}`);
      setElementPrestress(ws, elements, chordShare, elements.map((e) => pretension / model.elemArea[e]));
      const t0 = nowMs();
      const s = solveCase(ws, caseId, loads, previous ? { start: previous } : {});
      const seconds = (nowMs() - t0) / 1000;
      const warm = previous !== undefined && s.result.stats.loadSteps <= 1;
      if (s.result.converged) previous = s.fields.positions;
      return { result: s.result, fields: s.fields, seconds, warm };
    },
  };
}

/**
 * One model and workspace (sparsity pattern and symbolic factorisation) kept for every solve of a
 * tuning run: `solve(values, caseId, start)` writes the variables into the model's elements and
 * solves one case, from `start` when given (a warm start) or from the pretensioned start shape.
 *
 * Setting the variables writes, for every element of the group's members, the state buildModel
 * makes from the edited MemberSpec (solver/model/build-model.ts):
 * - by 'pretension' P:        Lr = chord/n, S0 = P/A, stress-free length stressFreeLength(Lr, S0, E);
 * - by 'unstressedLength' f:  Lr = f·L0/n, S0 = 0, stress-free length Lr.
 * Self-weight follows the stress-free length (assembly uses it for the element mass). Interior
 * nodes keep their first start shape: that only changes Newton's starting point, not the solution.
 * A solve depends only on (values, case, start), not on what the session solved before, so two
 * sessions on two threads give the same numbers for the same request (tested).
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveNamedCaseLoads } from '../loads/resolve-case-loads.ts';
import { memberStartChord } from '../model/analysis-model.ts';
import { createWorkspace, setElementPrestress } from '../analysis/workspace.ts';
import { solveCase } from '../analysis/solve-case.ts';
import type { ResolvedVariable } from './tuning-types.ts';

interface ElementSlot { e: number; chordShare: number; baseShare: number }

/** A solved case of a session: its result, and its final node positions (3 × node count, m). */
export interface SessionSolve { result: CaseResult; positions: Float64Array }

export interface CaseSession {
  /** Solve case `caseId` with the variables at `values` (N or length factor, variable order). */
  solve(values: readonly number[], caseId: string, start?: Float64Array): SessionSolve;
}

export function createCaseSession(project: ProjectFile, vars: readonly ResolvedVariable[], caseIds: readonly string[]): CaseSession {
  const model = buildModel(project);
  const ws = createWorkspace(model);
  const loads = new Map<string, CaseLoads>();
  for (const id of caseIds) {
    const caseLoads = resolveNamedCaseLoads(model, project, id);
    if (!caseLoads) throw new Error(`case "${id}" does not exist`);
    loads.set(id, caseLoads);
  }
  const topoById = new Map(model.members.map((m) => [m.id, m]));
  const slots: ElementSlot[][] = vars.map((v) => v.memberIds.flatMap((id, j) => {
    const m = topoById.get(id)!;
    const chord = memberStartChord(model, m);
    return Array.from({ length: m.elementCount }, (_, k) => ({
      e: m.firstElement + k, chordShare: chord / m.elementCount, baseShare: v.baseUnstressedLength[j] / m.elementCount,
    }));
  }));
  let current: readonly number[] | null = null;

  const setValues = (values: readonly number[]): void => {
    if (current && current.length === values.length && current.every((v, k) => v === values[k])) return;
    const elements: number[] = [], refLength: number[] = [], initialStress: number[] = [];
    vars.forEach((v, k) => {
      for (const s of slots[k]) {
        elements.push(s.e);
        if (v.by === 'pretension') {
          refLength.push(s.chordShare);
          initialStress.push(values[k] / model.elemArea[s.e]);
        } else {
          refLength.push(values[k] * s.baseShare);
          initialStress.push(0);
        }
      }
    });
    setElementPrestress(ws, elements, refLength, initialStress);
    current = [...values];
  };

  return {
    solve(values, caseId, start) {
      const caseLoads = loads.get(caseId);
      if (!caseLoads) throw new Error(`tuning: case "${caseId}" is not one of the session's cases`);
      setValues(values);
      const s = solveCase(ws, caseId, caseLoads, start ? { start } : {});
      return { result: s.result, positions: s.fields.positions };
    },
  };
}

/**
 * A tuning session that keeps one model and workspace (sparsity pattern and symbolic
 * factorisation) for every evaluation and warm-starts each case from its previous solution —
 * the fast default CaseSolve path of tuneProject.
 *
 * Setting the variables writes, for every element of the group's members, the state buildModel
 * makes from the edited MemberSpec (solver/model/build-model.ts):
 * - by 'pretension' P:        Lr = chord/n, S0 = P/A, stress-free length stressFreeLength(Lr, S0, E);
 * - by 'unstressedLength' f:  Lr = f·L0/n, S0 = 0, stress-free length Lr.
 * Self-weight follows the stress-free length (assembly uses it for the element mass). Interior
 * nodes keep their first start shape: that only changes Newton's starting point, not the solution.
 * The equivalence with the rebuild path (applyVariables + solveProject) is tested.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import type { CaseLoads } from '../loads/case-loads.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveCaseLoads, resolveCombinationLoads } from '../loads/resolve-case-loads.ts';
import { createWorkspace, setElementPrestress } from '../analysis/workspace.ts';
import { solveCase } from '../analysis/solve-case.ts';
import type { ResolvedVariable } from './tuning-types.ts';

interface ElementSlot { e: number; chordShare: number; baseShare: number }

export function createWarmSession(
  project: ProjectFile, vars: readonly ResolvedVariable[], caseIds: readonly string[],
): (values: readonly number[]) => Map<string, CaseResult> {
  const model = buildModel(project);
  const ws = createWorkspace(model);
  const loads = new Map<string, CaseLoads>();
  for (const id of caseIds) {
    const spec = project.loadCases.find((c) => c.id === id);
    const combo = project.combinations?.find((c) => c.id === id);
    if (!spec && !combo) throw new Error(`case "${id}" does not exist`);
    loads.set(id, spec ? resolveCaseLoads(model, project, spec) : resolveCombinationLoads(model, project, combo!));
  }
  const topoById = new Map(model.members.map((m) => [m.id, m]));
  const slots: ElementSlot[][] = vars.map((v) => v.memberIds.flatMap((id, j) => {
    const m = topoById.get(id)!;
    const a = 3 * m.nodeChain[0], b = 3 * m.nodeChain[m.nodeChain.length - 1];
    const c = model.coords;
    const chord = Math.hypot(c[b] - c[a], c[b + 1] - c[a + 1], c[b + 2] - c[a + 2]);
    return Array.from({ length: m.elementCount }, (_, k) => ({
      e: m.firstElement + k, chordShare: chord / m.elementCount, baseShare: v.baseUnstressedLength[j] / m.elementCount,
    }));
  }));
  const previous = new Map<string, Float64Array>();

  return (values) => {
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
    const out = new Map<string, CaseResult>();
    for (const id of caseIds) {
      const start = previous.get(id);
      const s = solveCase(ws, id, loads.get(id)!, start ? { start } : {});
      if (s.result.converged) previous.set(id, s.fields.positions);
      out.set(id, s.result);
    }
    return out;
  };
}

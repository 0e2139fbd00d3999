/**
 * A solve session that warm-starts each case from its own previous solution: evaluations of
 * the variables one after another (the as-built fit, solver/asbuilt/fit-lengths.ts). The model
 * and workspace are kept (case-session.ts). The equivalence with the rebuild path
 * (applyVariables + solveProject) is tested.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { createCaseSession } from './case-session.ts';
import type { ResolvedVariable } from './tuning-types.ts';

export function createWarmSession(
  project: ProjectFile, vars: readonly ResolvedVariable[], caseIds: readonly string[],
): (values: readonly number[]) => Map<string, CaseResult> {
  const session = createCaseSession(project, vars, caseIds);
  const previous = new Map<string, Float64Array>();
  return (values) => {
    const out = new Map<string, CaseResult>();
    for (const id of caseIds) {
      const s = session.solve(values, id, previous.get(id));
      if (s.result.converged) previous.set(id, s.positions);
      out.set(id, s.result);
    }
    return out;
  };
}

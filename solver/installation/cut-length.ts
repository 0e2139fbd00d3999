import type { AnalysisModel } from '../model/analysis-model.ts';

/**
 * Cut (unstressed) length of every member, m: the sum of its elements' stress-free lengths
 * Lr·√(1 − 2 S0/E) at the reference temperature (solver/model/analysis-model.ts). End fittings
 * and the strand's constructional stretch are not included — the fabricator adds those.
 * Returned in model.members order.
 */
export function memberCutLengths(model: AnalysisModel): number[] {
  return model.members.map((m) => {
    let sum = 0;
    for (let e = m.firstElement; e < m.firstElement + m.elementCount; e++) sum += model.elemUnstressedLength[e];
    return sum;
  });
}

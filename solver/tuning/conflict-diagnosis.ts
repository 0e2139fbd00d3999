/**
 * Why targets are not met, as structured notes (TuningNote; words at the edge), from the final gaps g and sensitivities ∂g/∂u.
 *
 * For each unmet target i:
 * - no variable influences it: every |∂g_i/∂u_k| below `threshold`;
 * - a variable would have to move past a bound: the helpful direction d_k = −sign(∂g_i/∂u_k · g_i)
 *   points out of the bound the variable sits on;
 * - two targets pull the same variable in opposite directions: a binding target j (an equality, or
 *   an inequality within the margin of its limit) worsens when u_k moves along d_k
 *   (∂g_j/∂u_k · d_k > 0 for "≤"; any |∂g_j/∂u_k| > threshold for "=").
 * The thresholds are common-practice choices (1e-6 in g per scale unit of u).
 */
import type { TargetSense, TuningNote } from './tuning-types.ts';

export interface DiagnosisInput {
  senses: TargetSense[];
  gaps: number[];
  met: boolean[];
  /** ∂g/∂u, rows = targets. */
  jacobian: number[][];
  variables: { group: string; by: 'pretension' | 'unstressedLength'; value: number; lower: number; upper: number }[];
  margin: number;
  threshold?: number;
}

/** A bound as a message quantity: pretension N (force) or a length factor (ratio). */
const boundQuantity = (by: 'pretension' | 'unstressedLength', v: number) => ({ value: v, kind: by === 'pretension' ? 'force' as const : 'ratio' as const });

export function diagnoseTargets(input: DiagnosisInput): TuningNote[] {
  const th = input.threshold ?? 1e-6;
  const out: TuningNote[] = [];
  const reportedPairs = new Set<string>();
  input.met.forEach((isMet, i) => {
    if (isMet) return;
    const row = input.jacobian[i];
    const influencing = row.map((_, k) => k).filter((k) => Math.abs(row[k]) > th);
    if (influencing.length === 0) {
      out.push({ code: 'noInfluence', quantities: {}, refs: { target: String(i), groups: input.variables.map((v) => v.group) } });
      return;
    }
    const notes: TuningNote[] = [];
    for (const k of influencing) {
      const v = input.variables[k];
      const d = -Math.sign(row[k] * input.gaps[i]);
      const direction = d > 0 ? 'up' : 'down';
      const atUpper = v.value >= v.upper && d > 0;
      const atLower = v.value <= v.lower && d < 0;
      if (atUpper || atLower) {
        notes.push({ code: 'atBound', quantities: { bound: boundQuantity(v.by, atUpper ? v.upper : v.lower) }, refs: { target: String(i), group: v.group, by: v.by, bound: atUpper ? 'upper' : 'lower', direction } });
      }
      input.met.forEach((_, j) => {
        if (j === i) return;
        const binding = input.senses[j] === 'equal' || input.gaps[j] > -input.margin - 1e-9;
        if (!binding) return;
        const harm = input.senses[j] === 'equal' ? Math.abs(input.jacobian[j][k]) > th : input.jacobian[j][k] * d > th;
        const pair = `${Math.min(i, j)}|${Math.max(i, j)}|${k}`;
        if (harm && !reportedPairs.has(pair)) {
          reportedPairs.add(pair);
          notes.push({ code: 'conflict', quantities: {}, refs: { target: String(i), other: String(j), group: v.group, by: v.by, direction } });
        }
      });
    }
    if (notes.length === 0) notes.push({ code: 'iterationLimit', quantities: { gap: { value: input.gaps[i], kind: 'share' } }, refs: { target: String(i) } });
    out.push(...notes);
  });
  return out;
}

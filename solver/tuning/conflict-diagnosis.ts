/**
 * Why targets are not met, in plain sentences, from the final gaps g and sensitivities ∂g/∂u.
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
import type { TargetSense } from './tuning-types.ts';

export interface DiagnosisInput {
  targetLabels: string[];
  senses: TargetSense[];
  gaps: number[];
  met: boolean[];
  /** ∂g/∂u, rows = targets. */
  jacobian: number[][];
  variables: { label: string; by: 'pretension' | 'unstressedLength'; value: number; lower: number; upper: number }[];
  margin: number;
  threshold?: number;
}

function boundText(by: 'pretension' | 'unstressedLength', v: number): string {
  return by === 'pretension' ? `${(v / 1000).toFixed(1)} kN` : `factor ${v.toFixed(4)}`;
}

function directionWord(by: 'pretension' | 'unstressedLength', d: number): string {
  if (by === 'pretension') return d > 0 ? 'higher' : 'lower';
  return d > 0 ? 'longer' : 'shorter';
}

export function diagnoseTargets(input: DiagnosisInput): string[] {
  const th = input.threshold ?? 1e-6;
  const out: string[] = [];
  const reportedPairs = new Set<string>();
  const noun = (k: number) => `the ${input.variables[k].by === 'pretension' ? 'pretension' : 'unstressed length'} of '${input.variables[k].label}'`;
  input.targetLabels.forEach((label, i) => {
    if (input.met[i]) return;
    const row = input.jacobian[i];
    const influencing = row.map((_, k) => k).filter((k) => Math.abs(row[k]) > th);
    if (influencing.length === 0) {
      out.push(`${label} cannot be met: no tuning variable changes it (${input.variables.map((v) => `'${v.label}'`).join(', ')}); add a variable for a group that acts on it.`);
      return;
    }
    const reasons: string[] = [];
    for (const k of influencing) {
      const v = input.variables[k];
      const d = -Math.sign(row[k] * input.gaps[i]);
      const atUpper = v.value >= v.upper && d > 0;
      const atLower = v.value <= v.lower && d < 0;
      if (atUpper || atLower) {
        reasons.push(`${label} needs ${noun(k)} ${d > 0 ? 'above its upper' : 'below its lower'} bound ${boundText(v.by, atUpper ? v.upper : v.lower)}`);
      }
      input.targetLabels.forEach((other, j) => {
        if (j === i) return;
        const binding = input.senses[j] === 'equal' || input.gaps[j] > -input.margin - 1e-9;
        if (!binding) return;
        const harm = input.senses[j] === 'equal' ? Math.abs(input.jacobian[j][k]) > th : input.jacobian[j][k] * d > th;
        const pair = `${Math.min(i, j)}|${Math.max(i, j)}|${k}`;
        if (harm && !reportedPairs.has(pair)) {
          reportedPairs.add(pair);
          reasons.push(`${label} needs ${noun(k)} ${directionWord(v.by, d)}, which ${other} does not allow: the two targets conflict`);
        }
      });
    }
    if (reasons.length === 0) reasons.push(`${label} was not met within the iteration limit (gap ${(input.gaps[i] * 100).toFixed(1)} % of the limit); try other start values or more variables`);
    out.push(...reasons.map((r) => `${r}.`));
  });
  return out;
}

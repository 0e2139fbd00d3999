/**
 * A tensioning sequence of the project, analysed: settings per step, the state after every stage,
 * issues, the comparison of the final state with the one-shot design state, and — when the order
 * fails — suggestions that were themselves simulated and pass:
 * 1. a reordering (greedy: at each position the remaining step whose stage scores best, see
 *    stageScore; up to MAX_REORDER_STEPS steps);
 * 2. a second pass (pass 1 at strain share 0.5, then every member to its design length);
 * 3. else, for a stage that is a mechanism, 'restrainOrGroup'; otherwise 'none'.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { ProjectFile } from '../project/types.ts';
import type { SequenceIssue, SequenceResult, SequenceSuggestion } from './sequence-types.ts';
import { designUnstressedLengths, withUnstressedLengths } from './design-lengths.ts';
import { resolveSequence, sequenceIndex, type ResolvedSequence } from './resolve-sequence.ts';
import { simulateSequence } from './simulate-sequence.ts';
import { solveStage, type StageSolution } from './stage-solver.ts';
import { evaluateStage, lowerEnd, stageScore } from './stage-evaluation.ts';

export const MAX_REORDER_STEPS = 12;
const SECOND_PASS_SHARE = 0.5;

export function runSequence(project: ProjectFile, sequenceId: string): SequenceResult {
  const index = sequenceIndex(project, sequenceId);
  const seq = resolveSequence(project, project.sequences![index], index);
  const L0 = designUnstressedLengths(project);
  const design = withUnstressedLengths(project, L0);
  const deltaT = seq.temperature - seq.referenceTemperature;
  const oneShot = solveStage(design, { present: new Set(design.members.map((m) => m.id)), lengths: L0, restraints: [], deltaT, selfWeight: seq.selfWeight });
  if (!oneShot.result.converged) throw new Error(`sequence "${sequenceId}": the design state itself does not solve (${oneShot.result.status}): ${oneShot.result.message ?? ''}`);
  const designTension = new Map(oneShot.result.members.map((m) => [m.id, lowerEnd(design, m)]));

  const sim = simulateSequence(design, L0, seq, { designTension });
  const issues: SequenceIssue[] = [...sim.issues];
  const finalDifference = sim.final ? difference(design, sim.final, designTension) : Infinity;
  if (sim.final) {
    const scale = Math.max(...designTension.values()) * 0.01;
    for (const m of sim.final.result.members) {
      const t = lowerEnd(design, m), d = designTension.get(m.id)!;
      if (Math.abs(t - d) > 1e-6 * Math.max(Math.abs(d), scale)) issues.push({ code: 'finalMismatch', member: m.id, value: t, design: d });
    }
  }
  const ok = issues.length === 0;
  return {
    id: sequenceId, temperature: seq.temperature, referenceTemperature: seq.referenceTemperature,
    referenceTemperatureAssumed: seq.referenceTemperatureAssumed, order: seq.steps.map((_, i) => i), passes: 1,
    stages: sim.stages, design: [...designTension].map(([member, tension]) => ({ member, tension })), finalDifference, issues, ok,
    suggestions: ok ? [] : suggest(design, L0, seq, designTension, sim.stages.find((s) => !s.converged)?.index),
    resistanceFactor: seq.resistanceFactor, plumbLimit: seq.plumb?.limit ?? null,
  };
}

/** Largest |final − design| / max(|design|, 1 % of the largest design tension) over members (lower-end tensions). */
function difference(design: ProjectFile, final: StageSolution, designTension: ReadonlyMap<string, number>): number {
  const scale = Math.max(...designTension.values()) * 0.01;
  let worst = 0;
  for (const r of final.result.members) {
    const d = designTension.get(r.id)!;
    worst = Math.max(worst, Math.abs(lowerEnd(design, r) - d) / Math.max(Math.abs(d), scale));
  }
  return worst;
}

function suggest(
  design: ProjectFile, L0: ReadonlyMap<string, number>, seq: ResolvedSequence, designTension: ReadonlyMap<string, number>, mechanismStage?: number,
): SequenceSuggestion[] {
  const out: SequenceSuggestion[] = [];
  const order = greedyOrder(design, L0, seq);
  if (order && simulateSequence(design, L0, seq, { order, settings: false, designTension, stopAtIssue: true }).issues.length === 0) out.push({ code: 'reorder', order });
  const two = simulateSequence(design, L0, seq, { passes: 2, share: SECOND_PASS_SHARE, settings: false, designTension, stopAtIssue: true });
  if (two.issues.length === 0) out.push({ code: 'secondPass', share: SECOND_PASS_SHARE });
  if (out.length === 0 && mechanismStage !== undefined) out.push({ code: 'restrainOrGroup', stage: mechanismStage });
  if (out.length === 0) out.push({ code: 'none' });
  return out;
}

/**
 * Greedy step order (see the file comment): each candidate is one stage solve on top of the chosen
 * prefix, warm-started; restraints released during the sequence are ignored in the search (the
 * suggestion is verified by a full simulation). Null when the sequence is too long to search.
 */
function greedyOrder(design: ProjectFile, L0: ReadonlyMap<string, number>, seq: ResolvedSequence): number[] | null {
  const n = seq.steps.length;
  if (n > MAX_REORDER_STEPS || n < 2) return null;
  const stepped = new Set(seq.steps.flatMap((s) => s.members));
  const present = new Set(design.members.filter((m) => !stepped.has(m.id)).map((m) => m.id));
  const restraints = seq.restraints.filter((r) => r.releaseAfterStep === null);
  const deltaT = seq.temperature - seq.referenceTemperature;
  const order: number[] = [];
  const left = new Set(seq.steps.map((_, i) => i));
  let previous: StageSolution | undefined;
  while (left.size) {
    let best = -1, bestScore = Infinity, bestSol: StageSolution | undefined;
    for (const k of left) {
      const trial = new Set([...present, ...seq.steps[k].members]);
      const sol = solveStage(design, { present: trial, lengths: L0, restraints, deltaT, selfWeight: seq.selfWeight }, previous?.positions);
      const score = stageScore(evaluateStage(design, sol.result, order.length + 1, seq.resistanceFactor, seq.plumb));
      if (score < bestScore) { bestScore = score; best = k; bestSol = sol; }
    }
    if (best < 0) return null;
    order.push(best);
    left.delete(best);
    for (const id of seq.steps[best].members) present.add(id);
    previous = bestSol;
  }
  return order;
}

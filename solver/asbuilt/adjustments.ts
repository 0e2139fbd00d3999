/**
 * The fewest length adjustments that bring every cable's tension at the reference state within
 * its tolerance of the design tension. Greedy forward selection (a heuristic, not a proven
 * minimum): each round tries resetting every remaining cable whose as-built length differs from
 * its design length by more than `minimumChange` (e.g. its posterior σ — smaller changes are not
 * known to be real) to its design length, re-solving the reference state through the nonlinear
 * solver, and keeps the reset that most reduces Σ max(0, d − 1)² over the cables, d being the
 * deviation |T − T_design| in units of the tolerance. When no single reset helps (two cables
 * that offset each other), pairs are tried (up to MAX_PAIR_SEARCH candidates). It stops when every
 * cable is within tolerance or nothing helps. (`identified` is filled in by the caller.)
 */
import type { Adjustment } from './asbuilt-types.ts';

/** Lower-end tension per member at the reference state for the given lengths, or null when it does not solve. */
/** Largest number of candidate cables for which pairs of resets are tried. */
export const MAX_PAIR_SEARCH = 12;

export type ReferenceSolve = (lengths: ReadonlyMap<string, number>) => Map<string, number> | null;

export interface AdjustmentPlan {
  adjustments: Adjustment[];
  /** Members still out of tolerance after the plan (empty when it succeeds). */
  remaining: string[];
  /** Tensions at the reference state after the plan, N. */
  tensions: Map<string, number>;
}

export interface AdjustmentInput {
  cables: readonly string[];
  design: ReadonlyMap<string, number>;
  designTension: ReadonlyMap<string, number>;
  asBuilt: ReadonlyMap<string, number>;
  /** Smallest length change worth making per cable, m. */
  minimumChange: ReadonlyMap<string, number>;
  tolerance: number;
  solve: ReferenceSolve;
  start: Map<string, number>;
}

export function planAdjustments(input: AdjustmentInput): AdjustmentPlan {
  const { cables, design, designTension, tolerance } = input;
  const lengths = new Map(input.asBuilt);
  let tensions = input.start;
  const deviation = (t: ReadonlyMap<string, number>, id: string) => {
    const d = designTension.get(id)!;
    return Math.abs(t.get(id)! - d) / (tolerance * Math.max(Math.abs(d), 1));
  };
  const excess = (t: ReadonlyMap<string, number>) => cables.reduce((s, id) => s + Math.max(0, deviation(t, id) - 1) ** 2, 0);
  const reset: string[] = [];
  let score = excess(tensions);
  const movable = () => cables.filter((id) => !reset.includes(id) && Math.abs(lengths.get(id)! - design.get(id)!) > (input.minimumChange.get(id) ?? 0));
  const tryReset = (ids: string[]) => {
    const trial = new Map(lengths);
    for (const id of ids) trial.set(id, design.get(id)!);
    const t = input.solve(trial);
    return t ? { ids, t, score: excess(t) } : null;
  };
  while (score > 0) {
    const free = movable();
    let best: { ids: string[]; t: Map<string, number>; score: number } | null = null;
    const consider = (c: ReturnType<typeof tryReset>) => { if (c && c.score < score && (!best || c.score < best.score)) best = c; };
    for (const id of free) consider(tryReset([id]));
    if (!best && free.length <= MAX_PAIR_SEARCH) {
      for (let i = 0; i < free.length; i++) for (let j = i + 1; j < free.length; j++) consider(tryReset([free[i], free[j]]));
    }
    if (!best) break;
    const chosen: { ids: string[]; t: Map<string, number>; score: number } = best;
    for (const id of chosen.ids) { lengths.set(id, design.get(id)!); reset.push(id); }
    tensions = chosen.t;
    score = chosen.score;
  }
  return {
    adjustments: reset.map((id) => ({ member: id, lengthChange: design.get(id)! - input.asBuilt.get(id)!, targetTension: tensions.get(id)!, identified: true })),
    remaining: cables.filter((id) => deviation(tensions, id) > 1), tensions,
  };
}

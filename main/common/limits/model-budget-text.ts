/**
 * Words for a refused model-size budget (solver/model/model-budget.ts): what was estimated, the
 * limit it passes, and the members that drive it, e.g.
 *   The model is too large to solve here: 3,000,006 degrees of freedom (limit 300,000) …
 *   Most of it comes from members[2] "G1" (1,000,000 segments: 2,999,997 DOFs) …
 */
import type { BudgetVerdict, BudgetItem, ModelSizeEstimate, ModelBudget } from '../../../solver/index.ts';

const grouped = (n: number): string => Math.round(n).toLocaleString('en-US');
const megabytes = (b: number): string => `${grouped(b / 1e6)} MB`;

function itemText(item: BudgetItem, e: ModelSizeEstimate, b: ModelBudget): string {
  switch (item) {
    case 'dofs': return `${grouped(e.dofs)} degrees of freedom (limit ${grouped(b.maxDofs)})`;
    case 'factorNonzeros': return `about ${grouped(e.factorNonzeros)} entries in the factorised stiffness matrix (limit ${grouped(b.maxFactorNonzeros)})`;
    case 'bytes': return `about ${megabytes(e.bytes)} of memory (limit ${megabytes(b.maxBytes)})`;
  }
}

/** One paragraph explaining a refused budget, or null when the verdict is ok. */
export function modelBudgetRefusal(verdict: BudgetVerdict): string | null {
  if (verdict.ok) return null;
  const e = verdict.estimate;
  const items = verdict.exceeded.map((i) => itemText(i, e, verdict.budget)).join('; ');
  const head = `The model is too large to solve here: ${items}. It has ${grouped(e.nodes)} nodes and ${grouped(e.elements)} elements after splitting members into segments.`;
  if (e.drivers.length === 0) {
    return `${head} Nothing is split into segments, so the size comes from the nodes and members themselves; split the model or solve parts of it.`;
  }
  const named = e.drivers.map((d) => `members[${d.member}] "${d.id}" (${grouped(d.segments)} segments: ${grouped(d.dofs)} DOFs)`).join(', ');
  return `${head} Most of it comes from ${named}. Fewer segments per member bring it within the limit (the sag error of a divided cable falls as 1/n², so a few dozen segments are usually enough).`;
}

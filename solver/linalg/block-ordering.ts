/**
 * Fill-reducing ordering of a symmetric pattern by its DOF groups (dof-groups.ts), chosen per
 * model by predicted fill:
 *  - 'amd': approximate minimum degree (amd.ts) on the weighted group graph;
 *  - 'nd': nested dissection (nested-dissection.ts) on the same graph;
 *  - 'auto' (default): both; nnz(L) of each is counted exactly from its elimination tree and
 *    column counts (group-symbolic.ts), and the smaller is kept (AMD on a tie);
 *  - 'natural': the given order.
 * The chosen group order is then postordered by its elimination tree (same fill, subtrees
 * contiguous) and expanded to DOFs with the DOF elimination tree and column counts.
 */
import { approximateMinimumDegree } from './amd.ts';
import { nestedDissection } from './nested-dissection.ts';
import { groupSymbolic, expandToDofs, type GroupSymbolic } from './group-symbolic.ts';
import { postorderTree } from './elimination-tree.ts';
import type { DofGroups } from './dof-groups.ts';
import type { PermutedGroups } from './supernodal-symbolic.ts';

export type OrderingMethod = 'auto' | 'amd' | 'nd' | 'natural';

export interface BlockOrdering {
  /** perm[k] = original DOF eliminated k-th (postordered). */
  perm: Int32Array;
  /** DOF elimination tree and below-diagonal column counts in the permuted numbering. */
  parent: Int32Array;
  counts: Int32Array;
  /** The ordering used and nnz(L) (diagonal included) of every candidate tried. */
  chosen: 'amd' | 'nd' | 'natural';
  predicted: { amd?: number; nd?: number; natural?: number };
  /** The groups in the final order, with their permuted adjacency (for the supernodal structure). */
  groups: PermutedGroups;
}

export function blockOrdering(n: number, groups: DofGroups, method: OrderingMethod): BlockOrdering {
  const { m, ptr, idx, weight } = groups;
  const candidates: { name: 'amd' | 'nd' | 'natural'; order: Int32Array; sym: GroupSymbolic }[] = [];
  const tryOrder = (name: 'amd' | 'nd' | 'natural', order: Int32Array): void => {
    candidates.push({ name, order, sym: groupSymbolic(m, ptr, idx, weight, order) });
  };
  if (method === 'natural' || m === 0) tryOrder('natural', Int32Array.from({ length: m }, (_, i) => i));
  if (method === 'amd' || method === 'auto') tryOrder('amd', approximateMinimumDegree(m, ptr, idx, weight));
  if ((method === 'nd' || method === 'auto') && m > 0) tryOrder('nd', nestedDissection(m, ptr, idx, weight));
  let best = candidates[0];
  for (const c of candidates) if (c.sym.factorNonzeros < best.sym.factorNonzeros) best = c;
  const predicted: BlockOrdering['predicted'] = {};
  for (const c of candidates) predicted[c.name] = c.sym.factorNonzeros;
  // Postorder the chosen order's elimination tree (same fill, contiguous subtrees), then analyse
  // again in the final order.
  const post = postorderTree(best.sym.parent);
  const order = new Int32Array(m);
  for (let k = 0; k < m; k++) order[k] = best.order[post[k]];
  const sym = groupSymbolic(m, ptr, idx, weight, order);
  const { perm, parent, counts, first } = expandToDofs(n, groups.start, order, sym);
  return { perm, parent, counts, chosen: best.name, predicted, groups: { m, first, ptr: sym.ptr, idx: sym.idx } };
}

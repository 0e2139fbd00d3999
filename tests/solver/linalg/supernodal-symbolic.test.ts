import { describe, it, expect } from 'vitest';
import { adjacencyGraph, type SymmetricPattern } from '../../../solver/linalg/symmetric-pattern.ts';
import { groupDofs, uniformBlocks } from '../../../solver/linalg/dof-groups.ts';
import { blockOrdering } from '../../../solver/linalg/block-ordering.ts';
import { invertPermutation, permuteGraph } from '../../../solver/linalg/permutation.ts';
import { dropDecoupledEntries } from '../../../solver/linalg/decoupled-dofs.ts';
import { identityGroups, supernodalScatter, supernodalStructure } from '../../../solver/linalg/supernodal-symbolic.ts';
import { prng, randomSystem, gridLaplacian } from './random-systems.ts';

// Reference: the structure of L by plain symbolic elimination of the permuted pattern on a dense
// boolean matrix (eliminating column k joins every pair of its rows below k: the fill graph,
// T. A. Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4). The supernodal rows
// (found on DOF groups and expanded) and the scatter plan must agree with it entry by entry.

/** Dense boolean L of C = P A Pᵀ (lower part, diagonal set). */
function symbolicL(p: SymmetricPattern, perm: Int32Array): boolean[][] {
  const n = p.n;
  const pinv = invertPermutation(perm);
  const L = Array.from({ length: n }, () => new Array<boolean>(n).fill(false));
  for (let j = 0; j < n; j++) {
    for (let q = p.colPtr[j]; q < p.colPtr[j + 1]; q++) {
      const a = pinv[p.rowIdx[q]], b = pinv[j];
      L[Math.max(a, b)][Math.min(a, b)] = true;
    }
  }
  for (let k = 0; k < n; k++) {
    const below: number[] = [];
    for (let i = k + 1; i < n; i++) if (L[i][k]) below.push(i);
    for (const i of below) for (const j of below) if (i > j) L[i][j] = true;
  }
  return L;
}

/** Mixed 3- and 6-DOF node blocks over n DOFs. */
function mixedBlocks(n: number, rand: () => number): Int32Array {
  const starts = [0];
  while (starts[starts.length - 1] < n) starts.push(Math.min(n, starts[starts.length - 1] + (rand() < 0.3 ? 6 : 3)));
  return Int32Array.from(starts);
}

const cases: { name: string; make: () => { pattern: SymmetricPattern; blocks: Int32Array } }[] = [
  { name: 'random 3-DOF nodes', make: () => { const s = randomSystem(prng(7), 50, 3, 0.08); return { pattern: s.pattern, blocks: uniformBlocks(150, 3) }; } },
  {
    name: 'random 3/6-DOF nodes with decoupled DOFs',
    make: () => {
      const rand = prng(11);
      const s = randomSystem(rand, 40, 6, 0.07);
      const decoupled = Array.from({ length: 240 }, () => (rand() < 0.1 ? 1 : 0));
      return { pattern: dropDecoupledEntries(s.pattern, decoupled).reduced, blocks: mixedBlocks(240, rand) };
    },
  },
  { name: 'grid Laplacian, 1 DOF per node', make: () => ({ pattern: gridLaplacian(12).pattern, blocks: uniformBlocks(144, 1) }) },
];

describe.each(cases)('supernodal symbolic analysis on DOF groups ($name)', ({ make }) => {
  it.each(['amd', 'nd'] as const)('rows and scatter plan agree with symbolic elimination (%s, fundamental and relaxed)', (method) => {
    const { pattern, blocks } = make();
    const n = pattern.n;
    const graph = adjacencyGraph(pattern);
    const ord = blockOrdering(n, groupDofs(n, graph, blocks), method);
    const L = symbolicL(pattern, ord.perm);
    const pinv = invertPermutation(ord.perm);
    for (const relax of [false, true]) {
      const st = supernodalStructure(n, ord.groups, ord.parent, ord.counts, relax);
      // The same structure from the DOF graph itself (one group per DOF).
      const pg = permuteGraph(graph.ptr, graph.idx, ord.perm, pinv);
      const byDofs = supernodalStructure(n, identityGroups(n, pg.ptr, pg.idx), ord.parent, ord.counts, relax);
      expect(st.superStart).toEqual(byDofs.superStart);
      expect(st.rows).toEqual(byDofs.rows);
      for (let s = 0; s < st.nsuper; s++) {
        const f = st.superStart[s], l = st.superStart[s + 1];
        const expected: number[] = [];
        for (let i = f; i < n; i++) {
          let hit = i < l;
          for (let j = f; j < l && !hit; j++) hit = L[i][j];
          if (hit) expected.push(i);
        }
        expect(Array.from(st.rows.subarray(st.rowPtr[s], st.rowPtr[s + 1]))).toEqual(expected);
      }
      // Scatter plan: every entry of A exactly once, at its (row, column) in its supernode's block.
      const plan = supernodalScatter(st, pattern.colPtr, pattern.rowIdx, pinv);
      expect(Array.from(plan.src).sort((a, b) => a - b)).toEqual(Array.from({ length: pattern.rowIdx.length }, (_, q) => q));
      for (let s = 0; s < st.nsuper; s++) {
        const f = st.superStart[s], nr = st.rowPtr[s + 1] - st.rowPtr[s];
        const rows = Array.from(st.rows.subarray(st.rowPtr[s], st.rowPtr[s + 1]));
        for (let t = plan.superPtr[s]; t < plan.superPtr[s + 1]; t++) {
          const q = plan.src[t];
          let j = 0;
          while (pattern.colPtr[j + 1] <= q) j++;
          const a = pinv[pattern.rowIdx[q]], b = pinv[j];
          const row = Math.max(a, b), col = Math.min(a, b);
          expect(st.colToSuper[col]).toBe(s);
          expect(plan.pos[t]).toBe(st.valPtr[s] + (col - f) * nr + rows.indexOf(row));
        }
      }
    }
  });
});

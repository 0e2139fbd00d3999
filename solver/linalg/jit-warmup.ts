import { patternFromCoordinates } from './symmetric-pattern.ts';
import type { SparseLDL } from './sparse-ldl.ts';

/**
 * One-off warm-up of the numeric kernels before the first large factorisation in a process.
 * V8 otherwise compiles the hot loops on the fly (on-stack replacement) in the middle of the first
 * big factorisation, which measured noticeably slower than code compiled after a few small calls.
 * Costs a few milliseconds once; results of the warm-up are discarded.
 */
let warmedUp = false;

/** Factorises and solves a small SPD node-blocked grid system a few dozen times, once per process. */
export function warmUpKernels(create: (p: ReturnType<typeof patternFromCoordinates>['pattern']) => SparseLDL): void {
  if (warmedUp) return;
  warmedUp = true;
  const side = 10, nodes = side * side, n = 3 * nodes;
  const rows: number[] = [], cols: number[] = [], vals: number[] = [];
  for (let y = 0; y < side; y++) for (let x = 0; x < side; x++) {
    const a = y * side + x;
    const neighbours = [x + 1 < side ? a + 1 : -1, y + 1 < side ? a + side : -1];
    for (const b of neighbours) {
      if (b < 0) continue;
      for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) { rows.push(3 * b + r); cols.push(3 * a + c); vals.push(r === c ? -1 : -0.1); }
    }
    for (let r = 0; r < 3; r++) for (let c = 0; c <= r; c++) { rows.push(3 * a + r); cols.push(3 * a + c); vals.push(r === c ? 8 : 0.05); }
  }
  const { pattern, slot } = patternFromCoordinates(n, rows, cols);
  const values = new Float64Array(pattern.rowIdx.length);
  for (let q = 0; q < slot.length; q++) values[slot[q]] += vals[q];
  const ldl = create(pattern);
  const b = new Float64Array(n).fill(1);
  for (let r = 0; r < 40; r++) {
    if (ldl.factor(values) !== -1) return;
    ldl.solve(b, b);
  }
}

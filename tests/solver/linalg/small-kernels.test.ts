/**
 * The fused kernels for small supernodes (solver/linalg/small-updates.ts, factorPanel3 in
 * dense-panel.ts) give the general kernels' results to the last bit: the same expressions summed in
 * the same order, so a factor is unchanged by which path ran. Reference: the general buffered
 * kernels (updateGeneral, factorPanelGeneral), whose own results are checked against mathjs in
 * sparse-ldl.test.ts. Random storage layouts: descendant of 3 or 6 columns with any row count,
 * first row and number of target columns; panels of 3 columns with any row count, including a
 * zero pivot.
 */
import { describe, expect, it } from 'vitest';
import { updateGeneral } from '../../../solver/linalg/supernodal-ldl.ts';
import { updateFrom3, updateFrom6 } from '../../../solver/linalg/small-updates.ts';
import { factorPanel3, factorPanelGeneral } from '../../../solver/linalg/dense-panel.ts';
import { prng } from './random-systems.ts';

const bits = (a: Float64Array): number[] => Array.from(new Int32Array(a.buffer.slice(0)));

describe('small supernode kernels', () => {
  it.each([3, 6])('update from a descendant of %i columns = the general update, bit for bit', (ncd) => {
    const rand = prng(31 + ncd);
    const fused = ncd === 3 ? updateFrom3 : updateFrom6;
    for (let trial = 0; trial < 300; trial++) {
      const nrd = ncd + 1 + Math.floor(rand() * 14); // descendant rows
      const i1 = ncd + Math.floor(rand() * (nrd - ncd)); // first row below its own columns
      const m = nrd - i1;
      const ncu = 1 + Math.floor(rand() * m); // target columns hit
      const nr = m + Math.floor(rand() * 5); // target rows (≥ the rows it receives)
      const based = 0, base = nrd * ncd + 7;
      const Lx = Float64Array.from({ length: base + nr * nr }, () => (rand() - 0.5) * 10 ** Math.floor(rand() * 6 - 3));
      const D = Float64Array.from({ length: ncd + 2 }, () => (rand() - 0.3) * 5);
      // Target rows: distinct, ascending, the first ncu inside the target's columns (< nr).
      const relBuf = new Int32Array(m);
      let row = 0;
      for (let k = 0; k < m; k++) { row += k === 0 ? Math.floor(rand() * (nr - m + 1)) : 1 + (rand() < 0.2 && row + m - k < nr ? 1 : 0); relBuf[k] = Math.min(row, nr - m + k); row = relBuf[k]; }
      const a = Lx.slice(), b = Lx.slice();
      const work = () => new Float64Array(32);
      updateGeneral(a, D, work(), work(), work(), work(), relBuf, based, nrd, 1, ncd, i1, m, ncu, base, nr);
      fused(b, D, relBuf, based, nrd, 1, i1, m, ncu, base, nr);
      expect(bits(b)).toEqual(bits(a));
      expect(bits(a)).not.toEqual(bits(Lx)); // something was updated
    }
  });

  it('3-column panel = the general panel factorisation, bit for bit (also at a zero pivot)', () => {
    const rand = prng(77);
    for (let trial = 0; trial < 300; trial++) {
      const nr = 3 + Math.floor(rand() * 13);
      const base = 5, f = 2;
      const Lx = Float64Array.from({ length: base + 3 * nr }, () => (rand() - 0.5) * 4);
      for (let j = 0; j < 3; j++) Lx[base + j * nr + j] = (rand() < 0.5 ? -1 : 1) * (3 + rand());
      if (trial % 10 === 0) Lx[base + nr + 1] = Lx[base + 1] * Lx[base + 1] / Lx[base]; // column 1's pivot cancels
      const aDiag = Float64Array.from({ length: f + 3 }, (_, j) => (j >= f ? Math.abs(Lx[base + (j - f) * nr + j - f]) : 0));
      const [a, b] = [Lx.slice(), Lx.slice()];
      const [Da, Db] = [new Float64Array(f + 3), new Float64Array(f + 3)];
      const work = () => new Float64Array(32);
      const ra = factorPanelGeneral(a, base, nr, 3, Da, f, aDiag, 1e-12, 1e-300, work(), work(), work(), work());
      const rb = factorPanel3(b, base, nr, Db, f, aDiag, 1e-12, 1e-300);
      expect(rb).toBe(ra);
      expect(bits(b)).toEqual(bits(a));
      expect(bits(Db)).toEqual(bits(Da));
    }
  });
});

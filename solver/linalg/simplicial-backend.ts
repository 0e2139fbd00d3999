import type { FactorBackend } from './factor-backend.ts';
import type { PermutedUpper } from './permuted-upper.ts';
import { SimplicialLDL } from './simplicial-ldl.ts';

/** FactorBackend over the simplicial up-looking LDLᵀ: scatters A's values into C's upper triangle. */
export class SimplicialBackend implements FactorBackend {
  readonly factorNonzeros: number;
  private readonly ldl: SimplicialLDL;
  private readonly map: Int32Array;
  private readonly cx: Float64Array;

  constructor(n: number, upper: PermutedUpper, parent: Int32Array, colCount: Int32Array) {
    this.ldl = new SimplicialLDL(n, upper.ptr, upper.idx, parent, colCount);
    this.map = upper.map;
    this.cx = new Float64Array(upper.idx.length);
    this.factorNonzeros = this.ldl.Lp[n] + n;
  }

  factor(values: Float64Array, tol: number, tiny: number): number {
    const { map, cx } = this;
    for (let q = 0; q < map.length; q++) cx[map[q]] = values[q];
    return this.ldl.factor(cx, tol, tiny);
  }

  solveInPlace(x: Float64Array): void { this.ldl.solveInPlace(x); }

  negativeCount(): number { return this.ldl.negativeCount(); }

  factorArrays(): Float64Array[] { return [this.ldl.Lx, this.ldl.D]; }
}

/**
 * Inclined cables under self-weight against the elastic catenary in closed form
 * (Irvine, Cable Structures, 1981, §2.2; reference implementation in reference/elastic-catenary.ts).
 *
 * Expected differences: (1) discretisation — n straight elements with lumped weight instead of a
 * continuous curve; element forces compare with the continuous tension at the element's mid
 * coordinate, O(1/n²); (2) material law — Irvine's stretch dp/ds = 1 + T/EA versus our
 * Green–Lagrange law N = EA λ(λ² − 1)/2, which differ in tension by a relative 1.5 ε (ε = T/EA ≤ 1e-3
 * here, so ≤ 1.5e-3 in the worst, taut case).
 */
import { describe, expect, it } from 'vitest';
import { solveProject, STANDARD_GRAVITY } from '../../solver/index.ts';
import { elasticCatenary } from './reference/elastic-catenary.ts';
import { singleCable, STRAND } from './helpers.ts';

const h = 40, v = 30; // chord 50 m
const w = STRAND.massPerLength * STANDARD_GRAVITY;
const EA = STRAND.E * STRAND.area;

function compare(L0: number, n: number, tensionTol: number) {
  const project = singleCable([h, 0, v], { segments: n, unstressedLength: L0 });
  const c = solveProject(project).report.cases[0];
  expect(c.converged).toBe(true);
  expect(c.stats.residual).toBeLessThan(1e-9);
  const ref = elasticCatenary(h, v, L0, w, EA);
  const m = c.members[0];
  const Lh = L0 / n;
  const tAt = (s: number) => Math.hypot(ref.H, ref.V0 + w * s);
  expect(Math.abs(m.tensionStart / tAt(Lh / 2) - 1)).toBeLessThan(tensionTol);
  expect(Math.abs(m.tensionEnd / tAt(L0 - Lh / 2) - 1)).toBeLessThan(tensionTol);
  // Horizontal reaction at A equals −H (the support pulls against the cable).
  const rA = c.reactions.find((r) => r.node === 'A')!;
  expect(Math.abs(-rA.force[0] / ref.H - 1)).toBeLessThan(tensionTol);
  // Sag: largest vertical distance below the chord at the same horizontal position.
  let sagRef = 0;
  for (let i = 1; i < 2000; i++) {
    const s = (L0 * i) / 2000;
    sagRef = Math.max(sagRef, (v / h) * ref.x(s) - ref.z(s));
  }
  expect(Math.abs(m.sag / sagRef - 1)).toBeLessThan(2e-3);
  return { m, ref, sagRef };
}

describe('elastic catenary (Irvine 1981)', () => {
  it('taut inclined cable, L0 shorter than the chord', () => {
    const { ref } = compare(49.985, 100, 2e-3);
    expect(ref.tensionAtA).toBeGreaterThan(5e3); // genuinely taut: strain ~ 4e-4
  });

  it('slack inclined cable, L0 4 % longer than the chord', () => {
    const { m } = compare(52, 100, 1e-3);
    expect(m.sag).toBeGreaterThan(5);
    expect(m.slack).toBe(false);
  });

  it('deeply slack inclined cable, L0 30 % longer than the chord', () => {
    compare(65, 100, 1e-3);
  });

  it('converges to the catenary as segments are added: H error falls as 1/n², sag within sag/n²', () => {
    const L0 = 52;
    const ref = elasticCatenary(h, v, L0, w, EA);
    let sagRef = 0;
    for (let i = 1; i < 20000; i++) { const s = (L0 * i) / 20000; sagRef = Math.max(sagRef, (v / h) * ref.x(s) - ref.z(s)); }
    const runs = [10, 20, 40, 80].map((n) => {
      const c = solveProject(singleCable([h, 0, v], { segments: n, unstressedLength: L0 })).report.cases[0];
      expect(c.converged).toBe(true);
      const hErr = Math.abs(-c.reactions.find((r) => r.node === 'A')!.force[0] / ref.H - 1);
      const sagErr = Math.abs(c.members[0].sag - sagRef);
      expect(sagErr).toBeLessThan(sagRef / (n * n));
      return hErr;
    });
    for (let k = 1; k < runs.length; k++) expect(runs[k]).toBeLessThan(runs[k - 1] / 3.5);
  });
});

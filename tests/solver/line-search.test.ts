import { describe, expect, it } from 'vitest';
import { lineSearch } from '../../solver/analysis/line-search.ts';

describe('line search on the energy slope', () => {
  // A quartic energy along the step, Π(s) = (s − 0.3)⁴: g(s) = −Π'(s) = −4 (s − 0.3)³ (closed form).
  const quartic = (s: number): [number, number] => [-4 * (s - 0.3) ** 3, Math.abs(4 * (s - 0.3) ** 3)];

  it('finds the energy minimum of a stiffening (quartic) profile to |g| ≤ ½ g(0)', () => {
    const g0 = quartic(0)[0];
    const s = lineSearch(quartic, g0, 1, Math.abs(g0));
    expect(Math.abs(quartic(s)[0])).toBeLessThanOrEqual(0.5 * g0);
    expect(s).toBeGreaterThan(0);
    expect(s).toBeLessThan(1);
  });

  it('takes the full step on a quadratic energy (Newton is exact there)', () => {
    const quadratic = (s: number): [number, number] => [1 - s, Math.abs(1 - s)];
    expect(lineSearch(quadratic, 1, 1, 1)).toBe(1);
  });

  it('takes a full step that lowers the residual even where the energy slope has turned', () => {
    // g(1) = −0.8 g(0) (an overshoot past the energy minimum along the step) but ‖R(1)‖ = ½ ‖R(0)‖:
    // the monotonicity test of damped Newton methods accepts it (line-search.ts).
    const turned = (s: number): [number, number] => [1 - 1.8 * s, 1 - 0.5 * s];
    expect(lineSearch(turned, 1, 1, 1)).toBe(1);
    // The same slope with a residual that grows is searched: the step is cut to the slope's root.
    const grows = (s: number): [number, number] => [1 - 1.8 * s, 1 + s];
    const s = lineSearch(grows, 1, 1, 1);
    expect(Math.abs(1 - 1.8 * s)).toBeLessThanOrEqual(0.5);
    expect(s).toBeLessThan(1);
  });

  it('halves past non-finite residuals and gives 0 when nothing is finite', () => {
    const blowsUp = (s: number): [number, number] => (s > 0.2 ? [NaN, NaN] : [1 - s, 1 - s]);
    const s = lineSearch(blowsUp, 1, 1, 1);
    expect(s).toBeGreaterThan(0);
    expect(s).toBeLessThanOrEqual(0.2);
    expect(lineSearch(() => [NaN, NaN], 1, 1, 1)).toBe(0);
  });
});

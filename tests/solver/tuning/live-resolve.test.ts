import { describe, expect, it } from 'vitest';
import { createLiveResolver } from '../../../solver/tuning/live-resolve.ts';
import { applyVariables, resolveVariables } from '../../../solver/tuning/tuning-variables.ts';
import { solveNamedCases } from '../../../solver/tuning/project-case-solver.ts';
import { singleSpan } from './fixtures.ts';

describe('live re-solve for the pretension slider', () => {
  it('gives the same state as a full rebuild and solve of the edited project, warm-started', () => {
    const base = singleSpan(20e3, 15);
    base.tuning = { variables: [{ group: 'span', by: 'pretension' }], targets: [{ kind: 'noSlack', group: 'span', case: 'dead' }] };
    const live = createLiveResolver(base, 'dead', 'span');
    const vars = resolveVariables(base);
    let coldIterations = 0;
    for (const [k, P] of [20e3, 22e3, 24e3, 26e3].entries()) {
      const step = live.setPretension(P);
      expect(step.result.converged).toBe(true);
      // Reference: the edited project rebuilt from scratch (independent path through buildModel).
      const ref = solveNamedCases(applyVariables(base, vars, [P]), ['dead']).get('dead')!;
      expect(step.result.members[0].tensionMax / ref.members[0].tensionMax).toBeCloseTo(1, 8);
      expect(step.result.members[0].sag).toBeCloseTo(ref.members[0].sag, 8);
      if (k === 0) coldIterations = step.result.stats.iterations;
      else {
        expect(step.warm).toBe(true);
        // The cold start already sits on the elastic-cable start shape of the stress-free length
        // (3 iterations), so a warm start from the previous slider position does about as well.
        expect(step.result.stats.iterations).toBeLessThanOrEqual(coldIterations + 1);
      }
    }
  });

  it('rejects an unknown group or case and a non-positive pretension', () => {
    const p = singleSpan(20e3);
    expect(() => createLiveResolver(p, 'dead', 'nope')).toThrow(/group "nope"/);
    expect(() => createLiveResolver(p, 'storm', 'span')).toThrow(/case "storm"/);
    expect(() => createLiveResolver(p, 'dead', 'span').setPretension(-1)).toThrow(/positive force/);
  });
});

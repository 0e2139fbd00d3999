/**
 * A case session's solve depends only on its request (variable values, case, warm start), not on
 * what the session solved before — the property that lets the tuner's solves run on any thread
 * (solver/tuning/case-session.ts, tuning-case-solver.ts). Reference: the same request on a fresh
 * session, compared bit for bit.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createCaseSession } from '../../../solver/tuning/case-session.ts';
import { resolveVariables } from '../../../solver/tuning/tuning-variables.ts';
import type { ProjectFile } from '../../../solver/project/types.ts';

const mast = (): ProjectFile => JSON.parse(readFileSync(new URL('../../fixtures/projects/kestrel-moor-mast.stayset.json', import.meta.url), 'utf8'));
const CASES = ['dead', 'wind-x', 'uls-wind'];

describe('case session', () => {
  it('gives the same bits for a request whatever it solved before (cold and warm starts)', () => {
    const p = mast();
    p.tuning = { variables: [{ group: 'guys', by: 'pretension' }], targets: [{ kind: 'noSlack', group: 'guys', case: 'dead' }] };
    const vars = resolveVariables(p);
    const busy = createCaseSession(p, vars, CASES);
    // History: other values, other cases, warm starts from them.
    const earlier = busy.solve([9e3], 'uls-wind');
    busy.solve([31e3], 'dead', earlier.positions);
    const start = createCaseSession(p, vars, CASES).solve([20e3], 'wind-x').positions;
    for (const [values, id, from] of [[[22e3], 'wind-x', undefined], [[22e3], 'wind-x', start], [[15e3], 'dead', start]] as const) {
      const a = busy.solve(values, id, from);
      const b = createCaseSession(p, vars, CASES).solve(values, id, from);
      expect(a.result.converged).toBe(true);
      expect(Array.from(a.positions)).toEqual(Array.from(b.positions));
      expect({ ...a.result, stats: { ...a.result.stats, seconds: 0, factorSeconds: 0 } })
        .toEqual({ ...b.result, stats: { ...b.result.stats, seconds: 0, factorSeconds: 0 } });
    }
  });
});

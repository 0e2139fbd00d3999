/**
 * Failed codes per member and node (solver/checks/failed-items.ts): the same lists as the
 * definition — for every item, the failures that name it, in report order (the reference below is
 * that definition written out as a scan per item) — gathered by reading each failure once, so a
 * report's item lists cost time linear in members + failures. Counted, not timed.
 */
import { describe, expect, it } from 'vitest';
import type { CheckCode, CheckResult, ProjectFile } from '../../../solver/index.ts';
import { runChecks } from '../../../solver/index.ts';
import { failedCodesByItem, MEMBER_CODES } from '../../../solver/checks/failed-items.ts';
import { caseResult } from './synthetic-report.ts';

const fail = (code: CheckCode, item: string): CheckResult => ({
  code, item, format: 'allowable', case: 'c', purpose: 'ultimate', quantity: 'force', value: 2, limit: 1, ratio: 2, pass: false, source: '',
});

/** The definition, one scan of all failures per item. */
function byScan(failures: CheckResult[], memberIds: string[], nodeIds: string[]) {
  const members = memberIds.map((id) => failures.filter((f) => f.item === id && MEMBER_CODES.includes(f.code)).map((f) => f.code));
  const nodes = nodeIds.map((id) => {
    const out: CheckCode[] = failures.filter((f) => (f.code === 'displacement' || f.code === 'uplift') && f.item === id).map((f) => f.code);
    for (const f of failures) {
      if (f.code === 'tilt' && f.item.split('→').includes(id)) out.push('tilt');
      if (f.code === 'twist' && f.item.split('+').includes(id)) out.push('twist');
    }
    return out;
  });
  return { members, nodes };
}

describe('failed codes per item', () => {
  const memberIds = Array.from({ length: 40 }, (_, i) => `m${i}`);
  const nodeIds = Array.from({ length: 12 }, (_, i) => `n${i}`);
  const failures: CheckResult[] = [];
  for (let k = 0; k < 300; k++) {
    const m = memberIds[(k * 7) % memberIds.length], n = nodeIds[(k * 5) % nodeIds.length], n2 = nodeIds[(k * 3 + 1) % nodeIds.length];
    const pick = k % 7;
    if (pick === 0) failures.push(fail('tilt', `${n}→${n2}`));
    else if (pick === 1) failures.push(fail('twist', `${n}+${n2}+${nodeIds[(k + 4) % nodeIds.length]}`));
    else if (pick === 2) failures.push(fail(k % 2 ? 'displacement' : 'uplift', n));
    else failures.push(fail(MEMBER_CODES[k % MEMBER_CODES.length], m));
  }

  it('gives the lists of the definition, in report order', () => {
    const got = failedCodesByItem(failures);
    const want = byScan(failures, memberIds, nodeIds);
    expect(memberIds.map((id) => got.members.get(id) ?? [])).toEqual(want.members);
    expect(nodeIds.map((id) => got.nodes.get(id) ?? [])).toEqual(want.nodes);
  });

  it('reads every failure exactly once, whatever the number of items', () => {
    let reads = 0;
    const counted = new Proxy(failures, {
      get(target, key, receiver) {
        if (typeof key === 'string' && /^\d+$/.test(key)) reads++;
        return Reflect.get(target, key, receiver) as unknown;
      },
    });
    failedCodesByItem(counted);
    expect(reads).toBe(failures.length);
  });

  it('runChecks lists each failing member and node with its codes (2,000 members, all failing)', () => {
    const n = 2000;
    const p: ProjectFile = {
      format: 'stayset-project', version: 2,
      nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [10, 0, 0] }],
      sections: [{ id: 's', E: 1.6e11, area: 1e-4, breakingLoad: 10e3 }],
      members: Array.from({ length: n }, (_, i) => ({ id: `c${i}`, kind: 'cable' as const, from: 'A', to: 'B', section: 's' })),
      loadCases: [{ id: 'c' }],
      designBasis: { format: 'allowable', allowable: { cableSafetyFactor: 2 } },
      checks: { displacementLimits: [{ node: 'B', limit: 0.01 }] },
    };
    // Every cable above MBL/SF = 5 kN (allowable format, cableSafetyFactor 2), B moved 0.1 m > 0.01 m.
    const report = { cases: [caseResult('c', p.members.map((m) => ({ id: m.id, tensionMax: 8e3, tensionMin: 8e3 })), [{ id: 'B', at: [10, 0, 0], u: [0.1, 0, 0] }])] };
    const r = runChecks(p, report);
    expect(r.failures.length).toBe(n + 1);
    expect(r.members.every((m) => m.status === 'fail' && m.failed.length === 1 && m.failed[0] === 'cableResistance')).toBe(true);
    expect(r.nodes.find((x) => x.id === 'B')?.failed).toEqual(['displacement']);
    expect(r.nodes.find((x) => x.id === 'A')?.status).toBe('unchecked');
  });
});

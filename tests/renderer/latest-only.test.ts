/**
 * The slider gate: while a live re-solve runs, newer slider values replace each other; the final
 * value is always solved. Checked against a direct simulation of a slow consumer (the expected
 * sequence is written out by hand from the rule "run now if idle, else keep only the latest").
 */
import { describe, expect, it } from 'vitest';
import { LatestOnly } from '../../renderer/tuning/latest-only.ts';

describe('LatestOnly gate', () => {
  it('runs the first value, drops intermediate ones and always runs the last', () => {
    const gate = new LatestOnly<number>();
    const ran: number[] = [];
    const offer = (v: number) => { if (gate.offer(v)) ran.push(v); };
    const finish = () => { const next = gate.done(); if (next !== undefined) ran.push(next); };
    offer(1); // idle → runs
    offer(2); offer(3); offer(4); // busy → only 4 waits
    finish(); // 1 done → 4 runs
    offer(5);
    finish(); // 4 done → 5 runs
    finish(); // 5 done → idle
    expect(ran).toEqual([1, 4, 5]);
    expect(gate.dropped).toBe(2);
    expect(gate.busy).toBe(false);
    offer(6);
    expect(ran).toEqual([1, 4, 5, 6]);
  });

  it('reset frees the gate and forgets the waiting value (worker restarted)', () => {
    const gate = new LatestOnly<string>();
    expect(gate.offer('a')).toBe(true);
    expect(gate.offer('b')).toBe(false);
    gate.reset();
    expect(gate.busy).toBe(false);
    expect(gate.offer('c')).toBe(true);
    expect(gate.done()).toBeUndefined();
  });
});

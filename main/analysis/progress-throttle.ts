/**
 * Rate limit for progress messages: a Newton iteration can take microseconds on small models,
 * and thousands of messages per second would flood IPC/SSE. Passes a progress update when the
 * case changed or `intervalMs` passed since the last one passed.
 */
import type { SolveProgress } from '../../solver/index.ts';

export function createProgressThrottle(intervalMs: number, now: () => number = Date.now): (p: SolveProgress) => boolean {
  let lastTime = -Infinity;
  let lastCase = -1;
  return (p) => {
    const t = now();
    if (p.caseIndex !== lastCase || t - lastTime >= intervalMs) {
      lastCase = p.caseIndex;
      lastTime = t;
      return true;
    }
    return false;
  };
}

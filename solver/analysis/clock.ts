/** Monotonic clock in ms: `performance.now()` exists in browsers, workers and Node ≥ 16. */
declare const performance: { now(): number };

export function nowMs(): number {
  return performance.now();
}

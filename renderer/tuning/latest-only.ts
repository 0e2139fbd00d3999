/**
 * "Latest value only" gate for a slow consumer (the live re-solve behind a slider): while one
 * value is being processed, newer values replace each other and only the last one is processed
 * next; intermediate slider positions are dropped, the final one never is.
 */
export class LatestOnly<T> {
  private running = false;
  private pending: { value: T } | null = null;
  /** Values offered while busy and replaced before they ran. */
  dropped = 0;

  get busy(): boolean {
    return this.running;
  }

  /** Offer a value: true = run it now (the gate is now busy); false = it waits (or replaced a waiting one). */
  offer(value: T): boolean {
    if (!this.running) {
      this.running = true;
      return true;
    }
    if (this.pending) this.dropped++;
    this.pending = { value };
    return false;
  }

  /** The running value finished: returns the next value to run (gate stays busy), or undefined (gate is free). */
  done(): T | undefined {
    const next = this.pending;
    this.pending = null;
    if (!next) {
      this.running = false;
      return undefined;
    }
    return next.value;
  }

  /** Forget the waiting value and free the gate (worker restarted). */
  reset(): void {
    this.pending = null;
    this.running = false;
  }
}

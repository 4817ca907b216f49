/**
 * Shared stop rule for one engine run: an iteration budget (deterministic), an optional wall-clock
 * budget read through the injected clock, and an optional abort signal.
 */
export class RunBudget {
  iterations = 0;
  private readonly start: number;
  constructor(
    readonly maxIterations: number,
    private readonly now?: () => number,
    private readonly timeBudgetMs?: number,
    private readonly signal?: AbortSignal,
  ) {
    this.start = now ? now() : 0;
  }

  get aborted(): boolean {
    return this.signal?.aborted ?? false;
  }

  elapsedMs(): number {
    return this.now ? this.now() - this.start : 0;
  }

  /** Fraction of the budget used, in [0, 1]: the larger of iterations and time. */
  fraction(): number {
    let f = this.iterations / this.maxIterations;
    if (this.now && this.timeBudgetMs !== undefined) f = Math.max(f, this.elapsedMs() / this.timeBudgetMs);
    return Math.min(1, f);
  }

  /** Reads the clock (when given) on every call, so a clock wrapper may also poll for cancellation. */
  exhausted(): boolean {
    const f = this.fraction();
    if (this.now && this.timeBudgetMs === undefined) this.now();
    return this.aborted || f >= 1;
  }
}

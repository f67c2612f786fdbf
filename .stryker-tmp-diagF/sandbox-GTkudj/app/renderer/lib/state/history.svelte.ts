/**
 * Undo and redo over immutable snapshots. `current` is the present value;
 * `push` records a new one and clears the redo line. Pushes that share a
 * coalesce key within a short time replace each other, so typing "1500" is
 * one step, not four.
 */
// @ts-nocheck

export interface HistoryOptions {
  /** Oldest steps are dropped beyond this many. */
  limit?: number;
  /** Pushes with the same key closer together than this merge into one step [ms]. */
  coalesceMs?: number;
  now?: () => number;
}

export class History<T> {
  #past = $state.raw<T[]>([]);
  #present = $state.raw() as T;
  #future = $state.raw<T[]>([]);
  #lastKey: string | null = null;
  #lastAt = 0;
  readonly #limit: number;
  readonly #coalesceMs: number;
  readonly #now: () => number;

  // Derived so buttons and menus update without asking.
  readonly canUndo = $derived(this.#past.length > 0);
  readonly canRedo = $derived(this.#future.length > 0);

  constructor(initial: T, options: HistoryOptions = {}) {
    this.#present = initial;
    this.#limit = options.limit ?? 200;
    this.#coalesceMs = options.coalesceMs ?? 1200;
    this.#now = options.now ?? (() => Date.now());
  }

  get current(): T {
    return this.#present;
  }

  push(value: T, coalesceKey?: string): void {
    const at = this.#now();
    const merge = coalesceKey !== undefined && coalesceKey === this.#lastKey && at - this.#lastAt < this.#coalesceMs;
    if (!merge) this.#past = [...this.#past, this.#present].slice(-this.#limit);
    this.#present = value;
    this.#future = [];
    this.#lastKey = coalesceKey ?? null;
    this.#lastAt = at;
  }

  undo(): boolean {
    const previous = this.#past[this.#past.length - 1];
    if (this.#past.length === 0) return false;
    this.#future = [this.#present, ...this.#future];
    this.#past = this.#past.slice(0, -1);
    this.#present = previous;
    this.#lastKey = null;
    return true;
  }

  redo(): boolean {
    if (this.#future.length === 0) return false;
    const [next, ...rest] = this.#future;
    this.#past = [...this.#past, this.#present];
    this.#future = rest;
    this.#present = next;
    this.#lastKey = null;
    return true;
  }

  /** Start over from `value`, forgetting every step (a newly opened version). */
  reset(value: T): void {
    this.#past = [];
    this.#future = [];
    this.#present = value;
    this.#lastKey = null;
  }
}

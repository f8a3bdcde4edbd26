/**
 * A small bounded memo for plot data, shared across renders. The curves are pure functions of
 * their key (beam input, rule set, settings, the NOHD they are drawn around), so a repeated key
 * gives the very same points; printing the same room again (report after notice, a re-print, a
 * second unit habit) then skips the many limit look-ups behind each curve. Bounded so a long-running
 * host does not grow without limit: the least recently used entry goes first.
 */
const ALL = new Set<BoundedMemo<unknown>>();

/** Forget every stored curve (the benchmark times a room's first print with this). */
export function clearPlotCurveCaches(): void {
  for (const m of ALL) m.clear();
}

export class BoundedMemo<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly capacity: number) {
    ALL.add(this);
  }

  clear(): void {
    this.entries.clear();
  }

  /** The value stored under `key`, or `make()` stored under it (evicting the oldest when full). */
  get(key: string, make: () => V): V {
    const hit = this.entries.get(key);
    if (hit !== undefined) {
      // Re-insert so Map order stays least-recently-used first.
      this.entries.delete(key);
      this.entries.set(key, hit);
      return hit;
    }
    const value = make();
    this.entries.set(key, value);
    while (this.entries.size > this.capacity) {
      const oldest = this.entries.keys().next();
      if (oldest.done === true) break;
      this.entries.delete(oldest.value);
    }
    return value;
  }
}

/**
 * A small bounded memo for the plate engine: pure results keyed by a string of every input that determines
 * them, least recently used dropped first. Between keystrokes most inputs stay the same (only a thickness, a
 * density or the excitation changes), so the dry modes and the added mass on them are reused rather than
 * recomputed. Cached arrays are shared: callers must treat them as read-only.
 */

export class BoundedMemo<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly capacity: number) {}

  /** The cached value for `key`, or `make()` stored under it (a null result is not stored). */
  get(key: string, make: () => V | null): V | null {
    const hit = this.entries.get(key);
    if (hit !== undefined) {
      // Re-insert so the Map's insertion order is the recency order.
      this.entries.delete(key);
      this.entries.set(key, hit);
      return hit;
    }
    const value = make();
    if (value === null) return null;
    this.entries.set(key, value);
    if (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value as string);
    return value;
  }

  clear(): void {
    this.entries.clear();
  }
}

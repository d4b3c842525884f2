/**
 * A small bounded memo of pure results keyed by a string of every input that determines them, least recently
 * used dropped first. Between keystrokes most inputs stay the same, so the plate engine's dry modes and added
 * mass (src/physics/plate) and the section solver's outcomes (src/physics/section/memo.ts) are reused rather
 * than recomputed. Cached values are shared: callers must treat them as read-only.
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

  /** Number of remembered values. */
  get size(): number {
    return this.entries.size;
  }

  clear(): void {
    this.entries.clear();
  }
}

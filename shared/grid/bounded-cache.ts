/**
 * A small least-recently-used cache keyed by string, for per-geometry arrays that are costly to
 * build (coordinates, metrics). Bounded so a long-running server that sees many grids does not
 * keep them all.
 */
export class BoundedCache<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly capacity: number) {}

  /** The cached value for `key`, building and storing it on a miss. */
  getOrBuild(key: string, build: () => V): V {
    const cached = this.entries.get(key);
    if (cached !== undefined) {
      // Refresh recency: Map iteration order is insertion order.
      this.entries.delete(key);
      this.entries.set(key, cached);
      return cached;
    }
    const built = build();
    this.entries.set(key, built);
    if (this.entries.size > this.capacity) {
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    return built;
  }
}

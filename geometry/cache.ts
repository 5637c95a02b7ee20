/**
 * The one memo helper: every cache in the tool is a BoundedCache, so each holds at
 * most a fixed number of entries (least recently used dropped first) and all of
 * them can be emptied at once (tests, long-running scripts).
 */

const ALL: BoundedCache<unknown, unknown>[] = [];

export class BoundedCache<K, V> {
  private readonly map = new Map<K, V>();

  /** @param name what is cached (for people reading a heap snapshot); @param limit largest number of entries kept, at least 1 */
  constructor(
    readonly name: string,
    readonly limit: number,
  ) {
    if (!(Number.isInteger(limit) && limit >= 1)) throw new RangeError(`cache limit ${limit} for ${name} must be a whole number, at least 1`);
    ALL.push(this as BoundedCache<unknown, unknown>);
  }

  /** The value for `key`, made by `make` on a miss. */
  get(key: K, make: () => V): V {
    const hit = this.map.get(key);
    if (hit !== undefined || this.map.has(key)) {
      // refresh its place: Map keeps insertion order, so the first key is the least recently used
      this.map.delete(key);
      this.map.set(key, hit as V);
      return hit as V;
    }
    const value = make();
    this.map.set(key, value);
    if (this.map.size > this.limit) this.map.delete(this.map.keys().next().value as K);
    return value;
  }

  get size(): number {
    return this.map.size;
  }

  clear(): void {
    this.map.clear();
  }
}

/** Empties every cache. */
export function clearAllCaches(): void {
  for (const c of ALL) c.clear();
}

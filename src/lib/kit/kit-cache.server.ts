/**
 * Server adapter: an in-process least-recently-used cache of built kit files by content hash and output.
 * It is a cache, not state: a miss rebuilds from the saved inputs, so several servers need not share it.
 */

/** Most entries kept, and most bytes kept (files counted by their length). */
export const KIT_CACHE_MAX_ENTRIES = 64;
export const KIT_CACHE_MAX_BYTES = 64_000_000;

interface Entry<T> {
  value: Promise<T>;
  bytes: number;
}

/** A small LRU over promises, so concurrent requests for one kit share one build; failed builds are dropped. */
export class KitCache<T> {
  private entries = new Map<string, Entry<T>>();
  private bytes = 0;

  constructor(
    private readonly sizeOf: (value: T) => number,
    private readonly maxEntries = KIT_CACHE_MAX_ENTRIES,
    private readonly maxBytes = KIT_CACHE_MAX_BYTES,
  ) {}

  /** The cached value for key, or the value make() produces (then cached). */
  async get(key: string, make: () => Promise<T>): Promise<T> {
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key);
      this.entries.set(key, hit);
      return hit.value;
    }
    const entry: Entry<T> = { value: make(), bytes: 0 };
    this.entries.set(key, entry);
    try {
      const value = await entry.value;
      if (this.entries.get(key) === entry) {
        entry.bytes = this.sizeOf(value);
        this.bytes += entry.bytes;
        this.evict();
      }
      return value;
    } catch (err) {
      if (this.entries.get(key) === entry) this.entries.delete(key);
      throw err;
    }
  }

  /** Number of entries held (tests). */
  get size(): number {
    return this.entries.size;
  }

  private evict(): void {
    for (const [key, entry] of this.entries) {
      if (this.entries.size <= this.maxEntries && this.bytes <= this.maxBytes) break;
      this.entries.delete(key);
      this.bytes -= entry.bytes;
    }
  }
}

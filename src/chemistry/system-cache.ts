/**
 * Bounded cache of built systems per (metal, temperature, activity, ligand totals). A worksheet column of
 * thousands of rows usually shares a handful of conditions, so each system is built once and reused.
 */
import { Database } from "./database";
import { buildSystem, MetalSystem } from "./system";

/** Least-recently-used map with a fixed capacity. */
export class LruCache<K, V> {
  private readonly entries = new Map<K, V>();
  constructor(private readonly capacity: number) {}

  get(key: K): V | undefined {
    const value = this.entries.get(key);
    if (value !== undefined) {
      this.entries.delete(key);
      this.entries.set(key, value);
    }
    return value;
  }

  set(key: K, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, value);
    if (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value as K);
  }

  get size(): number {
    return this.entries.size;
  }
}

export const SYSTEM_CACHE_SIZE = 256;

/** Builds or reuses a system. `extraKey` and `build` let callers with ligands supply their own construction. */
export class SystemCache {
  private readonly cache = new LruCache<string, MetalSystem>(SYSTEM_CACHE_SIZE);
  constructor(private readonly db: Database) {}

  get(element: string, celsius: number, activity: number, extraKey = "", build?: () => MetalSystem): MetalSystem {
    const key = `${element}|${celsius}|${activity}|${extraKey}`;
    let system = this.cache.get(key);
    if (!system) {
      system = build ? build() : buildSystem(this.db, element, { celsius, activity });
      this.cache.set(key, system);
    }
    return system;
  }

  get size(): number {
    return this.cache.size;
  }
}

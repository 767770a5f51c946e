import { mulberry32 } from "./seeded-random";

/**
 * Uniform reservoir sample of a stream of unknown length (Vitter's algorithm R) with a seeded generator, so that
 * a diagram of a million-row file draws a fixed number of points and the same points on every run.
 */
export class Reservoir<T> {
  readonly items: T[] = [];
  private seen = 0;
  private readonly random: () => number;

  constructor(
    private readonly capacity: number,
    seed = 0x5eed,
  ) {
    this.random = mulberry32(seed);
  }

  /**
   * Offers one item without making it: returns the index it takes in `items` (store it there), or −1 when it is not
   * kept, so that an item is built only when it is kept.
   */
  nextSlot(): number {
    this.seen++;
    if (this.items.length < this.capacity) return this.items.length;
    const j = Math.floor(this.random() * this.seen);
    return j < this.capacity ? j : -1;
  }

  /** How many items were offered. */
  get count(): number {
    return this.seen;
  }
}

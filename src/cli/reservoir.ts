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

  add(item: T): void {
    this.seen++;
    if (this.items.length < this.capacity) {
      this.items.push(item);
      return;
    }
    const j = Math.floor(this.random() * this.seen);
    if (j < this.capacity) this.items[j] = item;
  }

  /** How many items were offered. */
  get count(): number {
    return this.seen;
  }
}

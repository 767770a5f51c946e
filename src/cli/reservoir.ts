/**
 * Uniform reservoir sample of a stream of unknown length (Vitter's algorithm R) with a seeded generator, so that
 * a diagram of a million-row file draws a fixed number of points and the same points on every run.
 */
export class Reservoir<T> {
  readonly items: T[] = [];
  private seen = 0;
  private state: number;

  constructor(
    private readonly capacity: number,
    seed = 0x5eed,
  ) {
    this.state = seed >>> 0;
  }

  /** mulberry32, a small public-domain 32-bit generator. */
  private random(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
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

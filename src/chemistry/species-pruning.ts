/**
 * Which species a row need not evaluate: over a box of row features (a range of each of T, pH, E, threshold, γ and
 * ligand bounds that the rows of a column fall in), species i cannot be the argmin where another species j is lower
 * at every corner of the box. g is linear in the features (point-engine.ts, directRow), so
 *
 *   max over the box of (g_j − g_i) = Σ_k max((m_jk − m_ik)·lo_k, (m_jk − m_ik)·hi_k)
 *
 * and a negative maximum proves g_j < g_i for every row inside. Only species j without a speciated ligand may prune:
 * their row gives g_j exactly, while a species with carbonate, sulfur or orthophosphate has its row at the ligand's
 * bound (a lower bound of g_i, so a species i with such ligands is pruned soundly, but j would need an upper bound).
 *
 * The box grows with the rows (never shrinks): a row outside it widens it and evaluates every species; after a few
 * rows inside, the species left are worked out once (n²·features operations) and used until the box grows again.
 */

/** Allowance for rounding between the box bound and a row's g, V (g is worked out in two ways, ~1e-15 V apart). */
const PRUNE_MARGIN = 1e-9;
/** Rows inside a newly grown box before its species are worked out (single calls far apart do not pay for it). */
const SETTLE_ROWS = 8;
/** A widened side moves past the row by this fraction of the box's new width, so the box grows geometrically. */
const GROWTH = 0.03;

export class SpeciesPruning {
  private readonly lo: Float64Array;
  private readonly hi: Float64Array;
  /** Every available species, ascending: what a row evaluates outside a settled box. */
  readonly all: Int32Array;
  /** The species a row inside the settled box evaluates, ascending, and how many. */
  readonly list: Int32Array;
  count = 0;
  private rowsInside = 0;
  private settled = false;
  private empty = true;

  /**
   * `rows`: `width` coefficients per species (the features' dot product is g); `available`: the species the water
   * allows; `exact`: the available species whose row is exact (no speciated ligand), the only ones that may prune.
   */
  constructor(
    private readonly rows: Float64Array,
    private readonly width: number,
    private readonly features: number,
    private readonly available: readonly number[],
    private readonly exact: readonly boolean[],
  ) {
    this.lo = new Float64Array(features);
    this.hi = new Float64Array(features);
    this.all = Int32Array.from(available);
    this.list = Int32Array.from(available);
    this.count = available.length;
  }

  /**
   * Admits a row's features (its first `features` entries). True: the row evaluates `list` (its first `count`);
   * false: every species in `all`. A row outside the box widens it, unless `widen` is false (a point probed on the
   * way to a boundary or across a diagram, not a row of the column: it would widen the box past the rows).
   */
  admit(f: Float64Array, widen = true): boolean {
    if (!this.inside(f)) {
      if (widen) this.grow(f);
      return false;
    }
    if (!this.settled && ++this.rowsInside >= SETTLE_ROWS) {
      this.prune();
      this.settled = true;
    }
    return this.settled;
  }

  /** Whether the features lie in the box (feature 0 is the constant 1; the box is empty until a row grows it). */
  private inside(f: Float64Array): boolean {
    const { lo, hi } = this;
    let inside = +!this.empty;
    for (let k = 1; k < this.features; k++) inside &= +(f[k] >= lo[k]) & +(f[k] <= hi[k]);
    return inside === 1;
  }

  /** Widens the box to hold f (and a margin past it); its species are worked out again once rows settle in it. */
  private grow(f: Float64Array): void {
    const { lo, hi } = this;
    for (let k = 0; k < this.features; k++) {
      if (this.empty) lo[k] = hi[k] = f[k];
      const low = Math.min(lo[k], f[k]);
      const high = Math.max(hi[k], f[k]);
      const pad = GROWTH * (high - low);
      if (f[k] < lo[k]) lo[k] = f[k] - pad;
      if (f[k] > hi[k]) hi[k] = f[k] + pad;
    }
    this.empty = false;
    this.settled = false;
    this.rowsInside = 0;
  }

  /** The species no exact species is below everywhere in the box, into list. */
  private prune(): void {
    let count = 0;
    for (const i of this.available) if (!this.dominated(i)) this.list[count++] = i;
    this.count = count;
  }

  /** Whether some exact species j ≠ i has g_j < g_i at every point of the box. */
  private dominated(i: number): boolean {
    return this.available.some((j, n) => j !== i && this.exact[n] && this.largestGap(j, i) < -PRUNE_MARGIN);
  }

  /** max over the box of g_j − g_i (linear in the features: each feature at the end that makes it largest). */
  largestGap(j: number, i: number): number {
    const { rows, width, lo, hi } = this;
    let gap = 0;
    for (let k = 0; k < this.features; k++) {
      const d = rows[j * width + k] - rows[i * width + k];
      gap += Math.max(d * lo[k], d * hi[k]);
    }
    return gap;
  }
}

/**
 * The species pruning (src/chemistry/species-pruning.ts) on random linear planes: row after row, the argmin over the
 * species it keeps is the argmin over all of them. Species flagged inexact have their true g above their row (as the
 * engine's species with a speciated ligand are above their bound), by a random amount.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SpeciesPruning } from "../../src/chemistry/species-pruning";
import { mulberry32 } from "../../src/cli/seeded-random";

const WIDTH = 4;
const FEATURES = 4; // feature 0 is the constant 1, as in the engine

/** Index of the lowest of `g` over `indices` (ties to the first listed, which is the lowest index). */
function lowest(g: number[], indices: Iterable<number>): number {
  let best = -1;
  for (const i of indices) if (best < 0 || g[i] < g[best]) best = i;
  return best;
}

describe("species pruning", () => {
  it("keeps the argmin: the lowest g over the kept species is the lowest over all, row after row", () => {
    let pruned = 0;
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 12 }), fc.integer({ min: 1, max: 2 ** 31 - 1 }), (n, seed) => {
        const next = mulberry32(seed);
        const rows = Float64Array.from({ length: n * WIDTH }, () => 4 * next() - 2);
        const exact = Array.from({ length: n }, () => next() < 0.7);
        const available = Array.from({ length: n }, (_, i) => i).filter(() => next() < 0.9);
        if (available.length === 0) return;
        const pruning = new SpeciesPruning(
          rows,
          WIDTH,
          FEATURES,
          available,
          available.map((i) => exact[i]),
        );
        const centre = [1, next(), next(), next()];
        const spread = [0, next(), next(), next()];
        for (let row = 0; row < 200; row++) {
          const f = Float64Array.from(centre, (c, k) => c + spread[k] * (next() - 0.5));
          const g = Array.from({ length: n }, (_, i) => {
            let sum = 0;
            for (let k = 0; k < FEATURES; k++) sum += rows[i * WIDTH + k] * f[k];
            return exact[i] ? sum : sum + next(); // an inexact species is somewhere above its row
          });
          const kept = pruning.admit(f) ? pruning.list.slice(0, pruning.count) : pruning.all;
          if (kept.length < available.length) pruned++;
          expect(lowest(g, kept)).toBe(lowest(g, available));
        }
      }),
      { numRuns: 300 },
    );
    expect(pruned).toBeGreaterThan(0); // the pruned path was taken
  });

  it("a row outside the box evaluates every available species; a probe outside it does not widen it", () => {
    // two planes: species 1 is 1 V above species 0 wherever feature 1 is below 2, and below it past 2
    const rows = Float64Array.from([0, 0, 0, 0, 1, -0.5, 0, 0]);
    const pruning = new SpeciesPruning(rows, WIDTH, FEATURES, [0, 1], [true, true]);
    const row = (x: number, widen = true) => pruning.admit(Float64Array.from([1, x, 0, 0]), widen);
    // the box grows to [0, 1] (and a little past), then settles after rows inside it
    for (const x of [0, 1, 0.5, 0.2, 0.9, 0.4, 0.6, 0.1, 0.8, 0.3, 0.7]) row(x);
    expect(row(0.5)).toBe(true);
    expect([...pruning.list.slice(0, pruning.count)]).toEqual([0]); // species 1 cannot win for feature 1 in [0, 1]
    expect(row(3, false)).toBe(false); // a probe at 3: every species, and the box stays
    expect(row(0.5)).toBe(true);
    expect(row(3)).toBe(false); // a row at 3 widens the box: every species until it settles again
    for (let k = 0; k < 10; k++) row(k / 4);
    expect(row(1)).toBe(true);
    expect([...pruning.list.slice(0, pruning.count)]).toEqual([0, 1]);
  });
});

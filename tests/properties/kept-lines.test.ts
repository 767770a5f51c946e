/**
 * The point engine keeps its lines between the calls for one sample (BOUNDARY above then below; ASSESS's boundaries,
 * then its dissolved metal from the lines at unit activity at the same point) and returns at once from setWater for the water it already holds (src/chemistry/point-engine.ts). A property
 * of the engine itself, no outside value: every answer so obtained equals the answer worked out afresh, where an
 * unrelated point is asked in between so that nothing can be kept.
 */
import { describe, expect, it } from "vitest";
import { mulberry32 } from "../../src/cli/seeded-random";
import { assessAt } from "../../src/functions/assess-functions";
import { boundaryFrom, dissolvedAt } from "../../src/functions/stability-functions";

const WATERS: Record<string, [number, number, number]> = {
  "pure water": [0, 0, 0],
  "carbonate 2 mmol/kg": [2e-3, 0, 0],
  "carbonate and chloride": [2e-3, 1e-3, 0],
  "sulfur 0.1 mmol/kg": [0, 0, 1e-4],
};

/** The answer at one point after the metal's engine drew its lines at another point and water (nothing kept). */
function afresh<T>(metal: string, ask: () => T): T {
  boundaryFrom(metal, 3.3, 0.77, 61, 1e-5, 1e-3, 0, 0, 0, 0, 1);
  dissolvedAt(metal, 11.1, -0.91, 7, 0, 2e-3, 1e-5);
  return ask();
}

describe("answers with kept lines equal answers worked out afresh", () => {
  for (const metal of ["Fe", "Pb", "Cu"])
    for (const [label, [co3, cl, s]] of Object.entries(WATERS))
      it(`${metal}, ${label}: BOUNDARY both directions in one call (2 × n) and DISSOLVED after it, 200 samples`, () => {
        const next = mulberry32(11);
        const pH = Array.from({ length: 200 }, () => 4 + 6 * next());
        const E = Array.from({ length: 200 }, () => -0.8 + 1.6 * next());
        const T = Array.from({ length: 200 }, (_, i) => (i % 3 === 0 ? 25 : 5 + 30 * next()));
        const both = boundaryFrom(metal, [pH], [E], [T], 1e-6, co3, cl, s, 0, 0, [[1], [-1]]);
        let compared = 0;
        for (let i = 0; i < pH.length; i++) {
          const above = afresh(metal, () => boundaryFrom(metal, pH[i], E[i], T[i], 1e-6, co3, cl, s, 0, 0, 1)[0][0]);
          const below = afresh(metal, () => boundaryFrom(metal, pH[i], E[i], T[i], 1e-6, co3, cl, s, 0, 0, -1)[0][0]);
          expect(both[0][i], `above, sample ${i}`).toStrictEqual(above);
          expect(both[1][i], `below, sample ${i}`).toStrictEqual(below);
          // the same sample again at once: the engine holds its water and lines
          const again = boundaryFrom(metal, pH[i], E[i], T[i], 1e-6, co3, cl, s, 0, 0, -1)[0][0];
          const dissolved = dissolvedAt(metal, pH[i], E[i], T[i], co3, cl, s)[0][0];
          expect(again).toStrictEqual(below);
          expect(dissolved).toStrictEqual(afresh(metal, () => dissolvedAt(metal, pH[i], E[i], T[i], co3, cl, s)[0][0]));
          if (typeof above === "number" || typeof below === "number") compared++;
        }
        expect(compared).toBeGreaterThan(150);
      });
});

describe("ASSESS, whose dissolved metal follows its boundaries at the same point and water, equals the single functions", () => {
  for (const metal of ["Fe", "Pb", "Cu"])
    for (const [label, [co3, cl, s]] of Object.entries(WATERS))
      it(`${metal}, ${label}: 100 samples, boundaries and dissolved metal as BOUNDARY and DISSOLVED give them afresh`, () => {
        const next = mulberry32(13);
        const pH = Array.from({ length: 100 }, () => [4 + 6 * next()]);
        const E = Array.from({ length: 100 }, () => [-0.8 + 1.6 * next()]);
        const rows = assessAt(metal, pH, E, 25, 1e-6, co3, cl, s);
        let numbers = 0;
        for (let i = 0; i < pH.length; i++) {
          const [p, e] = [pH[i][0], E[i][0]];
          const [, , above, below, , dissolved] = rows[i];
          expect(above).toStrictEqual(
            afresh(metal, () => boundaryFrom(metal, p, e, 25, 1e-6, co3, cl, s, 0, 0, 1)[0][0]),
          );
          expect(below).toStrictEqual(
            afresh(metal, () => boundaryFrom(metal, p, e, 25, 1e-6, co3, cl, s, 0, 0, -1)[0][0]),
          );
          expect(dissolved).toStrictEqual(afresh(metal, () => dissolvedAt(metal, p, e, 25, co3, cl, s)[0][0]));
          if (typeof dissolved === "number") numbers++;
        }
        expect(numbers).toBeGreaterThan(50);
      });
});

describe("one sample point in many waters: lines are kept only for the water they were drawn in", () => {
  for (const metal of ["Fe", "Pb", "Cu"])
    it(`${metal}: pH 8, −0.3 V at 40 temperatures and carbonate totals, BOUNDARY both directions in one call`, () => {
      const T = Array.from({ length: 40 }, (_, i) => 5 + i);
      const co3 = Array.from({ length: 40 }, (_, i) => (i % 2 === 0 ? 0 : 1e-4 * (1 + i)));
      const both = boundaryFrom(metal, 8, -0.3, [T], 1e-6, [co3], 0, 0, 0, 0, [[1], [-1]]);
      for (let i = 0; i < T.length; i++) {
        expect(both[0][i], `above at ${T[i]} °C`).toStrictEqual(
          afresh(metal, () => boundaryFrom(metal, 8, -0.3, T[i], 1e-6, co3[i], 0, 0, 0, 0, 1)[0][0]),
        );
        expect(both[1][i], `below at ${T[i]} °C`).toStrictEqual(
          afresh(metal, () => boundaryFrom(metal, 8, -0.3, T[i], 1e-6, co3[i], 0, 0, 0, 0, -1)[0][0]),
        );
      }
    });
});

describe("a boundary search started on a boundary moves past it (the tie at E goes to the species that stays lowest)", () => {
  for (const metal of ["Fe", "Pb", "Cu"])
    it(`${metal}, pure water and carbonate water: BOUNDARY from a boundary finds the next one, not the same again`, () => {
      let chained = 0;
      for (const co3 of [0, 2e-3])
        for (let pH = 4; pH <= 12; pH += 0.5)
          for (const direction of [1, -1] as const) {
            const first = boundaryFrom(
              metal,
              pH,
              direction > 0 ? -1.5 : 1.5,
              25,
              1e-6,
              co3,
              0,
              0,
              0,
              0,
              direction,
            )[0][0];
            if (typeof first !== "number") continue;
            const next = boundaryFrom(metal, pH, first, 25, 1e-6, co3, 0, 0, 0, 0, direction)[0][0];
            if (typeof next !== "number") continue; // the last boundary that way
            expect(direction * (next - first), `pH ${pH}, from ${first} V`).toBeGreaterThan(1e-6);
            chained++;
          }
      expect(chained).toBeGreaterThan(10);
    });
});

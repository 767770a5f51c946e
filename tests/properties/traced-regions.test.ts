/**
 * Drawn regions of a water with ligands agree with SPECIES: points inside every traced piece (away from its edges
 * by more than the tracing tolerance) have the piece's species as the point engine's answer.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { buildLigandSystem } from "../../src/chemistry/ligand-system";
import { pointEngine } from "../../src/chemistry/point-engine";
import { tracedRegions } from "../../src/chemistry/region-tracing";
import { speciesAt } from "../../src/functions/stability-functions";

const db = getDatabase();
const total = fc.oneof(
  fc.constant(0),
  fc.double({ min: -6, max: -1, noNaN: true }).map((l) => 10 ** l),
);
const WINDOW = { pHMin: 0, pHMax: 14, eMin: -1.5, eMax: 2 };

describe("traced diagram regions", () => {
  it("every point well inside a drawn region has that region's species (checked through the point engine and REDOX.SPECIES)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("Pb", "Cu", "Fe", "Zn", "Ag", "Cd"),
        fc.double({ min: 0, max: 90, noNaN: true }),
        fc.double({ min: -8, max: -3, noNaN: true }),
        fc.record({ carbonate: total, chloride: total, sulfur: total }),
        fc.array(
          fc.tuple(fc.double({ min: 0.1, max: 0.9, noNaN: true }), fc.double({ min: 0.1, max: 0.9, noNaN: true })),
          { minLength: 3, maxLength: 3 },
        ),
        (metal, celsius, logActivity, totals, fractions) => {
          if (!(totals.carbonate || totals.chloride || totals.sulfur)) return;
          const system = buildLigandSystem(db, metal, { celsius, activity: 10 ** logActivity }, totals);
          const regions = tracedRegions(db, system, WINDOW);
          const engine = pointEngine(db, metal);
          let checked = 0;
          for (const r of regions) {
            const [[p0, lo0], [p1, lo1], [, hi1], [, hi0]] = r.vertices;
            if (p1 - p0 < 0.01) continue;
            for (const [u, v] of fractions) {
              const pH = p0 + u * (p1 - p0);
              const lo = lo0 + u * (lo1 - lo0);
              const hi = hi0 + u * (hi1 - hi0);
              if (hi - lo < 2e-3) continue;
              const E = lo + 1e-3 + v * (hi - lo - 2e-3);
              engine.setWater(celsius, 10 ** logActivity, totals.carbonate, totals.chloride, totals.sulfur, 0);
              expect(engine.table.species[engine.dominant(pH, E)].formula).toBe(r.formula);
              if (checked++ < 3)
                expect(
                  speciesAt(
                    metal,
                    pH,
                    E,
                    celsius,
                    10 ** logActivity,
                    totals.carbonate,
                    totals.chloride,
                    totals.sulfur,
                  )[0][0],
                ).toBe(r.formula);
            }
          }
          expect(checked).toBeGreaterThan(0);
        },
      ),
      { numRuns: 15 },
    );
  });
});

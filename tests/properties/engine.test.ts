/**
 * Properties of the stability engine that must hold for every metal, temperature, activity and point
 * (DEVELOPERS.md): the dominant species is the argmin of the planes; a reported boundary really separates two species;
 * the regions tile the diagram with no gap or overlap; the regime follows the species' state; on a solid–ion
 * boundary the dissolved total carries exactly the activity the boundary was drawn for.
 */
import fc from "fast-check";
import { expectRegionsTile } from "./tiling";
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { dissolvedTotal, nearestBoundary, boundariesAtPH } from "../../src/chemistry/predominance";
import { activeSpecies, buildSystem, dominantSpecies, speciesPotential } from "../../src/chemistry/system";

const db = getDatabase();
const metals = db.metals();

const conditions = fc.record({
  metal: fc.constantFrom(...metals),
  celsius: fc.double({ min: 0, max: 100, noNaN: true }),
  logActivity: fc.double({ min: -9, max: 0, noNaN: true }),
});
const point = fc.record({
  pH: fc.double({ min: -2, max: 16, noNaN: true }),
  E: fc.double({ min: -2.5, max: 2.5, noNaN: true }),
});

describe("stability engine properties", () => {
  it("the dominant species has the lowest g of all species", () => {
    fc.assert(
      fc.property(conditions, point, ({ metal, celsius, logActivity }, { pH, E }) => {
        const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
        const winner = dominantSpecies(system, pH, E); // a fresh system scans every species
        const gWinner = speciesPotential(system, winner, pH, E);
        for (let i = 0; i < system.species.length; i++)
          expect(gWinner).toBeLessThanOrEqual(speciesPotential(system, i, pH, E));
        // once the cell has found its active species it compares only those: the answer must not change
        for (const cell of system.cells) activeSpecies(cell);
        expect(dominantSpecies(system, pH, E)).toBe(winner);
      }),
      { numRuns: 300 },
    );
  });

  it("a boundary reported above or below a point changes the species 1 mV either side", () => {
    fc.assert(
      fc.property(
        conditions,
        point,
        fc.constantFrom(1 as const, -1 as const),
        fc.boolean(),
        ({ metal, celsius, logActivity }, { pH, E }, direction, pruned) => {
          const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
          if (pruned) for (const cell of system.cells) activeSpecies(cell); // both the fresh and the pruned path
          const crossing = nearestBoundary(system, pH, E, direction);
          if (!crossing) {
            // then the species is the same all the way to the search limit
            const edge = direction > 0 ? 3 : -3;
            const here = dominantSpecies(system, pH, E);
            if (Math.abs(edge - E) > 1e-3)
              expect(system.species[dominantSpecies(system, pH, edge - direction * 1e-3)].formula).toBe(
                system.species[here].formula,
              );
            return;
          }
          expect(direction > 0 ? crossing.E > E : crossing.E < E).toBe(true);
          // 1 mV either side, or half the width of a narrower band next to it (mercury's Hg2 2+ band closes near 1e-8.4)
          const others = boundariesAtPH(system, pH)
            .map((c) => Math.abs(c.E - crossing.E))
            .filter((d) => d > 1e-9);
          const step = Math.min(1e-3, ...others.map((d) => d / 2));
          const below = dominantSpecies(system, pH, crossing.E - step);
          const above = dominantSpecies(system, pH, crossing.E + step);
          expect(below).not.toBe(above);
          expect(below).toBe(crossing.below);
          expect(above).toBe(crossing.above);
          // and the point's own species runs up to that boundary: no other change in between
          const between = boundariesAtPH(system, pH).filter((c) =>
            direction > 0 ? c.E > E && c.E < crossing.E : c.E < E && c.E > crossing.E,
          );
          expect(between).toEqual([]);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("regions tile the rectangle: areas sum to it, and every point lies in the region of its dominant species", () => {
    fc.assert(
      fc.property(
        conditions,
        fc.array(point, { minLength: 20, maxLength: 20 }),
        ({ metal, celsius, logActivity }, points) => {
          expectRegionsTile(buildSystem(db, metal, { celsius, activity: 10 ** logActivity }), points);
        },
      ),
      { numRuns: 150 },
    );
  });

  it("regime follows the dominant species: metal → immunity, other solid → passivation, dissolved → corrosion", () => {
    fc.assert(
      fc.property(conditions, point, ({ metal, celsius, logActivity }, { pH, E }) => {
        const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
        const s = system.species[dominantSpecies(system, pH, E)];
        const expected =
          s.formula === db.element(metal)!.referenceState
            ? "immunity"
            : s.species.state === "aq"
              ? "corrosion"
              : "passivation";
        expect(s.regime).toBe(expected);
      }),
      { numRuns: 300 },
    );
  });

  it("on a solid–ion boundary the ion's equilibrium molality equals the activity the boundary was drawn for", () => {
    let checked = 0;
    fc.assert(
      fc.property(conditions, fc.double({ min: -1, max: 15, noNaN: true }), ({ metal, celsius, logActivity }, pH) => {
        const activity = 10 ** logActivity;
        const system = buildSystem(db, metal, { celsius, activity });
        for (const c of boundariesAtPH(system, pH)) {
          const [lower, upper] = [system.species[c.below], system.species[c.above]];
          const solid = !lower.dissolved ? c.below : !upper.dissolved ? c.above : -1;
          const ion = lower.dissolved ? c.below : upper.dissolved ? c.above : -1;
          if (solid < 0 || ion < 0) continue;
          const { parts, total } = dissolvedTotal(system, solid, pH, c.E);
          const part = parts.find((p) => p.species === ion)!;
          expect(Math.abs(part.molality / system.species[ion].metalAtoms / activity - 1)).toBeLessThan(1e-6);
          expect(total).toBeGreaterThanOrEqual(part.molality * (1 - 1e-12));
          checked++;
        }
      }),
      { numRuns: 200 },
    );
    expect(checked).toBeGreaterThan(20);
  });
});

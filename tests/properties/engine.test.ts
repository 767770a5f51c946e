/**
 * Properties of the stability engine that must hold for every metal, temperature, activity and point
 * (GUIDE §4): the dominant species is the argmin of the planes; a reported boundary really separates two species;
 * the regions tile the diagram with no gap or overlap; the regime follows the species' state; on a solid–ion
 * boundary the dissolved total carries exactly the activity the boundary was drawn for.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { Point, polygonArea } from "../../src/chemistry/halfplane";
import { diagramRegions, dissolvedTotal, nearestBoundary, boundariesAtPH } from "../../src/chemistry/predominance";
import { activeSpecies, buildSystem, dominantSpecies, speciesPotential } from "../../src/chemistry/system";

const db = getDatabase();
const metals = db.metals();

const conditions = fc.record({
  metal: fc.constantFrom(...metals),
  celsius: fc.double({ min: 0, max: 100, noNaN: true }),
  logActivity: fc.double({ min: -9, max: 0, noNaN: true }),
});
const point = fc.record({ pH: fc.double({ min: -2, max: 16, noNaN: true }), E: fc.double({ min: -2.5, max: 2.5, noNaN: true }) });

function insideConvex(polygon: readonly Point[], p: Point): boolean {
  // a polygon from clipping is convex and counter-clockwise; on-edge counts as inside
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i];
    const b = polygon[(i + 1) % polygon.length];
    const cross = (b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]);
    if (cross < -1e-9) return false;
  }
  return true;
}

describe("stability engine properties", () => {
  it("the dominant species has the lowest g of all species", () => {
    fc.assert(
      fc.property(conditions, point, ({ metal, celsius, logActivity }, { pH, E }) => {
        const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
        const winner = dominantSpecies(system, pH, E); // a fresh system scans every species
        const gWinner = speciesPotential(system, winner, pH, E);
        for (let i = 0; i < system.species.length; i++) expect(gWinner).toBeLessThanOrEqual(speciesPotential(system, i, pH, E));
        // once the cell has found its active species it compares only those: the answer must not change
        for (const cell of system.cells) activeSpecies(cell);
        expect(dominantSpecies(system, pH, E)).toBe(winner);
      }),
      { numRuns: 300 },
    );
  });

  it("a boundary reported above or below a point changes the species 1 mV either side", () => {
    fc.assert(
      fc.property(conditions, point, fc.constantFrom(1 as const, -1 as const), fc.boolean(), ({ metal, celsius, logActivity }, { pH, E }, direction, pruned) => {
        const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
        if (pruned) for (const cell of system.cells) activeSpecies(cell); // both the fresh and the pruned path
        const crossing = nearestBoundary(system, pH, E, direction);
        if (!crossing) {
          // then the species is the same all the way to the search limit
          const edge = direction > 0 ? 3 : -3;
          const here = dominantSpecies(system, pH, E);
          if (Math.abs(edge - E) > 1e-3) expect(system.species[dominantSpecies(system, pH, edge - direction * 1e-3)].formula).toBe(system.species[here].formula);
          return;
        }
        expect(direction > 0 ? crossing.E > E : crossing.E < E).toBe(true);
        const below = dominantSpecies(system, pH, crossing.E - 1e-3);
        const above = dominantSpecies(system, pH, crossing.E + 1e-3);
        expect(below).not.toBe(above);
        expect(below).toBe(crossing.below);
        expect(above).toBe(crossing.above);
        // and the point's own species runs up to that boundary: no other change in between
        const between = boundariesAtPH(system, pH).filter((c) => (direction > 0 ? c.E > E && c.E < crossing.E : c.E < E && c.E > crossing.E));
        expect(between).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });

  it("regions tile the rectangle: areas sum to it, and every point lies in the region of its dominant species", () => {
    fc.assert(
      fc.property(conditions, fc.array(point, { minLength: 20, maxLength: 20 }), ({ metal, celsius, logActivity }, points) => {
        const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
        const window = { pHMin: -2, pHMax: 16, eMin: -2.5, eMax: 2.5 };
        const regions = diagramRegions(system, window);
        const total = regions.reduce((sum, r) => sum + Math.abs(polygonArea(r.vertices)), 0);
        const box = (window.pHMax - window.pHMin) * (window.eMax - window.eMin);
        expect(Math.abs(total - box) / box).toBeLessThan(1e-9);
        for (const { pH, E } of points) {
          const containing = regions.filter((r) => insideConvex(r.vertices, [pH, E]));
          expect(containing.length).toBeGreaterThanOrEqual(1);
          const dominant = dominantSpecies(system, pH, E);
          // interior points lie in exactly one region, that of the dominant species (points on an edge may touch two)
          if (containing.length === 1) expect(containing[0].species).toBe(dominant);
          else expect(containing.map((r) => r.species)).toContain(dominant);
        }
      }),
      { numRuns: 150 },
    );
  });

  it("regime follows the dominant species: metal → immunity, other solid → passivation, dissolved → corrosion", () => {
    fc.assert(
      fc.property(conditions, point, ({ metal, celsius, logActivity }, { pH, E }) => {
        const system = buildSystem(db, metal, { celsius, activity: 10 ** logActivity });
        const s = system.species[dominantSpecies(system, pH, E)];
        const expected = s.formula === `${metal}(s)` ? "immunity" : s.species.state === "aq" ? "corrosion" : "passivation";
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

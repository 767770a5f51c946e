/**
 * Engine properties with ligands (DEVELOPERS.md): diagram polygons still tile the rectangle; the dominant species
 * is still the argmin of the planes; a boundary reported changes the species 1 mV either side; hostile ligand
 * input gives error values, never a throw, NaN or Infinity.
 */
import fc from "fast-check";
import { expectRegionsTile } from "./tiling";
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { buildLigandSystem } from "../../src/chemistry/ligand-system";
import { boundariesAtPH, nearestBoundary } from "../../src/chemistry/predominance";
import { dominantSpecies, speciesPotential } from "../../src/chemistry/system";
import { CellError } from "../../src/functions/cell-values";
import { boundary, dissolved, regime, species } from "../../src/functions/functions";

const db = getDatabase();
const metals = db.metals();
const total = fc.oneof(fc.constant(0), fc.double({ min: -6, max: 0, noNaN: true }).map((l) => 10 ** l));
const conditions = fc.record({
  metal: fc.constantFrom(...metals),
  celsius: fc.double({ min: 0, max: 100, noNaN: true }),
  logActivity: fc.double({ min: -9, max: 0, noNaN: true }),
  carbonate: total,
  chloride: total,
  sulfur: total,
});
const point = fc.record({ pH: fc.double({ min: -2, max: 16, noNaN: true }), E: fc.double({ min: -2.5, max: 2.5, noNaN: true }) });
type Conditions = { metal: string; celsius: number; logActivity: number; carbonate: number; chloride: number; sulfur: number };
const build = (c: Conditions) =>
  buildLigandSystem(db, c.metal, { celsius: c.celsius, activity: 10 ** c.logActivity }, { carbonate: c.carbonate, chloride: c.chloride, sulfur: c.sulfur });

describe("engine properties with ligands", () => {
  it("the dominant species has the lowest g of all species", () => {
    fc.assert(
      fc.property(conditions, point, (c, { pH, E }) => {
        const system = build(c);
        const winner = dominantSpecies(system, pH, E);
        const g = speciesPotential(system, winner, pH, E);
        for (let i = 0; i < system.species.length; i++) expect(g).toBeLessThanOrEqual(speciesPotential(system, i, pH, E));
      }),
      { numRuns: 200 },
    );
  });

  it("regions tile the rectangle and every point lies in the region of its dominant species", () => {
    fc.assert(
      fc.property(conditions, fc.array(point, { minLength: 15, maxLength: 15 }), (c, points) => {
        expectRegionsTile(build(c), points);
      }),
      { numRuns: 100 },
    );
  });

  it("a boundary reported above or below a point changes the species 1 mV either side", () => {
    fc.assert(
      fc.property(conditions, point, fc.constantFrom(1 as const, -1 as const), (c, { pH, E }, direction) => {
        const system = build(c);
        const crossing = nearestBoundary(system, pH, E, direction);
        if (!crossing) return;
        expect(direction > 0 ? crossing.E > E : crossing.E < E).toBe(true);
        // 1 mV either side, or half the width of a narrower band next to it (a CdS sliver at 1e-6 sulfur is 1 mV wide)
        const others = boundariesAtPH(system, pH).map((b) => Math.abs(b.E - crossing.E)).filter((d) => d > 1e-9);
        const step = Math.min(1e-3, ...others.map((d) => d / 2));
        const below = dominantSpecies(system, pH, crossing.E - step);
        const above = dominantSpecies(system, pH, crossing.E + step);
        expect(below).not.toBe(above);
      }),
      { numRuns: 200 },
    );
  });

  it("hostile ligand input gives values or error values, never a throw, NaN or Infinity", () => {
    const hostile = fc.oneof(
      fc.constant(null),
      fc.constant(""),
      fc.constant("abc"),
      fc.constant(true),
      fc.constant(Number.NaN),
      fc.constant(Number.POSITIVE_INFINITY),
      fc.constant(-1),
      fc.constant(1e300),
      fc.constant(1e-320),
      fc.constant("1e-3"),
      fc.double(),
      fc.constant([[1e-3, 2e-3]]),
      fc.constant([[1e-3], [2e-3], [3e-3]]),
      fc.constant([] as unknown[]),
    );
    fc.assert(
      fc.property(fc.constantFrom(...metals), hostile, hostile, hostile, point, (metal, co3, cl, s, { pH, E }) => {
        const wrap = (v: unknown) => (Array.isArray(v) ? v : [[v]]) as any[][];
        const outputs = [
          species([[metal]], [[pH]], [[E]], undefined, undefined, wrap(co3), wrap(cl), wrap(s)),
          regime([[metal]], [[pH]], [[E]], undefined, undefined, wrap(co3), wrap(cl), wrap(s)),
          boundary([[metal]], [[pH]], [[E]], undefined, undefined, undefined, wrap(co3), wrap(cl), wrap(s)),
          dissolved([[metal]], [[pH]], [[E]], undefined, [["mg/L"]], undefined, wrap(co3), wrap(cl), wrap(s)),
        ];
        for (const out of outputs) {
          for (const row of out) {
            for (const cell of row) {
              if (typeof cell === "number") expect(Number.isFinite(cell)).toBe(true);
              else if (typeof cell !== "string") expect(cell).toBeInstanceOf(CellError);
            }
          }
        }
      }),
      { numRuns: 300 },
    );
  });
});

/**
 * With carbonate, chloride and sulfur blank (or 0) every stability function answers exactly as without them
 * (issue: real waters; the ligand-free path is the same code). Compared cell by cell, including error values.
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { buildLigandSystem } from "../../src/chemistry/ligand-system";
import { buildSystem } from "../../src/chemistry/system";
import { boundary, dissolved, regime, species } from "../../src/functions/functions";

const db = getDatabase();
const metals = db.metals();
// a column of points covering the diagram, as a worksheet range
const pHs: number[] = [];
const Es: number[] = [];
for (let pH = -1; pH <= 15; pH += 2)
  for (let E = -1.6; E <= 1.6; E += 0.4) {
    pHs.push(pH);
    Es.push(Number(E.toFixed(2)));
  }
const col = (xs: unknown[]) => xs.map((x) => [x]) as any[][];

describe("blank ligand arguments change nothing", () => {
  for (const metal of metals) {
    it(`${metal}: SPECIES, REGIME, BOUNDARY, DISSOLVED identical with blank, 0 and omitted ligands`, () => {
      const el = [[metal]];
      const p = col(pHs);
      const e = col(Es);
      const blanks = [undefined, [[null]], [[""]], [[0]]] as const;
      const base = {
        species: species(el, p, e),
        regime: regime(el, p, e),
        up: boundary(el, p, e),
        down: boundary(el, p, e, undefined, undefined, undefined, undefined, undefined, undefined, undefined, [[-1]]),
        dissolved: dissolved(el, p, e, undefined, undefined, undefined, undefined, undefined, undefined, [["ug/L"]]),
      };
      for (const blank of blanks) {
        const b = blank as any;
        expect(species(el, p, e, undefined, undefined, b, b, b, b)).toEqual(base.species);
        expect(regime(el, p, e, undefined, undefined, b, b, b, b)).toEqual(base.regime);
        expect(boundary(el, p, e, undefined, undefined, b, b, b, b)).toEqual(base.up);
        expect(boundary(el, p, e, undefined, undefined, b, b, b, b, undefined, [[-1]])).toEqual(base.down);
        expect(dissolved(el, p, e, undefined, b, b, b, b, undefined, [["ug/L"]])).toEqual(base.dissolved);
      }
    });
  }

  it("buildLigandSystem with no ligand gives the planes of buildSystem bit for bit", () => {
    for (const metal of metals) {
      const plain = buildSystem(db, metal, { celsius: 40, activity: 1e-5 });
      const viaLigands = buildLigandSystem(
        db,
        metal,
        { celsius: 40, activity: 1e-5 },
        { carbonate: 0, chloride: 0, sulfur: 0 },
      );
      expect(viaLigands.species.map((s) => s.formula)).toEqual(plain.species.map((s) => s.formula));
      expect(viaLigands.cells.length).toBe(1);
      expect(Array.from(viaLigands.cells[0].a)).toEqual(Array.from(plain.cells[0].a));
      expect(Array.from(viaLigands.cells[0].b)).toEqual(Array.from(plain.cells[0].b));
      expect(Array.from(viaLigands.cells[0].c)).toEqual(Array.from(plain.cells[0].c));
    }
  });

  it("a ligand does change the answer where it should: lead at pH 8, +0.4 V with 1 mmol/kg DIC", () => {
    expect(species([["Pb"]], [[8]], [[0.4]])[0][0]).not.toBe(
      species([["Pb"]], [[8]], [[0.4]], undefined, undefined, [[1e-3]])[0][0],
    );
  });
});

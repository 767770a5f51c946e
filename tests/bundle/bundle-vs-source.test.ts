/**
 * The built bundle answers as the sources do. Every function of functions.json is called from dist/functions.js
 * (stand-in registry, harness.ts) and from src/functions/functions.ts with the same spreadsheet-shaped arguments —
 * single cells, column and row ranges, blank cells, omitted optionals, the ligand arguments, hostile values — and
 * the answers must match cell by cell: numbers to the last bit, text exactly, error values by code and message.
 * Sources run without a registry, so their errors are CellError records; the bundle's are the stand-in's.
 */
import { beforeAll, describe, expect, it } from "vitest";
import * as sources from "../../src/functions/functions";
import { CellError } from "../../src/functions/cell-values";
import { loadBundle, LoadedBundle, StandInError } from "../../test-support/bundle-harness";

type Args = unknown[];
const column = (...values: unknown[]) => values.map((v) => [v]);
const row = (...values: unknown[]) => [values];

/** Argument sets per function id: each list is passed as is to both implementations. */
const CASES: Record<string, Args[]> = {
  WATERLINE: [
    [7],
    [column(0, 7, 14, null, "x")],
    [7, 60, "H2", 0.21],
    [row(4, 7), 25, "O2", column(1, 0.21)],
    [7, 25, "N2"],
    [7, 120],
  ],
  WATERMARGIN: [
    [7, 0.5],
    [column(2, 7, 12), column(1.5, 0, -1), 25, 0.6],
    [7, null],
    [20, 0],
  ],
  TOSHE: [
    [0.2, "SCE"],
    [column(595, null), "AgCl-sat", 7.3, null, "mV"],
    [612, "SCE"],
    [column(0.1, 0.2, null), "AgCl-sat", column(10, 25, 40)],
    [0.1, "RHE", 25, 7],
    [0.1, "RHE"],
    [0.1, "Ag/AgCl"],
    [0.1, "calomel", 90],
  ],
  FROMSHE: [
    [0.5, "CSE"],
    [column(0.5, -0.2), "AgCl-3M", 35],
    [0.5, "RHE", 25, column(0, 7, 14)],
    [0.5, "nowhere"],
  ],
  PE: [[0.4], [column(0.4, -0.2, null), 60], [true]],
  EH: [[7], [column(7, -3), 10], ["seven"]],
  NEUTRALPH: [[], [column(0, 25, 100)], [101]],
  SLOPE: [[], [row(0, 25, 60, 100)], [-5]],
  SPECIES: [
    ["Fe", 7, 0],
    ["Cu", column(2, 7, 12, null), column(0.3, 0.1, -0.2, 0.1), 25],
    [column("Fe", "Pb", "Zn"), 8, 0.4, 60, 1e-5],
    ["Pb", 8, 0.4, null, null, 1e-3],
    ["Cu", 7, -0.3, 25, 1e-6, null, null, 1e-4],
    ["Fe", column(6, 8), column(-0.4, -0.2), 15, 1e-6, 2e-3, 1e-3, 1e-4],
    ["Pb", 7.2, 0.1, 12, 1e-6, 1.5e-3, 2e-3, 2e-4, null, 0.008],
    ["Pb", 7.5, 0.3, 25, 1e-6, 1e-3, 2e-3, null, 1e-5],
    ["Pb", 7.2, 0.1, 12, 1e-6, 1.5e-3, 2e-3, 2e-4, null, 0.6],
    ["Unobtainium", 7, 0],
    ["Fe", 17, 0],
    ["Fe", column(7, 8), row(0, 0.1, 0.2)],
    ["Fe", column(7, 8, 9), column(0, 0.1)],
  ],
  REGIME: [
    ["Zn", column(5, 9, 13), -0.5],
    ["Pb", 8, 0.4, 25, 1e-6, 1e-3],
    ["Al", 7, 0, 25, 0],
  ],
  BOUNDARY: [
    ["Fe", 7, 0],
    ["Fe", column(4, 7, 10), 0, 25, null, null, null, null, null, null, -1],
    ["Cu", 7, 0.1, 40, 1e-5, null, null, null, null, null, column(1, -1)],
    ["Pb", 8, 0.4, 25, 1e-6, 1e-3, 1e-3, null, 3e-5, null, -1],
    ["Pb", 7, -0.3, 15, 1e-6, 2e-3, 1e-3, 1e-4, null, 0.01, 1],
    ["Fe", 7, 0, 25, null, null, null, null, null, null, 2],
    ["Fe", 7, 0, 25, null, null, null, null, null, 0.9],
    ["Mg", 7, 2.9, 25, null, null, null, null, null, null, 1],
  ],
  COUPLE: [
    ["Fe3+", "Fe2+", 0],
    ["Fe2O3(s)", "Fe2+", column(2, 4, 6), 25, 1e-6],
    ["Fe2+", "Fe3+", 0],
    ["Cu2+", "CuOH+", 5],
    ["Fe3+", "Cu2+", 0],
    ["nonsense", "Fe2+", 0],
  ],
  DISSOLVED: [
    ["Cu", 9, 0.2],
    ["Pb", 8, 0.4, 25, 1e-3, null, null, null, null, "ug/L"],
    ["Pb", 7.5, 0.4, 25, 1e-3, 2e-4, null, 1e-5, null, "ug/L"],
    ["Pb", 7, 0.4, 25, 1e-3, 1e-3, 1e-4, null, 0.02, "ug/L"],
    ["Fe", column(8, 9, 10), -0.3, 25, null, null, null, null, null, "mg/L"],
    ["Zn", 4, 0],
    ["Cu", 9, 0.2, 25, null, null, null, null, null, "furlongs"],
  ],
  IONICSTRENGTH: [
    [500, "uS/cm"],
    [column(200, 400), "mg/L"],
    [1e6, "uS/cm"],
    [100, "ppm"],
  ],
  SPECIESTABLE: [["Cr"], ["Pb", 60], [column("Fe", "Cu")], ["Xx"]],
  DIC: [
    [120, 8],
    [column(50, 120, null), column(7, 8, 8.3), 10],
    [50, 3.5],
    ["lots", 8],
  ],
  ASSESS: [
    ["Fe", 7, 0],
    [
      column("Pb", "Fe", null, "Cu"),
      column(7.02, 8, 7, 9),
      column(0.81, -0.3, 0, 0.2),
      column(7.3, 13, 25, null),
      null,
      null,
      null,
      null,
      null,
      null,
      "ug/L",
      true,
    ],
    ["Pb", 7.2, 0.1, 12, 1e-6, 1.5e-3, 2e-3, 2e-4, null, 0.01, "mg/L", true],
    ["Pb", 7.5, 0.3, 15, 1e-6, 1e-3, 1e-3, null, 1.05e-5, null, "ug/L", true],
    ["Pb", 8, 0.4, 25, 1e-6, 1e-3],
    ["Fe", row(7, 8), 0],
    ["Fe", 7, 595],
  ],
  METALS: [[]],
  ELECTRODES: [[]],
  VERSION: [[]],
};

let bundle: LoadedBundle;
beforeAll(() => {
  bundle = loadBundle();
});

/** Cell value in a comparable form: errors as {code, message}. */
function comparable(cell: unknown): unknown {
  if (cell instanceof StandInError) return { error: cell.code, message: cell.message };
  if (cell instanceof CellError) return { error: cell.code, message: cell.message };
  return cell;
}

describe("bundle answers as the sources", () => {
  it("has cases for every function of functions.json, and sources for each", () => {
    for (const f of bundle.metadata.functions) {
      expect(CASES[f.id], `cases for ${f.id}`).toBeDefined();
      expect(typeof (sources as Record<string, unknown>)[f.id.toLowerCase()], `source of ${f.id}`).toBe("function");
    }
  });

  for (const [id, cases] of Object.entries(CASES)) {
    cases.forEach((args, n) => {
      it(`${id} case ${n + 1}`, () => {
        const fromBundle = bundle.functions.get(id)!(...args) as unknown[][];
        const fromSource = ((sources as Record<string, unknown>)[id.toLowerCase()] as (...a: unknown[]) => unknown[][])(
          ...args,
        );
        expect(fromBundle.map((r) => r.map(comparable))).toEqual(fromSource.map((r) => r.map(comparable)));
      });
    });
  }

  it("the cases reach every kind of answer: numbers, text, blanks and each error code", () => {
    const seen = new Set<string>();
    for (const [id, cases] of Object.entries(CASES)) {
      for (const args of cases) {
        for (const r of bundle.functions.get(id)!(...args) as unknown[][]) {
          for (const cell of r) {
            if (cell instanceof StandInError) seen.add(cell.code);
            else if (cell === "") seen.add("blank");
            else seen.add(typeof cell);
          }
        }
      }
    }
    for (const kind of ["number", "string", "blank", "#VALUE!", "#N/A"]) expect(seen).toContain(kind);
    expect(seen).not.toContain("#NUM!"); // Excel shows no message with #NUM!
  });
});

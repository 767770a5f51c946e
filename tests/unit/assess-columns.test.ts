/**
 * assessColumns, the answers the command line writes: for a batch given as a row or as a column of samples, each
 * sample's species, regime, boundaries and dissolved metal equal what SPECIES, REGIME, BOUNDARY and DISSOLVED give
 * for it alone, bad and blank cells included. A property of the functions themselves, no outside value.
 */
import { describe, expect, it } from "vitest";
import { assessColumns } from "../../src/functions/assess-functions";
import type { CellScalar } from "../../src/functions/cell-values";
import { boundaryFrom, dissolvedAt, regimeAt, speciesAt } from "../../src/functions/stability-functions";

// pH, E (V vs SHE), °C and carbonate per sample: ordinary rows, a bad pH, a blank potential, 250 °C for lead (refused)
const SAMPLES: [CellScalar, CellScalar, CellScalar, CellScalar][] = [
  [7.2, 0.35, 15, 2e-3],
  [5.1, -0.4, 25, 0],
  ["abc", 0.1, 25, 1e-3],
  [8.4, "", 25, 1e-3],
  [9.6, -0.7, 250, 0],
  [6.8, 0.05, 40, 5e-3],
];

describe("assessColumns gives each sample the single functions' answers", () => {
  for (const metal of ["Pb", "Fe"])
    for (const shape of ["row", "column"] as const)
      it(`${metal}, samples as a ${shape}`, () => {
        const n = SAMPLES.length;
        const range = (k: number): CellScalar[][] =>
          shape === "row" ? [SAMPLES.map((s) => s[k])] : SAMPLES.map((s) => [s[k]]);
        const got = assessColumns(n, metal, range(0), range(1), range(2), 1e-6, range(3), 0, 0, 0, 0, "ug/L");
        SAMPLES.forEach(([pH, E, T, co3], i) => {
          expect(got.species[i], `species ${i}`).toStrictEqual(speciesAt(metal, pH, E, T, 1e-6, co3)[0][0]);
          expect(got.regime[i], `regime ${i}`).toStrictEqual(regimeAt(metal, pH, E, T, 1e-6, co3)[0][0]);
          for (const [d, column] of [
            [1, got.above],
            [-1, got.below],
          ] as const)
            expect(column[i], `boundary ${d} ${i}`).toStrictEqual(
              boundaryFrom(metal, pH, E, T, 1e-6, co3, 0, 0, 0, 0, d)[0][0],
            );
          expect(got.dissolved[i], `dissolved ${i}`).toStrictEqual(
            dissolvedAt(metal, pH, E, T, co3, 0, 0, 0, 0, "ug/L")[0][0],
          );
        });
      });

  it("a whole-batch argument error fills every sample", () => {
    const got = assessColumns(3, "Xx", [[7, 7, 7]], [[0, 0, 0]]);
    expect(new Set(got.species).size).toBe(1);
    expect(got.species[0]).toStrictEqual(speciesAt("Xx", 7, 0)[0][0]);
    expect(got.species).toHaveLength(3);
  });
});

/**
 * Structural metals at boiler temperatures (issue #16): the S° added to hydroxo-complexes opens a metal to 300 °C
 * without changing any 25 °C answer; its answers are continuous across 100 °C (where the Criss–Cobble
 * correspondence takes over); and its fields at 250–300 °C are checked against published diagrams of 25–300 °C.
 *
 * Published diagrams, read from memory (no copy at hand): Cowan, R.L., Staehle, R.W., "The thermodynamics and
 * electrode kinetics of the iron–water system at elevated temperatures", J. Electrochem. Soc. 118, 557 (1971);
 * Beverskog, B., Puigdomenech, I., "Revised Pourbaix diagrams for iron at 25–300 °C", Corros. Sci. 38, 2121 (1996);
 * "Revised Pourbaix diagrams for zinc at 25–300 °C", Corros. Sci. 39, 107 (1997); "Revised Pourbaix diagrams for
 * chromium at 25–300 °C", Corros. Sci. 39, 43 (1997). Only features recalled with confidence are checked: which
 * field covers a point, not the position of a line to a few mV.
 */
import { describe, expect, it } from "vitest";
import snapshot from "../fixtures/species-25c-snapshot.json";
import { getDatabase } from "../../src/chemistry/database";
import { temperatureProblem } from "../../src/chemistry/temperature-range";
import { neutralPH, waterLine } from "../../src/chemistry/water";
import { CellError } from "../../src/functions/cell-values";
import { boundaryFrom, speciesAt } from "../../src/functions/stability-functions";

const db = getDatabase();
/** Metals whose every pure-water species now has S° (the rest are still refused above 100 °C). */
const OPENED = ["Fe", "Zn", "Cr"] as const;

const boundary = (metal: string, pH: number, E: number, celsius: number, direction: 1 | -1, carbonate = 0) =>
  boundaryFrom(metal, pH, E, celsius, 1e-6, carbonate, 0, 0, 0, 0, direction)[0][0];

describe("25 °C answers unchanged (regression snapshot written before the S° were added, not an outside check)", () => {
  const { grid, answers, gibbs } = snapshot;
  for (const metal of grid.metals) {
    it(`${metal}: REDOX.SPECIES at 25 °C over pH ${grid.pH[0]}–${grid.pH.at(-1)}, E ${grid.potentials[0]}–${grid.potentials.at(-1)} V is as before`, () => {
      for (const activity of grid.activities) {
        const cells = speciesAt(
          metal,
          [grid.pH],
          grid.potentials.map((e) => [e]),
          25,
          activity,
        );
        const now = cells.map((row) => row.map(String).join(" "));
        expect(now).toEqual(answers[metal as keyof typeof answers][String(activity) as "0.001"]);
      }
    });
  }
  it("ΔG°f at 25 °C of every species of these metals is as before", () => {
    for (const [formula, dGf] of Object.entries(gibbs)) expect(db.require(formula).dGf, formula).toBe(dGf);
  });
});

describe("metals opened to 300 °C: answers at 300 °C, continuous across 100 °C", () => {
  for (const metal of OPENED) {
    it(`${metal}: answered at 150, 250 and 300 °C in pure water`, () => {
      for (const celsius of [150, 250, 300]) {
        expect(temperatureProblem(db, metal, celsius)).toBeNull();
        expect(typeof speciesAt(metal, 7, -0.5, celsius)[0][0]).toBe("string");
      }
    });

    it(`${metal}: REDOX.BOUNDARY at 99.9 and 100.1 °C within 3 mV, and the step across 100 °C no larger than the step 99.7 → 99.9 °C (+0.3 mV)`, () => {
      let compared = 0;
      for (let pH = 0; pH <= 14; pH += 0.5)
        for (const E of [-1.2, -0.8, -0.4, 0, 0.4, 0.8])
          for (const direction of [1, -1] as const) {
            const [before, below, above] = [99.7, 99.9, 100.1].map((t) => boundary(metal, pH, E, t, direction));
            if (typeof below !== "number" || typeof above !== "number" || typeof before !== "number") {
              expect(typeof above, `pH ${pH}, E ${E}`).toBe(typeof below);
              continue;
            }
            expect(Math.abs(above - below), `pH ${pH}, E ${E}, direction ${direction}`).toBeLessThan(0.003);
            expect(Math.abs(above - below)).toBeLessThan(Math.abs(below - before) + 3e-4);
            compared++;
          }
      expect(compared).toBeGreaterThan(100);
    });

    it(`${metal} with carbonate (2 mmol/kg): REDOX.BOUNDARY continuous across 100 °C in the same way`, () => {
      let compared = 0;
      for (let pH = 4; pH <= 10; pH += 0.5)
        for (const E of [-0.8, -0.4, 0, 0.4])
          for (const direction of [1, -1] as const) {
            const [before, below, above] = [99.7, 99.9, 100.1].map((t) => boundary(metal, pH, E, t, direction, 0.002));
            if (typeof below !== "number" || typeof above !== "number" || typeof before !== "number") continue;
            expect(Math.abs(above - below), `pH ${pH}, E ${E}, direction ${direction}`).toBeLessThan(0.003);
            expect(Math.abs(above - below)).toBeLessThan(Math.abs(below - before) + 3e-4);
            compared++;
          }
      expect(compared).toBeGreaterThan(40);
    });
  }
});

describe("iron at 250–300 °C (Cowan & Staehle 1971; Beverskog & Puigdomenech 1996, diagrams at 10^-6 read from memory)", () => {
  // from memory of both papers' diagrams: at 250–300 °C magnetite's field covers the hydrogen line from slightly acid
  // pH(T) through neutral into mildly alkaline water; iron is immune below it, Fe2+ dissolves in acid water
  for (const celsius of [250, 300]) {
    const neutral = neutralPH(celsius);
    for (const pH of [neutral, neutral + 1]) {
      it(`${celsius} °C, pH(T) ${pH.toFixed(2)}: just above the hydrogen line the answer is magnetite, Fe3O4(s)`, () => {
        const onLine = waterLine(pH, celsius, "H2");
        expect(speciesAt("Fe", pH, onLine + 0.01, celsius, 1e-6)[0][0]).toBe("Fe3O4(s)");
      });
    }
    it(`${celsius} °C: iron immune well below the hydrogen line, Fe2+ in acid water at pH(T) 3, hematite at +0.3 V, pH(T) ${neutral.toFixed(2)}`, () => {
      expect(speciesAt("Fe", neutral, waterLine(neutral, celsius, "H2") - 0.3, celsius, 1e-6)[0][0]).toBe("Fe(s)");
      expect(speciesAt("Fe", 3, waterLine(3, celsius, "H2") + 0.01, celsius, 1e-6)[0][0]).toBe("Fe2+");
      expect(speciesAt("Fe", neutral, 0.3, celsius, 1e-6)[0][0]).toBe("Fe2O3(s)");
    });
  }

  it("the counter-check at 25 °C (common practice: iron corrodes in neutral de-aerated water): Fe2+ on the hydrogen line at pH 7", () => {
    expect(speciesAt("Fe", 7, waterLine(7, 25, "H2") + 0.01, 25, 1e-6)[0][0]).toBe("Fe2+");
  });
});

describe("zinc and chromium at 250–300 °C (Beverskog & Puigdomenech 1997, diagrams at 10^-6 read from memory)", () => {
  for (const celsius of [250, 300]) {
    const neutral = neutralPH(celsius);
    const hydrogen = (pH: number) => waterLine(pH, celsius, "H2");
    it(`${celsius} °C: zinc is immune only well below the hydrogen line (0.8 V below it at pH(T) ${neutral.toFixed(2)}) and dissolves as Zn2+ just above it at pH(T) 3`, () => {
      expect(speciesAt("Zn", neutral, hydrogen(neutral) - 0.8, celsius, 1e-6)[0][0]).toBe("Zn(s)");
      expect(speciesAt("Zn", neutral, hydrogen(neutral) + 0.01, celsius, 1e-6)[0][0]).not.toBe("Zn(s)");
      expect(speciesAt("Zn", 3, hydrogen(3) + 0.01, celsius, 1e-6)[0][0]).toBe("Zn2+");
    });
    it(`${celsius} °C: chromium passive, Cr2O3(s) just above the hydrogen line at pH(T) ${neutral.toFixed(2)}; chromate CrO4 2- just below the oxygen line at pH(T) 10`, () => {
      expect(speciesAt("Cr", neutral, hydrogen(neutral) + 0.01, celsius, 1e-6)[0][0]).toBe("Cr2O3(s)");
      expect(speciesAt("Cr", 10, waterLine(10, celsius, "O2") - 0.01, celsius, 1e-6)[0][0]).toBe("CrO42-");
      expect(speciesAt("Cr", neutral, hydrogen(neutral) - 0.8, celsius, 1e-6)[0][0]).toBe("Cr(s)");
    });
  }
});

describe("refusals that remain above 100 °C", () => {
  it("nickel is refused at 200 °C, naming only Ni4(OH)4 4+ (no published S° and no analogue of its charge types)", () => {
    const out = speciesAt("Ni", 7, 0, 200)[0][0] as CellError;
    expect(out).toBeInstanceOf(CellError);
    expect(out.message).toMatch(/Ni is modelled 0–100 °C only; above 100 °C the records lack S° for Ni4\(OH\)44\+$/);
  });

  it("copper is refused at 200 °C, naming only Cu2(OH)2 2+ (no published S° and no analogue of its charge types)", () => {
    const out = speciesAt("Cu", 7, 0, 200)[0][0] as CellError;
    expect(out).toBeInstanceOf(CellError);
    expect(out.message).toMatch(/Cu is modelled 0–100 °C only; above 100 °C the records lack S° for Cu2\(OH\)22\+$/);
  });

  it("iron with chloride is refused at 250 °C, naming FeCl+ (its chloro-complexes lack S°)", () => {
    const out = speciesAt("Fe", 7, -0.5, 250, 1e-6, 0, 0.01)[0][0] as CellError;
    expect(out).toBeInstanceOf(CellError);
    expect(out.message).toMatch(/Fe with chloride is modelled 0–100 °C only;.*FeCl\+/);
  });
});

/**
 * Carbonic acid constants and dissolved inorganic carbon.
 *
 * Check values (fixtures/ligands/carbonic-acid.json): Harned & Davis (1943) for pK1 and KH and Harned & Scholes
 * (1941) for pK2 at 5 and 25 °C — the measurements Plummer & Busenberg (1982) fitted — and the Plummer & Busenberg
 * fit itself at 60 °C (beyond the Harned series), all within 0.03. Both the fit in src/chemistry/carbonic-acid.ts
 * and the constants the engine derives from the carbonate species records (which set the ligand cells and every
 * metal carbonate plane) are checked.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import {
  AlkalinityProblem,
  alkalinityEquivalents,
  dicFromAlkalinity,
  dicFromBicarbonateOrProblem,
} from "../../src/chemistry/alkalinity";
import { carbonicPK1, carbonicPK2, logHenryCO2 } from "../../src/chemistry/carbonic-acid";
import { getDatabase } from "../../src/chemistry/database";
import { ligandOwnCells } from "../../src/chemistry/ligand-cells";
import { reactionLogK } from "../../src/chemistry/reaction";
import { pKw } from "../../src/chemistry/water";
import { dic } from "../../src/functions/functions";
import { CellError } from "../../src/functions/cell-values";
import { loadReferenceFixture } from "../../test-support/reference-fixture";

const db = getDatabase();
const constant = z.strictObject({ constant: z.enum(["pK1", "pK2", "logKH"]), celsius: z.number() });
/** Harned & Davis 1943, Harned & Scholes 1941 and the Plummer & Busenberg 1982 fit: within 0.03 at most. */
const CASES = loadReferenceFixture(new URL("./fixtures/ligands/carbonic-acid.json", import.meta.url), constant, {
  ceiling: () => 0.03,
});

function fromFit(what: string, celsius: number): number {
  return what === "pK1" ? carbonicPK1(celsius) : what === "pK2" ? carbonicPK2(celsius) : logHenryCO2(celsius);
}

function fromSpecies(what: string, celsius: number): number {
  if (what === "pK1") return -reactionLogK(db, { "CO2(aq)": -1, "H2O(l)": -1, "H+": 1, "HCO3-": 1 }, celsius);
  if (what === "pK2") return -reactionLogK(db, { "HCO3-": -1, "H+": 1, "CO32-": 1 }, celsius);
  return reactionLogK(db, { "CO2(g)": -1, "CO2(aq)": 1 }, celsius);
}

describe("carbonic acid constants within 0.03 (5, 25, 60 °C)", () => {
  for (const c of CASES) {
    const { constant, celsius } = c.inputs;
    it(`${c.id} = ${c.value}: fit (${c.source})`, () => {
      expect(Math.abs(fromFit(constant, celsius) - c.value)).toBeLessThanOrEqual(c.tolerance);
    });
    it(`${c.id} = ${c.value}: from the species records (${c.source})`, () => {
      expect(Math.abs(fromSpecies(constant, celsius) - c.value)).toBeLessThanOrEqual(c.tolerance);
    });
  }
});

describe("carbonate ligand cells follow pK1 and pK2 of the records", () => {
  for (const celsius of [5, 25, 60]) {
    it(`vertical boundaries at pK1 and pK2 at ${celsius} °C, independent of the total`, () => {
      for (const total of [1e-4, 1e-2]) {
        const cells = ligandOwnCells(db, "carbonate", total, celsius);
        expect(cells.map((c) => c.ligands[0].species.formula).sort()).toEqual(["CO2(aq)", "CO32-", "HCO3-"]);
        const edges = cells
          .flatMap((c) => c.region)
          .filter((h) => h.c === 0 && h.b !== 0)
          .map((h) => Math.abs(h.a / h.b));
        const pK1 = fromSpecies("pK1", celsius);
        const pK2 = fromSpecies("pK2", celsius);
        expect(edges.some((x) => Math.abs(x - pK1) < 1e-9)).toBe(true);
        expect(edges.some((x) => Math.abs(x - pK2) < 1e-9)).toBe(true);
        for (const cell of cells) expect(cell.ligands[0].lnActivity).toBeCloseTo(Math.log(total), 12);
      }
    });
  }
});

describe("dissolved inorganic carbon from alkalinity (hand calculations)", () => {
  it("100 mg/L as CaCO3 is 1.998 meq/L (½ × 100.087 g/mol; common practice)", () => {
    expect(alkalinityEquivalents(100) * 1000).toBeCloseTo(1.998, 3);
  });

  it("alkalinity 100 mg/L as CaCO3 at pH 7.5, 25 °C: step by step", () => {
    const h = 10 ** -7.5;
    const k1 = 10 ** -6.352; // Harned & Davis 1943 via Plummer & Busenberg 1982 (from memory)
    const k2 = 10 ** -10.329; // Harned & Scholes 1941 via Plummer & Busenberg 1982 (from memory)
    const kw = 10 ** -13.995; // Bandura & Lvov 2006 (from memory)
    const alk = 100 / 50043.5;
    const d = h * h + k1 * h + k1 * k2;
    const expected = (alk - kw / h + h) / ((k1 * h + 2 * k1 * k2) / d);
    // about 2.13 mmol/kg: at pH 7.5 some 7 % of DIC is CO2(aq)
    expect(expected).toBeGreaterThan(2.12e-3);
    expect(expected).toBeLessThan(2.15e-3);
    expect(Math.abs(dicFromAlkalinity(100, 7.5, 25) / expected - 1)).toBeLessThan(2e-3);
  });

  it("at pH 8.3 DIC ≈ alkalinity (the bicarbonate end point; common practice) within 2 %", () => {
    for (const alkalinity of [20, 100, 300]) {
      const dicValue = dicFromAlkalinity(alkalinity, 8.3, 25);
      expect(Math.abs(dicValue / alkalinityEquivalents(alkalinity) - 1)).toBeLessThan(0.02);
    }
  });

  it("temperature enters through K1, K2 (Plummer & Busenberg) and Kw (water records)", () => {
    const celsius = 60;
    const pH = 9.5;
    const h = 10 ** -pH;
    const k1 = 10 ** -carbonicPK1(celsius);
    const k2 = 10 ** -carbonicPK2(celsius);
    const oh = 10 ** -pKw(celsius) / h;
    const alk = 150 / 50043.5;
    const expected = (alk - oh + h) / ((k1 * h + 2 * k1 * k2) / (h * h + k1 * h + k1 * k2));
    expect(dicFromAlkalinity(150, pH, celsius)).toBeCloseTo(expected, 12);
    // a warmer water at the same pH and alkalinity holds less DIC (more of it as CO3 2-)
    expect(dicFromAlkalinity(150, pH, 60)).toBeLessThan(dicFromAlkalinity(150, pH, 25));
  });

  it("REDOX.DIC: values, broadcasting and error values, never a throw", () => {
    const out = dic([[100], [0], ["abc"], [-5], [null]], [[7.5], [12], [7], [7], [7]]);
    expect(out[0][0]).toBeCloseTo(dicFromAlkalinity(100, 7.5, 25), 15);
    expect((out[1][0] as CellError).code).toBe("#N/A"); // hydroxide exceeds a zero alkalinity: no DIC exists
    expect((out[2][0] as CellError).code).toBe("#VALUE!");
    expect((out[3][0] as CellError).code).toBe("#VALUE!"); // negative alkalinity: out of range
    expect(out[4][0]).toBe("");
    const hot = dic([[100]], [[7.5]], [[150]]);
    expect((hot[0][0] as CellError).code).toBe("#VALUE!"); // the fits' range, not the engine's 0–300 °C
    expect((hot[0][0] as CellError).message).toMatch(
      /^temperature: 150 °C is outside 0 to 100 °C.*Plummer & Busenberg/,
    );
  });
});

describe("dissolved inorganic carbon from bicarbonate (hand calculations)", () => {
  it("122 mg/L HCO3 at pH 7.5, 25 °C: DIC = [HCO3−]/α1, step by step", () => {
    const h = 10 ** -7.5;
    const k1 = 10 ** -6.352; // Harned & Davis 1943 via Plummer & Busenberg 1982 (from memory)
    const k2 = 10 ** -10.329; // Harned & Scholes 1941 via Plummer & Busenberg 1982 (from memory)
    const alpha1 = (k1 * h) / (h * h + k1 * h + k1 * k2); // 0.932: some 7 % of DIC is CO2(aq)
    const hco3 = 122 / 61016; // mol/L: HCO3− 61.016 g/mol (IUPAC atomic weights; common practice)
    const expected = hco3 / alpha1;
    expect(expected).toBeGreaterThan(2.13e-3);
    expect(expected).toBeLessThan(2.16e-3);
    expect(Math.abs((dicFromBicarbonateOrProblem(122, 7.5, 25) as number) / expected - 1)).toBeLessThan(2e-3);
  });

  it("one water, two reports: its bicarbonate and its alkalinity give the same DIC (pH 6–10, 0–90 °C)", () => {
    for (const celsius of [0, 12, 25, 60, 90])
      for (const pH of [6, 7, 7.8, 8.3, 9, 10]) {
        const dicTrue = 2.5e-3; // mol/kg
        const h = 10 ** -pH;
        const k1 = 10 ** -carbonicPK1(celsius);
        const k2 = 10 ** -carbonicPK2(celsius);
        const d = h * h + k1 * h + k1 * k2;
        const hco3MgL = dicTrue * ((k1 * h) / d) * 61016;
        const alkMgL = (dicTrue * ((k1 * h + 2 * k1 * k2) / d) + 10 ** -pKw(celsius) / h - h) * 50043.5;
        expect(dicFromBicarbonateOrProblem(hco3MgL, pH, celsius)).toBeCloseTo(dicTrue, 9);
        expect(dicFromAlkalinity(alkMgL, pH, celsius)).toBeCloseTo(dicTrue, 9);
      }
  });

  it("no answer where bicarbonate is under a thousandth of the carbonate (pH 2, pH 13.5)", () => {
    expect(dicFromBicarbonateOrProblem(100, 2, 25)).toBeInstanceOf(AlkalinityProblem);
    expect(dicFromBicarbonateOrProblem(100, 13.5, 25)).toBeInstanceOf(AlkalinityProblem);
    expect(dicFromBicarbonateOrProblem(100, 4, 25)).not.toBeInstanceOf(AlkalinityProblem);
  });

  it('REDOX.DIC with basis "bicarbonate"; an unknown basis is #VALUE! naming both', () => {
    const out = dic([[122], [122]], [[7.5], [7.5]], [[25]], [["bicarbonate"], ["Alkalinity"]]);
    expect(out[0][0]).toBeCloseTo(dicFromBicarbonateOrProblem(122, 7.5, 25) as number, 15);
    expect(out[1][0]).toBeCloseTo(dicFromAlkalinity(122, 7.5, 25), 15);
    const bad = dic([[122]], [[7.5]], [[25]], [["HCO3"]]);
    expect((bad[0][0] as CellError).code).toBe("#VALUE!");
    expect((bad[0][0] as CellError).message).toMatch(/"alkalinity".*"bicarbonate"/);
    expect((dic([[100]], [[13.5]], [[25]], [["bicarbonate"]])[0][0] as CellError).code).toBe("#N/A");
  });
});

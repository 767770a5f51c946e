// Reference checks for the water slice: constants, Nernst factor, the water lines, Kw(T) and the pe scale, each
// against a named published value (or `common practice`). No internet was available: published values written
// here are recalled and say "from memory".
import { create, faradayDependencies, gasConstantDependencies } from "mathjs";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { getDatabase } from "../../src/chemistry/database";
import { FARADAY, GAS_CONSTANT, kelvin, nernstFactor, T0 } from "../../src/chemistry/constants";
import { ehFromPe, peFromEh } from "../../src/chemistry/pe";
import {
  kw,
  neutralPH,
  pKw,
  recordsPKw,
  waterLine,
  waterMargin,
  waterStandardPotential,
} from "../../src/chemistry/water";
import { CellError } from "../../src/functions/cell-values";
import { neutralPHAt, slopeAt, waterLineAt, waterMarginAt } from "../../src/functions/water-functions";
import { boundText } from "../../src/chemistry/domain";
import { checkById, loadReferenceFixture } from "../../test-support/reference-fixture";

const mathjs = create({ gasConstantDependencies, faradayDependencies });
/** The largest tolerance per unit: 0.5 µV for the Nernst factor, 1 mV for E°, 0.01 mV/K for dE°/dT, 0.03 pe. */
const CEILING_BY_UNIT = new Map([
  ["V per decade", 5e-7],
  ["V", 0.001],
  ["V/K", 1e-5],
  ["pe", 0.03],
]);
/** Published values of the Nernst factor and the water couples: fixtures/water/water-lines.json. */
const waterLines = loadReferenceFixture(
  new URL("./fixtures/water/water-lines.json", import.meta.url),
  z.strictObject({ celsius: z.number(), pH: z.number().optional() }),
  { ceiling: (c) => CEILING_BY_UNIT.get(c.unit) ?? 0 },
);
const published = (id: string) => checkById(waterLines, id);

describe("physical constants", () => {
  it("R matches mathjs's built-in gas constant (CODATA 2018, exact N_A·k)", () => {
    const reference = {
      value: mathjs.gasConstant.toNumber("J / (mol K)"),
      source: "mathjs 15 physical constant gasConstant (CODATA 2018)",
    };
    expect(Math.abs(GAS_CONSTANT - reference.value) / reference.value).toBeLessThan(1e-9);
    expect(GAS_CONSTANT).toBeCloseTo(8.314462618, 9); // CODATA 2018, Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)
  });

  it("F matches mathjs's built-in Faraday constant (CODATA 2018, exact N_A·e)", () => {
    const reference = {
      value: mathjs.faraday.toNumber("C / mol"),
      source: "mathjs 15 physical constant faraday (CODATA 2018)",
    };
    expect(Math.abs(FARADAY - reference.value) / reference.value).toBeLessThan(1e-9);
    expect(FARADAY).toBeCloseTo(96485.33212, 5); // CODATA 2018, Tiesinga et al. (2021)
  });

  const nernst = published("Nernst factor RT ln10 / F");
  it(`Nernst factor RT ln10 / F is ${nernst.value} V at 25 °C`, () => {
    expect(Math.abs(nernstFactor(T0) - nernst.value)).toBeLessThan(nernst.tolerance);
  });

  it("REDOX.SLOPE returns the Nernst factor, also at 60 °C", () => {
    const at60 = slopeAt([[60]])[0][0] as number;
    // k(333.15 K) = 8.314462618·333.15·ln10 / 96485.33212 = 0.066104 V (0.059159 V × 333.15/298.15, computed by hand)
    expect(at60).toBeCloseTo(0.066104, 6);
    expect(slopeAt()[0][0]).toBeCloseTo(0.059159, 6);
  });
});

describe("water lines from the species data", () => {
  const oxygen = published("E°(O2/H2O)");
  it(`E°(O2/H2O) is ${oxygen.value} V at 25 °C`, () => {
    expect(Math.abs(waterStandardPotential("O2", 25) - oxygen.value)).toBeLessThan(oxygen.tolerance);
  });

  const oxygenSlope = published("dE°/dT of O2/H2O");
  it(`dE°/dT of O2/H2O is ${boundText(oxygenSlope.value * 1000)} mV/K at 25 °C`, () => {
    const slope = (waterStandardPotential("O2", 26) - waterStandardPotential("O2", 24)) / 2;
    expect(Math.abs(slope - oxygenSlope.value)).toBeLessThan(oxygenSlope.tolerance);
  });

  it("E°(H+/H2) is zero at every temperature (hydrogen-electrode convention)", () => {
    // source: common practice (IUPAC convention; docs/method.md, Temperature)
    for (const t of [0, 25, 60, 100]) expect(Math.abs(waterStandardPotential("H2", t))).toBeLessThan(1e-12);
  });

  it("the window is 1.23 V wide at 25 °C at every pH", () => {
    // source: common practice
    for (const pH of [-2, 0, 7, 14, 16]) {
      expect(waterLine(pH, 25, "O2") - waterLine(pH, 25, "H2")).toBeCloseTo(1.23, 2);
    }
  });

  it("both lines fall 0.0592 V per pH unit at 25 °C", () => {
    // source: common practice
    for (const gas of ["O2", "H2"] as const) {
      expect(waterLine(3, 25, gas) - waterLine(4, 25, gas)).toBeCloseTo(0.0592, 4);
    }
  });

  const [peW, pe0] = [published("pe of O2/H2O at pH 7"), published("pe° of O2/H2O")];
  it(`O2/H2O at pH 7 is pe ${peW.value} (0.813 V), and pe° of the couple is ${pe0.value}`, () => {
    expect(Math.abs(peFromEh(waterLine(peW.inputs.pH!)) - peW.value)).toBeLessThan(peW.tolerance);
    expect(Math.abs(peFromEh(waterStandardPotential("O2")) - pe0.value)).toBeLessThan(pe0.tolerance);
  });

  it("gas pressure shifts the lines by the Nernst term: (k/4)·log p for O2, −(k/2)·log p for H2", () => {
    // source: Nernst equation for O2 + 4H+ + 4e− = 2H2O and 2H+ + 2e− = H2 (common practice)
    const k = nernstFactor(kelvin(25));
    expect(waterLine(7, 25, "O2", 0.21) - waterLine(7, 25, "O2", 1)).toBeCloseTo((k / 4) * Math.log10(0.21), 12);
    expect(waterLine(7, 25, "H2", 1e-4) - waterLine(7, 25, "H2", 1)).toBeCloseTo(2 * k, 12);
  });

  it("REDOX.WATERLINE answers per row and spills", () => {
    const out = waterLineAt([[0], [7], [14]], [[25]], [["O2"], ["h2"], ["oxygen"]]);
    expect(out.length).toBe(3);
    expect(out[0][0] as number).toBeCloseTo(1.229, 3);
    expect(out[1][0] as number).toBeCloseTo(-0.414, 3); // common practice: hydrogen line at pH 7 is −0.414 V
    expect(out[2][0] as number).toBeCloseTo(1.229 - 14 * 0.059159, 3);
  });
});

describe("ion product of water", () => {
  // pKw of Bandura & Lvov 2006 (IAPWS R11-07), 0–100 °C: fixtures/water/pkw.json
  const bandura = loadReferenceFixture(
    new URL("./fixtures/water/pkw.json", import.meta.url),
    z.strictObject({ celsius: z.number() }),
    { ceiling: () => 0.002 },
  );
  /** The species records (constant ΔCp°r) are a fit to the published values, not the formulation: 0.05. */
  const RECORDS_TOLERANCE = 0.05;

  // the species records (constant ΔCp°r) against the published values: a check of data/species/water.json
  const residuals = bandura.map(({ inputs, value }) => ({
    celsius: inputs.celsius,
    residual: recordsPKw(inputs.celsius) - value,
  }));

  it("prints the residuals against Bandura & Lvov", () => {
    // informational: the figures behind the two checks below
    console.log(
      residuals.map((r) => `${r.celsius} °C: ${r.residual >= 0 ? "+" : ""}${r.residual.toFixed(3)}`).join(", "),
    );
    expect(residuals.length).toBe(11);
  });

  for (const r of residuals) {
    const published = bandura.find((b) => b.inputs.celsius === r.celsius)!;
    it(`pKw from the records at ${r.celsius} °C is within ${RECORDS_TOLERANCE} of Bandura & Lvov 2006`, () => {
      expect(Math.abs(r.residual)).toBeLessThanOrEqual(RECORDS_TOLERANCE);
    });
    it(`pKw (IAPWS R11-07 as implemented) at ${r.celsius} °C is within ${published.tolerance} of the paper's values`, () => {
      expect(Math.abs(pKw(r.celsius) - published.value)).toBeLessThanOrEqual(published.tolerance);
    });
  }

  it("the check forces the ΔCp term: with ΔCp = 0 the 100 °C value would miss by far more than 0.05", () => {
    // ΔG°(T) without the heat-capacity term, computed here from the records: ΔG°(T0) − ΔS°·(T − T0)
    const T = 373.15;
    const R = 8.314462618; // CODATA 2018
    const db = getDatabase();
    const [water, hydroxide] = [db.require("H2O(l)"), db.require("OH-")];
    const dG = hydroxide.dGf - water.dGf - (hydroxide.S! - water.S!) * (T - 298.15);
    const pKwWithoutCp = dG / (R * T * Math.LN10);
    expect(Math.abs(pKwWithoutCp - 12.252)).toBeGreaterThan(0.15);
  });

  it("Kw at 25 °C is 1.01e-14 and neutral pH is 7.00", () => {
    const reference = { value: 13.995, source: "Bandura & Lvov 2006 (from memory)" };
    expect(kw(25)).toBeCloseTo(10 ** -reference.value, 16);
    expect(neutralPH(25)).toBeCloseTo(reference.value / 2, 2);
    expect(neutralPHAt()[0][0] as number).toBeCloseTo(7.0, 2); // common practice
  });

  it("neutral pH falls with temperature: 7.47 at 0 °C, 6.13 at 100 °C", () => {
    // Bandura & Lvov 2006 (from memory): ½·14.946 and ½·12.252
    expect(Math.abs(neutralPH(0) - 7.473)).toBeLessThan(0.025);
    expect(Math.abs(neutralPH(100) - 6.126)).toBeLessThan(0.03);
  });
});

describe("water margin and the kinetic window", () => {
  it("is positive inside, to the nearer line, and negative beyond the line crossed", () => {
    const top = waterLine(7, 25, "O2");
    const bottom = waterLine(7, 25, "H2");
    expect(waterMargin(7, top - 0.1)).toBeCloseTo(0.1, 12);
    expect(waterMargin(7, bottom + 0.2)).toBeCloseTo(0.2, 12);
    expect(waterMargin(7, top + 0.3)).toBeCloseTo(-0.3, 12);
    expect(waterMargin(7, bottom - 0.4)).toBeCloseTo(-0.4, 12);
    // the middle of the window is 1.23/2 from both lines (common practice: window 1.23 V wide)
    expect(waterMargin(7, (top + bottom) / 2)).toBeCloseTo(0.615, 2);
  });

  it("an overpotential of about 0.6 V keeps points up to 0.6 V beyond the lines inside (kinetic window)", () => {
    // source: common practice — water decomposes noticeably only about 0.6 V beyond its lines
    const top = waterLine(5, 25, "O2");
    const bottom = waterLine(5, 25, "H2");
    expect(waterMargin(5, top + 0.5, 25, 0.6)).toBeCloseTo(0.1, 12);
    expect(waterMargin(5, top + 0.7, 25, 0.6)).toBeCloseTo(-0.1, 12);
    expect(waterMargin(5, bottom - 0.5, 25, 0.6)).toBeCloseTo(0.1, 12);
    expect(waterMargin(5, bottom - 0.7, 25, 0.6)).toBeCloseTo(-0.1, 12);
    // kinetic window about 1.23 + 2·0.6 ≈ 2.4 V wide
    expect(waterMargin(5, (top + bottom) / 2, 25, 0.6)).toBeCloseTo((1.229 + 1.2) / 2, 2);
  });

  it("REDOX.WATERMARGIN broadcasts and names its arguments in errors", () => {
    const out = waterMarginAt([[7, 7]], [[0.5], [1.5]], 25, 0.6);
    expect(out.length).toBe(2);
    expect(out[0].length).toBe(2);
    const bad = waterMarginAt(7, 0.5, 25, -0.1)[0][0];
    expect(bad).toBeInstanceOf(CellError);
    expect((bad as CellError).code).toBe("#VALUE!"); // out of range: Excel shows a message only with #VALUE! and #N/A
    expect((bad as CellError).message).toContain("overpotential");
  });
});

describe("pe and Eh", () => {
  it("pe = Eh / 0.05916 at 25 °C and back", () => {
    // source: Stumm & Morgan 1996, eq. 8.x: pe = F·Eh / (2.303 RT) (from memory)
    expect(peFromEh(0.5916)).toBeCloseTo(10.0, 3);
    expect(ehFromPe(peFromEh(0.3, 60), 60)).toBeCloseTo(0.3, 12);
  });
});

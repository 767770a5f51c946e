import { describe, expect, it } from "vitest";
import {
  headerTokens,
  ionicStrengthOf,
  isNumericColumn,
  matchHeaders,
  matchIonicColumns,
  matchWaterColumns,
} from "../../src/tables";

const roles = (headers: string[]) => matchIonicColumns(headers).map((c) => [c.role, c.index, c.unit]);

describe("ionic-strength columns by header", () => {
  it("finds conductivity headers as labs write them, with their unit", () => {
    expect(roles(["pH", "ORP (mV)", "Conductivity (µS/cm)"])).toEqual([["conductivity", 2, "uS/cm"]]);
    expect(roles(["Specific conductance, uS/cm"])).toEqual([["conductivity", 0, "uS/cm"]]);
    expect(roles(["EC_uS_cm"])).toEqual([["conductivity", 0, "uS/cm"]]);
    expect(roles(["SC"])).toEqual([["conductivity", 0, "uS/cm"]]);
    expect(roles(["SpCond (mS/cm)"])).toEqual([["conductivity", 0, "mS/cm"]]);
    expect(roles(["EC (mS/m)"])).toEqual([["conductivity", 0, "mS/m"]]);
    // German and French lab exports (accents dropped before matching)
    expect(roles(["Leitfähigkeit (µS/cm)"])).toEqual([["conductivity", 0, "uS/cm"]]);
    expect(roles(["Conductivité (mS/m)"])).toEqual([["conductivity", 0, "mS/m"]]);
  });

  it("finds TDS headers: mg/L, ppm as mg/L, g/L", () => {
    expect(roles(["TDS (mg/L)"])).toEqual([["tds", 0, "mg/L"]]);
    expect(roles(["TDS ppm"])).toEqual([["tds", 0, "mg/L"]]);
    expect(roles(["Total dissolved solids (g/L)"])).toEqual([["tds", 0, "g/L"]]);
    // other languages' names for it (accents dropped before matching)
    expect(roles(["Abdampfrückstand (mg/l)"])).toEqual([["tds", 0, "mg/L"]]);
    expect(roles(["Résidu sec à 180 °C (mg/L)"])).toEqual([["tds", 0, "mg/L"]]);
    expect(roles(["Sólidos disueltos totales (mg/L)"])).toEqual([["tds", 0, "mg/L"]]);
    expect(roles(["Residuo fisso (mg/L)"])).toEqual([["tds", 0, "mg/L"]]);
    expect(roles(["ORP std (mV)"])).toEqual([]); // a standard deviation, not the Spanish "STD"
  });

  it("finds an explicit ionic strength; mol/L is read as mol/kg", () => {
    expect(roles(["Ionic strength (mol/kg)"])).toEqual([["ionicStrength", 0, "mol/kg"]]);
    expect(roles(["I (mol/L)"])).toEqual([["ionicStrength", 0, "mol/kg"]]);
    expect(roles(["I_mmol_kg"])).toEqual([["ionicStrength", 0, "mmol/kg"]]);
  });

  it("lists every kind present in the order they win: stated I, conductivity, TDS", () => {
    expect(roles(["TDS (mg/L)", "EC (uS/cm)", "Ionic strength"]).map((r) => r[0])).toEqual([
      "ionicStrength",
      "conductivity",
      "tds",
    ]);
  });

  it("never takes a text field about the measurement", () => {
    expect(roles(["EC flag", "Conductivity comment", "TDS method"])).toEqual([]);
  });

  it("leaves the other roles as they were: a conductivity header naming 25 °C is not the temperature", () => {
    const headers = [
      "Sample ID",
      "pH",
      "ORP (mV) vs SHE",
      "Conductivity (µS/cm at 25 °C)",
      "Temp (°C)",
      "Alkalinity (mg/L CaCO3)",
      "Chloride (mg/L)",
    ];
    const { mapping } = matchHeaders(headers);
    expect(mapping.temperature).toBe(4);
    expect(matchWaterColumns(headers, mapping)).toEqual({
      alkalinity: { index: 5, unit: "mg/L CaCO3" },
      chloride: { index: 6, unit: "mg/L" },
    });
    expect(matchIonicColumns(headers, Object.values(mapping))).toEqual([
      { role: "conductivity", index: 3, unit: "uS/cm" },
    ]);
    expect(matchIonicColumns(headers, [3])).toEqual([]);
  });

  it("tells number columns from text columns (decimal commas read as numbers)", () => {
    expect(isNumericColumn([412, "398", "", "0,45"])).toBe(true);
    expect(isNumericColumn(["high", "low", "412"])).toBe(false);
    expect(headerTokens("µS/cm")).toEqual(["us", "cm"]);
  });
});

describe("ionic strength from a reading", () => {
  // Russell, L.L., Chemistry of oilfield waters (1976): I ≈ 1.6·10⁻⁵ × specific conductance in µS/cm
  it("conductance: 1000 µS/cm → 0.016 mol/kg; 1 mS/cm the same; 100 mS/m the same", () => {
    expect(ionicStrengthOf(1000, "uS/cm")).toBeCloseTo(0.016, 12);
    expect(ionicStrengthOf(1, "mS/cm")).toBeCloseTo(0.016, 12);
    expect(ionicStrengthOf(100, "mS/m")).toBeCloseTo(0.016, 12);
  });
  // Langelier, W.F., The analytical control of anti-corrosion water treatment, J. AWWA 28, 1500 (1936):
  // I ≈ 2.5·10⁻⁵ × TDS in mg/L
  it("TDS: 400 mg/L → 0.010 mol/kg; 0.4 g/L the same", () => {
    expect(ionicStrengthOf(400, "mg/L")).toBeCloseTo(0.01, 12);
    expect(ionicStrengthOf(0.4, "g/L")).toBeCloseTo(0.01, 12);
  });
  it("a stated ionic strength passes through; mmol/kg scaled", () => {
    expect(ionicStrengthOf(0.02, "mol/kg")).toBe(0.02);
    expect(ionicStrengthOf(20, "mmol/kg")).toBeCloseTo(0.02, 12);
  });
});

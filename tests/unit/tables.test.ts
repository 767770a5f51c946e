// src/tables: the shared reading of sample logs — DIC and kelvin headers, the electrode a header names, decimal
// commas, the delimiter guess, and the one unit table (conversion factors from the element records' atomic
// weights: IUPAC standard atomic weights as data/elements.json carries them).
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import {
  BARE_SILVER_CHLORIDE,
  electrodeHint,
  electrodeNamed,
  guessDecimalMark,
  guessDelimiter,
  headerTokens,
  matchHeaders,
  matchIonicColumns,
  matchWaterColumns,
  molalFactor,
  alkalinityFactor,
  readNumber,
  toCelsius,
  waterColumnAt,
  withDecimalCommas,
} from "../../src/tables";

const weight = (parts: Readonly<Record<string, number>>) =>
  Object.entries(parts).reduce((sum, [symbol, n]) => sum + n * getDatabase().element(symbol)!.atomicWeight, 0);

describe("header matching", () => {
  it("finds DIC columns with their units, after alkalinity, chloride and sulfate", () => {
    const headers = ["pH", "Eh (V)", "Alk (mg/L CaCO3)", "DIC mmol/L", "Cl mg/L", "SO4 mg/L"];
    const water = matchWaterColumns(headers, matchHeaders(headers).mapping);
    expect(water.dic).toEqual({ index: 3, unit: "mmol/L" });
    expect(water.alkalinity?.index).toBe(2);
    expect(waterColumnAt("dic", ["DIC (mg/L as C)"], 0).unit).toBe("mg/L C");
    expect(waterColumnAt("dic", ["dissolved inorganic carbon"], 0).unit).toBe("mol/kg");
    expect(waterColumnAt("chloride", ["chloride mol/kg"], 0).unit).toBe("mol/kg");
    expect(waterColumnAt("chloride", ["Cl (umol/L)"], 0).unit).toBe("umol/L");
  });

  it("finds orthophosphate columns: mg/L as PO4 by default, as P when the header says so; total phosphorus is not orthophosphate", () => {
    const headers = ["pH", "ORP mV", "Total phosphorus mg/L", "Orthophosphate (mg/L)", "SO4 mg/L"];
    const water = matchWaterColumns(headers, matchHeaders(headers).mapping);
    expect(water.phosphate).toEqual({ index: 3, unit: "mg/L PO4" });
    expect(water.sulfate?.index).toBe(4);
    expect(waterColumnAt("phosphate", ["PO4-P mg/L"], 0).unit).toBe("mg/L P");
    expect(waterColumnAt("phosphate", ["ortho-P"], 0).unit).toBe("mg/L P");
    expect(waterColumnAt("phosphate", ["phosphate (mg/L as P)"], 0).unit).toBe("mg/L P");
    expect(waterColumnAt("phosphate", ["PO4 mg/L"], 0).unit).toBe("mg/L PO4");
    expect(waterColumnAt("phosphate", ["orthophosphate mmol/L"], 0).unit).toBe("mmol/L");
    expect(matchWaterColumns(["pH", "ORP", "Total P (mg/L)"]).phosphate).toBeUndefined();
  });

  it("reads German, French, Spanish and Italian lab headers, with the units their trades use", () => {
    const german = ["Probe", "pH-Wert", "Redoxpotential (mV)", "Temperatur (°C)", "Säurekapazität bis pH 4,3"];
    const de = matchHeaders([...german, "Chlorid (mg/l)", "Sulfat (mg/l)", "Orthophosphat-P (mg/l)"]);
    expect(de.mapping).toMatchObject({ id: 0, pH: 1, potential: 2, temperature: 3 });
    expect(matchHeaders(["Messstelle", "Probe", "pH", "ORP"]).mapping).toMatchObject({ site: 0, id: 1 });
    expect(matchHeaders(["Échantillon", "Point de prélèvement", "pH", "ORP"]).mapping).toMatchObject({
      id: 0,
      site: 1,
    });
    expect(matchHeaders(["Muestra", "Punto de muestreo", "pH", "ORP"]).mapping).toMatchObject({ id: 0, site: 1 });
    expect(matchHeaders(["Probe Datum", "pH", "ORP"]).mapping.id).toBe(-1); // a date, not the sample's name
    expect(de.hints).toMatchObject({ potentialUnit: "mV", temperatureScale: "C" });
    // the acid capacity to pH 4.3 is alkalinity in mmol/L (DIN 38409-7, common practice), not the pH column
    const deWater = matchWaterColumns(
      [...german, "Chlorid (mg/l)", "Sulfat (mg/l)", "Orthophosphat-P (mg/l)"],
      de.mapping,
    );
    expect(deWater).toMatchObject({
      alkalinity: { index: 4, unit: "meq/L" },
      chloride: { index: 5, unit: "mg/L" },
      sulfate: { index: 6, unit: "mg/L SO4" },
      phosphate: { index: 7, unit: "mg/L P" },
    });
    expect(matchWaterColumns(["m-Wert"]).alkalinity?.unit).toBe("meq/L");
    expect(matchWaterColumns(["TAC"]).alkalinity?.unit).toBe("degf"); // French practice: TAC in French degrees
    expect(matchWaterColumns(["TAC (mg/L CaCO3)"]).alkalinity?.unit).toBe("mg/L CaCO3");
    expect(matchWaterColumns(["KS4,3 (mg/l CaCO3)"]).alkalinity?.unit).toBe("mg/L CaCO3");
    // French: TAC in French degrees left of the temperature is alkalinity, not a °F temperature; ECS is the SCE
    const french = ["TAC (°f)", "pH", "Potentiel redox (mV/ECS)", "Température (°C)", "Chlorures (mg/L)"];
    const fr = matchHeaders(french);
    expect(fr.mapping).toMatchObject({ pH: 1, potential: 2, temperature: 3 });
    expect(fr.hints).toMatchObject({ electrode: "SCE", temperatureScale: "C" });
    expect(matchWaterColumns(french, fr.mapping)).toMatchObject({
      alkalinity: { index: 0, unit: "degf" },
      chloride: { index: 4 },
    });
    // Spanish, Italian
    expect(matchHeaders(["pH", "Potencial (mV)", "Temperatura"]).mapping).toMatchObject({
      potential: 1,
      temperature: 2,
    });
    expect(matchWaterColumns(["Alcalinidad (mg/L CaCO3)", "Cloruros (mg/L)", "Solfati (mg/L)"])).toMatchObject({
      alkalinity: { index: 0, unit: "mg/L CaCO3" },
      chloride: { index: 1 },
      sulfate: { index: 2 },
    });
  });

  it("reads Swedish, Danish, Finnish, Polish and Czech lab headers (invented header rows, in the words of each language)", () => {
    const exports: Record<string, string[]> = {
      sv: [
        "Prov",
        "Provplats",
        "pH",
        "Redoxpotential (mV)",
        "Temperatur",
        "Konduktivitet (mS/m)",
        "Alkalinitet (mmol/l)",
        "Klorid (mg/l)",
        "Sulfat (mg/l)",
      ],
      da: [
        "Prøve",
        "Prøvested",
        "pH",
        "Redoxpotential (mV Ag/AgCl mættet)",
        "Temperatur",
        "Ledningsevne (mS/m)",
        "Alkalinitet (mmol/l)",
        "Klorid (mg/l)",
        "Sulfat (mg/l)",
      ],
      fi: [
        "Näyte",
        "Näytteenottopaikka",
        "pH",
        "Redox-potentiaali (mV)",
        "Lämpötila (°C)",
        "Sähkönjohtavuus (mS/m)",
        "Alkaliniteetti (mmol/l)",
        "Kloridi (mg/l)",
        "Sulfaatti (mg/l)",
      ],
      pl: [
        "Próbka",
        "Punkt poboru",
        "pH",
        "Potencjał redoks (mV)",
        "Temperatura",
        "Przewodność (µS/cm)",
        "Zasadowość (mval/l)",
        "Chlorki (mg/l)",
        "Siarczany (mg/l)",
      ],
      cs: [
        "Vzorek",
        "Místo odběru",
        "pH",
        "Redox potenciál (mV)",
        "Teplota",
        "Vodivost (mS/m)",
        "KNK 4,5 (mmol/l)",
        "Chloridy (mg/l)",
        "Sírany (mg/l)",
      ],
    };
    for (const [language, headers] of Object.entries(exports)) {
      const { mapping, hints } = matchHeaders(headers);
      expect(mapping, language).toMatchObject({ id: 0, site: 1, pH: 2, potential: 3, temperature: 4 });
      expect(hints, language).toMatchObject({ potentialUnit: "mV", temperatureScale: "C" });
      expect(matchWaterColumns(headers, mapping), language).toMatchObject({
        alkalinity: { index: 6, unit: "meq/L" },
        chloride: { index: 7, unit: "mg/L" },
        sulfate: { index: 8, unit: "mg/L SO4" },
      });
      const conductivity = matchIonicColumns(headers, Object.values(mapping));
      expect(conductivity[0], language).toMatchObject({ role: "conductivity", index: 5 });
    }
    // "mættet": saturated KCl, named (a bare Ag/AgCl header is only offered saturated KCl in the pane)
    expect(electrodeNamed(headerTokens(exports.da[3]))).toBe("AgCl-sat");
    expect(electrodeNamed(headerTokens("E vs Ag/AgCl (KCl nasycony)"))).toBe("AgCl-sat");
    expect(matchHeaders(["pH", "Potencjał (mV)"]).mapping.potential).toBe(1); // ł spelt out
    expect(matchIonicColumns(exports.fi)[0].unit).toBe("mS/m");
    expect(matchIonicColumns(exports.pl)[0].unit).toBe("uS/cm");
    // a sample word before a date names the sampling date, not the sample
    expect(matchHeaders(["Prøve dato", "pH", "ORP"]).mapping.id).toBe(-1);
    expect(matchHeaders(["Näyte pvm", "pH", "ORP"]).mapping.id).toBe(-1);
    // phosphate and bicarbonate in those languages
    expect(matchWaterColumns(["Fosfat-P (mg/l)"]).phosphate).toEqual({ index: 0, unit: "mg/L P" });
    expect(matchWaterColumns(["Fosforany (mg/l)"]).phosphate).toEqual({ index: 0, unit: "mg/L PO4" });
    expect(matchWaterColumns(["Vätekarbonat (mg/l)"]).alkalinity).toEqual({ index: 0, unit: "mg/L HCO3" });
    expect(matchWaterColumns(["Wodorowęglany (mg/l)"]).alkalinity).toEqual({ index: 0, unit: "mg/L HCO3" });
  });

  it("a bicarbonate column gives the carbonate when no alkalinity column does (mg/L as HCO3, or mmol/L)", () => {
    expect(matchWaterColumns(["pH", "ORP", "Hydrogencarbonat (mg/l)"]).alkalinity).toEqual({
      index: 2,
      unit: "mg/L HCO3",
    });
    expect(matchWaterColumns(["HCO3 (mmol/L)"]).alkalinity).toEqual({ index: 0, unit: "mmol/L HCO3" });
    expect(matchWaterColumns(["Bicarbonate (mg/L)"]).alkalinity?.unit).toBe("mg/L HCO3");
    // "bicarbonate alkalinity as CaCO3" is alkalinity; an alkalinity column wins over a bicarbonate one
    expect(matchWaterColumns(["Bicarbonate alkalinity (mg/L as CaCO3)"]).alkalinity?.unit).toBe("mg/L CaCO3");
    expect(matchWaterColumns(["HCO3 (mg/L)", "Alkalinity (mg/L CaCO3)"]).alkalinity).toEqual({
      index: 1,
      unit: "mg/L CaCO3",
    });
    // 1 mmol/L of HCO3− is 61.016 mg/L (IUPAC atomic weights; common practice)
    expect(alkalinityFactor("mmol/L HCO3")).toBeCloseTo(61.016, 3);
  });

  it("a conductivity or dissolved-solids header naming °C in German or French is not the temperature column", () => {
    expect(matchHeaders(["pH", "ORP", "Leitfähigkeit bei 25 °C (µS/cm)", "Temp"]).mapping.temperature).toBe(3);
    expect(matchHeaders(["pH", "ORP", "Conductivité à 25 °C", "T (°C)"]).mapping.temperature).toBe(3);
    expect(matchHeaders(["pH", "ORP", "Résidu sec à 180 °C (mg/L)", "T (°C)"]).mapping.temperature).toBe(3);
  });

  it("reads the temperature scale: °F, K, else °C", () => {
    expect(matchHeaders(["pH", "ORP", "Water temp °F"]).hints.temperatureScale).toBe("F");
    expect(matchHeaders(["pH", "ORP", "T (K)"]).hints.temperatureScale).toBe("K");
    expect(matchHeaders(["pH", "ORP", "temperature_kelvin"]).hints.temperatureScale).toBe("K");
    expect(matchHeaders(["pH", "ORP", "temp_C"]).hints.temperatureScale).toBe("C");
    expect(matchHeaders(["pH", "ORP"]).hints.temperatureScale).toBeNull();
  });

  it("a bare silver chloride header names no filling; the pane's default stays saturated KCl", () => {
    expect(electrodeNamed(headerTokens("ORP (mV) vs Ag/AgCl"))).toBe(BARE_SILVER_CHLORIDE);
    expect(electrodeHint(headerTokens("ORP (mV) vs Ag/AgCl"))).toBe("AgCl-sat");
    expect(electrodeNamed(headerTokens("ORP_mV_AgCl_3M"))).toBe("AgCl-3M");
    expect(electrodeNamed(headerTokens("E vs HgO"))).toBe("HgO-1M");
  });

  it("a loop log's corrosion potential against the pressure-balanced electrode: ECP column, AgCl-EPB (not a filling)", () => {
    const match = matchHeaders(["Loop", "pH(T)", "ECP_mV_AgCl_EPB", "T_C"]);
    expect(match.mapping.potential).toBe(2);
    expect(match.hints.electrode).toBe("AgCl-EPB");
    expect(electrodeNamed(headerTokens("E (mV vs EPBRE)"))).toBe("AgCl-EPB");
    expect(electrodeNamed(headerTokens("ECP mV Ag/AgCl EPBRE 0.1M"))).toBe("AgCl-EPB");
  });
});

describe("delimiters and decimal marks", () => {
  it("guesses the delimiter from the header line, ignoring quoted ones", () => {
    expect(guessDelimiter("a;b;c")).toBe(";");
    expect(guessDelimiter('"a;b";c,d,e')).toBe(",");
    expect(guessDelimiter("a\tb\tc")).toBe("\t");
  });

  it("a decimal comma only with ';' or tab, and only when the data say so", () => {
    expect(guessDecimalMark(";", ["7,25", "201,5", "A"])).toBe(",");
    expect(guessDecimalMark(";", ["7.25", "201.5", "1,5"])).toBe(".");
    expect(guessDecimalMark(",", ["7,25"])).toBe(".");
    expect(guessDecimalMark("\t", ["15", "20"])).toBe(".");
  });

  it("a pasted European table: its decimal-comma numbers become numbers, headers and text stay", () => {
    const rows = [
      ["Probe", "pH-Wert", "KS 4,3 (mmol/l)"],
      ["A", "7,25", "2,4"],
      ["B", "8", "1,5E-1"],
    ];
    expect(withDecimalCommas(rows, ";")).toEqual([
      ["Probe", "pH-Wert", "KS 4,3 (mmol/l)"],
      ["A", 7.25, 2.4],
      ["B", "8", 0.15],
    ]);
    // a comma-delimited table has decimal points: nothing is converted
    expect(withDecimalCommas([["pH"], ["7.25"]], ",")).toEqual([["pH"], ["7.25"]]);
  });

  it("reads numbers with either mark; thousands separators are not numbers", () => {
    expect(readNumber("7,25", ",")).toBe(7.25);
    expect(readNumber("-1,5E-3", ",")).toBe(-0.0015);
    expect(readNumber("7,25", ".")).toBeNull();
    expect(readNumber("1.234,5", ",")).toBeNull();
    expect(readNumber(" 7.25 ")).toBe(7.25);
    expect(readNumber("")).toBeNull();
  });
});

describe("the unit table", () => {
  it("converts temperature scales (°F: (x − 32)·5/9; K: x − 273.15)", () => {
    expect(toCelsius(59, "F")).toBeCloseTo(15, 12);
    expect(toCelsius(288.15, "K")).toBeCloseTo(15, 12);
    expect(toCelsius(15, "C")).toBe(15);
  });

  it("gives mol/kg per unit from the atomic weights, 1 L as 1 kg", () => {
    expect(molalFactor("mg/L", { Cl: 1 }, weight)).toBeCloseTo(1e-3 / weight({ Cl: 1 }), 15);
    expect(molalFactor("ug/L", { Cl: 1 }, weight)).toBeCloseTo(1e-6 / weight({ Cl: 1 }), 18);
    expect(molalFactor("mg/L SO4", { S: 1, O: 4 }, weight)).toBeCloseTo(1e-3 / weight({ S: 1, O: 4 }), 15);
    expect(molalFactor("mg/L S", { S: 1, O: 4 }, weight)).toBeCloseTo(1e-3 / weight({ S: 1 }), 15);
    expect(molalFactor("mg/L PO4", { P: 1 }, weight)).toBeCloseTo(1e-3 / weight({ P: 1, O: 4 }), 15);
    expect(molalFactor("mg/L P", { P: 1 }, weight)).toBeCloseTo(1e-3 / weight({ P: 1 }), 15);
    expect(molalFactor("mmol/L", { Cl: 1 }, weight)).toBe(1e-3);
    expect(molalFactor("mol/kg", { Cl: 1 }, weight)).toBe(1);
    // 1 meq/L of alkalinity is 50.04 mg/L as CaCO3 (CaCO3 100.087 g/mol, 2 eq/mol — common practice)
    expect(alkalinityFactor("meq/L")).toBeCloseTo(50.0435, 4);
    // one French degree is 10 mg/L as CaCO3 (common practice)
    expect(alkalinityFactor("degf")).toBe(10);
    expect(() => molalFactor("meq/L", {}, weight)).toThrow();
  });
});

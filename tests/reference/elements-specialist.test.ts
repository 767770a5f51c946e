/**
 * Reference checks for the vanadium, tungsten, bismuth, gold and platinum records (data/species/v.json, w.json,
 * bi.json, au.json, pt.json and their sulfides and chloro-complexes in the ligand files):
 *   1. standard potentials against Bard, Parsons & Jordan (1985) and the CRC electrochemical series, within 10 mV,
 *      and where compilations disagree, which one the data follow;
 *   2. boundary equations at 25 °C and activity 1e-6 against Pourbaix's Atlas (1974);
 *   3. the dominant species at a few points the trade knows.
 *
 * No copy of these publications was at hand: every check value is recalled from memory and says so. Gold's ions
 * and platinum's ions, oxides and chloro-complexes were themselves derived from CRC/Atlas potentials (their
 * records say so): those checks are labelled as arithmetic round trips, and platinum has no independent check.
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { ligandCells } from "../../src/chemistry/ligand-cells";
import { buildSystem, dominantSpecies } from "../../src/chemistry/system";
import {
  BARD,
  BM,
  checkConstants,
  checkDisagreements,
  checkPotentials,
  ConstantCase,
  CRC,
  Disagreement,
  NBS,
  PotentialCase,
} from "./compilation-checks";
import {
  ATLAS,
  checkDiagramDisagreements,
  checkDiagramLines,
  DiagramDisagreement,
  DiagramLine,
} from "./element-checks";

const db = getDatabase();

const potentials: PotentialCase[] = [
  { couple: "V3+ + e- = V2+", pair: ["V3+", "V2+"], value: -0.255, source: `${CRC}; ${BARD}` },
  { couple: "VO 2+ + 2H+ + e- = V3+ + H2O", pair: ["VO^2+", "V3+"], value: 0.337, source: CRC },
  { couple: "VO2+ + 2H+ + e- = VO 2+ + H2O", pair: ["VO2+", "VO^2+"], value: 1.0, source: `${BARD} (CRC 0.991 V)` },
  { couple: "WO3 + 2H+ + 2e- = WO2 + H2O", pair: ["WO3(s)", "WO2(s)"], value: 0.036, source: CRC },
  { couple: "WO3 + 6H+ + 6e- = W + 3H2O", pair: ["WO3(s)", "W(s)"], value: -0.09, source: CRC },
  {
    couple: "Bi2O3 + 3H2O + 6e- = 2Bi + 6OH-",
    reaction: { "Bi2O3(s)": -1, "H2O(l)": -3, "e-": -6, "Bi(s)": 2, "OH-": 6 },
    value: -0.46,
    source: CRC,
  },
  {
    couple: "AuCl4- + 3e- = Au + 4Cl-",
    reaction: { "AuCl4-": -1, "e-": -3, "Au(s)": 1, "Cl-": 4 },
    value: 1.002,
    source: CRC,
  },
  // round trips: the records were derived from these values
  { couple: "Au3+ + 3e- = Au", pair: ["Au3+", "Au(s)"], value: 1.498, source: CRC, derived: true },
  { couple: "Au+ + e- = Au", pair: ["Au+", "Au(s)"], value: 1.692, source: CRC, derived: true },
  {
    couple: "AuCl2- + e- = Au + 2Cl-",
    reaction: { "AuCl2-": -1, "e-": -1, "Au(s)": 1, "Cl-": 2 },
    value: 1.154,
    source: CRC,
    derived: true,
  },
  { couple: "Pt2+ + 2e- = Pt", pair: ["Pt2+", "Pt(s)"], value: 1.18, source: CRC, derived: true },
  {
    couple: "PtCl4 2- + 2e- = Pt + 4Cl-",
    reaction: { "PtCl42-": -1, "e-": -2, "Pt(s)": 1, "Cl-": 4 },
    value: 0.755,
    source: CRC,
    derived: true,
  },
  {
    couple: "PtCl6 2- + 2e- = PtCl4 2- + 2Cl-",
    reaction: { "PtCl62-": -1, "e-": -2, "PtCl42-": 1, "Cl-": 2 },
    value: 0.68,
    source: CRC,
    derived: true,
  },
];

checkPotentials("specialist elements: standard potentials (25 °C) within 10 mV of the tabulated values", potentials);

const disagreements: Disagreement[] = [
  {
    couple: "V2+ + 2e- = V",
    pair: ["V2+", "V(s)"],
    value: -1.175,
    source: `${CRC}; ${ATLAS}`,
    follows: -1.1297,
    followsSource: `${NBS}, V2+ −218 kJ/mol`,
  },
  {
    couple: "WO2 + 4H+ + 4e- = W + 2H2O",
    pair: ["WO2(s)", "W(s)"],
    value: -0.119,
    source: `${CRC} (not consistent with its own WO3/WO2 and WO3/W values, which imply −0.153 V)`,
    follows: -0.1545,
    followsSource: `${NBS}, WO2 −533.92 kJ/mol`,
  },
  {
    couple: "Bi3+ + 3e- = Bi",
    pair: ["Bi3+", "Bi(s)"],
    value: 0.308,
    source: `${CRC} (Bard, Parsons & Jordan 0.317 V)`,
    follows: 0.286,
    followsSource: `${NBS}, Bi3+ 82.8 kJ/mol`,
  },
];

checkDisagreements("specialist elements: documented disagreements between compilations", disagreements);

const constants: ConstantCase[] = [
  {
    label: "V3+ + H2O = VOH2+ + H+",
    reaction: { "V3+": -1, "H2O(l)": -1, "VOH2+": 1, "H+": 1 },
    logK: -2.26,
    source: BM,
    independent: false,
  },
  {
    label: "VO 2+ + H2O = VO(OH)+ + H+",
    reaction: { "VO^2+": -1, "H2O(l)": -1, "VO(OH)+": 1, "H+": 1 },
    logK: -5.67,
    source: BM,
    independent: false,
  },
  {
    label: "Bi3+ + H2O = BiOH2+ + H+",
    reaction: { "Bi3+": -1, "H2O(l)": -1, "BiOH2+": 1, "H+": 1 },
    logK: -1.09,
    source: BM,
    independent: false,
  },
];

// Only round trips: no independent hydrolysis constant of these elements was recalled with confidence.
checkConstants("specialist elements: hydrolysis constants (derivation round trips)", constants, ["V", "Bi"], true);

const lines: DiagramLine[] = [
  {
    element: "V",
    pair: ["V3+", "V2+"],
    equation: "E = −0.255 + 0.0591 log(V3+/V2+)",
    kind: "line",
    e0: -0.255,
    hPerN: 0,
    logCoef: 0,
    source: ATLAS,
  },
  {
    element: "V",
    pair: ["VO^2+", "V3+"],
    equation: "E = 0.337 − 0.1182 pH + 0.0591 log(VO 2+/V3+)",
    kind: "line",
    e0: 0.337,
    hPerN: 2,
    logCoef: 0,
    source: ATLAS,
  },
  {
    element: "V",
    pair: ["VO2+", "VO^2+"],
    equation: "E = 1.000 − 0.1182 pH + 0.0591 log(VO2+/VO 2+)",
    kind: "line",
    e0: 1.0,
    hPerN: 2,
    logCoef: 0,
    source: ATLAS,
  },
  {
    element: "Bi",
    pair: ["Bi2O3(s)", "Bi(s)"],
    equation: "E = 0.371 − 0.0591 pH",
    kind: "line",
    e0: 0.371,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  {
    element: "Au",
    pair: ["Au(OH)3(s)", "Au(s)"],
    equation: "E = 1.457 − 0.0591 pH",
    kind: "line",
    e0: 1.457,
    hPerN: 1,
    logCoef: 0,
    source: `${ATLAS}; the record uses the CRC's 1.45 V, after the same Latimer data`,
    derived: false,
  },
  {
    element: "Pt",
    pair: ["Pt(OH)2(s)", "Pt(s)"],
    equation: "E = 0.980 − 0.0591 pH",
    kind: "line",
    e0: 0.98,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
    derived: true,
  },
  {
    element: "Pt",
    pair: ["PtO2(s)", "Pt(OH)2(s)"],
    equation: "E = 1.045 − 0.0591 pH",
    kind: "line",
    e0: 1.045,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
    derived: true,
  },
];

checkDiagramLines("specialist elements: boundary equations at 25 °C, activity 1e-6, against Pourbaix's Atlas", lines);

const lineDisagreements: DiagramDisagreement[] = [
  {
    element: "W",
    pair: ["WO2(s)", "W(s)"],
    equation: "E = −0.119 − 0.0591 pH",
    kind: "line",
    e0: -0.119,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
    follows: -0.1545,
    reason: "NBS 1982 WO2; the Atlas value matches the CRC's, which is inconsistent with its WO3 couples",
  },
  {
    element: "V",
    pair: ["V2+", "V(s)"],
    equation: "E = −1.175 + 0.0295 log(V2+)",
    kind: "line",
    e0: -1.175,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
    follows: -1.3072,
    reason: "NBS 1982 V2+ −218 kJ/mol gives E° −1.130 V",
  },
];

checkDiagramDisagreements(
  "specialist elements: Atlas lines the data do not reproduce, with the reason",
  lineDisagreements,
);

describe("specialist elements: dominant species at 25 °C, activity 1e-6", () => {
  const at = (element: string, pH: number, E: number, totals = {}) => {
    const system = buildSystem(db, element, { celsius: 25, activity: 1e-6 }, ligandCells(db, totals, 25));
    return system.species[dominantSpecies(system, pH, E)];
  };
  it("gold is immune across the water window at pH 7 in pure water (common practice)", () => {
    for (const E of [-0.8, 0, 0.8]) expect(at("Au", 7, E).regime).toBe("immunity");
  });
  it("gold dissolves as AuCl4- in oxidising brine (0.5 mol/kg chloride, pH 1, 1.1 V: the principle of chlorine leaching, common practice)", () => {
    expect(at("Au", 1, 1.1, { chloride: 0.5 }).formula).toBe("AuCl4-");
  });
  it("platinum is immune below its oxide line (0.98 − 0.059 pH V, Atlas) and covered above it", () => {
    expect(at("Pt", 7, 0.5).regime).toBe("immunity");
    expect(at("Pt", 7, 0.9).regime).toBe("passivation");
  });
  it("vanadate in oxic neutral water, vanadyl in mildly reducing acid water (Wehrli & Stumm 1989, Geochim. Cosmochim. Acta 53, 69, from memory)", () => {
    expect(at("V", 7, 0.6).formula).toBe("H2VO4-");
    expect(at("V", 3, 0.3).formula).toBe("VO^2+");
  });
  it("tungstate WO4 2- in neutral and alkaline oxic water (common practice)", () => {
    expect(at("W", 8, 0.4).formula).toBe("WO42-");
  });
  it("bismuthinite in sulfidic water, bismuth oxychloride in oxic chloride water (Brookins 1988, from memory)", () => {
    expect(at("Bi", 4, -0.1, { sulfur: 1e-3 }).formula).toBe("Bi2S3(s)");
    expect(at("Bi", 2, 0.6, { chloride: 1e-2 }).formula).toBe("BiOCl(s)");
  });
});

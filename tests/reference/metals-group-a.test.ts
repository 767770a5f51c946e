/**
 * Reference checks for the iron, copper, zinc, lead, nickel, chromium, aluminium and manganese records
 * (data/species/fe.json … mn.json):
 *   1. standard potentials against Bard, Parsons & Jordan (1985) and the CRC electrochemical series, within 10 mV,
 *      and, where compilations disagree, which one the data follow;
 *   2. hydrolysis and solubility constants against Baes & Mesmer (1976), within 0.5 log units;
 *   3. boundary equations at 25 °C and activity 1e-6 against Pourbaix's Atlas (1974): intercept within 30 mV (or,
 *      for a vertical line, pH within 0.5/h, i.e. 0.5 log units of the constant), slope exactly −(h/n)·k.
 *      Where the Atlas used other data, the size of the difference is checked against the data difference that
 *      explains it.
 *
 * No copy of these publications was at hand: every check value is recalled from memory and says so.
 * Alkaline couples are written with OH−, so they also depend on the water records (Kw).
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { reactionLogK } from "../../src/chemistry/reaction";
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
import { buildSystem, dominantSpecies, pairBoundary } from "../../src/chemistry/system";
import { FARADAY, GAS_CONSTANT, LN10, T0, nernstFactor } from "../../src/chemistry/constants";

const db = getDatabase();
const METALS = ["Fe", "Cu", "Zn", "Pb", "Ni", "Cr", "Al", "Mn"] as const;

const ATLAS = "Pourbaix 1974, Atlas of Electrochemical Equilibria in Aqueous Solutions (from memory)";

/** Nernst factor at 25 °C, V per decade. */
const K25 = nernstFactor(T0);

const potentials: PotentialCase[] = [
  // iron
  { couple: "Fe3+ + e- = Fe2+", pair: ["Fe3+", "Fe2+"], value: 0.771, source: `${CRC}; ${BARD}` },
  // copper
  { couple: "Cu2+ + 2e- = Cu", pair: ["Cu2+", "Cu(s)"], value: 0.3419, source: CRC },
  { couple: "Cu2+ + 2e- = Cu", pair: ["Cu2+", "Cu(s)"], value: 0.34, source: BARD },
  { couple: "Cu+ + e- = Cu", pair: ["Cu+", "Cu(s)"], value: 0.521, source: CRC },
  { couple: "Cu2+ + e- = Cu+", pair: ["Cu2+", "Cu+"], value: 0.153, source: CRC },
  {
    couple: "Cu2O + H2O + 2e- = 2Cu + 2OH-",
    reaction: { "Cu2O(s)": -1, "H2O(l)": -1, "e-": -2, "Cu(s)": 2, "OH-": 2 },
    value: -0.36,
    source: CRC,
  },
  // zinc
  { couple: "Zn2+ + 2e- = Zn", pair: ["Zn2+", "Zn(s)"], value: -0.7618, source: CRC },
  // lead
  { couple: "Pb2+ + 2e- = Pb", pair: ["Pb2+", "Pb(s)"], value: -0.1262, source: CRC },
  { couple: "PbO2 + 4H+ + 2e- = Pb2+ + 2H2O", pair: ["PbO2(s)", "Pb2+"], value: 1.455, source: `${CRC}; ${BARD}` },
  {
    couple: "PbO + H2O + 2e- = Pb + 2OH-",
    reaction: { "PbO(s)": -1, "H2O(l)": -1, "e-": -2, "Pb(s)": 1, "OH-": 2 },
    value: -0.58,
    source: CRC,
  },
  {
    couple: "PbO2 + H2O + 2e- = PbO + 2OH-",
    reaction: { "PbO2(s)": -1, "H2O(l)": -1, "e-": -2, "PbO(s)": 1, "OH-": 2 },
    value: 0.247,
    source: CRC,
  },
  {
    couple: "HPbO2- + H2O + 2e- = Pb + 3OH-",
    reaction: { "HPbO2-": -1, "H2O(l)": -1, "e-": -2, "Pb(s)": 1, "OH-": 3 },
    value: -0.537,
    source: CRC,
  },
  // chromium (Cr2+ and Cr3+ were derived from the first two potentials; Cr3+/Cr2+ and dichromate are then
  // independent checks)
  { couple: "Cr2+ + 2e- = Cr", pair: ["Cr2+", "Cr(s)"], value: -0.913, source: `${BARD}; ${CRC}`, derived: true },
  { couple: "Cr3+ + 3e- = Cr", pair: ["Cr3+", "Cr(s)"], value: -0.744, source: `${BARD}; ${CRC}`, derived: true },
  { couple: "Cr3+ + e- = Cr2+", pair: ["Cr3+", "Cr2+"], value: -0.407, source: `${CRC}; ${BARD}` },
  { couple: "Cr2O7 2- + 14H+ + 6e- = 2Cr3+ + 7H2O", pair: ["Cr2O72-", "Cr3+"], value: 1.36, source: BARD },
  // aluminium
  { couple: "Al3+ + 3e- = Al", pair: ["Al3+", "Al(s)"], value: -1.676, source: BARD },
  {
    couple: "Al(OH)4- + 3e- = Al + 4OH- (tabulated as H2AlO3- + H2O + 3e-)",
    reaction: { "Al(OH)4-": -1, "e-": -3, "Al(s)": 1, "OH-": 4 },
    value: -2.33,
    source: CRC,
  },
  // manganese
  { couple: "Mn2+ + 2e- = Mn", pair: ["Mn2+", "Mn(s)"], value: -1.185, source: CRC },
  { couple: "MnO2 + 4H+ + 2e- = Mn2+ + 2H2O", pair: ["MnO2(s)", "Mn2+"], value: 1.224, source: CRC },
  { couple: "MnO4- + 8H+ + 5e- = Mn2+ + 4H2O", pair: ["MnO4-", "Mn2+"], value: 1.507, source: CRC },
  { couple: "MnO4- + 4H+ + 3e- = MnO2 + 2H2O", pair: ["MnO4-", "MnO2(s)"], value: 1.7, source: BARD },
  { couple: "MnO4- + e- = MnO4 2-", pair: ["MnO4-", "MnO42-"], value: 0.558, source: CRC },
  {
    couple: "MnO4- + 2H2O + 3e- = MnO2 + 4OH-",
    reaction: { "MnO4-": -1, "H2O(l)": -2, "e-": -3, "MnO2(s)": 1, "OH-": 4 },
    value: 0.595,
    source: CRC,
  },
  {
    couple: "MnO2 + 2H2O + 2e- = Mn(OH)2 + 2OH-",
    reaction: { "MnO2(s)": -1, "H2O(l)": -2, "e-": -2, "Mn(OH)2(s)": 1, "OH-": 2 },
    value: -0.05,
    source: CRC,
  },
  {
    couple: "2MnO2 + H2O + 2e- = Mn2O3 + 2OH-",
    reaction: { "MnO2(s)": -2, "H2O(l)": -1, "e-": -2, "Mn2O3(s)": 1, "OH-": 2 },
    value: 0.15,
    source: CRC,
  },
  {
    couple: "Mn(OH)2 + 2e- = Mn + 2OH-",
    reaction: { "Mn(OH)2(s)": -1, "e-": -2, "Mn(s)": 1, "OH-": 2 },
    value: -1.56,
    source: CRC,
  },
];

checkPotentials("group A metals: standard potentials (25 °C) within 10 mV of the tabulated values", potentials);

/**
 * Couples where the data follow one compilation and another differs by more than 10 mV. Each case states the value
 * the data follow and checks that the other source really is more than 10 mV away, so a data change that silently
 * switches compilation fails here.
 */
const disagreements: Disagreement[] = [
  {
    couple: "Fe2+ + 2e- = Fe",
    pair: ["Fe2+", "Fe(s)"],
    value: -0.447,
    source: `${CRC} (Bard, Parsons & Jordan −0.44 V, Pourbaix's Atlas −0.440 V)`,
    follows: -0.409,
    followsSource: `${NBS}, ΔG°f(Fe2+) = −78.90 kJ/mol`,
  },
  {
    couple: "Fe3+ + 3e- = Fe",
    pair: ["Fe3+", "Fe(s)"],
    value: -0.037,
    source: CRC,
    follows: -0.016,
    followsSource: `${NBS}, ΔG°f(Fe3+) = −4.7 kJ/mol`,
  },
  {
    couple: "Fe(OH)2 + 2e- = Fe + 2OH-",
    reaction: { "Fe(OH)2(s)": -1, "e-": -2, "Fe(s)": 1, "OH-": 2 },
    value: -0.877,
    source: CRC,
    follows: -0.891,
    followsSource: `${NBS}, ΔG°f(Fe(OH)2) = −486.5 kJ/mol`,
  },
  {
    couple: "Fe(OH)3 + e- = Fe(OH)2 + OH-",
    reaction: { "Fe(OH)3(s)": -1, "e-": -1, "Fe(OH)2(s)": 1, "OH-": 1 },
    value: -0.56,
    source: CRC,
    follows: -0.547,
    followsSource: `${NBS}, ΔG°f(Fe(OH)3) = −696.5 kJ/mol`,
  },
  {
    couple: "ZnO + H2O + 2e- = Zn + 2OH-",
    reaction: { "ZnO(s)": -1, "H2O(l)": -1, "e-": -2, "Zn(s)": 1, "OH-": 2 },
    value: -1.26,
    source: CRC,
    follows: -1.249,
    followsSource: `${NBS}, ΔG°f(ZnO) = −318.30 kJ/mol`,
  },
  {
    couple: "Ni2+ + 2e- = Ni",
    pair: ["Ni2+", "Ni(s)"],
    value: -0.257,
    source: `${CRC} (Pourbaix's Atlas −0.250 V)`,
    follows: -0.236,
    followsSource: `${NBS}, ΔG°f(Ni2+) = −45.6 kJ/mol`,
  },
  {
    couple: "Ni(OH)2 + 2e- = Ni + 2OH-",
    reaction: { "Ni(OH)2(s)": -1, "e-": -2, "Ni(s)": 1, "OH-": 2 },
    value: -0.72,
    source: CRC,
    follows: -0.688,
    followsSource: `${NBS}, ΔG°f(Ni(OH)2) = −447.2 kJ/mol`,
  },
  {
    couple: "HCrO4- + 7H+ + 3e- = Cr3+ + 4H2O",
    pair: ["HCrO4-", "Cr3+"],
    value: 1.35,
    source: `${CRC} (not consistent with 1.36 V for dichromate and log K = 1.5 for its formation)`,
    follows: 1.379,
    followsSource: `${NBS} for HCrO4-, Cr3+ from ${BARD}`,
  },
  {
    couple: "Al3+ + 3e- = Al",
    pair: ["Al3+", "Al(s)"],
    value: -1.662,
    source: CRC,
    follows: -1.676,
    followsSource: `${NBS}, ΔG°f(Al3+) = −485.0 kJ/mol, as ${BARD}`,
  },
  {
    couple: "MnO4- + 4H+ + 3e- = MnO2 + 2H2O",
    pair: ["MnO4-", "MnO2(s)"],
    value: 1.679,
    source: CRC,
    follows: 1.7,
    followsSource: `${NBS}, as ${BARD}`,
  },
];

checkDisagreements("group A metals: documented disagreements between compilations", disagreements);

const constants: ConstantCase[] = [
  // independent: NBS records against Baes & Mesmer
  {
    label: "Fe3+ + H2O = FeOH2+ + H+, log*β11",
    reaction: { "Fe3+": -1, "H2O(l)": -1, "FeOH2+": 1, "H+": 1 },
    logK: -2.19,
    source: `${BM}, iron(III)`,
    independent: true,
  },
  {
    label: "2Fe3+ + 2H2O = Fe2(OH)2 4+ + 2H+, log*β22",
    reaction: { "Fe3+": -2, "H2O(l)": -2, "Fe2(OH)24+": 1, "H+": 2 },
    logK: -2.95,
    source: `${BM}, iron(III)`,
    independent: true,
  },
  {
    label: "Fe2+ + 3H2O = Fe(OH)3- + 3H+, log*β13 (as HFeO2- + H2O)",
    reaction: { "Fe2+": -1, "H2O(l)": -2, "HFeO2-": 1, "H+": 3 },
    logK: -31.0,
    source: `${BM}, iron(II)`,
    independent: true,
  },
  {
    label: "Cu2+ + 4H2O = Cu(OH)4 2- + 4H+, log*β14 (as CuO2 2- + 2H2O)",
    reaction: { "Cu2+": -1, "H2O(l)": -2, "CuO22-": 1, "H+": 4 },
    logK: -39.6,
    source: `${BM}, copper(II)`,
    independent: true,
  },
  {
    label: "ZnO (zincite) + 2H+ = Zn2+ + H2O, log*Ks10",
    reaction: { "ZnO(s)": -1, "H+": -2, "Zn2+": 1, "H2O(l)": 1 },
    logK: 11.14,
    source: `${BM}, zinc`,
    independent: true,
  },
  {
    label: "PbO (litharge) + 2H+ = Pb2+ + H2O, log*Ks10",
    reaction: { "PbO(s)": -1, "H+": -2, "Pb2+": 1, "H2O(l)": 1 },
    logK: 12.7,
    source: `${BM}, lead(II)`,
    independent: true,
  },
  {
    label: "Pb2+ + 3H2O = Pb(OH)3- + 3H+, log*β13 (as HPbO2- + H2O)",
    reaction: { "Pb2+": -1, "H2O(l)": -2, "HPbO2-": 1, "H+": 3 },
    logK: -28.06,
    source: `${BM}, lead(II)`,
    independent: true,
  },
  {
    label: "Ni2+ + H2O = NiOH+ + H+, log*β11",
    reaction: { "Ni2+": -1, "H2O(l)": -1, "NiOH+": 1, "H+": 1 },
    logK: -9.86,
    source: `${BM}, nickel(II)`,
    independent: true,
  },
  {
    label: "HCrO4- = CrO4 2- + H+, log K",
    reaction: { "HCrO4-": -1, "CrO42-": 1, "H+": 1 },
    logK: -6.51,
    source: `${BM}, chromium(VI) (value recalled with low confidence as to the table; the commonly cited pKa)`,
    independent: true,
  },
  {
    label: "2HCrO4- = Cr2O7 2- + H2O, log K",
    reaction: { "HCrO4-": -2, "Cr2O72-": 1, "H2O(l)": 1 },
    logK: 1.52,
    source: `${BM}, chromium(VI) (value recalled with low confidence as to the table)`,
    independent: true,
  },
  {
    label: "Al3+ + H2O = AlOH2+ + H+, log*β11",
    reaction: { "Al3+": -1, "H2O(l)": -1, "AlOH2+": 1, "H+": 1 },
    logK: -4.97,
    source: `${BM}, aluminium`,
    independent: true,
  },
  {
    label: "Mn2+ + H2O = MnOH+ + H+, log*β11",
    reaction: { "Mn2+": -1, "H2O(l)": -1, "MnOH+": 1, "H+": 1 },
    logK: -10.59,
    source: `${BM}, manganese(II)`,
    independent: true,
  },
  {
    label: "Mn2+ + 3H2O = Mn(OH)3- + 3H+, log*β13 (as HMnO2- + H2O)",
    reaction: { "Mn2+": -1, "H2O(l)": -2, "HMnO2-": 1, "H+": 3 },
    logK: -34.8,
    source: `${BM}, manganese(II)`,
    independent: true,
  },
  {
    label: "Mn(OH)2 + 2H+ = Mn2+ + 2H2O, log*Ks10",
    reaction: { "Mn(OH)2(s)": -1, "H+": -2, "Mn2+": 1, "H2O(l)": 2 },
    logK: 15.2,
    source: `${BM}, manganese(II)`,
    independent: true,
  },
  // derivation round trips (species built from these very constants)
  {
    label: "Fe2+ + H2O = FeOH+ + H+",
    reaction: { "Fe2+": -1, "H2O(l)": -1, "FeOH+": 1, "H+": 1 },
    logK: -9.5,
    source: BM,
    independent: false,
  },
  {
    label: "Fe3+ + 2H2O = Fe(OH)2+ + 2H+",
    reaction: { "Fe3+": -1, "H2O(l)": -2, "Fe(OH)2+": 1, "H+": 2 },
    logK: -5.67,
    source: BM,
    independent: false,
  },
  {
    label: "Fe3+ + 4H2O = Fe(OH)4- + 4H+",
    reaction: { "Fe3+": -1, "H2O(l)": -4, "Fe(OH)4-": 1, "H+": 4 },
    logK: -21.6,
    source: BM,
    independent: false,
  },
  {
    label: "Cu2+ + H2O = CuOH+ + H+",
    reaction: { "Cu2+": -1, "H2O(l)": -1, "CuOH+": 1, "H+": 1 },
    logK: -8.0,
    source: BM,
    independent: false,
  },
  {
    label: "2Cu2+ + 2H2O = Cu2(OH)2 2+ + 2H+",
    reaction: { "Cu2+": -2, "H2O(l)": -2, "Cu2(OH)22+": 1, "H+": 2 },
    logK: -10.36,
    source: BM,
    independent: false,
  },
  {
    label: "Zn2+ + H2O = ZnOH+ + H+",
    reaction: { "Zn2+": -1, "H2O(l)": -1, "ZnOH+": 1, "H+": 1 },
    logK: -8.96,
    source: BM,
    independent: false,
  },
  {
    label: "Zn2+ + 3H2O = Zn(OH)3- + 3H+",
    reaction: { "Zn2+": -1, "H2O(l)": -3, "Zn(OH)3-": 1, "H+": 3 },
    logK: -28.4,
    source: BM,
    independent: false,
  },
  {
    label: "Zn2+ + 4H2O = Zn(OH)4 2- + 4H+",
    reaction: { "Zn2+": -1, "H2O(l)": -4, "Zn(OH)42-": 1, "H+": 4 },
    logK: -41.2,
    source: BM,
    independent: false,
  },
  {
    label: "Pb2+ + H2O = PbOH+ + H+",
    reaction: { "Pb2+": -1, "H2O(l)": -1, "PbOH+": 1, "H+": 1 },
    logK: -7.71,
    source: BM,
    independent: false,
  },
  {
    label: "Pb2+ + 2H2O = Pb(OH)2(aq) + 2H+",
    reaction: { "Pb2+": -1, "H2O(l)": -2, "Pb(OH)2(aq)": 1, "H+": 2 },
    logK: -17.12,
    source: BM,
    independent: false,
  },
  {
    label: "4Ni2+ + 4H2O = Ni4(OH)4 4+ + 4H+",
    reaction: { "Ni2+": -4, "H2O(l)": -4, "Ni4(OH)44+": 1, "H+": 4 },
    logK: -27.74,
    source: BM,
    independent: false,
  },
  {
    label: "Cr3+ + H2O = CrOH2+ + H+",
    reaction: { "Cr3+": -1, "H2O(l)": -1, "CrOH2+": 1, "H+": 1 },
    logK: -4.0,
    source: BM,
    independent: false,
  },
  {
    label: "Cr3+ + 2H2O = Cr(OH)2+ + 2H+",
    reaction: { "Cr3+": -1, "H2O(l)": -2, "Cr(OH)2+": 1, "H+": 2 },
    logK: -9.7,
    source: BM,
    independent: false,
  },
  {
    label: "Cr3+ + 4H2O = Cr(OH)4- + 4H+",
    reaction: { "Cr3+": -1, "H2O(l)": -4, "Cr(OH)4-": 1, "H+": 4 },
    logK: -27.4,
    source: BM,
    independent: false,
  },
  {
    label: "Al3+ + 2H2O = Al(OH)2+ + 2H+",
    reaction: { "Al3+": -1, "H2O(l)": -2, "Al(OH)2+": 1, "H+": 2 },
    logK: -9.3,
    source: BM,
    independent: false,
  },
  {
    label: "NiO(s) + H2O = HNiO2- + H+ (Ni(OH)2 + H2O = Ni(OH)3- + H+ in base: log*Ks10 10.8 + log*β13 −29.0)",
    reaction: { "NiO(s)": -1, "H2O(l)": -1, "HNiO2-": 1, "H+": 1 },
    logK: -18.2,
    source: BM,
    independent: false,
  },
];

checkConstants(
  "group A metals: hydrolysis and solubility constants within 0.5 log units of Baes & Mesmer",
  constants,
  METALS,
);

/**
 * Constants where the data (NBS 1982 or Robie & Hemingway 1995) and Baes & Mesmer differ by more than 0.5 log
 * units. The data are not adjusted; the difference is pinned so that it cannot change unnoticed.
 */
const constantDisagreements: (ConstantCase & { follows: number; followsSource: string })[] = [
  {
    label: "Cu2+ + 3H2O = Cu(OH)3- + 3H+, log*β13 (as HCuO2- + H2O)",
    reaction: { "Cu2+": -1, "H2O(l)": -2, "HCuO2-": 1, "H+": 3 },
    logK: -26.9,
    source: BM,
    independent: true,
    follows: -26.33,
    followsSource: `${NBS}, ΔG°f(HCuO2-) = −258.5 kJ/mol`,
  },
  {
    label: "Ni(OH)2 + 2H+ = Ni2+ + 2H2O, log*Ks10",
    reaction: { "Ni(OH)2(s)": -1, "H+": -2, "Ni2+": 1, "H2O(l)": 2 },
    logK: 10.8,
    source: BM,
    independent: true,
    follows: 12.73,
    followsSource: `${NBS}, ΔG°f(Ni(OH)2) = −447.2 kJ/mol`,
  },
  {
    label: "Ni2+ + 3H2O = Ni(OH)3- + 3H+, log*β13 (as HNiO2- + H2O)",
    reaction: { "Ni2+": -1, "H2O(l)": -2, "HNiO2-": 1, "H+": 3 },
    logK: -29.0,
    source: BM,
    independent: true,
    follows: -30.64,
    followsSource:
      "HNiO2- anchored on NBS NiO through Baes & Mesmer's solubility in base (log K −18.2), NBS NiO being 1.6 log units more soluble than their Ni(OH)2",
  },
  {
    label: "Al3+ + 4H2O = Al(OH)4- + 4H+, log*β14",
    reaction: { "Al3+": -1, "H2O(l)": -4, "Al(OH)4-": 1, "H+": 4 },
    logK: -23.0,
    source: BM,
    independent: true,
    follows: -22.46,
    followsSource: `${NBS}, ΔG°f(Al(OH)4-) = −1305.3 kJ/mol`,
  },
  {
    label: "Al(OH)3 (gibbsite) + 3H+ = Al3+ + 3H2O, log*Ks10",
    reaction: { "Al(OH)3(s)": -1, "H+": -3, "Al3+": 1, "H2O(l)": 3 },
    logK: 8.2,
    source: BM,
    independent: true,
    follows: 7.27,
    followsSource: `Robie & Hemingway 1995 gibbsite with ${NBS} Al3+`,
  },
];

describe("group A metals: documented disagreements with Baes & Mesmer", () => {
  for (const c of constantDisagreements) {
    it(`${c.label}: data give ${c.follows} (${c.followsSource}); ${c.source} gives ${c.logK}`, () => {
      const logK = reactionLogK(db, c.reaction, 25);
      expect(Math.abs(logK - c.follows)).toBeLessThanOrEqual(0.02);
      expect(Math.abs(logK - c.logK)).toBeGreaterThan(0.5);
    });
  }
});

/**
 * A boundary line of the Atlas written as  E = e0 − (h/n)·k·pH + logCoef·log10(a)  for dissolved species at the
 * common activity a, or as a vertical line  pH = pH0 + logCoefPH·log10(a).
 */
interface AtlasLine {
  metal: (typeof METALS)[number];
  pair: [string, string];
  equation: string;
  source: string;
  kind: "line" | "vertical";
  e0?: number;
  /** Protons per electron, h/n, of the reaction ox + h H+ + n e- → red. */
  hPerN?: number;
  logCoef?: number;
  pH0?: number;
  logCoefPH?: number;
  /** Protons exchanged in an acid–base (vertical) boundary, for its tolerance 0.5/h. */
  h?: number;
}

const ACTIVITY = 1e-6;
const LOG_A = Math.log10(ACTIVITY);

const atlasLines: AtlasLine[] = [
  // iron (Atlas chapter on iron, anhydrous oxides)
  {
    metal: "Fe",
    pair: ["Fe3+", "Fe2+"],
    equation: "E = 0.771 + 0.0591 log(Fe3+/Fe2+)",
    kind: "line",
    e0: 0.771,
    hPerN: 0,
    logCoef: 0,
    source: ATLAS,
  },
  {
    metal: "Fe",
    pair: ["Fe2O3(s)", "Fe3O4(s)"],
    equation: "E = 0.221 − 0.0591 pH",
    kind: "line",
    e0: 0.221,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  {
    metal: "Fe",
    pair: ["Fe3O4(s)", "Fe(s)"],
    equation: "E = −0.085 − 0.0591 pH",
    kind: "line",
    e0: -0.085,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  {
    metal: "Fe",
    pair: ["HFeO2-", "Fe(s)"],
    equation: "E = 0.493 − 0.0886 pH + 0.0295 log(HFeO2-)",
    kind: "line",
    e0: 0.493,
    hPerN: 1.5,
    logCoef: 0.0295,
    source: ATLAS,
  },
  {
    metal: "Fe",
    pair: ["Fe3O4(s)", "HFeO2-"],
    equation: "E = −1.819 + 0.0295 pH − 0.0886 log(HFeO2-)",
    kind: "line",
    e0: -1.819,
    hPerN: -0.5,
    logCoef: -0.0886,
    source: ATLAS,
  },
  // copper
  {
    metal: "Cu",
    pair: ["Cu2+", "Cu(s)"],
    equation: "E = 0.337 + 0.0295 log(Cu2+)",
    kind: "line",
    e0: 0.337,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
  },
  {
    metal: "Cu",
    pair: ["Cu2O(s)", "Cu(s)"],
    equation: "E = 0.471 − 0.0591 pH",
    kind: "line",
    e0: 0.471,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  {
    metal: "Cu",
    pair: ["Cu2+", "Cu2O(s)"],
    equation: "E = 0.203 + 0.0591 pH + 0.0591 log(Cu2+)",
    kind: "line",
    e0: 0.203,
    hPerN: -1,
    logCoef: 0.0591,
    source: ATLAS,
  },
  {
    metal: "Cu",
    pair: ["CuO(s)", "Cu2O(s)"],
    equation: "E = 0.669 − 0.0591 pH",
    kind: "line",
    e0: 0.669,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  // zinc
  {
    metal: "Zn",
    pair: ["Zn2+", "Zn(s)"],
    equation: "E = −0.763 + 0.0295 log(Zn2+)",
    kind: "line",
    e0: -0.763,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
  },
  // lead
  {
    metal: "Pb",
    pair: ["Pb2+", "Pb(s)"],
    equation: "E = −0.126 + 0.0295 log(Pb2+)",
    kind: "line",
    e0: -0.126,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
  },
  {
    metal: "Pb",
    pair: ["PbO(s)", "Pb(s)"],
    equation: "E = 0.248 − 0.0591 pH (red PbO)",
    kind: "line",
    e0: 0.248,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  {
    metal: "Pb",
    pair: ["PbO2(s)", "Pb2+"],
    equation: "E = 1.449 − 0.1182 pH − 0.0295 log(Pb2+)",
    kind: "line",
    e0: 1.449,
    hPerN: 2,
    logCoef: -0.0295,
    source: ATLAS,
  },
  // nickel
  {
    metal: "Ni",
    pair: ["Ni2+", "Ni(s)"],
    equation: "E = −0.250 + 0.0295 log(Ni2+)",
    kind: "line",
    e0: -0.25,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
  },
  // chromium
  {
    metal: "Cr",
    pair: ["Cr2+", "Cr(s)"],
    equation: "E = −0.913 + 0.0295 log(Cr2+)",
    kind: "line",
    e0: -0.913,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
  },
  {
    metal: "Cr",
    pair: ["Cr3+", "Cr2+"],
    equation: "E = −0.408 + 0.0591 log(Cr3+/Cr2+)",
    kind: "line",
    e0: -0.408,
    hPerN: 0,
    logCoef: 0,
    source: ATLAS,
  },
  {
    metal: "Cr",
    pair: ["Cr2O3(s)", "Cr(s)"],
    equation: "E = −0.579 − 0.0591 pH (anhydrous Cr2O3)",
    kind: "line",
    e0: -0.579,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
  // aluminium
  {
    metal: "Al",
    pair: ["Al3+", "Al(s)"],
    equation: "E = −1.663 + 0.0197 log(Al3+)",
    kind: "line",
    e0: -1.663,
    hPerN: 0,
    logCoef: 0.0197,
    source: ATLAS,
  },
  {
    metal: "Al",
    pair: ["Al(OH)3(s)", "Al(s)"],
    equation: "E = −1.550 − 0.0591 pH (hydrargillite Al2O3·3H2O)",
    kind: "line",
    e0: -1.55,
    hPerN: 1,
    logCoef: 0,
    source: ATLAS,
  },
];

const systems = new Map(METALS.map((m) => [m, buildSystem(db, m, { celsius: 25, activity: ACTIVITY })]));

describe("group A metals: boundary equations at 25 °C, activity 1e-6, against Pourbaix's Atlas", () => {
  for (const line of atlasLines) {
    it(`${line.metal}: ${line.pair[0]} / ${line.pair[1]}: ${line.equation} (${line.source})`, () => {
      const boundary = pairBoundary(systems.get(line.metal)!, line.pair[0], line.pair[1]);
      expect(boundary?.kind).toBe(line.kind);
      if (boundary?.kind !== "line") return;
      const expected = line.e0! + line.logCoef! * LOG_A;
      expect(
        Math.abs(boundary.intercept - expected),
        `intercept ${boundary.intercept.toFixed(4)} V vs ${expected.toFixed(4)} V`,
      ).toBeLessThanOrEqual(0.03);
      // slope exact: −(h/n)·RT ln10/F, whatever the data
      expect(Math.abs(boundary.slope - -line.hPerN! * K25)).toBeLessThan(1e-12);
    });
  }
  it("the Atlas set covers Fe, Cu, Zn, Pb, Ni, Cr and Al", () => {
    for (const m of ["Fe", "Cu", "Zn", "Pb", "Ni", "Cr", "Al"])
      expect(
        atlasLines.some((l) => l.metal === m),
        m,
      ).toBe(true);
  });
});

/**
 * Atlas lines the data cannot reproduce within 30 mV (or 0.5/h pH), because the Atlas used other values. Each is
 * checked against the difference that the named data difference predicts, within 10 mV (or 0.05 pH), so the
 * explanation itself is tested.
 *
 * Iron: the Atlas took ΔG°f(Fe2+) = −84.94 kJ/mol and ΔG°f(Fe3+) = −10.59 kJ/mol (from memory), NBS 1982 −78.90
 * and −4.7: each Fe2+ or Fe3+ in a reaction shifts its line by 6.04 (5.89) kJ/mol ÷ nF.
 * Copper: the Atlas line log(Cu2+) = 7.89 − 2 pH for tenorite; NBS gives log*Ks10 = 7.35.
 */
const FE2_SHIFT = (-78.9 - -84.94) * 1000; // J/mol, NBS minus Atlas
const FE3_SHIFT = (-4.7 - -10.59) * 1000;

interface AtlasDisagreement extends AtlasLine {
  /** Predicted (data − Atlas) difference of the intercept (V) or of the vertical pH. */
  predicted: number;
  why: string;
}

const atlasDisagreements: AtlasDisagreement[] = [
  {
    metal: "Fe",
    pair: ["Fe2+", "Fe(s)"],
    equation: "E = −0.440 + 0.0295 log(Fe2+)",
    kind: "line",
    e0: -0.44,
    hPerN: 0,
    logCoef: 0.0295,
    source: ATLAS,
    predicted: FE2_SHIFT / (2 * FARADAY),
    why: "one Fe2+ oxidised, 2 e−",
  },
  {
    metal: "Fe",
    pair: ["Fe2O3(s)", "Fe2+"],
    equation: "E = 0.728 − 0.1773 pH − 0.0591 log(Fe2+)",
    kind: "line",
    e0: 0.728,
    hPerN: 3,
    logCoef: -0.0591,
    source: ATLAS,
    predicted: (-2 * FE2_SHIFT) / (2 * FARADAY),
    why: "two Fe2+ formed, 2 e−",
  },
  {
    metal: "Fe",
    pair: ["Fe3O4(s)", "Fe2+"],
    equation: "E = 0.980 − 0.2364 pH − 0.0886 log(Fe2+)",
    kind: "line",
    e0: 0.98,
    hPerN: 4,
    logCoef: -0.0886,
    source: ATLAS,
    predicted: (-3 * FE2_SHIFT) / (2 * FARADAY),
    why: "three Fe2+ formed, 2 e−",
  },
  {
    metal: "Fe",
    pair: ["Fe2O3(s)", "Fe3+"],
    equation: "log(Fe3+) = −0.72 − 3 pH",
    kind: "vertical",
    pH0: -0.72 / 3,
    logCoefPH: -1 / 3,
    h: 3,
    source: ATLAS,
    // Fe2O3 + 6H+ = 2Fe3+ + 3H2O: ΔG°r rises by 2·shift → log K falls by 2·shift/(RT ln10) → pH of the line falls by that/6
    predicted: -(2 * FE3_SHIFT) / (GAS_CONSTANT * T0 * LN10) / 6,
    why: "two Fe3+ formed, six H+",
  },
  {
    metal: "Cu",
    pair: ["Cu2+", "CuO(s)"],
    equation: "log(Cu2+) = 7.89 − 2 pH",
    kind: "vertical",
    pH0: 7.89 / 2,
    logCoefPH: -1 / 2,
    h: 2,
    source: ATLAS,
    predicted: (7.35 - 7.89) / 2,
    why: "tenorite log*Ks10 7.35 (NBS 1982) against 7.89 (Atlas)",
  },
  {
    // 2CrO4 2- + 10H+ + 6e- = Cr2O3 + 5H2O: NBS Cr2O3 −1058.1 against the Atlas's −1046.8 kJ/mol, NBS CrO4 2- −727.75
    // against Latimer's −736.8 kJ/mol (−176.1 kcal, from memory): E° 1.362 V here, 1.311 V in the Atlas
    metal: "Cr",
    pair: ["CrO42-", "Cr2O3(s)"],
    equation: "E = 1.311 − 0.0985 pH + 0.0197 log(CrO4 2-)",
    kind: "line",
    e0: 1.311,
    hPerN: 10 / 6,
    logCoef: 0.0197,
    source: ATLAS,
    predicted: ((-(-1058.1 - -1046.8) + 2 * (-727.75 - -736.8)) * 1000) / (6 * FARADAY),
    why: "Cr2O3 (NBS −1058.1, Atlas −1046.8 kJ/mol) and CrO4 2- (NBS −727.75, Latimer −736.8 kJ/mol), 6 e−",
  },
];

describe("group A metals: Atlas lines where the Atlas used other data", () => {
  for (const line of atlasDisagreements) {
    it(`${line.metal}: ${line.pair[0]} / ${line.pair[1]}: ${line.equation} (${line.source}); offset explained by ${line.why}`, () => {
      const boundary = pairBoundary(systems.get(line.metal)!, line.pair[0], line.pair[1]);
      expect(boundary?.kind).toBe(line.kind);
      if (boundary?.kind === "line") {
        const atlas = line.e0! + line.logCoef! * LOG_A;
        const offset = boundary.intercept - atlas;
        expect(Math.abs(offset)).toBeGreaterThan(0.03);
        expect(
          Math.abs(offset - line.predicted),
          `offset ${offset.toFixed(4)} V, predicted ${line.predicted.toFixed(4)} V`,
        ).toBeLessThanOrEqual(0.01);
        expect(Math.abs(boundary.slope - -line.hPerN! * K25)).toBeLessThan(1e-12);
      } else if (boundary?.kind === "vertical") {
        const atlas = line.pH0! + line.logCoefPH! * LOG_A;
        const offset = boundary.pH - atlas;
        expect(Math.abs(offset)).toBeGreaterThan(0.5 / line.h!);
        expect(
          Math.abs(offset - line.predicted),
          `offset ${offset.toFixed(3)} pH, predicted ${line.predicted.toFixed(3)}`,
        ).toBeLessThanOrEqual(0.05);
      }
    });
  }
});

/**
 * Nickel in base (data correction): with NBS HNiO2- nickel corroded from pH 11.45 at 1e-6 (=REDOX.SPECIES("Ni",
 * 11.8, -0.3) gave HNiO2-); with HNiO2- from Baes & Mesmer's solubility in base it is passive (NiO) there, and the
 * NiO/HNiO2- line lies at pH 12.2 as in the Atlas.
 */
describe("group A metals: nickel passive in base up to about pH 12.2", () => {
  const system = buildSystem(db, "Ni", { celsius: 25, activity: 1e-6 });
  it(`Ni at pH 11.8, −0.3 V is NiO(s), passivation (${ATLAS}, nickel diagram at 1e-6: passive to about pH 12.2)`, () => {
    const s = system.species[dominantSpecies(system, 11.8, -0.3)];
    expect(s.formula).toBe("NiO(s)");
    expect(s.regime).toBe("passivation");
  });
  it(`NiO / HNiO2- at 1e-6: pH 12.2 within 0.3 (${ATLAS}; ${BM})`, () => {
    const boundary = pairBoundary(system, "NiO(s)", "HNiO2-");
    expect(boundary?.kind).toBe("vertical");
    if (boundary?.kind === "vertical") expect(Math.abs(boundary.pH - 12.2)).toBeLessThanOrEqual(0.3);
  });
});

/**
 * The Cu+ band (README's statement): in acid, Cu+ has a region where the Cu2+/Cu+ line lies above the Cu+/Cu line.
 * At 1e-6 that happens when the disproportionation constant of 2Cu+ = Cu2+ + Cu falls below 10^6: with these data
 * log K = 6.04 at 25 °C, so the band opens at about 26 °C, 11 mV wide at 30 °C and 93 mV at 60 °C. The widths are
 * the data's (pinned, so that README cannot drift from them); the constant is compared with the CRC's potentials.
 */
describe("group A metals: the Cu+ band as README states it", () => {
  const width = (celsius: number) => {
    const system = buildSystem(db, "Cu", { celsius, activity: 1e-6 });
    const upper = pairBoundary(system, "Cu2+", "Cu+");
    const lower = pairBoundary(system, "Cu+", "Cu(s)");
    if (upper?.kind !== "line" || lower?.kind !== "line") throw new Error("copper couples are not lines");
    return upper.intercept - lower.intercept;
  };
  it(`2Cu+ = Cu2+ + Cu: log K ${"6.22"} within 0.25 (${CRC}: E° Cu+/Cu 0.521 V, Cu2+/Cu+ 0.153 V)`, () => {
    expect(Math.abs(reactionLogK(db, { "Cu+": -2, "Cu2+": 1, "Cu(s)": 1 }, 25) - 6.22)).toBeLessThanOrEqual(0.25);
  });
  it("no band at 25 °C; 11 ± 2 mV at 30 °C; 93 ± 5 mV at 60 °C (data's figures, as README states)", () => {
    expect(width(25)).toBeLessThan(0);
    expect(Math.abs(width(30) - 0.0113)).toBeLessThanOrEqual(0.002);
    expect(Math.abs(width(60) - 0.093)).toBeLessThanOrEqual(0.005);
  });
});

/**
 * Zinc's neutral complex Zn(OH)2(aq), a documented choice: Baes & Mesmer give only an upper limit, log *β2 ≤ −16.9.
 * Taken at that limit, zincite's solubility as the neutral complex would be 10^(log*Ks10 − 16.9) = 10^-5.4 mol/kg at
 * every pH — above 1e-6, so zinc would have no passive window at the default activity. The database leaves the
 * complex out (data/species/zn.json) and zinc is passive (ZnO) from pH 8.8 to 10.9 at 1e-6; this pins both.
 */
describe("group A metals: zinc without Zn(OH)2(aq), and what including it would do", () => {
  const system = buildSystem(db, "Zn", { celsius: 25, activity: 1e-6 });
  it("Zn(OH)2(aq) is not in the database (the upper limit of Baes & Mesmer 1976 is not taken as a value)", () => {
    expect(db.species("Zn(OH)2(aq)")).toBeUndefined();
  });
  it(`at the limit log *β2 = −16.9 (${BM}) the neutral complex alone would exceed 1e-6 over zincite`, () => {
    const logKs = reactionLogK(db, { "ZnO(s)": -1, "H+": -2, "Zn2+": 1, "H2O(l)": 1 }, 25);
    expect(logKs - 16.9).toBeGreaterThan(-6);
  });
  it("without it, zinc is passive at 1e-6 between the Zn2+/ZnO and ZnO/Zn(OH)3- lines, pH 8.8 to 10.9 (data's figures, as README states)", () => {
    const acid = pairBoundary(system, "Zn2+", "ZnO(s)");
    const base = pairBoundary(system, "ZnO(s)", "Zn(OH)3-");
    expect(acid?.kind === "vertical" && Math.abs(acid.pH - 8.77) < 0.05).toBe(true);
    expect(base?.kind === "vertical" && Math.abs(base.pH - 10.86) < 0.05).toBe(true);
    expect(system.species[dominantSpecies(system, 9.8, 0)].formula).toBe("ZnO(s)");
  });
});

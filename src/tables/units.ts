/**
 * Units a sample log writes its columns in, and their conversions, in one table each: temperature scales to °C,
 * potential units to volts, water units to mol/kg (or, for alkalinity, to mg/L as CaCO3). Dilute water: 1 L is
 * taken as 1 kg (common practice). Molar masses come from the caller (the element records), so this file holds no
 * chemistry data of its own.
 */
import { CACO3_GRAMS_PER_EQUIVALENT, HCO3_GRAMS_PER_MOLE } from "../chemistry";

/** Temperature scales a header can name. */
export type TemperatureScale = "C" | "F" | "K";

/** °C from a reading on each scale: °F (x − 32)·5/9; K x − 273.15 (ITS-90 definitions, common practice). */
export const TEMPERATURE_SCALES: Readonly<
  Record<TemperatureScale, { readonly words: string; readonly toCelsius: (x: number) => number }>
> = {
  C: { words: "°C", toCelsius: (x) => x },
  F: { words: "°F", toCelsius: (x) => ((x - 32) * 5) / 9 },
  K: { words: "K", toCelsius: (x) => x - 273.15 },
};

/** A temperature on `scale` in °C. */
export function toCelsius(value: number, scale: TemperatureScale): number {
  return TEMPERATURE_SCALES[scale].toCelsius(value);
}

/** Potential units a header can name, with volts per unit. */
export type PotentialUnit = "V" | "mV";

export const POTENTIAL_UNITS: Readonly<Record<PotentialUnit, number>> = { V: 1, mV: 1e-3 };

/**
 * Units of the water columns. Alkalinity: mg/L as CaCO3 (the utility unit, the default), meq/L (also written
 * mmol/L: the acid capacity to pH 4.3) or French degrees (°f, the "TAC" of French labs: 10 mg/L as CaCO3); or
 * bicarbonate, which goes the same way through REDOX.DIC (its basis "bicarbonate"): mg/L as HCO3 or mmol/L of
 * HCO3. Totals: mg/L or µg/L of the column's own ion, mg/L as SO4, as S or as C, orthophosphate mg/L as PO4 or as
 * P, mmol/L, µmol/L, or mol/kg.
 */
export type WaterUnit =
  | "mg/L CaCO3"
  | "meq/L"
  | "degf"
  | "mg/L HCO3"
  | "mmol/L HCO3"
  | "mg/L"
  | "ug/L"
  | "mmol/L"
  | "umol/L"
  | "mol/kg"
  | "mg/L SO4"
  | "mg/L S"
  | "mg/L C"
  | "mg/L PO4"
  | "mg/L P";

/** Parts of a formula whose molar mass a unit uses: { S: 1, O: 4 } for sulfate. */
export type FormulaParts = Readonly<Record<string, number>>;

interface WaterUnitEntry {
  /** Words for menus, captions and messages. */
  readonly words: string;
  /** Amount per litre per unit: grams (mass units) or moles. */
  readonly perLitre: number;
  /** Mass units: the formula weighed ("own" = the column's own ion); null = an amount in moles. */
  readonly weighed: FormulaParts | "own" | null;
  /** Alkalinity units: mg/L as CaCO3 per unit (null for totals). */
  readonly asCaCO3: number | null;
  /** Bicarbonate units: mg/L as HCO3 per unit (absent for the others). */
  readonly asHCO3?: number;
}

export const WATER_UNITS: Readonly<Record<WaterUnit, WaterUnitEntry>> = {
  "mg/L CaCO3": { words: "mg/L as CaCO3", perLitre: 1e-3, weighed: null, asCaCO3: 1 },
  "meq/L": { words: "meq/L", perLitre: 1e-3, weighed: null, asCaCO3: CACO3_GRAMS_PER_EQUIVALENT },
  // one French degree is 10 mg/L as CaCO3 (common practice: the French degree of hardness and of TA/TAC)
  degf: { words: "°f (French degrees)", perLitre: 1e-2, weighed: null, asCaCO3: 10 },
  "mg/L HCO3": { words: "mg/L as HCO3", perLitre: 1e-3, weighed: null, asCaCO3: null, asHCO3: 1 },
  // 1 mmol of HCO3− is 61.016 mg (alkalinity.ts, IUPAC atomic weights)
  "mmol/L HCO3": { words: "mmol/L of HCO3", perLitre: 1e-3, weighed: null, asCaCO3: null, asHCO3: HCO3_GRAMS_PER_MOLE },
  "mg/L": { words: "mg/L", perLitre: 1e-3, weighed: "own", asCaCO3: null },
  "ug/L": { words: "µg/L", perLitre: 1e-6, weighed: "own", asCaCO3: null },
  "mmol/L": { words: "mmol/L", perLitre: 1e-3, weighed: null, asCaCO3: null },
  "umol/L": { words: "µmol/L", perLitre: 1e-6, weighed: null, asCaCO3: null },
  "mol/kg": { words: "mol/kg", perLitre: 1, weighed: null, asCaCO3: null },
  "mg/L SO4": { words: "mg/L as SO4", perLitre: 1e-3, weighed: { S: 1, O: 4 }, asCaCO3: null },
  "mg/L S": { words: "mg/L as S", perLitre: 1e-3, weighed: { S: 1 }, asCaCO3: null },
  "mg/L C": { words: "mg/L as C", perLitre: 1e-3, weighed: { C: 1 }, asCaCO3: null },
  "mg/L PO4": { words: "mg/L as PO4", perLitre: 1e-3, weighed: { P: 1, O: 4 }, asCaCO3: null },
  "mg/L P": { words: "mg/L as P", perLitre: 1e-3, weighed: { P: 1 }, asCaCO3: null },
};

/** Words for a water unit, for the pane's menus and captions. */
export const WATER_UNIT_WORDS: Readonly<Record<WaterUnit, string>> = Object.fromEntries(
  Object.entries(WATER_UNITS).map(([unit, entry]) => [unit, entry.words]),
) as Record<WaterUnit, string>;

/**
 * Whether a unit goes through REDOX.DIC with the row's pH (an alkalinity unit, converted to mg/L as CaCO3, or a
 * bicarbonate unit, converted to mg/L as HCO3: dicBasis says which).
 */
export function isAlkalinityUnit(unit: WaterUnit): boolean {
  return WATER_UNITS[unit].asCaCO3 !== null || WATER_UNITS[unit].asHCO3 !== undefined;
}

/** The basis REDOX.DIC takes a unit's numbers in: "bicarbonate" for the bicarbonate units, else "alkalinity". */
export function dicBasis(unit: WaterUnit): "alkalinity" | "bicarbonate" {
  return WATER_UNITS[unit].asHCO3 !== undefined ? "bicarbonate" : "alkalinity";
}

/**
 * mol/kg per unit of a total. `ownIon` is the formula of the column's ion (chloride { Cl: 1 }); `molarMass` gives
 * g/mol of formula parts. Alkalinity units have no such factor (they go through REDOX.DIC).
 */
export function molalFactor(unit: WaterUnit, ownIon: FormulaParts, molarMass: (parts: FormulaParts) => number): number {
  const entry = WATER_UNITS[unit];
  if (isAlkalinityUnit(unit)) throw new Error(`${entry.words} is an alkalinity unit, not a total`);
  if (entry.weighed === null) return entry.perLitre;
  return entry.perLitre / molarMass(entry.weighed === "own" ? ownIon : entry.weighed);
}

/** mg/L as CaCO3 per unit of an alkalinity column (mg/L as HCO3 per unit of a bicarbonate one: dicBasis). */
export function alkalinityFactor(unit: WaterUnit): number {
  const factor = WATER_UNITS[unit].asCaCO3 ?? WATER_UNITS[unit].asHCO3;
  if (factor === null || factor === undefined) throw new Error(`${WATER_UNITS[unit].words} is not an alkalinity unit`);
  return factor;
}

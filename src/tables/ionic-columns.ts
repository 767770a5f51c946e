/**
 * Columns that give each row's ionic strength, found by header, with the unit their header names:
 * - an explicit ionic strength: "Ionic strength (mol/kg)", "I (mol/L)", "I_mmol_kg";
 * - specific conductance: "Conductivity (µS/cm)", "Specific conductance", "EC_uS_cm", "SC", "SpCond (mS/cm)";
 * - total dissolved solids: "TDS (mg/L)", "TDS ppm", "Total dissolved solids (g/L)".
 * A header that describes a text field about the measurement ("EC flag", "conductivity comment") is no source.
 * Pure functions: no host, no DOM. The conversion to mol/kg is src/chemistry/ionic-strength.ts (one copy).
 */
import { ionicStrengthFrom, type IonicStrengthBasis } from "../chemistry";
import { CONDUCTIVITY_WORDS, headerTokens, namesDissolvedSolids } from "./header-match";
import { readNumber } from "./numbers";

export type IonicColumnRole = "ionicStrength" | "conductivity" | "tds";

/** Roles in the order they win when a log has several: a stated I, then conductivity, then TDS. */
export const IONIC_COLUMN_ROLES: readonly IonicColumnRole[] = ["ionicStrength", "conductivity", "tds"];

/** Units accepted per role. mol/L and mmol/L are read as mol/kg and mmol/kg (dilute water, 1 L ≈ 1 kg). */
export type IonicUnit = "mol/kg" | "mmol/kg" | "uS/cm" | "mS/cm" | "mS/m" | "mg/L" | "g/L";

interface IonicUnitEntry {
  readonly words: string;
  /** What the number becomes after × factor: an ionic strength (mol/kg) or the basis of REDOX.IONICSTRENGTH. */
  readonly basis: IonicStrengthBasis | "mol/kg";
  readonly factor: number;
}

/** Unit conversions (SI prefixes; 1 mS/m = 10 µS/cm, 1 g/L = 1000 mg/L; mg/L and ppm taken as equal — common practice). */
export const IONIC_UNITS: Readonly<Record<IonicUnit, IonicUnitEntry>> = {
  "mol/kg": { words: "mol/kg", basis: "mol/kg", factor: 1 },
  "mmol/kg": { words: "mmol/kg", basis: "mol/kg", factor: 1e-3 },
  "uS/cm": { words: "µS/cm", basis: "uS/cm", factor: 1 },
  "mS/cm": { words: "mS/cm", basis: "uS/cm", factor: 1000 },
  "mS/m": { words: "mS/m", basis: "uS/cm", factor: 10 },
  "mg/L": { words: "mg/L", basis: "mg/L", factor: 1 },
  "g/L": { words: "g/L", basis: "mg/L", factor: 1000 },
};

export interface IonicColumn {
  readonly role: IonicColumnRole;
  readonly index: number;
  readonly unit: IonicUnit;
}

const has = (tokens: readonly string[], ...words: string[]) => words.some((w) => tokens.includes(w));

/** Header words of a text field about a measurement, not the measurement. */
const TEXT_FIELD = [
  "flag",
  "flags",
  "comment",
  "comments",
  "note",
  "notes",
  "remark",
  "remarks",
  "qualifier",
  "method",
  "probe",
  "meter",
];

function isIonicStrength(tokens: readonly string[]): boolean {
  if (has(tokens, "ionic") && has(tokens, "strength")) return true;
  return tokens[0] === "i" && tokens.length <= 4 && has(tokens, "mol", "mmol", "molal");
}

function isConductivity(tokens: readonly string[]): boolean {
  return has(
    tokens,
    "conductivity",
    "conductance",
    "cond",
    "spcond",
    "ec",
    "sc",
    "spc",
    "kappa",
    ...CONDUCTIVITY_WORDS,
  );
}

function isTds(tokens: readonly string[]): boolean {
  return namesDissolvedSolids(tokens);
}

const TESTS: Readonly<Record<IonicColumnRole, (t: readonly string[]) => boolean>> = {
  ionicStrength: isIonicStrength,
  conductivity: isConductivity,
  tds: isTds,
};

/** Whether a header names a column of `role` (and not a text field about it). */
export function headerIsIonic(role: IonicColumnRole, tokens: readonly string[]): boolean {
  return tokens.length > 0 && !has(tokens, ...TEXT_FIELD) && TESTS[role](tokens);
}

/** The unit a header names for `role`; the trade's usual unit when it names none (µS/cm, mg/L, mol/kg). */
export function ionicUnit(role: IonicColumnRole, tokens: readonly string[]): IonicUnit {
  if (role === "conductivity") {
    const ms = tokens.indexOf("ms");
    if (ms >= 0) return tokens[ms + 1] === "m" ? "mS/m" : "mS/cm";
    return "uS/cm";
  }
  if (role === "tds") return has(tokens, "g") && !has(tokens, "mg", "ppm") ? "g/L" : "mg/L";
  return has(tokens, "mmol", "mm") ? "mmol/kg" : "mol/kg";
}

/**
 * The ionic-strength columns among `headers`, skipping the `taken` columns, in the order they win (a stated I,
 * conductivity, TDS); the first matching column (left to right) per role.
 */
export function matchIonicColumns(headers: readonly unknown[], taken: Iterable<number> = []): IonicColumn[] {
  const tokens = headers.map((h) =>
    headerTokens(typeof h === "string" ? h : h === null || h === undefined ? "" : String(h)),
  );
  const used = new Set(taken);
  const out: IonicColumn[] = [];
  for (const role of IONIC_COLUMN_ROLES) {
    const index = tokens.findIndex((t, i) => !used.has(i) && headerIsIonic(role, t));
    if (index < 0) continue;
    used.add(index);
    out.push({ role, index, unit: ionicUnit(role, tokens[index]) });
  }
  return out;
}

/**
 * Whether a column's cells are numbers (blanks aside): at least half of the non-blank cells read as numbers. A text
 * column is never offered as a source of the ionic strength.
 */
export function isNumericColumn(cells: readonly unknown[]): boolean {
  let numbers = 0;
  let filled = 0;
  for (const c of cells) {
    if (c === null || c === undefined || (typeof c === "string" && c.trim() === "")) continue;
    filled++;
    if (
      (typeof c === "number" && Number.isFinite(c)) ||
      (typeof c === "string" && (readNumber(c.trim(), ".") ?? readNumber(c.trim(), ",")) !== null)
    )
      numbers++;
  }
  return filled === 0 || numbers * 2 >= filled;
}

/** A reading in `unit` → ionic strength, mol/kg (Russell 1976 for conductance, Langelier 1936 for TDS). */
export function ionicStrengthOf(value: number, unit: IonicUnit): number {
  const { basis, factor } = IONIC_UNITS[unit];
  return basis === "mol/kg" ? value * factor : ionicStrengthFrom(value * factor, basis);
}

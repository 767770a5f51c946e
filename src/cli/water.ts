/**
 * The water of each row for the command line: which columns feed the [carbonate], [chloride] and [sulfur]
 * arguments of SPECIES, REGIME, BOUNDARY and DISSOLVED, and how their numbers become totals in mol/kg.
 *
 * - Carbonate from a DIC column (mol/kg as written; mmol/L, µmol/L or mg/L as C when the header says so), else
 *   from an alkalinity column (mg/L as CaCO3, or meq/L when the header says so) through REDOX.DIC with the row's
 *   own pH and temperature, exactly as a worksheet would pass REDOX.DIC(alkalinity, pH, temperature).
 * - Chloride and sulfur: mol/kg when the header says mol/kg; otherwise mg/L (µg/L, mmol/L when the header says
 *   so) converted with the atomic weights of the element records. A sulfate column counts as total sulfur (in oxic
 *   water sulfate carries practically all of it). Dilute water: 1 L taken as 1 kg (common practice).
 *
 * Headers are matched by the pane's water-column matching (src/taskpane/header-match.ts); DIC columns here.
 * Nothing is rounded: each distinct total is its own system, as in the worksheet.
 */
import { CACO3_GRAMS_PER_EQUIVALENT } from "../chemistry/alkalinity";
import { getDatabase } from "../chemistry/database";
import type { LigandName } from "../chemistry/ligand-cells";
import { headerTokens, waterColumnAt, type ColumnMapping, type WaterColumnRole, type WaterUnit, matchWaterColumns } from "../taskpane/header-match";
import { UsageError, type CliOptions } from "./options";

/** One ligand argument fed from a column. */
export interface LigandInput {
  readonly ligand: LigandName;
  readonly column: number;
  /** "alkalinity": the column's number × factor is mg/L as CaCO3, passed through REDOX.DIC; "total": × factor is mol/kg. */
  readonly kind: "alkalinity" | "total";
  readonly factor: number;
  /** The unit read, in words, for the summary and messages. */
  readonly unit: string;
}

/** Output column of the total actually passed to the functions. */
export const LIGAND_OUTPUT: Readonly<Record<LigandName, string>> = { carbonate: "DIC_mol_kg", chloride: "chloride_mol_kg", sulfur: "sulfur_mol_kg" };

function has(tokens: readonly string[], ...words: string[]): boolean {
  return words.some((w) => tokens.includes(w));
}

/** A header naming dissolved inorganic carbon: "DIC", "TIC", "dissolved inorganic carbon (mmol/L)". */
export function isDicHeader(header: string): boolean {
  const t = headerTokens(header);
  return has(t, "dic", "tic") || (has(t, "inorganic") && has(t, "carbon"));
}

/** Header says mol/kg (or molal), not a milli- or micro- unit. */
function saysMolPerKg(tokens: readonly string[]): boolean {
  return has(tokens, "molal") || (tokens.includes("mol") && tokens.includes("kg"));
}

function molarMass(symbol: string): number {
  const weight = getDatabase().element(symbol)?.atomicWeight;
  if (weight === undefined) throw new Error(`no atomic weight for ${symbol} in the element records`);
  return weight;
}

function dicInput(column: number, header: string): LigandInput {
  const t = headerTokens(header);
  if (has(t, "mmol", "mm")) return { ligand: "carbonate", column, kind: "total", factor: 1e-3, unit: "mmol/L DIC" };
  if (has(t, "umol")) return { ligand: "carbonate", column, kind: "total", factor: 1e-6, unit: "µmol/L DIC" };
  if (has(t, "mg", "ppm")) return { ligand: "carbonate", column, kind: "total", factor: 1e-3 / molarMass("C"), unit: "mg/L DIC as C" };
  return { ligand: "carbonate", column, kind: "total", factor: 1, unit: "mol/kg DIC" };
}

function alkalinityInput(column: number, unit: WaterUnit): LigandInput {
  return unit === "meq/L"
    ? { ligand: "carbonate", column, kind: "alkalinity", factor: CACO3_GRAMS_PER_EQUIVALENT, unit: "meq/L alkalinity" }
    : { ligand: "carbonate", column, kind: "alkalinity", factor: 1, unit: "mg/L alkalinity as CaCO3" };
}

function totalInput(ligand: "chloride" | "sulfur", column: number, header: string, unit: WaterUnit): LigandInput {
  if (saysMolPerKg(headerTokens(header))) return { ligand, column, kind: "total", factor: 1, unit: "mol/kg" };
  if (unit === "mmol/L") return { ligand, column, kind: "total", factor: 1e-3, unit: "mmol/L" };
  if (ligand === "chloride") {
    return unit === "ug/L"
      ? { ligand, column, kind: "total", factor: 1e-6 / molarMass("Cl"), unit: "µg/L chloride" }
      : { ligand, column, kind: "total", factor: 1e-3 / molarMass("Cl"), unit: "mg/L chloride" };
  }
  return unit === "mg/L S"
    ? { ligand, column, kind: "total", factor: 1e-3 / molarMass("S"), unit: "mg/L sulfur as S" }
    : { ligand, column, kind: "total", factor: 1e-3 / (molarMass("S") + 4 * molarMass("O")), unit: "mg/L sulfate as SO4" };
}

/**
 * The ligand inputs of a file: columns found by header unless named (or "none") on the command line; none at all
 * with --pure-water. `mapping` holds the columns already used for pH, potential, …; `find` resolves a named column.
 */
export function planWater(
  headers: readonly string[],
  options: CliOptions,
  mapping: ColumnMapping,
  find: (option: string, what: string) => number,
): LigandInput[] {
  if (options.pureWater) return [];
  const auto = matchWaterColumns(headers, mapping);
  const taken = new Set(Object.values(mapping).filter((i) => i >= 0));
  const autoDic = headers.findIndex((h, i) => !taken.has(i) && isDicHeader(h));
  const choose = (option: string | null | undefined, automatic: number, what: string): number | null => {
    if (option === null) return null;
    if (option === undefined) return automatic >= 0 ? automatic : null;
    return find(option, what);
  };
  const inputs: LigandInput[] = [];

  const dic = choose(options.dicColumn, autoDic, "--dic-column");
  const alkalinity = choose(options.alkalinityColumn, auto.alkalinity?.index ?? -1, "--alkalinity-column");
  if (dic !== null && alkalinity !== null && options.dicColumn !== undefined && options.alkalinityColumn !== undefined) {
    throw new UsageError("--dic-column and --alkalinity-column both give the carbonate; name one of them (or set the other to none)");
  }
  // a measured DIC wins over one derived from alkalinity, unless the alkalinity column was named
  if (dic !== null && options.alkalinityColumn === undefined) inputs.push(dicInput(dic, headers[dic]));
  else if (alkalinity !== null) inputs.push(alkalinityInput(alkalinity, waterColumnAt("alkalinity", headers, alkalinity).unit));
  else if (dic !== null) inputs.push(dicInput(dic, headers[dic]));

  const roles: Array<["chloride" | "sulfur", WaterColumnRole, string | null | undefined, string]> = [
    ["chloride", "chloride", options.chlorideColumn, "--chloride-column"],
    ["sulfur", "sulfate", options.sulfurColumn, "--sulfur-column"],
  ];
  for (const [ligand, role, option, what] of roles) {
    const column = choose(option, auto[role]?.index ?? -1, what);
    if (column !== null) inputs.push(totalInput(ligand, column, headers[column], waterColumnAt(role, headers, column).unit));
  }
  const used = inputs.map((i) => i.column);
  const clash = used.find((c, k) => used.indexOf(c) !== k);
  if (clash !== undefined) throw new UsageError(`the column "${headers[clash]}" is named for two ligands`);
  return inputs;
}

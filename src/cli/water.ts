/**
 * The water of each row for the command line: which columns feed the [carbonate], [chloride], [sulfur] and
 * [phosphate] arguments of SPECIES, REGIME, BOUNDARY and DISSOLVED, and how their numbers become totals in mol/kg.
 *
 * - Carbonate from a DIC column (mol/kg as written; mmol/L, µmol/L or mg/L as C when the header says so), else
 *   from an alkalinity column (mg/L as CaCO3, or meq/L when the header says so) through REDOX.DIC with the row's
 *   own pH and temperature, exactly as a worksheet would pass REDOX.DIC(alkalinity, pH, temperature); else from a
 *   bicarbonate column (mg/L as HCO3, or mmol/L) through REDOX.DIC(bicarbonate, pH, temperature, "bicarbonate").
 * - Orthophosphate: mg/L as PO4, or as P when the header says so ("PO4-P", "as P"); mmol/L or mol/kg (as P) likewise.
 * - Chloride and sulfur: mol/kg when the header says mol/kg; otherwise mg/L (µg/L, mmol/L when the header says
 *   so) converted with the atomic weights of the element records. A sulfate column counts as total sulfur (in oxic
 *   water sulfate carries practically all of it). Dilute water: 1 L taken as 1 kg (common practice).
 *
 * Headers and units are read by src/tables (the pane's rules; one unit table for both).
 * Nothing is rounded: each distinct total is its own system, as in the worksheet.
 */
import { getDatabase, type LigandName } from "../chemistry";
import {
  alkalinityFactor,
  dicBasis,
  matchWaterColumns,
  molalFactor,
  WATER_UNITS,
  waterColumnAt,
  type ColumnMapping,
  type FormulaParts,
  type WaterColumnRole,
  type WaterUnit,
} from "../tables";
import { UsageError, type CliOptions } from "./options";

/** One ligand argument fed from a column. */
export interface LigandInput {
  readonly ligand: LigandName;
  readonly column: number;
  /** "alkalinity": the column's number × factor is mg/L as CaCO3, passed through REDOX.DIC; "total": × factor is mol/kg. */
  readonly kind: "alkalinity" | "total";
  readonly factor: number;
  /** REDOX.DIC's basis for an "alkalinity" input: total alkalinity, or bicarbonate (× factor is mg/L as HCO3). */
  readonly basis?: "alkalinity" | "bicarbonate";
  /** The unit read, in words, for the summary and messages. */
  readonly unit: string;
}

/** Output column of the total actually passed to the functions. */
export const LIGAND_OUTPUT: Readonly<Record<LigandName, string>> = {
  carbonate: "DIC_mol_kg",
  chloride: "chloride_mol_kg",
  sulfur: "sulfur_mol_kg",
  phosphate: "phosphate_mol_kg",
};

/** g/mol of formula parts from the element records. */
function molarMass(parts: FormulaParts): number {
  let sum = 0;
  for (const [symbol, count] of Object.entries(parts)) {
    const weight = getDatabase().element(symbol)?.atomicWeight;
    if (weight === undefined) throw new Error(`no atomic weight for ${symbol} in the element records`);
    sum += count * weight;
  }
  return sum;
}

const OWN_ION: Readonly<Record<WaterColumnRole, FormulaParts>> = {
  alkalinity: {},
  chloride: { Cl: 1 },
  sulfate: { S: 1, O: 4 },
  dic: { C: 1 },
  phosphate: { P: 1 },
};
const WHAT: Readonly<Record<WaterColumnRole, string>> = {
  alkalinity: "alkalinity",
  chloride: "chloride",
  sulfate: "sulfate",
  dic: "DIC",
  phosphate: "orthophosphate",
};
const LIGAND_OF: Readonly<Record<WaterColumnRole, LigandName>> = {
  alkalinity: "carbonate",
  chloride: "chloride",
  sulfate: "sulfur",
  dic: "carbonate",
  phosphate: "phosphate",
};

/** The input for a column serving `role`, in the unit its header names (units.ts). */
function inputFor(role: WaterColumnRole, column: number, unit: WaterUnit): LigandInput {
  const basis = role === "alkalinity" ? dicBasis(unit) : undefined;
  const words = `${basis === "bicarbonate" ? "bicarbonate" : WHAT[role]} in ${WATER_UNITS[unit].words}`;
  if (role === "alkalinity")
    return { ligand: "carbonate", column, kind: "alkalinity", factor: alkalinityFactor(unit), unit: words, basis };
  return {
    ligand: LIGAND_OF[role],
    column,
    kind: "total",
    factor: molalFactor(unit, OWN_ION[role], molarMass),
    unit: words,
  };
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
  const choose = (option: string | null | undefined, automatic: number, what: string): number | null => {
    if (option === null) return null;
    if (option === undefined) return automatic >= 0 ? automatic : null;
    return find(option, what);
  };
  const unitOf = (role: WaterColumnRole, column: number): WaterUnit => waterColumnAt(role, headers, column).unit;
  const inputs: LigandInput[] = [];

  const dic = choose(options.dicColumn, auto.dic?.index ?? -1, "--dic-column");
  const alkalinity = choose(options.alkalinityColumn, auto.alkalinity?.index ?? -1, "--alkalinity-column");
  if (
    dic !== null &&
    alkalinity !== null &&
    options.dicColumn !== undefined &&
    options.alkalinityColumn !== undefined
  ) {
    throw new UsageError(
      "--dic-column and --alkalinity-column both give the carbonate; name one of them (or set the other to none)",
    );
  }
  // a measured DIC wins over one derived from alkalinity, unless the alkalinity column was named
  if (dic !== null && options.alkalinityColumn === undefined) inputs.push(inputFor("dic", dic, unitOf("dic", dic)));
  else if (alkalinity !== null) inputs.push(inputFor("alkalinity", alkalinity, unitOf("alkalinity", alkalinity)));
  else if (dic !== null) inputs.push(inputFor("dic", dic, unitOf("dic", dic)));

  const roles: Array<[WaterColumnRole, string | null | undefined, string]> = [
    ["chloride", options.chlorideColumn, "--chloride-column"],
    ["sulfate", options.sulfurColumn, "--sulfur-column"],
    ["phosphate", options.phosphateColumn, "--phosphate-column"],
  ];
  for (const [role, option, what] of roles) {
    const column = choose(option, auto[role]?.index ?? -1, what);
    if (column !== null) inputs.push(inputFor(role, column, unitOf(role, column)));
  }
  const used = inputs.map((i) => i.column);
  const clash = used.find((c, k) => used.indexOf(c) !== k);
  if (clash !== undefined) throw new UsageError(`the column "${headers[clash]}" is named for two ligands`);
  return inputs;
}

/**
 * One summary line on the water every row was answered in: the columns feeding each ligand, or pure water and why
 * (a log whose water columns have headers the program does not know is answered as pure water: say so).
 */
export function waterSummary(ligands: readonly LigandInput[], headers: readonly string[], options: CliOptions): string {
  if (options.pureWater) return "water: pure water on every row (--pure-water; the water columns are ignored)";
  if (ligands.length === 0)
    return (
      "water: pure water on every row; no alkalinity, DIC, chloride, sulfate or orthophosphate column was found by " +
      "its header (name one with --alkalinity-column, --dic-column, --chloride-column, --sulfur-column or --phosphate-column)"
    );
  const parts = ligands.map((l) => {
    const basis = l.basis === "bicarbonate" ? ' and basis "bicarbonate"' : "";
    const how = l.kind === "alkalinity" ? `, through REDOX.DIC with the row's pH and temperature${basis}` : "";
    return `${l.ligand} from "${headers[l.column]}" (${l.unit}${how})`;
  });
  return `water: ${parts.join("; ")}`;
}

/**
 * The water the samples are drawn in: ligand totals (carbonate as dissolved inorganic carbon, chloride, sulfur,
 * orthophosphate as P) for
 * the diagram and for each sample, either typed by the user (mol/kg, blank = absent) or taken row by row from the
 * log's alkalinity, chloride or sulfate column. Pure: no host, no DOM.
 *
 * - Alkalinity → DIC with the row's own pH and temperature (REDOX.DIC's chemistry, alkalinity.ts).
 * - Chloride and sulfate in mass units → mol/kg with the atomic weights of data/elements.json; dilute water, so
 *   1 L ≈ 1 kg (common practice). A sulfate column is taken as the total sulfur (oxic water: sulfate carries
 *   practically all of it; sulfide is not in the column).
 * - The diagram is drawn at the median of the rows' totals; each sample's species and regime use its own row's
 *   totals. Rows whose column cell is blank or unreadable use the median and are counted.
 * - Column totals are rounded to 0.01 in log10 (2.3 %, finer than an alkalinity titration or an ion
 *   chromatograph resolves — common practice) so rows share systems; the rounded total is the one shown and used.
 */
import {
  AlkalinityProblem,
  dicFromReadingOrProblem,
  hasLigands,
  LIGAND_ORDER,
  LigandName,
  LigandTotals,
  MAX_LIGAND_TOTAL,
  type Database,
} from "../chemistry";
import {
  alkalinityFactor,
  dicBasis,
  isAlkalinityUnit,
  molalFactor,
  readNumber,
  type WaterColumn,
  type WaterColumnRole,
} from "../tables";
import { formatTotals, LIGAND_WORDS } from "../diagram";

export { formatTotals };

/** Where each ligand's total comes from. */
export type LigandSource =
  { readonly kind: "typed"; readonly total: number | null } | { readonly kind: "column"; readonly column: WaterColumn };

export type WaterSettings = Readonly<Record<LigandName, LigandSource>>;

/** No ligand: the ligand-free diagram. */
export const PURE_WATER: WaterSettings = {
  carbonate: { kind: "typed", total: null },
  chloride: { kind: "typed", total: null },
  sulfur: { kind: "typed", total: null },
  phosphate: { kind: "typed", total: null },
};

/** The column each ligand can be read from. */
export const LIGAND_COLUMN: Readonly<Record<LigandName, WaterColumnRole>> = {
  carbonate: "alkalinity",
  chloride: "chloride",
  sulfur: "sulfate",
  phosphate: "phosphate",
};

/** A row's value for one ligand: a total in mol/kg, or why none could be read. */
export type RowTotal = number | { readonly problem: string };

export type RowTotals = Partial<Record<LigandName, RowTotal>>;

/** Rounds a positive total to 0.01 in log10 (see the file comment). */
export function roundTotal(total: number): number {
  return Number((10 ** (Math.round(Math.log10(total) * 100) / 100)).toPrecision(6));
}

function numberIn(cell: unknown): number | null {
  if (typeof cell === "number") return Number.isFinite(cell) ? cell : null;
  if (typeof cell !== "string") return null;
  const text = cell.trim();
  return readNumber(text);
}

/** Molar mass (g/mol) from the element records. */
function molarMass(db: Database, parts: Record<string, number>): number {
  let sum = 0;
  for (const [symbol, count] of Object.entries(parts)) {
    const weight = db.element(symbol)?.atomicWeight;
    if (weight === undefined) throw new Error(`no atomic weight for ${symbol} in the element records`);
    sum += count * weight;
  }
  return sum;
}

/** The ion a ligand column in plain mass units weighs (orthophosphate columns say as PO4 or as P). */
const OWN_ION: Readonly<Record<LigandName, Record<string, number>>> = {
  carbonate: { C: 1 },
  chloride: { Cl: 1 },
  sulfur: { S: 1, O: 4 },
  phosphate: { P: 1, O: 4 },
};

/**
 * One row's total (mol/kg) of `ligand` from its column cell. `pH` and `celsius` are the row's own (alkalinity needs
 * them). Blank, unreadable, negative or out-of-range values give a problem instead.
 */
export function rowTotal(
  db: Database,
  ligand: LigandName,
  column: WaterColumn,
  cell: unknown,
  pH: number,
  celsius: number,
): RowTotal {
  if (cell === null || cell === undefined || (typeof cell === "string" && cell.trim() === ""))
    return { problem: "blank" };
  const value = numberIn(cell);
  if (value === null) return { problem: `"${String(cell).trim().slice(0, 20)}" is not a number` };
  if (value < 0) return { problem: `${value} is negative` };
  let total: number;
  if (ligand === "carbonate" && !isAlkalinityUnit(column.unit))
    total = value * molalFactor(column.unit, { C: 1 }, (parts) => molarMass(db, parts));
  else if (ligand === "carbonate") {
    const basis = dicBasis(column.unit);
    const measured = value * alkalinityFactor(column.unit); // mg/L as CaCO3, or as HCO3 on that basis
    if (measured === 0) return { problem: `${basis} is 0` };
    const dic = dicFromReadingOrProblem(measured, basis, pH, celsius);
    if (dic instanceof AlkalinityProblem) return { problem: dic.message };
    total = dic;
  } else total = value * molalFactor(column.unit, OWN_ION[ligand], (parts) => molarMass(db, parts));
  if (total === 0) return 0;
  if (!(total > 0 && total <= MAX_LIGAND_TOTAL))
    return { problem: `gives ${total.toPrecision(3)} mol/kg, outside 0–${MAX_LIGAND_TOTAL}` };
  return roundTotal(total);
}

/** Median of positive numbers (NaN when none). */
function medianOf(values: readonly number[]): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

export interface ResolvedWater {
  /** Totals of the diagram (mol/kg; absent ligands left out). */
  readonly diagram: LigandTotals;
  /** Totals of each sample, aligned with the rows given; all equal to `diagram` when nothing is read per row. */
  readonly perSample: LigandTotals[];
  /** Ligands read per row. */
  readonly fromColumns: LigandName[];
  /** Per ligand read from a column: rows that used the median instead of their own value. */
  readonly fallbacks: Partial<Record<LigandName, number>>;
  /** Ligands set to read from a column that gave no usable row at all (left out of the water). */
  readonly unusable: LigandName[];
  /** Per ligand read per row, what its column holds ("alkalinity", "bicarbonate", "DIC", "chloride" …). */
  readonly readFrom: Partial<Record<LigandName, string>>;
}

/** What a ligand's column holds, in words: the carbonate's as its unit says (alkalinity, bicarbonate or DIC). */
function columnContent(ligand: LigandName, column: WaterColumn): string {
  if (ligand !== "carbonate") return LIGAND_COLUMN[ligand];
  if (!isAlkalinityUnit(column.unit)) return "DIC";
  return dicBasis(column.unit) === "bicarbonate" ? "bicarbonate" : "alkalinity";
}

/**
 * The diagram's and every sample's totals from the settings and the rows' column values (`rows[i]` for sample i).
 * Typed totals apply to every sample; column totals are per row with the median for the diagram.
 */
export function resolveWater(settings: WaterSettings, rows: readonly RowTotals[]): ResolvedWater {
  const diagram: LigandTotals = {};
  const fromColumns: LigandName[] = [];
  const fallbacks: Partial<Record<LigandName, number>> = {};
  const unusable: LigandName[] = [];
  const readFrom: Partial<Record<LigandName, string>> = {};
  for (const ligand of LIGAND_ORDER) {
    const source = settings[ligand];
    if (source.kind === "typed") {
      if (source.total !== null && source.total > 0) diagram[ligand] = source.total;
      continue;
    }
    const values = rows.map((r) => r[ligand]).filter((v): v is number => typeof v === "number");
    if (values.length === 0) {
      unusable.push(ligand);
      continue;
    }
    const median = medianOf(values);
    if (median > 0) diagram[ligand] = roundTotal(median);
    fromColumns.push(ligand);
    readFrom[ligand] = columnContent(ligand, source.column);
    fallbacks[ligand] = rows.length - values.length;
  }
  const perSample = rows.map((r) => {
    if (fromColumns.length === 0) return diagram;
    const own: LigandTotals = { ...diagram };
    for (const ligand of fromColumns) {
      const v = r[ligand];
      if (typeof v === "number") {
        if (v > 0) own[ligand] = v;
        else delete own[ligand];
      }
    }
    return own;
  });
  return { diagram, perSample, fromColumns, fallbacks, unusable, readFrom };
}

/** Names of the ligands present, for titles: "carbonate, chloride and sulfur". */
export function ligandNames(totals: LigandTotals): string {
  const names = LIGAND_ORDER.filter((l) => (totals[l] ?? 0) > 0);
  return names.length <= 1 ? names.join("") : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
}

/**
 * The caption line naming the water and the method in one sentence; "" without ligands.
 */
export function waterCaption(water: ResolvedWater): string {
  if (!hasLigands(water.diagram)) return "";
  const per = water.fromColumns.map(
    (l) =>
      `${LIGAND_WORDS[l]} is the median of the rows' totals from their ${water.readFrom[l] ?? LIGAND_COLUMN[l]} and ` +
      "each sample uses its own",
  );
  return (
    `Water: ${formatTotals(water.diagram)}${per.length > 0 ? ` (${per.join("; ")})` : ""}; ` +
    "each ligand is speciated exactly at every point from its total, ideal solution."
  );
}

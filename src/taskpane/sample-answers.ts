/**
 * Each sample's own answer, computed by the worksheet functions themselves (src/functions) exactly as a worksheet
 * row would call them: REDOX.TOSHE of the reading as logged at the row's own temperature, REDOX.WATERMARGIN,
 * REDOX.SPECIES, REGIME and DISSOLVED with the row's own temperature and water (alkalinity through REDOX.DIC with
 * the row's pH and temperature; chloride and sulfate converted to mol/kg by the same factors as the command line).
 * The pane therefore shows for a row what the sheet and the command line give for it — by construction, not by a
 * second implementation. The diagram behind the markers is drawn separately, at one temperature and one water.
 */
import { getDatabase, LIGAND_ORDER, type LigandName, type LigandTotals, type Regime } from "../chemistry";
import {
  CellError,
  CellOutput,
  CellScalar,
  dicAt,
  dissolvedAt,
  isBlank,
  regimeAt,
  speciesAt,
  toSHEAt,
  waterMarginAt,
} from "../functions";
import { ionicArgumentFor } from "./ionic-input";
import {
  alkalinityFactor,
  dicBasis,
  isAlkalinityUnit,
  molalFactor,
  type FormulaParts,
  type IonicColumn,
  type WaterColumn,
} from "../tables";

/** One ligand argument read per row: the column's number × factor is mg/L as CaCO3 (alkalinity) or mol/kg (total). */
export interface RowLigand {
  readonly ligand: LigandName;
  readonly column: number;
  readonly kind: "alkalinity" | "total";
  readonly factor: number;
  /** REDOX.DIC's basis for an "alkalinity" column: total alkalinity, or bicarbonate (× factor is mg/L as HCO3). */
  readonly basis?: "alkalinity" | "bicarbonate";
}

/** The arguments every row shares, and where the per-row ones come from. */
export interface AnswerPlan {
  readonly metal: string;
  readonly phColumn: number;
  readonly potentialColumn: number;
  /** Temperature column, or −1: then `celsius` for every row. */
  readonly temperatureColumn: number;
  readonly temperatureUnit: "C" | "F";
  readonly celsius: number;
  readonly electrode: string;
  readonly unit: "V" | "mV";
  readonly activity: number;
  /** Ligands read per row. */
  readonly ligands: readonly RowLigand[];
  /** Ligands typed once for every row (mol/kg). */
  readonly typed: LigandTotals;
  /** The conductivity, TDS or ionic-strength column feeding [ionicStrength] per row; absent: ideal solution. */
  readonly ionic?: IonicColumn;
}

/** A row's answer, or the first error a function gave for it (its message names the argument). */
export type SampleAnswer =
  | {
      readonly eSHE: number;
      readonly margin: number;
      readonly species: string;
      readonly regime: Regime;
      /** Equilibrium dissolved metal, µg/L (REDOX.DISSOLVED); null where no solid is stable (#N/A). */
      readonly dissolved: number | null;
      /** The row's temperature, °C, as passed to the functions. */
      readonly celsius: number;
      /** The totals passed to the functions (mol/kg), ligands present only. */
      readonly water: LigandTotals;
      /** The ionic strength passed to the functions (mol/kg); null: none (ideal solution). */
      readonly ionicStrength: number | null;
    }
  | { readonly error: string };

const NUMERIC = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

/** A cell as the spreadsheet would pass it: numbers as numbers (numeric text read as the functions read it). */
function cellValue(cell: unknown, factor = 1): CellScalar {
  if (typeof cell === "number") return factor === 1 ? cell : cell * factor;
  if (cell === null || cell === undefined) return "";
  const text = String(cell);
  if (NUMERIC.test(text)) return factor === 1 ? Number(text) : Number(text) * factor;
  return isBlank(text) ? "" : text;
}

function column(
  rows: readonly (readonly unknown[])[],
  index: number,
  read: (cell: unknown) => CellScalar,
): CellScalar[][] {
  return rows.map((r) => [read(r[index])]);
}

/** A result cell passed on to the next function, as the spreadsheet passes a formula's result. */
const passOn = (cell: CellOutput): CellScalar => (cell instanceof CellError ? "" : cell);

/** Reading as the command line passes it: a number in mV divided by 1000 (the same operation, the same bits). */
function readingValue(unit: "V" | "mV") {
  return (cell: unknown): CellScalar => {
    const v = cellValue(cell);
    return unit === "mV" && typeof v === "number" ? v / 1000 : v;
  };
}

function temperatureValue(unit: "C" | "F") {
  return (cell: unknown): CellScalar => {
    const v = cellValue(cell);
    return unit === "F" && typeof v === "number" ? ((v - 32) * 5) / 9 : v;
  };
}

/** The ligand columns for the functions: each ligand's argument column and the first error per row. */
function ligandColumns(
  plan: AnswerPlan,
  rows: readonly (readonly unknown[])[],
  pH: CellScalar[][],
  temperature: CellScalar | CellScalar[][],
) {
  const args: Partial<Record<LigandName, CellScalar | CellScalar[][]>> = {};
  const errors: (CellError | null)[] = rows.map(() => null);
  for (const [ligand, total] of Object.entries(plan.typed) as [LigandName, number][])
    if (total > 0) args[ligand] = total;
  for (const l of plan.ligands) {
    const values = column(rows, l.column, (c) => cellValue(c, l.factor));
    if (l.kind === "alkalinity") {
      const dic = dicAt(values, pH, temperature, l.basis ?? "alkalinity");
      dic.forEach(([d], r) => (errors[r] ??= d instanceof CellError ? d : null));
      args[l.ligand] = dic.map(([d]) => [passOn(d)]);
    } else args[l.ligand] = values;
  }
  return { args, errors };
}

const at = (input: CellScalar | CellScalar[][] | undefined, r: number): CellScalar =>
  Array.isArray(input) ? input[r][0] : input;

/** The answers of `rows` (cells as the host gives them), one per row, in order. */
export function answerSamples(plan: AnswerPlan, rows: readonly (readonly unknown[])[]): SampleAnswer[] {
  if (rows.length === 0) return [];
  const pH = column(rows, plan.phColumn, (c) => cellValue(c));
  const reading = column(rows, plan.potentialColumn, readingValue(plan.unit));
  const temperature =
    plan.temperatureColumn >= 0
      ? column(rows, plan.temperatureColumn, temperatureValue(plan.temperatureUnit))
      : plan.celsius;
  const isRhe = plan.electrode.trim().toUpperCase() === "RHE";
  const eShe = toSHEAt(reading, plan.electrode, temperature, isRhe ? pH : undefined);
  const potential = eShe.map(([e]) => [passOn(e)]);
  const margin = waterMarginAt(pH, potential, temperature);
  const { args, errors } = ligandColumns(plan, rows, pH, temperature);
  const { carbonate, chloride, sulfur, phosphate } = args;
  // the ionic strength as the command line builds it (REDOX.IONICSTRENGTH for conductivity and TDS)
  const ionic = plan.ionic ? ionicArgumentFor(plan.ionic, rows) : null;
  ionic?.errors.forEach((e, r) => (errors[r] ??= e));
  const I = ionic?.argument;
  const el = plan.metal;
  const species = speciesAt(el, pH, potential, temperature, plan.activity, carbonate, chloride, sulfur, phosphate, I);
  const regime = regimeAt(el, pH, potential, temperature, plan.activity, carbonate, chloride, sulfur, phosphate, I);
  // REDOX.DISSOLVED(element, pH, potential, [temperature], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [unit])
  const dissolved = dissolvedAt(el, pH, potential, temperature, carbonate, chloride, sulfur, phosphate, I, "ug/L");
  return rows.map((_, r): SampleAnswer => {
    // a blank cell in the temperature column is a missing measurement, not 25 °C (as in the command line)
    if (Array.isArray(temperature) && temperature[r][0] === "")
      return { error: "temperature is blank: a missing measurement, so the row has no answer" };
    const cells = [eShe[r][0], errors[r] ?? "", margin[r][0], species[r][0], regime[r][0]];
    const failed = cells.find((c): c is CellError => c instanceof CellError);
    if (failed) return { error: failed.message };
    const [e, , m, s, g] = cells;
    if (typeof e !== "number" || typeof m !== "number" || typeof s !== "string" || s === "" || typeof g !== "string")
      return { error: "a required cell is blank" };
    const d = dissolved[r][0];
    const water: LigandTotals = {};
    for (const ligand of LIGAND_ORDER) {
      const v = at(args[ligand], r);
      if (typeof v === "number" && v > 0) water[ligand] = v;
    }
    const t = at(temperature, r);
    const used = ionic ? ionic.cells[r][0] : null;
    return {
      ionicStrength: typeof used === "number" && used > 0 ? used : null,
      eSHE: e,
      margin: m,
      species: s,
      regime: g as Regime,
      dissolved: typeof d === "number" ? d : null,
      celsius: typeof t === "number" ? t : plan.celsius,
      water,
    };
  });
}

/**
 * A water column → the argument the functions take, with the command line's factors (src/cli/water.ts inputFor,
 * src/tables units): alkalinity units go through REDOX.DIC as mg/L CaCO3; DIC, chloride and sulfate are totals.
 */
export function rowLigand(ligand: LigandName, column: WaterColumn): RowLigand {
  if (ligand === "carbonate" && isAlkalinityUnit(column.unit))
    return {
      ligand,
      column: column.index,
      kind: "alkalinity",
      factor: alkalinityFactor(column.unit),
      basis: dicBasis(column.unit),
    };
  const ownIon: FormulaParts = ligand === "carbonate" ? { C: 1 } : ligand === "chloride" ? { Cl: 1 } : { S: 1, O: 4 };
  return { ligand, column: column.index, kind: "total", factor: molalFactor(column.unit, ownIon, molarMass) };
}

/** g/mol of formula parts from the element records. */
function molarMass(parts: FormulaParts): number {
  let sum = 0;
  for (const [symbol, count] of Object.entries(parts))
    sum += count * (getDatabase().element(symbol)?.atomicWeight ?? NaN);
  return sum;
}

/**
 * REDOX.ASSESS: one call per sample row. For each row it spills the dominant species, the regime, the nearest
 * boundaries above and below (V vs SHE), the water margin (V), and the equilibrium dissolved metal with the solid
 * that controls it — the same answers SPECIES, REGIME, BOUNDARY, WATERMARGIN and DISSOLVED give for that row.
 * Optionally a header row first. Arguments are read and broadcast by broadcast.ts; samples come as single cells or
 * columns (one output row per input row).
 */
import {
  dissolvedAtPoint,
  engineAtPoint,
  getDatabase,
  MAX_DISSOLVED,
  pointBoundary,
  waterMargin,
  type PointEngine,
} from "../chemistry";
import { finish as finishCell, mapCells } from "./broadcast";
import { argumentError, CellError, CellInput, CellOutput, isBlank, toHostError, valueError } from "./cell-values";
import {
  DISSOLVED_UNITS,
  NO_BOUNDARY_ABOVE,
  NO_BOUNDARY_BELOW,
  noSolidForms,
  POINT_ARGS,
  PointArguments,
  temperatureError,
  unitArg,
} from "./stability-functions";

export const ASSESS_COLUMNS = [
  "species",
  "regime",
  "boundary above (V)",
  "boundary below (V)",
  "water margin (V)",
  "dissolved",
  "controlling solid",
] as const;
const WIDTH = ASSESS_COLUMNS.length;

/**
 * The answers of a run of samples, column by column in ASSESS_COLUMNS order: `add` works one sample out with the
 * same engine calls as the single functions (SPECIES, REGIME, BOUNDARY both ways, WATERMARGIN, DISSOLVED), sharing
 * the engine's water and lines between them, and returns the sample's index in the columns.
 */
class AssessAnswers {
  readonly columns: CellOutput[][] = ASSESS_COLUMNS.map(() => []);
  private count = 0;
  /** The dissolved unit's factor for the last element and unit (mol/kg → the unit: atomic weight). */
  private factorElement = "";
  private factorUnit = "";
  private factor = NaN;

  /** `margin`: whether to work out the water margin (the command line has its own, with the overpotential). */
  constructor(private readonly margin: boolean) {}

  /** Adds the sample at (pH, E) in the water `engine` was set to (or the reason it was refused); returns its index. */
  add(element: string, pH: number, E: number, celsius: number, unit: string, engine: PointEngine | string): number {
    const k = this.count++;
    const [species, regime, above, below, margin, dissolved, solid] = this.columns;
    if (typeof engine === "string") {
      const error = temperatureError(engine); // e.g. above 100 °C without S° (temperature-range.ts)
      for (const column of this.columns) column[k] = error;
      return k;
    }
    const dominant = engine.table.species[engine.dominant(pH, E)];
    species[k] = dominant.formula;
    regime[k] = dominant.regime;
    above[k] = pointBoundary(engine, pH, E, 1)?.E ?? NO_BOUNDARY_ABOVE;
    below[k] = pointBoundary(engine, pH, E, -1)?.E ?? NO_BOUNDARY_BELOW;
    margin[k] = this.margin ? waterMargin(pH, E, celsius, 0) : "";
    // the equilibrium dissolved metal and its controlling solid (the engine already holds this row's water)
    const equilibrium = dissolvedAtPoint(engine, pH, E);
    const formula = engine.table.species[equilibrium.solid].formula;
    const soluble = equilibrium.total <= MAX_DISSOLVED;
    dissolved[k] = soluble ? equilibrium.total * this.unitFactor(element, unit) : noSolidForms(formula);
    solid[k] = soluble ? formula : noSolidForms(formula);
    return k;
  }

  /** mol/kg → `unit` for `element`, as REDOX.DISSOLVED converts (DISSOLVED_UNITS). */
  private unitFactor(element: string, unit: string): number {
    if (element !== this.factorElement || unit !== this.factorUnit) {
      this.factorElement = element;
      this.factorUnit = unit;
      this.factor = DISSOLVED_UNITS[unit](getDatabase().element(element)?.atomicWeight ?? NaN);
    }
    return this.factor;
  }
}

/** Works out every sample of `inputs` (the point arguments and the unit) into `answers`; the cells give each sample's index. */
function assessCells(inputs: readonly CellInput[], answers: AssessAnswers): CellOutput[][] {
  return mapCells([...POINT_ARGS, unitArg], inputs, (el, p, e, t, a, co3, cl, s, po4, i, u) =>
    answers.add(el, p, e, t, u, engineAtPoint(getDatabase(), el, t, a, co3, cl, s, po4, i)),
  );
}

/** Reads the header switch: omitted, blank, FALSE or 0 → no header; TRUE or 1 → header. */
function readHeader(header: CellInput): boolean | CellError {
  const value = Array.isArray(header)
    ? header.length === 1 && header[0].length === 1
      ? header[0][0]
      : undefined
    : header;
  if (Array.isArray(header) && value === undefined)
    return argumentError("header", "give one cell (TRUE for a header row)");
  if (isBlank(value) || value === false || value === 0) return false;
  if (value === true || value === 1) return true;
  if (typeof value === "string" && /^\s*(true|false)\s*$/i.test(value)) return /true/i.test(value);
  return argumentError(
    "header",
    `expected TRUE or FALSE, got ${typeof value === "string" ? `the text "${value.slice(0, 24)}"` : String(value)}`,
  );
}

/** Samples must come as single cells or columns: the answer has one row per sample. */
function widthProblem(inputs: readonly CellInput[]): CellError | null {
  for (const input of inputs) {
    if (Array.isArray(input) && Array.isArray(input[0]) && input[0].length > 1) {
      return valueError(
        `give single cells or columns: ASSESS answers one row per sample (got a range ${input.length}×${input[0].length})`,
      );
    }
  }
  return null;
}

/** Names the unit in the dissolved column's header. */
function headerRow(unit: CellInput): CellOutput[] {
  const chosen = mapCells([unitArg], [unit], (u) => u)[0][0];
  const name =
    typeof chosen === "string" && chosen !== "" ? chosen.replace("mg/l", "mg/L").replace("ug/l", "µg/L") : "mol/kg";
  return ASSESS_COLUMNS.map((c) => (c === "dissolved" ? `dissolved (${name})` : c));
}

/** REDOX.ASSESS(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [unit], [header]). */
export function assessAt(...args: [...PointArguments, unit?: CellInput, header?: CellInput]): CellOutput[][] {
  const inputs = args.slice(0, 11); // the point arguments and the unit
  const unit = args[10];
  const header = args[11];
  const wantHeader = readHeader(header);
  const problem = wantHeader instanceof CellError ? wantHeader : widthProblem(inputs);
  if (problem) return [[toHostError(problem)]];
  const answers = new AssessAnswers(true);
  const cells = assessCells(inputs, answers);
  const { columns } = answers;
  // a blank row stays blank, a row with a bad cell shows its error in every column, others their seven answers
  const out = cells.map(([cell]) =>
    typeof cell === "number"
      ? columns.map((column) => finishCell(column[cell]))
      : new Array<CellOutput>(WIDTH).fill(cell),
  );
  return wantHeader ? [headerRow(unit), ...out] : out;
}

/** ASSESS's answers that the command line writes, one column each, one cell per sample. */
export interface AssessedColumns {
  readonly species: CellOutput[];
  readonly regime: CellOutput[];
  readonly above: CellOutput[];
  readonly below: CellOutput[];
  readonly dissolved: CellOutput[];
}

/**
 * ASSESS for a batch of n samples given as rows (1 × n ranges, the command line's batches) or as columns: the
 * species, regime, boundaries and dissolved metal of each sample as columns of n cells, without the water margin (the
 * command line works out its own, with the overpotential). A one-cell answer (an argument's error for the whole
 * batch) fills all n.
 */
export function assessColumns(n: number, ...args: [...PointArguments, unit?: CellInput]): AssessedColumns {
  const answers = new AssessAnswers(false);
  const result = assessCells(args, answers);
  const [species, regime, above, below, , dissolved] = answers.columns;
  // one cell per sample from a row (1 × n) or a column (n × 1) of them; a single cell fills all n
  const cells =
    result.length === 1 && result[0].length === n
      ? result[0]
      : result.length === n && n > 1
        ? result.map((row) => row[0])
        : new Array<CellOutput>(n).fill(result[0][0]);
  const pick = (column: CellOutput[]) =>
    cells.map((cell) => (typeof cell === "number" ? finishCell(column[cell]) : cell));
  return {
    species: pick(species),
    regime: pick(regime),
    above: pick(above),
    below: pick(below),
    dissolved: pick(dissolved),
  };
}

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
import { mapCells } from "./broadcast";
import {
  argumentError,
  CellError,
  CellInput,
  CellOutput,
  isBlank,
  notAvailable,
  toHostError,
  valueError,
} from "./cell-values";
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
// Held in a module constant: in a sandboxed host each global lookup per cell is slow.
const isFiniteNumber = Number.isFinite;

/** The water a sample is evaluated in: ligand totals in mol/kg (0 = absent). */
interface Water {
  celsius: number;
  activity: number;
  carbonate: number;
  chloride: number;
  sulfur: number;
  /** Total orthophosphate, mol/kg as P. */
  phosphate: number;
  ionicStrength: number;
}

/** Equilibrium dissolved metal (mol/kg) and the controlling solid (the point engine set to the row's water, as REDOX.DISSOLVED), or #N/A. */
function dissolvedWithSolid(
  engine: PointEngine,
  pH: number,
  E: number,
): { total: number; controllingSolid: string } | CellError {
  const { total, solid } = dissolvedAtPoint(engine, pH, E);
  const controllingSolid = engine.table.species[solid].formula;
  if (!(total <= MAX_DISSOLVED)) return noSolidForms(controllingSolid);
  return { total, controllingSolid };
}

/** The seven answers for one sample, in ASSESS_COLUMNS order (the same engine calls as the single functions). */
function assessRow(element: string, pH: number, E: number, water: Water, unit: string): CellOutput[] {
  const engine = engineAtPoint(
    getDatabase(),
    element,
    water.celsius,
    water.activity,
    water.carbonate,
    water.chloride,
    water.sulfur,
    water.phosphate,
    water.ionicStrength,
  );
  if (typeof engine === "string") {
    const error = temperatureError(engine); // e.g. above 100 °C without S° (temperature-range.ts)
    return ASSESS_COLUMNS.map(() => error);
  }
  const dominant = engine.table.species[engine.dominant(pH, E)];
  const boundary = (direction: 1 | -1): CellOutput =>
    pointBoundary(engine, pH, E, direction)?.E ?? (direction > 0 ? NO_BOUNDARY_ABOVE : NO_BOUNDARY_BELOW);
  const above = boundary(1);
  const below = boundary(-1);
  const dissolved = dissolvedWithSolid(engine, pH, E); // the engine already holds this row's water
  const weight = getDatabase().element(element)?.atomicWeight ?? NaN;
  return [
    dominant.formula,
    dominant.regime,
    above,
    below,
    waterMargin(pH, E, water.celsius, 0),
    dissolved instanceof CellError ? dissolved : dissolved.total * DISSOLVED_UNITS[unit](weight),
    dissolved instanceof CellError ? dissolved : dissolved.controllingSolid,
  ];
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
  const rows: CellOutput[][] = [];
  const cells = mapCells(
    [...POINT_ARGS, unitArg],
    inputs,
    (el, p, e, t, a, co3, cl, s, po4, i, u) =>
      rows.push(
        assessRow(
          el,
          p,
          e,
          { celsius: t, activity: a, carbonate: co3, chloride: cl, sulfur: s, phosphate: po4, ionicStrength: i },
          u,
        ),
      ) - 1,
  );
  // a blank row stays blank, a row with a bad cell shows its error in every column, others their seven answers
  const out = cells.map(([cell]) =>
    typeof cell === "number" ? finishRow(rows[cell]) : new Array<CellOutput>(WIDTH).fill(cell),
  );
  return wantHeader ? [headerRow(unit), ...out] : out;
}

/** The row's answers as the host shows them, in place (a copy per row would be one more array per sample to collect). */
function finishRow(row: CellOutput[]): CellOutput[] {
  for (let i = 0; i < row.length; i++) row[i] = finishCell(row[i]);
  return row;
}

function finishCell(value: CellOutput): CellOutput {
  if (value instanceof CellError) return toHostError(value);
  if (typeof value === "number" && !isFiniteNumber(value))
    return toHostError(notAvailable("no finite answer exists at this input"));
  return value;
}

/**
 * REDOX.ASSESS: one call per sample row. For each row it spills the dominant species, the regime, the nearest
 * boundaries above and below (V vs SHE), the water margin (V), and the equilibrium dissolved metal with the solid
 * that controls it — the same answers SPECIES, REGIME, BOUNDARY, WATERMARGIN and DISSOLVED give for that row.
 * Optionally a header row first. Arguments are read and broadcast by broadcast.ts; samples come as single cells or
 * columns (one output row per input row).
 */
import { getDatabase } from "../chemistry/database";
import { dissolvedAtPoint, nearestBoundary } from "../chemistry/predominance";
import { dominantSpecies } from "../chemistry/system";
import { waterMargin } from "../chemistry/water";
import { mapCells } from "./broadcast";
import { CellError, CellInput, CellOutput, isBlank, notAvailable, toHostError, valueError } from "./cell-values";
import { activityArg, elementArg, pHArg, potentialArg, temperatureArg } from "./common-args";
import { carbonateArg, chlorideArg, sulfurArg } from "./ligand-args";
import { DISSOLVED_UNITS, systemInWater, unitArg } from "./stability-functions";

export const ASSESS_COLUMNS = ["species", "regime", "boundary above (V)", "boundary below (V)", "water margin (V)", "dissolved", "controlling solid"] as const;
const WIDTH = ASSESS_COLUMNS.length;

/** The water a sample is evaluated in: ligand totals in mol/kg (0 = absent). */
interface Water {
  celsius: number;
  activity: number;
  carbonate: number;
  chloride: number;
  sulfur: number;
}

/**
 * Equilibrium dissolved metal (mol/kg) and the solid controlling it, or #N/A. The one place the dissolved columns
 * come from, so that a chemistry function returning {total, controllingSolid} replaces the body in one line.
 */
function dissolvedWithSolid(element: string, pH: number, E: number, water: Water): { total: number; controllingSolid: string } | CellError {
  const system = systemInWater(element, water.celsius, water.activity, water.carbonate, water.chloride, water.sulfur);
  const found = dissolvedAtPoint(system, pH, E);
  if (!found) return notAvailable("a dissolved species is dominant here: no solid is stable");
  return { total: found.total, controllingSolid: system.species[found.solid].formula };
}

/** The seven answers for one sample, in ASSESS_COLUMNS order. */
function assessRow(element: string, pH: number, E: number, water: Water, unit: string): CellOutput[] {
  const system = systemInWater(element, water.celsius, water.activity, water.carbonate, water.chloride, water.sulfur);
  const dominant = system.species[dominantSpecies(system, pH, E)];
  const boundary = (direction: 1 | -1): CellOutput =>
    nearestBoundary(system, pH, E, direction)?.E ?? notAvailable(`no boundary ${direction > 0 ? "above" : "below"} this point between −3 and +3 V`);
  const dissolved = dissolvedWithSolid(element, pH, E, water);
  const weight = getDatabase().element(element)?.atomicWeight ?? NaN;
  return [
    dominant.formula,
    dominant.regime,
    boundary(1),
    boundary(-1),
    waterMargin(pH, E, water.celsius, 0),
    dissolved instanceof CellError ? dissolved : dissolved.total * DISSOLVED_UNITS[unit](weight),
    dissolved instanceof CellError ? dissolved : dissolved.controllingSolid,
  ];
}

/** Reads the header switch: omitted, blank, FALSE or 0 → no header; TRUE or 1 → header. */
function readHeader(header: CellInput): boolean | CellError {
  const value = Array.isArray(header) ? (header.length === 1 && header[0].length === 1 ? header[0][0] : undefined) : header;
  if (Array.isArray(header) && value === undefined) return valueError("header: give one cell (TRUE for a header row)");
  if (isBlank(value) || value === false || value === 0) return false;
  if (value === true || value === 1) return true;
  if (typeof value === "string" && /^\s*(true|false)\s*$/i.test(value)) return /true/i.test(value);
  return valueError(`header: expected TRUE or FALSE, got ${typeof value === "string" ? `the text "${value.slice(0, 24)}"` : String(value)}`);
}

/** Samples must come as single cells or columns: the answer has one row per sample. */
function widthProblem(inputs: readonly CellInput[]): CellError | null {
  for (const input of inputs) {
    if (Array.isArray(input) && Array.isArray(input[0]) && input[0].length > 1) {
      return valueError(`give single cells or columns: ASSESS answers one row per sample (got a range ${input.length}×${input[0].length})`);
    }
  }
  return null;
}

/** Names the unit in the dissolved column's header. */
function headerRow(unit: CellInput): CellOutput[] {
  const chosen = mapCells([unitArg], [unit], (u) => u)[0][0];
  const name = typeof chosen === "string" && chosen !== "" ? chosen.replace("mg/l", "mg/L").replace("ug/l", "µg/L") : "mol/kg";
  return ASSESS_COLUMNS.map((c) => (c === "dissolved" ? `dissolved (${name})` : c));
}

/** REDOX.ASSESS(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [unit], [header]). */
export function assessAt(
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  activity?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
  unit?: CellInput,
  header?: CellInput,
): CellOutput[][] {
  const inputs = [element, pH, potential, temperature, activity, carbonate, chloride, sulfur, unit];
  const wantHeader = readHeader(header);
  const problem = wantHeader instanceof CellError ? wantHeader : widthProblem(inputs);
  if (problem) return [[toHostError(problem)]];
  const rows: CellOutput[][] = [];
  const cells = mapCells(
    [elementArg, pHArg, potentialArg(), temperatureArg, activityArg, carbonateArg, chlorideArg, sulfurArg, unitArg],
    inputs,
    (el, p, e, t, a, co3, cl, s, u) => rows.push(assessRow(el, p, e, { celsius: t, activity: a, carbonate: co3, chloride: cl, sulfur: s }, u)) - 1,
  );
  // a blank row stays blank, a row with a bad cell shows its error in every column, others their seven answers
  const out = cells.map(([cell]) => (typeof cell === "number" ? rows[cell].map(finishCell) : new Array<CellOutput>(WIDTH).fill(cell)));
  return wantHeader ? [headerRow(unit), ...out] : out;
}

function finishCell(value: CellOutput): CellOutput {
  if (value instanceof CellError) return toHostError(value);
  if (typeof value === "number" && !Number.isFinite(value)) return toHostError(notAvailable("no finite answer exists at this input"));
  return value;
}

/**
 * The argument columns every function takes, for a batch: pH, the reading converted to E vs SHE (REDOX.TOSHE,
 * Nernst per electrode), the temperature in °C, and the distance from the water-stability window
 * (REDOX.WATERMARGIN).
 */
import { CellError, type CellInput, type CellOutput, type CellScalar } from "../functions";
import { toCelsius } from "../tables";
import { answersOf, asRange, numericColumn } from "./batch-cells";
import type { EvaluationPlan } from "./evaluation-plan";
import type { InputRow } from "./record-reader";
import type { WorksheetFunctions } from "./worksheet";

/** The argument columns every function takes: pH, the reading as E vs SHE, the temperature, and the water margin. */
export interface SampleColumns {
  readonly pH: CellScalar[];
  /** The [temperature] argument: a 1 × n range of the column, or one cell for every row. */
  readonly temperature: CellInput;
  /** The temperature cell of each row (for the diagram points). */
  readonly temperatureAt: (r: number) => CellScalar;
  /** REDOX.TOSHE's cells: E vs SHE, or the error of a reading that failed to convert. */
  readonly eShe: CellOutput[];
  readonly potential: CellScalar[];
  readonly margin: CellOutput[];
}

/** The [temperature] argument of a batch: the column converted to °C (blank cells: the fixed one), or the fixed one. */
function temperatureColumn(plan: EvaluationPlan, rows: readonly InputRow[]): CellScalar[] | CellScalar {
  const fixedT = plan.fixedTemperature ?? "";
  if (plan.temperatureColumn === null) return fixedT;
  const scale = plan.temperatureScale;
  const convert = scale === "C" ? undefined : (x: number): number => toCelsius(x, scale);
  return numericColumn(rows, plan.temperatureColumn, plan.format, 1, fixedT, convert);
}

/** Reads pH, reading and temperature columns and converts the readings to E vs SHE (Nernst, per electrode). */
export function sampleColumns(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): SampleColumns {
  const n = rows.length;
  const pH = numericColumn(rows, plan.phColumn, plan.format);
  // Readings in mV are divided by 1000 when they are numbers; anything else goes to the function as written.
  const mV = plan.unit === "mV" ? (x: number): number => x / 1000 : undefined;
  const reading = numericColumn(rows, plan.potentialColumn, plan.format, 1, "", mV);
  const t = temperatureColumn(plan, rows);
  const temperature: CellInput = Array.isArray(t) ? asRange(t) : t;
  const temperatureAt = Array.isArray(t) ? (r: number): CellScalar => t[r] : (): CellScalar => t;
  const isRhe = plan.electrode.trim().toUpperCase() === "RHE";
  const eShe = answersOf(fns.toShe(asRange(reading), plan.electrode, temperature, isRhe ? asRange(pH) : undefined), n);
  // A reading that failed to convert is an error cell the spreadsheet would pass on as it is.
  const potential: CellScalar[] = new Array(n);
  for (let r = 0; r < n; r++) {
    const e = eShe[r];
    potential[r] = typeof e === "object" && e instanceof CellError ? "" : (e as number | string);
  }
  const margin = answersOf(fns.waterMargin(asRange(pH), asRange(potential), temperature, plan.overpotential), n);
  return { pH, temperature, temperatureAt, eShe, potential, margin };
}

/**
 * Evaluates one batch of CSV rows: builds 1 × n columns from the mapped input columns, calls the worksheet
 * functions on them (exactly as a worksheet range would), and writes the results — one line per row, in file
 * order — with per-row error text, the messages the command line prints, regime counts and diagram samples.
 * No I/O here.
 */
import { CellError, type CellOutput } from "../functions";
import type { CsvBytes } from "./csv-bytes";
import type { DiagramSamples } from "./diagrams";
import type { EvaluationPlan } from "./evaluation-plan";
import { groupedOrder } from "./grouped-order";
import { cellKinds, writeBlankLine, writeOutputLine } from "./output-line";
import type { InputRow } from "./record-reader";
import {
  argumentColumns,
  argumentNotes,
  errorsText,
  pushBlankMessages,
  rowProblems,
  skippedRowMessage,
  type RowMessage,
} from "./row-messages";
import { offerRowSamples } from "./sample-offers";
import { sampleColumns } from "./sample-columns";
import { targetColumns, type TargetColumns } from "./target-columns";
import { waterColumns } from "./water-columns";
import type { WorksheetFunctions } from "./worksheet";

export { outputHeader, type EvaluationPlan, type MetalTarget } from "./evaluation-plan";
export { clip, ECHO_LIMIT, type RowMessage } from "./row-messages";
export type { SamplePoint } from "./sample-offers";
export type { InputRow };

export interface BatchResult {
  readonly messages: RowMessage[];
  /** Rows with at least one #VALUE! result, or an #N/A caused by an input cell. */
  readonly errorRows: number;
  /** Rows whose results are blank because a required cell is blank. */
  readonly blankRows: number;
  /** Regime counts per target prefix. */
  readonly regimes: Map<string, Map<string, number>>;
}

/** Writes a row's result cells in output order; an error passed on fills every metal's five cells. */
function fillRowCells(
  cells: CellOutput[],
  r: number,
  e: CellOutput,
  margin: CellOutput,
  ligandCells: readonly CellOutput[][],
  perTarget: readonly TargetColumns[],
  passOn: CellError | null,
): void {
  let k = 0;
  cells[k++] = e;
  cells[k++] = margin;
  for (const c of ligandCells) cells[k++] = c[r];
  for (const p of perTarget) {
    if (passOn) {
      for (let j = 0; j < 5; j++) cells[k++] = passOn;
    } else {
      cells[k++] = p.species[r];
      cells[k++] = p.regime[r];
      cells[k++] = p.above[r];
      cells[k++] = p.below[r];
      cells[k++] = p.dissolved[r];
    }
  }
}

/** Counts a converted row's regime per metal target (`counts` in the targets' order). */
function countRegimes(r: number, perTarget: readonly TargetColumns[], counts: readonly Map<string, number>[]): void {
  for (let t = 0; t < perTarget.length; t++) {
    const p = perTarget[t];
    const regime = p.regime[r];
    if (typeof regime !== "string" || regime === "" || typeof p.species[r] !== "string") continue;
    counts[t].set(regime, (counts[t].get(regime) ?? 0) + 1);
  }
}

/**
 * Where each file row's results are in the columns: the functions see the rows grouped by metal and temperature
 * (groupedOrder) — `sorted` in that order — and `at[i]` is file row i's index there; null when not grouped.
 */
function groupedRows(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
): { sorted: readonly InputRow[]; at: Int32Array | null } {
  const { metalColumn, temperatureColumn } = plan;
  if (metalColumn === null && temperatureColumn === null) return { sorted: rows, at: null };
  const order = groupedOrder(rows, metalColumn, temperatureColumn);
  const at = new Int32Array(rows.length);
  for (let k = 0; k < order.length; k++) at[order[k]] = k;
  return { sorted: order.map((i) => rows[i]), at };
}

/**
 * Evaluates a batch: whole-batch columns through the functions (rows grouped by metal and temperature), then one
 * output line per row into `out`, with its messages and diagram samples, in file order.
 */
export function evaluateBatch(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
  out: CsvBytes,
  diagrams: DiagramSamples | null = null,
): BatchResult {
  const n = rows.length;
  const { sorted, at } = groupedRows(plan, rows);
  const samples = sampleColumns(plan, sorted, fns);
  const water = waterColumns(plan, sorted, fns, samples);
  const perTarget = targetColumns(plan, sorted, fns, samples, water);
  const { eShe, margin } = samples;
  const { ligandCells, carbonateErrors, ionic } = water;
  const offers = diagrams !== null && plan.diagrams ? diagrams : null;
  const argColumns = argumentColumns(plan);
  const argNotes = argumentNotes(plan, ionic);
  const kinds = cellKinds(ligandCells.length, perTarget.length);
  const missingTemperature =
    plan.temperatureColumn !== null && plan.fixedTemperature === undefined ? plan.temperatureColumn : null;
  const messages: RowMessage[] = [];
  const counts = perTarget.map(() => new Map<string, number>());
  let errorRows = 0;
  let blankRows = 0;
  const cellCount = 2 + ligandCells.length + 5 * perTarget.length;

  const cells: CellOutput[] = new Array(cellCount); // reused: each row's line is written before the next row
  for (let i = 0; i < n; i++) {
    const row = rows[i];
    const r = at === null ? i : at[i];
    const skipped = skippedRowMessage(plan, row, missingTemperature);
    if (skipped !== null) {
      messages.push(skipped);
      writeBlankLine(out, plan, row, cellCount);
      blankRows++;
      continue;
    }
    const e = eShe[r];
    const eError = typeof e === "object" && e instanceof CellError ? e : null;
    // the spreadsheet passes an error in an argument cell straight through: the potential first, then the carbonate
    const passOn = eError ?? (carbonateErrors === null ? null : carbonateErrors[r]) ?? ionic?.errors[r] ?? null;
    fillRowCells(cells, r, e, eError ?? margin[r], ligandCells, perTarget, passOn);
    const problems = rowProblems(cells, row.line, argColumns, argNotes);
    if (problems !== null) {
      errorRows++;
      for (const m of problems) messages.push(m);
    } else if (pushBlankMessages(plan, row, messages)) blankRows++;
    if (typeof e === "number" && !passOn) {
      countRegimes(r, perTarget, counts);
      if (offers !== null) offerRowSamples(plan, r, row.line, samples, water, perTarget, offers);
    }
    writeOutputLine(out, plan, row, cells, kinds, problems === null ? "" : errorsText(problems));
  }
  const regimes = new Map<string, Map<string, number>>();
  for (let t = 0; t < perTarget.length; t++) if (counts[t].size > 0) regimes.set(perTarget[t].target.prefix, counts[t]);
  return { messages, errorRows, blankRows, regimes };
}

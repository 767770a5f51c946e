/**
 * Evaluates one batch of CSV rows: builds n × 1 columns from the mapped input columns, calls the worksheet
 * functions on them (exactly as a worksheet range would), and turns the results into output cells, per-row error
 * text and the messages the command line prints. No I/O here.
 */
import { DEFAULT_CELSIUS, type LigandName, type LigandTotals } from "../chemistry";
import {
  carbonateArg,
  CellError,
  CellInput,
  CellOutput,
  CellScalar,
  chlorideArg,
  ionicStrengthArgument,
  isBlank,
  mapCells,
  phosphateArg,
  sulfurArg,
} from "../functions";
import { IONIC_UNITS, readNumber, toCelsius, type TemperatureScale } from "../tables";
import { ionicBasis, IONIC_OUTPUT, ionicWords, type IonicPlan } from "./ionic";
import { numberField, textField, type CsvFormat, type NumberKind } from "./csv-format";
import type { DissolvedUnit, PotentialUnitOption } from "./options";
import type { InputRow } from "./record-reader";
import { regimeColumn } from "./regimes";
import { LIGAND_OUTPUT, type LigandInput } from "./water";
import type { WorksheetFunctions } from "./worksheet";
import type { DiagramSamples } from "./diagrams";

/** A metal whose results fill one group of columns: a fixed metal, or the per-row metal column. */
export interface MetalTarget {
  /** Column-name prefix: the symbol ("Fe") or "metal" for the per-row column. */
  readonly prefix: string;
  /** The symbol for a fixed metal; null for the per-row column. */
  readonly symbol: string | null;
}

/** Everything decided before the first data row: which column feeds which argument, and the fixed arguments. */
export interface EvaluationPlan {
  readonly headers: readonly string[];
  readonly phColumn: number;
  readonly potentialColumn: number;
  readonly temperatureColumn: number | null;
  readonly metalColumn: number | null;
  /**
   * Fixed temperature °C given on the command line: every row's without a column, and a blank cell's in one.
   * Undefined: the functions' default without a column, and a blank cell is a missing measurement (blank results).
   */
  readonly fixedTemperature: number | undefined;
  /** Scale of the temperature column's numbers (converted to °C for the functions). */
  readonly temperatureScale: TemperatureScale;
  readonly electrode: string;
  readonly unit: PotentialUnitOption;
  readonly activity: number;
  readonly dissolvedUnit: DissolvedUnit;
  readonly overpotential: number;
  readonly targets: readonly MetalTarget[];
  readonly keepInput: boolean;
  /** Columns feeding the [carbonate], [chloride], [sulfur] arguments (empty: pure water). */
  readonly ligands: readonly LigandInput[];
  /** Where each row's [ionicStrength] comes from (absent: none, ideal solution). */
  readonly ionic?: IonicPlan;
  /** Delimiter, decimal mark, text neutralising and precision of the input and the results. */
  readonly format: CsvFormat;
  /** Whether the batch results carry the sample points for diagrams. */
  readonly diagrams: boolean;
}

export const RESULT_SUFFIXES = ["species", "regime", "boundary_above_V", "boundary_below_V"] as const;

/** Unit as it appears in a column name: ug/L → ug_L. */
export function unitSlug(unit: DissolvedUnit): string {
  return unit.replace("/", "_");
}

/** Header of the results CSV. */
export function outputHeader(plan: EvaluationPlan): string[] {
  const header = plan.keepInput ? [...plan.headers] : [];
  header.push("E_SHE_V", "water_margin_V");
  for (const l of plan.ligands) header.push(LIGAND_OUTPUT[l.ligand]);
  if (usesIonic(plan)) header.push(IONIC_OUTPUT);
  for (const t of plan.targets) {
    for (const s of RESULT_SUFFIXES) header.push(`${t.prefix}_${s}`);
    header.push(`${t.prefix}_dissolved_${unitSlug(plan.dissolvedUnit)}`);
  }
  header.push("errors");
  return header;
}

export type { InputRow };

/** A point for a diagram: the sample's pH, E vs SHE, its regime and temperature, and the file line. */
export interface SamplePoint {
  readonly symbol: string;
  readonly pH: number;
  readonly E: number;
  readonly regime: string;
  readonly species: string;
  readonly celsius: number;
  readonly line: number;
  /** The row's ligand totals (mol/kg) where it has any. */
  readonly ligands?: LigandTotals;
}

export interface RowMessage {
  readonly line: number;
  /** Column header the message is about, when it is about one. */
  readonly column: string | null;
  readonly text: string;
  readonly kind: "error" | "blank";
}

export interface BatchResult {
  /** Output rows in file order, each a CSV line ending in a newline. */
  readonly lines: string[];
  readonly messages: RowMessage[];
  /** Rows with at least one #VALUE! result, or an #N/A caused by an input cell. */
  readonly errorRows: number;
  /** Rows whose results are blank because a required cell is blank. */
  readonly blankRows: number;
  /** Regime counts per target prefix. */
  readonly regimes: Map<string, Map<string, number>>;
}

/** A result cell as CSV text: numbers rounded by kind (never quoted), error values as their code. */
function cellText(value: CellOutput, kind: NumberKind, format: CsvFormat): string {
  if (typeof value === "number") return numberField(value, kind, format);
  if (typeof value === "string") return textField(value, format);
  return value.code;
}

/** Echoed input is cut to this many characters in messages and the errors column. */
export const ECHO_LIMIT = 200;

/** Text cut to `limit` characters, with an ellipsis and the length left out. */
export function clip(text: string, limit = ECHO_LIMIT): string {
  return text.length <= limit
    ? text
    : `${text.slice(0, limit)}… (${(text.length - limit).toLocaleString("en-US")} more characters)`;
}

/**
 * A column of cells for the functions, one cell per row; the functions get it as a 1 × n range (one array for the
 * batch, not one per row: a range broadcasts the same along either dimension). Numeric text (with the file's decimal
 * mark) becomes the number the functions would read from it, × factor or converted by `convert` (they take plain
 * numbers without reading them again, once per function instead of six times); anything else goes as written, so
 * that the function's own message says what is wrong with it.
 */
function numericColumn(
  rows: readonly InputRow[],
  index: number,
  format: CsvFormat,
  factor = 1,
  blank: CellScalar = "",
  convert?: (x: number) => number,
): CellScalar[] {
  const out: CellScalar[] = new Array(rows.length);
  const mark = format.decimalMark;
  for (let r = 0; r < rows.length; r++) {
    const text = rows[r].fields[index] ?? "";
    const x = readNumber(text, mark);
    out[r] = x !== null ? (convert ? convert(x) : x * factor) : isBlank(text) ? blank : text;
  }
  return out;
}

function textColumn(rows: readonly InputRow[], index: number): CellScalar[] {
  const out: CellScalar[] = new Array(rows.length);
  for (let r = 0; r < rows.length; r++) out[r] = rows[r].fields[index] ?? "";
  return out;
}

/** A batch's cells as the range the functions take: one row of n cells. */
const asRange = (cells: CellScalar[]): CellScalar[][] => [cells];

/** A function's answers for a batch of n rows, one per row (a one-cell answer, an argument's error, fills all n). */
function answersOf(result: CellOutput[][], n: number): CellOutput[] {
  const first = result[0];
  if (result.length === 1 && first.length === n) return first;
  return new Array<CellOutput>(n).fill(first[0]);
}

/** BOUNDARY's direction argument as a 2 × 1 range: above (1) in the first row of the answer, below (−1) in the second. */
const DIRECTIONS: CellScalar[][] = [[1], [-1]];

/** The two rows of answers of a call over a 2 × n broadcast, each one per row (a one-cell answer fills both). */
function twoAnswersOf(result: CellOutput[][], n: number): [CellOutput[], CellOutput[]] {
  if (result.length === 2 && result[0].length === n) return [result[0], result[1]];
  const fill = new Array<CellOutput>(n).fill(result[0][0]);
  return [fill, fill];
}

/** #VALUE! is always the input's fault; #N/A only when its message names an input (no DIC for that alkalinity). */
const SERIOUS = new Set(["#VALUE!"]);
const LIGAND_ARG = {
  carbonate: carbonateArg,
  chloride: chlorideArg,
  sulfur: sulfurArg,
  phosphate: phosphateArg,
} as const;

/**
 * Argument names of the worksheet functions → the input column that fed them. An error of the functions records
 * the argument at fault (CellError.argument), which is how a message is tied to a column.
 */
function argumentColumns(plan: EvaluationPlan): Record<string, string | null> {
  const h = (i: number | null): string | null => (i === null ? null : plan.headers[i]);
  const columns: Record<string, string | null> = {
    pH: h(plan.phColumn),
    reading: h(plan.potentialColumn),
    potential: h(plan.potentialColumn),
    temperature: h(plan.temperatureColumn),
    element: h(plan.metalColumn),
  };
  if (plan.ionic?.kind === "column") {
    columns.ionicStrength = h(plan.ionic.column.index);
    if (ionicBasis(plan.ionic.column.unit) !== null) columns.value = h(plan.ionic.column.index);
  }
  for (const l of plan.ligands) {
    columns[l.ligand] = h(l.column);
    if (l.kind === "alkalinity") {
      columns.alkalinity = h(l.column);
      columns["alkalinity, pH"] = h(l.column);
    }
  }
  return columns;
}

/**
 * The argument at fault as the error records it (CellError.argument; the message text is never parsed) and the
 * message without its "argument: " lead.
 */
function splitMessage(error: CellError): [string | null, string] {
  if (error.argument === undefined) return [null, error.message];
  const lead = `${error.argument}: `;
  return [error.argument, error.message.startsWith(lead) ? error.message.slice(lead.length) : error.message];
}

/**
 * The order the functions see a batch's rows in: grouped by metal, and within a metal by temperature (each in order
 * of first appearance; inside a group the file's order). The engine keeps one element's conditions from row to
 * row, so a group costs one change of element and temperature instead of one per row.
 */
function groupedOrder(
  rows: readonly InputRow[],
  metalColumn: number | null,
  temperatureColumn: number | null,
): number[] {
  const metals = new Map<string, Map<string, number[]>>();
  for (let i = 0; i < rows.length; i++) {
    const f = rows[i].fields;
    const metal = metalColumn === null ? "" : (f[metalColumn] ?? "").trim();
    const celsius = temperatureColumn === null ? "" : (f[temperatureColumn] ?? "").trim();
    let temperatures = metals.get(metal);
    if (!temperatures) metals.set(metal, (temperatures = new Map()));
    const group = temperatures.get(celsius);
    if (group) group.push(i);
    else temperatures.set(celsius, [i]);
  }
  const order: number[] = [];
  for (const temperatures of metals.values())
    for (const group of temperatures.values()) for (const i of group) order.push(i);
  return order;
}

/**
 * Evaluates a batch. The rows are handed to the functions grouped by metal and temperature (groupedOrder), and the
 * results — lines and messages — are put back in file order; the rows' samples are offered to `diagrams` in file
 * order too (its random choice depends on the order).
 */
export function evaluateBatch(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
  diagrams: DiagramSamples | null = null,
): BatchResult {
  const { metalColumn, temperatureColumn } = plan;
  const grouped = metalColumn !== null || temperatureColumn !== null;
  const order = grouped ? groupedOrder(rows, metalColumn, temperatureColumn) : null;
  const sorted = order === null ? rows : order.map((i) => rows[i]);
  const { result, columns } = evaluateInOrder(plan, sorted, fns);
  if (diagrams !== null && plan.diagrams) offerSamples(plan, sorted, columns, order, diagrams);
  if (order === null) return result;
  const out: string[] = new Array(rows.length);
  for (let k = 0; k < order.length; k++) out[order[k]] = result.lines[k];
  // a stable sort: a row's messages keep their order
  const messages = result.messages.sort((a, b) => a.line - b.line);
  return { ...result, lines: out, messages };
}

/** The argument columns every function takes: pH, the reading as E vs SHE, the temperature, and the water margin. */
interface SampleColumns {
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
function sampleColumns(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): SampleColumns {
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
    potential[r] = e instanceof CellError ? "" : (e as number | string);
  }
  const margin = answersOf(fns.waterMargin(asRange(pH), asRange(potential), temperature, plan.overpotential), n);
  return { pH, temperature, temperatureAt, eShe, potential, margin };
}

/** The water of a batch: ligand and ionic-strength arguments, their output cells, and the errors passed on. */
interface WaterColumns {
  readonly ligandArgs: Partial<Record<LigandName, CellScalar[]>>;
  readonly ligandCells: CellOutput[][];
  /** REDOX.DIC's errors (carbonate from alkalinity), passed on to every function taking the carbonate. */
  readonly carbonateErrors: (CellError | null)[] | null;
  readonly ionic: IonicColumn | null;
}

/** Each ligand's argument column and output cells (carbonate from alkalinity via REDOX.DIC), then the ionic strength. */
function waterColumns(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
  samples: SampleColumns,
): WaterColumns {
  const n = rows.length;
  const f = plan.format;
  const { pH, temperature } = samples;
  const ligandArgs: Partial<Record<LigandName, CellScalar[]>> = {};
  const ligandCells: CellOutput[][] = [];
  let carbonateErrors: (CellError | null)[] | null = null;
  for (const l of plan.ligands) {
    const column = numericColumn(rows, l.column, f, l.factor);
    if (l.kind === "alkalinity") {
      const dic = answersOf(fns.dic(asRange(column), asRange(pH), temperature), n);
      carbonateErrors = dic.map((d) => (d instanceof CellError ? d : null));
      ligandArgs.carbonate = dic.map((d) => (d instanceof CellError ? "" : (d as number | string)));
      ligandCells.push(dic);
    } else {
      ligandArgs[l.ligand] = column;
      // the output cell: the total as the functions read it ("" where blank)
      const read = answersOf(
        mapCells([LIGAND_ARG[l.ligand]], [asRange(column)], (x) => x),
        n,
      );
      ligandCells.push(read.map((cell, r) => (isBlank(column[r]) ? "" : cell)));
    }
  }
  const ionic = ionicColumn(plan, rows, fns);
  if (ionic) ligandCells.push(ionic.cells);
  return { ligandArgs, ligandCells, carbonateErrors, ionic };
}

/** One metal's result columns: species, regime, the boundaries above and below, and the dissolved amount. */
interface TargetColumns {
  readonly target: MetalTarget;
  /** Each row's element cell (the per-row metal column), or null for a fixed metal. */
  readonly elements: CellScalar[] | null;
  readonly species: CellOutput[];
  readonly regime: CellOutput[];
  readonly above: CellOutput[];
  readonly below: CellOutput[];
  readonly dissolved: CellOutput[];
}

/** Calls the stability functions once per metal target over the whole batch (as a worksheet range would). */
function targetColumns(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
  samples: SampleColumns,
  water: WaterColumns,
): TargetColumns[] {
  const n = rows.length;
  const { temperature } = samples;
  const pH = asRange(samples.pH);
  const potential = asRange(samples.potential);
  const arg = (cells: CellScalar[] | undefined): CellInput => (cells === undefined ? undefined : asRange(cells));
  const { carbonate, chloride, sulfur, phosphate } = water.ligandArgs;
  const ionicStrength = water.ionic?.argument;
  // the water arguments in the order every stability function takes them, after element, pH, potential, temperature
  const waterArgs = [arg(carbonate), arg(chloride), arg(sulfur), arg(phosphate), ionicStrength] as const;
  return plan.targets.map((t) => {
    const elements = t.symbol === null ? textColumn(rows, plan.metalColumn as number) : null;
    const element: CellInput = elements === null ? t.symbol : asRange(elements);
    const sample = [element, pH, potential, temperature] as const;
    const species = answersOf(fns.species(...sample, plan.activity, ...waterArgs), n);
    // one BOUNDARY call for both directions: a 2 × 1 direction range broadcasts to the rows above and below
    const [above, below] = twoAnswersOf(fns.boundary(...sample, plan.activity, ...waterArgs, DIRECTIONS), n);
    return {
      target: t,
      elements,
      species,
      regime: regimeColumn(species, elements ?? (t.symbol as string)),
      above,
      below,
      // DISSOLVED has no activity: it is the controlling solid's solubility
      dissolved: answersOf(fns.dissolved(...sample, ...waterArgs, plan.dissolvedUnit), n),
    };
  });
}

/** Notes added to messages about converted arguments: the functions name them in mol/kg or °C, say the source unit. */
function argumentNotes(plan: EvaluationPlan, ionic: WaterColumns["ionic"]): Record<string, string> {
  const scale = plan.temperatureScale;
  const argNotes: Record<string, string> = {};
  for (const l of plan.ligands)
    if (l.kind === "total" && l.factor !== 1) argNotes[l.ligand] = ` (converted from ${l.unit})`;
  if (ionic?.note) argNotes[ionic.note.arg] = ionic.note.text;
  if (scale !== "C") argNotes.temperature = ` (°C, converted from the column's ${scale === "F" ? "°F" : "K"})`;
  return argNotes;
}

/** The message of a row whose results are all left blank (a blank record, a missing temperature), or null. */
function skippedRowMessage(plan: EvaluationPlan, row: InputRow, missingTemperature: number | null): RowMessage | null {
  if (isBlank(row.fields[plan.phColumn]) && row.fields.every(isBlank)) {
    return {
      line: row.line,
      column: null,
      text: "a record of blank cells; its results are left blank",
      kind: "blank",
    };
  }
  if (missingTemperature !== null && isBlank(row.fields[missingTemperature])) {
    const text = "blank: a missing measurement, this row's results are left blank (--temperature gives a default)";
    return { line: row.line, column: plan.headers[missingTemperature], text, kind: "blank" };
  }
  return null;
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

/** A row's error messages, one per distinct problem, tied to the input column at fault; null when there are none. */
function rowProblems(
  cells: readonly CellOutput[],
  line: number,
  argColumns: Record<string, string | null>,
  argNotes: Record<string, string>,
): RowMessage[] | null {
  let problems: RowMessage[] | null = null;
  for (const c of cells) {
    if (!(c instanceof CellError)) continue;
    const [arg, rest] = splitMessage(c);
    if (
      !SERIOUS.has(c.code) &&
      !(c.code === "#N/A" && arg !== null && Object.prototype.hasOwnProperty.call(argColumns, arg))
    )
      continue;
    const col = arg !== null && arg in argColumns ? argColumns[arg] : null;
    const text = clip(
      col !== null ? `${rest}${(arg !== null && argNotes[arg]) || ""} (${c.code})` : `${c.message} (${c.code})`,
    );
    problems ??= [];
    if (!problems.some((m) => m.column === col && m.text === text))
      problems.push({ line, column: col, text, kind: "error" });
  }
  return problems;
}

/**
 * Messages for the blank cells of an error-free row: a blank required cell leaves the results blank (returns true);
 * otherwise a blank ligand or ionic-strength cell means the row is evaluated without it.
 */
function pushBlankMessages(plan: EvaluationPlan, row: InputRow, messages: RowMessage[]): boolean {
  const blanks: string[] = [];
  if (isBlank(row.fields[plan.phColumn])) blanks.push(plan.headers[plan.phColumn]);
  if (isBlank(row.fields[plan.potentialColumn])) blanks.push(plan.headers[plan.potentialColumn]);
  if (plan.metalColumn !== null && isBlank(row.fields[plan.metalColumn])) blanks.push(plan.headers[plan.metalColumn]);
  if (blanks.length > 0) {
    for (const b of blanks)
      messages.push({ line: row.line, column: b, text: "blank; this row's results are left blank", kind: "blank" });
    return true;
  }
  for (const l of plan.ligands) {
    if (isBlank(row.fields[l.column]))
      messages.push({
        line: row.line,
        column: plan.headers[l.column],
        text: `blank; this row is evaluated without ${l.ligand}`,
        kind: "blank",
      });
  }
  if (plan.ionic?.kind === "column" && isBlank(row.fields[plan.ionic.column.index])) {
    const text = "blank; this row is evaluated without the ionic-strength correction (ideal solution)";
    messages.push({ line: row.line, column: plan.headers[plan.ionic.column.index], text, kind: "blank" });
  }
  return false;
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

/** The batch's columns a diagram sample is made of, in the order the functions saw the rows. */
interface EvaluatedColumns {
  readonly samples: SampleColumns;
  readonly ligandArgs: WaterColumns["ligandArgs"];
  readonly perTarget: readonly TargetColumns[];
  /** 1 for a row whose results count (a converted reading, no error passed on): its regimes and samples. */
  readonly counted: Uint8Array;
}

/**
 * Offers each counted row's samples (one per metal with a regime) to the diagrams, in file order; a sample's point
 * is made only when the diagram keeps it (DEFAULT_CELSIUS where the temperature is blank).
 */
function offerSamples(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  columns: EvaluatedColumns,
  order: readonly number[] | null,
  diagrams: DiagramSamples,
): void {
  const { samples, ligandArgs, perTarget, counted } = columns;
  const n = rows.length;
  let position: Int32Array | null = null; // file index → index in `rows`
  if (order !== null) {
    position = new Int32Array(n);
    for (let k = 0; k < n; k++) position[order[k]] = k;
  }
  for (let i = 0; i < n; i++) {
    const r = position === null ? i : position[i];
    if (counted[r] === 0) continue;
    for (const p of perTarget) {
      const regime = p.regime[r];
      const species = p.species[r];
      if (typeof regime !== "string" || regime === "" || typeof species !== "string") continue;
      const symbol = diagrams.offer(p.target.symbol ?? String(p.elements![r]).trim());
      if (symbol === null) continue;
      const tCell = samples.temperatureAt(r);
      const celsius = isBlank(tCell) ? DEFAULT_CELSIUS : Number(tCell);
      const E = samples.eShe[r] as number;
      const point: SamplePoint = { symbol, pH: Number(samples.pH[r]), E, regime, species, celsius, line: rows[r].line };
      const ligands = rowLigands(plan, r, ligandArgs);
      diagrams.keep(ligands ? { ...point, ligands } : point);
    }
  }
}

/** A row's ligand totals (mol/kg) where it has any. */
function rowLigands(plan: EvaluationPlan, r: number, ligandArgs: WaterColumns["ligandArgs"]): LigandTotals | undefined {
  let ligands: LigandTotals | undefined;
  for (const l of plan.ligands) {
    const x = ligandArgs[l.ligand]![r];
    if (typeof x === "number" && x > 0) (ligands ??= {})[l.ligand] = x;
  }
  return ligands;
}

/** The errors cell: each problem prefixed by its column. */
function errorsText(problems: readonly RowMessage[]): string {
  return problems.map((m) => (m.column ? `${clip(m.column)}: ${m.text}` : m.text)).join("; ");
}

/** Evaluates rows in the order given: whole-batch columns through the functions, then one output line per row. */
function evaluateInOrder(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
): { result: BatchResult; columns: EvaluatedColumns } {
  const n = rows.length;
  const samples = sampleColumns(plan, rows, fns);
  const water = waterColumns(plan, rows, fns, samples);
  const perTarget = targetColumns(plan, rows, fns, samples, water);
  const { eShe, margin } = samples;
  const { ligandCells, carbonateErrors, ionic } = water;
  const argColumns = argumentColumns(plan);
  const argNotes = argumentNotes(plan, ionic);
  const kinds = cellKinds(ligandCells.length, perTarget.length);
  const missingTemperature =
    plan.temperatureColumn !== null && plan.fixedTemperature === undefined ? plan.temperatureColumn : null;
  const out: string[] = new Array(n);
  const messages: RowMessage[] = [];
  const counts = perTarget.map(() => new Map<string, number>());
  const counted = new Uint8Array(n);
  let errorRows = 0;
  let blankRows = 0;
  const cellCount = 2 + ligandCells.length + 5 * perTarget.length;

  const cells: CellOutput[] = new Array(cellCount); // reused: each row's line is written before the next row
  for (let r = 0; r < n; r++) {
    const row = rows[r];
    const skipped = skippedRowMessage(plan, row, missingTemperature);
    if (skipped !== null) {
      messages.push(skipped);
      out[r] = blankLine(plan, row, cellCount);
      blankRows++;
      continue;
    }
    const e = eShe[r];
    const eError = e instanceof CellError ? e : null;
    // the spreadsheet passes an error in an argument cell straight through: the potential first, then the carbonate
    const passOn = eError ?? (carbonateErrors === null ? null : carbonateErrors[r]) ?? ionic?.errors[r] ?? null;
    fillRowCells(cells, r, e, eError ?? margin[r], ligandCells, perTarget, passOn);
    const problems = rowProblems(cells, row.line, argColumns, argNotes);
    if (problems !== null) {
      errorRows++;
      for (const m of problems) messages.push(m);
    } else if (pushBlankMessages(plan, row, messages)) blankRows++;
    if (typeof e === "number" && !passOn) {
      counted[r] = 1;
      countRegimes(r, perTarget, counts);
    }
    out[r] = outputLine(plan, row, cells, kinds, problems === null ? "" : errorsText(problems));
  }
  const regimes = new Map<string, Map<string, number>>();
  for (let t = 0; t < perTarget.length; t++) if (counts[t].size > 0) regimes.set(perTarget[t].target.prefix, counts[t]);
  const result = { lines: out, messages, errorRows, blankRows, regimes };
  return { result, columns: { samples, ligandArgs: water.ligandArgs, perTarget, counted } };
}

/** Whether the results carry an ionic-strength column (a fixed value or a column feeds the functions). */
function usesIonic(plan: EvaluationPlan): boolean {
  return plan.ionic !== undefined && plan.ionic.kind !== "ideal";
}

/** A batch's [ionicStrength]: the argument, the output cell and the error passed on of each row, and a unit note. */
interface IonicColumn {
  readonly argument: CellInput;
  readonly cells: CellOutput[];
  readonly errors: readonly (CellError | null)[];
  readonly note: { readonly arg: string; readonly text: string } | null;
}

/**
 * The [ionicStrength] of a batch: a fixed value, or a column through ionicStrengthArgument (a stated ionic strength
 * × its unit's factor, or a conductivity or TDS reading through REDOX.IONICSTRENGTH). Blank cells: that row is ideal.
 * ionicStrengthArgument, shared with the pane, takes and gives n × 1 ranges.
 */
function ionicColumn(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): IonicColumn | null {
  const ionic = plan.ionic;
  if (ionic === undefined || ionic.kind === "ideal") return null;
  const n = rows.length;
  if (ionic.kind === "fixed") {
    const none = new Array<CellError | null>(n).fill(null);
    return { argument: ionic.value, cells: new Array<CellOutput>(n).fill(ionic.value), errors: none, note: null };
  }
  const { index, unit } = ionic.column;
  const { factor } = IONIC_UNITS[unit];
  const basis = ionicBasis(unit);
  const values = numericColumn(rows, index, plan.format, factor).map((v) => [v]);
  const column = ionicStrengthArgument(values, basis, fns.ionicStrength);
  const note =
    factor === 1
      ? null
      : { arg: basis === null ? "ionicStrength" : "value", text: ` (converted from ${ionicWords(ionic.column)})` };
  return {
    argument: asRange(column.argument.map(([v]) => v)),
    cells: column.cells.map(([c]) => c),
    errors: column.errors,
    note,
  };
}

/** How each result cell's number is rounded, in output order (see outputHeader). */
function cellKinds(ligandColumns: number, targets: number): NumberKind[] {
  const kinds: NumberKind[] = ["volts", "volts"];
  for (let i = 0; i < ligandColumns; i++) kinds.push("amount");
  for (let t = 0; t < targets; t++) kinds.push("amount", "amount", "volts", "volts", "amount");
  return kinds;
}

/**
 * Whether every field of an unquoted record is written as it was read (textField leaves it as it is), so that the
 * record's line can be copied: printable ASCII, no space at either end of a field, and no field that a spreadsheet
 * would take for a formula (=, +, -, @ not starting a number). Anything else takes the field-by-field path.
 */
function writtenAsRead(row: InputRow, format: CsvFormat): row is InputRow & { readonly text: string } {
  const text = row.text;
  if (text === undefined || format.delimiter.length !== 1) return false;
  const d = format.delimiter.charCodeAt(0);
  const end = text.length;
  let field = 0;
  let start = true;
  for (let i = 0; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c === d) {
      field++;
      start = true;
      continue;
    }
    if (c === 32) {
      if (start || i + 1 === end || text.charCodeAt(i + 1) === d) return false;
    } else if (c < 32 || c > 126) return false;
    else if (start && !format.rawText && (c === 61 || c === 43 || c === 45 || c === 64)) {
      if (readNumber(row.fields[field], format.decimalMark) === null) return false;
    }
    start = false;
  }
  return true;
}

/** One output line: the input fields (unless dropped), the result cells and the errors cell. */
function outputLine(
  plan: EvaluationPlan,
  row: InputRow,
  cells: readonly CellOutput[],
  kinds: readonly NumberKind[],
  errors: string,
): string {
  const f = plan.format;
  const d = f.delimiter;
  let line = "";
  if (plan.keepInput) {
    if (writtenAsRead(row, f)) line = row.text + d;
    else for (const field of row.fields) line += textField(field, f) + d;
  }
  for (let i = 0; i < cells.length; i++) line += (cells[i] === undefined ? "" : cellText(cells[i], kinds[i], f)) + d;
  return line + (errors === "" ? "" : textField(clip(errors, 4 * ECHO_LIMIT), f)) + "\n";
}

/** A row of blank results (a blank record, or a missing temperature). */
function blankLine(plan: EvaluationPlan, row: InputRow, cellCount: number): string {
  return outputLine(plan, row, new Array<CellOutput>(cellCount).fill(""), [], "");
}

/**
 * Evaluates one batch of CSV rows: builds n × 1 columns from the mapped input columns, calls the worksheet
 * functions on them (exactly as a worksheet range would), and turns the results into output cells, per-row error
 * text and the messages the command line prints. No I/O here.
 */
import type { LigandName, LigandTotals } from "../chemistry/ligand-cells";
import { mapCells } from "../functions/broadcast";
import { CellError, CellInput, CellOutput, CellScalar, isBlank } from "../functions/cell-values";
import { carbonateArg, chlorideArg, sulfurArg } from "../functions/ligand-args";
import type { DissolvedUnit, PotentialUnitOption } from "./options";
import { LIGAND_OUTPUT, type LigandInput } from "./water";
import type { WorksheetFunctions } from "./worksheet";

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
  /** Fixed temperature °C (no column, or a blank cell in it); undefined = the functions' default. */
  readonly fixedTemperature: number | undefined;
  readonly electrode: string;
  readonly unit: PotentialUnitOption;
  readonly activity: number;
  readonly dissolvedUnit: DissolvedUnit;
  readonly overpotential: number;
  readonly targets: readonly MetalTarget[];
  readonly keepInput: boolean;
  /** Columns feeding the [carbonate], [chloride], [sulfur] arguments (empty: pure water). */
  readonly ligands: readonly LigandInput[];
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
  for (const t of plan.targets) {
    for (const s of RESULT_SUFFIXES) header.push(`${t.prefix}_${s}`);
    header.push(`${t.prefix}_dissolved_${unitSlug(plan.dissolvedUnit)}`);
  }
  header.push("errors");
  return header;
}

/** One data row as read: its fields and the line of the file it started on (for messages). */
export interface InputRow {
  readonly fields: readonly string[];
  readonly line: number;
}

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
  readonly points: SamplePoint[];
}

/** How a number is written: 10 significant digits, no trailing noise. */
export function formatNumber(x: number): string {
  return String(Number(x.toPrecision(10)));
}

/** A CSV field: quoted when it holds the delimiter, a quote, a line break, or leading or trailing space. */
export function csvField(text: string): string {
  return /[",\n\r]|^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One CSV line, newline included. */
export function csvLine(cells: readonly string[]): string {
  return cells.map(csvField).join(",") + "\n";
}

/** A result cell as CSV text: numbers as formatNumber writes them (never quoted), error values as their code. */
function cellText(value: CellOutput): string {
  if (typeof value === "number") return formatNumber(value);
  if (typeof value === "string") return csvField(value);
  return value.code;
}

/** Numeric text as the worksheet functions read it (numberArg): the same pattern, then Number(). */
const NUMERIC = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

/**
 * A column of cells for the functions. Numeric text becomes the number the functions would read from it (they take
 * plain numbers without reading them again, once per function instead of six times); anything else goes as written,
 * so that the function's own message says what is wrong with it.
 */
function numericColumn(rows: readonly InputRow[], index: number, factor = 1, blank: CellScalar = ""): CellScalar[][] {
  const out: CellScalar[][] = new Array(rows.length);
  for (let r = 0; r < rows.length; r++) {
    const text = rows[r].fields[index] ?? "";
    out[r] = [NUMERIC.test(text) ? (factor === 1 ? Number(text) : Number(text) * factor) : isBlank(text) ? blank : text];
  }
  return out;
}

function textColumn(rows: readonly InputRow[], index: number): CellScalar[][] {
  const out: CellScalar[][] = new Array(rows.length);
  for (let r = 0; r < rows.length; r++) out[r] = [rows[r].fields[index] ?? ""];
  return out;
}

/** #VALUE! is always the input's fault; #N/A only when its message names an input (no DIC for that alkalinity). */
const SERIOUS = new Set(["#VALUE!"]);
const LIGAND_ARG = { carbonate: carbonateArg, chloride: chlorideArg, sulfur: sulfurArg } as const;

/**
 * Argument names of the worksheet functions → the input column that fed them. The functions name the argument
 * first in every message ("pH: expected a number, got …"), which is how a message is tied to a column.
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
  for (const l of plan.ligands) {
    columns[l.ligand] = h(l.column);
    if (l.kind === "alkalinity") {
      columns.alkalinity = h(l.column);
      columns["alkalinity, pH"] = h(l.column);
    }
  }
  return columns;
}

/** Splits "pH: expected …" into the argument and the rest. */
function splitMessage(message: string): [string | null, string] {
  const m = /^([A-Za-z][\w ,]*?):\s(.*)$/s.exec(message);
  return m ? [m[1], m[2]] : [null, message];
}

/**
 * Evaluates a batch. The rows are handed to the functions grouped by metal and temperature — the functions reuse
 * the system of the previous row when its conditions are the same, so grouping saves most look-ups — and the
 * results are put back in file order.
 */
export function evaluateBatch(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): BatchResult {
  const { metalColumn, temperatureColumn } = plan;
  if (metalColumn === null && temperatureColumn === null) return evaluateInOrder(plan, rows, fns);
  // groups in order of first appearance; the order inside a group is the file's
  const groups = new Map<string, number[]>();
  for (let i = 0; i < rows.length; i++) {
    const f = rows[i].fields;
    const key = `${metalColumn === null ? "" : (f[metalColumn] ?? "").trim()}\u0000${temperatureColumn === null ? "" : (f[temperatureColumn] ?? "").trim()}`;
    const group = groups.get(key);
    if (group) group.push(i);
    else groups.set(key, [i]);
  }
  const order: number[] = [];
  for (const group of groups.values()) for (const i of group) order.push(i);
  const sorted: InputRow[] = new Array(rows.length);
  for (let k = 0; k < order.length; k++) sorted[k] = rows[order[k]];
  const result = evaluateInOrder(plan, sorted, fns);
  const out: string[] = new Array(rows.length);
  for (let k = 0; k < order.length; k++) out[order[k]] = result.lines[k];
  const messages = result.messages.sort((a, b) => a.line - b.line);
  return { ...result, lines: out, messages };
}

function evaluateInOrder(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): BatchResult {
  const n = rows.length;
  const pH = numericColumn(rows, plan.phColumn);
  // Readings in mV are divided by 1000 when they are numbers; anything else goes to the function as written.
  const reading: CellInput =
    plan.unit === "mV"
      ? rows.map((r) => {
          const text = r.fields[plan.potentialColumn] ?? "";
          const t = text.trim();
          return [/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t) ? Number(t) / 1000 : text];
        })
      : numericColumn(rows, plan.potentialColumn);
  const fixedT = plan.fixedTemperature ?? "";
  const temperature: CellInput = plan.temperatureColumn === null ? fixedT : numericColumn(rows, plan.temperatureColumn, 1, fixedT);
  const isRhe = plan.electrode.trim().toUpperCase() === "RHE";
  const eShe = fns.toShe(reading, plan.electrode, temperature, isRhe ? pH : undefined);
  // A reading that failed to convert is an error cell the spreadsheet would pass on as it is.
  const potential: CellScalar[][] = new Array(n);
  for (let r = 0; r < n; r++) {
    const e = eShe[r][0];
    potential[r] = [e instanceof CellError ? "" : (e as number | string)];
  }
  const margin = fns.waterMargin(pH, potential, temperature, plan.overpotential);

  // The water: each ligand's argument column, the cells of its output column, and (for carbonate from alkalinity)
  // REDOX.DIC's errors, which the spreadsheet passes on to every function taking the carbonate.
  const ligandArgs: Partial<Record<LigandName, CellScalar[][]>> = {};
  const ligandCells: CellOutput[][][] = [];
  let carbonateErrors: (CellError | null)[] | null = null;
  for (const l of plan.ligands) {
    if (l.kind === "alkalinity") {
      const dic = fns.dic(numericColumn(rows, l.column, l.factor), pH, temperature);
      carbonateErrors = dic.map(([d]) => (d instanceof CellError ? d : null));
      ligandArgs.carbonate = dic.map(([d]) => [d instanceof CellError ? "" : (d as number | string)]);
      ligandCells.push(dic);
    } else {
      const column = numericColumn(rows, l.column, l.factor);
      ligandArgs[l.ligand] = column;
      // the output cell: the total as the functions read it ("" where blank)
      ligandCells.push(mapCells([LIGAND_ARG[l.ligand]], [column], (x) => x).map((cell, r) => (isBlank(column[r][0]) ? [""] : cell)));
    }
  }
  const { carbonate, chloride, sulfur } = ligandArgs;

  const perTarget = plan.targets.map((t) => {
    const element: CellInput = t.symbol ?? textColumn(rows, plan.metalColumn as number);
    return {
      target: t,
      element,
      species: fns.species(element, pH, potential, temperature, plan.activity, carbonate, chloride, sulfur),
      regime: fns.regime(element, pH, potential, temperature, plan.activity, carbonate, chloride, sulfur),
      above: fns.boundary(element, pH, potential, 1, temperature, plan.activity, carbonate, chloride, sulfur),
      below: fns.boundary(element, pH, potential, -1, temperature, plan.activity, carbonate, chloride, sulfur),
      dissolved: fns.dissolved(element, pH, potential, temperature, plan.dissolvedUnit, plan.activity, carbonate, chloride, sulfur),
    };
  });

  const argColumns = argumentColumns(plan);
  // a total converted from the column's unit is named in mol/kg by the functions: say where it came from
  const argNotes: Record<string, string> = {};
  for (const l of plan.ligands) if (l.kind === "total" && l.factor !== 1) argNotes[l.ligand] = ` (converted from ${l.unit})`;
  const out: string[] = new Array(n);
  const messages: RowMessage[] = [];
  const regimes = new Map<string, Map<string, number>>();
  for (const p of perTarget) regimes.set(p.target.prefix, new Map());
  const points: SamplePoint[] = [];
  let errorRows = 0;
  let blankRows = 0;
  const keep = plan.keepInput;
  const cellCount = 2 + ligandCells.length + 5 * perTarget.length;

  for (let r = 0; r < n; r++) {
    const row = rows[r];
    const e = eShe[r][0];
    const eError = e instanceof CellError ? e : null;
    // the spreadsheet passes an error in an argument cell straight through: the potential first, then the carbonate
    const passOn = eError ?? (carbonateErrors === null ? null : carbonateErrors[r]);
    const cells: CellOutput[] = new Array(cellCount);
    let k = 0;
    cells[k++] = e;
    cells[k++] = eError ?? margin[r][0];
    for (const c of ligandCells) cells[k++] = c[r][0];
    for (const p of perTarget) {
      if (passOn) {
        for (let j = 0; j < 5; j++) cells[k++] = passOn;
      } else {
        cells[k++] = p.species[r][0];
        cells[k++] = p.regime[r][0];
        cells[k++] = p.above[r][0];
        cells[k++] = p.below[r][0];
        cells[k++] = p.dissolved[r][0];
      }
    }
    // messages: one per distinct problem in the row
    let problems: RowMessage[] | null = null;
    for (const c of cells) {
      if (!(c instanceof CellError)) continue;
      const [arg, rest] = splitMessage(c.message);
      if (!SERIOUS.has(c.code) && !(c.code === "#N/A" && arg !== null && Object.prototype.hasOwnProperty.call(argColumns, arg))) continue;
      const col = arg !== null && arg in argColumns ? argColumns[arg] : null;
      const text = col !== null ? `${rest}${(arg !== null && argNotes[arg]) || ""} (${c.code})` : `${c.message} (${c.code})`;
      problems ??= [];
      if (!problems.some((m) => m.column === col && m.text === text)) problems.push({ line: row.line, column: col, text, kind: "error" });
    }
    if (problems !== null) {
      errorRows++;
      for (const m of problems) messages.push(m);
    } else {
      const blanks: string[] = [];
      if (isBlank(row.fields[plan.phColumn])) blanks.push(plan.headers[plan.phColumn]);
      if (isBlank(row.fields[plan.potentialColumn])) blanks.push(plan.headers[plan.potentialColumn]);
      if (plan.metalColumn !== null && isBlank(row.fields[plan.metalColumn])) blanks.push(plan.headers[plan.metalColumn]);
      if (blanks.length > 0) {
        blankRows++;
        for (const b of blanks) messages.push({ line: row.line, column: b, text: "blank; this row's results are left blank", kind: "blank" });
      } else {
        for (const l of plan.ligands) {
          if (isBlank(row.fields[l.column])) messages.push({ line: row.line, column: plan.headers[l.column], text: `blank; this row is evaluated without ${l.ligand}`, kind: "blank" });
        }
      }
    }

    // regime counts and diagram points
    if (typeof e === "number" && !passOn) {
      const pHValue = Number(pH[r][0]);
      const tCell = Array.isArray(temperature) ? temperature[r][0] : temperature;
      const celsius = isBlank(tCell) ? 25 : Number(tCell);
      let ligands: LigandTotals | undefined;
      for (const l of plan.ligands) {
        const x = ligandArgs[l.ligand]![r][0];
        if (typeof x === "number" && x > 0) (ligands ??= {})[l.ligand] = x;
      }
      for (const p of perTarget) {
        const regime = p.regime[r][0];
        const species = p.species[r][0];
        if (typeof regime !== "string" || regime === "" || typeof species !== "string") continue;
        const counts = regimes.get(p.target.prefix)!;
        counts.set(regime, (counts.get(regime) ?? 0) + 1);
        const symbol = p.target.symbol ?? String((p.element as CellScalar[][])[r][0]).trim();
        const point: SamplePoint = { symbol, pH: pHValue, E: e, regime, species, celsius, line: row.line };
        points.push(ligands ? { ...point, ligands } : point);
      }
    }

    let line = "";
    if (keep) for (const f of row.fields) line += csvField(f) + ",";
    for (let i = 0; i < cellCount; i++) line += cellText(cells[i]) + ",";
    line += problems === null ? "\n" : csvField(problems.map((m) => (m.column ? `${m.column}: ${m.text}` : m.text)).join("; ")) + "\n";
    out[r] = line;
  }
  for (const [prefix, counts] of regimes) if (counts.size === 0) regimes.delete(prefix);
  return { lines: out, messages, errorRows, blankRows, regimes, points };
}

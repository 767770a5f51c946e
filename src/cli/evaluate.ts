/**
 * Evaluates one batch of CSV rows: builds n × 1 columns from the mapped input columns, calls the worksheet
 * functions on them (exactly as a worksheet range would), and turns the results into output cells, per-row error
 * text and the messages the command line prints. No I/O here.
 */
import { CellError, CellInput, CellOutput, isBlank } from "../functions/cell-values";
import type { DissolvedUnit, PotentialUnitOption } from "./options";
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
}

export interface RowMessage {
  readonly line: number;
  /** Column header the message is about, when it is about one. */
  readonly column: string | null;
  readonly text: string;
  readonly kind: "error" | "blank";
}

export interface BatchResult {
  /** Output rows, cells already as CSV text (not yet quoted). */
  readonly rows: string[][];
  readonly messages: RowMessage[];
  /** Rows with at least one #VALUE! or #NUM! result. */
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

function cellText(value: CellOutput): string {
  if (value instanceof CellError) return value.code;
  if (typeof value === "number") return formatNumber(value);
  return value;
}

function column(rows: readonly InputRow[], index: number | null): CellInput {
  if (index === null) return "";
  return rows.map((r) => [r.fields[index] ?? ""]);
}

const SERIOUS = new Set(["#VALUE!", "#NUM!"]);

/**
 * Argument names of the worksheet functions → the input column that fed them. The functions name the argument
 * first in every message ("pH: expected a number, got …"), which is how a message is tied to a column.
 */
function argumentColumns(plan: EvaluationPlan): Record<string, string | null> {
  const h = (i: number | null): string | null => (i === null ? null : plan.headers[i]);
  return {
    pH: h(plan.phColumn),
    reading: h(plan.potentialColumn),
    potential: h(plan.potentialColumn),
    temperature: h(plan.temperatureColumn),
    element: h(plan.metalColumn),
  };
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
  const key = (r: InputRow): string =>
    `${plan.metalColumn === null ? "" : (r.fields[plan.metalColumn] ?? "").trim()}\u0000${plan.temperatureColumn === null ? "" : (r.fields[plan.temperatureColumn] ?? "").trim()}`;
  const keys = rows.map(key);
  const order = rows.map((_, i) => i).sort((a, b) => (keys[a] < keys[b] ? -1 : keys[a] > keys[b] ? 1 : a - b));
  const result = evaluateInOrder(
    plan,
    order.map((i) => rows[i]),
    fns,
  );
  const out: string[][] = new Array(rows.length);
  order.forEach((original, k) => {
    out[original] = result.rows[k];
  });
  const messages = [...result.messages].sort((a, b) => a.line - b.line);
  return { ...result, rows: out, messages };
}

function evaluateInOrder(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): BatchResult {
  const n = rows.length;
  const pH = column(rows, plan.phColumn);
  const rawReading = column(rows, plan.potentialColumn) as string[][];
  // Readings in mV are divided by 1000 when they are numbers; anything else goes to the function as written, so
  // that its own message says what is wrong with it.
  const reading: CellInput =
    plan.unit === "mV"
      ? rawReading.map(([text]) => {
          const t = text.trim();
          return [/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t) ? Number(t) / 1000 : text];
        })
      : rawReading;
  const fixedT = plan.fixedTemperature ?? "";
  const temperature: CellInput =
    plan.temperatureColumn === null
      ? fixedT
      : rows.map((r) => {
          const text = r.fields[plan.temperatureColumn as number] ?? "";
          return [isBlank(text) ? fixedT : text];
        });
  const isRhe = plan.electrode.trim().toUpperCase() === "RHE";
  const eShe = fns.toShe(reading, plan.electrode, temperature, isRhe ? pH : undefined);
  // A reading that failed to convert is an error cell the spreadsheet would pass on as it is.
  const potential: CellInput = eShe.map(([e]) => [e instanceof CellError ? "" : (e as number | string)]);
  const margin = fns.waterMargin(pH, potential, temperature, plan.overpotential);

  const perTarget = plan.targets.map((t) => {
    const element: CellInput = t.symbol ?? column(rows, plan.metalColumn);
    return {
      target: t,
      element,
      species: fns.species(element, pH, potential, temperature, plan.activity),
      regime: fns.regime(element, pH, potential, temperature, plan.activity),
      above: fns.boundary(element, pH, potential, 1, temperature, plan.activity),
      below: fns.boundary(element, pH, potential, -1, temperature, plan.activity),
      dissolved: fns.dissolved(element, pH, potential, temperature, plan.dissolvedUnit, plan.activity),
    };
  });

  const argColumns = argumentColumns(plan);
  const out: string[][] = new Array(n);
  const messages: RowMessage[] = [];
  const regimes = new Map<string, Map<string, number>>();
  const points: SamplePoint[] = [];
  let errorRows = 0;
  let blankRows = 0;

  for (let r = 0; r < n; r++) {
    const row = rows[r];
    const e = eShe[r][0];
    const cells: CellOutput[] = [e, e instanceof CellError ? e : margin[r][0]];
    for (const p of perTarget) {
      const results = [p.species[r][0], p.regime[r][0], p.above[r][0], p.below[r][0], p.dissolved[r][0]];
      // the spreadsheet passes an error in an argument cell straight through
      cells.push(...(e instanceof CellError ? results.map(() => e) : results));
    }
    // messages: one per distinct problem in the row
    const problems = new Map<string, RowMessage>();
    for (const c of cells) {
      if (!(c instanceof CellError) || !SERIOUS.has(c.code)) continue;
      const [arg, rest] = splitMessage(c.message);
      const col = arg !== null && arg in argColumns ? argColumns[arg] : null;
      const text = col !== null ? `${rest} (${c.code})` : `${c.message} (${c.code})`;
      const key = `${col}|${text}`;
      if (!problems.has(key)) problems.set(key, { line: row.line, column: col, text, kind: "error" });
    }
    if (problems.size > 0) {
      errorRows++;
      messages.push(...problems.values());
    } else {
      const blanks: string[] = [];
      if (isBlank(row.fields[plan.phColumn])) blanks.push(plan.headers[plan.phColumn]);
      if (isBlank(row.fields[plan.potentialColumn])) blanks.push(plan.headers[plan.potentialColumn]);
      if (plan.metalColumn !== null && isBlank(row.fields[plan.metalColumn])) blanks.push(plan.headers[plan.metalColumn]);
      if (blanks.length > 0) {
        blankRows++;
        for (const b of blanks) messages.push({ line: row.line, column: b, text: "blank; this row's results are left blank", kind: "blank" });
      }
    }

    // regime counts and diagram points
    if (typeof e === "number") {
      const pHValue = Number(String((pH as string[][])[r][0]).trim());
      const tCell = Array.isArray(temperature) ? temperature[r][0] : temperature;
      const celsius = isBlank(tCell) ? 25 : Number(String(tCell).trim());
      perTarget.forEach((p) => {
        const regime = p.regime[r][0];
        const species = p.species[r][0];
        if (typeof regime !== "string" || regime === "" || typeof species !== "string") return;
        let counts = regimes.get(p.target.prefix);
        if (!counts) regimes.set(p.target.prefix, (counts = new Map()));
        counts.set(regime, (counts.get(regime) ?? 0) + 1);
        const symbol = p.target.symbol ?? String((p.element as string[][])[r][0]).trim();
        points.push({ symbol, pH: pHValue, E: e, regime, species, celsius, line: row.line });
      });
    }

    const text = cells.map(cellText);
    const errorText = [...problems.values()].map((m) => (m.column ? `${m.column}: ${m.text}` : m.text)).join("; ");
    out[r] = plan.keepInput ? [...row.fields, ...text, errorText] : [...text, errorText];
  }
  return { rows: out, messages, errorRows, blankRows, regimes, points };
}

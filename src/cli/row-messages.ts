/**
 * The messages of a batch's rows and the errors cell: each error tied to the input column at fault (through the
 * argument the error records), blank records and blank cells reported, echoed input cut to a bounded length.
 */
import { CellError, isBlank, type CellOutput } from "../functions";
import type { EvaluationPlan } from "./evaluation-plan";
import { ionicBasis } from "./ionic";
import type { InputRow } from "./record-reader";
import type { IonicColumn } from "./water-columns";

export interface RowMessage {
  readonly line: number;
  /** Column header the message is about, when it is about one. */
  readonly column: string | null;
  readonly text: string;
  readonly kind: "error" | "blank";
}

/** Echoed input is cut to this many characters in messages and the errors column. */
export const ECHO_LIMIT = 200;

/** Text cut to `limit` characters, with an ellipsis and the length left out. */
export function clip(text: string, limit = ECHO_LIMIT): string {
  return text.length <= limit
    ? text
    : `${text.slice(0, limit)}… (${(text.length - limit).toLocaleString("en-US")} more characters)`;
}

/** #VALUE! is always the input's fault; #N/A only when its message names an input (no DIC for that alkalinity). */
const SERIOUS = new Set(["#VALUE!"]);

/**
 * Argument names of the worksheet functions → the input column that fed them. An error of the functions records
 * the argument at fault (CellError.argument), which is how a message is tied to a column.
 */
export function argumentColumns(plan: EvaluationPlan): Record<string, string | null> {
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

/** The error's message without its "argument: " lead (the argument it records, CellError.argument; never parsed). */
function messageAfterArgument(error: CellError, argument: string): string {
  const lead = `${argument}: `;
  return error.message.startsWith(lead) ? error.message.slice(lead.length) : error.message;
}

/** Notes added to messages about converted arguments: the functions name them in mol/kg or °C, say the source unit. */
export function argumentNotes(plan: EvaluationPlan, ionic: IonicColumn | null): Record<string, string> {
  const scale = plan.temperatureScale;
  const argNotes: Record<string, string> = {};
  for (const l of plan.ligands)
    if (l.kind === "total" && l.factor !== 1) argNotes[l.ligand] = ` (converted from ${l.unit})`;
  if (ionic?.note) argNotes[ionic.note.arg] = ionic.note.text;
  if (scale !== "C") argNotes.temperature = ` (°C, converted from the column's ${scale === "F" ? "°F" : "K"})`;
  return argNotes;
}

/** The message of a row whose results are all left blank (a blank record, a missing temperature), or null. */
export function skippedRowMessage(
  plan: EvaluationPlan,
  row: InputRow,
  missingTemperature: number | null,
): RowMessage | null {
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

/** A row's error messages, one per distinct problem, tied to the input column at fault; null when there are none. */
export function rowProblems(
  cells: readonly CellOutput[],
  line: number,
  argColumns: Record<string, string | null>,
  argNotes: Record<string, string>,
): RowMessage[] | null {
  let problems: RowMessage[] | null = null;
  for (let i = 0; i < cells.length; i++) {
    const c = cells[i];
    if (typeof c !== "object" || !(c instanceof CellError)) continue;
    const arg = c.argument ?? null;
    if (
      !SERIOUS.has(c.code) &&
      !(c.code === "#N/A" && arg !== null && Object.prototype.hasOwnProperty.call(argColumns, arg))
    )
      continue;
    const col = arg !== null && arg in argColumns ? argColumns[arg] : null;
    const text = clip(
      col !== null ? `${messageAfterArgument(c, arg!)}${argNotes[arg!] || ""} (${c.code})` : `${c.message} (${c.code})`,
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
export function pushBlankMessages(plan: EvaluationPlan, row: InputRow, messages: RowMessage[]): boolean {
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

/** The errors cell: each problem prefixed by its column. */
export function errorsText(problems: readonly RowMessage[]): string {
  return problems.map((m) => (m.column ? `${clip(m.column)}: ${m.text}` : m.text)).join("; ");
}

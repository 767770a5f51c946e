/**
 * One line of the results: the input fields (unless dropped), the result cells rounded by kind, and the errors cell,
 * written into the results bytes (csv-bytes.ts).
 */
import type { CellOutput } from "../functions";
import { readNumber } from "../tables";
import type { CsvBytes } from "./csv-bytes";
import { textField, type CsvFormat, type NumberKind } from "./csv-format";
import type { EvaluationPlan } from "./evaluation-plan";
import type { InputRow } from "./record-reader";
import { clip, ECHO_LIMIT } from "./row-messages";

/** How each result cell's number is rounded, in output order (see outputHeader). */
export function cellKinds(ligandColumns: number, targets: number): NumberKind[] {
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
export function writeOutputLine(
  out: CsvBytes,
  plan: EvaluationPlan,
  row: InputRow,
  cells: readonly CellOutput[],
  kinds: readonly NumberKind[],
  errors: string,
): void {
  if (plan.keepInput) {
    if (writtenAsRead(row, out.format)) out.text(row.text);
    else
      for (let i = 0; i < row.fields.length; i++) {
        if (i > 0) out.delimiterByte();
        out.text(textField(row.fields[i], out.format));
      }
    out.delimiterByte();
  }
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i];
    if (typeof cell === "number") out.number(cell, kinds[i]);
    else if (typeof cell === "string") out.textCell(cell);
    else if (cell !== undefined) out.text(cell.code);
    out.delimiterByte();
  }
  if (errors !== "") out.text(textField(clip(errors, 4 * ECHO_LIMIT), out.format));
  out.byte(10);
}

/** A blank line's cells: every result blank. */
export function writeBlankLine(out: CsvBytes, plan: EvaluationPlan, row: InputRow, cellCount: number): void {
  writeOutputLine(out, plan, row, new Array<CellOutput>(cellCount).fill(""), [], "");
}

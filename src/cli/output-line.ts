/**
 * One line of the results: the input fields (unless dropped), the result cells rounded by kind, and the errors cell,
 * written into the results bytes (csv-bytes.ts).
 */
import type { CellOutput } from "../functions";
import type { CsvBytes } from "./csv-bytes";
import { textField, type NumberKind } from "./csv-format";
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
    // an unquoted record's line as read where that is what its fields give (CsvBytes.lineAsRead)
    if (row.text === undefined || !out.lineAsRead(row.text, row.fields))
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

/**
 * A batch's cells as the worksheet functions take and give them: a column of input cells as a 1 × n range (one
 * array for the batch, not one per row: a range broadcasts the same along either dimension), and the answers back
 * as one cell per row.
 */
import { isBlank, type CellOutput, type CellScalar } from "../functions";
import { readNumber } from "../tables";
import type { CsvFormat } from "./csv-format";
import type { InputRow } from "./record-reader";

/**
 * A column of cells for the functions, one cell per row. Numeric text (with the file's decimal mark) becomes the
 * number the functions would read from it, × factor or converted by `convert` (they take plain numbers without
 * reading them again, once per function instead of six times); anything else goes as written, so that the
 * function's own message says what is wrong with it.
 */
export function numericColumn(
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

/** A column of text cells as written ("" past the end of a short record). */
export function textColumn(rows: readonly InputRow[], index: number): CellScalar[] {
  const out: CellScalar[] = new Array(rows.length);
  for (let r = 0; r < rows.length; r++) out[r] = rows[r].fields[index] ?? "";
  return out;
}

/** A batch's cells as the range the functions take: one row of n cells. */
export const asRange = (cells: CellScalar[]): CellScalar[][] => [cells];

/** A function's answers for a batch of n rows, one per row (a one-cell answer, an argument's error, fills all n). */
export function answersOf(result: CellOutput[][], n: number): CellOutput[] {
  const first = result[0];
  if (result.length === 1 && first.length === n) return first;
  return new Array<CellOutput>(n).fill(first[0]);
}

/**
 * What the first 64 KiB of the input say about its format: the field separator (from the header line, the first
 * line that is not blank or a # note) and the decimal mark (from the data lines after it).
 */
import { closeSync, openSync, readSync } from "node:fs";
import { guessDecimalMark, guessDelimiter, type DecimalMark } from "../tables";

export interface InputFormat {
  readonly delimiter: string;
  readonly decimalMark: DecimalMark;
}

function headOf(path: string): string {
  const fd = openSync(path, "r");
  try {
    const buffer = Buffer.alloc(65536);
    const n = readSync(fd, buffer, 0, buffer.length, 0);
    return buffer
      .subarray(0, n)
      .toString("utf8")
      .replace(/^\uFEFF/, "");
  } finally {
    closeSync(fd);
  }
}

/** The input's delimiter and decimal mark: the options' where given, else guessed. */
export function probeInput(path: string, delimiter?: string, decimalMark?: DecimalMark): InputFormat {
  if (delimiter !== undefined && decimalMark !== undefined) return { delimiter, decimalMark };
  const lines = headOf(path).split(/\r?\n/);
  const header = lines.findIndex((l) => l.trim() !== "" && !l.trimStart().startsWith("#"));
  const d = delimiter ?? guessDelimiter(header < 0 ? "" : lines[header]);
  if (decimalMark !== undefined) return { delimiter: d, decimalMark };
  // the last line may be cut off at 64 KiB: leave it out
  const fields = header < 0 ? [] : lines.slice(header + 1, -1).flatMap((l) => l.split(d));
  return { delimiter: d, decimalMark: guessDecimalMark(d, fields) };
}

/**
 * How the results CSV is written: the input's delimiter and decimal mark; text cells that a spreadsheet would
 * take for a formula neutralised as the OWASP guidance on CSV injection recommends (a leading apostrophe before =,
 * +, -, @, tab or carriage return, and the field quoted), numbers left as numbers; results rounded to what
 * the measurements carry unless full precision is asked for.
 */
import { readNumber, type DecimalMark } from "../tables";

export interface CsvFormat {
  readonly delimiter: string;
  readonly decimalMark: DecimalMark;
  /** Write text cells exactly as they are (no neutralising of formula-like text). */
  readonly rawText: boolean;
  /** Write numbers with every digit (shortest round-trip form) instead of the default rounding. */
  readonly fullPrecision: boolean;
}

export const DEFAULT_FORMAT: CsvFormat = { delimiter: ",", decimalMark: ".", rawText: false, fullPrecision: false };

/** How a result number is rounded: potentials to 0.1 mV, amounts to 4 significant figures. */
export type NumberKind = "volts" | "amount";

/** Characters that make a spreadsheet read a cell as a formula (OWASP, CSV injection). */
const FORMULA_START = /^[=+\-@\t\r]/;

/** Cells that must be quoted: the delimiter, a quote, a line break, or space at either end. */
function needsQuotes(text: string, delimiter: string): boolean {
  return text.includes(delimiter) || /["\n\r]|^\s|\s$/.test(text);
}

/** A text cell as a CSV field in this format. */
export function textField(text: string, format: CsvFormat): string {
  if (text === "") return "";
  if (!format.rawText && FORMULA_START.test(text) && readNumber(text, format.decimalMark) === null) {
    return `"'${text.replace(/"/g, '""')}"`;
  }
  return needsQuotes(text, format.delimiter) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A result number as a CSV field: rounded by kind (unless full precision), with the format's decimal mark. */
/**
 * Volts to 0.1 mV, written from the integer number of tenths of a millivolt: the text String(round(x·1e4)/1e4)
 * gives (no trailing zeros), without formatting a double.
 */
function voltsText(x: number): string {
  const n = Math.round(x * 1e4);
  if (!(Math.abs(n) < 1e15)) return String(n / 1e4);
  const a = n < 0 ? -n : n;
  const whole = Math.floor(a / 1e4);
  let fraction = a - whole * 1e4;
  const sign = n < 0 ? "-" : "";
  if (fraction === 0) return sign + whole;
  let digits = 4;
  while (fraction % 10 === 0) {
    fraction /= 10;
    digits--;
  }
  return `${sign}${whole}.${String(fraction).padStart(digits, "0")}`;
}

export function numberField(x: number, kind: NumberKind, format: CsvFormat): string {
  const text = format.fullPrecision ? String(x) : kind === "volts" ? voltsText(x) : String(Number(x.toPrecision(4)));
  return format.decimalMark === "." ? text : text.replace(".", ",");
}

/** One CSV line of text cells, newline included. */
export function textLine(cells: readonly string[], format: CsvFormat): string {
  return cells.map((c) => textField(c, format)).join(format.delimiter) + "\n";
}

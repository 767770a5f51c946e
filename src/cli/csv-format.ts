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

/** Whether a character code is one of = + - @ tab or carriage return: a cell beginning so is a formula (OWASP). */
function isFormulaStart(code: number): boolean {
  return code === 61 || code === 43 || code === 45 || code === 64 || code === 9 || code === 13;
}

/** Whether a character code is white space as a regular expression's \s means it (printable ASCII never is). */
function isSpace(code: number): boolean {
  if (code > 32 && code < 127) return false;
  return /\s/.test(String.fromCharCode(code));
}

/** Cells that must be quoted: the delimiter, a quote, a line break, or space at either end. */
function needsQuotes(text: string, delimiter: string): boolean {
  if (isSpace(text.charCodeAt(0)) || isSpace(text.charCodeAt(text.length - 1))) return true;
  if (delimiter.length !== 1) return text.includes(delimiter) || /["\n\r]/.test(text);
  const d = delimiter.charCodeAt(0);
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === d || c === 34 || c === 10 || c === 13) return true;
  }
  return false;
}

/** A text cell as a CSV field in this format. */
export function textField(text: string, format: CsvFormat): string {
  if (text === "") return "";
  if (!format.rawText && isFormulaStart(text.charCodeAt(0)) && readNumber(text, format.decimalMark) === null) {
    return `"'${text.replace(/"/g, '""')}"`;
  }
  return needsQuotes(text, format.delimiter) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The text of tenths of a millivolt 0–9999 after the volts' decimal point: "" for 0, ".0001", ".25" (no trailing 0). */
const VOLT_FRACTIONS: readonly string[] = Array.from({ length: 10_000 }, (_, f) =>
  f === 0 ? "" : `.${String(f).padStart(4, "0").replace(/0+$/, "")}`,
);

/** Volts as a whole number of tenths of a millivolt, or null where that is not below 10¹⁵ (or not a number). */
export function voltsTenths(x: number): number | null {
  const n = Math.round(x * 1e4);
  return Math.abs(n) < 1e15 ? n : null;
}

/**
 * Volts to 0.1 mV, written from the integer number of tenths of a millivolt: the text String(round(x·1e4)/1e4)
 * gives (no trailing zeros), without formatting a double.
 */
function voltsText(x: number): string {
  const n = voltsTenths(x);
  if (n === null) return String(Math.round(x * 1e4) / 1e4);
  const a = n < 0 ? -n : n;
  const whole = Math.floor(a / 1e4);
  const text = String(whole) + VOLT_FRACTIONS[a - whole * 1e4];
  return n < 0 && a !== 0 ? "-" + text : text;
}

/** 10^k as doubles, 0 ≤ k ≤ 308 (exact to 10²², then correctly rounded). */
const POWERS_OF_TEN: readonly number[] = Array.from({ length: 309 }, (_, k) => Number(`1e${k}`));

/** a·10^k (one rounding where |k| ≤ 22, where the power of ten is an exact double; two beyond). */
function timesPowerOfTen(a: number, k: number): number {
  return k >= 0 ? a * POWERS_OF_TEN[k] : a / POWERS_OF_TEN[-k];
}

/** Scale k of the smallest amounts written with 4 figures here (m·10^−k, k ≤ 303: about 10⁻³⁰⁰); past it, toPrecision. */
const MAX_SCALE = 303;

/** Exponent notation below 10⁻⁶, as Number.prototype.toString writes it (ECMA-262, Number::toString): k > 9. */
export const EXPONENT_SCALE = 9;

/**
 * The shortest text of a 4-digit decimal m·10^−k (1000 ≤ m ≤ 9999, −11 ≤ k ≤ 303), as String of its double
 * writes it: "1.235", "0.0012", "120", "1.2e-7".
 */
function decimalText(m: number, k: number): string {
  if (k <= 0) return String(m * POWERS_OF_TEN[-k]);
  const digits = String(m);
  const exponent = k > EXPONENT_SCALE;
  const whole = exponent ? 1 : 4 - k;
  const text = whole > 0 ? `${digits.slice(0, whole)}.${digits.slice(whole)}` : `0.${"0".repeat(-whole)}${digits}`;
  let end = text.length;
  while (text.charCodeAt(end - 1) === 48) end--; // trailing zeros
  if (text.charCodeAt(end - 1) === 46) end--; // and a bare point
  return exponent ? `${text.slice(0, end)}e-${k - 3}` : text.slice(0, end);
}

/**
 * The four significant figures of x ≠ 0 as m·10^−k (1000 ≤ m ≤ 9999, −11 ≤ k ≤ 303), packed as m·512 + k + 11,
 * from the integer of the four digits; −1 from 10¹⁵ up (and below about 10⁻³⁰⁰) and within 10⁻⁷ of a tie between
 * two roundings, where the answer is left to toPrecision (which formats the double's exact decimal expansion,
 * slowly). The scaling's rounding error (a few units in the last place) is far inside that margin.
 */
export function fourFigureParts(x: number): number {
  const a = x < 0 ? -x : x;
  if (!(a < 1e15)) return -1;
  let k = 3 - Math.floor(Math.log10(a)); // a·10^k in [1000, 10000)
  if (!(k < MAX_SCALE)) return -1; // also a = 0 (k = Infinity)
  let scaled = timesPowerOfTen(a, k);
  if (scaled < 1000) scaled = timesPowerOfTen(a, ++k);
  else if (scaled >= 10000) scaled = timesPowerOfTen(a, --k);
  const below = Math.floor(scaled);
  if (Math.abs(scaled - below - 0.5) < 1e-7) return -1;
  let m = Math.round(scaled);
  if (m === 10000) {
    m = 1000;
    k--;
  }
  return m * 512 + k + 11;
}

/** 4 significant figures: the text String(Number(x.toPrecision(4))) gives (fourFigureParts). */
function fourFigures(x: number): string {
  if (x === 0) return "0";
  const parts = fourFigureParts(x);
  if (parts < 0) return String(Number(x.toPrecision(4)));
  const text = decimalText(Math.floor(parts / 512), (parts % 512) - 11);
  return x < 0 ? "-" + text : text;
}

/** A result number as a CSV field: rounded by kind (unless full precision), with the format's decimal mark. */
export function numberField(x: number, kind: NumberKind, format: CsvFormat): string {
  const text = format.fullPrecision ? String(x) : kind === "volts" ? voltsText(x) : fourFigures(x);
  return format.decimalMark === "." ? text : text.replace(".", ",");
}

/** One CSV line of text cells, newline included. */
export function textLine(cells: readonly string[], format: CsvFormat): string {
  return cells.map((c) => textField(c, format)).join(format.delimiter) + "\n";
}

/**
 * Reading numbers as sample logs write them: a decimal point, or a decimal comma where the file's delimiter is a
 * semicolon or a tab (the European spreadsheet export, common practice). Exponents as in 1.5E-3 / 1,5E-3. No
 * thousands separators: "1.234,5" is not a number here, and is passed on as text.
 */

export type DecimalMark = "." | ",";

/** The number pattern of the worksheet functions (a decimal point). */
export const POINT_NUMBER = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

/** The same pattern with a decimal comma. */
export const COMMA_NUMBER = /^\s*[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?\s*$/;

const POWERS_OF_TEN = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * The value of a plain decimal of at most 15 digits — an optional sign, digits, and optionally the mark (code 46 "."
 * or 44 ",") followed by digits — read by its characters, or NaN for any other text (left to the patterns above).
 * Exactly Number(text): the digits form an integer below 2⁵³ and 10^k (k ≤ 15) is exact, so the one division is the
 * correctly rounded value of the decimal, as Number's is (ECMA-262, StringToNumber). Faster than a pattern and
 * Number for the millions of cells of a log.
 */
function plainDecimal(text: string, mark: number): number {
  const end = text.length;
  const first = text.charCodeAt(0);
  let i = first === 43 || first === 45 ? 1 : 0; // + or -
  const digitsFrom = i;
  let digits = 0;
  let scale = -1; // digits after the mark, once it is seen
  for (; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      digits = digits * 10 + (c - 48);
      if (scale >= 0) scale++;
    } else if (c === mark && scale < 0 && i > digitsFrom) scale = 0;
    else return NaN;
  }
  const count = end - digitsFrom - (scale >= 0 ? 1 : 0);
  if (count === 0 || count > 15 || scale === 0) return NaN;
  const value = scale > 0 ? digits / POWERS_OF_TEN[scale] : digits;
  return first === 45 ? -value : value;
}

/** The number a cell's text holds with this decimal mark, or null when it holds none (blank, text, "1.234,5"). */
export function readNumber(text: string, mark: DecimalMark = "."): number | null {
  const plain = plainDecimal(text, mark === "." ? 46 : 44);
  if (!Number.isNaN(plain)) return plain;
  if (mark === ".") return POINT_NUMBER.test(text) ? Number(text) : null;
  return COMMA_NUMBER.test(text) ? Number(text.replace(",", ".")) : null;
}

/** A number written with this decimal mark. */
export function writeDecimal(text: string, mark: DecimalMark): string {
  return mark === "." ? text : text.replace(".", ",");
}

/** Fields that read as a number only with a decimal comma ("7,25") and only with a decimal point ("7.25"). */
function markVotes(fields: readonly string[]): { comma: number; point: number } {
  let comma = 0;
  let point = 0;
  for (const f of fields) {
    const t = f.trim();
    if (/^[+-]?\d*,\d+([eE][+-]?\d+)?$/.test(t)) comma++;
    else if (/^[+-]?\d*\.\d+([eE][+-]?\d+)?$/.test(t)) point++;
  }
  return { comma, point };
}

/**
 * The decimal mark of a table from some of its data fields: a comma only where the delimiter is not one (";" or
 * tab) and more fields read as decimal-comma numbers than as decimal-point numbers.
 */
export function guessDecimalMark(delimiter: string, fields: readonly string[]): DecimalMark {
  if (delimiter === ",") return ".";
  const { comma, point } = markVotes(fields);
  return comma > point ? "," : ".";
}

/**
 * The cells of a delimited table with its decimal-comma numbers as numbers, when the table writes them so (its
 * delimiter ";" or tab, and guessDecimalMark says ","); the other cells, and every cell of a decimal-point table,
 * as they are. For readers that take only decimal points (the pane's sample reader).
 */
export function withDecimalCommas(rows: readonly (readonly string[])[], delimiter: string): (string | number)[][] {
  const mark = guessDecimalMark(delimiter, rows.flat());
  if (mark === ".") return rows.map((row) => [...row]);
  return rows.map((row) => row.map((cell) => (cell.includes(",") ? (readNumber(cell, ",") ?? cell) : cell)));
}

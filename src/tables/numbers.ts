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

/** The number a cell's text holds with this decimal mark, or null when it holds none (blank, text, "1.234,5"). */
export function readNumber(text: string, mark: DecimalMark = "."): number | null {
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

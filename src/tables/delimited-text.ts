/**
 * Pasted or opened tables: CSV (comma or semicolon) or TSV text → rows of cells. Quoted fields may hold the
 * delimiter, doubled quotes and line breaks (RFC 4180). Lines starting with "#" before the header are comments.
 * The delimiter is the one of tab, comma and semicolon that occurs most often, outside quotes, on the first
 * non-comment line (delimiter.ts). (csv-parse would need a Buffer polyfill in the browser; this is the small part we use.)
 */
import { guessDelimiter } from "./delimiter";

export interface ParsedText {
  readonly rows: string[][];
  /** 1-based line number in the text of each row's first line (for messages that point to the file). */
  readonly lines: number[];
  readonly delimiter: string;
  readonly comments: string[];
}

export function parseDelimited(text: string): ParsedText {
  const source = text.replace(/^\uFEFF/, "");
  const comments: string[] = [];
  let start = 0;
  let line = 1;
  // leading comment lines and blank lines
  for (;;) {
    const end = source.indexOf("\n", start);
    const current = source.slice(start, end < 0 ? source.length : end).replace(/\r$/, "");
    if (current.trim().startsWith("#")) comments.push(current.trim());
    else if (current.trim() !== "" || end < 0) break;
    if (end < 0) break;
    start = end + 1;
    line++;
  }
  const firstEnd = source.indexOf("\n", start);
  const delimiter = guessDelimiter(source.slice(start, firstEnd < 0 ? source.length : firstEnd));
  const rows: string[][] = [];
  const lines: number[] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  let rowLine = line;
  let sawAny = false;
  const endRow = () => {
    row.push(field);
    if (!(row.length === 1 && row[0].trim() === "")) {
      rows.push(row);
      lines.push(rowLine);
    }
    row = [];
    field = "";
    sawAny = false;
  };
  for (let i = start; i < source.length; i++) {
    const ch = source[i];
    if (quoted) {
      if (ch === '"') {
        if (source[i + 1] === '"') {
          field += '"';
          i++;
        } else quoted = false;
      } else {
        if (ch === "\n") line++;
        field += ch;
      }
      continue;
    }
    if (ch === '"' && field === "") {
      quoted = true;
      sawAny = true;
    } else if (ch === delimiter) {
      row.push(field);
      field = "";
      sawAny = true;
    } else if (ch === "\n") {
      endRow();
      line++;
      rowLine = line;
    } else if (ch === "\r") {
      // CR of CRLF
    } else {
      field += ch;
      sawAny = true;
    }
  }
  if (sawAny || field !== "" || row.length > 0) endRow();
  return { rows, lines, delimiter, comments };
}

/**
 * Splits streamed CSV text into records, one per record of the file: every line after the header is a record,
 * blank lines and lines of delimiters included (they give rows of blank results), and a line starting with "#" is
 * data like any other (a sample id may begin with it). Before the header, blank lines and "#" lines are a preamble
 * (the demo log's note that it is invented). Quoted fields may hold the delimiter, doubled quotes and line breaks
 * (RFC 4180); a quote elsewhere in a field is kept as written. Lines without a quote take a fast split.
 */

/** One record as read: its fields and the file line it starts on. */
export interface InputRow {
  readonly fields: readonly string[];
  readonly line: number;
  /**
   * The record's line as read (without its line break) when it holds no quote: its fields joined by the delimiter;
   * else undefined (every row has the same properties, so code reading rows sees one shape).
   */
  readonly text: string | undefined;
}

export class MalformedCsvError extends Error {}

/** Fields of a quoted record starting at `start`, or null when its closing quote is not in `text` yet. */
function parseQuotedRecord(
  text: string,
  start: number,
  delimiter: string,
): { fields: string[]; next: number; breaks: number } | null {
  const fields: string[] = [];
  let field = "";
  let breaks = 0;
  let i = start;
  let atFieldStart = true;
  for (;;) {
    if (i >= text.length) return null;
    const ch = text[i];
    if (atFieldStart && ch === '"') {
      // a quoted field: up to the closing quote, "" is one quote
      let j = i + 1;
      for (;;) {
        const q = text.indexOf('"', j);
        if (q < 0) return null;
        for (let k = text.indexOf("\n", j); k >= 0 && k < q; k = text.indexOf("\n", k + 1)) breaks++;
        field += text.slice(j, q);
        if (text[q + 1] === '"') {
          field += '"';
          j = q + 2;
          continue;
        }
        if (q + 1 >= text.length) return null; // the next character decides whether the record ends
        i = q + 1;
        break;
      }
      atFieldStart = false;
      continue;
    }
    atFieldStart = false;
    if (ch === delimiter) {
      fields.push(field);
      field = "";
      atFieldStart = true;
    } else if (ch === "\n") {
      fields.push(field.endsWith("\r") ? field.slice(0, -1) : field);
      return { fields, next: i + 1, breaks };
    } else field += ch;
    i++;
  }
}

export class RecordSplitter {
  private rest = "";
  private line = 1;
  private started = false;
  /** Preamble lines skipped before the header. */
  preambleLines = 0;

  constructor(
    private readonly delimiter: string,
    private headerSeen = false,
  ) {}

  /** Appends the complete records of `chunk` (with what was left over) to `out`; keeps an incomplete tail. */
  push(chunk: string, out: InputRow[]): void {
    let text = this.rest + chunk;
    if (!this.started) {
      this.started = true;
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    }
    const d = this.delimiter;
    let pos = 0;
    // the next quote at or after pos (searched again only once passed: one scan per chunk, not one per line)
    let quote = text.indexOf('"');
    for (;;) {
      const nl = text.indexOf("\n", pos);
      if (nl < 0) break;
      const end = nl > pos && text.charCodeAt(nl - 1) === 13 ? nl - 1 : nl;
      if (quote >= 0 && quote < pos) quote = text.indexOf('"', pos);
      if (quote < 0 || quote > nl) {
        const lineText = text.slice(pos, end);
        // after the header (almost every line) the record is made here, without the preamble's checks
        if (this.headerSeen) out.push({ fields: lineText.split(d), line: this.line, text: lineText });
        else this.emit(lineText, null, out);
        pos = nl + 1;
        this.line++;
        continue;
      }
      const record = parseQuotedRecord(text, pos, d);
      if (record === null) break;
      this.emit(null, record.fields, out);
      pos = record.next;
      this.line += 1 + record.breaks;
    }
    this.rest = text.slice(pos);
  }

  /** The last record (a final line without a line break). Throws MalformedCsvError for an unclosed quote. */
  end(out: InputRow[]): void {
    if (this.rest === "") return;
    const text = this.rest + "\n";
    this.rest = "";
    if (text.indexOf('"') < 0) {
      this.emit(text.slice(0, text.endsWith("\r\n") ? -2 : -1), null, out);
      return;
    }
    const record = parseQuotedRecord(text, 0, this.delimiter);
    if (record === null || record.next < text.length)
      throw new MalformedCsvError(`line ${this.line}: a quoted field is not closed before the end of the file`);
    this.emit(null, record.fields, out);
  }

  /** Text not yet split into records (bounded by the longest record). */
  get pending(): number {
    return this.rest.length;
  }

  private emit(lineText: string | null, fields: string[] | null, out: InputRow[]): void {
    if (!this.headerSeen) {
      const first = lineText ?? fields?.join(this.delimiter) ?? "";
      if (first.trim() === "" || first.trimStart().startsWith("#")) {
        this.preambleLines++;
        return;
      }
      this.headerSeen = true;
    }
    if (lineText === null) out.push({ fields: fields as string[], line: this.line, text: undefined });
    else out.push({ fields: lineText.split(this.delimiter), line: this.line, text: lineText });
  }
}

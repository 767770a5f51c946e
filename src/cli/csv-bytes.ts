/**
 * The results CSV as bytes: lines are written straight into a buffer (UTF-8) that the run hands to the output
 * stream about 1 MiB at a time, numbers written digit by digit from their integers. The text is exactly what
 * csv-format.ts gives (numberField, textField), without a string per cell, per line and per batch to build, join
 * and encode again.
 */
import { readNumber } from "../tables";
import {
  EXPONENT_SCALE,
  fourFigureParts,
  numberField,
  textField,
  voltsTenths,
  type CsvFormat,
  type NumberKind,
} from "./csv-format";

/** Bytes kept before the buffer grows (a few batches' lines). */
const INITIAL_BYTES = 1 << 21;
/** The distinct text cells (species, regimes) whose encoded bytes are kept. */
const MAX_CACHED_TEXTS = 4096;

export class CsvBytes {
  private bytes: Buffer = Buffer.allocUnsafe(INITIAL_BYTES);
  /** Bytes written so far. */
  length = 0;
  private readonly delimiter: number;
  private readonly mark: number;
  private readonly texts = new Map<string, Buffer>();

  constructor(readonly format: CsvFormat) {
    this.delimiter = format.delimiter.length === 1 ? format.delimiter.charCodeAt(0) : -1;
    this.mark = format.decimalMark.charCodeAt(0);
  }

  /** The bytes written so far, handed over (the buffer is not written to again); starts an empty one. */
  take(): Buffer {
    const written = this.bytes.subarray(0, this.length);
    this.bytes = Buffer.allocUnsafe(Math.max(INITIAL_BYTES, this.bytes.length));
    this.length = 0;
    return written;
  }

  /** The text written so far (for tests and small outputs); the buffer is emptied. */
  takeText(): string {
    return this.take().toString("utf8");
  }

  /** Room for `n` more bytes. */
  private reserve(n: number): void {
    if (this.length + n <= this.bytes.length) return;
    const grown = Buffer.allocUnsafe(Math.max(2 * this.bytes.length, this.length + n));
    this.bytes.copy(grown, 0, 0, this.length);
    this.bytes = grown;
  }

  byte(code: number): void {
    if (this.length >= this.bytes.length) this.reserve(1);
    this.bytes[this.length++] = code;
  }

  /** The format's delimiter (a multi-character one as its text). */
  delimiterByte(): void {
    if (this.delimiter >= 0) this.byte(this.delimiter);
    else this.text(this.format.delimiter);
  }

  /** Text as it is, UTF-8. */
  text(text: string): void {
    const n = text.length;
    this.reserve(3 * n);
    const bytes = this.bytes;
    let at = this.length;
    for (let i = 0; i < n; i++) {
      const c = text.charCodeAt(i);
      if (c > 127) {
        this.length = at;
        this.length += bytes.write(text.slice(i), at, "utf8");
        return;
      }
      bytes[at++] = c;
    }
    this.length = at;
  }

  /** A text cell as textField writes it (neutralised, quoted where needed); repeated cells from a cache. */
  textCell(text: string): void {
    if (text === "") return;
    let encoded = this.texts.get(text);
    if (encoded === undefined) {
      encoded = Buffer.from(textField(text, this.format), "utf8");
      if (this.texts.size < MAX_CACHED_TEXTS) this.texts.set(text, encoded);
    }
    this.reserve(encoded.length);
    const bytes = this.bytes;
    let at = this.length;
    for (let i = 0; i < encoded.length; i++) bytes[at++] = encoded[i];
    this.length = at;
  }

  /**
   * Copies an unquoted record's line when every field of it is written as it was read (textField leaves it as it
   * is): printable ASCII, no space at either end of a field, and no field that a spreadsheet would take for a formula
   * (=, +, -, @ not starting a number). Returns false, with nothing written, when a field needs textField.
   */
  lineAsRead(text: string, fields: readonly string[]): boolean {
    const d = this.delimiter;
    if (d < 0) return false;
    const { rawText, decimalMark } = this.format;
    const end = text.length;
    this.reserve(end);
    const bytes = this.bytes;
    let at = this.length;
    let field = 0;
    let start = true;
    for (let i = 0; i < end; i++) {
      const c = text.charCodeAt(i);
      bytes[at++] = c;
      if (c === d) {
        field++;
        start = true;
        continue;
      }
      if (c === 32) {
        if (start || i + 1 === end || text.charCodeAt(i + 1) === d) return false;
      } else if (c < 32 || c > 126) return false;
      else if (start && !rawText && (c === 61 || c === 43 || c === 45 || c === 64)) {
        if (readNumber(fields[field], decimalMark) === null) return false;
      }
      start = false;
    }
    this.length = at;
    return true;
  }

  /** A result number as numberField writes it. */
  number(x: number, kind: NumberKind): void {
    if (!this.format.fullPrecision && (kind === "volts" ? this.volts(x) : this.fourFigures(x))) return;
    this.text(numberField(x, kind, this.format));
  }

  /** Digits of a whole number 0 ≤ n < 2⁵³. */
  private digits(n: number): void {
    if (n < 10) {
      this.byte(48 + n);
      return;
    }
    let count = 1;
    for (let p = 10; p <= n; p *= 10) count++;
    this.reserve(count);
    const bytes = this.bytes;
    let at = this.length + count;
    this.length = at;
    while (count-- > 0) {
      const q = Math.floor(n / 10);
      bytes[--at] = 48 + (n - 10 * q);
      n = q;
    }
  }

  /** Volts to 0.1 mV (voltsTenths); false when numberField must write it. */
  private volts(x: number): boolean {
    const n = voltsTenths(x);
    if (n === null) return false;
    const a = n < 0 ? -n : n;
    const whole = Math.floor(a / 1e4);
    if (whole >= 10) {
      if (n < 0) this.byte(45);
      this.digits(whole);
    } else {
      this.reserve(2);
      if (n < 0) this.bytes[this.length++] = 45;
      this.bytes[this.length++] = 48 + whole;
    }
    let fraction = a - whole * 1e4;
    if (fraction === 0) return true;
    // the point and up to four digits, without trailing zeros
    this.reserve(5);
    const bytes = this.bytes;
    let at = this.length;
    bytes[at++] = this.mark;
    for (let unit = 1000; fraction > 0; unit /= 10) {
      const d = Math.floor(fraction / unit);
      bytes[at++] = 48 + d;
      fraction -= d * unit;
    }
    this.length = at;
    return true;
  }

  /** 4 significant figures (fourFigureParts); false when numberField must write it. */
  private fourFigures(x: number): boolean {
    if (x === 0) {
      this.byte(48);
      return true;
    }
    const parts = fourFigureParts(x);
    if (parts < 0) return false;
    const m = Math.floor(parts / 512);
    const k = (parts % 512) - 11;
    if (x < 0) this.byte(45);
    if (k <= 0) {
      this.digits(m * 10 ** -k);
      return true;
    }
    // the four digits with the point before the last k of them (after the first in exponent notation), trailing
    // zeros (and a bare point) left out
    let last = 4;
    for (let rest = m; rest % 10 === 0; rest /= 10) last--;
    const exponent = k > EXPONENT_SCALE;
    const whole = exponent ? 1 : 4 - k;
    if (whole > 0) this.digits(Math.floor(m / 10 ** (4 - whole)));
    else {
      this.byte(48);
      this.byte(this.mark);
      for (let z = whole; z < 0; z++) this.byte(48);
    }
    if (whole > 0 && last > whole) this.byte(this.mark);
    for (let i = Math.max(whole, 0); i < last; i++) this.byte(48 + (Math.floor(m / 10 ** (3 - i)) % 10));
    if (exponent) {
      this.byte(101); // e
      this.byte(45);
      this.digits(k - 3);
    }
    return true;
  }
}

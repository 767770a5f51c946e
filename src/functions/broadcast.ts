/**
 * The one coercion and broadcasting layer every worksheet function goes through.
 *
 * Each argument may be a single cell or a range (rows of cells). Ranges broadcast like arrays do: along each
 * dimension the sizes must agree or be 1, and the result takes the common shape (so it spills). Blank means
 * missing: a blank cell in a required argument, or in a measured optional argument given as a cell or range
 * (temperature), gives a blank result in that position; defaults apply only to omitted arguments (and to blank
 * cells of options that are not measurements, such as activity). Every failure becomes #VALUE! or #N/A naming the
 * argument; nothing here throws, and no NaN or Infinity reaches a cell. An error cell inside a range (Excel passes it
 * in because functions.json sets allowErrorForDataTypeAny) gives an error in that position only.
 */
import {
  argumentError,
  argumentNotAvailable,
  basicValueOf,
  CellError,
  CellInput,
  CellOutput,
  CellScalar,
  inputErrorCode,
  isBlank,
  notAvailable,
  toHostError,
  valueError,
} from "./cell-values";

/** How one argument is read from a cell. */
export interface ArgSpec<T> {
  /** The argument's name as the function help shows it ("pH", "temperature"). */
  readonly name: string;
  /** Optional arguments take `defaultValue` when omitted (and, unless `measured`, when blank). */
  readonly optional: boolean;
  /** A measurement: a blank cell given for it is a missing value (blank result), never the default. */
  readonly measured?: boolean;
  readonly defaultValue?: T;
  /** Reads a non-blank cell. */
  parse(value: Exclude<CellScalar, null | undefined>): T | CellError;
  /** For numbers: the accepted interval, so that a plain number inside it is taken without a call to parse. */
  readonly accepts?: { readonly low: number; readonly high: number };
}

/** Reads a number; numeric text ("7.25") is accepted, as spreadsheets often hold numbers typed as text. */
export function numberArg(
  name: string,
  options: {
    min?: number;
    max?: number;
    /** Lower bound excluded (activity > 0). */
    minExclusive?: boolean;
    optional?: boolean;
    defaultValue?: number;
    /** Shown in range messages: "°C", "bar". */
    unit?: string;
    /** A measurement: a blank cell given for it gives a blank result (see ArgSpec.measured). */
    measured?: boolean;
    /** The whole message for a number outside [min, max], when the generic one would not say what to do. */
    outOfRange?: (x: number) => string;
  } = {},
): ArgSpec<number> {
  const {
    min,
    max,
    minExclusive = false,
    optional = false,
    defaultValue,
    unit = "",
    measured = false,
    outOfRange,
  } = options;
  const suffix = unit ? ` ${unit}` : "";
  const rangeText = (): string => {
    const low = min === undefined ? "" : `${minExclusive ? "above" : "at least"} ${min}${suffix}`;
    const high = max === undefined ? "" : `at most ${max}${suffix}`;
    return [low, high].filter(Boolean).join(" and ");
  };
  // the closed interval a plain number may take without further checks (an excluded bound is left to parse)
  const low =
    min === undefined ? -Number.MAX_VALUE : minExclusive ? Math.max(min, 0) * (1 + 1e-15) + Number.MIN_VALUE : min;
  const high = max === undefined ? Number.MAX_VALUE : max;
  return {
    name,
    optional,
    measured,
    defaultValue,
    accepts: { low, high },
    parse(value) {
      let x: number;
      if (typeof value === "number") x = value;
      else if (typeof value === "string" && /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(value))
        x = Number(value);
      else return argumentError(name, `expected a number, got ${describe(value)}`);
      if (!isFiniteNumber(x)) return argumentError(name, `expected a finite number, got ${x}`);
      const below = min !== undefined && (minExclusive ? x <= min : x < min);
      if (below || (max !== undefined && x > max))
        return valueError(outOfRange ? outOfRange(x) : `${name}: ${x} is out of range (${rangeText()})`, name);
      return x;
    },
  };
}

/** Reads a text choice through `resolve`, which returns the meaning or an error naming what was expected. */
export function textArg<T>(
  name: string,
  resolve: (text: string) => T | CellError,
  options: { optional?: boolean; defaultValue?: T } = {},
): ArgSpec<T> {
  return {
    name,
    optional: options.optional ?? false,
    defaultValue: options.defaultValue,
    parse(value) {
      if (typeof value !== "string") {
        if (typeof value === "number" && Number.isInteger(value)) return resolve(String(value));
        return argumentError(name, `expected text, got ${describe(value)}`);
      }
      return resolve(value.trim());
    },
  };
}

function describe(value: unknown): string {
  if (typeof value === "string") return `the text "${value.length > 24 ? value.slice(0, 24) + "…" : value}"`;
  if (typeof value === "boolean") return `the logical value ${value ? "TRUE" : "FALSE"}`;
  if (typeof value === "number") return String(value);
  return "an unreadable value";
}

/** Shape of one argument: rows × columns (a single cell is 1 × 1). */
interface Shape {
  rows: number;
  cols: number;
}

const BLANK = Symbol("blank");
/** Arguments passed one by one to `compute` (more are spread). */
const FIXED_ARITY = 12;

// Built-ins held in module constants: in a sandboxed host each global lookup can be slow, and these run per cell.
const isFiniteNumber = Number.isFinite;
const isArray = Array.isArray;
type Parsed<T> = T | CellError | typeof BLANK;

type SpecsOf<A extends unknown[]> = { [K in keyof A]: ArgSpec<A[K]> };

/** The arguments' shapes and the shape they broadcast to, or the error of an empty or mismatched range. */
function broadcastShape<A extends unknown[]>(
  specs: SpecsOf<A>,
  inputs: readonly CellInput[],
): { shapes: Shape[]; rows: number; cols: number } | CellError {
  const count = specs.length;
  const shapes: Shape[] = [];
  for (let i = 0; i < count; i++) {
    const shape = shapeOf(inputs[i]);
    if (shape === null) return argumentError(specs[i].name, "the range is empty or not rectangular");
    shapes.push(shape);
  }
  let rows = 1;
  let cols = 1;
  for (let i = 0; i < count; i++) {
    const s = shapes[i];
    if (s.rows !== 1) {
      if (rows !== 1 && rows !== s.rows) return shapeError(specs, shapes);
      rows = s.rows;
    }
    if (s.cols !== 1) {
      if (cols !== 1 && cols !== s.cols) return shapeError(specs, shapes);
      cols = s.cols;
    }
  }
  return { shapes, rows, cols };
}

/** Single-cell arguments parsed once into `args`; the indices of the ranges, read cell by cell in the row loop. */
function constantArguments<A extends unknown[]>(
  specs: SpecsOf<A>,
  inputs: readonly CellInput[],
  shapes: readonly Shape[],
): { args: unknown[]; varying: number[]; constantError: number; constantBlank: boolean } {
  const args: unknown[] = specs.map(() => undefined);
  const varying: number[] = [];
  let constantError = -1; // index of the first single-cell argument holding an error
  let constantBlank = false;
  for (let i = 0; i < specs.length; i++) {
    const s = shapes[i];
    if (s.rows !== 1 || s.cols !== 1) {
      varying.push(i);
      continue;
    }
    // a top-level blank is an omitted argument; a blank inside an array is a cell the user pointed at
    const parsed = parseCell(specs[i], cellAt(inputs[i], 0, 0), isArray(inputs[i]));
    if (parsed === BLANK) constantBlank = true;
    else if (parsed instanceof CellError) {
      if (constantError < 0) constantError = i;
      args[i] = parsed;
    } else args[i] = parsed;
  }
  return { args, varying, constantError, constantBlank };
}

/**
 * Applies `compute` cell by cell over broadcast arguments. `compute` receives parsed values and returns a number,
 * text, "" for blank, or a CellError. The result always has at least one cell.
 */
export function mapCells<A extends unknown[]>(
  specs: SpecsOf<A>,
  inputs: readonly CellInput[],
  compute: (...args: A) => CellOutput,
): CellOutput[][] {
  const shape = broadcastShape(specs, inputs);
  if (shape instanceof CellError) return [[toHostError(shape)]];
  const { shapes, rows, cols } = shape;

  // Arguments given as one cell are parsed once, before the loop; only ranges are read cell by cell.
  const constants = constantArguments(specs, inputs, shapes);
  const columns = constants.varying.map((i) => varyingColumn(i, specs[i], inputs[i] as CellScalar[][], shapes[i]));
  const unguarded = cellReader(specs, constants, columns, compute, false);
  // Computations almost never throw: run unguarded, and only if one does, run again guarding every cell.
  try {
    return fillCells(rows, cols, unguarded);
  } catch {
    return fillCells(rows, cols, cellReader(specs, constants, columns, compute, true));
  }
}

/** How one result cell at (r, c) is worked out. */
type CellAt = (r: number, c: number) => CellOutput;

/**
 * One result cell: the row's varying arguments read into the constants' `args`, then the computation (`guarded`:
 * a throw becomes that cell's #VALUE!).
 */
function cellReader<A extends unknown[]>(
  specs: SpecsOf<A>,
  constants: ReturnType<typeof constantArguments>,
  columns: readonly VaryingColumn[],
  compute: (...args: A) => CellOutput,
  guarded: boolean,
): CellAt {
  const { args, constantError, constantBlank } = constants;
  // columns of plain numbers (a lab export) are read from parallel arrays, the rest cell by cell
  const plainColumns = columns.filter((column) => column.plain !== null);
  const readColumns = columns.filter((column) => column.plain === null);
  const plainCount = plainColumns.length;
  const plainIndex = Int32Array.from(plainColumns, (column) => column.index);
  const plainRowStep = Int32Array.from(plainColumns, (column) => column.rowStep);
  const plainColStep = Int32Array.from(plainColumns, (column) => column.colStep);
  const plainValues = plainColumns.map((column) => column.plain as Float64Array);
  const readCount = readColumns.length;
  const wide = args.length > FIXED_ARITY;
  return (r, c) => {
    let blank = constantBlank;
    let errorIndex = constantError;
    for (let k = 0; k < plainCount; k++)
      args[plainIndex[k]] = plainValues[k][r * plainRowStep[k] + c * plainColStep[k]];
    for (let k = 0; k < readCount; k++) {
      const column = readColumns[k];
      const i = column.index;
      const value = column.range[r * column.rowStep][c * column.colStep];
      // a text cell equal to the one above reads the same (readers are pure): a metal column repeats its symbols
      let parsed: unknown;
      if (typeof value === "string" && value === column.lastText) parsed = column.lastParsed;
      else {
        parsed = parseCell(specs[i], value, true);
        if (typeof value === "string") {
          column.lastText = value;
          column.lastParsed = parsed;
        }
      }
      if (parsed === BLANK) blank = true;
      else if (typeof parsed === "object" && parsed instanceof CellError) {
        if (errorIndex < 0 || i < errorIndex) errorIndex = i; // the first error in argument order wins over blanks
        args[i] = parsed;
      } else args[i] = parsed;
    }
    if (errorIndex >= 0) return toHostError(args[errorIndex] as CellError);
    if (blank) return "";
    if (guarded) return finish(safeCompute(compute, args as A));
    if (wide) return finish(compute(...(args as A)));
    const a = args; // a call of fixed arity: cheaper per cell than spreading the array
    const call = compute as (...x: unknown[]) => CellOutput;
    return finish(call(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8], a[9], a[10], a[11]));
  };
}

/** The rows × cols result, cell by cell. */
function fillCells(rows: number, cols: number, cell: CellAt): CellOutput[][] {
  const result: CellOutput[][] = new Array(rows);
  if (rows > 1 && rows < cols) return fillByColumns(result, rows, cols, cell);
  for (let r = 0; r < rows; r++) {
    // a one-cell literal for a column (the usual lab export): an empty literal grown by one cell reserves room for
    // many, and those rows stay alive until the host takes the result, so every collection copies them
    if (cols === 1) result[r] = [cell(r, 0)];
    else {
      const row: CellOutput[] = []; // a literal: in a sandboxed host the global Array is a slow lookup
      for (let c = 0; c < cols; c++) row[c] = cell(r, c);
      result[r] = row;
    }
  }
  return result;
}

/**
 * A few rows over many columns (a row of samples against a column of choices, as BOUNDARY's directions): column by
 * column, so that the answers for one sample are worked out one after the other (the engine keeps its lines).
 */
function fillByColumns(result: CellOutput[][], rows: number, cols: number, cell: CellAt): CellOutput[][] {
  for (let r = 0; r < rows; r++) result[r] = [];
  for (let c = 0; c < cols; c++) for (let r = 0; r < rows; r++) result[r][c] = cell(r, c);
  return result;
}

/** A range argument as the row loop reads it. */
interface VaryingColumn {
  readonly index: number;
  readonly range: CellScalar[][];
  /** Steps into `range` (0 along a dimension of size 1, which broadcasts). */
  readonly rowStep: number;
  readonly colStep: number;
  /** The range's numbers in one flat array (index r·rowStep + c·colStep), or null when a cell needs reading. */
  readonly plain: Float64Array | null;
  /** The last text cell read, and what it read as. */
  lastText: string | null;
  lastParsed: unknown;
}

/**
 * Reads a range argument column by column before the row loop. When every cell is a plain number inside the spec's
 * accepted interval (a lab column), the numbers go into one typed array: the row loop then reads contiguous
 * memory instead of one row array per cell of every argument, which was most of a row's cost with many columns.
 */
function varyingColumn(index: number, spec: ArgSpec<unknown>, range: CellScalar[][], shape: Shape): VaryingColumn {
  const accepts = spec.accepts;
  const plain = accepts ? plainNumbers(range, shape, accepts.low, accepts.high) : null;
  return {
    index,
    range,
    rowStep: plain ? (shape.rows === 1 ? 0 : shape.cols) : shape.rows === 1 ? 0 : 1,
    colStep: shape.cols === 1 ? 0 : 1,
    plain,
    lastText: null,
    lastParsed: undefined,
  };
}

/**
 * The range's cells row by row in one typed array, or null unless every one is a number in [low, high]. A loop of
 * its own returning a primitive result: the optimised loop then has no object to build at its exits, which cost a
 * deoptimisation (and a run through the interpreter) on every range before.
 */
function plainNumbers(range: CellScalar[][], shape: Shape, low: number, high: number): Float64Array | null {
  const { rows, cols } = shape;
  const plain = new Float64Array(rows * cols);
  for (let r = 0; r < rows; r++) {
    const cells = range[r];
    for (let c = 0; c < cols; c++) {
      const value = cells[c];
      if (typeof value !== "number" || !(value >= low && value <= high)) return null;
      plain[r * cols + c] = value;
    }
  }
  return plain;
}

/** Reads one cell; `given` is false only for an omitted argument (a top-level blank). */
function parseCell<T>(spec: ArgSpec<T>, value: unknown, given: boolean): Parsed<T> {
  if (isBlank(value)) {
    if (spec.optional && !(given && spec.measured)) return spec.defaultValue as T;
    return BLANK;
  }
  if (typeof value !== "number" && typeof value !== "string" && typeof value !== "boolean")
    return parseObject(spec, value, given);
  return spec.parse(value);
}

/** An error cell keeps its meaning (#N/A stays "no value"); a rich value is read by its plain value. */
function parseObject<T>(spec: ArgSpec<T>, value: unknown, given: boolean): Parsed<T> {
  const code = inputErrorCode(value);
  if (code === "#N/A") return argumentNotAvailable(spec.name, "the cell holds #N/A (no value)");
  if (code !== null)
    return argumentError(spec.name, `the cell holds the error ${code.slice(0, 12)}; correct that cell`);
  const basic = basicValueOf(value);
  if (basic !== undefined) return parseCell(spec, basic, given);
  return argumentError(spec.name, "the cell holds an unreadable value");
}

function safeCompute<A extends unknown[]>(compute: (...args: A) => CellOutput, args: A): CellOutput {
  try {
    return compute(...args);
  } catch (error) {
    return valueError(`unexpected failure: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/** A computed cell as the host shows it: CellError → the host's error, a non-finite number → #N/A. */
export function finish(value: CellOutput): CellOutput {
  if (value instanceof CellError) return toHostError(value);
  if (typeof value === "number" && !isFiniteNumber(value))
    return toHostError(notAvailable("no finite answer exists at this input"));
  return value;
}

function shapeOf(input: CellInput): Shape | null {
  if (!isArray(input)) return { rows: 1, cols: 1 };
  const rows = input.length;
  if (rows === 0) return null;
  const first = input[0];
  if (!isArray(first)) return null;
  const cols = first.length;
  if (cols === 0 || !rowsOfLength(input, cols)) return null;
  return { rows, cols };
}

/** Whether every row of `input` is an array of `cols` cells (a loop of its own, as in plainNumbers). */
function rowsOfLength(input: readonly unknown[], cols: number): boolean {
  for (let r = 1; r < input.length; r++) {
    const row = input[r];
    if (!isArray(row) || row.length !== cols) return false;
  }
  return true;
}

function cellAt(input: CellInput, r: number, c: number): unknown {
  return isArray(input) ? input[r][c] : input;
}

function shapeError(specs: readonly ArgSpec<unknown>[], shapes: Shape[]): CellError {
  const described = specs.map((s, i) => `${s.name} ${shapes[i].rows}×${shapes[i].cols}`).join(", ");
  return valueError(
    `ranges of different shapes cannot be combined (${described}); use ranges of the same size or single cells`,
  );
}

/**
 * What a worksheet cell can hold, as the spreadsheet passes it to a custom function, and the error values we
 * return. Errors are built through the host's `CustomFunctions.Error` when it exists (in the spreadsheet and in the
 * bundle harness) and as plain records otherwise (unit tests, command line), so one code path serves all hosts.
 *
 * Only two error kinds: Excel shows a custom message only with #VALUE! and #N/A (Office documentation of
 * CustomFunctions.ErrorCode, https://learn.microsoft.com/javascript/api/custom-functions-runtime/customfunctions.errorcode),
 * so anything the user can get wrong (wrong kind, unknown name, out of range) is #VALUE! and "no answer exists" is
 * #N/A, each with a message naming the argument, the value and what is expected.
 */

export type CellScalar = number | string | boolean | null | undefined;
/** One cell, or a range as rows of cells. */
export type CellInput = CellScalar | CellScalar[][];

export type ErrorKind = "#VALUE!" | "#N/A";

/**
 * The error value we hand back when no host registry exists: its code, its message and, when an argument is at
 * fault, that argument's name as the function help shows it ("pH"; several joined by ", ", as "oxidized, reduced").
 * Callers such as the command line read `argument`, never the message text.
 */
export class CellError {
  readonly argument?: string;
  constructor(
    readonly code: ErrorKind,
    readonly message: string,
    argument?: string,
  ) {
    if (argument !== undefined) this.argument = argument; // absent, not undefined, when no argument is at fault
  }
}

/** A value our functions may put in a result cell. Blank results are the empty string. */
export type CellOutput = number | string | CellError;

const HOST_ERROR_CODES: Record<ErrorKind, string> = {
  "#VALUE!": "invalidValue",
  "#N/A": "notAvailable",
};

interface HostRegistry {
  Error: new (code: unknown, message?: string) => unknown;
  ErrorCode: Record<string, unknown>;
}

/** A failure described in the engine's terms, converted to the host's error value at the edge. */
export function toHostError(error: CellError): CellOutput {
  const host = (globalThis as { CustomFunctions?: HostRegistry }).CustomFunctions;
  if (host && typeof host.Error === "function" && host.ErrorCode) {
    return new host.Error(host.ErrorCode[HOST_ERROR_CODES[error.code]], error.message) as CellOutput;
  }
  return error;
}

/**
 * Wrong kind, unknown name or out-of-range input: #VALUE! with a message naming value and expectation, and the
 * argument at fault when there is one (an error of one argument is written with `argumentError`).
 */
export const valueError = (message: string, argument?: string): CellError =>
  new CellError("#VALUE!", message, argument);
/** No answer exists at valid input: #N/A with its reason (and the argument whose value leaves no answer, if one). */
export const notAvailable = (message: string, argument?: string): CellError => new CellError("#N/A", message, argument);

/** #VALUE! for the named argument(s): the message leads with the name ("pH: expected a number, got …"). */
export const argumentError = (argument: string, detail: string): CellError =>
  valueError(`${argument}: ${detail}`, argument);
/** #N/A because of the named argument(s)' values, the message leading with the name. */
export const argumentNotAvailable = (argument: string, detail: string): CellError =>
  notAvailable(`${argument}: ${detail}`, argument);

/** Blank cell as the spreadsheet passes it: null, undefined or the empty string. */
export function isBlank(value: unknown): value is null | undefined | "" {
  return value === null || value === undefined || (typeof value === "string" && value.trim() === "");
}

/**
 * The error code ("#DIV/0!", "#N/A" …) of an error cell passed in by the spreadsheet, or null when `value` is not
 * one. Error cells arrive as CustomFunctions.Error objects ({code, message}); as rich cell values (the metadata allows
 * custom data for `any`) they arrive as {type: "Error", basicValue: "#N/A", …}.
 */
export function inputErrorCode(value: unknown): string | null {
  if (value === null || typeof value !== "object") return null;
  const record = value as { code?: unknown; type?: unknown; basicValue?: unknown; errorType?: unknown };
  if (typeof record.code === "string" && record.code.startsWith("#")) return record.code;
  if (record.type === "Error") {
    if (typeof record.basicValue === "string" && record.basicValue.startsWith("#")) return record.basicValue;
    return typeof record.errorType === "string" ? `#${record.errorType}` : "#VALUE!";
  }
  return null;
}

/** The plain value of a rich cell value ({type: "Double", basicValue: 7.2}), or undefined when there is none. */
export function basicValueOf(value: unknown): number | string | boolean | undefined {
  if (value === null || typeof value !== "object") return undefined;
  const basic = (value as { basicValue?: unknown }).basicValue;
  return typeof basic === "number" || typeof basic === "string" || typeof basic === "boolean" ? basic : undefined;
}

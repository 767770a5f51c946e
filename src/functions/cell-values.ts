/**
 * What a worksheet cell can hold, as the spreadsheet passes it to a custom function, and the error values we
 * return. Errors are built through the host's `CustomFunctions.Error` when it exists (in the spreadsheet and in the
 * bundle harness) and as plain records otherwise (unit tests, command line), so one code path serves all hosts.
 */

export type CellScalar = number | string | boolean | null | undefined;
/** One cell, or a range as rows of cells. */
export type CellInput = CellScalar | CellScalar[][];

export type ErrorKind = "#VALUE!" | "#NUM!" | "#N/A";

/** The error value we hand back when no host registry exists. */
export class CellError {
  constructor(
    readonly code: ErrorKind,
    readonly message: string,
  ) {}
}

/** A value our functions may put in a result cell. Blank results are the empty string. */
export type CellOutput = number | string | CellError;

const HOST_ERROR_CODES: Record<ErrorKind, string> = {
  "#VALUE!": "invalidValue",
  "#NUM!": "invalidNumber",
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

export const valueError = (message: string): CellError => new CellError("#VALUE!", message);
export const numError = (message: string): CellError => new CellError("#NUM!", message);
export const notAvailable = (message: string): CellError => new CellError("#N/A", message);

/** Blank cell as the spreadsheet passes it: null, undefined or the empty string. */
export function isBlank(value: unknown): value is null | undefined | "" {
  return value === null || value === undefined || (typeof value === "string" && value.trim() === "");
}

// Minimal ambient declarations of the spreadsheet's custom-function registry, for type checking only: the runtime
// object comes from the host (and from the stand-in in test-support/bundle-harness.ts). @types/custom-functions-runtime
// is not a dependency of this project; if it is added later, delete this file.

declare namespace CustomFunctions {
  /** Binds a function to the id it has in functions.json. */
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- functions of any parameter types must fit
  function associate(id: string, functionObject: (...args: any[]) => unknown): void;

  /** Error codes the spreadsheet shows in a cell. */
  enum ErrorCode {
    invalidValue = "#VALUE!",
    notAvailable = "#N/A",
    divisionByZero = "#DIV/0!",
    invalidNumber = "#NUM!",
    nullReference = "#NULL!",
    invalidName = "#NAME?",
    invalidReference = "#REF!",
  }

  /** An error value returned into a cell, with an optional message shown to the user. */
  class Error {
    constructor(errorCode: ErrorCode, errorMessage?: string);
    code: ErrorCode;
    message?: string;
  }

  /** Information about the call (the calling cell address when the function asks for it). */
  interface Invocation {
    address?: string;
    functionName?: string;
    parameterAddresses?: string[];
  }
}

// Loads the BUILT functions bundle (dist/functions.js) the way the spreadsheet's custom-function runtime does: in a
// Node vm context whose only non-standard global is a stand-in for the registry (CustomFunctions.associate, Error,
// ErrorCode). No window, self, document, console, timers or require: a bundle that reaches for any of them fails to
// load here. The directory is taken from REDOX_DIST (default dist/, relative to the repository root).

import { readFileSync, existsSync } from "node:fs";
import { dirname, isAbsolute, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import vm from "node:vm";

export const REPO_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "..");

/** The error codes the stand-in offers, with the text the spreadsheet shows. */
export const StandInErrorCode = {
  invalidValue: "#VALUE!",
  notAvailable: "#N/A",
  invalidNumber: "#NUM!",
  divisionByZero: "#DIV/0!",
  nullReference: "#NULL!",
  invalidName: "#NAME?",
  invalidReference: "#REF!",
} as const;

export type StandInErrorCodeValue = (typeof StandInErrorCode)[keyof typeof StandInErrorCode];

const KNOWN_CODES = new Set<string>(Object.values(StandInErrorCode));

/** Stand-in for CustomFunctions.Error: an error value with a code and an optional message. */
export class StandInError {
  readonly code: string;
  readonly message: string | undefined;
  constructor(code: string, message?: string) {
    this.code = code;
    this.message = message;
  }
  /** True when the code is one the spreadsheet knows (a bundle passing an undefined code would show nothing). */
  get known(): boolean {
    return KNOWN_CODES.has(this.code);
  }
}

export type CustomFunction = (...args: unknown[]) => unknown;

/** One entry of functions.json (the fields the tests read). */
export interface MetadataParameter {
  name: string;
  type?: string;
  dimensionality?: "scalar" | "matrix";
  optional?: boolean;
  repeating?: boolean;
  description?: string;
}
export interface MetadataFunction {
  id: string;
  name: string;
  description?: string;
  parameters: MetadataParameter[];
  result?: { type?: string; dimensionality?: "scalar" | "matrix" };
  options?: Record<string, unknown>;
}
export interface Metadata {
  functions: MetadataFunction[];
  enums?: unknown[];
  allowCustomDataForDataTypeAny?: boolean;
}

export interface LoadedBundle {
  /** Every function the bundle registered, by id as passed to associate (last registration wins). */
  functions: Map<string, CustomFunction>;
  /** How many times each id was associated (the metadata plugin adds its own calls; sources may add theirs). */
  associations: Map<string, number>;
  /** Parsed functions.json. */
  metadata: Metadata;
  /** Directory the bundle was read from. */
  dist: string;
}

/** The dist directory the tests read: REDOX_DIST (absolute, or relative to the repository root) or dist/. */
export function distDir(): string {
  const chosen = process.env.REDOX_DIST?.trim() || "dist";
  return isAbsolute(chosen) ? chosen : join(REPO_ROOT, chosen);
}

/**
 * Runs `code` in a fresh vm context that offers only the stand-in registry, and returns what it registered.
 * Throws what the code throws at load time (e.g. ReferenceError: window is not defined).
 */
export function runInStandInRegistry(code: string, filename = "functions.js") {
  const functions = new Map<string, CustomFunction>();
  const associations = new Map<string, number>();
  const registry = {
    associate(id: unknown, fn: unknown): void {
      if (typeof id !== "string" || id === "")
        throw new TypeError(`associate: id must be a non-empty string, got ${String(id)}`);
      if (typeof fn !== "function") throw new TypeError(`associate: ${id} is not bound to a function`);
      functions.set(id, fn as CustomFunction);
      associations.set(id, (associations.get(id) ?? 0) + 1);
    },
    Error: StandInError,
    ErrorCode: { ...StandInErrorCode },
  };
  const context = vm.createContext({ CustomFunctions: registry });
  vm.runInContext(code, context, { filename });
  return { functions, associations, context };
}

/** Loads dist/functions.js and dist/functions.json (directory from REDOX_DIST). */
export function loadBundle(dist: string = distDir()): LoadedBundle {
  const jsPath = join(dist, "functions.js");
  const jsonPath = join(dist, "functions.json");
  for (const p of [jsPath, jsonPath]) {
    if (!existsSync(p)) throw new Error(`${p} not found: build first (npm run build, or set REDOX_DIST)`);
  }
  const { functions, associations } = runInStandInRegistry(readFileSync(jsPath, "utf8"), jsPath);
  const metadata = JSON.parse(readFileSync(jsonPath, "utf8")) as Metadata;
  return { functions, associations, metadata, dist };
}

/** Calls a registered function and waits for it if it answers with a promise. */
export async function callFunction(fn: CustomFunction, args: unknown[]): Promise<unknown> {
  const out = fn(...args);
  if (out !== null && typeof out === "object" && typeof (out as { then?: unknown }).then === "function") {
    return await (out as PromiseLike<unknown>);
  }
  return out;
}

/** What a cell may hold: a finite number, a string (possibly empty) or a known error value. Returns why not. */
export function cellProblem(value: unknown): string | null {
  if (typeof value === "number") return Number.isFinite(value) ? null : `non-finite number ${value}`;
  if (typeof value === "string") return null;
  if (value instanceof StandInError) return value.known ? null : `error value with unknown code ${String(value.code)}`;
  if (value === undefined) return "undefined";
  if (value === null) return "null";
  return `unexpected ${typeof value}: ${safeString(value)}`;
}

/**
 * What a whole result may be, given the declared result dimensionality: a scalar cell, or for "matrix" a non-empty
 * rectangular 2-D array of cells (the spreadsheet cannot spill a ragged or empty array) or one error value.
 */
export function resultProblem(value: unknown, dimensionality: "scalar" | "matrix" = "scalar"): string | null {
  if (dimensionality === "scalar") return cellProblem(value);
  if (value instanceof StandInError) return cellProblem(value);
  if (!Array.isArray(value)) return `matrix result is not an array: ${safeString(value)}`;
  if (value.length === 0) return "matrix result has no rows";
  let width = -1;
  for (let r = 0; r < value.length; r++) {
    const row: unknown = value[r];
    if (!Array.isArray(row)) return `row ${r} is not an array`;
    if (row.length === 0) return `row ${r} is empty`;
    if (width === -1) width = row.length;
    else if (row.length !== width) return `ragged result: row ${r} has ${row.length} cells, row 0 has ${width}`;
    for (let c = 0; c < row.length; c++) {
      const p = cellProblem(row[c]);
      if (p) return `cell [${r}][${c}]: ${p}`;
    }
  }
  return null;
}

export function safeString(value: unknown): string {
  try {
    return (
      JSON.stringify(value, (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? String(v) : v))?.slice(0, 200) ??
      String(value)
    );
  } catch {
    return String(value);
  }
}

/** Whether a value (a cell or a 2-D range) holds an error cell. */
function containsError(value: unknown): StandInError | null {
  if (value instanceof StandInError) return value;
  if (Array.isArray(value)) {
    for (const row of value) {
      if (Array.isArray(row)) for (const cell of row) if (cell instanceof StandInError) return cell;
    }
  }
  return null;
}

/**
 * Calls a function the way Excel does with error cells among the arguments, as the Office documentation describes
 * ("Errors as custom function inputs", https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-errors):
 * unless functions.json sets `allowErrorForDataTypeAny`, a function whose input holds an error is not evaluated and
 * the formula shows that error (a spilled column fails as a whole); with it, parameters of type `any` receive the
 * error cells in place (here as stand-in errors) and the function answers cell by cell.
 */
export function callAsSpreadsheet(
  bundle: Pick<LoadedBundle, "functions" | "metadata">,
  id: string,
  args: unknown[],
): unknown {
  const meta = bundle.metadata.functions.find((f) => f.id === id);
  const fn = bundle.functions.get(id);
  if (!meta || !fn) throw new Error(`no function ${id}`);
  const allowed = (bundle.metadata as { allowErrorForDataTypeAny?: boolean }).allowErrorForDataTypeAny === true;
  for (let i = 0; i < args.length; i++) {
    const error = containsError(args[i]);
    if (!error) continue;
    const type = meta.parameters[i]?.type ?? "any";
    if (!allowed || type !== "any") return error;
  }
  return fn(...args);
}

// The demo workbook (data/demo/demo-workbook.xlsx, scripts/generate-demo-workbook.ts): every formula parses, calls
// only functions the built add-in declares (dist/functions.json, namespace REDOX) with an argument count the
// declaration allows, and — evaluated through the BUILT bundle (test-support/bundle-harness.ts) with its cell references
// resolved to the row's values — gives the values the command line writes for the same rows of the demo log, the
// sample's water (carbonate from its alkalinity, REDOX.DIC) included — and every formula cell carries that value as
// its cached result, so the file shows the answers where the add-in is not loaded.
// Needs a build: `npm test` builds first; alone, build to a temporary directory and set REDOX_DIST.

import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { PassThrough } from "node:stream";
import ExcelJS from "exceljs";
import { parse } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runCommand } from "../../src/cli/run";
import { dissolvedAt } from "../../src/functions/stability-functions";
import {
  callFunction,
  loadBundle,
  REPO_ROOT,
  StandInError,
  type LoadedBundle,
  type MetadataFunction,
} from "../../test-support/bundle-harness";
import { calls, evaluate, isError, parseFormula, type Node, type Value } from "../../scripts/workbook-formula";

const WORKBOOK = join(REPO_ROOT, "data/demo/demo-workbook.xlsx");
const LOG = join(REPO_ROOT, "data/demo/sample-log.csv");
const NAMESPACE = "REDOX.";

interface FormulaCell {
  address: string;
  row: number;
  column: string;
  formula: string;
  ast: Node;
}

let bundle: LoadedBundle;
let sheet: ExcelJS.Worksheet;
const formulas: FormulaCell[] = [];
let cliRows: Record<string, string>[] = [];
let tmp: string;

function declared(name: string): MetadataFunction | undefined {
  if (!name.startsWith(NAMESPACE)) return undefined;
  const id = name.slice(NAMESPACE.length);
  return bundle.metadata.functions.find((f) => f.id.toUpperCase() === id || f.name.toUpperCase() === id);
}

beforeAll(async () => {
  bundle = loadBundle();
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(WORKBOOK);
  sheet = workbook.getWorksheet("Sample log")!;
  workbook.eachSheet((ws) => {
    ws.eachRow((row) => {
      row.eachCell((cell) => {
        const value = cell.value as { formula?: string; sharedFormula?: string } | null;
        if (value && typeof value === "object" && ("formula" in value || "sharedFormula" in value)) {
          const formula = cell.formula;
          formulas.push({
            address: `${ws.name}!${cell.address}`,
            row: Number(cell.row),
            column: cell.address.replace(/\d+$/, ""),
            formula,
            ast: parseFormula(formula),
          });
        }
      });
    });
  });

  tmp = mkdtempSync(join(tmpdir(), "redox-workbook-"));
  const out = join(tmp, "results.csv");
  const sink = new PassThrough();
  sink.resume();
  const { code } = await runCommand(
    [LOG, "-o", out, "--no-svg", "--quiet", "--max-messages", "0", "--full-precision"],
    { stdout: sink, stderr: sink },
  );
  expect([0, 1]).toContain(code);
  cliRows = parse(readFileSync(out, "utf8"), { columns: true, skip_empty_lines: true }) as Record<string, string>[];
});

afterAll(() => {
  if (tmp) rmSync(tmp, { recursive: true, force: true });
});

describe("demo workbook formulas", () => {
  it("has formulas in every result column of every data row", () => {
    expect(formulas.length).toBe(cliRows.length * 10);
  });

  it("calls only declared REDOX functions (and IF) with argument counts the declarations allow", () => {
    const problems: string[] = [];
    const used = new Set<string>();
    for (const f of formulas) {
      for (const call of calls(f.ast)) {
        if (call.name === "IF") {
          if (call.argCount < 2 || call.argCount > 3) problems.push(`${f.address}: IF with ${call.argCount} arguments`);
          continue;
        }
        const fn = declared(call.name);
        if (!fn) {
          problems.push(`${f.address}: ${call.name} is not declared in functions.json`);
          continue;
        }
        used.add(fn.id);
        const required = fn.parameters.filter((p) => !p.optional).length;
        if (call.argCount < required || call.argCount > fn.parameters.length) {
          problems.push(
            `${f.address}: ${call.name} takes ${required}–${fn.parameters.length} arguments, got ${call.argCount}`,
          );
        }
      }
    }
    expect(problems).toEqual([]);
    expect([...used].sort()).toEqual(["BOUNDARY", "DIC", "DISSOLVED", "REGIME", "SPECIES", "TOSHE", "WATERMARGIN"]);
  });

  it("evaluated through the built bundle, gives the values the command line writes", async () => {
    // header row 2 names the columns; the command line's output has the same input columns plus its own
    const header = new Map<string, string>();
    sheet.getRow(2).eachCell((cell) => header.set(cell.address.replace(/\d+$/, ""), String(cell.value)));
    const byAddress = new Map(formulas.map((f) => [f.address.split("!")[1], f]));
    const memo = new Map<string, Value>();

    const cellValue = (column: string, row: number): Value => {
      const address = `${column}${row}`;
      if (memo.has(address)) return memo.get(address)!;
      const formula = byAddress.get(address);
      let value: Value;
      if (formula) value = evaluate(formula.ast, context);
      else {
        const raw = sheet.getCell(address).value;
        value =
          raw === null || raw === undefined ? null : raw instanceof Date ? raw.getTime() : (raw as number | string);
      }
      memo.set(address, value);
      return value;
    };
    const context = {
      cell: cellValue,
      callAddin(name: string, args: (Value | undefined)[]): Value {
        const fn = declared(name)!;
        const fnImpl = bundle.functions.get(fn.id)!;
        // the spreadsheet passes every declared parameter, a single cell as a 1×1 range, an omitted one as null
        const passed = fn.parameters.map((p, i) =>
          i < args.length && args[i] !== undefined ? (p.dimensionality === "matrix" ? [[args[i]]] : args[i]) : null,
        );
        const out = fnImpl(...passed) as unknown;
        const cell = Array.isArray(out) ? (out as unknown[][])[0][0] : out;
        return cell as Value;
      },
    };

    // the command line's result column for each workbook result column
    const counterpart: Record<string, string> = {
      E_SHE_V: "E_SHE_V",
      water_margin_V: "water_margin_V",
      DIC_mol_kg: "DIC_mol_kg",
      pipe_species: "metal_species",
      pipe_regime: "metal_regime",
      boundary_above_V: "metal_boundary_above_V",
      boundary_below_V: "metal_boundary_below_V",
      pipe_dissolved_ug_L: "metal_dissolved_ug_L",
    };
    const idColumn = [...header].find(([, h]) => h === "sample_id")![0];
    const cliById = new Map(cliRows.map((r) => [r.sample_id, r]));
    const mismatches: string[] = [];
    let compared = 0;
    let numbers = 0;
    let errorsSeen = 0;
    for (const f of formulas) {
      const columnName = header.get(f.column)!;
      const sampleId = String(sheet.getCell(`${idColumn}${f.row}`).value);
      const cli = cliById.get(sampleId);
      if (!cli) {
        mismatches.push(`${f.address}: sample ${sampleId} not in the command line's output`);
        continue;
      }
      let expected = cli[counterpart[columnName]];
      if (columnName === "vs_threshold") {
        // the thresholds typed in row 1 (10 µg/L lead, 2000 µg/L copper), against the command line's dissolved metal
        const limit = cli.pipe_metal === "Pb" ? 10 : cli.pipe_metal === "Cu" ? 2000 : null;
        const d = cli.metal_dissolved_ug_L;
        expected = d === "" ? "" : d.startsWith("#") ? d : limit === null ? "" : Number(d) > limit ? "above" : "below";
      } else if (columnName === "what_if_1mg_PO4_ug_L") {
        // the same dissolved metal with 1.053E-5 mol/kg orthophosphate: computed here from the command line's own E and
        // DIC through the source functions; orthophosphate adds only solids, so it can never raise the dissolved metal
        const e = Number(cli.E_SHE_V);
        const dic = cli.DIC_mol_kg === "" ? undefined : Number(cli.DIC_mol_kg);
        const ready =
          cli.metal_dissolved_ug_L !== "" && !cli.metal_dissolved_ug_L.startsWith("#") && Number.isFinite(e);
        if (!ready) {
          compared++;
          continue;
        }
        const value = dissolvedAt(
          cli.pipe_metal,
          Number(cli.pH),
          e,
          Number(cli.temp_C),
          dic,
          undefined,
          undefined,
          1.053e-5,
          undefined,
          "ug/L",
        )[0][0];
        expected = typeof value === "number" ? String(value) : (value as { code: string }).code;
        if (typeof value === "number") expect(value).toBeLessThanOrEqual(Number(cli.metal_dissolved_ug_L) * (1 + 1e-9));
      }
      // a blank temperature is a missing measurement: the command line leaves the row blank (the workbook's formulas
      // give blank there once the functions treat a blank temperature cell so too)
      if (cli.temp_C.trim() === "") {
        if (expected !== "")
          mismatches.push(`${f.address} (${sampleId}, ${columnName}): blank temperature, command line "${expected}"`);
        compared++;
        continue;
      }
      const got = cellValue(f.column, f.row);
      compared++;
      // the cached result the file carries is what the built add-in computes for the formula
      const result = (sheet.getCell(f.address.split("!")[1]).value as { result?: unknown }).result;
      const cachedText =
        result && typeof result === "object" && "error" in result
          ? (result as { error: string }).error
          : (result ?? ""); // an empty text result reads back as undefined
      const gotText = isError(got) ? got.code : (got ?? "");
      if (
        typeof gotText === "number"
          ? Math.abs(gotText - Number(cachedText)) > 1e-12 * Math.max(1, Math.abs(gotText))
          : cachedText !== gotText
      ) {
        mismatches.push(
          `${f.address} (${sampleId}, ${columnName}): cached ${String(cachedText)}, add-in ${String(gotText)}`,
        );
      }
      if (isError(got)) {
        errorsSeen++;
        if (got.code !== expected)
          mismatches.push(`${f.address} (${sampleId}, ${columnName}): workbook ${got.code}, command line ${expected}`);
      } else if (typeof got === "number") {
        numbers++;
        const want = Number(expected);
        if (!(Math.abs(got - want) <= 1e-9 * Math.max(1, Math.abs(got))))
          mismatches.push(`${f.address} (${sampleId}, ${columnName}): workbook ${got}, command line ${expected}`);
      } else if ((got ?? "") !== expected) {
        mismatches.push(
          `${f.address} (${sampleId}, ${columnName}): workbook "${String(got)}", command line "${expected}"`,
        );
      }
    }
    expect(mismatches.slice(0, 20)).toEqual([]);
    expect(compared).toBe(formulas.length);
    // the what-if is not vacuous: orthophosphate lowers equilibrium lead on some lead rows
    const letterOf = (name: string) => [...header].find(([, h]) => h === name)![0];
    const leadRows = formulas.filter(
      (f) =>
        header.get(f.column) === "what_if_1mg_PO4_ug_L" &&
        sheet.getCell(`${letterOf("pipe_metal")}${f.row}`).value === "Pb",
    );
    const lowered = leadRows.filter((f) => {
      const whatIf = cellValue(f.column, f.row);
      const now = cellValue(letterOf("pipe_dissolved_ug_L"), f.row);
      return typeof whatIf === "number" && typeof now === "number" && whatIf < now / 3;
    });
    expect(lowered.length).toBeGreaterThan(0);
    // the comparison is not vacuous: most cells are numbers, and the mistyped rows give error values
    expect(numbers).toBeGreaterThan(cliRows.length * 3);
    expect(errorsSeen).toBeGreaterThan(0);
    // and the water is not pure: the alkalinity's carbonate reaches the functions (carbonate species dominate some
    // lead and copper samples in both the workbook and the command line)
    expect(cliRows.filter((r) => r.metal_species.includes("CO3")).length).toBeGreaterThan(0);
    expect(cliRows.filter((r) => Number(r.DIC_mol_kg) > 0).length).toBeGreaterThan(cliRows.length / 2);
    expect(
      await callFunction(bundle.functions.get("TOSHE")!, [[[0.5]], [["AgCl-sat"]], null, null]),
    ).not.toBeInstanceOf(StandInError);
  });
});

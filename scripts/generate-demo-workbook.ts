// Writes data/demo/demo-workbook.xlsx: the INVENTED demo log (data/demo/sample-log.csv) on a sheet, with REDOX
// formulas filled down in result columns — potential vs SHE (REDOX.TOSHE), water margin, dissolved inorganic carbon
// from the alkalinity (REDOX.DIC), and for the pipe metal of each site in that water the dominant species, regime,
// nearest boundaries above and below, and dissolved metal. Every formula cell also carries its result, computed here
// by the add-in's own sources (src/functions) through the same formula evaluator the workbook test uses, so the file
// opens with values in any spreadsheet program; with the add-in loaded, recalculating (Ctrl+Alt+F9) recomputes them.
// A second sheet says what the workbook is.
//
// Usage: npx tsx scripts/generate-demo-workbook.ts [input.csv] [output.xlsx]

import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import ExcelJS from "exceljs";
import { parse } from "csv-parse/sync";
import * as addin from "../src/functions/functions";
import { CellError } from "../src/functions/cell-values";
import { evaluate, isError, parseFormula, type Value } from "./workbook-formula";

const input = resolve(process.argv[2] ?? "data/demo/sample-log.csv");
const output = resolve(process.argv[3] ?? "data/demo/demo-workbook.xlsx");

/** First data row on the sheet: row 1 says the data are invented, row 2 is the header. */
export const FIRST_ROW = 3;

/** Result columns written after the log's own (the demo test counts them). */
export const RESULT_COUNT = 10;

const NUMBER = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

/** A CSV cell as a worksheet cell: numbers as numbers, blanks empty, anything else (typos included) as text. */
function cellValue(text: string, header: string): ExcelJS.CellValue {
  if (text.trim() === "") return null;
  if (header === "date" && /^\d{4}-\d{2}-\d{2}$/.test(text)) return new Date(`${text}T00:00:00Z`);
  if (NUMBER.test(text) && !["sample_id", "site", "pipe_metal", "pipe_material", "note"].includes(header))
    return Number(text);
  return text;
}

/** Column letter of a 1-based column number. */
function letter(n: number): string {
  let s = "";
  for (let x = n; x > 0; x = Math.floor((x - 1) / 26)) s = String.fromCharCode(65 + ((x - 1) % 26)) + s;
  return s;
}

async function main(): Promise<void> {
  const records = parse(readFileSync(input, "utf8"), {
    comment: "#",
    comment_no_infix: true,
    skip_empty_lines: true,
    relax_column_count: true,
  }) as string[][];
  const [header, ...rows] = records;
  const col = (name: string): string => {
    const i = header.indexOf(name);
    if (i < 0) throw new Error(`${input}: no column "${name}"`);
    return letter(i + 1);
  };
  const metal = col("pipe_metal");
  const pH = col("pH");
  const orp = col("ORP_mV_AgCl_sat");
  const temp = col("temp_C");
  const alkalinity = col("alkalinity_mg_L_CaCO3");
  const first = header.length + 1;
  const E = letter(first);
  const DIC = letter(first + 2);
  // activity of dissolved metal species (the functions' default, written out so the carbonate can follow it);
  // chloride, sulfur and ionic strength are written as 0 (absent, ideal solution) so the option can follow them
  const activity = "1E-6";
  const dissolvedColumn = letter(first + 7);
  // what-if: 1 mg/L orthophosphate as PO4 = 1e-3 / 94.97 mol/kg as P (1 L taken as 1 kg)
  const whatIfPhosphate = "1.053E-5";
  // typed thresholds in row 1, right of the result columns (µg/L; the EU Directive 2020/2184 figures as a start)
  const thresholdLead = `${letter(first + RESULT_COUNT + 1)}1`;
  const thresholdCopper = `${letter(first + RESULT_COUNT + 3)}1`;

  /** Result columns: header and formula for sheet row r (formulas without the leading "="). */
  const results: Array<[string, (r: number) => string]> = [
    // readings are in mV against a saturated Ag/AgCl electrode, as logged
    ["E_SHE_V", (r) => `REDOX.TOSHE(${orp}${r},"AgCl-sat",${temp}${r},,"mV")`],
    ["water_margin_V", (r) => `REDOX.WATERMARGIN(${pH}${r},${E}${r},${temp}${r})`],
    // the water: dissolved inorganic carbon (mol/kg) from the alkalinity at the sample's pH and temperature
    ["DIC_mol_kg", (r) => `REDOX.DIC(${alkalinity}${r},${pH}${r},${temp}${r})`],
    ["pipe_species", (r) => `REDOX.SPECIES(${metal}${r},${pH}${r},${E}${r},${temp}${r},${activity},${DIC}${r})`],
    ["pipe_regime", (r) => `REDOX.REGIME(${metal}${r},${pH}${r},${E}${r},${temp}${r},${activity},${DIC}${r})`],
    [
      "boundary_above_V",
      (r) => `REDOX.BOUNDARY(${metal}${r},${pH}${r},${E}${r},${temp}${r},${activity},${DIC}${r},0,0,0,0,1)`,
    ],
    [
      "boundary_below_V",
      (r) => `REDOX.BOUNDARY(${metal}${r},${pH}${r},${E}${r},${temp}${r},${activity},${DIC}${r},0,0,0,0,-1)`,
    ],
    [
      "pipe_dissolved_ug_L",
      (r) => `REDOX.DISSOLVED(${metal}${r},${pH}${r},${E}${r},${temp}${r},${DIC}${r},0,0,0,0,"ug/L")`,
    ],
    // lead and copper rows against the threshold typed in row 1; other metals blank
    [
      "vs_threshold",
      (r) =>
        `IF(${dissolvedColumn}${r}="","",IF(${metal}${r}="Pb",IF(${dissolvedColumn}${r}>${thresholdLead},"above","below"),IF(${metal}${r}="Cu",IF(${dissolvedColumn}${r}>${thresholdCopper},"above","below"),"")))`,
    ],
    [
      "what_if_1mg_PO4_ug_L",
      (r) => `REDOX.DISSOLVED(${metal}${r},${pH}${r},${E}${r},${temp}${r},${DIC}${r},0,0,${whatIfPhosphate},0,"ug/L")`,
    ],
  ];
  if (results.length !== RESULT_COUNT) throw new Error("RESULT_COUNT is out of date");

  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Redox Cells demo generator";
  // fixed dates so that regenerating gives the same workbook contents
  workbook.created = new Date("2026-01-01T00:00:00Z");
  workbook.modified = new Date("2026-01-01T00:00:00Z");
  // keep the cached results on opening: without the add-in a recalculation would turn every formula into #NAME?
  workbook.calcProperties.fullCalcOnLoad = false;

  const sheet = workbook.addWorksheet("Sample log", { views: [{ state: "frozen", xSplit: 4, ySplit: 2 }] });
  sheet.getCell("A1").value =
    "INVENTED DEMO DATA — the Brackenholm Water Cooperative and every value here are fictional (scripts/generate-demo-log.ts). Result columns hold REDOX formulas.";
  sheet.getCell("A1").font = { bold: true, color: { argb: "FF8A3B12" } };
  // the thresholds the user types (µg/L); examples: EU 2020/2184 lead 10 (5 from 2036), copper 2000; US action levels 15 and 1300
  const typed: Array<[number, ExcelJS.CellValue]> = [
    [0, "lead threshold µg/L (type yours):"],
    [1, 10],
    [2, "copper threshold µg/L:"],
    [3, 2000],
  ];
  for (const [offset, value] of typed) sheet.getCell(`${letter(first + RESULT_COUNT + offset)}1`).value = value;
  const headerRow = sheet.getRow(2);
  [...header, ...results.map(([h]) => h)].forEach((h, i) => {
    const cell = headerRow.getCell(i + 1);
    cell.value = h;
    cell.font = { bold: true };
    if (i >= header.length) cell.fill = { type: "pattern", pattern: "solid", fgColor: { argb: "FFE3EEEA" } };
  });

  rows.forEach((fields, k) => {
    const row = sheet.getRow(FIRST_ROW + k);
    header.forEach((h, i) => {
      const value = cellValue(fields[i] ?? "", h);
      if (value !== null) row.getCell(i + 1).value = value;
    });
  });
  const cached = cachedResults(sheet, first, results);
  rows.forEach((_fields, k) => {
    const r = FIRST_ROW + k;
    results.forEach(([, formula], j) => {
      const address = `${letter(first + j)}${r}`;
      sheet.getCell(address).value = { formula: formula(r), result: cached(address) } as ExcelJS.CellFormulaValue;
    });
  });
  sheet.getColumn(col("date")).numFmt = "yyyy-mm-dd";
  header.forEach((h, i) => {
    sheet.getColumn(i + 1).width = Math.max(9, Math.min(28, h.length + 2));
  });
  results.forEach(([h], j) => {
    sheet.getColumn(first + j).width = Math.max(12, h.length + 2);
  });

  const about = workbook.addWorksheet("About");
  const lines = [
    "Redox Cells demo workbook",
    "",
    "INVENTED DATA: the Brackenholm Water Cooperative, its sites and samples are fictional, made up to show the functions at work.",
    "",
    "Sheet 'Sample log': one row per sample, data from row 3. ORP is in mV against a saturated Ag/AgCl electrode; the result columns convert it",
    `to volts vs SHE with REDOX.TOSHE(…, "mV") and evaluate the pipe metal named in column ${metal} (pipe_metal) at the sample's pH and temperature,`,
    "in the sample's own water: its dissolved inorganic carbon from the alkalinity goes to the functions' carbonate argument.",
    "  water_margin_V       REDOX.WATERMARGIN — distance from the water-stability window (positive inside)",
    "  DIC_mol_kg           REDOX.DIC — dissolved inorganic carbon, mol/kg, from the alkalinity (mg/L as CaCO3), pH and temperature",
    "  pipe_species         REDOX.SPECIES — dominant species of the pipe metal",
    "  pipe_regime          REDOX.REGIME — immunity, passivation or corrosion",
    "  boundary_above_V     REDOX.BOUNDARY(…, 1) — nearest stability boundary above the sample (direction last)",
    "  boundary_below_V     REDOX.BOUNDARY(…, -1) — nearest stability boundary below",
    "  pipe_dissolved_ug_L  REDOX.DISSOLVED — dissolved metal in equilibrium with the most stable solid, µg/L (#N/A where no solid can form)",
    "  vs_threshold         lead and copper rows: above or below the threshold typed in row 1 (10 and 2000 µg/L to start: EU Directive",
    "                       2020/2184 lead 10 µg/L until 2036 then 5, copper 2 mg/L; US Lead and Copper Rule action levels 15 µg/L and 1.3 mg/L)",
    "  what_if_1mg_PO4_ug_L the same with 1 mg/L orthophosphate as PO4 (1.053E-5 mol/kg as P in the phosphate argument)",
    "",
    "Equilibrium is not a tap sample: thresholds apply to samples taken under the regulator's protocol. These columns compare",
    "treatment options; they do not show compliance (see docs/lead-and-copper.md in the project).",
    "",
    "Some cells are blank or mistyped on purpose (a decimal comma, '7.4.1', 'n/a', '1O.4', '612 mV', pH 17.2): their rows show",
    "blank results or #VALUE! (hover the error indicator for the message), as a real log would. A blank temperature is a missing",
    "measurement: that row's results are blank. A blank alkalinity leaves that sample's water without carbonate.",
    "",
    "The result cells hold the values computed by Redox Cells when the workbook was generated, so the file shows them in any",
    "spreadsheet program. With the add-in loaded, press Ctrl+Alt+F9 to recalculate them.",
    "",
    "Carbonate is treated exactly at its fixed total: its activity as HCO3- is the total times the alpha-fraction at the",
    "sample's pH and temperature; ideal dilute water (no ionic strength given).",
    "",
    "Thermodynamics says which state is stable, not how fast a metal corrodes. For lead and copper in drinking water, confirm",
    "by laboratory analysis and defer to local codes, regulators and licensed corrosion professionals.",
  ];
  lines.forEach((text, i) => {
    about.getCell(`A${i + 1}`).value = text;
  });
  about.getCell("A1").font = { bold: true, size: 14 };
  about.getColumn(1).width = 120;

  await workbook.xlsx.writeFile(output);
  console.log(`wrote ${rows.length} rows × ${results.length} formula columns to ${output}`);
}

/** A result as a workbook cell stores it: number, text, or an error code. */
function stored(value: Value | CellError): ExcelJS.CellValue {
  if (value instanceof CellError || isError(value)) return { error: value.code as ExcelJS.CellErrorValue["error"] };
  if (value === null) return "";
  return value as number | string | boolean;
}

/**
 * The result of every formula cell, evaluated through the add-in's sources: add-in calls receive each argument as
 * the spreadsheet passes it (a single cell as a 1×1 range, an omitted one as null).
 */
function cachedResults(
  sheet: ExcelJS.Worksheet,
  first: number,
  results: Array<[string, (r: number) => string]>,
): (address: string) => ExcelJS.CellValue {
  const functions = addin as unknown as Record<string, (...args: unknown[]) => unknown[][]>;
  const memo = new Map<string, Value>();
  const formulaAt = (column: string, row: number): string | null => {
    const j = [...Array(results.length).keys()].find((i) => letter(first + i) === column);
    return j === undefined || row < FIRST_ROW ? null : results[j][1](row);
  };
  const context = {
    cell(column: string, row: number): Value {
      const address = `${column}${row}`;
      if (memo.has(address)) return memo.get(address)!;
      const formula = formulaAt(column, row);
      const raw = sheet.getCell(address).value;
      const value: Value = formula
        ? evaluate(parseFormula(formula), context)
        : raw === null || raw === undefined
          ? null
          : raw instanceof Date
            ? raw.getTime()
            : (raw as number | string);
      memo.set(address, value);
      return value;
    },
    callAddin(name: string, args: (Value | undefined)[]): Value {
      const fn = functions[name.replace(/^REDOX\./, "").toLowerCase()];
      if (typeof fn !== "function") return { code: "#NAME?" };
      return fn(...args.map((a) => (a === undefined ? null : [[a]])))[0][0] as Value;
    },
  };
  return (address) => stored(context.cell(address.replace(/\d+$/, ""), Number(address.replace(/^[A-Z]+/, ""))));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});

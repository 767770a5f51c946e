// Figures the README and docs/worked-examples.md quote about the invented demo data, computed rather than typed:
// the demo workbook's worked row (its real row number, formulas and cached results) and the samples per regime per
// site that `npm run demo` prints (the command line over the demo log). Each figure block sits in the documents
// between `<!-- figures:NAME -->` and `<!-- /figures:NAME -->`; the docs test checks that every block equals what this
// script computes, so a figure cannot drift from the code.
//
// Usage: npx tsx scripts/demo-figures.ts          check, exit 1 when a block is stale
//        npx tsx scripts/demo-figures.ts --write  rewrite the blocks in place

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { PassThrough } from "node:stream";
import ExcelJS from "exceljs";
import { parse } from "csv-parse/sync";
import { runCommand } from "../src/cli/run";

const ROOT = resolve(__dirname, "..");
const LOG = join(ROOT, "data/demo/sample-log.csv");
const WORKBOOK = join(ROOT, "data/demo/demo-workbook.xlsx");
/** The sample the README works through, and the documents holding figure blocks. */
const WORKED_SAMPLE = "MLL-25-001";
export const FIGURE_DOCUMENTS = ["README.md", "docs/worked-examples.md"];

const REGIMES = ["immunity", "passivation", "corrosion"] as const;

/** The command line's results for the demo log, as `npm run demo` computes them. */
async function demoResults(): Promise<Record<string, string>[]> {
  const dir = mkdtempSync(join(tmpdir(), "redox-figures-"));
  try {
    const out = join(dir, "results.csv");
    const sink = new PassThrough();
    sink.resume();
    const { code } = await runCommand([LOG, "-o", out, "--no-svg", "--quiet", "--max-messages", "0"], {
      stdout: sink,
      stderr: sink,
    });
    if (code > 1) throw new Error(`the command line failed on the demo log (exit ${code})`);
    return parse(readFileSync(out, "utf8"), { columns: true, skip_empty_lines: true }) as Record<string, string>[];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Samples per regime of each site's pipe metal: the table `npm run demo` prints. */
function regimeTable(rows: Record<string, string>[]): string {
  const bySite = new Map<string, { metal: string; counts: Record<string, number>; other: number }>();
  for (const r of rows) {
    const entry = bySite.get(r.site) ?? { metal: r.pipe_metal, counts: {}, other: 0 };
    bySite.set(r.site, entry);
    if ((REGIMES as readonly string[]).includes(r.metal_regime))
      entry.counts[r.metal_regime] = (entry.counts[r.metal_regime] ?? 0) + 1;
    else entry.other++;
  }
  const lines = [
    `\`npm run demo\` prints the regime of each site's pipe metal over the year (${rows.length} samples):`,
    "",
    "| site | metal | immunity | passivation | corrosion | not evaluated |",
    "|---|---|---:|---:|---:|---:|",
  ];
  for (const [site, e] of [...bySite].sort((a, b) => a[0].localeCompare(b[0]))) {
    lines.push(`| ${site} | ${e.metal} | ${REGIMES.map((g) => e.counts[g] ?? 0).join(" | ")} | ${e.other} |`);
  }
  return lines.join("\n");
}

/** "Across the year, 7 of the 26 Mill Lane samples fall in the corrosion regime." */
function millLaneSentence(rows: Record<string, string>[]): string {
  const mill = rows.filter((r) => r.site === "Mill Lane");
  const corroding = mill.filter((r) => r.metal_regime === "corrosion").length;
  const passive = mill.filter((r) => r.metal_regime === "passivation").length;
  return `Across the year, ${corroding} of the ${mill.length} Mill Lane samples fall in the corrosion regime and ${passive} in passivation (\`npm run demo\`).`;
}

/** A cached result as the README shows it. */
function shown(value: unknown, header: string): string {
  if (value && typeof value === "object" && "error" in value) return String((value as { error: string }).error);
  if (value === undefined || value === null || value === "") return "(blank)";
  if (typeof value === "number") {
    if (header.endsWith("_V")) return `${value.toFixed(3).replace("-", "−")} V`;
    if (header.startsWith("DIC")) return `${value.toPrecision(2)} mol/kg`;
    if (header.endsWith("ug_L")) return `${value.toPrecision(2)} µg/L`;
    return String(value);
  }
  return String(value);
}

/** The worked sample's row of the demo workbook: its row number, each result column's formula and cached result. */
async function workedRow(): Promise<string> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(WORKBOOK);
  const sheet = workbook.getWorksheet("Sample log")!;
  const headers = new Map<number, string>();
  sheet.getRow(2).eachCell((cell, col) => headers.set(col, String(cell.value)));
  const idColumn = [...headers].find(([, h]) => h === "sample_id")![0];
  let rowNumber = -1;
  sheet.eachRow((row, r) => {
    if (r > 2 && row.getCell(idColumn).value === WORKED_SAMPLE) rowNumber = r;
  });
  if (rowNumber < 0) throw new Error(`${WORKED_SAMPLE} is not in ${WORKBOOK}`);
  const lines = [
    `Sample ${WORKED_SAMPLE} is row ${rowNumber} of the workbook (row 1 marks the data invented, row 2 holds the headers):`,
    "",
    "```",
  ];
  const row = sheet.getRow(rowNumber);
  const formulas: Array<[string, string, string]> = [];
  row.eachCell((cell, col) => {
    const value = cell.value as { formula?: string; result?: unknown } | null;
    if (value && typeof value === "object" && typeof value.formula === "string") {
      const header = headers.get(col)!;
      formulas.push([
        `${cell.address.replace(/\d+$/, "")} ${header}`,
        `=${value.formula}`,
        shown(value.result, header),
      ]);
    }
  });
  const w1 = Math.max(...formulas.map((f) => f[0].length)) + 2;
  const w2 = Math.max(...formulas.map((f) => f[1].length)) + 2;
  for (const [name, formula, result] of formulas) lines.push(`${name.padEnd(w1)}${formula.padEnd(w2)}→ ${result}`);
  lines.push("```");
  return lines.join("\n");
}

/** Every figure block by name. */
export async function demoFigures(): Promise<Record<string, string>> {
  const rows = await demoResults();
  return {
    "regimes-per-site": regimeTable(rows),
    "mill-lane": millLaneSentence(rows),
    "worked-row": await workedRow(),
  };
}

const BLOCK = /<!-- figures:([a-z-]+) -->\n([\s\S]*?)<!-- \/figures:\1 -->/g;

/** The document's figure blocks by name. */
export function figureBlocks(text: string): Map<string, string> {
  return new Map([...text.matchAll(BLOCK)].map((m) => [m[1], m[2].replace(/\n$/, "")]));
}

/** The document with every figure block replaced by the computed one. */
export function withFigures(text: string, figures: Record<string, string>): string {
  return text.replace(BLOCK, (whole, name: string) =>
    name in figures ? `<!-- figures:${name} -->\n${figures[name]}\n<!-- /figures:${name} -->` : whole,
  );
}

async function main(): Promise<number> {
  const figures = await demoFigures();
  let stale = 0;
  for (const document of FIGURE_DOCUMENTS) {
    const path = join(ROOT, document);
    const text = readFileSync(path, "utf8");
    const updated = withFigures(text, figures);
    if (updated === text) continue;
    stale++;
    if (process.argv.includes("--write")) writeFileSync(path, updated);
    console.log(
      `${document}: figure blocks ${process.argv.includes("--write") ? "rewritten" : "are stale (run with --write)"}`,
    );
  }
  return stale > 0 && !process.argv.includes("--write") ? 1 : 0;
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(__filename)) {
  main().then(
    (code) => (process.exitCode = code),
    (error: unknown) => {
      console.error(error);
      process.exitCode = 1;
    },
  );
}

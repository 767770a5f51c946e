/**
 * `npm run bench`: throughput figures against DEVELOPERS.md's budgets. Prints a table; never fails on time.
 */
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";
import { loadBundle } from "../test-support/bundle-harness";
import { spawnSync } from "node:child_process";
import { benchDiagrams, benchStability, BenchRow } from "./engine";
import { benchPaneRender } from "./pane-render";

/** The stability functions as the spreadsheet runs them: the built bundle's wrappers over ranges. */
function bundleStabilityRows(): BenchRow[] {
  let bundle;
  try {
    bundle = loadBundle();
  } catch (error) {
    return [
      {
        name: "stability functions in the built bundle",
        figure: `bundle not loadable (${(error as Error).message.slice(0, 40)})`,
        target: "—",
        met: null,
      },
    ];
  }
  return benchStability((name) => bundle.functions.get(name) as ((...args: unknown[]) => unknown) | undefined);
}

function bundleRow(): BenchRow {
  const file = path.join(process.env.REDOX_DIST ?? "dist", "functions.js");
  if (!fs.existsSync(file))
    return {
      name: "functions bundle, gzipped",
      figure: "not built (run npm run build)",
      target: "< 150 KB",
      met: null,
    };
  const gz = zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;
  return {
    name: "functions bundle, gzipped",
    figure: `${(gz / 1024).toFixed(1)} KB`,
    target: "< 150 KB",
    met: gz < 150 * 1024,
  };
}

async function main(): Promise<void> {
  const rows: BenchRow[] = [...bundleStabilityRows(), ...benchDiagrams(), ...benchPaneRender(10_000), bundleRow()];
  const width = Math.max(...rows.map((r) => r.name.length));
  const figureWidth = Math.max(...rows.map((r) => r.figure.length));
  console.log(`Redox Cells benchmark — node ${process.version}, ${new Date().toISOString()}`);
  for (const r of rows) {
    const verdict = r.met === null ? "" : r.met ? "met" : "NOT MET";
    console.log(`${r.name.padEnd(width)}  ${r.figure.padEnd(figureWidth)}  target ${r.target.padEnd(18)} ${verdict}`);
  }
  // Figures measured in other processes: the functions' cold start, the command line over a generated 1 M-row log (rows/s, peak memory), and
  // the task pane drawing 10 k samples in headless Chromium (when /usr/bin/chromium exists).
  const children: [string, string[]][] = [
    ["bench/cold-start.ts", []],
    ["bench/cli.ts", [process.env.REDOX_BENCH_CLI_ROWS ?? "1000000"]],
  ];
  if (fs.existsSync("/usr/bin/chromium")) children.push(["bench/pane-browser.ts", []]);
  for (const [script, args] of children) {
    const run = spawnSync(process.execPath, ["--import", "tsx", script, ...args], {
      stdio: "inherit",
      env: process.env,
    });
    if (run.status !== 0) console.log(`${script}: exited with ${run.status ?? run.signal}`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

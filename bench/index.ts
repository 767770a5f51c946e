/**
 * `npm run bench`: throughput figures against DEVELOPERS.md's budgets. Prints a table; never fails on time.
 */
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";
import { loadBundle } from "../tests/bundle/harness";
import { spawnSync } from "node:child_process";
import { benchEngine, BenchRow, fmt } from "./engine";
import { benchLigands } from "./ligands";
import { benchPaneRender } from "./pane-render";

/** (c′) REDOX.SPECIES as the spreadsheet runs it: the built bundle, called with a 100 k-row range. */
function bundleWrapperRow(): BenchRow {
  const name = "(c′) REDOX.SPECIES in the built bundle, 100,000-row range, steady state";
  let bundle;
  try {
    bundle = loadBundle();
  } catch (error) {
    return { name, figure: `bundle not loadable (${(error as Error).message.slice(0, 40)})`, target: "≥ 1 M rows/s", met: null };
  }
  const species = bundle.functions.get("SPECIES");
  if (!species) return { name, figure: "SPECIES not registered", target: "≥ 1 M rows/s", met: false };
  const m = 100_000;
  const pH = Array.from({ length: m }, (_, i) => [2 + ((i * 7919) % 1000) / 100]);
  const E = Array.from({ length: m }, (_, i) => [-1 + ((i * 104729) % 2000) / 1000]);
  const T = Array.from({ length: m }, (_, i) => [15 + 5 * (i % 5)]);
  // steady state: three warm-up calls (the JIT compiles the loop), then the best of five
  for (let k = 0; k < 3; k++) species("Fe", pH, E, T);
  let fastest = Infinity;
  for (let k = 0; k < 5; k++) {
    const start = performance.now();
    species("Fe", pH, E, T);
    fastest = Math.min(fastest, performance.now() - start);
  }
  const rate = m / (fastest / 1000);
  return { name, figure: `${fmt(rate)} rows/s (${fastest.toFixed(1)} ms)`, target: "≥ 1 M rows/s", met: rate >= 1e6 };
}

function bundleRow(): BenchRow {
  const file = path.join(process.env.REDOX_DIST ?? "dist", "functions.js");
  if (!fs.existsSync(file)) return { name: "functions bundle, gzipped", figure: "not built (run npm run build)", target: "< 150 KB", met: null };
  const gz = zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;
  return { name: "functions bundle, gzipped", figure: `${(gz / 1024).toFixed(1)} KB`, target: "< 150 KB", met: gz < 150 * 1024 };
}

async function main(): Promise<void> {
  const rows: BenchRow[] = [...benchEngine(), bundleWrapperRow(), ...benchLigands(), ...benchPaneRender(10_000), bundleRow()];
  const width = Math.max(...rows.map((r) => r.name.length));
  const figureWidth = Math.max(...rows.map((r) => r.figure.length));
  console.log(`Redox Cells benchmark — node ${process.version}, ${new Date().toISOString()}`);
  for (const r of rows) {
    const verdict = r.met === null ? "" : r.met ? "met" : "NOT MET";
    console.log(`${r.name.padEnd(width)}  ${r.figure.padEnd(figureWidth)}  target ${r.target.padEnd(18)} ${verdict}`);
  }
  // Figures measured in other processes: the command line over a generated 1 M-row log (rows/s, peak memory), and
  // the task pane drawing 10 k samples in headless Chromium (when /usr/bin/chromium exists).
  const children: [string, string[]][] = [["bench/cli.ts", [process.env.REDOX_BENCH_CLI_ROWS ?? "1000000"]]];
  if (fs.existsSync("/usr/bin/chromium")) children.push(["bench/pane-browser.ts", []]);
  for (const [script, args] of children) {
    const run = spawnSync(process.execPath, ["--import", "tsx", script, ...args], { stdio: "inherit", env: process.env });
    if (run.status !== 0) console.log(`${script}: exited with ${run.status ?? run.signal}`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

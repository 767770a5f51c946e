/**
 * `npm run bench`: throughput figures against the budgets of GUIDE §6. Prints a table; never fails on time.
 */
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";
import { benchEngine, BenchRow } from "./engine";

function bundleRow(): BenchRow {
  const file = path.join(process.env.REDOX_DIST ?? "dist", "functions.js");
  if (!fs.existsSync(file)) return { name: "functions bundle, gzipped", figure: "not built (run npm run build)", target: "< 150 KB", met: null };
  const gz = zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;
  return { name: "functions bundle, gzipped", figure: `${(gz / 1024).toFixed(1)} KB`, target: "< 150 KB", met: gz < 150 * 1024 };
}

async function main(): Promise<void> {
  const rows: BenchRow[] = [...benchEngine(), bundleRow()];
  const width = Math.max(...rows.map((r) => r.name.length));
  const figureWidth = Math.max(...rows.map((r) => r.figure.length));
  console.log(`Redox Cells benchmark — node ${process.version}, ${new Date().toISOString()}`);
  for (const r of rows) {
    const verdict = r.met === null ? "" : r.met ? "met" : "NOT MET";
    console.log(`${r.name.padEnd(width)}  ${r.figure.padEnd(figureWidth)}  target ${r.target.padEnd(18)} ${verdict}`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

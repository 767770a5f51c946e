// Command-line figures, all measured in this one run on the same machine state: start-up (`--version` against a
// bare `node -e 0`), the floor (a plain Node split of lines and fields over the same file) against the command
// line on a pure-water log, and a log where every row has its own water (its own alkalinity) against the pure-water
// time per row; peak memory of the child process. Runs the package bin (bin/redox-cells.mjs), which uses the
// prebuilt dist/cli file. Figures only: nothing here passes or fails on time.
//
// Usage: npx tsx bench/cli.ts [rows] [own-water rows]   (defaults 1 000 000 and 20 000)

import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { writeSyntheticLog } from "../test-support/synthetic-log";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const bin = join(root, "bin/redox-cells.mjs");

/** Resident set size and its high-water mark of a process in KiB, from /proc (Linux), or null. */
function memoryOf(pid: number): { rss: number; hwm: number } | null {
  const path = `/proc/${pid}/status`;
  if (!existsSync(path)) return null;
  try {
    const text = readFileSync(path, "utf8");
    const rss = Number(/VmRSS:\s+(\d+)/.exec(text)?.[1] ?? NaN);
    const hwm = Number(/VmHWM:\s+(\d+)/.exec(text)?.[1] ?? NaN);
    return Number.isFinite(rss) ? { rss, hwm } : null;
  } catch {
    return null;
  }
}

interface Timed {
  seconds: number;
  code: number;
  peakKiB: number;
  stderr: string;
}

/** Runs node with `args`, timing it and sampling its memory every 50 ms. */
async function timed(args: string[]): Promise<Timed> {
  const started = performance.now();
  const child = spawn(process.execPath, args, { stdio: ["ignore", "ignore", "pipe"] });
  let stderr = "";
  child.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
  let peak = 0;
  const timer = setInterval(() => {
    const m = child.pid ? memoryOf(child.pid) : null;
    if (m) peak = Math.max(peak, m.rss, m.hwm || 0);
  }, 50);
  const code: number = await new Promise((res) => child.on("exit", (c) => res(c ?? -1)));
  clearInterval(timer);
  return { seconds: (performance.now() - started) / 1000, code, peakKiB: peak, stderr };
}

/** Median wall time of `runs` runs of node with `args` (short runs: start-up). */
function medianStart(args: string[], runs = 7): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    spawnSync(process.execPath, args, { stdio: "ignore" });
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[runs >> 1];
}

/** The floor: stream the file, split every line into fields, count them — what reading the file costs at least. */
const FLOOR = `
const fs = require("fs");
let rest = "", rows = 0, fields = 0;
const s = fs.createReadStream(process.argv[1], { encoding: "utf8", highWaterMark: 1 << 20 });
s.on("data", (c) => { const lines = (rest + c).split("\\n"); rest = lines.pop(); for (const l of lines) { fields += l.split(",").length; rows++; } });
s.on("end", () => { if (rest) rows++; process.stdout.write(rows + " " + fields + "\\n"); });
`;

const perSecond = (rows: number, seconds: number): string =>
  `${Math.round(rows / seconds).toLocaleString("en-US")} rows/s`;

async function main(): Promise<void> {
  const rows = Number(process.argv[2] ?? 1_000_000);
  const waterRows = Number(process.argv[3] ?? 20_000);
  if (!existsSync(join(root, "dist/cli/redox-cells.cjs")))
    console.log("cli: dist/cli/redox-cells.cjs is missing (run npm run build): the bin falls back to tsx");
  const dir = mkdtempSync(join(tmpdir(), "redox-cli-bench-"));
  try {
    const pure = join(dir, "pure.csv");
    const water = join(dir, "water.csv");
    await writeSyntheticLog(pure, rows, { seed: 3 });
    await writeSyntheticLog(water, waterRows, { seed: 5, ownWater: true });
    console.log(
      `cli: logs of ${rows.toLocaleString("en-US")} pure-water rows (${(statSync(pure).size / 1e6).toFixed(1)} MB) and ${waterRows.toLocaleString("en-US")} own-water rows`,
    );

    const bare = medianStart(["-e", "0"]);
    const version = medianStart([bin, "--version"]);
    console.log(
      `cli: start-up: --version ${version.toFixed(0)} ms, bare node -e 0 ${bare.toFixed(0)} ms: ${(version / bare).toFixed(1)}× (target: a few ×)`,
    );

    const floor = await timed(["-e", FLOOR, pure]);
    const cli = await timed([bin, pure, "-o", join(dir, "pure-out.csv"), "--svg-dir", dir, "--quiet"]);
    if (cli.code !== 0) console.log(`cli: exit code ${cli.code}\n${cli.stderr.slice(0, 2000)}`);
    console.log(`cli: floor (split lines and fields) ${floor.seconds.toFixed(2)} s, ${perSecond(rows, floor.seconds)}`);
    console.log(
      `cli: pure water ${cli.seconds.toFixed(2)} s, ${perSecond(rows, cli.seconds)}: ${(cli.seconds / floor.seconds).toFixed(1)}× the floor (target ≤ 8×); peak memory ${(cli.peakKiB / 1024).toFixed(0)} MiB`,
    );

    const own = await timed([bin, water, "-o", join(dir, "water-out.csv"), "--no-svg", "--quiet"]);
    // exit 1: rows whose pH is outside what an alkalinity can say (their cells hold #NUM!), as in real logs
    if (own.code > 1) console.log(`cli: exit code ${own.code}\n${own.stderr.slice(0, 2000)}`);
    const ratio = own.seconds / waterRows / (cli.seconds / rows);
    console.log(
      `cli: own water per row ${own.seconds.toFixed(2)} s, ${perSecond(waterRows, own.seconds)}: ${ratio.toFixed(1)}× the pure-water time per row (target ≤ 3×); peak memory ${(own.peakKiB / 1024).toFixed(0)} MiB`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});

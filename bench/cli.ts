// Command-line figures, all measured in this one run on the same machine state, in rounds that interleave every
// measurement (so load on a shared machine falls on all of them alike), taking the fastest of each:
//   - start-up: `--version` against a bare `node -e 0`;
//   - the floor (a plain Node split of lines and fields over the same file) against the command line on a pure-water
//     log as a user runs it (results and diagrams);
//   - a log where every row has its own water (its own alkalinity) against the pure-water log, time per row, both
//     without diagrams (a diagram is a fixed cost per metal, not per row; it is shown apart);
// with the peak memory of the child processes. Runs the package bin (bin/redox-cells.mjs), which uses the prebuilt
// dist/cli file. Figures only: nothing here passes or fails on time.
//
// Usage: npx tsx bench/cli.ts [rows] [own-water rows] [rounds]   (defaults 1 000 000, 300 000 and 3)

import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from "node:fs";
import { cpus, tmpdir } from "node:os";
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

/** Wall time of one short run of node with `args`, ms. */
function startTime(args: string[]): number {
  const t0 = performance.now();
  spawnSync(process.execPath, args, { stdio: "ignore" });
  return performance.now() - t0;
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
const mib = (kib: number): string => `${(kib / 1024).toFixed(0)} MiB`;
const ratios = (values: readonly number[]): string => values.map((x) => `${x.toFixed(1)}×`).join(", ");

/** The fastest of a kind of run over the rounds, the largest memory, and every round's time. */
class Best {
  seconds = Infinity;
  peakKiB = 0;
  readonly all: number[] = [];

  add(run: Timed, what: string, okCodes: readonly number[] = [0]): void {
    if (!okCodes.includes(run.code)) console.log(`cli: ${what}: exit code ${run.code}\n${run.stderr.slice(0, 2000)}`);
    this.seconds = Math.min(this.seconds, run.seconds);
    this.peakKiB = Math.max(this.peakKiB, run.peakKiB);
    this.all.push(run.seconds);
  }
}

async function main(): Promise<void> {
  const rows = Number(process.argv[2] ?? 1_000_000);
  // enough rows that the fixed start-up (about 0.2 s) is as small a part of the own-water time per row as of the pure
  const waterRows = Number(process.argv[3] ?? 300_000);
  const rounds = Number(process.argv[4] ?? process.env.REDOX_BENCH_ROUNDS ?? 3);
  if (!existsSync(join(root, "dist/cli/redox-cells.cjs")))
    console.log("cli: dist/cli/redox-cells.cjs is missing (run npm run build): the bin falls back to tsx");
  const dir = mkdtempSync(join(tmpdir(), "redox-cli-bench-"));
  try {
    const pure = join(dir, "pure.csv");
    const water = join(dir, "water.csv");
    await writeSyntheticLog(pure, rows, { seed: 3 });
    await writeSyntheticLog(water, waterRows, { seed: 5, ownWater: true });
    console.log(
      `cli: node ${process.version}, ${cpus().length} cores; logs of ${rows.toLocaleString("en-US")} pure-water rows (${(statSync(pure).size / 1e6).toFixed(1)} MB) and ${waterRows.toLocaleString("en-US")} own-water rows; fastest of ${rounds} interleaved rounds`,
    );

    const bare: number[] = [];
    const version: number[] = [];
    const floor = new Best();
    const cli = new Best();
    const cliNoSvg = new Best();
    const own = new Best();
    const out = join(dir, "out.csv");
    for (let round = 0; round < rounds; round++) {
      for (let k = 0; k < 3; k++) {
        bare.push(startTime(["-e", "0"]));
        version.push(startTime([bin, "--version"]));
      }
      floor.add(await timed(["-e", FLOOR, pure]), "floor");
      cli.add(await timed([bin, pure, "-o", out, "--svg-dir", dir, "--quiet"]), "pure water");
      cliNoSvg.add(await timed([bin, pure, "-o", out, "--no-svg", "--quiet"]), "pure water, --no-svg");
      // exit 1: rows whose pH is outside what an alkalinity can say (their cells hold #N/A), as in real logs
      own.add(await timed([bin, water, "-o", out, "--no-svg", "--quiet"]), "own water", [0, 1]);
    }

    const bareMs = Math.min(...bare);
    const versionMs = Math.min(...version);
    console.log(
      `cli: start-up: --version ${versionMs.toFixed(0)} ms, bare node -e 0 ${bareMs.toFixed(0)} ms: ${(versionMs / bareMs).toFixed(1)}× (target: a few ×)`,
    );
    console.log(`cli: floor (split lines and fields) ${floor.seconds.toFixed(2)} s, ${perSecond(rows, floor.seconds)}`);
    const perRound = cli.all.map((s, i) => s / floor.all[i]);
    console.log(
      `cli: pure water ${cli.seconds.toFixed(2)} s, ${perSecond(rows, cli.seconds)}: ${(cli.seconds / floor.seconds).toFixed(1)}× the floor (target ≤ 8×; each round ${ratios(perRound)}); peak memory ${mib(cli.peakKiB)}`,
    );
    console.log(
      `cli: pure water without diagrams ${cliNoSvg.seconds.toFixed(2)} s, ${perSecond(rows, cliNoSvg.seconds)} (the diagrams: ${Math.max(0, cli.seconds - cliNoSvg.seconds).toFixed(2)} s); peak memory ${mib(cliNoSvg.peakKiB)}`,
    );
    const perRow = (seconds: number, n: number): number => seconds / n;
    const ratio = perRow(own.seconds, waterRows) / perRow(cliNoSvg.seconds, rows);
    const ownRounds = own.all.map((s, i) => perRow(s, waterRows) / perRow(cliNoSvg.all[i], rows));
    console.log(
      `cli: own water ${own.seconds.toFixed(2)} s, ${perSecond(waterRows, own.seconds)}: ${ratio.toFixed(1)}× the pure-water time per row, both without diagrams (target ≤ 3×; each round ${ratios(ownRounds)}); peak memory ${mib(own.peakKiB)}`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});

// Command-line throughput: generates a synthetic log of N rows (default 1 000 000; `tsx bench/cli.ts 200000` for
// fewer), runs bin/redox-cells.mjs on it in a child process, and prints rows/s and the child's peak memory
// (resident set size sampled every 50 ms from /proc, and the kernel's own high-water mark VmHWM at exit where
// /proc exists). Figures only: nothing here passes or fails on time.
//
// Usage: npx tsx bench/cli.ts [rows]

import { spawn } from "node:child_process";
import { createReadStream, existsSync, mkdtempSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { writeSyntheticLog } from "../tests/cli/synthetic-log";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");

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

/** Newlines in a file, read as a stream. */
async function countLines(path: string): Promise<number> {
  let n = 0;
  for await (const chunk of createReadStream(path)) for (const byte of chunk as Buffer) if (byte === 10) n++;
  return n;
}

async function main(): Promise<void> {
  const rows = Number(process.argv[2] ?? 1_000_000);
  const dir = mkdtempSync(join(tmpdir(), "redox-cli-bench-"));
  try {
    const input = join(dir, "log.csv");
    const output = join(dir, "results.csv");
    const t0 = performance.now();
    await writeSyntheticLog(input, rows, { seed: 3 });
    const mb = statSync(input).size / 1e6;
    console.log(`cli: generated ${rows.toLocaleString("en-US")} rows (${mb.toFixed(1)} MB) in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

    const started = performance.now();
    const child = spawn(process.execPath, [join(root, "bin/redox-cells.mjs"), input, "-o", output, "--svg-dir", dir, "--quiet"], {
      stdio: ["ignore", "ignore", "pipe"],
    });
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
    let peakRss = 0;
    let hwm = 0;
    const timer = setInterval(() => {
      const m = child.pid ? memoryOf(child.pid) : null;
      if (m) {
        peakRss = Math.max(peakRss, m.rss);
        hwm = Math.max(hwm, m.hwm || 0);
      }
    }, 50);
    const code: number = await new Promise((res) => child.on("exit", (c) => res(c ?? -1)));
    clearInterval(timer);
    const seconds = (performance.now() - started) / 1000;
    if (code !== 0) {
      console.log(`cli: exit code ${code}\n${stderr.slice(0, 2000)}`);
      process.exitCode = 1;
      return;
    }
    const outLines = (await countLines(output)) - 1; // minus the header
    console.log(`cli: ${rows.toLocaleString("en-US")} rows in ${seconds.toFixed(1)} s (process start included): ${Math.round(rows / seconds).toLocaleString("en-US")} rows/s; ${outLines.toLocaleString("en-US")} rows written`);
    console.log(peakRss > 0 ? `cli: peak memory ${(Math.max(peakRss, hwm) / 1024).toFixed(0)} MiB (resident set; sampled peak ${(peakRss / 1024).toFixed(0)} MiB, high-water mark ${(hwm / 1024).toFixed(0)} MiB)` : "cli: peak memory not measurable here (no /proc)");
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});

// The package bin as users run it (spawned processes, few of them: each start costs time): it runs the prebuilt
// dist/cli file with no sources and no compiler present; without that file (a fresh `npm ci`, no build yet) it
// falls back to the sources through tsx; and an interrupted run (SIGINT, as Ctrl-C sends) exits 130, leaves the
// previous results as they were and no partial file.

import { spawn, spawnSync } from "node:child_process";
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  symlinkSync,
  writeFileSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { REPO_ROOT } from "../../test-support/bundle-harness";
import { writeSyntheticLog } from "../../test-support/synthetic-log";

const PREBUILT = join(REPO_ROOT, "dist/cli");
const pkg = JSON.parse(readFileSync(join(REPO_ROOT, "package.json"), "utf8")) as {
  bin: Record<string, string>;
  version: string;
};

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "redox-cli-bin-"));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe("the package bin", () => {
  it("is bin/redox-cells.mjs and runs the prebuilt file: works with no sources, no node_modules, no compiler", () => {
    expect(pkg.bin["redox-cells"]).toBe("bin/redox-cells.mjs");
    expect(
      existsSync(join(PREBUILT, "redox-cells.cjs")),
      "dist/cli/redox-cells.cjs is missing: run npm run build",
    ).toBe(true);
    // a copy of the package with only the bin and the prebuilt files in it
    const copy = join(dir, "prebuilt-only");
    mkdirSync(join(copy, "bin"), { recursive: true });
    mkdirSync(join(copy, "dist/cli"), { recursive: true });
    copyFileSync(join(REPO_ROOT, pkg.bin["redox-cells"]), join(copy, "bin/redox-cells.mjs"));
    for (const f of readdirSync(PREBUILT)) copyFileSync(join(PREBUILT, f), join(copy, "dist/cli", f));
    const log = join(dir, "log.csv");
    writeFileSync(log, "id,pH,ORP_mV_AgCl_sat,temp_C,metal\nA,7,200,15,Fe\nB,7,oops,15,Cu\n");
    const exec = (args: string[]) =>
      spawnSync(process.execPath, [join(copy, "bin/redox-cells.mjs"), ...args], {
        encoding: "utf8",
        cwd: dir,
        timeout: 60_000,
      });
    const version = exec(["--version"]);
    expect(version.status).toBe(0);
    expect(version.stdout).toBe(`redox-cells ${pkg.version}\n`);
    // a whole run: the chemistry, the data files and the diagram renderer are in the prebuilt files
    const result = exec([log, "-o", join(dir, "out.csv"), "--svg-dir", dir, "--quiet"]);
    expect(result.stderr).toContain(`line 3, column "ORP_mV_AgCl_sat": expected a number`);
    expect(result.status).toBe(1);
    expect(readFileSync(join(dir, "out.csv"), "utf8").split("\n")).toHaveLength(4);
    expect(existsSync(join(dir, "diagram-Fe.svg"))).toBe(true);
  }, 120_000);

  it("without the prebuilt file (npm ci before any build) runs the sources through tsx: --help works", () => {
    const copy = join(dir, "sources-only");
    mkdirSync(join(copy, "bin"), { recursive: true });
    copyFileSync(join(REPO_ROOT, "bin/redox-cells.mjs"), join(copy, "bin/redox-cells.mjs"));
    for (const entry of ["src", "data", "node_modules", "package.json", "tsconfig.json"])
      symlinkSync(join(REPO_ROOT, entry), join(copy, entry));
    const help = spawnSync(process.execPath, [join(copy, "bin/redox-cells.mjs"), "--help"], {
      encoding: "utf8",
      timeout: 120_000,
    });
    expect(help.stderr).toBe("");
    expect(help.status).toBe(0);
    expect(help.stdout).toContain("Usage");
    const usage = spawnSync(process.execPath, [join(copy, "bin/redox-cells.mjs"), "--no-such-option", "x.csv"], {
      encoding: "utf8",
      timeout: 120_000,
    });
    expect(usage.status).toBe(2);
  }, 240_000);

  it("an interrupt (SIGINT) exits 130, keeps the previous results and leaves no partial file", async () => {
    const input = join(dir, "big.csv");
    await writeSyntheticLog(input, 300_000, { seed: 2 });
    const outDir = join(dir, "interrupted");
    mkdirSync(outDir);
    const output = join(outDir, "results.csv");
    writeFileSync(output, "previous results\n");
    const child = spawn(
      process.execPath,
      [join(REPO_ROOT, "bin/redox-cells.mjs"), input, "-o", output, "--no-svg", "--quiet"],
      { stdio: ["ignore", "ignore", "pipe"] },
    );
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
    const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
    // wait until the temporary file is being written, then interrupt
    let sawPartial = false;
    for (let i = 0; i < 1500 && !sawPartial; i++) {
      sawPartial = readdirSync(outDir).some((f) => f.endsWith(".partial"));
      if (!sawPartial) await new Promise((r) => setTimeout(r, 10));
    }
    expect(sawPartial).toBe(true);
    child.kill("SIGINT");
    expect(await exited).toBe(130);
    expect(stderr).toContain("interrupted");
    expect(readFileSync(output, "utf8")).toBe("previous results\n");
    expect(readdirSync(outDir)).toEqual(["results.csv"]);
  }, 120_000);
});

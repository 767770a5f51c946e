// The command line never loses data, drops a row or writes a formula: same-file refusal, previous results kept on
// a failure and on a full disk, one output row per input record, CSV-injection neutralising (OWASP, "CSV
// Injection", owasp.org/www-community/attacks/CSV_Injection), bounded messages, precision, duplicate headers, a
// failed diagram write. In process (runCommand); the spawned bin and a kill are in cli-bin.test.ts.

import {
  createWriteStream,
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
import { Writable } from "node:stream";
import { parse as parseSync } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_BATCH_SIZE } from "../../src/cli/options";
import { CsvBytes } from "../../src/cli/csv-bytes";
import { DEFAULT_FORMAT, numberField, type NumberKind } from "../../src/cli/csv-format";
import { mulberry32 } from "../../src/cli/seeded-random";
import { runCommand, type CliStreams } from "../../src/cli/run";

class Capture extends Writable {
  text = "";
  isTTY = false;
  override _write(chunk: Buffer | string, _enc: BufferEncoding, done: () => void): void {
    this.text += chunk.toString();
    done();
  }
}

async function run(args: string[], extra: Partial<CliStreams> = {}) {
  const stdout = new Capture();
  const stderr = new Capture();
  const result = await runCommand(args, { stdout, stderr, ...extra });
  return { ...result, stdout: stdout.text, stderr: stderr.text };
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "redox-cli-safety-"));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const write = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};
const partials = (): string[] => readdirSync(dir).filter((f) => f.endsWith(".partial"));
const LOG = "id,pH,ORP_mV_AgCl_sat,temp_C,metal\nA1,7,200,15,Fe\nA2,7.5,-100,20,Cu\n";

describe("safe output", () => {
  it("refuses an output that is the input (same path, a path through .., a symlink) with exit 2, input untouched", async () => {
    const input = write("same.csv", LOG);
    mkdirSync(join(dir, "sub"), { recursive: true });
    symlinkSync(input, join(dir, "sub", "link.csv"));
    for (const output of [input, join(dir, "sub", "..", "same.csv"), join(dir, "sub", "link.csv")]) {
      const r = await run([input, "-o", output, "--no-svg"]);
      expect(r.code, output).toBe(2);
      expect(r.stderr).toContain("is the input file");
      expect(readFileSync(input, "utf8")).toBe(LOG);
    }
    expect(partials()).toEqual([]);
  });

  it("a failing run (unclosed quote, usage error) leaves the previous results as they were and no partial file", async () => {
    const output = write("previous.csv", "previous results\n");
    const malformed = write("unclosed.csv", LOG + 'A3,"7,200,15,Fe\n');
    const r = await run([malformed, "-o", output, "--no-svg"]);
    expect(r.code).toBe(3);
    expect(readFileSync(output, "utf8")).toBe("previous results\n");
    const usage = await run([write("nounit.csv", "pH,ORP,metal\n7,200,Fe\n"), "-o", output, "--no-svg", "-e", "SCE"]);
    expect(usage.code).toBe(2);
    expect(readFileSync(output, "utf8")).toBe("previous results\n");
    expect(partials()).toEqual([]);
  });

  it("a full disk: exit 3, 'no space left', the previous results kept, no partial file", async () => {
    const output = write("full-previous.csv", "previous results\n");
    // the temporary file's stream fails as a full disk does once a few bytes are written
    const openOutput = (path: string) => {
      const stream = createWriteStream(path, { flags: "wx" });
      let written = 0;
      const real = stream._write.bind(stream);
      stream._write = (chunk: Buffer, encoding: BufferEncoding, done: (error?: Error | null) => void) => {
        written += chunk.length;
        if (written > 64)
          return done(Object.assign(new Error("ENOSPC: no space left on device, write"), { code: "ENOSPC" }));
        real(chunk, encoding, done);
      };
      return stream;
    };
    const r = await run([write("full.csv", LOG), "-o", output, "--no-svg"], { openOutput });
    expect(r.code).toBe(3);
    expect(r.stderr).toContain("no space left on the device");
    expect(readFileSync(output, "utf8")).toBe("previous results\n");
    expect(partials()).toEqual([]);
  });

  it("writing to /dev/full (a real device that is always full) exits 3 with the reason", async () => {
    if (!existsSync("/dev/full")) return;
    const r = await run([write("devfull.csv", LOG), "-o", "/dev/full", "--no-svg"]);
    expect(r.code).toBe(3);
    expect(r.stderr).toContain("no space left on the device");
  });

  it("a successful run replaces the previous results", async () => {
    const output = write("replaced.csv", "previous results\n");
    const r = await run([write("ok.csv", LOG), "-o", output, "--no-svg", "--quiet"]);
    expect(r.code).toBe(0);
    expect(readFileSync(output, "utf8").split("\n")[0]).toMatch(/^id,pH,/);
    expect(partials()).toEqual([]);
  });

  it("a failed diagram write exits 4, with the results complete", async () => {
    const output = join(dir, "svgfail-out.csv");
    const notADirectory = write("not-a-dir", "x");
    const r = await run([write("svgfail.csv", LOG), "-o", output, "--svg-dir", join(notADirectory, "svg"), "--quiet"]);
    expect(r.code).toBe(4);
    expect(r.stderr).toContain("the results are complete, but the diagrams cannot be written");
    expect(parseSync(readFileSync(output, "utf8"))).toHaveLength(3);
  });

  it("a metal whose median temperature and water are refused (above 100 °C with chloride) gets no diagram, the others do; exit 4 with the reason", async () => {
    // copper answers at 250 °C in pure water and at 80 °C with chloride, but not at the median (165 °C) with chloride
    const rows = ["id,metal,pH,Eh_mV,temperature_C,chloride_mg_L"];
    for (const [id, t, cl] of [
      ["a", 250, 0],
      ["b", 250, 0],
      ["c", 250, 0],
      ["d", 80, 350],
      ["e", 80, 350],
      ["f", 80, 350],
    ])
      rows.push(`${id},Cu,7,-400,${t},${cl}`);
    rows.push("g,Cr,6,-300,300,0");
    const svgDir = join(dir, "median-refused");
    const output = join(dir, "median-refused.csv");
    const r = await run([
      write("median-refused-in.csv", rows.join("\n") + "\n"),
      "-o",
      output,
      "--svg-dir",
      svgDir,
      "--quiet",
    ]);
    expect(r.code).toBe(4);
    expect(r.stderr).toMatch(
      /the results are complete, but no Cu diagram \(drawn at the samples' median temperature and water\): temperature 165 °C: Cu with chloride/,
    );
    expect(readdirSync(svgDir)).toEqual(["diagram-Cr.svg"]);
    expect(parseSync(readFileSync(output, "utf8"))).toHaveLength(8);
  });
});

describe("one output row per input record", () => {
  it("keeps ids beginning with #, blank lines and lines of delimiters, each with a note; a # preamble is skipped", async () => {
    const input = write(
      "records.csv",
      "# a note before the header\n\nid,pH,Eh (V),temp,metal\n#1,7,0.2,20,Fe\n,,,,\n\n#2,8,0.1,20,Fe\n",
    );
    const output = join(dir, "records-out.csv");
    const r = await run([input, "-o", output, "--no-svg", "--quiet"]);
    expect(r.code).toBe(0);
    const rows = parseSync(readFileSync(output, "utf8"), { relax_column_count: true }) as string[][];
    expect(rows.map((row) => row[0])).toEqual(["id", "#1", "", "", "#2"]);
    expect(r.summary?.rows).toBe(4);
    expect(r.summary?.blankRows).toBe(2);
    expect(rows[1][7]).toBe("Fe2O3(s)");
    expect(rows[2].slice(5).every((c) => c === "")).toBe(true);
    expect(r.stderr).toContain("line 5: a record of blank cells; its results are left blank");
    expect(r.stderr).toContain("line 6: a record of blank cells");
  });

  it("reports duplicate headers (the first is read) and records longer than the header", async () => {
    const input = write("dupes.csv", "pH,Eh (V),PH,metal\n7,0.2,9,Fe\n7,0.2,9,Fe,extra\n");
    const r = await run([input, "-o", join(dir, "dupes-out.csv"), "--no-svg", "--quiet"]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`the header "PH" is in columns 1 and 3; the first is the one read`);
    expect(r.stderr).toContain("line 3: 5 fields, the header has 4");
  });
});

describe("no formula injection", () => {
  const input = () =>
    write(
      "inject.csv",
      'id,pH,Eh (V),metal,note\n=HYPERLINK("http://x"),7,0.2,Fe,+cmd|calc\n@SUM(1),7,-0.25,Fe,-2+3\n"\tx",7,+0.2,Fe,"\rx"\nok,7,0.2,Fe,-7.5\n',
    );

  it("puts an apostrophe before text starting with = + - @ tab or CR; numbers stay numbers", async () => {
    const output = join(dir, "inject-out.csv");
    const r = await run([input(), "-o", output, "--no-svg", "--quiet"]);
    expect(r.code).toBe(0);
    const rows = parseSync(readFileSync(output, "utf8")) as string[][];
    expect(rows[1][0]).toBe(`'=HYPERLINK("http://x")`);
    expect(rows[1][4]).toBe("'+cmd|calc");
    expect(rows[2][0]).toBe("'@SUM(1)");
    expect(rows[2][4]).toBe("'-2+3");
    expect(rows[2][2]).toBe("-0.25");
    expect(rows[3][0]).toBe("'\tx");
    expect(rows[3][2]).toBe("+0.2");
    expect(rows[3][4]).toBe("'\rx");
    expect(rows[4][4]).toBe("-7.5");
    // results that are negative numbers are numbers too
    expect(rows[2][6]).toMatch(/^-?\d/);
  });

  it("--raw-text writes them as they are", async () => {
    const output = join(dir, "inject-raw.csv");
    await run([input(), "-o", output, "--no-svg", "--quiet", "--raw-text"]);
    const rows = parseSync(readFileSync(output, "utf8")) as string[][];
    expect(rows[1][0]).toBe(`=HYPERLINK("http://x")`);
    expect(rows[2][0]).toBe("@SUM(1)");
  });
});

describe("bounded messages and precision", () => {
  it("cuts echoed input to a few hundred characters (a 1 MB header, a 100 kB cell, a long metal name)", async () => {
    const huge = "h".repeat(1_000_000);
    const noPH = await run([write("huge-header.csv", `${huge},ORP mV\n1,2\n`), "-m", "Fe", "-e", "SCE", "-u", "mV"]);
    expect(noPH.code).toBe(2);
    expect(noPH.stderr.length).toBeLessThan(1500);
    const cell = "x".repeat(100_000);
    const output = join(dir, "huge-cell-out.csv");
    const bad = await run([
      write("huge-cell.csv", `pH,Eh (V),${cell.slice(0, 5000)}\n${cell},0.2,Fe\n`),
      "-o",
      output,
      "-m",
      "Fe",
      "--no-svg",
      "--quiet",
    ]);
    expect(bad.code).toBe(1);
    expect(bad.stderr.length).toBeLessThan(1500);
    const errors = (parseSync(readFileSync(output, "utf8")) as string[][])[1].at(-1)!;
    expect(errors.length).toBeLessThan(1000);
    const metal = await run([write("m.csv", LOG), "-m", "Q".repeat(100_000)]);
    expect(metal.stderr.length).toBeLessThan(1500);
  });

  it("writes potentials to 0.1 mV and amounts to 4 significant figures; --full-precision writes every digit", async () => {
    const input = write("precision.csv", LOG);
    const short = join(dir, "short.csv");
    const full = join(dir, "full.csv");
    await run([input, "-o", short, "--no-svg", "--quiet"]);
    await run([input, "-o", full, "--no-svg", "--quiet", "--full-precision"]);
    const a = parseSync(readFileSync(short, "utf8"), { columns: true }) as Record<string, string>[];
    const b = parseSync(readFileSync(full, "utf8"), { columns: true }) as Record<string, string>[];
    expect(a[0].water_margin_V).toBe("0.43");
    expect(a[0].metal_boundary_below_V).toBe("-0.1845");
    expect(b[0].water_margin_V.length).toBeGreaterThan(12);
    expect(Number(a[0].metal_boundary_below_V)).toBeCloseTo(Number(b[0].metal_boundary_below_V), 4);
    const dissolved = Number(b[0].metal_dissolved_ug_L);
    expect(a[0].metal_dissolved_ug_L).toBe(String(Number(dissolved.toPrecision(4))));
  });
});

describe("batches", () => {
  // rows are handed to the functions grouped by metal and temperature within each batch, so the batch size changes
  // the order the engine sees them in and which rows share a call; the results must not change with it
  it("give the same results, messages and diagrams at any batch size", async () => {
    const metals = ["Fe", "Cu", "Pb", "zinc", " Pb ", "Xx", "", "Hg"];
    let text = "id;pH;ORP (mV) vs SCE;Temp (°F);metal;Alkalinity (meq/L);chloride mg/L;Conductivity (uS/cm);note\n";
    let seed = 99;
    const random = (): number => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    for (let i = 0; i < 1500; i++) {
      const pH = random() < 0.03 ? "7,3x" : (2 + random() * 11).toFixed(2).replace(".", ",");
      const orp = random() < 0.03 ? "" : String(Math.round(-600 + random() * 1400));
      const fahrenheit = (35 + Math.floor(random() * 6) * 20).toFixed(1).replace(".", ",");
      const alkalinity = random() < 0.1 ? "" : (random() * 4).toFixed(3).replace(".", ",");
      const chloride = random() < 0.3 ? "" : (random() * 200).toFixed(1).replace(".", ",");
      const note = random() < 0.05 ? "=1+2" : "";
      const metal = metals[Math.floor(random() * metals.length)];
      text +=
        random() < 0.01
          ? ";;;;\n"
          : `S${i};${pH};${orp};${fahrenheit};${metal};${alkalinity};${chloride};${Math.round(random() * 2000)};${note}\n`;
    }
    const input = write("batches.csv", text);
    const outcomes: { code: number; stderr: string; results: string; svgs: string[] }[] = [];
    for (const size of [1, 7, 256, DEFAULT_BATCH_SIZE, 5000]) {
      const out = join(dir, `batches-${size}`);
      mkdirSync(out, { recursive: true });
      const args = [input, "-o", join(out, "results.csv"), "--svg-dir", out, "-m", "Cu", "--full-precision"];
      const result = await run([...args, "--batch-size", String(size), "--max-messages", "100000", "--quiet"]);
      const svgs = readdirSync(out)
        .filter((f) => f.endsWith(".svg"))
        .sort()
        .map((f) => readFileSync(join(out, f), "utf8"));
      outcomes.push({
        code: result.code,
        stderr: result.stderr,
        results: readFileSync(join(out, "results.csv"), "utf8"),
        svgs,
      });
    }
    const first = outcomes[0];
    expect(first.code).toBe(1); // the file has bad cells
    expect(first.results.split("\n")).toHaveLength(1500 + 2); // header, rows, final newline
    expect(first.svgs.length).toBeGreaterThan(3);
    for (const later of outcomes.slice(1)) expect(later).toEqual(first);
  }, 120_000);
});

describe("number text", () => {
  it("potentials to 0.1 mV read back as the rounded value, with a decimal comma where the file has one", () => {
    for (let i = -30_000; i <= 30_000; i += 7) {
      const x = i / 1e4 + (i % 3) * 1.3e-5;
      const text = numberField(x, "volts", DEFAULT_FORMAT);
      expect(Number(text)).toBe(Math.round(x * 1e4) / 1e4);
      expect(text).not.toMatch(/\.\d*0$|e/);
    }
    expect(numberField(-0.00004, "volts", DEFAULT_FORMAT)).toBe("0");
    expect(numberField(-1.25, "volts", { ...DEFAULT_FORMAT, delimiter: ";", decimalMark: "," })).toBe("-1,25");
    expect(numberField(1.234567e-7, "amount", DEFAULT_FORMAT)).toBe("1.235e-7");
  });

  it("the results bytes hold exactly numberField's text, at every magnitude, sign, tie and decimal mark", () => {
    const random = mulberry32(11);
    const values = [0, -0, 1, -1, 0.5, 9999.5, 0.00012345, 1e-6, 9.9995e-7, 1e15, 1e16, 123456789.5, NaN, Infinity];
    values.push(1e-7, 1.5e-300, 5e-324, 9.99951e-301, 1e-310, 2.5e-12, 9.9999e-10, -3.21e-45, 1e21, 1e300);
    for (let i = 0; i < 20_000; i++) {
      const x = (random() - 0.3) * 10 ** Math.floor(random() * 60 - 40);
      values.push(x, Math.round(x * 1e4) / 1e4 + 0.00005, Number(x.toPrecision(4)));
    }
    const comma = { ...DEFAULT_FORMAT, delimiter: ";", decimalMark: "," as const };
    for (const format of [DEFAULT_FORMAT, comma, { ...DEFAULT_FORMAT, fullPrecision: true }])
      for (const kind of ["volts", "amount"] as NumberKind[]) {
        const bytes = new CsvBytes(format);
        for (const x of values) {
          bytes.number(x, kind);
          bytes.byte(10);
        }
        expect(bytes.takeText()).toBe(values.map((x) => numberField(x, kind, format) + "\n").join(""));
      }
    // amounts: the text of the 4-figure double as JavaScript writes it (ECMA-262, Number::toString)
    const amounts = values.map((x) => numberField(x, "amount", DEFAULT_FORMAT));
    expect(amounts).toEqual(values.map((x) => String(Number(x.toPrecision(4)))));
  });
});

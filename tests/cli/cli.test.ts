// The redox-cells command line: a generated 200 000-row CSV (row count, columns, a sample of values against direct
// calls of the worksheet functions, messages for bad cells), blank cells, delimiters and quoting, output to
// standard output, --help, and the exit codes (in process; the spawned bin is in cli-bin.test.ts).

import { mkdtempSync, readFileSync, rmSync, writeFileSync, createReadStream } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Writable } from "node:stream";
import { parse } from "csv-parse";
import { parse as parseSync } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CellError, type CellOutput } from "../../src/functions/cell-values";
import { toSHEAt } from "../../src/functions/electrode-functions";
import { boundaryFrom, dissolvedAt, regimeAt, speciesAt } from "../../src/functions/stability-functions";
import { waterMarginAt } from "../../src/functions/water-functions";
import { dicAt } from "../../src/functions/carbonate-functions";
import { getDatabase } from "../../src/chemistry/database";
import { DEFAULT_FORMAT, numberField, type NumberKind } from "../../src/cli/csv-format";
import { HELP, OPTION_SPEC } from "../../src/cli/options";
import { runCommand } from "../../src/cli/run";
import { SYNTHETIC_HEADER, writeSyntheticLog } from "../../test-support/synthetic-log";

/** Collects what the program writes. */
class Capture extends Writable {
  text = "";
  isTTY = false;
  override _write(chunk: Buffer | string, _enc: BufferEncoding, done: () => void): void {
    this.text += chunk.toString();
    done();
  }
}

async function run(args: string[]) {
  const stdout = new Capture();
  const stderr = new Capture();
  const result = await runCommand(args, { stdout, stderr });
  return { ...result, stdout: stdout.text, stderr: stderr.text };
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "redox-cli-"));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const RESULT_COLUMNS = [
  "E_SHE_V",
  "water_margin_V",
  "metal_species",
  "metal_regime",
  "metal_boundary_above_V",
  "metal_boundary_below_V",
  "metal_dissolved_ug_L",
  "errors",
];

/** What a result cell of the CSV should hold for a worksheet function's answer. */
function expectedText(value: CellOutput, kind: NumberKind = "amount"): string {
  if (value instanceof CellError) return value.code;
  return typeof value === "number" ? numberField(value, kind, DEFAULT_FORMAT) : value;
}

/** A total (mol/kg) as the results write it: 4 significant figures. */
const formatNumber = (x: number): string => numberField(x, "amount", DEFAULT_FORMAT);

describe("a generated 200 000-row log", () => {
  const ROWS = 200_000;
  // 0-based data rows with a mistyped or impossible pH; the file line is index + 2 (the header is line 1)
  const bad = new Map<number, string>([
    [1_000, "7,3"],
    [123_456, "seven"],
    [199_999, "17.5"],
  ]);
  let input: string;
  let output: string;
  let outcome: Awaited<ReturnType<typeof run>>;

  beforeAll(async () => {
    input = join(dir, "big.csv");
    output = join(dir, "big-results.csv");
    await writeSyntheticLog(input, ROWS, { seed: 11, bad });
    outcome = await run([input, "-o", output, "--no-svg", "--max-messages", "10"]);
  }, 600_000);

  it("exits 1 (some rows had bad cells) and names line and column of each", () => {
    expect(outcome.code).toBe(1);
    expect(outcome.stderr).toContain(`line 1002, column "pH": expected a number, got the text "7,3" (#VALUE!)`);
    expect(outcome.stderr).toContain(`line 123458, column "pH": expected a number, got the text "seven" (#VALUE!)`);
    expect(outcome.stderr).toMatch(/line 200001, column "pH": 17\.5 is out of range.*\(#VALUE!\)/);
    expect(outcome.summary?.errorRows).toBe(3);
    expect(outcome.summary?.rows).toBe(ROWS);
  });

  it("writes every row, in order, with the input columns and the result columns", async () => {
    const parser = createReadStream(output).pipe(parse({ relax_column_count: false }));
    let header: string[] | null = null;
    let count = 0;
    const sample = new Map<number, string[]>();
    const wanted = new Set<number>([...bad.keys()]);
    for (let k = 0; k < 300; k++) wanted.add((k * 7919 * 13 + 17) % ROWS);
    for await (const record of parser as AsyncIterable<string[]>) {
      if (header === null) {
        header = record;
        continue;
      }
      expect(record[0]).toBe(`S${count + 1}`);
      if (wanted.has(count)) sample.set(count, record);
      count++;
    }
    expect(header).toEqual([...SYNTHETIC_HEADER, ...RESULT_COLUMNS]);
    expect(count).toBe(ROWS);

    // a sample of rows against direct calls of the worksheet functions on the same cells
    const inputRows = parseSync(readFileSync(input, "utf8"), { from_line: 2 }) as string[][];
    let compared = 0;
    for (const [index, record] of sample) {
      const [, pH, orp, t, metal] = inputRows[index];
      const reading = Number(orp) / 1000;
      const e = toSHEAt(reading, "AgCl-sat", t)[0][0];
      const ePassed = typeof e === "number" ? e : "";
      const expected = [
        expectedText(e, "volts"),
        expectedText(waterMarginAt(pH, ePassed, t)[0][0], "volts"),
        expectedText(speciesAt(metal, pH, ePassed, t)[0][0]),
        expectedText(regimeAt(metal, pH, ePassed, t)[0][0]),
        expectedText(
          boundaryFrom(
            metal,
            pH,
            ePassed,
            t,
            undefined,
            undefined,
            undefined,
            undefined,
            undefined,
            undefined,
            1,
          )[0][0],
          "volts",
        ),
        expectedText(
          boundaryFrom(
            metal,
            pH,
            ePassed,
            t,
            undefined,
            undefined,
            undefined,
            undefined,
            undefined,
            undefined,
            -1,
          )[0][0],
          "volts",
        ),
        expectedText(
          dissolvedAt(metal, pH, ePassed, t, undefined, undefined, undefined, undefined, undefined, "ug/L")[0][0],
        ),
      ];
      const got = record.slice(SYNTHETIC_HEADER.length, SYNTHETIC_HEADER.length + 7);
      expect(got, `row ${index + 1}`).toEqual(expected);
      compared++;
    }
    expect(compared).toBe(sample.size);
    expect(compared).toBeGreaterThan(250);

    const badRow = sample.get(1_000)!;
    expect(badRow.slice(SYNTHETIC_HEADER.length + 1, SYNTHETIC_HEADER.length + 7).every((c) => c === "#VALUE!")).toBe(
      true,
    );
    expect(badRow[badRow.length - 1]).toBe(`pH: expected a number, got the text "7,3" (#VALUE!)`);
    const outOfRange = sample.get(199_999)!;
    expect(outOfRange[SYNTHETIC_HEADER.length + 2]).toBe("#VALUE!");
  }, 600_000);

  it("says how many messages it did not print", () => {
    // 3 bad rows give 3 messages here; the limit is 10, so none is held back
    expect(outcome.stderr).not.toContain("more messages not shown");
    expect(outcome.summary?.messages).toBe(3);
  });
});

describe("small files", () => {
  const write = (name: string, text: string): string => {
    const path = join(dir, name);
    writeFileSync(path, text);
    return path;
  };

  it("blank cells give blank results, a note, and exit 0", async () => {
    const input = write("blank.csv", "# a comment line\nsite;pH;Eh (V);temp\nA;7;0.5;20\nB;;0.5;20\nC;8;;\n");
    const r = await run([input, "-o", join(dir, "blank-out.csv"), "--metal", "Cu,iron", "--no-svg", "--quiet"]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`line 4, column "pH": blank; this row's results are left blank`);
    // a blank temperature is a missing measurement: blank results, reported
    expect(r.stderr).toContain(`line 5, column "temp": blank: a missing measurement`);
    // the results use the input's delimiter
    const rows = parseSync(readFileSync(join(dir, "blank-out.csv"), "utf8"), { delimiter: ";" }) as string[][];
    expect(rows[0]).toEqual([
      "site",
      "pH",
      "Eh (V)",
      "temp",
      "E_SHE_V",
      "water_margin_V",
      "Cu_species",
      "Cu_regime",
      "Cu_boundary_above_V",
      "Cu_boundary_below_V",
      "Cu_dissolved_ug_L",
      "Fe_species",
      "Fe_regime",
      "Fe_boundary_above_V",
      "Fe_boundary_below_V",
      "Fe_dissolved_ug_L",
      "errors",
    ]);
    expect(rows[1][4]).toBe("0.5"); // Eh is on the SHE scale already
    expect(rows[1][6]).toBe(expectedText(speciesAt("Cu", 7, 0.5, 20)[0][0]));
    expect(rows[1][11]).toBe(expectedText(speciesAt("Fe", 7, 0.5, 20)[0][0]));
    expect(rows[2].slice(5, 16).every((c) => c === "")).toBe(true);
    expect(rows[3].slice(4, 16).every((c) => c === "")).toBe(true);
  });

  it("names the first line of a record that spans lines, and keeps quoted fields intact", async () => {
    const input = write("quoted.csv", 'id,pH,ORP (mV),note\n1,7,200,"two\nlines"\n2,x,200,ok\n');
    const r = await run([input, "-o", join(dir, "quoted-out.csv"), "-m", "Fe", "-e", "SCE", "--no-svg", "--quiet"]);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain(`line 4, column "pH": expected a number, got the text "x"`);
    const rows = parseSync(readFileSync(join(dir, "quoted-out.csv"), "utf8")) as string[][];
    expect(rows[1][3]).toBe("two\nlines");
    expect(rows[1][4]).toBe(expectedText(toSHEAt(0.2, "SCE")[0][0], "volts"));
  });

  it("writes to standard output with -o - and keeps the summary off it", async () => {
    const input = write("stdout.csv", "pH,E_V_SHE,metal\n7,0.2,Zn\n");
    const r = await run([input, "-o", "-", "--no-svg"]);
    expect(r.code).toBe(0);
    const rows = parseSync(r.stdout) as string[][];
    expect(rows).toHaveLength(2);
    expect(rows[1][3]).toBe(expectedText(toSHEAt(0.2, "SHE")[0][0], "volts"));
    expect(rows[1][5]).toBe(expectedText(speciesAt("Zn", 7, 0.2)[0][0]));
    expect(r.stderr).toContain("1 rows from");
  });

  it("draws the progress bar only when asked (standard error is not a terminal here)", async () => {
    const input = write("progress.csv", "pH,Eh_V,metal\n7,0.2,Zn\n");
    const quiet = await run([input, "-o", join(dir, "p1.csv"), "--no-svg", "--quiet"]);
    expect(quiet.stderr).toBe("");
    const shown = await run([input, "-o", join(dir, "p2.csv"), "--no-svg", "--quiet", "--progress"]);
    expect(shown.stderr).toMatch(/\r\[#+\] 100%/);
  });

  it("usage errors: no pH column, unknown metal, unknown electrode, missing unit", async () => {
    const input = write("usage.csv", "depth,ORP mV\n1,200\n");
    const noPH = await run([input, "-m", "Fe", "-e", "SCE"]);
    expect(noPH.code).toBe(2);
    expect(noPH.stderr).toContain("no pH column found");
    const ok = write("usage2.csv", "pH,ORP\n7,200\n");
    expect((await run([ok, "-m", "Unobtainium", "-e", "SCE", "-u", "mV"])).stderr).toContain(
      `--metal: "Unobtainium" is not a metal`,
    );
    expect((await run([ok, "-m", "Fe", "-e", "XYZ", "-u", "mV"])).code).toBe(2);
    const noUnit = await run([ok, "-m", "Fe", "-e", "SCE"]);
    expect(noUnit.code).toBe(2);
    expect(noUnit.stderr).toContain("give --unit V or --unit mV");
    const noElectrode = await run([ok, "-m", "Fe", "-u", "mV"]);
    expect(noElectrode.stderr).toContain("give --electrode");
  });

  it("--help documents every option the parser accepts", async () => {
    const r = await run(["--help"]);
    expect(r.code).toBe(0);
    for (const name of Object.keys(OPTION_SPEC)) expect(HELP, name).toContain(`--${name}`);
    for (const code of ["0", "1", "2", "3", "4", "130"]) expect(HELP).toMatch(new RegExp(`^  ${code}  `, "m"));
  });
});

describe("water columns: alkalinity, DIC, chloride and sulfate feed [carbonate], [chloride], [sulfur]", () => {
  const write = (name: string, text: string): string => {
    const path = join(dir, name);
    writeFileSync(path, text);
    return path;
  };
  const read = (name: string) =>
    parseSync(readFileSync(join(dir, name), "utf8"), { columns: true }) as Record<string, string>[];
  // atomic weights from the element records, as the command line converts mg/L (1 L taken as 1 kg)
  const weight = (symbol: string) => getDatabase().element(symbol)!.atomicWeight;

  it("alkalinity (mg/L as CaCO3) → REDOX.DIC per row → the carbonate argument; chloride and sulfate in mg/L → mol/kg", async () => {
    const input = write(
      "water.csv",
      "site,pH,ORP_mV_AgCl_sat,temp_C,pipe_metal,Alkalinity (mg/L CaCO3),Chloride mg/L,Sulfate mg/L\n" +
        "A,7.2,350,12,Pb,80,35,40\n" +
        "B,8.1,-250,18,Cu,150,,120\n" +
        "C,6.9,420,9,Pb,,20,\n",
    );
    const r = await run([input, "-o", join(dir, "water-out.csv"), "--no-svg", "--quiet"]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(
      `line 4, column "Alkalinity (mg/L CaCO3)": blank; this row is evaluated without carbonate`,
    );
    const rows = read("water-out.csv");
    expect(Object.keys(rows[0])).toEqual([
      "site",
      "pH",
      "ORP_mV_AgCl_sat",
      "temp_C",
      "pipe_metal",
      "Alkalinity (mg/L CaCO3)",
      "Chloride mg/L",
      "Sulfate mg/L",
      "E_SHE_V",
      "water_margin_V",
      "DIC_mol_kg",
      "chloride_mol_kg",
      "sulfur_mol_kg",
      "metal_species",
      "metal_regime",
      "metal_boundary_above_V",
      "metal_boundary_below_V",
      "metal_dissolved_ug_L",
      "errors",
    ]);
    const cases: Array<[string, number, number, number, number | string, number | string, number | string]> = [
      // metal, pH, reading mV, °C, alkalinity, chloride mg/L, sulfate mg/L
      ["Pb", 7.2, 350, 12, 80, 35, 40],
      ["Cu", 8.1, -250, 18, 150, "", 120],
      ["Pb", 6.9, 420, 9, "", 20, ""],
    ];
    let carbonateMattered = false;
    cases.forEach(([metal, pH, mV, t, alk, cl, so4], i) => {
      const row = rows[i];
      const e = toSHEAt(mV / 1000, "AgCl-sat", t)[0][0] as number;
      const dic = alk === "" ? "" : (dicAt(alk, pH, t)[0][0] as number);
      const chloride = cl === "" ? "" : (cl as number) / 1000 / weight("Cl");
      const sulfur = so4 === "" ? "" : (so4 as number) / 1000 / (weight("S") + 4 * weight("O"));
      expect(row.DIC_mol_kg).toBe(dic === "" ? "" : formatNumber(dic));
      expect(row.chloride_mol_kg).toBe(chloride === "" ? "" : formatNumber(chloride));
      expect(row.sulfur_mol_kg).toBe(sulfur === "" ? "" : formatNumber(sulfur));
      expect(row.metal_species).toBe(expectedText(speciesAt(metal, pH, e, t, undefined, dic, chloride, sulfur)[0][0]));
      expect(row.metal_regime).toBe(expectedText(regimeAt(metal, pH, e, t, undefined, dic, chloride, sulfur)[0][0]));
      expect(row.metal_boundary_above_V).toBe(
        expectedText(
          boundaryFrom(metal, pH, e, t, undefined, dic, chloride, sulfur, undefined, undefined, 1)[0][0],
          "volts",
        ),
      );
      expect(row.metal_boundary_below_V).toBe(
        expectedText(
          boundaryFrom(metal, pH, e, t, undefined, dic, chloride, sulfur, undefined, undefined, -1)[0][0],
          "volts",
        ),
      );
      expect(row.metal_dissolved_ug_L).toBe(
        expectedText(dissolvedAt(metal, pH, e, t, dic, chloride, sulfur, undefined, undefined, "ug/L")[0][0]),
      );
      if (row.metal_species !== expectedText(speciesAt(metal, pH, e, t)[0][0])) carbonateMattered = true;
    });
    // the water changes at least one answer here (lead carbonates at pH 7.2 with 80 mg/L alkalinity)
    expect(carbonateMattered).toBe(true);

    const pure = await run([input, "-o", join(dir, "water-pure.csv"), "--no-svg", "--quiet", "--pure-water"]);
    expect(pure.code).toBe(0);
    const pureRows = read("water-pure.csv");
    expect(Object.keys(pureRows[0])).not.toContain("DIC_mol_kg");
    cases.forEach(([metal, pH, mV, t], i) => {
      const e = toSHEAt(mV / 1000, "AgCl-sat", t)[0][0] as number;
      expect(pureRows[i].metal_species).toBe(expectedText(speciesAt(metal, pH, e, t)[0][0]));
    });

    const noChloride = await run([
      input,
      "-o",
      join(dir, "water-nocl.csv"),
      "--no-svg",
      "--quiet",
      "--chloride-column",
      "none",
    ]);
    expect(Object.keys(read("water-nocl.csv")[0])).toEqual(expect.not.arrayContaining(["chloride_mol_kg"]));
    expect(noChloride.code).toBe(0);
  });

  it("an orthophosphate column feeds [phosphate]: mg/L as PO4 by default, as P when the header says PO4-P", async () => {
    const header = (phosphate: string) => `site,pH,ORP_mV_AgCl_sat,temp_C,pipe_metal,DIC mmol/L,${phosphate}\n`;
    const body = "A,7.5,350,15,Pb,1,1\nB,7.5,350,15,Pb,1,\n";
    for (const [name, phosphateHeader, perMg] of [
      ["po4.csv", "Orthophosphate (mg/L as PO4)", 1e-3 / (weight("P") + 4 * weight("O"))],
      ["po4p.csv", "PO4-P mg/L", 1e-3 / weight("P")],
    ] as const) {
      const input = write(name, header(phosphateHeader) + body);
      const out = `${name}.out.csv`;
      const r = await run([input, "-o", join(dir, out), "--no-svg", "--quiet"]);
      expect(r.code).toBe(0);
      const rows = read(out);
      expect(rows[0].phosphate_mol_kg).toBe(formatNumber(perMg));
      expect(rows[1].phosphate_mol_kg).toBe("");
      const e = toSHEAt(0.35, "AgCl-sat", 15)[0][0] as number;
      expect(rows[0].metal_dissolved_ug_L).toBe(
        expectedText(dissolvedAt("Pb", 7.5, e, 15, 1e-3, undefined, undefined, perMg, undefined, "ug/L")[0][0]),
      );
      expect(rows[1].metal_dissolved_ug_L).toBe(
        expectedText(dissolvedAt("Pb", 7.5, e, 15, 1e-3, undefined, undefined, undefined, undefined, "ug/L")[0][0]),
      );
      // orthophosphate lowers equilibrium lead (hydroxypyromorphite instead of cerussite)
      expect(Number(rows[0].metal_dissolved_ug_L)).toBeLessThan(Number(rows[1].metal_dissolved_ug_L) / 3);
    }
  });

  it("a DIC column (mmol/L) is used before the alkalinity; named columns and units from the header", async () => {
    const input = write("dic.csv", "pH,Eh_V,metal,alk,DIC mmol/L,total S mol/kg\n7.5,-0.3,Fe,100,2.1,0.0004\n");
    const r = await run([
      input,
      "-o",
      join(dir, "dic-out.csv"),
      "--no-svg",
      "--quiet",
      "--sulfur-column",
      "total S mol/kg",
    ]);
    expect(r.code).toBe(0);
    const [row] = read("dic-out.csv");
    expect(row.DIC_mol_kg).toBe(formatNumber(2.1 / 1000));
    expect(row.sulfur_mol_kg).toBe("0.0004");
    expect(row.metal_species).toBe(
      expectedText(speciesAt("Fe", 7.5, -0.3, undefined, undefined, 0.0021, undefined, 0.0004)[0][0]),
    );
    // naming the alkalinity column takes the carbonate from it instead
    const alk = await run([
      input,
      "-o",
      join(dir, "dic-alk.csv"),
      "--no-svg",
      "--quiet",
      "--alkalinity-column",
      "alk",
      "--dic-column",
      "none",
    ]);
    expect(alk.code).toBe(0);
    expect(read("dic-alk.csv")[0].DIC_mol_kg).toBe(formatNumber(dicAt(100, 7.5)[0][0] as number));
    const both = await run([input, "--no-svg", "--alkalinity-column", "alk", "--dic-column", "5"]);
    expect(both.code).toBe(2);
    expect(both.stderr).toContain("name one of them");
  });

  it("bad water cells: messages name the column; an unusable alkalinity passes REDOX.DIC's error on, as a worksheet does", async () => {
    const input = write(
      "water-bad.csv",
      "pH,Eh_V,metal,alkalinity,chloride\n7,0.3,Cu,lots,10\n7,0.3,Cu,50,-5\n11.5,0.3,Cu,5,10\n",
    );
    const r = await run([input, "-o", join(dir, "water-bad-out.csv"), "--no-svg", "--quiet"]);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain(`line 2, column "alkalinity": expected a number, got the text "lots" (#VALUE!)`);
    expect(r.stderr).toMatch(/line 3, column "chloride": .*out of range.* \(#VALUE!\)/);
    // 5 mg/L alkalinity cannot hold pH 11.5: hydroxide alone exceeds it
    expect(r.stderr).toMatch(/line 4, column "alkalinity": .*hydroxide exceeds.*\(#N\/A\)/);
    const rows = read("water-bad-out.csv");
    expect(rows[0].DIC_mol_kg).toBe("#VALUE!");
    expect(rows[0].metal_species).toBe("#VALUE!");
    expect(rows[0].water_margin_V).not.toMatch(/^#/); // the margin does not take the carbonate
    expect(rows[1].chloride_mol_kg).toBe("#VALUE!");
    expect(rows[1].metal_regime).toBe("#VALUE!");
    expect(rows[2].DIC_mol_kg).toBe("#N/A");
    expect(rows[2].metal_species).toBe("#N/A");
  });
});

describe("exit codes, in process (the spawned bin is tested in cli-bin.test.ts)", () => {
  it("0 for --help, 2 for a usage error, 3 for an unreadable input, 1 for bad cells", async () => {
    const help = await run(["--help"]);
    expect(help.code).toBe(0);
    expect(help.stdout).toContain("Usage");

    const usage = await run(["--no-such-option", "x.csv"]);
    expect(usage.code).toBe(2);
    expect(usage.stderr).toContain("Try 'redox-cells --help'");

    const missing = await run([join(dir, "does-not-exist.csv"), "-m", "Fe"]);
    expect(missing.code).toBe(3);
    expect(missing.stderr).toContain("no such file");

    const malformed = join(dir, "malformed.csv");
    writeFileSync(malformed, 'pH,Eh_V,metal\n7,0.2,Fe\n"7,0.3,Fe\n');
    const m = await run([malformed, "-o", join(dir, "m-out.csv"), "--no-svg"]);
    expect(m.code).toBe(3);
    expect(m.stderr).toContain("line 3: a quoted field is not closed");

    const badCells = join(dir, "bad-cells.csv");
    writeFileSync(badCells, "pH,Eh (V),metal\n7,0.2,Fe\n7,oops,Fe\n");
    const bad = await run([badCells, "-o", join(dir, "bad-out.csv"), "--no-svg"]);
    expect(bad.code).toBe(1);
    expect(bad.stderr).toContain(`line 3, column "Eh (V)": expected a number, got the text "oops"`);
  });
});

// Units on the command line: °F and K temperature columns converted to °C (°F: (x − 32)·5/9; K: x − 273.15, the
// ITS-90 definitions — common practice), a bare Ag/AgCl header refused with the list of fillings, decimal commas
// with ";" and tab delimiters (detected, or forced), results in the input's delimiter and decimal mark, and a blank
// temperature as a missing measurement.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Writable } from "node:stream";
import { parse as parseSync } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { dicFromBicarbonateOrProblem } from "../../src/chemistry/alkalinity";
import { runCommand } from "../../src/cli/run";

class Capture extends Writable {
  text = "";
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
  dir = mkdtempSync(join(tmpdir(), "redox-cli-units-"));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const write = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

/** Runs a file and returns its result rows (objects by header) and the run. */
async function results(name: string, text: string, args: string[] = [], delimiter = ",") {
  const output = join(dir, `${name}-out.csv`);
  const r = await run([write(name, text), "-o", output, "--no-svg", "--quiet", "--full-precision", ...args]);
  const rows =
    r.code <= 1
      ? (parseSync(readFileSync(output, "utf8"), { columns: true, delimiter }) as Record<string, string>[])
      : [];
  return { r, rows, raw: r.code <= 1 ? readFileSync(output, "utf8") : "" };
}

const RESULTS = [
  "E_SHE_V",
  "water_margin_V",
  "metal_species",
  "metal_regime",
  "metal_boundary_above_V",
  "metal_boundary_below_V",
  "metal_dissolved_ug_L",
];
const resultsOf = (row: Record<string, string>) => RESULTS.map((c) => row[c]);

describe("temperature scales", () => {
  it("a °F column is converted: 59 °F gives the answers of 15 °C; 68 °F those of 20 °C", async () => {
    const celsius = await results("c.csv", "pH,ORP_mV_AgCl_sat,Temp (°C),metal\n7,200,15,Fe\n8,-300,20,Pb\n");
    const fahrenheit = await results("f.csv", "pH,ORP_mV_AgCl_sat,Temp (°F),metal\n7,200,59,Fe\n8,-300,68,Pb\n");
    expect(fahrenheit.r.code).toBe(0);
    expect(fahrenheit.rows.map(resultsOf)).toEqual(celsius.rows.map(resultsOf));
    // and not read as °C: 59 °C would move the reference electrode
    const hot = await results("hot.csv", "pH,ORP_mV_AgCl_sat,Temp (°C),metal\n7,200,59,Fe\n");
    expect(hot.rows[0].E_SHE_V).not.toBe(celsius.rows[0].E_SHE_V);
  });

  it("a kelvin column (T (K), temperature_K) is converted: 288.15 K gives the answers of 15 °C", async () => {
    const celsius = await results("c2.csv", "pH,ORP_mV_AgCl_sat,temp_C,metal\n7,200,15,Fe\n");
    for (const header of ["T (K)", "temperature_K", "Temperature kelvin"]) {
      const kelvin = await results("k.csv", `pH,ORP_mV_AgCl_sat,${header},metal\n7,200,288.15,Fe\n`);
      expect(kelvin.r.code, header).toBe(0);
      expect(
        resultsOf(kelvin.rows[0]).map((x) => (Number.isFinite(Number(x)) ? Number(Number(x).toPrecision(9)) : x)),
      ).toEqual(
        resultsOf(celsius.rows[0]).map((x) => (Number.isFinite(Number(x)) ? Number(Number(x).toPrecision(9)) : x)),
      );
    }
  });

  it("--temperature-unit overrides the header; an out-of-range converted value names the conversion", async () => {
    const forced = await results("forced.csv", "pH,ORP_mV_AgCl_sat,temp,metal\n7,200,59,Fe\n", [
      "--temperature-unit",
      "F",
    ]);
    const celsius = await results("c3.csv", "pH,ORP_mV_AgCl_sat,temp,metal\n7,200,15,Fe\n");
    expect(resultsOf(forced.rows[0])).toEqual(resultsOf(celsius.rows[0]));
    const hot = await results("hotf.csv", "pH,ORP_mV_AgCl_sat,Temp (°F),metal\n7,200,250,Fe\n");
    expect(hot.r.code).toBe(1);
    expect(hot.r.stderr).toContain("converted from the column's °F");
    expect((await run([write("x.csv", "pH\n7\n"), "--temperature-unit", "R"])).code).toBe(2);
  });
});

describe("reference electrode from the header", () => {
  it("a bare Ag/AgCl header is refused with the list of fillings; an explicit --electrode names one", async () => {
    const text = "pH,ORP (mV) vs Ag/AgCl,temp,metal\n7,200,15,Fe\n";
    const bare = await results("agcl.csv", text);
    expect(bare.r.code).toBe(2);
    expect(bare.r.stderr).toContain("names a silver chloride electrode but not its filling");
    for (const filling of ["AgCl-sat", "AgCl-3.5M", "AgCl-3M", "AgCl-1M", "AgCl-sea"])
      expect(bare.r.stderr).toContain(filling);
    const named = await results("agcl3.csv", text, ["--electrode", "AgCl-3M"]);
    expect(named.r.code).toBe(0);
    const sat = await results("agclsat.csv", text, ["--electrode", "AgCl-sat"]);
    // 3 M and saturated KCl fillings read apart (about 13 mV at 25 °C: Sawyer, Sobkowiak & Roberts 1995, table 5.3 — from memory)
    expect(Math.abs(Number(named.rows[0].E_SHE_V) - Number(sat.rows[0].E_SHE_V))).toBeGreaterThan(0.005);
    const ambiguousOption = await results("agcl4.csv", text, ["--electrode", "Ag/AgCl"]);
    expect(ambiguousOption.r.code).toBe(2);
    expect(ambiguousOption.r.stderr).toContain("AgCl-3M");
    // a header naming the filling needs no option
    expect((await results("agcl5.csv", "pH,ORP (mV) vs Ag/AgCl 3M,temp,metal\n7,200,15,Fe\n")).r.code).toBe(0);
  });
});

describe("decimal commas", () => {
  const point = "site,pH,ORP_mV_AgCl_sat,temp_C,metal\nA,7.25,201.5,15.5,Fe\nB,8.1,-120,20,Cu\n";
  const semicolon = "site;pH;ORP_mV_AgCl_sat;temp_C;metal\nA;7,25;201,5;15,5;Fe\nB;8,1;-120;20;Cu\n";

  it("';' with decimal commas is detected, read, and written back with ';' and decimal commas (round trip)", async () => {
    const reference = await results("point.csv", point);
    const comma = await results("semicolon.csv", semicolon, [], ";");
    expect(comma.r.code).toBe(0);
    expect(comma.raw.split("\n")[0]).toContain(";E_SHE_V;water_margin_V;");
    // the input columns are written back as they were
    expect(comma.raw.split("\n")[1].startsWith("A;7,25;201,5;15,5;Fe;")).toBe(true);
    const asPoint = (x: string) => x.replace(",", ".");
    expect(comma.rows.map((r) => resultsOf(r).map(asPoint))).toEqual(reference.rows.map(resultsOf));
    expect(comma.rows[0].E_SHE_V).toContain(",");
  });

  it("tab-separated with decimal commas likewise", async () => {
    const reference = await results("point2.csv", point);
    const tab = await results("tab.csv", semicolon.replace(/;/g, "\t"), [], "\t");
    expect(tab.r.code).toBe(0);
    expect(tab.rows.map((r) => resultsOf(r).map((x) => x.replace(",", ".")))).toEqual(reference.rows.map(resultsOf));
  });

  it("';' with decimal points stays with points; --decimal forces either", async () => {
    const points = await results("sc-point.csv", point.replace(/,/g, ";"), [], ";");
    expect(points.r.code).toBe(0);
    expect(points.rows[0].E_SHE_V).not.toContain(",");
    const forced = await results("sc-forced.csv", semicolon, ["--decimal", "point"], ";");
    expect(forced.r.code).toBe(1);
    expect(forced.r.stderr).toContain(`column "pH": expected a number, got the text "8,1"`);
    const forcedComma = await results(
      "sc-forced2.csv",
      "pH;ORP_mV_AgCl_sat;temp_C;metal\n7;200;15;Fe\n",
      ["--decimal", "comma"],
      ";",
    );
    expect(forcedComma.r.code).toBe(0);
    expect((await run([write("c.csv", point), "--decimal", "comma", "--delimiter", ","])).code).toBe(2);
  });
});

describe("a blank temperature is a missing measurement", () => {
  const text = "id,pH,ORP_mV_AgCl_sat,temp_C,metal\nA,7,200,15,Fe\nB,7,200,,Fe\n";

  it("leaves the row's results blank and reports it, unless --temperature gives a default", async () => {
    const missing = await results("missing.csv", text);
    expect(missing.r.code).toBe(0);
    expect(resultsOf(missing.rows[1]).every((c) => c === "")).toBe(true);
    expect(missing.r.stderr).toContain(`line 3, column "temp_C": blank: a missing measurement`);
    expect(missing.r.summary?.blankRows).toBe(1);
    const defaulted = await results("defaulted.csv", text, ["--temperature", "15"]);
    expect(resultsOf(defaulted.rows[1])).toEqual(resultsOf(defaulted.rows[0]));
  });
});

describe("the summary says which water every row was answered in", () => {
  const known = "id,pH,ORP_mV_AgCl_sat,temp_C,Alkalinity (mg/L CaCO3),Chloride (mg/L)\nA,7.2,215,12.5,120,25\n";
  // a Hungarian lab's headers: the program does not know them, so the rows are pure water, and the summary must say so
  const unknown = "Minta,pH,ORP_mV_AgCl_sat,temp_C,Lúgosság (mg/L CaCO3),Kloridion (mg/L)\nA,7.2,215,12.5,120,25\n";

  it("names the columns feeding each ligand, and says pure water when none was found or --pure-water is given", async () => {
    const water = async (name: string, text: string, args: string[] = []) =>
      (await results(name, text, ["--metal", "Fe", ...args])).r.summary?.notes?.find((n) => n.startsWith("water:"));
    expect(await water("known.csv", known)).toBe(
      'water: carbonate from "Alkalinity (mg/L CaCO3)" (alkalinity in mg/L as CaCO3, through REDOX.DIC with the ' +
        'row\'s pH and temperature); chloride from "Chloride (mg/L)" (chloride in mg/L)',
    );
    expect(await water("unknown.csv", unknown)).toMatch(
      /^water: pure water on every row; no alkalinity, DIC, chloride/,
    );
    expect(await water("named.csv", unknown, ["--alkalinity-column", "5"])).toMatch(
      /^water: carbonate from "Lúgosság \(mg\/L CaCO3\)"/,
    );
    expect(await water("pure.csv", known, ["--pure-water"])).toBe(
      "water: pure water on every row (--pure-water; the water columns are ignored)",
    );
  });
});

describe("European lab exports: headers in their own language", () => {
  // the same two samples, written as a German lab (semicolons, decimal commas, "KS 4,3" in mmol/L) and an English
  // one would write them; every answer must agree
  const english =
    "id,pH,ORP (mV vs Ag/AgCl 3 M),Temperature (°C),Alkalinity (meq/L),Chloride (mg/L),Sulfate (mg/L),Conductivity (µS/cm)\n" +
    "A,7.2,215,12.5,2.4,25,40,450\nB,8.1,-120,18.0,1.1,60,12,820\n";
  const german =
    "Probe;pH-Wert;Redoxpotential (mV, Ag/AgCl 3 M);Temperatur (°C);KS 4,3 (mmol/l);Chlorid (mg/l);Sulfat (mg/l);Leitfähigkeit (µS/cm)\n" +
    "A;7,2;215;12,5;2,4;25;40;450\nB;8,1;-120;18,0;1,1;60;12;820\n";
  const WATER = ["E_SHE_V", "DIC_mol_kg", "chloride_mol_kg", "sulfur_mol_kg", "ionic_strength_mol_kg"];
  const columns = (row: Record<string, string>) => [...WATER, ...RESULTS].map((c) => row[c]?.replace(",", "."));

  it("a German export is read as the English one: same potentials, water, ionic strength and answers", async () => {
    const en = await results("en.csv", english, ["--metal", "Fe"]);
    const de = await results("de.csv", german, ["--metal", "Fe"], ";");
    expect(de.r.code).toBe(0);
    expect(de.rows.map(columns)).toEqual(en.rows.map(columns));
    expect(de.rows[0].DIC_mol_kg).not.toBe(""); // the carbonate column was found (not pure water)
    expect(de.r.summary?.notes?.find((n) => n.startsWith("water:"))).toMatch(/carbonate from "KS 4,3 \(mmol\/l\)"/);
  });

  it("Polish and Swedish exports are read as the English one (mval/l and mmol/l alkalinity, mS/m conductivity)", async () => {
    const polish =
      "Próbka;pH;Potencjał redoks (mV, Ag/AgCl 3 M);Temperatura (°C);Zasadowość (mval/l);Chlorki (mg/l);Siarczany (mg/l);Przewodność (µS/cm)\n" +
      "A;7,2;215;12,5;2,4;25;40;450\nB;8,1;-120;18,0;1,1;60;12;820\n";
    // 450 µS/cm is 45 mS/m (1 mS/m = 10 µS/cm, SI prefixes)
    const swedish =
      "Prov;pH;Redoxpotential (mV, Ag/AgCl 3 M);Temperatur;Alkalinitet (mmol/l);Klorid (mg/l);Sulfat (mg/l);Konduktivitet (mS/m)\n" +
      "A;7,2;215;12,5;2,4;25;40;45\nB;8,1;-120;18,0;1,1;60;12;82\n";
    const en = await results("en-nordic.csv", english, ["--metal", "Fe"]);
    for (const [name, text] of [
      ["pl.csv", polish],
      ["sv.csv", swedish],
    ]) {
      const export_ = await results(name, text, ["--metal", "Fe"], ";");
      expect(export_.r.code, name).toBe(0);
      expect(export_.rows.map(columns), name).toEqual(en.rows.map(columns));
    }
  });

  it("French degrees: TAC 12 °f is 120 mg/L as CaCO3, the potential against ECS (SCE), not a °F temperature", async () => {
    const french =
      "Échantillon;pH;Potentiel redox (mV/ECS);Température (°C);TAC (°f);Chlorures (mg/L)\nA;7,2;215;12,5;12;25\n";
    const same = "id,pH,ORP (mV vs SCE),Temp (°C),Alkalinity (mg/L CaCO3),Chloride (mg/L)\nA,7.2,215,12.5,120,25\n";
    const fr = await results("fr.csv", french, ["--metal", "Fe"], ";");
    const en = await results("en-sce.csv", same, ["--metal", "Fe"]);
    expect(fr.r.code).toBe(0);
    expect(fr.rows.map(columns)).toEqual(en.rows.map(columns));
  });

  it('a German analysis reporting Hydrogencarbonat: DIC through REDOX.DIC with basis "bicarbonate"', async () => {
    const text =
      "Probe;pH-Wert;Redoxpotential (mV, Ag/AgCl 3 M);Temperatur (°C);Hydrogencarbonat (mg/l)\nA;7,4;180;11,0;183\n";
    const de = await results("hco3.csv", text, ["--metal", "Cu"], ";");
    expect(de.r.code).toBe(0);
    const expected = dicFromBicarbonateOrProblem(183, 7.4, 11) as number;
    expect(Number(de.rows[0].DIC_mol_kg.replace(",", "."))).toBeCloseTo(expected, 12);
    expect(de.r.summary?.notes?.find((n) => n.startsWith("water:"))).toMatch(
      /carbonate from "Hydrogencarbonat \(mg\/l\)" \(bicarbonate in mg\/L as HCO3, through REDOX.DIC .* basis "bicarbonate"\)/,
    );
  });
});

/**
 * One answer everywhere: every row of the invented demo log, for every metal of the database, gives the same
 * species, regime, E vs SHE, water margin and dissolved metal in the pane (sample-answers.ts with the plan the
 * pane builds from the headers), in the command line (its results CSV) and in the worksheet functions called on
 * that row alone with its own temperature and water (REDOX.DIC of its alkalinity, as a worksheet would chain it),
 * and — on a fixture log with a conductivity column — with each row's REDOX.IONICSTRENGTH as [ionicStrength].
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import { PassThrough } from "stream";
import { parse } from "csv-parse/sync";
import { getDatabase } from "../../src/chemistry/database";
import { runCommand } from "../../src/cli/run";
import { dicAt } from "../../src/functions/carbonate-functions";
import { toSHEAt } from "../../src/functions/electrode-functions";
import { dissolvedAt, regimeAt, speciesAt } from "../../src/functions/stability-functions";
import { waterMarginAt } from "../../src/functions/water-functions";
import { matchHeaders, matchWaterColumns } from "../../src/tables";
import { answerSamples, rowLigand, type RowLigand } from "../../src/taskpane/sample-answers";
import { findIonicColumn } from "../../src/taskpane/ionic-input";
import { ionicStrengthAt } from "../../src/functions/ionic-strength-functions";
import { tableFromText } from "../../src/taskpane/standalone-adapter";

const DEMO = join(__dirname, "../../data/demo/sample-log.csv");
const table = tableFromText(readFileSync(DEMO, "utf8"), "demo");
const metals = getDatabase().metals();
let dir: string;
let cli: Record<string, string>[];

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), "redox-answers-"));
  const output = join(dir, "results.csv");
  const streams = { stdout: new PassThrough(), stderr: new PassThrough() };
  const result = await runCommand(
    [DEMO, "--metal", metals.join(","), "--output", output, "--no-svg", "--dissolved-unit", "ug/L"],
    streams,
  );
  expect([0, 1]).toContain(result.code); // 1: some demo rows hold deliberately bad cells
  cli = parse(readFileSync(output, "utf8"), { columns: true, skip_empty_lines: true }) as Record<string, string>[];
}, 120_000);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

const cellOf = (v: unknown) =>
  typeof v === "number" ? v : typeof v === "string" && v.trim() !== "" && Number.isFinite(Number(v)) ? Number(v) : v;
/** Runs a fixture log through the command line; its exit code and result rows (objects by header). */
async function commandLineRows(name: string, text: string, args: string[], delimiter = ",") {
  const file = join(dir, `${name}.csv`);
  const output = join(dir, `${name}-results.csv`);
  writeFileSync(file, text);
  const result = await runCommand([file, "--output", output, "--no-svg", ...args], {
    stdout: new PassThrough(),
    stderr: new PassThrough(),
  });
  const lines = parse(readFileSync(output, "utf8"), { columns: true, skip_empty_lines: true, delimiter });
  return { code: result.code, lines: lines as Record<string, string>[] };
}

/** The pane's plan for a fixture with pH, E (V vs SHE) and °C in columns 1–3 and the given ligand columns. */
const fixturePlan = (metal: string, ligands: RowLigand[]) => ({
  metal,
  phColumn: 1,
  potentialColumn: 2,
  temperatureColumn: 3,
  temperatureUnit: "C" as const,
  celsius: 25,
  electrode: "SHE",
  unit: "V" as const,
  activity: 1e-6,
  ligands,
  typed: {},
});

const REGIMES = ["immunity", "passivation", "corrosion"];
const close = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));
/** The command line writes potentials to 0.1 mV and other numbers to four significant figures. */
const asWritten = (a: number, b: number) => Math.abs(a - b) <= Math.max(5e-5, 5e-4 * Math.abs(b));

describe("pane, command line and worksheet functions on every demo row", () => {
  const match = matchHeaders(table.headers);
  const m = match.mapping;
  const water = matchWaterColumns(table.headers, m);

  it("the demo log has the columns the comparison relies on", () => {
    expect(m.pH).toBeGreaterThanOrEqual(0);
    expect(m.temperature).toBeGreaterThanOrEqual(0);
    expect(water.alkalinity).toBeDefined();
    expect(cli.length).toBe(table.rows.length);
  });

  for (const metal of metals) {
    it(`${metal}: every row agrees`, () => {
      const answers = answerSamples(
        {
          metal,
          phColumn: m.pH,
          potentialColumn: m.potential,
          temperatureColumn: m.temperature,
          temperatureUnit: "C",
          celsius: 25,
          electrode: match.hints.electrode ?? "SHE",
          unit: match.hints.potentialUnit ?? "V",
          activity: 1e-6,
          ligands: [rowLigand("carbonate", water.alkalinity!)],
          typed: {},
        },
        table.rows,
      );
      let compared = 0;
      const differences: string[] = [];
      table.rows.forEach((row, r) => {
        const pane = answers[r];
        const line = cli[r];
        // the worksheet: this row alone, each argument a single cell
        const pH = cellOf(row[m.pH]) as number;
        const logged = cellOf(row[m.potential]);
        const reading = typeof logged === "number" ? logged / 1000 : (logged as string);
        const t = cellOf(row[m.temperature]) as number;
        const e = toSHEAt(reading, "AgCl-sat", t)[0][0];
        const dic = dicAt(cellOf(row[water.alkalinity!.index]) as number, pH, t)[0][0];
        const co3 = typeof dic === "number" ? dic : "";
        const sheet = {
          species: speciesAt(metal, pH, e as number, t, 1e-6, co3)[0][0],
          regime: regimeAt(metal, pH, e as number, t, 1e-6, co3)[0][0],
          margin: waterMarginAt(pH, e as number, t)[0][0],
          dissolved: dissolvedAt(
            metal,
            pH,
            e as number,
            t,
            co3,
            undefined,
            undefined,
            undefined,
            undefined,
            "ug/L",
          )[0][0],
        };
        if (cellOf(row[m.temperature]) === "") {
          // a blank temperature in a column is a missing measurement: no answer in the pane or the command line
          // (a worksheet cell given alone would be an omitted argument instead, so the sheet is not asked)
          if (!("error" in pane) || REGIMES.includes(line[`${metal}_regime`]))
            differences.push(`row ${table.rowNumbers[r]}: blank temperature answered`);
          return;
        }
        if ("error" in pane) {
          // a row the pane does not draw has no answer in the sheet or the command line either
          if (REGIMES.includes(line[`${metal}_regime`]) || REGIMES.includes(String(sheet.regime)))
            differences.push(
              `row ${table.rowNumbers[r]}: pane error ${pane.error}, command line ${line[`${metal}_regime`]}`,
            );
          return;
        }
        const same =
          pane.species === sheet.species &&
          pane.species === line[`${metal}_species`] &&
          pane.regime === sheet.regime &&
          pane.regime === line[`${metal}_regime`] &&
          typeof e === "number" &&
          close(pane.eSHE, e) &&
          asWritten(pane.eSHE, Number(line.E_SHE_V)) &&
          close(pane.margin, sheet.margin as number) &&
          asWritten(pane.margin, Number(line.water_margin_V)) &&
          (pane.dissolved === null
            ? typeof sheet.dissolved !== "number" && Number.isNaN(Number(line[`${metal}_dissolved_ug_L`]))
            : close(pane.dissolved, sheet.dissolved as number) &&
              asWritten(pane.dissolved, Number(line[`${metal}_dissolved_ug_L`])));
        if (!same)
          differences.push(
            `row ${table.rowNumbers[r]}: pane ${pane.species}/${pane.regime}, sheet ${String(sheet.species)}/${String(sheet.regime)}, command line ${line[`${metal}_species`]}/${line[`${metal}_regime`]}`,
          );
        compared++;
      });
      expect(differences).toEqual([]);
      expect(compared).toBeGreaterThan(table.rows.length - 12);
    });
  }
});

describe("a log with a measured DIC column", () => {
  it("pane and command line read the DIC column alike (mmol/L) and give the same answers", async () => {
    const text = [
      "site,pH,Eh (V),Temp C,DIC (mmol/L)",
      "A,6.8,0.35,12,1.9",
      "B,7.9,0.42,18,3.2",
      "C,8.6,-0.1,9,0.6",
      "D,7.2,0.05,15,",
      "E,6.2,0.55,22,4.4",
    ].join("\n");
    const { code, lines } = await commandLineRows("dic", text, ["--metal", "Cu,Pb,Fe"]);
    expect(code).toBe(0);
    const t = tableFromText(text, "dic");
    const headers = t.headers as string[];
    const dic = matchWaterColumns(headers, matchHeaders(headers).mapping).dic!;
    expect(dic.index).toBe(4);
    for (const metal of ["Cu", "Pb", "Fe"]) {
      const answers = answerSamples(fixturePlan(metal, [rowLigand("carbonate", dic)]), t.rows);
      answers.forEach((a, r) => {
        expect("error" in a ? a.error : `${a.species}/${a.regime}`, `${metal} row ${r}`).toBe(
          `${lines[r][`${metal}_species`]}/${lines[r][`${metal}_regime`]}`,
        );
      });
    }
  });
});

describe("a log with a conductivity column (fixture, invented)", () => {
  // I ≈ 1.6e-5 × specific conductance in µS/cm (Russell, L.L., Chemistry of oilfield waters, 1976), through
  // REDOX.IONICSTRENGTH; the demo log has no conductivity column, so a fixture stands in for it.
  it("pane, command line and worksheet functions give the same answers with each row's ionic strength", async () => {
    const text = [
      "site,pH,Eh (V),Temp C,Alkalinity (mg/L CaCO3),Conductivity (µS/cm)",
      "A,7.0,-0.307,25,40,1000",
      "B,7.0,-0.307,25,40,",
      "C,7.9,0.42,18,120,650",
      "D,6.4,0.12,12,25,180",
      "E,8.3,-0.25,9,90,2400",
      "F,7.0,-0.307,25,40,40000",
    ].join("\n");
    const { code, lines } = await commandLineRows("cond", text, ["--metal", "Cu,Pb,Fe,Zn"]);
    expect(code).toBe(1); // row F: 40 000 µS/cm is above the Davies equation's 0.5 mol/kg
    const t = tableFromText(text, "cond");
    const headers = t.headers as string[];
    const m = matchHeaders(headers).mapping;
    const alkalinity = matchWaterColumns(headers, m).alkalinity!;
    const ionic = findIonicColumn(headers, [m.pH, m.potential, m.temperature, alkalinity.index], t.rows)!;
    expect(ionic).toEqual({ role: "conductivity", index: 5, unit: "uS/cm" });
    let changed = 0;
    for (const metal of ["Cu", "Pb", "Fe", "Zn"]) {
      const plan = fixturePlan(metal, [rowLigand("carbonate", alkalinity)]);
      const answers = answerSamples({ ...plan, ionic }, t.rows);
      const ideal = answerSamples(plan, t.rows);
      answers.forEach((a, r) => {
        const line = lines[r];
        expect("error" in a ? "#VALUE!" : `${a.species}/${a.regime}`, `${metal} row ${r}`).toBe(
          `${line[`${metal}_species`]}/${line[`${metal}_regime`]}`.replace("#VALUE!/#VALUE!", "#VALUE!"),
        );
        if ("error" in a) return;
        // the worksheet: this row alone, REDOX.IONICSTRENGTH of its conductivity in [ionicStrength]
        const row = t.rows[r].map(cellOf);
        const I = row[5] === "" ? "" : ionicStrengthAt(row[5] as number, "uS/cm")[0][0];
        const co3 = dicAt(row[4] as number, row[1] as number, row[3] as number)[0][0] as number;
        const sheet = speciesAt(
          metal,
          row[1] as number,
          row[2] as number,
          row[3] as number,
          1e-6,
          co3,
          undefined,
          undefined,
          undefined,
          I as number,
        )[0][0];
        expect(a.species, `${metal} row ${r} sheet`).toBe(sheet);
        expect(a.ionicStrength === null ? "" : a.ionicStrength).toBe(I === "" ? "" : I);
        if (a.ionicStrength !== null) expect(Number(line.ionic_strength_mol_kg)).toBeCloseTo(a.ionicStrength, 6);
        const b = ideal[r];
        if (!("error" in b) && b.species !== a.species) changed++;
      });
    }
    // near the Pb2+/Pb boundary (rows A) the correction changes lead's answer; row B (blank) stays ideal
    expect(changed).toBeGreaterThan(0);
  });
});

describe("a log reporting bicarbonate instead of alkalinity (fixture, invented)", () => {
  it('pane, command line and worksheet functions agree: DIC through REDOX.DIC(…, "bicarbonate")', async () => {
    const text = [
      "Messstelle;pH-Wert;Eh (V);Temperatur (°C);Hydrogencarbonat (mg/l)",
      "A;7,4;-0,05;11;183",
      "B;8,2;0,35;9;250",
      "C;6,9;0,1;14;60",
    ].join("\n");
    const { code, lines } = await commandLineRows("hco3", text, ["--metal", "Cu,Pb", "--full-precision"], ";");
    expect(code).toBe(0);
    const t = tableFromText(text, "hco3");
    const headers = t.headers as string[];
    const m = matchHeaders(headers).mapping;
    const carbonate = matchWaterColumns(headers, m).alkalinity!;
    expect(carbonate).toEqual({ index: 4, unit: "mg/L HCO3" });
    for (const metal of ["Cu", "Pb"]) {
      const plan = fixturePlan(metal, [rowLigand("carbonate", carbonate)]);
      answerSamples(plan, t.rows).forEach((a, r) => {
        const row = t.rows[r].map(Number); // the pasted table holds numbers, its decimal commas read
        const co3 = dicAt(row[4], row[1], row[3], "bicarbonate")[0][0] as number;
        expect(Number(lines[r].DIC_mol_kg.replace(",", "."))).toBeCloseTo(co3, 12);
        const sheet = speciesAt(metal, row[1], row[2], row[3], 1e-6, co3)[0][0];
        expect("error" in a ? a.error : a.species, `${metal} row ${r}`).toBe(sheet);
        if (!("error" in a)) expect(a.water.carbonate).toBeCloseTo(co3, 15); // the total the pane passed
        expect(lines[r][`${metal}_species`]).toBe(sheet);
      });
    }
  });
});

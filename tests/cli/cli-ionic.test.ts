// Ionic strength on the command line: a conductivity, TDS or ionic-strength column feeds [ionicStrength] row by row
// (conductivity and TDS through REDOX.IONICSTRENGTH: I ≈ 1.6e-5 × µS/cm, Russell, L.L., Chemistry of oilfield
// waters, 1976; I ≈ 2.5e-5 × mg/L, Langelier, W.F., J. AWWA 28, 1500, 1936), the order in which columns win, the
// --ionic-strength and --ideal options, blank cells answered without the correction, and #VALUE! above 0.5 mol/kg.
//
// The test point: lead at pH 7, 25 °C, Eh −0.307 V. The functions put the Pb2+/Pb boundary at −0.3041 V ideal and at
// −0.3106 V at I = 0.016 mol/kg (Davies: the lower Pb2+ activity coefficient widens the metal's field downward), so
// the point is in the metal's field without the correction and in Pb2+'s with it. Both are checked against the
// worksheet functions called directly, so the file and a worksheet agree.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Writable } from "node:stream";
import { parse as parseSync } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runCommand } from "../../src/cli/run";
import { ionicStrengthAt } from "../../src/functions/ionic-strength-functions";
import { boundaryFrom, speciesAt } from "../../src/functions/stability-functions";

class Capture extends Writable {
  text = "";
  override _write(chunk: Buffer | string, _enc: BufferEncoding, done: () => void): void {
    this.text += chunk.toString();
    done();
  }
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "redox-cli-ionic-"));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

async function results(name: string, text: string, args: string[] = []) {
  const input = join(dir, name);
  writeFileSync(input, text);
  const output = join(dir, `${name}-out.csv`);
  const stdout = new Capture();
  const stderr = new Capture();
  const r = await runCommand([input, "-o", output, "--no-svg", "--full-precision", ...args], { stdout, stderr });
  const rows =
    r.code <= 1 ? (parseSync(readFileSync(output, "utf8"), { columns: true }) as Record<string, string>[]) : [];
  return { code: r.code, rows, stdout: stdout.text, stderr: stderr.text };
}

const E = -0.307;
const direct = (I: number | string) =>
  speciesAt("Pb", 7, E, 25, 1e-6, undefined, undefined, undefined, undefined, I)[0][0];

describe("the test point sits between the ideal and the corrected boundary", () => {
  it("the boundary below Pb2+ at pH 7 is above the point ideal and below it at I = 0.016 (the worksheet functions)", () => {
    const ideal = boundaryFrom("Pb", 7, 0, 25, 1e-6, undefined, undefined, undefined, undefined, 0, -1)[0][0] as number;
    const corrected = boundaryFrom(
      "Pb",
      7,
      0,
      25,
      1e-6,
      undefined,
      undefined,
      undefined,
      undefined,
      0.016,
      -1,
    )[0][0] as number;
    expect(typeof ideal).toBe("number");
    expect(ideal).toBeGreaterThan(E); // ideal: the point is below the boundary, in the metal's field
    expect(corrected).toBeLessThan(E);
    expect(direct(0)).toBe("Pb(s)");
    expect(direct(0.016)).toBe("Pb2+");
  });
});

describe("a conductivity column changes the answer near a boundary", () => {
  const file = "pH,Eh (V),Conductivity (µS/cm),metal\n7,-0.307,1000,Pb\n7,-0.307,,Pb\n7,-0.307,40000,Pb\n";

  it("1000 µS/cm → I = 0.016 mol/kg → Pb2+; a blank cell → no correction (Pb(s)), reported; 40 000 µS/cm → #VALUE!", async () => {
    const { code, rows, stdout, stderr } = await results("cond.csv", file);
    expect(code).toBe(1); // the 40 000 µS/cm row is a bad cell
    expect(Number(rows[0].ionic_strength_mol_kg)).toBeCloseTo(0.016, 12);
    expect(rows[0].metal_species).toBe("Pb2+");
    expect(rows[0].metal_species).toBe(direct(ionicStrengthAt(1000, "uS/cm")[0][0] as number));
    expect(rows[1].ionic_strength_mol_kg).toBe("");
    expect(rows[1].metal_species).toBe("Pb(s)");
    expect(stderr).toMatch(
      /Conductivity \(µS\/cm\).*blank; this row is evaluated without the ionic-strength correction/,
    );
    expect(rows[2].ionic_strength_mol_kg).toBe("#VALUE!");
    expect(rows[2].metal_species).toBe("#VALUE!");
    expect(rows[2].errors).toMatch(
      /^Conductivity \(µS\/cm\): 40000 uS\/cm gives I = 0\.640 mol\/kg, above the 0\.5 mol\/kg/,
    );
    expect(stdout).toMatch(
      /ionic strength: from "Conductivity \(µS\/cm\)" \(specific conductance in µS\/cm; REDOX\.IONICSTRENGTH\(value, "uS\/cm"\), Russell 1976\)/,
    );
  });

  it("mS/cm is × 1000; TDS 640 mg/L (Langelier: 0.016 mol/kg) and a stated I give the same answer", async () => {
    for (const [header, value] of [
      ["EC (mS/cm)", "1"],
      ["TDS (mg/L)", "640"],
      ["TDS (g/L)", "0.64"],
      ["Ionic strength (mol/L)", "0.016"],
    ]) {
      const { rows } = await results("units.csv", `pH,Eh (V),${header},metal\n7,-0.307,${value},Pb\n`);
      expect(Number(rows[0].ionic_strength_mol_kg), header).toBeCloseTo(0.016, 12);
      expect(rows[0].metal_species, header).toBe("Pb2+");
    }
  });

  it("several columns: a stated I wins over conductivity, which wins over TDS; the summary names the others", async () => {
    const both = await results("both.csv", "pH,Eh (V),TDS (mg/L),SC (uS/cm),metal\n7,-0.307,10,1000,Pb\n");
    expect(both.rows[0].metal_species).toBe("Pb2+");
    expect(both.stdout).toMatch(/from "SC \(uS\/cm\)".*not used: "TDS \(mg\/L\)"/);
    const stated = await results("stated.csv", "pH,Eh (V),SC (uS/cm),I (mol/kg),metal\n7,-0.307,1000,0.0001,Pb\n");
    expect(Number(stated.rows[0].ionic_strength_mol_kg)).toBe(0.0001);
    expect(stated.rows[0].metal_species).toBe("Pb(s)");
  });

  it("--ideal ignores the columns; --ionic-strength fixes every row; both at once is refused", async () => {
    const ideal = await results("ideal.csv", file, ["--ideal"]);
    expect(ideal.rows.map((r) => r.metal_species)).toEqual(["Pb(s)", "Pb(s)", "Pb(s)"]);
    expect(ideal.rows[0].ionic_strength_mol_kg).toBeUndefined();
    expect(ideal.stdout).toMatch(/ionic strength: none, ideal solution \(--ideal\); not used: "Conductivity/);
    const fixed = await results("fixed.csv", "pH,Eh (V),metal\n7,-0.307,Pb\n", ["--ionic-strength", "0.016"]);
    expect(fixed.rows[0].ionic_strength_mol_kg).toBe("0.016");
    expect(fixed.rows[0].metal_species).toBe("Pb2+");
    const both = await results("contradict.csv", file, ["--ideal", "--ionic-strength", "0.01"]);
    expect(both.code).toBe(2);
    expect(both.stderr).toMatch(/--ideal and --ionic-strength/);
    const high = await results("high.csv", file, ["--ionic-strength", "0.7"]);
    expect(high.code).toBe(2);
    expect(high.stderr).toMatch(/--ionic-strength: expected an ionic strength from 0 to 0.5 mol\/kg/);
  });

  it("a stated ionic strength above 0.5 mol/kg is the functions' #VALUE! for that row", async () => {
    const { code, rows } = await results(
      "above.csv",
      "pH,Eh (V),Ionic strength (mol/kg),metal\n7,-0.307,0.8,Pb\n7,-0.307,0.016,Pb\n",
    );
    expect(code).toBe(1);
    expect(rows[0].metal_species).toBe("#VALUE!");
    expect(rows[0].errors).toMatch(/^Ionic strength \(mol\/kg\):/);
    expect(rows[1].metal_species).toBe("Pb2+");
  });
});

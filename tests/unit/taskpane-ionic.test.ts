// The pane's ionic strength per sample agrees with the command line and the worksheet functions on the same rows:
// the column found by header (text columns never taken), the [ionicStrength] argument built the same way
// (REDOX.IONICSTRENGTH: I ≈ 1.6e-5 × µS/cm, Russell, L.L., Chemistry of oilfield waters, 1976; I ≈ 2.5e-5 × mg/L
// TDS, Langelier, W.F., J. AWWA 28, 1500, 1936), and each row's REDOX.SPECIES and REGIME with it. Fixture rows
// (invented): lead at pH 7 near the Pb2+/Pb boundary, where 1000 µS/cm changes the answer.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Writable } from "node:stream";
import { parse as parseSync } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { runCommand } from "../../src/cli/run";
import { regimeAt, speciesAt } from "../../src/functions/stability-functions";
import { findIonicColumn, ionicArgumentFor, ionicCaption, ionicHover } from "../../src/taskpane/ionic-input";

class Capture extends Writable {
  text = "";
  override _write(chunk: Buffer | string, _enc: BufferEncoding, done: () => void): void {
    this.text += chunk.toString();
    done();
  }
}

const HEADERS = ["Sample", "pH", "Eh (V)", "Conductivity note", "Conductivity (mS/cm)", "TDS (mg/L)", "metal"];
const ROWS: unknown[][] = [
  ["A-1", 7, -0.307, "probe 2", 1.0, 600, "Pb"],
  ["A-2", 7, -0.307, "", "", 600, "Pb"],
  ["A-3", 7.5, -0.2, "re-read", 0.35, 210, "Pb"],
  ["A-4", 6.8, 0.1, "", "0,8", 500, "Cu"],
  ["A-5", 7, -0.307, "", 40, 600, "Pb"],
];

describe("pane: ionic strength per sample", () => {
  it("finds the conductivity column (conductivity wins over TDS; the text column is skipped)", () => {
    const column = findIonicColumn(HEADERS, [0, 1, 2, 6], ROWS);
    expect(column).toEqual({ role: "conductivity", index: 4, unit: "mS/cm" });
    // a header that reads like conductivity but holds text is never a source
    const textual = findIonicColumn(
      ["pH", "Eh", "EC"],
      [0, 1],
      [
        [7, 0, "high"],
        [7, 0, "low"],
      ],
    );
    expect(textual).toBeNull();
  });

  it("gives each row's species and regime the command line gives, and the functions with the same I", async () => {
    const column = findIonicColumn(HEADERS, [0, 1, 2, 6], ROWS)!;
    const ionic = ionicArgumentFor(column, ROWS);
    const used = ionic.cells.map(([c]) => c);
    // 1 mS/cm = 1000 µS/cm → 0.016 mol/kg (Russell 1976); blank → ""; 40 mS/cm → 0.64 mol/kg, above 0.5 → #VALUE!
    expect(used[0]).toBeCloseTo(0.016, 12);
    expect(used[1]).toBe("");
    expect(used[2]).toBeCloseTo(0.0056, 12);
    expect(used[3]).toBeCloseTo(0.0128, 12);
    expect(ionic.errors[4]?.code).toBe("#VALUE!");

    const col = (i: number) => ROWS.map((r) => [r[i] as number | string]);
    const pane = {
      species: speciesAt(
        col(6),
        col(1),
        col(2),
        25,
        1e-6,
        undefined,
        undefined,
        undefined,
        undefined,
        ionic.argument,
      ).map(([s], r) => ionic.errors[r]?.code ?? s),
      regime: regimeAt(
        col(6),
        col(1),
        col(2),
        25,
        1e-6,
        undefined,
        undefined,
        undefined,
        undefined,
        ionic.argument,
      ).map(([s], r) => ionic.errors[r]?.code ?? s),
    };
    expect(pane.species[0]).toBe("Pb2+");
    expect(pane.species[1]).toBe("Pb(s)");

    // the worksheet functions, one row at a time, with the ionic strength the pane used
    ROWS.forEach((row, r) => {
      if (ionic.errors[r]) return;
      const I = used[r] === "" ? undefined : (used[r] as number);
      expect(pane.species[r]).toBe(
        speciesAt(
          row[6] as string,
          row[1] as number,
          row[2] as number,
          25,
          1e-6,
          undefined,
          undefined,
          undefined,
          undefined,
          I,
        )[0][0],
      );
    });

    // the command line on the same rows (the comma in "0,8" quoted as a field of a point-decimal file)
    const dir = mkdtempSync(join(tmpdir(), "redox-pane-ionic-"));
    try {
      const csv = [
        HEADERS.join(","),
        ...ROWS.map((r) =>
          r.map((c) => (String(c).includes(",") ? `"${String(c).replace(",", ".")}"` : String(c))).join(","),
        ),
      ].join("\n");
      writeFileSync(join(dir, "log.csv"), csv + "\n");
      const out = join(dir, "out.csv");
      await runCommand([join(dir, "log.csv"), "-o", out, "--no-svg", "--quiet", "--full-precision"], {
        stdout: new Capture(),
        stderr: new Capture(),
      });
      const cli = parseSync(readFileSync(out, "utf8"), { columns: true }) as Record<string, string>[];
      expect(cli.map((row) => row.metal_species)).toEqual(pane.species);
      expect(cli.map((row) => row.metal_regime)).toEqual(pane.regime);
      cli.forEach((row, r) => {
        if (typeof used[r] === "number") expect(Number(row.ionic_strength_mol_kg)).toBe(used[r]);
      });
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it("says where the ionic strength comes from in the caption and the hover", () => {
    const column = findIonicColumn(HEADERS, [0, 1, 2, 6], ROWS)!;
    const ionic = ionicArgumentFor(column, ROWS);
    const caption = ionicCaption(HEADERS[column.index], column, ionic);
    expect(caption).toMatch(
      /^Ionic strength: each sample's own from "Conductivity \(mS\/cm\)" \(mS\/cm, REDOX\.IONICSTRENGTH from specific conductance, Russell 1976\), median 0\.0128 mol\/kg/,
    );
    expect(caption).toMatch(/1 blank row answered without the correction/);
    expect(ionicHover(ionic.cells[0][0])).toBe("I 0.016 mol/kg");
    expect(ionicHover("")).toBe("");
  });
});

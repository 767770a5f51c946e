/**
 * The built standalone pane, 350 px wide, with a German lab export pasted as it leaves the spreadsheet: semicolons,
 * decimal commas, German headers, the redox reading in mV against Ag/AgCl (3 M KCl) and bicarbonate
 * ("Hydrogencarbonat") instead of alkalinity. Every row must be drawn, the carbonate read from the bicarbonate
 * column, and every marker's regime equal REDOX.REGIME of its row with DIC from REDOX.DIC(…, "bicarbonate").
 * The log is invented (a fictional utility's taps), made for this test.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { OpenPane, openStandalonePane } from "../../test-support/serve-dist";
import { toSHE } from "../../src/chemistry/electrodes";
import { regimeAt } from "../../src/functions/stability-functions";
import { dicAt } from "../../src/functions/carbonate-functions";

/** Invented rows: site, pH, reading (mV vs Ag/AgCl 3 M), °C, HCO3− mg/L. */
const ROWS: readonly (readonly [string, string, string, string, string])[] = [
  ["Hochbehälter Nord", "7,42", "185", "10,5", "183"],
  ["Zapfstelle 3", "7,05", "240", "14,2", "98"],
  ["Zapfstelle 7", "8,12", "-60", "12,0", "244"],
  ["Ortsnetz Süd", "6,85", "310", "16,8", "61"],
  ["Brunnen 2", "7,66", "-210", "9,1", "305"],
];
const TEXT = [
  "Messstelle;pH-Wert;Redoxpotential (mV, Ag/AgCl 3 M);Temperatur (°C);Hydrogencarbonat (mg/l)",
  ...ROWS.map((r) => r.join(";")),
].join("\n");
const comma = (text: string) => Number(text.replace(",", "."));

let pane: OpenPane;
let page: Page;

beforeAll(async () => {
  pane = await openStandalonePane();
  page = pane.page;
  await page.setViewportSize({ width: 350, height: 900 });
  await page.click("#paste-details summary");
  await page.fill("#paste-input", TEXT);
  await page.click("#draw-pasted");
  await page.waitForSelector("#diagram .rc-sample");
  await page.selectOption("#metal", "Cu");
  await page.waitForFunction(() => /Copper/.test(document.querySelector("#diagram-title")?.textContent ?? ""));
});

afterAll(async () => {
  await pane?.close();
});

describe("a German lab export pasted into the pane at 350 px", () => {
  it("reads the reading's unit and electrode from the header and the carbonate from the bicarbonate column", async () => {
    const setting = await page.evaluate(() => ({
      unit: (document.getElementById("unit") as HTMLSelectElement).value,
      electrode: (document.getElementById("electrode") as HTMLSelectElement).value,
      carbonate: (document.getElementById("carbonate-source") as HTMLSelectElement).selectedOptions[0]?.textContent,
    }));
    expect(setting).toMatchObject({ unit: "mV", electrode: "AgCl-3M" });
    expect(setting.carbonate).toBe("from the bicarbonate column “Hydrogencarbonat (mg/l)” (mg/L as HCO3)");
    expect(await page.textContent("#diagram-caption")).toMatch(
      /DIC is the median of the rows' totals from their bicarbonate/,
    );
  });

  it("draws every row, each marker's regime that of REDOX.REGIME with its DIC from its bicarbonate", async () => {
    const activity = await page.evaluate(() => Number((document.getElementById("activity") as HTMLInputElement).value));
    const markers = await page.$$eval("#diagram .rc-sample", (nodes) =>
      nodes.map((n) => ({ row: Number(n.getAttribute("data-row")), regime: n.getAttribute("data-regime") })),
    );
    expect(markers.map((m) => m.row).sort((a, b) => a - b)).toEqual([2, 3, 4, 5, 6]); // the text's line numbers
    let withCarbonateChanged = 0;
    for (const m of markers) {
      const [, pHText, mV, celsiusText, hco3] = ROWS[m.row - 2];
      const pH = comma(pHText);
      const t = comma(celsiusText);
      const eSHE = toSHE(Number(mV) / 1000, "AgCl-3M", t);
      const dic = dicAt(Number(hco3), pH, t, "bicarbonate")[0][0] as number;
      const regime = regimeAt("Cu", pH, eSHE, t, activity, dic)[0][0];
      expect(m.regime, `row ${m.row}`).toBe(regime);
      if (regimeAt("Cu", pH, eSHE, t, activity)[0][0] !== regime) withCarbonateChanged++;
    }
    // the rows' water matters to at least one answer (else the test would not see a lost carbonate)
    expect(withCarbonateChanged).toBeGreaterThan(0);
  });
});

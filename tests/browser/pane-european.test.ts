/**
 * The built standalone pane, 350 px wide, with a German lab export pasted as it leaves the spreadsheet: semicolons,
 * decimal commas, German headers, the redox reading in mV against Ag/AgCl (3 M KCl) and bicarbonate
 * ("Hydrogencarbonat") instead of alkalinity. Every row must be drawn, the carbonate read from the bicarbonate
 * column, and every marker's regime equal REDOX.REGIME of its row with DIC from REDOX.DIC(…, "bicarbonate").
 * A Polish export the same way: its headers, alkalinity in mval/l and a saturated Ag/AgCl electrode named in Polish.
 * The logs are invented (a fictional utility's taps), made for this test.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { OpenPane, openStandalonePane } from "../../test-support/serve-dist";
import { toSHE } from "../../src/chemistry/electrodes";
import { regimeAt } from "../../src/functions/stability-functions";
import { dicAt } from "../../src/functions/carbonate-functions";
import { alkalinityFactor } from "../../src/tables";

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

/** The standalone pane at 350 px with `text` pasted and drawn for `metal`. */
async function pastedPane(text: string, metal: string, title: RegExp): Promise<OpenPane> {
  const opened = await openStandalonePane();
  const page = opened.page;
  await page.setViewportSize({ width: 350, height: 900 });
  await page.click("#paste-details summary");
  await page.fill("#paste-input", text);
  await page.click("#draw-pasted");
  await page.waitForSelector("#diagram .rc-sample");
  await page.selectOption("#metal", metal);
  await page.waitForFunction(
    (t) => new RegExp(t).test(document.querySelector("#diagram-title")?.textContent ?? ""),
    title.source,
  );
  return opened;
}

/** The pane's unit, electrode and carbonate source as its menus show them. */
const settingsOf = (page: Page) =>
  page.evaluate(() => ({
    unit: (document.getElementById("unit") as HTMLSelectElement).value,
    electrode: (document.getElementById("electrode") as HTMLSelectElement).value,
    carbonate: (document.getElementById("carbonate-source") as HTMLSelectElement).selectedOptions[0]?.textContent,
  }));

/**
 * Every row drawn (lines 2… of the text), each marker's regime that `regimeOf` gives for its row with and without
 * its carbonate; the rows' water must change at least one answer (else a lost carbonate would go unseen).
 */
async function expectMarkersAgree(
  page: Page,
  rows: number,
  regimeOf: (row: number, activity: number, withCarbonate: boolean) => unknown,
): Promise<void> {
  const activity = await page.evaluate(() => Number((document.getElementById("activity") as HTMLInputElement).value));
  const markers = await page.$$eval("#diagram .rc-sample", (nodes) =>
    nodes.map((n) => ({ row: Number(n.getAttribute("data-row")), regime: n.getAttribute("data-regime") })),
  );
  expect(markers.map((m) => m.row).sort((a, b) => a - b)).toEqual(Array.from({ length: rows }, (_, i) => i + 2));
  let withCarbonateChanged = 0;
  for (const m of markers) {
    const regime = regimeOf(m.row - 2, activity, true);
    expect(m.regime, `row ${m.row}`).toBe(regime);
    if (regimeOf(m.row - 2, activity, false) !== regime) withCarbonateChanged++;
  }
  expect(withCarbonateChanged).toBeGreaterThan(0);
}

describe("a German lab export pasted into the pane at 350 px", () => {
  let pane: OpenPane;
  beforeAll(async () => {
    pane = await pastedPane(TEXT, "Cu", /Copper/);
  });
  afterAll(async () => {
    await pane?.close();
  });

  it("reads the reading's unit and electrode from the header and the carbonate from the bicarbonate column", async () => {
    const setting = await settingsOf(pane.page);
    expect(setting).toMatchObject({ unit: "mV", electrode: "AgCl-3M" });
    expect(setting.carbonate).toBe("from the bicarbonate column “Hydrogencarbonat (mg/l)” (mg/L as HCO3)");
    expect(await pane.page.textContent("#diagram-caption")).toMatch(
      /DIC is the median of the rows' totals from their bicarbonate/,
    );
  });

  it("draws every row, each marker's regime that of REDOX.REGIME with its DIC from its bicarbonate", async () => {
    await expectMarkersAgree(pane.page, ROWS.length, (r, activity, withCarbonate) => {
      const [, pHText, mV, celsiusText, hco3] = ROWS[r];
      const pH = comma(pHText);
      const t = comma(celsiusText);
      const eSHE = toSHE(Number(mV) / 1000, "AgCl-3M", t);
      const dic = dicAt(Number(hco3), pH, t, "bicarbonate")[0][0] as number;
      return regimeAt("Cu", pH, eSHE, t, activity, withCarbonate ? dic : undefined)[0][0];
    });
  });
});

/** Invented rows: site, pH, reading (mV vs Ag/AgCl, saturated KCl), °C, total alkalinity mval/l (= meq/L). */
const POLISH_ROWS: readonly (readonly [string, string, string, string, string])[] = [
  ["Zbiornik Północ", "7,38", "160", "11,0", "3,2"],
  ["Kran 4", "7,10", "215", "13,5", "1,6"],
  ["Kran 9", "8,05", "-80", "12,4", "4,1"],
  ["Sieć Południe", "6,90", "290", "17,2", "0,9"],
  ["Studnia 1", "7,70", "-190", "9,6", "5,0"],
];
const POLISH_TEXT = [
  "Punkt poboru;pH;Potencjał redoks (mV, Ag/AgCl nasycony);Temperatura (°C);Zasadowość (mval/l)",
  ...POLISH_ROWS.map((r) => r.join(";")),
].join("\n");

describe("a Polish lab export pasted into the pane at 350 px", () => {
  let pane: OpenPane;
  beforeAll(async () => {
    pane = await pastedPane(POLISH_TEXT, "Cu", /Copper/);
  });
  afterAll(async () => {
    await pane?.close();
  });

  it("reads mV, the saturated Ag/AgCl electrode (nasycony) and the alkalinity in mval/l from the headers", async () => {
    const setting = await settingsOf(pane.page);
    expect(setting).toMatchObject({ unit: "mV", electrode: "AgCl-sat" });
    expect(setting.carbonate).toBe("from the alkalinity column “Zasadowość (mval/l)” (meq/L)");
  });

  it("draws every row, each marker's regime that of REDOX.REGIME with its DIC from its alkalinity", async () => {
    await expectMarkersAgree(pane.page, POLISH_ROWS.length, (r, activity, withCarbonate) => {
      const [, pHText, mV, celsiusText, alkalinity] = POLISH_ROWS[r];
      const pH = comma(pHText);
      const t = comma(celsiusText);
      const eSHE = toSHE(Number(mV) / 1000, "AgCl-sat", t);
      const asCaCO3 = comma(alkalinity) * alkalinityFactor("meq/L"); // mg/L as CaCO3, the pane's own factor
      const dic = dicAt(asCaCO3, pH, t)[0][0] as number;
      return regimeAt("Cu", pH, eSHE, t, activity, withCarbonate ? dic : undefined)[0][0];
    });
  });
});

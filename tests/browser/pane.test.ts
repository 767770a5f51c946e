/**
 * The built standalone pane in headless Chromium: paste the invented demo log, then check the drawing against the
 * engine — every region labelled, every marker at the pixel the axis transform gives, every marker's regime equal
 * to REDOX.REGIME's answer for its row — and the exports (valid SVG, PNG of the stated size).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { copyFileSync, mkdirSync, readFileSync } from "fs";
import { join } from "path";
import type { Page } from "playwright-core";
import { XMLValidator, XMLParser } from "fast-xml-parser";
import { PNG } from "pngjs";
import { OpenPane, openStandalonePane, ROOT } from "../../test-support/serve-dist";
import { getDatabase } from "../../src/chemistry/database";
import { buildSystem } from "../../src/chemistry/system";
import { toSHE, fromSHE } from "../../src/chemistry/electrodes";
import { displayScale, shownRegions } from "../../src/diagram/diagram-model";
import { makeAxes } from "../../src/diagram/axes";
import { diagramLayout } from "../../src/diagram/diagram-svg";
import { formulaSegments, segmentsText } from "../../src/diagram/formula-markup";
import { MARKER_FILLS } from "../../src/diagram/palette";
import { regimeAt } from "../../src/functions/stability-functions";
import { dicAt } from "../../src/functions/carbonate-functions";
import { MARKER_RADIUS } from "../../src/diagram/markers";
import { parseDelimited } from "../../src/tables";

const DEMO_TEXT = readFileSync(join(ROOT, "data/demo/sample-log.csv"), "utf8");

let pane: OpenPane;
let page: Page;

beforeAll(async () => {
  pane = await openStandalonePane();
  page = pane.page;
  await page.click("#paste-details summary"); // the paste box is folded away under the demo and file buttons
  await page.fill("#paste-input", DEMO_TEXT);
  await page.click("#draw-pasted");
  await page.waitForSelector("#diagram .rc-sample");
});

afterAll(async () => {
  await pane?.close();
});

async function controls() {
  return page.evaluate(() => {
    const value = (id: string) => (document.getElementById(id) as HTMLInputElement).value;
    const svg = document.querySelector("#diagram svg")!;
    const attr = (name: string) => Number(svg.getAttribute(name));
    return {
      metal: value("metal"),
      celsius: Number(value("temperature")),
      activity: Number(value("activity")),
      electrode: value("electrode"),
      unit: value("unit") as "V" | "mV",
      window: {
        pHMin: attr("data-ph-min"),
        pHMax: attr("data-ph-max"),
        eMin: attr("data-e-min"),
        eMax: attr("data-e-max"),
      },
      width: attr("width"),
      height: attr("height"),
      captionLines: -1, // the screen drawing has no caption inside: it is HTML under it
    };
  });
}

describe("standalone pane with the demo data pasted", () => {
  it("takes the columns, electrode and unit from the demo log's headers", async () => {
    const c = await controls();
    expect(c.electrode).toBe("AgCl-sat"); // header ORP_mV_AgCl_sat
    expect(c.unit).toBe("mV");
    expect(c.activity).toBe(1e-6);
    expect(getDatabase().metals()).toContain(c.metal);
  });

  it("labels every region of the engine's diagram in place", async () => {
    await page.click("#full-range"); // the fitted view of the clustered demo shows one region
    const c = await controls();
    const system = buildSystem(getDatabase(), c.metal, { celsius: c.celsius, activity: c.activity });
    const regions = shownRegions(system, c.window, displayScale(c.electrode, c.unit, c.celsius));
    expect(regions.length).toBeGreaterThan(2);
    const labels = await page.$$eval("#diagram text.rc-label", (nodes) =>
      nodes.map((n) => ({
        formula: n.getAttribute("data-formula"),
        text: n.textContent,
        key: n.getAttribute("data-key"),
      })),
    );
    const key = await page.$$eval("#region-key li", (nodes) =>
      nodes.map((n) => ({ formula: n.getAttribute("data-formula"), number: n.getAttribute("value") })),
    );
    for (const r of regions) {
      const label = labels.find((l) => l.formula === r.formula);
      const listed = key.find((k) => k.formula === r.formula);
      expect(label ?? listed, `label of ${r.formula}`).toBeDefined();
      if (label && label.key === null) expect(label.text).toBe(segmentsText(formulaSegments(r.formula, r.charge)));
      if (label && label.key !== null) expect(listed?.number, `key entry of ${r.formula}`).toBe(label.key);
    }
    expect(labels.length + key.filter((k) => !labels.some((l) => l.key === k.number)).length).toBe(regions.length);
  });

  it("puts every sample at the pixel of the axis transform (within 1 px) with REDOX.REGIME's regime for its own row", async () => {
    const c = await controls();
    const parsed = parseDelimited(DEMO_TEXT);
    const header = parsed.rows[0];
    const col = (name: string) => header.indexOf(name);
    const byLine = new Map(parsed.rows.slice(1).map((row, i) => [parsed.lines[i + 1], row]));
    const area = diagramLayout(c.width, c.height, c.captionLines);
    const axes = makeAxes(c.window, area);
    const markers = await page.$$eval("#diagram .rc-sample", (nodes) => {
      const svg = document.querySelector("#diagram svg")!.getBoundingClientRect();
      return nodes.map((n) => {
        const box = n.getBoundingClientRect();
        return {
          row: Number(n.getAttribute("data-row")),
          regime: n.getAttribute("data-regime"),
          fill: getComputedStyle(n).fill,
          x: box.left + box.width / 2 - svg.left,
          y: box.top + box.height / 2 - svg.top,
        };
      });
    });
    expect(markers.length).toBeGreaterThan(30);
    const hex = (rgb: string) =>
      "#" +
      (rgb.match(/\d+/g) ?? [])
        .slice(0, 3)
        .map((v) => Number(v).toString(16).padStart(2, "0"))
        .join("");
    for (const m of markers) {
      const row = byLine.get(m.row)!;
      expect(row[col("pipe_metal")]).toBe(c.metal);
      const pH = Number(row[col("pH")]);
      const rowCelsius = Number(row[col("temp_C")]);
      const eSHE = toSHE(Number(row[col("ORP_mV_AgCl_sat")]) / 1000, "AgCl-sat", rowCelsius);
      const shown = fromSHE(eSHE, "AgCl-sat", c.celsius) * 1000;
      // the box centre of a triangle sits 0.34 r above its centroid (markers.ts: apex 1.35 r up, base 0.675 r down)
      const offset = m.regime === "corrosion" ? -0.3375 * MARKER_RADIUS : 0;
      expect(Math.abs(m.x - axes.x(pH)), `row ${m.row} x`).toBeLessThanOrEqual(1);
      expect(Math.abs(m.y - offset - axes.y(shown)), `row ${m.row} y`).toBeLessThanOrEqual(1);
      // the row's own water: REDOX.DIC of its alkalinity at its pH and temperature, as a worksheet chains it
      const alk = row[col("alkalinity_mg_L_CaCO3")].trim();
      const dic = alk === "" ? "" : (dicAt(Number(alk), pH, rowCelsius)[0][0] as number);
      const regime = regimeAt(c.metal, pH, eSHE, rowCelsius, c.activity, dic)[0][0];
      expect(m.regime, `row ${m.row}`).toBe(regime);
      expect(m.fill).not.toBe("");
      expect(hex(m.fill)).toBe(MARKER_FILLS[regime as keyof typeof MARKER_FILLS]);
    }
  });

  it("lists the rows it could not draw, with reasons", async () => {
    const items = await page.$$eval("#skipped li", (nodes) => nodes.map((n) => n.textContent ?? ""));
    expect(items.length).toBeGreaterThan(0);
    for (const item of items) expect(item).toMatch(/^Row \d+: .+(blank|not a number|decimal comma|outside)/);
  });

  it("shows the logged reading, E vs SHE and the row's temperature of the sample reached by the arrow keys", async () => {
    await page.focus("#diagram .rc-samples");
    await page.keyboard.press("Home");
    const row = await page.getAttribute("#diagram .rc-sample.rc-current", "data-row");
    await expect
      .poll(() => page.textContent("#point-info"))
      .toMatch(
        new RegExp(
          `row ${row}\\): pH \\d+\\.\\d{2}, reading -?\\d+ mV vs AgCl-sat = -?\\d\\.\\d{3} V vs SHE at [\\d.]+ °C.*; .+, (immunity|passivation|corrosion); water margin`,
        ),
      );
  });

  it("clears the info line when the metal changes", async () => {
    await page.focus("#diagram .rc-samples");
    await page.keyboard.press("Home");
    await expect.poll(() => page.textContent("#point-info")).toMatch(/^\S.*\(row \d+\)/);
    const metal = await page.inputValue("#metal");
    await page.selectOption("#metal", metal === "Cu" ? "Fe" : "Cu");
    expect(await page.textContent("#point-info")).toMatch(/^Hover over a sample/);
    await page.selectOption("#metal", metal);
  });

  it("exports a valid SVG and a PNG of the stated size; saves a screenshot", async () => {
    const svgDownload = page.waitForEvent("download");
    await page.click("#export-svg");
    const svgText = readFileSync((await (await svgDownload).path())!, "utf8");
    expect(XMLValidator.validate(svgText)).toBe(true);
    const root = new XMLParser({ ignoreAttributes: false }).parse(svgText).svg;
    expect(root["@_width"]).toBe("1200");

    await page.click("#export-details summary");
    await page.fill("#png-width", "1000");
    await page.fill("#png-height", "760");
    const pngDownload = page.waitForEvent("download");
    await page.click("#export-png");
    const png = PNG.sync.read(readFileSync((await (await pngDownload).path())!));
    expect([png.width, png.height]).toEqual([1000, 760]);

    // The screenshot is a test artefact (test-results/); the README's copy in docs/images is refreshed only on
    // request (REDOX_UPDATE_SCREENSHOT=1 npm test), so a test run leaves the working tree as it found it.
    mkdirSync(join(ROOT, "test-results"), { recursive: true });
    const shot = join(ROOT, "test-results/pane-demo.png");
    await page.locator("#pane").screenshot({ path: shot });
    expect(PNG.sync.read(readFileSync(shot)).width).toBeGreaterThan(300);
    if (process.env.REDOX_UPDATE_SCREENSHOT === "1") {
      mkdirSync(join(ROOT, "docs/images"), { recursive: true });
      copyFileSync(shot, join(ROOT, "docs/images/pane-demo.png"));
    }
  });

  it("loads the bundled demo data with its button", async () => {
    await page.fill("#paste-input", "");
    await page.click("#load-demo");
    await expect.poll(() => page.inputValue("#paste-input")).toContain("INVENTED");
    await page.waitForSelector("#diagram .rc-sample");
    expect(await page.textContent("#pane-status")).toMatch(/drawn from demo/);
  });
});

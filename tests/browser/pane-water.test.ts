/**
 * The built standalone pane with ligands: the invented demo log's lead rows drawn in a water with carbonate from
 * the alkalinity column (each row's DIC from its alkalinity, pH and temperature, the diagram at the median), and
 * typed chloride and sulfur totals. Every marker's regime and fill must equal REDOX.REGIME of its row (own temperature, own DIC, typed totals);
 * every species of the split diagram is labelled (in place, by number or in the key); the caption names the water. Then a large synthetic set, drawn
 * on the canvas layer: isolated markers carry their regime's fill, and the keyboard reaches the samples.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { readFileSync } from "fs";
import { join } from "path";
import type { Page } from "playwright-core";
import { OpenPane, openStandalonePane, ROOT } from "../../test-support/serve-dist";
import { getDatabase } from "../../src/chemistry/database";
import { buildLigandSystem } from "../../src/chemistry/ligand-system";
import { toSHE } from "../../src/chemistry/electrodes";
import { displayScale, shownRegions } from "../../src/diagram/diagram-model";
import { MARKER_FILLS } from "../../src/diagram/palette";
import { roundTotal } from "../../src/taskpane/ligand-inputs";
import { median } from "../../src/taskpane/sample-table";
import { CANVAS_SAMPLES } from "../../src/taskpane/sample-canvas";
import { regimeAt } from "../../src/functions/stability-functions";
import { dicAt } from "../../src/functions/carbonate-functions";
import { parseDelimited } from "../../src/tables";
import { syntheticSamples } from "../../test-support/synthetic-samples";

const DEMO_TEXT = readFileSync(join(ROOT, "data/demo/sample-log.csv"), "utf8");
const CHLORIDE = 5e-4;
const SULFUR = 2e-4;

let pane: OpenPane;
let page: Page;

beforeAll(async () => {
  pane = await openStandalonePane();
  page = pane.page;
});

afterAll(async () => {
  await pane?.close();
});

const hex = (rgb: string) =>
  "#" +
  (rgb.match(/\d+/g) ?? [])
    .slice(0, 3)
    .map((v) => Number(v).toString(16).padStart(2, "0"))
    .join("");

describe("lead rows of the demo log in a water with carbonate, chloride and sulfur", () => {
  beforeAll(async () => {
    await page.click("#paste-details summary"); // the paste box is folded away under the demo and file buttons
    await page.fill("#paste-input", DEMO_TEXT);
    await page.click("#draw-pasted");
    await page.waitForSelector("#diagram .rc-sample");
    await page.selectOption("#metal", "Pb");
    await page.click("#ligands summary"); // the water settings are folded away under the diagram
    const alkalinity = await page.$$eval("#carbonate-source option", (options) =>
      options.find((o) => /alkalinity column/.test(o.textContent ?? ""))?.getAttribute("value"),
    );
    expect(alkalinity).toBeTruthy();
    await page.selectOption("#carbonate-source", alkalinity!);
    for (const [id, value] of [
      ["#chloride-total", String(CHLORIDE)],
      ["#sulfur-total", String(SULFUR)],
    ]) {
      await page.fill(id, value);
      await page.locator(id).blur(); // the input's change event redraws the diagram
    }
    await page.waitForFunction(() => /Water: DIC/.test(document.querySelector("#diagram-caption")?.textContent ?? ""));
  });

  it("fills every marker by REDOX.REGIME given the row's DIC and the typed totals", async () => {
    const c = await page.evaluate(() => {
      const value = (id: string) => (document.getElementById(id) as HTMLInputElement).value;
      return { metal: value("metal"), celsius: Number(value("temperature")), activity: Number(value("activity")) };
    });
    expect(c.metal).toBe("Pb");
    const parsed = parseDelimited(DEMO_TEXT);
    const header = parsed.rows[0];
    const col = (name: string) => header.indexOf(name);
    const rows = parsed.rows.slice(1).map((row, i) => ({ line: parsed.lines[i + 1], row }));
    const byLine = new Map(rows.map((r) => [r.line, r.row]));
    const markers = await page.$$eval("#diagram .rc-sample", (nodes) =>
      nodes.map((n) => ({
        row: Number(n.getAttribute("data-row")),
        regime: n.getAttribute("data-regime"),
        fill: getComputedStyle(n).fill,
      })),
    );
    expect(markers.length).toBeGreaterThan(15);

    // each drawn row's DIC computed here from its cells with REDOX.DIC; blank alkalinity → the median
    // each row's own answer: its temperature, its DIC from its alkalinity (REDOX.DIC, as a worksheet chains it)
    let changedByLigands = 0;
    const dics: number[] = [];
    for (const m of markers) {
      const row = byLine.get(m.row)!;
      expect(row[col("pipe_metal")]).toBe("Pb");
      const pH = Number(row[col("pH")]);
      const t = Number(row[col("temp_C")]);
      const eSHE = toSHE(Number(row[col("ORP_mV_AgCl_sat")]) / 1000, "AgCl-sat", t);
      const alk = row[col("alkalinity_mg_L_CaCO3")].trim();
      const dic = alk === "" ? "" : (dicAt(Number(alk), pH, t)[0][0] as number);
      if (typeof dic === "number") dics.push(roundTotal(dic));
      const regime = regimeAt("Pb", pH, eSHE, t, c.activity, dic, CHLORIDE, SULFUR)[0][0];
      expect(m.regime, `row ${m.row}`).toBe(regime);
      expect(hex(m.fill), `row ${m.row}`).toBe(MARKER_FILLS[regime as keyof typeof MARKER_FILLS]);
      if (regimeAt("Pb", pH, eSHE, t, c.activity)[0][0] !== regime) changedByLigands++;
    }
    const diagramDic = roundTotal(median(dics));
    expect(changedByLigands).toBeGreaterThan(0);

    // the diagram is drawn at the median DIC: every species of the split diagram has its label
    const svg = await page.evaluate(() => {
      const s = document.querySelector("#diagram svg")!;
      const a = (n: string) => Number(s.getAttribute(n));
      return {
        window: { pHMin: a("data-ph-min"), pHMax: a("data-ph-max"), eMin: a("data-e-min"), eMax: a("data-e-max") },
      };
    });
    const system = buildLigandSystem(
      getDatabase(),
      "Pb",
      { celsius: c.celsius, activity: c.activity },
      { carbonate: diagramDic, chloride: CHLORIDE, sulfur: SULFUR },
    );
    const regions = shownRegions(system, svg.window, displayScale("AgCl-sat", "mV", c.celsius));
    // every species is labelled in place, numbered, or (too small to mark) named in the key
    const labels = new Set(
      await page.$$eval("#diagram text.rc-label, #region-key li", (nodes) =>
        nodes.map((n) => n.getAttribute("data-formula")),
      ),
    );
    for (const r of regions) expect(labels.has(r.formula), `label of ${r.formula}`).toBe(true);
    const regimes = new Set(
      await page.$$eval("#diagram .rc-region", (nodes) => nodes.map((n) => n.getAttribute("data-formula"))),
    );
    expect(regimes).toEqual(new Set(regions.map((r) => r.formula)));
  });

  it("names the water and the method; hover text carries the row's water", async () => {
    expect(await page.textContent("#diagram-title")).toBe("Lead in water with carbonate, sulfur and chloride");
    const caption = (await page.textContent("#diagram-caption")) ?? "";
    expect(caption).toMatch(/Water: DIC [\d.]+, S 0\.2, Cl 0\.5 mmol\/kg/);
    expect(caption).toMatch(/median of the rows' totals from their alkalinity/);
    expect(caption).toMatch(/speciated\s*exactly\s*at\s*every\s*point/);
    await page.focus("#diagram .rc-samples");
    await page.keyboard.press("ArrowRight");
    await expect.poll(() => page.textContent("#point-info")).toMatch(/, water DIC [\d.]+, S 0\.2, Cl 0\.5 mmol\/kg; /);
  });

  it("returns to the pure-water diagram when the ligands are cleared", async () => {
    await page.selectOption("#carbonate-source", "typed");
    for (const id of ["#chloride-total", "#sulfur-total"]) {
      await page.fill(id, "");
      await page.locator(id).blur();
    }
    await expect.poll(() => page.textContent("#diagram-title")).toBe("Lead in water");
    expect(await page.textContent("#diagram-caption")).not.toMatch(/Water:/);
  });
});

describe("a large set on the canvas layer", () => {
  const count = CANVAS_SAMPLES + 500;
  // spread over the whole default window so that many markers stand alone
  const inputs = syntheticSamples(count, 11).map((s) => ({
    ...s,
    pH: -1.5 + ((s.pH - 4) / 6) * 17,
    eSHE: -1.8 + ((s.eSHE + 0.6) / 1.4) * 3.6,
  }));

  beforeAll(async () => {
    await page.evaluate(() => localStorage.clear()); // the first part chose lead, mV and Ag/AgCl; start afresh
    await pane.reload();
    await page.click("#paste-details summary");
    const text = ["id,pH,E (V) vs SHE", ...inputs.map((s) => `${s.id},${s.pH.toFixed(3)},${s.eSHE.toFixed(4)}`)].join(
      "\n",
    );
    await page.evaluate(
      (value) => ((document.getElementById("paste-input") as HTMLTextAreaElement).value = value),
      text,
    );
    await page.click("#draw-pasted");
    await page.waitForSelector("#diagram canvas.rc-sample-canvas");
  });

  it("paints every marker with its regime's fill where the axes put it", async () => {
    expect(await page.$$eval("#diagram .rc-sample", (n) => n.length)).toBe(0);
    const c = await page.evaluate(() => ({
      metal: (document.getElementById("metal") as HTMLSelectElement).value,
      celsius: Number((document.getElementById("temperature") as HTMLInputElement).value),
      activity: Number((document.getElementById("activity") as HTMLInputElement).value),
      painted: Number(document.querySelector("#diagram canvas")!.getAttribute("data-samples")),
    }));
    expect(c.painted).toBe(count);
    // read the canvas at the centre of markers with no neighbour within 10 px (no overlap to blur the colour)
    // the test browser runs at device scale 1, so canvas pixels are CSS pixels
    expect(
      await page.evaluate(
        () =>
          (document.querySelector("#diagram canvas") as HTMLCanvasElement).width ===
          Number(document.querySelector("#diagram svg")!.getAttribute("width")),
      ),
    ).toBe(true);
    const pixels = await page.evaluate(
      (points: [number, number][]) => {
        const svg = document.querySelector("#diagram svg")!;
        const a = (n: string) => Number(svg.getAttribute(n));
        const ctx = (document.querySelector("#diagram canvas") as HTMLCanvasElement).getContext("2d")!;
        const xy = points.map(([pH, e]) => [
          a("data-plot-left") +
            ((pH - a("data-ph-min")) / (a("data-ph-max") - a("data-ph-min"))) * a("data-plot-width"),
          a("data-plot-top") + ((a("data-e-max") - e) / (a("data-e-max") - a("data-e-min"))) * a("data-plot-height"),
        ]);
        return xy.map(([x, y], i) => {
          const alone = xy.every(([u, v], j) => j === i || Math.hypot(u - x, v - y) > 10);
          const [r, g, b] = ctx.getImageData(Math.floor(x), Math.floor(y), 1, 1).data;
          return { alone, rgb: `rgb(${r}, ${g}, ${b})` };
        });
      },
      inputs.map((s) => [Number(s.pH.toFixed(3)), Number(s.eSHE.toFixed(4))] as [number, number]),
    );
    let checked = 0;
    pixels.forEach((p, i) => {
      if (!p.alone) return;
      const s = inputs[i];
      const regime = regimeAt(
        c.metal,
        Number(s.pH.toFixed(3)),
        Number(s.eSHE.toFixed(4)),
        c.celsius,
        c.activity,
      )[0][0] as keyof typeof MARKER_FILLS;
      expect(hex(p.rgb), `sample ${s.id}`).toBe(MARKER_FILLS[regime]);
      checked++;
    });
    expect(checked).toBeGreaterThan(20);
  });

  it("reaches the samples from the keyboard and names them in the info line", async () => {
    await page.focus("#diagram canvas");
    const first = (await page.textContent("#point-info")) ?? "";
    expect(first).toMatch(/^S-\d+ \(row \d+\): pH -?\d+\.\d{2}, reading -?[\d.]+ V vs SHE = /);
    await page.keyboard.press("ArrowRight");
    const second = (await page.textContent("#point-info")) ?? "";
    expect(second).not.toBe(first);
    const pH = (text: string) => Number(/pH (-?\d+\.\d+)/.exec(text)![1]);
    expect(pH(second)).toBeGreaterThanOrEqual(pH(first));
    expect(await page.isVisible("#diagram .rc-focus-ring")).toBe(true);
  });

  it("still exports every sample as an SVG circle", async () => {
    const download = page.waitForEvent("download");
    await page.click("#export-svg");
    const text = readFileSync((await (await download).path())!, "utf8");
    expect(text.match(/class="rc-sample"/g)?.length).toBe(count);
  });
});

describe("a log with a conductivity column (fixture, invented)", () => {
  // lead at pH 7, Eh −0.307 V: Pb(s) for an ideal solution, Pb2+ at I = 0.016 mol/kg, which REDOX.IONICSTRENGTH
  // gives for 1000 µS/cm (I ≈ 1.6e-5 × µS/cm, Russell, L.L., Chemistry of oilfield waters, 1976)
  beforeAll(async () => {
    await page.evaluate(() => localStorage.clear());
    await pane.reload();
    await page.click("#paste-details summary");
    const text = ["id,pH,Eh (V),Conductivity (µS/cm)", "A,7,-0.307,1000", "B,7,-0.307,", "C,7.5,-0.2,350"].join("\n");
    await page.evaluate(
      (value) => ((document.getElementById("paste-input") as HTMLTextAreaElement).value = value),
      text,
    );
    await page.click("#draw-pasted");
    await page.waitForSelector("#diagram .rc-sample");
    await page.selectOption("#metal", "Pb");
    await page.waitForFunction(() =>
      /Ionic strength/.test(document.querySelector("#diagram-caption")?.textContent ?? ""),
    );
  });

  it("answers each sample with its own ionic strength, says so in the caption and the hover", async () => {
    const caption = (await page.textContent("#diagram-caption")) ?? "";
    expect(caption).toMatch(/Ionic strength: each sample's own from "Conductivity \(µS\/cm\)"/);
    expect(caption).toMatch(/1 blank row answered without the correction/);
    const species = await page.$$eval("#diagram .rc-sample", (nodes) =>
      nodes.map((n) => n.getAttribute("data-species")),
    );
    expect(species.slice(0, 2)).toEqual(["Pb2+", "Pb(s)"]);
    await page.focus("#diagram .rc-samples");
    const texts: string[] = [];
    for (const key of ["Home", "ArrowRight", "ArrowRight"]) {
      await page.keyboard.press(key);
      texts.push((await page.textContent("#point-info")) ?? "");
    }
    // sample A carries its ionic strength; blank B none (pH order decides which comes first)
    expect(texts.filter((t) => /^A .*, I 0\.016 mol\/kg; Pb2\+/.test(t))).toHaveLength(1);
    expect(texts.find((t) => /^B /.test(t))).not.toMatch(/ I \d/);
  });
});

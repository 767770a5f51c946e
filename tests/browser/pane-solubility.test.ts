/**
 * The built standalone pane at 350 px with the invented demo log: the solubility chart (dissolved metal along pH at
 * the chosen sample's potential) appears for lead and for copper, fits the pane, has no text over other text, is
 * labelled for screen readers and reachable by keyboard; its marker is the row's REDOX.DISSOLVED (the worksheet
 * function called in the test as a sheet chains it: REDOX.TOSHE of the reading, REDOX.DIC of the alkalinity);
 * typing a threshold moves the line to its height on the log axis; a long log lists its first samples and adds one
 * chosen on the diagram. Saves a screenshot under test-results/.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { copyFileSync, mkdirSync } from "fs";
import { join } from "path";
import type { Page } from "playwright-core";
import { OpenPane, openStandalonePane, ROOT } from "../../test-support/serve-dist";
import { tabStops } from "../../test-support/layout-probe";
import { demoRowDissolved } from "../../test-support/demo-dissolved";
import { getDatabase } from "../../src/chemistry/database";
import { LISTED_SAMPLES } from "../../src/taskpane/solubility-view";

const WIDTH = 350;

let pane: OpenPane;
let page: Page;

beforeAll(async () => {
  pane = await openStandalonePane();
  page = pane.page;
  await page.setViewportSize({ width: WIDTH, height: 900 });
  await page.evaluate(() => localStorage.clear());
  await pane.reload();
  await page.click("#load-demo");
  await page.waitForSelector("#diagram .rc-sample");
  await page.selectOption("#metal", "Pb");
  await page.waitForFunction(() => /lead/.test(document.querySelector("#solubility-heading")?.textContent ?? ""));
});

afterAll(async () => {
  await pane?.close();
});

interface ChartFigures {
  pageWidth: number;
  sectionWidth: number;
  sectionScroll: number;
  svg: { left: number; right: number; top: number; bottom: number; width: number; height: number };
  texts: number;
  overlaps: string[];
  outside: number;
  lines: number;
}

/** Sizes of the chart, and its text boxes that overlap one another or leave the SVG. */
async function measureChart(): Promise<ChartFigures> {
  // a string, not a function: the test runner's transform would wrap inner functions in a helper the page lacks
  return page.evaluate(`(() => {
    const svg = document.querySelector("#solubility-chart svg");
    const box = svg.getBoundingClientRect();
    const texts = [...svg.querySelectorAll("text")].map((n) => ({ r: n.getBoundingClientRect(), t: n.textContent }));
    const overlaps = [];
    for (let i = 0; i < texts.length; i++)
      for (let j = i + 1; j < texts.length; j++) {
        const a = texts[i].r, b = texts[j].r;
        if (a.left < b.right - 0.5 && b.left < a.right - 0.5 && a.top < b.bottom - 0.5 && b.top < a.bottom - 0.5)
          overlaps.push(texts[i].t + " / " + texts[j].t);
      }
    const outside = texts.filter(({ r }) => r.left < box.left - 0.5 || r.right > box.right + 0.5 || r.top < box.top - 0.5 || r.bottom > box.bottom + 0.5).length;
    const section = document.querySelector("#solubility-section");
    return {
      pageWidth: document.documentElement.scrollWidth,
      sectionWidth: section.clientWidth,
      sectionScroll: section.scrollWidth,
      svg: { left: box.left, right: box.right, top: box.top, bottom: box.bottom, width: box.width, height: box.height },
      texts: texts.length,
      overlaps,
      outside,
      lines: svg.querySelectorAll(".rc-sol-line").length,
    };
  })()`) as Promise<ChartFigures>;
}

/** The threshold line's y, and where the log axis puts the value (both in SVG units). */
async function thresholdHeight(): Promise<{ y: number | null; expected: number }> {
  return page.evaluate(() => {
    const svg = document.querySelector("#solubility-chart svg")!;
    const n = (name: string) => Number(svg.getAttribute(name));
    const line = svg.querySelector(".rc-sol-threshold");
    const value = Number(line?.getAttribute("data-value"));
    const [low, high] = [n("data-log-min"), n("data-log-max")];
    const expected = n("data-plot-top") + ((high - Math.log10(value)) / (high - low)) * n("data-plot-height");
    return { y: line ? Number(line.getAttribute("data-y")) : null, expected };
  });
}

const chosenId = () =>
  page.$eval("#solubility-sample", (s) => (s as HTMLSelectElement).selectedOptions[0].text.split(" · ")[0]);
/** The marker's value, and the row's own REDOX.DISSOLVED as the pane answered the row (sample-answers.ts). */
const marker = () =>
  page.$eval("#solubility-chart .rc-sol-sample", (m) => ({
    value: Number(m.getAttribute("data-value")),
    row: Number(m.getAttribute("data-row-value")),
  }));

/**
 * The marker is the pane's own REDOX.DISSOLVED of the row, bit for bit (both computed in the page), and the worksheet
 * function run here in Node gives the same to 1e-12: Chromium's and Node's JavaScript engines may round a
 * transcendental function differently in the last bit.
 */
async function expectRowValue(metal: string): Promise<void> {
  const m = await marker();
  expect(m.value).toBe(m.row);
  const expected = demoRowDissolved(metal, await chosenId());
  expect(Math.abs(m.value - expected)).toBeLessThanOrEqual(1e-12 * expected);
}

describe(`the solubility chart in the pane ${WIDTH} px wide with the demo data`, () => {
  it("appears for lead under the diagram, fits the pane and has no text over other text", async () => {
    const m = await measureChart();
    expect(m.lines).toBeGreaterThan(0);
    expect(m.pageWidth).toBeLessThanOrEqual(WIDTH);
    expect(m.svg.right).toBeLessThanOrEqual(WIDTH);
    expect(m.svg.width).toBeGreaterThanOrEqual(280); // as wide as the pane gives it
    expect(m.svg.height).toBeGreaterThanOrEqual(170);
    expect(m.sectionScroll).toBeLessThanOrEqual(m.sectionWidth);
    expect(m.texts).toBeGreaterThan(6);
    expect(m.overlaps).toEqual([]);
    expect(m.outside).toBe(0);
    console.log(
      `solubility chart at ${WIDTH} px: ${Math.round(m.svg.width)} × ${Math.round(m.svg.height)} px, ${m.texts} texts`,
    );
    mkdirSync(join(ROOT, "test-results"), { recursive: true });
    const shot = join(ROOT, "test-results/solubility-350px.png");
    await (await page.$("#solubility-section"))!.screenshot({ path: shot });
    if (process.env.REDOX_UPDATE_SCREENSHOT === "1") copyFileSync(shot, join(ROOT, "docs/images/solubility-350px.png"));
  });

  it("marks the chosen sample at its row's REDOX.DISSOLVED", async () => {
    await expectRowValue("Pb");
  });

  it("moves the threshold line when a threshold is typed, to its height on the log axis", async () => {
    const before = await thresholdHeight();
    expect(before.y).not.toBeNull();
    expect(Math.abs(before.y! - before.expected)).toBeLessThanOrEqual(0.01);
    await page.fill("#solubility-threshold", "15");
    await page.waitForFunction(() => document.querySelector(".rc-sol-threshold")?.getAttribute("data-value") === "15");
    const after = await thresholdHeight();
    expect(after.y).toBeLessThan(before.y!); // 15 µg/L sits higher than 10 µg/L
    expect(Math.abs(after.y! - after.expected)).toBeLessThanOrEqual(0.01);
    expect(await page.textContent("#solubility-summary")).toMatch(/the 15 µg\/L threshold/);
    expect((await measureChart()).overlaps).toEqual([]);
    await page.fill("#solubility-threshold", "ten");
    await expect.poll(() => page.textContent("#solubility-note")).toMatch(/Threshold: a number of µg\/L above 0/);
    expect(await page.$("#solubility-chart .rc-sol-threshold")).toBeNull();
    await page.fill("#solubility-threshold", "10");
    await page.waitForSelector("#solubility-chart .rc-sol-threshold");
  });

  it("is labelled for screen readers and reachable by keyboard", async () => {
    const label = await page.evaluate(() => {
      const svg = document.querySelector("#solubility-chart svg")!;
      const ids = (svg.getAttribute("aria-labelledby") ?? "").split(" ");
      return { role: svg.getAttribute("role"), texts: ids.map((id) => document.getElementById(id)?.textContent ?? "") };
    });
    expect(label.role).toBe("img");
    expect(label.texts[0]).toMatch(/dissolved lead against pH/);
    expect(label.texts[1]).toMatch(/At the sample's pH/);
    expect(await page.textContent("#solubility-caution")).toMatch(/not a tap sample.*not how\s+fast.*regulator/s);
    expect(await tabStops(page, "#solubility-sample", "#solubility-threshold")).toBe(1);
    expect(await tabStops(page, "#export-svg", "#solubility-sample")).toBeGreaterThan(0);
  });

  it("follows the sample chosen on the diagram with the keyboard (arrow keys, Enter)", async () => {
    await page.focus("#diagram .rc-samples");
    await page.keyboard.press("End");
    await page.keyboard.press("Enter");
    const chosen = await chosenId();
    const info = await page.textContent("#point-info");
    expect(info).toContain(chosen);
    await expectRowValue("Pb");
  });

  it("works for copper too", async () => {
    await page.selectOption("#metal", "Cu");
    await page.waitForFunction(() => /copper/.test(document.querySelector("#solubility-heading")?.textContent ?? ""));
    const m = await measureChart();
    expect(m.lines).toBeGreaterThan(0);
    expect(m.overlaps).toEqual([]);
    expect(m.svg.right).toBeLessThanOrEqual(WIDTH);
    await expectRowValue("Cu");
  });

  it("fits and keeps its text apart for every metal of the pane", async () => {
    const problems: string[] = [];
    for (const metal of getDatabase().metals()) {
      await page.selectOption("#metal", metal);
      const name = getDatabase().element(metal)!.name;
      await page.waitForFunction(
        (n) => (document.querySelector("#solubility-heading")?.textContent ?? "").includes(n),
        name,
      );
      if (await page.isHidden("#solubility-section")) continue; // no row of this metal drawn
      const m = await measureChart();
      if (m.overlaps.length > 0 || m.outside > 0 || m.svg.right > WIDTH || m.pageWidth > WIDTH)
        problems.push(`${metal}: ${m.overlaps.join("; ")} ${m.outside} outside, right ${m.svg.right}`);
    }
    expect(problems).toEqual([]);
  });

  it(`lists the first ${LISTED_SAMPLES} samples of a long log, says how to reach the others, and adds one chosen on the diagram`, async () => {
    // an invented log of 400 rows, pH rising with the row, so that the last marker (End) is the last row
    const rows = Array.from({ length: 400 }, (_, i) => `S${i + 1},${(5 + i * 0.01).toFixed(2)},150`);
    await page.click("#paste-details summary");
    await page.fill("#paste-input", ["id,pH,ORP (mV) vs AgCl sat", ...rows].join("\n"));
    await page.click("#draw-pasted");
    await page.waitForFunction(
      (listed) => (document.querySelector("#solubility-sample") as HTMLSelectElement).length > listed,
      LISTED_SAMPLES,
    );
    const list = () =>
      page.$eval("#solubility-sample", (s) =>
        [...(s as HTMLSelectElement).options].map((o) => ({ text: o.text, disabled: o.disabled })),
      );
    const before = await list();
    expect(before).toHaveLength(LISTED_SAMPLES + 1);
    expect(before[0].text).toMatch(/^S1 · pH 5\.00$/);
    expect(before[LISTED_SAMPLES]).toEqual({ text: "… 100 more: choose them on the diagram", disabled: true });
    await page.focus("#diagram .rc-samples");
    await page.keyboard.press("End");
    await page.keyboard.press("Enter");
    await expect.poll(chosenId).toBe("S400");
    const after = await list();
    expect(after).toHaveLength(LISTED_SAMPLES + 2);
    expect(after[0].text).toMatch(/^S400 · pH 8\.99$/);
  });
});

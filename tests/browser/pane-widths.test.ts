/**
 * The pane at the widths a spreadsheet gives a task pane (320, 350, 400 px) and wide (800 px), with the invented
 * demo log: no sideways scrolling, a plot at least 220 px tall, region labels that neither overlap nor cross the
 * frame (for every metal, fitted and full range), one tab stop for the whole sample layer, and a redraw when the
 * pane is resized. Saves task-pane-width and wide screenshots under test-results/ (docs/images on request).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { copyFileSync, mkdirSync } from "fs";
import { join } from "path";
import type { Page } from "playwright-core";
import { OpenPane, openStandalonePane, ROOT } from "../../test-support/serve-dist";
import { measureLayout, tabStops } from "../../test-support/layout-probe";
import { getDatabase } from "../../src/chemistry/database";

let pane: OpenPane;
let page: Page;

beforeAll(async () => {
  pane = await openStandalonePane();
  page = pane.page;
});

afterAll(async () => {
  await pane?.close();
});

async function openAt(width: number): Promise<void> {
  await page.setViewportSize({ width, height: 900 });
  await page.evaluate(() => localStorage.clear());
  await pane.reload();
  await page.click("#load-demo");
  await page.waitForSelector("#diagram .rc-sample");
}

async function screenshot(name: string): Promise<void> {
  mkdirSync(join(ROOT, "test-results"), { recursive: true });
  const shot = join(ROOT, `test-results/${name}.png`);
  await page.evaluate(() => {
    (document.activeElement as HTMLElement | null)?.blur();
    window.scrollTo(0, 0);
  });
  await page.screenshot({ path: shot, fullPage: false });
  if (process.env.REDOX_UPDATE_SCREENSHOT === "1") {
    mkdirSync(join(ROOT, "docs/images"), { recursive: true });
    copyFileSync(shot, join(ROOT, `docs/images/${name}.png`));
  }
}

describe.each([320, 350, 400, 800])("the pane %i px wide with the demo data", (width) => {
  beforeAll(async () => openAt(width));

  it("does not scroll sideways and gives the plot at least 220 px of height", async () => {
    const m = await measureLayout(page);
    expect(m.pageWidth).toBeLessThanOrEqual(m.viewportWidth);
    expect(m.svgWidth).toBeLessThanOrEqual(width);
    expect(m.plotHeight).toBeGreaterThanOrEqual(220);
    expect(m.svgHeight).toBeGreaterThanOrEqual(m.svgWidth * 0.9); // about as tall as wide
  });

  it("keeps the sample layer to one tab stop and reaches Download SVG in a few presses", async () => {
    expect(await page.$$eval("#diagram [tabindex]", (nodes) => nodes.length)).toBe(1);
    const presses = await tabStops(page, "#load-demo", "#export-svg");
    expect(presses).toBeGreaterThan(0);
    expect(presses).toBeLessThanOrEqual(10);
  });

  it("places no label over another or across the frame, for every metal, fitted and full range", async () => {
    const problems: string[] = [];
    for (const metal of getDatabase().metals()) {
      await page.selectOption("#metal", metal);
      for (const view of ["#fit-samples", "#full-range"]) {
        await page.click(view);
        const m = await measureLayout(page);
        if (m.overlaps > 0 || m.outside > 0)
          problems.push(`${metal} ${view}: ${m.overlaps} overlapping pairs, ${m.outside} across the frame`);
      }
    }
    expect(problems).toEqual([]);
    if (width === 350 || width === 800) {
      await page.selectOption("#metal", "Pb");
      await page.click("#fit-samples");
      await screenshot(`pane-${width}px`);
    }
  });
});

describe("resizing the pane", () => {
  it("redraws the diagram at the new width", async () => {
    await openAt(350);
    const narrow = await measureLayout(page);
    await page.setViewportSize({ width: 600, height: 900 });
    await expect
      .poll(async () => (await measureLayout(page)).svgWidth, { timeout: 5000 })
      .toBeGreaterThan(narrow.svgWidth + 200);
    const wide = await measureLayout(page);
    expect(wide.pageWidth).toBeLessThanOrEqual(600);
    expect(wide.plotHeight).toBeGreaterThan(narrow.plotHeight);
  });
});

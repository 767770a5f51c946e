/**
 * Layout measurements of the open pane, shared by the browser tests and bench/pane-layout.ts: scroll width, plot
 * rectangle, region-label boxes that overlap one another or cross the plot frame, and Tab presses between two
 * controls.
 */
import type { Page } from "playwright-core";

export interface LayoutFigures {
  pageWidth: number;
  viewportWidth: number;
  svgWidth: number;
  svgHeight: number;
  plotWidth: number;
  plotHeight: number;
  diagramTop: number;
  labels: number;
  overlaps: number;
  outside: number;
}

export async function measureLayout(page: Page): Promise<LayoutFigures> {
  // a string, not a function: the test runner's transform would wrap named inner functions in a helper the page lacks
  return page.evaluate(`(() => {
    const svg = document.querySelector("#diagram svg") ;
    const box = svg.getBoundingClientRect();
    function attr(name) { return Number(svg.getAttribute(name)); }
    const scale = box.width / (Number(svg.getAttribute("width")) || box.width);
    const plot = {
      left: box.left + attr("data-plot-left") * scale,
      top: box.top + attr("data-plot-top") * scale,
      right: box.left + (attr("data-plot-left") + attr("data-plot-width")) * scale,
      bottom: box.top + (attr("data-plot-top") + attr("data-plot-height")) * scale,
    };
    const labels = [...document.querySelectorAll("#diagram .rc-label")].map((n) => n.getBoundingClientRect());
    let overlaps = 0;
    for (let i = 0; i < labels.length; i++) {
      for (let j = i + 1; j < labels.length; j++) {
        const a = labels[i];
        const b = labels[j];
        if (a.left < b.right - 0.5 && b.left < a.right - 0.5 && a.top < b.bottom - 0.5 && b.top < a.bottom - 0.5) overlaps++;
      }
    }
    const outside = labels.filter((a) => a.left < plot.left - 0.5 || a.right > plot.right + 0.5 || a.top < plot.top - 0.5 || a.bottom > plot.bottom + 0.5).length;
    return {
      pageWidth: document.documentElement.scrollWidth,
      viewportWidth: window.innerWidth,
      svgWidth: Math.round(box.width),
      svgHeight: Math.round(box.height),
      plotWidth: Math.round(plot.right - plot.left),
      plotHeight: Math.round(plot.bottom - plot.top),
      diagramTop: Math.round(box.top + window.scrollY),
      labels: labels.length,
      overlaps,
      outside,
    };
  })()`) as Promise<LayoutFigures>;
}

/** Tab presses from the element `from` until `to` has the focus (−1 after `limit` presses). */
export async function tabStops(page: Page, from: string, to: string, limit = 400): Promise<number> {
  await page.focus(from);
  for (let n = 1; n <= limit; n++) {
    await page.keyboard.press("Tab");
    const here = await page.evaluate((selector) => document.activeElement === document.querySelector(selector), to);
    if (here) return n;
  }
  return -1;
}

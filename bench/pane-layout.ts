/**
 * The pane's layout at the widths a spreadsheet gives a task pane: the built standalone page in headless Chromium,
 * the invented demo log loaded, then per width the page's scroll width, the plot rectangle, overlapping region
 * labels (and labels crossing the frame), the diagram's distance from the top and the Tab presses from
 * "Load demo data" to "Download SVG". Prints figures; never fails.
 *
 *   npx webpack --mode production --output-path /tmp/pane-dist   (or npm run build)
 *   REDOX_DIST=/tmp/pane-dist npx tsx bench/pane-layout.ts [widths…]
 */
import { openStandalonePane } from "../test-support/serve-dist";
import { measureLayout, tabStops } from "../test-support/layout-probe";

async function main(): Promise<void> {
  const widths = process.argv
    .slice(2)
    .map(Number)
    .filter((w) => w > 0);
  const pane = await openStandalonePane();
  try {
    const { page } = pane;
    for (const width of widths.length > 0 ? widths : [320, 350, 400, 800]) {
      await page.setViewportSize({ width, height: 900 });
      await pane.reload();
      await page.click("#load-demo");
      await page.waitForSelector("#diagram svg [data-row], #diagram .rc-sample");
      await page.waitForTimeout(200);
      const m = await measureLayout(page);
      const tabs = await tabStops(page, "#load-demo", "#export-svg");
      console.log(
        `${width} px: page ${m.pageWidth} px wide, SVG ${m.svgWidth}×${m.svgHeight}, plot ${m.plotWidth}×${m.plotHeight} px, ` +
          `diagram top at ${m.diagramTop} px, ${m.labels} labels, ${m.overlaps} overlapping pairs, ${m.outside} crossing the frame, ` +
          `${tabs} Tab presses from Load demo data to Download SVG`,
      );
    }
  } finally {
    await pane.close();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

/**
 * Task pane drawing figure (DEVELOPERS.md: 10 k samples < 0.5 s): the samples' species, regime and water margin on the
 * engine's system, then the whole SVG as text (src/taskpane/diagram-svg.ts), in Node. The browser's own parse and
 * paint of that SVG is measured by bench/pane-browser.ts.
 *
 *   npx tsx bench/pane-render.ts          prints the figure
 *   import { benchPaneRender }            returns BenchRow[] for bench/index.ts
 */
import { getDatabase } from "../src/chemistry/database";
import { buildSystem } from "../src/chemistry/system";
import { displayScale, defaultWindow, plotSamples, SampleInput, shownRegions, shownWaterLines } from "../src/taskpane/diagram-model";
import { renderDiagramSvg } from "../src/taskpane/diagram-svg";
import { mulberry32 } from "../src/cli/seeded-random";
import type { BenchRow } from "./engine";

/** Deterministic samples spread over the usual window (mulberry32). */
export function syntheticSamples(count: number, seed = 7): SampleInput[] {
  const next = mulberry32(seed);
  return Array.from({ length: count }, (_, i) => ({ row: i + 2, id: `S-${i + 1}`, pH: 4 + 6 * next(), eSHE: -0.6 + 1.4 * next() }));
}

export function benchPaneRender(count = 10_000): BenchRow[] {
  const system = buildSystem(getDatabase(), "Fe", { celsius: 25, activity: 1e-6 });
  const scale = displayScale("AgCl-sat", "mV", 25);
  const window = defaultWindow(scale);
  const inputs = syntheticSamples(count);
  const once = () => {
    const start = performance.now();
    const regions = shownRegions(system, window, scale);
    const samples = plotSamples(system, inputs, scale);
    const svg = renderDiagramSvg({ system, window, regions, samples, water: shownWaterLines(25, scale), axisTitle: scale.axisTitle, unit: "mV", width: 800, height: 650, caption: ["bench"] });
    return { ms: performance.now() - start, bytes: svg.length };
  };
  once(); // warm-up
  let best = { ms: Infinity, bytes: 0 };
  for (let k = 0; k < 5; k++) {
    const r = once();
    if (r.ms < best.ms) best = r;
  }
  return [
    {
      name: `(f) pane: ${count.toLocaleString("en")} samples → SVG text (Node)`,
      figure: `${best.ms.toFixed(1)} ms (${(best.bytes / 1e6).toFixed(1)} MB SVG)`,
      target: "< 500 ms",
      met: best.ms < 500,
    },
  ];
}

if (process.argv[1] && /pane-render\.ts$/.test(process.argv[1])) {
  for (const row of benchPaneRender()) console.log(`${row.name}  ${row.figure}  target ${row.target}  ${row.met ? "met" : "NOT MET"}`);
}

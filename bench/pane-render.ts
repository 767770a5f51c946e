/**
 * Task pane drawing figure (DEVELOPERS.md budget: 10 k samples < 0.5 s, with a water of their own per row too): every sample's
 * answer through the worksheet functions as the pane computes it (src/taskpane/sample-answers.ts), then the whole
 * SVG as text (src/diagram), in Node: the SVG the pane exports, every sample a marker in it (on screen the pane paints
 * the markers of more than 2 000 samples on a canvas instead). The pane's own drawing in the browser, from Draw to
 * paint, is measured by bench/pane-browser.ts.
 *
 *   npx tsx bench/pane-render.ts          prints the figure
 *   import { benchPaneRender }            returns BenchRow[] for bench/index.ts
 */
import { getDatabase } from "../src/chemistry/database";
import { buildSystem } from "../src/chemistry/system";
import {
  displayScale,
  defaultWindow,
  PlottedSample,
  shownRegions,
  shownWaterLines,
} from "../src/diagram/diagram-model";
import { answerSamples } from "../src/taskpane/sample-answers";
import { renderDiagramSvg } from "../src/diagram/diagram-svg";
import type { BenchRow } from "./engine";
import { syntheticLog } from "../test-support/synthetic-samples";

/** The pane's path: every row's answer through the worksheet functions (sample-answers.ts), then the SVG text. */
function paneOnce(
  count: number,
  ownWater: boolean,
  log: ReturnType<typeof syntheticLog>,
): { ms: number; bytes: number } {
  const start = performance.now();
  const system = buildSystem(getDatabase(), "Fe", { celsius: 25, activity: 1e-6 });
  const scale = displayScale("AgCl-sat", "mV", 25);
  const window = defaultWindow(scale);
  const answers = answerSamples(
    {
      metal: "Fe",
      phColumn: 1,
      potentialColumn: 2,
      temperatureColumn: ownWater ? 3 : -1,
      temperatureUnit: "C",
      celsius: 25,
      electrode: "AgCl-sat",
      unit: "mV",
      activity: 1e-6,
      ligands: ownWater ? [{ ligand: "carbonate", column: 4, kind: "alkalinity", factor: 1 }] : [],
      typed: {},
    },
    log.rows,
  );
  const samples: PlottedSample[] = [];
  answers.forEach((a, i) => {
    if ("error" in a) return;
    const pH = log.rows[i][1] as number;
    samples.push({
      row: i + 2,
      id: String(log.rows[i][0]),
      pH,
      E: scale.fromSHE(pH, a.eSHE),
      eSHE: a.eSHE,
      formula: a.species,
      regime: a.regime,
      waterMargin: a.margin,
      celsius: a.celsius,
      equilibrium: a.dissolved,
    });
  });
  const regions = shownRegions(system, window, scale);
  const svg = renderDiagramSvg({
    system,
    window,
    regions,
    samples,
    water: shownWaterLines(25, scale),
    axisTitle: scale.axisTitle,
    unit: "mV",
    width: 800,
    height: 760,
    chrome: false,
    sampleTitles: false,
  });
  const firstError = answers.find((a) => "error" in a);
  if (samples.length < count * 0.99)
    throw new Error(`only ${samples.length} of ${count} samples answered: ${JSON.stringify(firstError)}`);
  return { ms: performance.now() - start, bytes: svg.length };
}

export function benchPaneRender(count = 10_000): BenchRow[] {
  return [false, true].map((ownWater) => {
    const log = syntheticLog(count, ownWater);
    paneOnce(count, ownWater, log); // warm-up
    let best = { ms: Infinity, bytes: 0 };
    for (let k = 0; k < 5; k++) {
      const r = paneOnce(count, ownWater, log);
      if (r.ms < best.ms) best = r;
    }
    return {
      name: `(f${ownWater ? "′" : ""}) pane: ${count.toLocaleString("en")} samples${ownWater ? ", each with its own temperature and alkalinity," : ""} → answers (worksheet functions) and the exported SVG with every marker (Node)`,
      figure: `${best.ms.toFixed(1)} ms (${(best.bytes / 1e6).toFixed(1)} MB SVG)`,
      target: "< 500 ms",
      met: best.ms < 500,
    };
  });
}

if (process.argv[1] && /pane-render\.ts$/.test(process.argv[1])) {
  for (const row of benchPaneRender())
    console.log(`${row.name}  ${row.figure}  target ${row.target}  ${row.met ? "met" : "NOT MET"}`);
}

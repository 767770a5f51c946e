/**
 * The diagram SVGs of a run: one per metal, drawn at the samples' median temperature and water, each written to
 * a temporary file and renamed into place, so a failed write leaves no partial diagram.
 */
import { mkdirSync, renameSync, unlinkSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { DiagramSamples, diagramCelsius, diagramTotals, renderDiagram, totalsText } from "./diagrams";
import type { EvaluationPlan } from "./evaluation-plan";
import type { CliOptions } from "./options";
import { DEFAULT_CELSIUS, SystemError } from "../chemistry";

function baseName(path: string): string {
  const i = Math.max(path.lastIndexOf("/"), path.lastIndexOf("\\"));
  return path.slice(i + 1);
}

/** The caption lines under a diagram's legend. */
function captionOf(
  options: CliOptions,
  plan: EvaluationPlan,
  drawn: number,
  total: number,
  celsius: number,
  totals: string,
): string[] {
  const caption = [
    `${total.toLocaleString("en-US")} samples from ${baseName(options.input)}${drawn < total ? ` (${drawn.toLocaleString("en-US")} drawn, chosen at random)` : ""}.`,
    plan.temperatureColumn === null
      ? `Drawn at ${celsius} °C.`
      : `Drawn at ${celsius} °C, the samples' median; each sample's result columns use its own temperature.`,
  ];
  if (plan.ligands.length > 0) {
    caption.push(
      totals === ""
        ? "Drawn in pure water (no sample has ligand totals); each sample's result columns use its own water."
        : `Drawn in water with the samples' median totals (${totals}); each sample's result columns use its own water.`,
    );
  }
  return caption;
}

/** Writes `text` to `file` through a temporary file beside it. */
function writeWhole(file: string, text: string): void {
  const temporary = `${file}.${process.pid}.partial`;
  try {
    writeFileSync(temporary, text, "utf8");
    renameSync(temporary, file);
  } catch (error) {
    try {
      unlinkSync(temporary);
    } catch {
      // not created
    }
    throw error;
  }
}

/** The diagrams of a run: the files written, and why a metal's diagram was not drawn. */
export interface DiagramOutcome {
  readonly files: string[];
  /** One line per metal whose diagram conditions (median temperature and water) the model refuses. */
  readonly notDrawn: string[];
}

/**
 * Draws and writes every metal's diagram. A metal whose median temperature and water the model refuses (e.g. above
 * 100 °C with a ligand whose complexes lack S°) gets no diagram and a line in notDrawn; the others are still drawn.
 * Throws on a failed write.
 */
export function writeDiagrams(
  options: CliOptions,
  plan: EvaluationPlan,
  diagrams: DiagramSamples | null,
): DiagramOutcome {
  const outcome: DiagramOutcome = { files: [], notDrawn: [] };
  if (options.svgDir === null || diagrams === null) return outcome;
  mkdirSync(options.svgDir, { recursive: true });
  const fixed = plan.fixedTemperature ?? DEFAULT_CELSIUS;
  for (const symbol of diagrams.symbols()) {
    const points = diagrams.points(symbol);
    const celsius = plan.temperatureColumn === null ? fixed : diagramCelsius(points, fixed);
    const ligands = diagramTotals(points);
    const caption = captionOf(options, plan, points.length, diagrams.count(symbol), celsius, totalsText(ligands));
    let svg: string;
    try {
      svg = renderDiagram({ element: symbol, celsius, activity: plan.activity, samples: points, caption, ligands });
    } catch (error) {
      if (!(error instanceof SystemError)) throw error;
      outcome.notDrawn.push(
        `no ${symbol} diagram (drawn at the samples' median temperature and water): ${error.message}`,
      );
      continue;
    }
    const file = join(options.svgDir, `diagram-${symbol}.svg`);
    writeWhole(file, svg);
    outcome.files.push(file);
  }
  return outcome;
}

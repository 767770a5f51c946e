/**
 * A batch's samples for the diagrams: each counted row offers one sample per metal with a regime, in file order
 * (the diagrams' random choice depends on the order), and a sample's point is made only when it is kept.
 */
import { DEFAULT_CELSIUS, type LigandTotals } from "../chemistry";
import { isBlank } from "../functions";
import type { DiagramSamples } from "./diagrams";
import type { EvaluationPlan } from "./evaluation-plan";
import type { SampleColumns } from "./sample-columns";
import type { TargetColumns } from "./target-columns";
import type { WaterColumns } from "./water-columns";

/** A point for a diagram: the sample's pH, E vs SHE, its regime and temperature, and the file line. */
export interface SamplePoint {
  readonly symbol: string;
  readonly pH: number;
  readonly E: number;
  readonly regime: string;
  readonly species: string;
  readonly celsius: number;
  readonly line: number;
  /** The row's ligand totals (mol/kg) where it has any. */
  readonly ligands?: LigandTotals;
}

/** A row's ligand totals (mol/kg) where it has any. */
function rowLigands(plan: EvaluationPlan, r: number, ligandArgs: WaterColumns["ligandArgs"]): LigandTotals | undefined {
  let ligands: LigandTotals | undefined;
  for (const l of plan.ligands) {
    const x = ligandArgs[l.ligand]![r];
    if (typeof x === "number" && x > 0) (ligands ??= {})[l.ligand] = x;
  }
  return ligands;
}

/**
 * Offers the samples of a counted row (a converted reading, no error passed on) — the row at `r` in the columns,
 * on file line `line` — one per metal with a regime; DEFAULT_CELSIUS where the temperature is blank.
 */
export function offerRowSamples(
  plan: EvaluationPlan,
  r: number,
  line: number,
  samples: SampleColumns,
  water: WaterColumns,
  perTarget: readonly TargetColumns[],
  diagrams: DiagramSamples,
): void {
  for (const p of perTarget) {
    const regime = p.regime[r];
    const species = p.species[r];
    if (typeof regime !== "string" || regime === "" || typeof species !== "string") continue;
    const symbol = diagrams.offer(p.target.symbol ?? String(p.elements![r]).trim());
    if (symbol === null) continue;
    const tCell = samples.temperatureAt(r);
    const celsius = isBlank(tCell) ? DEFAULT_CELSIUS : Number(tCell);
    const E = samples.eShe[r] as number;
    const point: SamplePoint = { symbol, pH: Number(samples.pH[r]), E, regime, species, celsius, line };
    const ligands = rowLigands(plan, r, water.ligandArgs);
    diagrams.keep(ligands ? { ...point, ligands } : point);
  }
}

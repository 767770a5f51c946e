/**
 * One metal's result columns for a batch: REDOX.SPECIES, the regime read from it (regimes.ts), REDOX.BOUNDARY
 * above and below, and REDOX.DISSOLVED — each function called once per metal over the whole batch, as a worksheet
 * range would call it.
 */
import type { CellInput, CellOutput, CellScalar } from "../functions";
import { answersOf, asRange, textColumn, twoAnswersOf } from "./batch-cells";
import type { EvaluationPlan, MetalTarget } from "./evaluation-plan";
import type { InputRow } from "./record-reader";
import { regimeColumn } from "./regimes";
import type { SampleColumns } from "./sample-columns";
import type { WaterColumns } from "./water-columns";
import type { WorksheetFunctions } from "./worksheet";

/** One metal's result columns: species, regime, the boundaries above and below, and the dissolved amount. */
export interface TargetColumns {
  readonly target: MetalTarget;
  /** Each row's element cell (the per-row metal column), or null for a fixed metal. */
  readonly elements: CellScalar[] | null;
  readonly species: CellOutput[];
  readonly regime: CellOutput[];
  readonly above: CellOutput[];
  readonly below: CellOutput[];
  readonly dissolved: CellOutput[];
}

/** BOUNDARY's direction argument as a 2 × 1 range: above (1) in the first row of the answer, below (−1) in the second. */
const DIRECTIONS: CellScalar[][] = [[1], [-1]];

/** Calls the stability functions once per metal target over the whole batch (as a worksheet range would). */
export function targetColumns(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
  samples: SampleColumns,
  water: WaterColumns,
): TargetColumns[] {
  const n = rows.length;
  const { temperature } = samples;
  const pH = asRange(samples.pH);
  const potential = asRange(samples.potential);
  const arg = (cells: CellScalar[] | undefined): CellInput => (cells === undefined ? undefined : asRange(cells));
  const { carbonate, chloride, sulfur, phosphate } = water.ligandArgs;
  const ionicStrength = water.ionic?.argument;
  // the water arguments in the order every stability function takes them, after element, pH, potential, temperature
  const waterArgs = [arg(carbonate), arg(chloride), arg(sulfur), arg(phosphate), ionicStrength] as const;
  return plan.targets.map((t) => {
    const elements = t.symbol === null ? textColumn(rows, plan.metalColumn as number) : null;
    const element: CellInput = elements === null ? t.symbol : asRange(elements);
    const sample = [element, pH, potential, temperature] as const;
    const species = answersOf(fns.species(...sample, plan.activity, ...waterArgs), n);
    // one BOUNDARY call for both directions: a 2 × 1 direction range broadcasts to the rows above and below
    const [above, below] = twoAnswersOf(fns.boundary(...sample, plan.activity, ...waterArgs, DIRECTIONS), n);
    return {
      target: t,
      elements,
      species,
      regime: regimeColumn(species, elements ?? (t.symbol as string)),
      above,
      below,
      // DISSOLVED has no activity: it is the controlling solid's solubility
      dissolved: answersOf(fns.dissolved(...sample, ...waterArgs, plan.dissolvedUnit), n),
    };
  });
}

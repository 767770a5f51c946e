/**
 * One metal's result columns for a batch: the answers of REDOX.SPECIES, REGIME, BOUNDARY above and below and
 * DISSOLVED, from one REDOX.ASSESS call per metal over the whole batch (as a worksheet range would call it), which
 * works each row out once instead of once per function (tests/unit/assess-columns.test.ts checks its columns against
 * the single functions, row by row).
 */
import type { CellInput, CellOutput, CellScalar } from "../functions";
import { asRange, textColumn } from "./batch-cells";
import type { EvaluationPlan, MetalTarget } from "./evaluation-plan";
import type { InputRow } from "./record-reader";
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

/** Calls ASSESS once per metal target over the whole batch (as a worksheet range would). */
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
    const answers = fns.assess(n, element, pH, potential, temperature, plan.activity, ...waterArgs, plan.dissolvedUnit);
    // DISSOLVED has no activity (it is the controlling solid's solubility): ASSESS's dissolved metal is the same
    return { target: t, elements, ...answers };
  });
}

/**
 * What is decided before the first data row — which column feeds which argument, the fixed arguments, the format —
 * and the header of the results it gives.
 */
import type { CsvFormat } from "./csv-format";
import { IONIC_OUTPUT, type IonicPlan } from "./ionic";
import type { DissolvedUnit, PotentialUnitOption } from "./options";
import type { TemperatureScale } from "../tables";
import { LIGAND_OUTPUT, type LigandInput } from "./water";

/** A metal whose results fill one group of columns: a fixed metal, or the per-row metal column. */
export interface MetalTarget {
  /** Column-name prefix: the symbol ("Fe") or "metal" for the per-row column. */
  readonly prefix: string;
  /** The symbol for a fixed metal; null for the per-row column. */
  readonly symbol: string | null;
}

/** Everything decided before the first data row: which column feeds which argument, and the fixed arguments. */
export interface EvaluationPlan {
  readonly headers: readonly string[];
  readonly phColumn: number;
  readonly potentialColumn: number;
  readonly temperatureColumn: number | null;
  readonly metalColumn: number | null;
  /**
   * Fixed temperature °C given on the command line: every row's without a column, and a blank cell's in one.
   * Undefined: the functions' default without a column, and a blank cell is a missing measurement (blank results).
   */
  readonly fixedTemperature: number | undefined;
  /** Scale of the temperature column's numbers (converted to °C for the functions). */
  readonly temperatureScale: TemperatureScale;
  readonly electrode: string;
  readonly unit: PotentialUnitOption;
  readonly activity: number;
  readonly dissolvedUnit: DissolvedUnit;
  readonly overpotential: number;
  readonly targets: readonly MetalTarget[];
  readonly keepInput: boolean;
  /** Columns feeding the [carbonate], [chloride], [sulfur] arguments (empty: pure water). */
  readonly ligands: readonly LigandInput[];
  /** Where each row's [ionicStrength] comes from (absent: none, ideal solution). */
  readonly ionic?: IonicPlan;
  /** Delimiter, decimal mark, text neutralising and precision of the input and the results. */
  readonly format: CsvFormat;
  /** Whether the batch results carry the sample points for diagrams. */
  readonly diagrams: boolean;
}

export const RESULT_SUFFIXES = ["species", "regime", "boundary_above_V", "boundary_below_V"] as const;

/** Unit as it appears in a column name: ug/L → ug_L. */
export function unitSlug(unit: DissolvedUnit): string {
  return unit.replace("/", "_");
}

/** Whether the results carry an ionic-strength column (a fixed value or a column feeds the functions). */
export function usesIonic(plan: EvaluationPlan): boolean {
  return plan.ionic !== undefined && plan.ionic.kind !== "ideal";
}

/** Header of the results CSV. */
export function outputHeader(plan: EvaluationPlan): string[] {
  const header = plan.keepInput ? [...plan.headers] : [];
  header.push("E_SHE_V", "water_margin_V");
  for (const l of plan.ligands) header.push(LIGAND_OUTPUT[l.ligand]);
  if (usesIonic(plan)) header.push(IONIC_OUTPUT);
  for (const t of plan.targets) {
    for (const s of RESULT_SUFFIXES) header.push(`${t.prefix}_${s}`);
    header.push(`${t.prefix}_dissolved_${unitSlug(plan.dissolvedUnit)}`);
  }
  header.push("errors");
  return header;
}

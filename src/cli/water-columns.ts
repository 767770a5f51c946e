/**
 * The water of a batch: each ligand's argument column and output cells (carbonate from alkalinity through
 * REDOX.DIC with the row's own pH and temperature), then the [ionicStrength] (a fixed value, or a column through
 * ionicStrengthArgument, shared with the pane).
 */
import type { LigandName } from "../chemistry";
import {
  carbonateArg,
  CellError,
  chlorideArg,
  ionicStrengthArgument,
  isBlank,
  mapCells,
  phosphateArg,
  sulfurArg,
  type CellInput,
  type CellOutput,
  type CellScalar,
} from "../functions";
import { IONIC_UNITS } from "../tables";
import { answersOf, asRange, numericColumn } from "./batch-cells";
import type { EvaluationPlan } from "./evaluation-plan";
import { ionicBasis, ionicWords } from "./ionic";
import type { InputRow } from "./record-reader";
import type { SampleColumns } from "./sample-columns";
import type { WorksheetFunctions } from "./worksheet";

const LIGAND_ARG = {
  carbonate: carbonateArg,
  chloride: chlorideArg,
  sulfur: sulfurArg,
  phosphate: phosphateArg,
} as const;

/** A batch's [ionicStrength]: the argument, the output cell and the error passed on of each row, and a unit note. */
export interface IonicColumn {
  readonly argument: CellInput;
  readonly cells: CellOutput[];
  readonly errors: readonly (CellError | null)[];
  readonly note: { readonly arg: string; readonly text: string } | null;
}

/** The water of a batch: ligand and ionic-strength arguments, their output cells, and the errors passed on. */
export interface WaterColumns {
  readonly ligandArgs: Partial<Record<LigandName, CellScalar[]>>;
  readonly ligandCells: CellOutput[][];
  /** REDOX.DIC's errors (carbonate from alkalinity), passed on to every function taking the carbonate. */
  readonly carbonateErrors: (CellError | null)[] | null;
  readonly ionic: IonicColumn | null;
}

/** Each ligand's argument column and output cells (carbonate from alkalinity via REDOX.DIC), then the ionic strength. */
export function waterColumns(
  plan: EvaluationPlan,
  rows: readonly InputRow[],
  fns: WorksheetFunctions,
  samples: SampleColumns,
): WaterColumns {
  const n = rows.length;
  const f = plan.format;
  const { pH, temperature } = samples;
  const ligandArgs: Partial<Record<LigandName, CellScalar[]>> = {};
  const ligandCells: CellOutput[][] = [];
  let carbonateErrors: (CellError | null)[] | null = null;
  for (const l of plan.ligands) {
    const column = numericColumn(rows, l.column, f, l.factor);
    if (l.kind === "alkalinity") {
      const dic = answersOf(fns.dic(asRange(column), asRange(pH), temperature, l.basis ?? "alkalinity"), n);
      carbonateErrors = dic.map((d) => (d instanceof CellError ? d : null));
      ligandArgs.carbonate = dic.map((d) => (d instanceof CellError ? "" : (d as number | string)));
      ligandCells.push(dic);
    } else {
      ligandArgs[l.ligand] = column;
      // the output cell: the total as the functions read it ("" where blank)
      const read = answersOf(
        mapCells([LIGAND_ARG[l.ligand]], [asRange(column)], (x) => x),
        n,
      );
      ligandCells.push(read.map((cell, r) => (isBlank(column[r]) ? "" : cell)));
    }
  }
  const ionic = ionicColumn(plan, rows, fns);
  if (ionic) ligandCells.push(ionic.cells);
  return { ligandArgs, ligandCells, carbonateErrors, ionic };
}

/**
 * The [ionicStrength] of a batch: a fixed value, or a column through ionicStrengthArgument (a stated ionic strength
 * × its unit's factor, or a conductivity or TDS reading through REDOX.IONICSTRENGTH). Blank cells: that row is ideal.
 * ionicStrengthArgument, shared with the pane, takes and gives n × 1 ranges.
 */
function ionicColumn(plan: EvaluationPlan, rows: readonly InputRow[], fns: WorksheetFunctions): IonicColumn | null {
  const ionic = plan.ionic;
  if (ionic === undefined || ionic.kind === "ideal") return null;
  const n = rows.length;
  if (ionic.kind === "fixed") {
    const none = new Array<CellError | null>(n).fill(null);
    return { argument: ionic.value, cells: new Array<CellOutput>(n).fill(ionic.value), errors: none, note: null };
  }
  const { index, unit } = ionic.column;
  const { factor } = IONIC_UNITS[unit];
  const basis = ionicBasis(unit);
  const values = numericColumn(rows, index, plan.format, factor).map((v) => [v]);
  const column = ionicStrengthArgument(values, basis, fns.ionicStrength);
  const note =
    factor === 1
      ? null
      : { arg: basis === null ? "ionicStrength" : "value", text: ` (converted from ${ionicWords(ionic.column)})` };
  return {
    argument: asRange(column.argument.map(([v]) => v)),
    cells: column.cells.map(([c]) => c),
    errors: column.errors,
    note,
  };
}

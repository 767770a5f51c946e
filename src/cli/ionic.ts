/**
 * The ionic strength of each row for the command line: the [ionicStrength] argument of SPECIES, REGIME, BOUNDARY
 * and DISSOLVED (mol/kg; Davies activity coefficients, valid to 0.5 mol/kg).
 *
 * - Found by header (src/tables/ionic-columns.ts): a stated ionic strength wins over a conductivity column, which
 *   wins over a TDS column; the summary says which was used and which were left aside.
 * - Conductivity (µS/cm; mS/cm × 1000, mS/m × 10) and TDS (mg/L; g/L × 1000) go through REDOX.IONICSTRENGTH(value,
 *   "uS/cm" | "mg/L") exactly as a worksheet would chain it; a stated I (mol/kg, mol/L read as mol/kg) goes as is.
 * - --ionic-strength X gives every row X (columns ignored); --ideal (or --pure-water) gives none (γ = 1).
 * - A blank cell is a missing measurement of a correction: the row is answered without it (ideal solution) and a
 *   message says so. The correction moves a boundary by millivolts in fresh water; a blank answer would lose the
 *   row for want of a refinement.
 */
import { IONIC_UNITS, matchIonicColumns, type IonicColumn, type IonicColumnRole, type IonicUnit } from "../tables";
import { UsageError, type CliOptions } from "./options";

/** Where each row's ionic strength comes from. */
export type IonicPlan =
  | { readonly kind: "ideal"; readonly why: string; readonly ignored: readonly IonicColumn[] }
  | { readonly kind: "fixed"; readonly value: number; readonly ignored: readonly IonicColumn[] }
  | { readonly kind: "column"; readonly column: IonicColumn; readonly ignored: readonly IonicColumn[] };

/** Output column of the ionic strength passed to the functions. */
export const IONIC_OUTPUT = "ionic_strength_mol_kg";

const WHAT: Readonly<Record<IonicColumnRole, string>> = {
  ionicStrength: "ionic strength",
  conductivity: "specific conductance",
  tds: "total dissolved solids",
};

/** The basis argument of REDOX.IONICSTRENGTH for a unit, or null for a stated ionic strength. */
export function ionicBasis(unit: IonicUnit): "uS/cm" | "mg/L" | null {
  const basis = IONIC_UNITS[unit].basis;
  return basis === "mol/kg" ? null : basis;
}

/**
 * The ionic strength plan of a file. `taken` holds the columns already used (pH, potential, ligands, …); `find`
 * resolves a column named with --ionic-strength-column.
 */
export function planIonic(
  headers: readonly string[],
  options: CliOptions,
  taken: readonly number[],
  find: (option: string, what: string) => number,
): IonicPlan {
  const found = matchIonicColumns(headers, taken);
  if (options.ideal && options.ionicStrength !== undefined)
    throw new UsageError("--ideal and --ionic-strength contradict each other; give one of them");
  if (options.ideal) return { kind: "ideal", why: "--ideal", ignored: found };
  if (options.pureWater) return { kind: "ideal", why: "--pure-water", ignored: found };
  if (options.ionicStrength !== undefined) return { kind: "fixed", value: options.ionicStrength, ignored: found };
  const named = options.ionicStrengthColumn;
  if (named === null) return { kind: "ideal", why: "--ionic-strength-column none", ignored: found };
  if (named !== undefined) {
    const index = find(named, "--ionic-strength-column");
    if (taken.includes(index))
      throw new UsageError(`--ionic-strength-column: the column "${headers[index]}" already feeds another argument`);
    const own = matchIonicColumns(headers.map((h, i) => (i === index ? h : "")))[0];
    if (own === undefined)
      throw new UsageError(
        `--ionic-strength-column: "${headers[index]}" does not say whether it is a conductivity, a TDS or an ionic strength (name one in its header)`,
      );
    return { kind: "column", column: own, ignored: found.filter((c) => c.index !== index) };
  }
  if (found.length === 0) return { kind: "ideal", why: "no conductivity, TDS or ionic-strength column", ignored: [] };
  return { kind: "column", column: found[0], ignored: found.slice(1) };
}

/** The unit read, in words: "specific conductance in mS/cm". */
export function ionicWords(column: IonicColumn): string {
  return `${WHAT[column.role]} in ${IONIC_UNITS[column.unit].words}`;
}

/** One summary line on the ionic strength used. */
export function ionicSummary(plan: IonicPlan, headers: readonly string[]): string {
  const aside =
    plan.ignored.length === 0 ? "" : `; not used: ${plan.ignored.map((c) => `"${headers[c.index]}"`).join(", ")}`;
  if (plan.kind === "ideal") return `ionic strength: none, ideal solution (${plan.why})${aside}`;
  if (plan.kind === "fixed") return `ionic strength: ${plan.value} mol/kg on every row (--ionic-strength)${aside}`;
  const c = plan.column;
  const basis = ionicBasis(c.unit);
  const how =
    basis === null
      ? "as stated"
      : `REDOX.IONICSTRENGTH(value, "${basis}"), ${basis === "uS/cm" ? "Russell 1976" : "Langelier 1936"}`;
  return `ionic strength: from "${headers[c.index]}" (${ionicWords(c)}; ${how})${aside}`;
}

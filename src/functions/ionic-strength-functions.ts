/**
 * REDOX.IONICSTRENGTH: ionic strength (mol/kg) estimated from specific conductance or total dissolved solids, for
 * the [ionicStrength] argument of the stability functions (src/chemistry/ionic-strength.ts).
 */
import { IonicStrengthBasis, ionicStrengthFrom, MAX_IONIC_STRENGTH } from "../chemistry";
import { mapCells, numberArg, textArg } from "./broadcast";
import { argumentError, CellError, CellInput, CellOutput, CellScalar, isBlank } from "./cell-values";
import { ionicStrengthArg } from "./ligand-args";

const BASES: ReadonlyMap<string, IonicStrengthBasis> = new Map([
  ["us/cm", "uS/cm"],
  ["µs/cm", "uS/cm"],
  ["μs/cm", "uS/cm"],
  ["mg/l", "mg/L"],
]);

const basisArg = textArg<IonicStrengthBasis>("basis", (text) => {
  const found = BASES.get(text.toLowerCase().replace(/\s+/g, ""));
  return (
    found ??
    argumentError("basis", `"${text}" is not "uS/cm" (specific conductance) or "mg/L" (total dissolved solids)`)
  );
});

const measuredArg = numberArg("value", { min: 0 });

export function ionicStrengthAt(value: CellInput, basis: CellInput): CellOutput[][] {
  return mapCells([measuredArg, basisArg], [value, basis], (x, b) => {
    const I = ionicStrengthFrom(x, b);
    if (I > MAX_IONIC_STRENGTH)
      return argumentError(
        "value",
        `${x} ${b} gives I = ${I.toPrecision(3)} mol/kg, above the ${MAX_IONIC_STRENGTH} mol/kg the Davies equation holds to`,
      );
    return I;
  });
}

/** A column of readings turned into the [ionicStrength] argument of the stability functions, row by row. */
export interface IonicStrengthArgument {
  /** The argument: each row's ionic strength, mol/kg ("" = blank cell or error: that row is ideal or passes the error). */
  readonly argument: CellScalar[][];
  /** The ionic strength used per row ("" where blank), or REDOX.IONICSTRENGTH's / the argument's error. */
  readonly cells: CellOutput[][];
  /** Per row: the error to pass on to every function (as a worksheet passes an error cell), or null. */
  readonly errors: (CellError | null)[];
}

/**
 * What a worksheet does with a measured column: =REDOX.IONICSTRENGTH(value, basis) in a helper column fed to
 * [ionicStrength] (basis "uS/cm" or "mg/L"), or the stated ionic strength itself (basis null). A blank reading is a
 * missing measurement of a correction: that row is answered without it (ideal solution). Shared by the command line
 * and the task pane so both chain the functions the same way.
 */
export function ionicStrengthArgument(
  values: readonly (readonly CellScalar[])[],
  basis: IonicStrengthBasis | null,
  ionicStrength: (value: CellInput, basis: CellInput) => CellOutput[][] = ionicStrengthAt,
): IonicStrengthArgument {
  const blank = values.map(([v]) => isBlank(v));
  const computed: CellOutput[][] =
    basis === null
      ? mapCells([ionicStrengthArg], [values as CellScalar[][]], (x) => x)
      : ionicStrength(values as CellScalar[][], basis);
  const cells = computed.map((cell, r) => (blank[r] ? [""] : cell));
  const errors = cells.map(([c]) => (c instanceof CellError ? c : null));
  // a stated value goes to the functions as written, so their own message names [ionicStrength]
  const argument =
    basis === null ? values.map(([v]) => [v]) : cells.map(([c]) => [c instanceof CellError ? "" : (c as CellScalar)]);
  return { argument, cells, errors: basis === null ? errors.map(() => null) : errors };
}

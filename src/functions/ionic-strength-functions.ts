/**
 * REDOX.IONICSTRENGTH: ionic strength (mol/kg) estimated from specific conductance or total dissolved solids, for
 * the [ionicStrength] argument of the stability functions (src/chemistry/ionic-strength.ts).
 */
import { MAX_IONIC_STRENGTH } from "../chemistry/activity-coefficients";
import { ionicStrengthFrom, IonicStrengthBasis } from "../chemistry/ionic-strength";
import { mapCells, numberArg, textArg } from "./broadcast";
import { CellInput, CellOutput, valueError } from "./cell-values";

const BASES: ReadonlyMap<string, IonicStrengthBasis> = new Map([
  ["us/cm", "uS/cm"],
  ["µs/cm", "uS/cm"],
  ["μs/cm", "uS/cm"],
  ["mg/l", "mg/L"],
]);

const basisArg = textArg<IonicStrengthBasis>("basis", (text) => {
  const found = BASES.get(text.toLowerCase().replace(/\s+/g, ""));
  return (
    found ?? valueError(`basis: "${text}" is not "uS/cm" (specific conductance) or "mg/L" (total dissolved solids)`)
  );
});

const measuredArg = numberArg("value", { min: 0 });

export function ionicStrengthAt(value: CellInput, basis: CellInput): CellOutput[][] {
  return mapCells([measuredArg, basisArg], [value, basis], (x, b) => {
    const I = ionicStrengthFrom(x, b);
    if (I > MAX_IONIC_STRENGTH)
      return valueError(
        `value: ${x} ${b} gives I = ${I.toPrecision(3)} mol/kg, above the ${MAX_IONIC_STRENGTH} mol/kg the Davies equation holds to`,
      );
    return I;
  });
}

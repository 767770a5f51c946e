/**
 * Optional water arguments shared by SPECIES, REGIME, BOUNDARY and DISSOLVED: [carbonate], [chloride], [sulfur] in
 * mol/kg (blank or 0 = absent) and [ionicStrength] in mol/kg (blank or 0 = ideal dilute solution, γ = 1).
 */
import { MAX_IONIC_STRENGTH } from "../chemistry/activity-coefficients";
import { MAX_LIGAND_TOTAL } from "../chemistry/ligand-system";
import { ArgSpec, numberArg } from "./broadcast";
import { CellError, valueError } from "./cell-values";

/** A number argument whose out-of-range values are #VALUE! (the user's input), with the given message. */
function rangeAsValueError(spec: ArgSpec<number>, message: (x: unknown) => string): ArgSpec<number> {
  return {
    ...spec,
    parse(value) {
      const parsed = spec.parse(value);
      return parsed instanceof CellError && parsed.code === "#NUM!" ? valueError(message(value)) : parsed;
    },
  };
}

const totalArg = (name: string) =>
  rangeAsValueError(numberArg(name, { min: 0, max: MAX_LIGAND_TOTAL, unit: "mol/kg", optional: true, defaultValue: 0 }), (x) => `${name}: ${x} is outside 0–${MAX_LIGAND_TOTAL} mol/kg`);

export const carbonateArg = totalArg("carbonate");
export const chlorideArg = totalArg("chloride");
export const sulfurArg = totalArg("sulfur");

export const ionicStrengthArg = rangeAsValueError(
  numberArg("ionicStrength", { min: 0, max: MAX_IONIC_STRENGTH, unit: "mol/kg", optional: true, defaultValue: 0 }),
  (x) => `ionicStrength: ${x} mol/kg is outside 0–${MAX_IONIC_STRENGTH} mol/kg, the range of the Davies equation (REDOX.IONICSTRENGTH estimates it from conductivity or TDS)`,
);

/**
 * Optional water arguments shared by SPECIES, REGIME, BOUNDARY and DISSOLVED: [carbonate], [chloride], [sulfur],
 * [phosphate] (as P) in mol/kg (blank or 0 = absent) and [ionicStrength] in mol/kg (blank or 0 = ideal dilute solution, γ = 1).
 */
import { MAX_IONIC_STRENGTH, MAX_LIGAND_TOTAL } from "../chemistry";
import { ArgSpec, numberArg } from "./broadcast";
import { CellError, valueError } from "./cell-values";

/** A number argument whose error messages (#VALUE!, the user's input) end with `hint`. */
function withHint(spec: ArgSpec<number>, hint: string): ArgSpec<number> {
  return {
    ...spec,
    parse(value) {
      const parsed = spec.parse(value);
      return parsed instanceof CellError ? valueError(parsed.message + hint, parsed.argument) : parsed;
    },
  };
}

const totalArg = (name: string) =>
  numberArg(name, { min: 0, max: MAX_LIGAND_TOTAL, unit: "mol/kg", optional: true, defaultValue: 0 });

export const carbonateArg = totalArg("carbonate");
export const chlorideArg = totalArg("chloride");
export const sulfurArg = totalArg("sulfur");
/** Total orthophosphate, mol/kg as P (REDOX functions take it between sulfur and ionicStrength). */
export const phosphateArg = totalArg("phosphate");

export const ionicStrengthArg = withHint(
  numberArg("ionicStrength", { min: 0, max: MAX_IONIC_STRENGTH, unit: "mol/kg", optional: true, defaultValue: 0 }),
  `: the Davies equation holds up to about ${MAX_IONIC_STRENGTH} mol/kg (REDOX.IONICSTRENGTH estimates I from conductivity or TDS)`,
);

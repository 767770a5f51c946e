/**
 * REDOX.DIC: total dissolved inorganic carbon (mol/kg) from total alkalinity (mg/L as CaCO3), pH and temperature —
 * the number to give the [carbonate] argument of the stability functions. Chemistry in src/chemistry/alkalinity.ts.
 */
import { AlkalinityProblem, dicOrProblem } from "../chemistry";
import { mapCells, numberArg } from "./broadcast";
import { argumentError, argumentNotAvailable, CellInput, CellOutput } from "./cell-values";
import { pHArg, temperatureArg } from "./common-args";

/** Total alkalinity, mg/L as CaCO3: ≥ 0; 100 000 mg/L (2 eq/L) is far beyond any natural or process water. */
const alkalinityArg = numberArg("alkalinity", { min: 0, max: 100000, unit: "mg/L as CaCO3" });

/** Highest temperature of the carbonic-acid fits as this function has always accepted them, °C (fitted 0–90 °C at 1 atm). */
const CARBONIC_MAX_CELSIUS = 100;

export function dicAt(alkalinity: CellInput, pH: CellInput, temperature?: CellInput): CellOutput[][] {
  return mapCells([alkalinityArg, pHArg, temperatureArg], [alkalinity, pH, temperature], (alk, p, t) => {
    if (t > CARBONIC_MAX_CELSIUS)
      return argumentError(
        "temperature",
        `${t} °C is outside 0 to ${CARBONIC_MAX_CELSIUS} °C, the range of the carbonic-acid constants (Plummer & Busenberg 1982)`,
      );
    const dic = dicOrProblem(alk, p, t);
    // valid inputs with no DIC (below the end point, or more hydroxide than alkalinity): no answer exists
    return dic instanceof AlkalinityProblem ? argumentNotAvailable("alkalinity, pH", dic.message) : dic;
  });
}

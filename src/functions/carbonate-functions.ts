/**
 * REDOX.DIC: total dissolved inorganic carbon (mol/kg) from total alkalinity (mg/L as CaCO3) — or, with basis
 * "bicarbonate", from bicarbonate (mg/L as HCO3−) — pH and temperature: the number to give the [carbonate] argument
 * of the stability functions. Chemistry in src/chemistry/alkalinity.ts.
 */
import { AlkalinityProblem, dicFromReadingOrProblem, type DicBasis } from "../chemistry";
import { mapCells, numberArg, textArg } from "./broadcast";
import { argumentError, argumentNotAvailable, CellInput, CellOutput } from "./cell-values";
import { pHArg, temperatureArg } from "./common-args";

/** Total alkalinity, mg/L as CaCO3: ≥ 0; 100 000 mg/L (2 eq/L) is far beyond any natural or process water. */
const alkalinityArg = numberArg("alkalinity", { min: 0, max: 100000, unit: "mg/L as CaCO3" });

/** Highest temperature of the carbonic-acid fits as this function has always accepted them, °C (fitted 0–90 °C at 1 atm). */
const CARBONIC_MAX_CELSIUS = 100;

const basisArg = textArg<DicBasis>(
  "basis",
  (text) => {
    const word = text.trim().toLowerCase();
    if (word === "alkalinity" || word === "bicarbonate") return word;
    return argumentError("basis", `"${text}" is not "alkalinity" (mg/L as CaCO3) or "bicarbonate" (mg/L as HCO3−)`);
  },
  { optional: true, defaultValue: "alkalinity" },
);

export function dicAt(
  alkalinity: CellInput,
  pH: CellInput,
  temperature?: CellInput,
  basis?: CellInput,
): CellOutput[][] {
  const args = [alkalinityArg, pHArg, temperatureArg, basisArg] as const;
  return mapCells([...args], [alkalinity, pH, temperature, basis], (alk, p, t, b) => {
    if (t > CARBONIC_MAX_CELSIUS)
      return argumentError(
        "temperature",
        `${t} °C is outside 0 to ${CARBONIC_MAX_CELSIUS} °C, the range of the carbonic-acid constants (Plummer & Busenberg 1982)`,
      );
    const dic = dicFromReadingOrProblem(alk, b, p, t);
    // valid inputs with no DIC (below the end point, or more hydroxide than alkalinity): no answer exists
    return dic instanceof AlkalinityProblem ? argumentNotAvailable("alkalinity, pH", dic.message) : dic;
  });
}

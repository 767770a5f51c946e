/**
 * Dissolved inorganic carbon from total alkalinity and pH (the numbers a water laboratory reports).
 *
 * Total alkalinity, charge balance of the proton acceptors (e.g. Stumm & Morgan, Aquatic Chemistry, 3rd ed. 1996,
 * §4.5):   Alk = [HCO3−] + 2[CO3²−] + [OH−] − [H+]
 * With the fractions of the carbonate species α1 = K1·h / D, α2 = K1·K2 / D, D = h² + K1·h + K1·K2 (h = 10^−pH):
 *
 *   DIC = (Alk − Kw/h + h) / (α1 + 2·α2)
 *
 * Approximations, stated: ideal dilute solution (activity coefficients 1, so mol/L ≈ mol/kg and the measured pH is
 * taken as −log [H+]); other proton acceptors (borate, silicate, phosphate, organic acids) counted as carbonate.
 * Alkalinity in mg/L as CaCO3 (the utility unit): 1 meq/L = 50.04 mg/L as CaCO3 (half the molar mass of CaCO3,
 * 100.087 g/mol). K1, K2 from Plummer & Busenberg (1982) (carbonic-acid.ts); Kw from IAPWS R11-07 (water.ts).
 *
 * A laboratory may report bicarbonate (HCO3−, mg/L) instead (German analyses list "Hydrogencarbonat"): with the
 * same approximations, DIC = [HCO3−] / α1 at the pH (dicFromBicarbonateOrProblem).
 */
import { DEFAULT_CELSIUS } from "./domain";
import { carbonicPK1, carbonicPK2 } from "./carbonic-acid";
import type { Database } from "./database";
import { pKw } from "./water";

/** Grams of CaCO3 per equivalent: ½ × 100.087 g/mol (IUPAC atomic weights; common practice for "as CaCO3"). */
export const CACO3_GRAMS_PER_EQUIVALENT = 100.087 / 2;

/**
 * pH of the total-alkalinity titration end point (about 4.5; common practice, e.g. Standard Methods 2320). A
 * sample already below it has no total alkalinity, so an alkalinity reported with such a pH cannot be carbonate.
 */
export const ALKALINITY_END_POINT_PH = 4.5;

export class AlkalinityError extends Error {}

/** Why an alkalinity and pH give no DIC, as a value (no stack trace is captured). */
export class AlkalinityProblem {
  constructor(readonly message: string) {}
}

/** Total alkalinity (mg/L as CaCO3) → equivalents per kg (dilute water, 1 L ≈ 1 kg). */
export function alkalinityEquivalents(mgPerLitreAsCaCO3: number): number {
  return mgPerLitreAsCaCO3 / (CACO3_GRAMS_PER_EQUIVALENT * 1000);
}

/**
 * Total dissolved inorganic carbon (mol/kg) from total alkalinity (mg/L as CaCO3), pH and temperature (°C), or an
 * AlkalinityProblem (not thrown: a log can hold thousands of such rows) when the carbonate alkalinity
 * Alk − [OH−] + [H+] is not positive (hydroxide alone exceeds the total alkalinity): no carbonate water matches that
 * pair of numbers; and below the titration end point (pH < 4.5), where DIC is not determined by alkalinity
 * (α1 + 2α2 → 0 and the quotient grows without bound).
 */
export function dicOrProblem(alkalinityMgL: number, pH: number, celsius = DEFAULT_CELSIUS): number | AlkalinityProblem {
  if (pH < ALKALINITY_END_POINT_PH) {
    return new AlkalinityProblem(
      `pH ${pH} is below the alkalinity end point (${ALKALINITY_END_POINT_PH}): alkalinity does not determine DIC there`,
    );
  }
  const h = 10 ** -pH;
  const k1 = 10 ** -carbonicPK1(celsius);
  const k2 = 10 ** -carbonicPK2(celsius);
  const oh = 10 ** -pKw(celsius) / h;
  const carbonateAlkalinity = alkalinityEquivalents(alkalinityMgL) - oh + h;
  if (!(carbonateAlkalinity > 0)) {
    return new AlkalinityProblem(
      `the carbonate alkalinity is not positive at pH ${pH} (hydroxide exceeds the total alkalinity)`,
    );
  }
  const d = h * h + k1 * h + k1 * k2;
  const alpha1 = (k1 * h) / d;
  const alpha2 = (k1 * k2) / d;
  return carbonateAlkalinity / (alpha1 + 2 * alpha2);
}

/** Grams of HCO3− per mole: 1.008 + 12.011 + 3 × 15.999 (IUPAC standard atomic weights, abridged; common practice). */
export const HCO3_GRAMS_PER_MOLE = 61.016;

/** Below this α1 (the fraction of DIC that is HCO3−) a bicarbonate reading says too little of the carbonate. */
const LEAST_BICARBONATE_FRACTION = 1e-3;

/**
 * Total dissolved inorganic carbon (mol/kg) from bicarbonate (mg/L as HCO3−), pH and temperature (°C): DIC = [HCO3−]/α1,
 * α1 = K1·h/(h² + K1·h + K1·K2); an AlkalinityProblem where α1 < 10⁻³ (far below pK1 or above pK2, where the
 * bicarbonate reading would carry the carbonate total by a factor over a thousand).
 */
export function dicFromBicarbonateOrProblem(
  bicarbonateMgL: number,
  pH: number,
  celsius = DEFAULT_CELSIUS,
): number | AlkalinityProblem {
  const h = 10 ** -pH;
  const k1 = 10 ** -carbonicPK1(celsius);
  const k2 = 10 ** -carbonicPK2(celsius);
  const alpha1 = (k1 * h) / (h * h + k1 * h + k1 * k2);
  if (!(alpha1 >= LEAST_BICARBONATE_FRACTION))
    return new AlkalinityProblem(
      `at pH ${pH} bicarbonate is ${alpha1.toPrecision(2)} of the dissolved carbonate: it does not determine DIC there`,
    );
  return bicarbonateMgL / (HCO3_GRAMS_PER_MOLE * 1000) / alpha1;
}

/** What a carbonate reading measures: total alkalinity (mg/L as CaCO3) or bicarbonate (mg/L as HCO3−). */
export type DicBasis = "alkalinity" | "bicarbonate";

/** DIC (mol/kg) from a reading on its basis, pH and temperature, or the AlkalinityProblem why none exists. */
export function dicFromReadingOrProblem(
  reading: number,
  basis: DicBasis,
  pH: number,
  celsius = DEFAULT_CELSIUS,
): number | AlkalinityProblem {
  return basis === "bicarbonate"
    ? dicFromBicarbonateOrProblem(reading, pH, celsius)
    : dicOrProblem(reading, pH, celsius);
}

/** dicOrProblem that throws AlkalinityError with the problem's message. */
export function dicFromAlkalinity(
  alkalinityMgL: number,
  pH: number,
  celsius = DEFAULT_CELSIUS,
  _db?: Database,
): number {
  // _db kept for callers: Kw comes from IAPWS R11-07, not from the records
  const dic = dicOrProblem(alkalinityMgL, pH, celsius);
  if (dic instanceof AlkalinityProblem) throw new AlkalinityError(dic.message);
  return dic;
}

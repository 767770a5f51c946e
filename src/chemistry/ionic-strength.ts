/**
 * Ionic strength estimated from what a lab measures, for dilute natural and drinking waters:
 *   from specific conductance  I ≈ 1.6·10⁻⁵·SC   (SC in µS/cm at 25 °C; Russell, L.L., Chemistry of oilfield waters,
 *   1976, as quoted in Snoeyink & Jenkins, Water Chemistry, 1980 — from memory)
 *   from total dissolved solids I ≈ 2.5·10⁻⁵·TDS (TDS in mg/L; Langelier, W.F., J. AWWA 28, 1500 (1936))
 * Both are empirical and good to perhaps ±30 % in ordinary fresh waters.
 */

export type IonicStrengthBasis = "uS/cm" | "mg/L";

/** Factors from the measured value to ionic strength, mol/kg. */
export const IONIC_STRENGTH_FACTORS: Readonly<Record<IonicStrengthBasis, number>> = { "uS/cm": 1.6e-5, "mg/L": 2.5e-5 };

/** Ionic strength (mol/kg) from a specific conductance (µS/cm) or TDS (mg/L). */
export function ionicStrengthFrom(value: number, basis: IonicStrengthBasis): number {
  return value * IONIC_STRENGTH_FACTORS[basis];
}

/**
 * Physical constants, CODATA 2018 exact or recommended values
 * (Tiesinga, Mohr, Newell & Taylor, "CODATA recommended values of the fundamental physical constants: 2018",
 * Rev. Mod. Phys. 93, 025010 (2021)). Since the 2019 SI redefinition R and F are exact products of exact constants.
 */

/** Molar gas constant R = N_A·k, J mol⁻¹ K⁻¹ (exact). */
export const GAS_CONSTANT = 8.314462618;
/** Faraday constant F = N_A·e, C mol⁻¹ (exact). */
export const FARADAY = 96485.33212;
/** Standard reference temperature T0 = 298.15 K (25 °C). */
export const T0 = 298.15;
/** Offset between the Celsius and Kelvin scales. */
export const ZERO_CELSIUS = 273.15;
/** Natural logarithm of 10. */
export const LN10 = Math.LN10;

/** Lowest and highest temperature accepted, °C: liquid water at 1 atm below 100 °C, on the saturation curve above (water-properties.ts). */
export const MIN_CELSIUS = 0;
export const MAX_CELSIUS = 300;

/** Celsius → kelvin. */
export function kelvin(celsius: number): number {
  return celsius + ZERO_CELSIUS;
}

/**
 * Nernst factor k(T) = RT ln10 / F, volts per decade of activity ratio (0.059159 V at 25 °C).
 */
export function nernstFactor(kelvinT: number): number {
  return (GAS_CONSTANT * kelvinT * LN10) / FARADAY;
}

/**
 * Carbonic acid constants as functions of temperature, from the fits of Plummer, L.N., Busenberg, E., "The
 * solubilities of calcite, aragonite and vaterite in CO2–H2O solutions between 0 and 90 °C, and an evaluation of
 * the aqueous model for the system CaCO3–CO2–H2O", Geochim. Cosmochim. Acta 46, 1011 (1982), Table 4 (coefficients
 * from memory; they reproduce the paper's 25 °C values pKH 1.468, pK1 6.352, pK2 10.329):
 *
 *   log K = a + b·T + c/T + d·log10 T + e/T²,   T in kelvin, valid 0–90 °C at 1 atm
 *
 *   KH   CO2(g) = CO2(aq)                 (CO2(aq) stands for H2CO3*)
 *   K1   CO2(aq) + H2O = H+ + HCO3−
 *   K2   HCO3− = H+ + CO3²−
 *
 * The engine's carbonate species records (data/species/carbonate.json) reproduce these fits within 0.015 from 5 to
 * 60 °C; the fits are used directly where a function is documented to follow them (REDOX.DIC).
 */
import { DEFAULT_CELSIUS } from "./domain";
import { kelvin } from "./constants";

interface Fit {
  readonly a: number;
  readonly b: number;
  readonly c: number;
  readonly d: number;
  readonly e: number;
}

const HENRY: Fit = { a: 108.3865, b: 0.01985076, c: -6919.53, d: -40.45154, e: 669365 };
const FIRST: Fit = { a: -356.3094, b: -0.06091964, c: 21834.37, d: 126.8339, e: -1684915 };
const SECOND: Fit = { a: -107.8871, b: -0.03252849, c: 5151.79, d: 38.92561, e: -563713.9 };

function evaluate(fit: Fit, celsius: number): number {
  const T = kelvin(celsius);
  return fit.a + fit.b * T + fit.c / T + fit.d * Math.log10(T) + fit.e / (T * T);
}

/** log10 KH of CO2(g) = CO2(aq), mol/(kg·bar), at `celsius`. */
export function logHenryCO2(celsius = DEFAULT_CELSIUS): number {
  return evaluate(HENRY, celsius);
}

/** pK1 of CO2(aq) + H2O = H+ + HCO3− at `celsius`. */
export function carbonicPK1(celsius = DEFAULT_CELSIUS): number {
  return -evaluate(FIRST, celsius);
}

/** pK2 of HCO3− = H+ + CO3²− at `celsius`. */
export function carbonicPK2(celsius = DEFAULT_CELSIUS): number {
  return -evaluate(SECOND, celsius);
}

/**
 * Activity coefficients of charged species at an ionic strength, by the Davies equation (Davies, C.W., Ion
 * Association, Butterworths, London, 1962):
 *
 *   log10 γ = −A(T)·z²·( √I / (1 + √I) − 0.3·I ),   valid up to about I = 0.5 mol/kg
 *
 * with the Debye–Hückel constant A(T) = 1.82483·10⁶·√ρ / (ε·T)^{3/2} (ρ in g/cm³, T in kelvin; e.g. Stumm, W.,
 * Morgan, J.J., Aquatic Chemistry, 3rd ed., Wiley 1996, ch. 3), from the density and dielectric constant of liquid
 * water at its pressure (water-properties.ts: 1 atm below 100 °C, the saturation curve from 100 °C to 300 °C).
 * Neutral species keep γ = 1.
 */
import { DEFAULT_CELSIUS } from "./domain";
import { kelvin } from "./constants";
import { liquidDensity, liquidDielectric } from "./water-properties";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { exp, sqrt, LN10 } = Math;

/** Largest ionic strength the Davies equation is used at, mol/kg (common practice: about 0.5). */
export const MAX_IONIC_STRENGTH = 0.5;

/** Debye–Hückel A(T), kg^½·mol^−½ (0.509 at 25 °C), from the liquid's density and permittivity at its pressure (water-properties.ts). */
export function debyeHuckelA(celsius: number): number {
  const et = liquidDielectric(celsius) * kelvin(celsius);
  return (1.82483e6 * sqrt(liquidDensity(celsius))) / (et * sqrt(et));
}

/** Natural logarithm of γ for a singly charged ion (multiply by z² for charge z), Davies equation. */
export function lnGammaUnitCharge(ionicStrength: number, celsius: number): number {
  return ionicStrength > 0 ? lnGammaWithA(ionicStrength, debyeHuckelA(celsius)) : 0;
}

/** The same with A(T) given (callers that keep A for a temperature). */
export function lnGammaWithA(ionicStrength: number, A: number): number {
  if (!(ionicStrength > 0)) return 0;
  const root = sqrt(ionicStrength);
  return -LN10 * A * (root / (1 + root) - 0.3 * ionicStrength);
}

/** γ of an ion of charge z at ionic strength I (mol/kg) and t °C, Davies equation. */
export function daviesGamma(charge: number, ionicStrength: number, celsius = DEFAULT_CELSIUS): number {
  return exp(charge * charge * lnGammaUnitCharge(ionicStrength, celsius));
}

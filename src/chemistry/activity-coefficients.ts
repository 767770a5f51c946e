/**
 * Activity coefficients of charged species at an ionic strength, by the Davies equation (Davies, C.W., Ion
 * Association, Butterworths, London, 1962):
 *
 *   log10 γ = −A(T)·z²·( √I / (1 + √I) − 0.3·I ),   valid up to about I = 0.5 mol/kg
 *
 * with the Debye–Hückel constant A(T) = 1.82483·10⁶·√ρ / (ε·T)^{3/2} (ρ in g/cm³, T in kelvin; e.g. Stumm, W.,
 * Morgan, J.J., Aquatic Chemistry, 3rd ed., Wiley 1996, ch. 3), from the dielectric constant of water of Malmberg,
 * C.G., Maryott, A.A., J. Res. Natl. Bur. Stand. 56, 1 (1956) and the density of water of Kell, G.S., J. Chem.
 * Eng. Data 20, 97 (1975) (both fits from memory). Neutral species keep γ = 1.
 */
import { kelvin } from "./constants";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { exp, sqrt, LN10 } = Math;

/** Largest ionic strength the Davies equation is used at, mol/kg (common practice: about 0.5). */
export const MAX_IONIC_STRENGTH = 0.5;

/** Relative permittivity of liquid water at t °C (Malmberg & Maryott 1956, 0–100 °C). */
export function waterDielectric(celsius: number): number {
  const t = celsius;
  return 87.74 + t * (-0.40008 + t * (9.398e-4 + t * -1.41e-6));
}

/** Density of liquid water at 1 atm, g/cm³ (Kell 1975, 0–150 °C). */
export function waterDensity(celsius: number): number {
  const t = celsius;
  const numerator =
    999.83952 + t * (16.945176 + t * (-7.9870401e-3 + t * (-46.170461e-6 + t * (105.56302e-9 + t * -280.54253e-12))));
  return numerator / (1 + 16.87985e-3 * t) / 1000;
}

/** Debye–Hückel A(T), kg^½·mol^−½ (0.509 at 25 °C). */
export function debyeHuckelA(celsius: number): number {
  const et = waterDielectric(celsius) * kelvin(celsius);
  return (1.82483e6 * sqrt(waterDensity(celsius))) / (et * sqrt(et));
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
export function daviesGamma(charge: number, ionicStrength: number, celsius = 25): number {
  return exp(charge * charge * lnGammaUnitCharge(ionicStrength, celsius));
}

/**
 * The pe scale: pe = −log10 a(e−) = F·Eh / (RT ln10), so that Eh = pe·k(T) with k(T) = RT ln10 / F
 * (e.g. Stumm & Morgan, Aquatic Chemistry, 3rd ed. 1996, ch. 8). Eh in volts vs SHE, temperature in °C.
 */
import { DEFAULT_CELSIUS } from "./domain";
import { kelvin, nernstFactor } from "./constants";

/** pe from Eh (V vs SHE). */
export function peFromEh(potential: number, celsius = DEFAULT_CELSIUS): number {
  return potential / nernstFactor(kelvin(celsius));
}

/** Eh (V vs SHE) from pe. */
export function ehFromPe(pe: number, celsius = DEFAULT_CELSIUS): number {
  return pe * nernstFactor(kelvin(celsius));
}

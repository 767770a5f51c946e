/**
 * Worksheet functions for water and the redox scale: WATERLINE, WATERMARGIN, PE, EH, NEUTRALPH and SLOPE
 * (README). Thin adapters: arguments are read and broadcast by broadcast.ts, the answers come from
 * src/chemistry/water.ts, pe.ts and constants.ts. Temperatures in °C, potentials in V vs SHE.
 */
import {
  ehFromPe,
  kelvin,
  nernstFactor,
  neutralPH,
  ownEntry,
  peFromEh,
  WaterGas,
  waterLine,
  waterMargin,
} from "../chemistry";
import { mapCells, numberArg, textArg } from "./broadcast";
import { argumentError, argumentNotAvailable, CellInput, CellOutput } from "./cell-values";
import { pHArg, potentialArg, temperatureArg } from "./common-args";

const GAS_NAMES: Readonly<Record<string, WaterGas>> = { o2: "O2", oxygen: "O2", h2: "H2", hydrogen: "H2" };

/** "O2" (default) or "H2", case-insensitive; "oxygen" and "hydrogen" too. */
export const gasArg = textArg<WaterGas>(
  "gas",
  (text) =>
    ownEntry(GAS_NAMES, text.toLowerCase().replace(/\(g\)$/, "")) ??
    argumentError("gas", `expected "O2" or "H2", got "${text.slice(0, 24)}"`),
  { optional: true, defaultValue: "O2" },
);
/** Partial pressure of the gas in bar, > 0, default 1. */
export const pressureArg = numberArg("pressure", {
  min: 0,
  minExclusive: true,
  optional: true,
  defaultValue: 1,
  unit: "bar",
});
/** Extra width (V, ≥ 0) added beyond each water line; default 0 (the thermodynamic window). */
export const overpotentialArg = numberArg("overpotential", { min: 0, optional: true, defaultValue: 0, unit: "V" });
const peArg = numberArg("pe");

/** REDOX.WATERLINE(pH, [temperature], [gas], [pressure]) → V vs SHE. */
export function waterLineAt(
  pH: CellInput,
  temperature?: CellInput,
  gas?: CellInput,
  pressure?: CellInput,
): CellOutput[][] {
  return mapCells([pHArg, temperatureArg, gasArg, pressureArg], [pH, temperature, gas, pressure], (p, t, g, bar) =>
    waterLine(p, t, g, bar),
  );
}

/** REDOX.WATERMARGIN(pH, potential, [temperature], [overpotential]) → signed distance in V. */
export function waterMarginAt(
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  overpotential?: CellInput,
): CellOutput[][] {
  return mapCells(
    [pHArg, potentialArg(), temperatureArg, overpotentialArg],
    [pH, potential, temperature, overpotential],
    (p, e, t, eta) => waterMargin(p, e, t, eta),
  );
}

/** REDOX.PE(potential, [temperature]) → pe. */
export function peAt(potential: CellInput, temperature?: CellInput): CellOutput[][] {
  return mapCells([potentialArg(), temperatureArg], [potential, temperature], (e, t) => {
    const x = peFromEh(e, t);
    return Number.isFinite(x) ? x : argumentNotAvailable("potential", `${e} V has no finite pe`);
  });
}

/** REDOX.EH(pe, [temperature]) → V vs SHE. */
export function ehAt(pe: CellInput, temperature?: CellInput): CellOutput[][] {
  return mapCells([peArg, temperatureArg], [pe, temperature], (x, t) => {
    const e = ehFromPe(x, t);
    return Number.isFinite(e) ? e : argumentError("pe", `${x} is too large to express as a potential`);
  });
}

/** REDOX.NEUTRALPH([temperature]) → ½ pKw(T). */
export function neutralPHAt(temperature?: CellInput): CellOutput[][] {
  return mapCells([temperatureArg], [temperature], (t) => neutralPH(t));
}

/** REDOX.SLOPE([temperature]) → RT ln10 / F in V per decade. */
export function slopeAt(temperature?: CellInput): CellOutput[][] {
  return mapCells([temperatureArg], [temperature], (t) => nernstFactor(kelvin(t)));
}

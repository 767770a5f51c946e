/**
 * Worksheet functions between reference electrode scales: TOSHE and FROMSHE (GUIDE §3). Arguments are read and
 * broadcast by broadcast.ts; the electrode potentials come from src/chemistry/electrodes.ts.
 */
import { Electrode, getElectrodes, inRange } from "../chemistry/electrodes";
import { mapCells, numberArg, textArg } from "./broadcast";
import { CellError, CellInput, CellOutput, valueError } from "./cell-values";
import { potentialArg, temperatureArg } from "./common-args";

/** A reference electrode by name or alias, case-insensitive ("SCE", "Ag/AgCl 3M", "copper sulfate"). */
export const electrodeArg = textArg<Electrode>("electrode", (text) => {
  const found = getElectrodes().lookup(text);
  return "error" in found ? valueError(`electrode: ${found.error}`) : found.electrode;
});
/** pH of the solution, needed only by RHE; no default. */
const electrodePHArg = numberArg("pH", { min: -2, max: 16, optional: true });

/** Potential of `electrode` vs SHE at the conditions, or the error naming what is missing or out of range. */
function electrodePotential(electrode: Electrode, celsius: number, pH: number | undefined): number | CellError {
  if (!inRange(electrode, celsius)) {
    const [low, high] = electrode.validCelsius;
    return valueError(`temperature: ${celsius} °C is outside the published range of ${electrode.id} (${low} to ${high} °C)`);
  }
  if (electrode.needsPH && pH === undefined) return valueError(`pH: ${electrode.id} needs the pH of the solution`);
  return getElectrodes().potential(electrode, celsius, pH);
}

/** REDOX.TOSHE(reading, electrode, [temperature], [pH]) → V vs SHE. */
export function toSHEAt(reading: CellInput, electrode: CellInput, temperature?: CellInput, pH?: CellInput): CellOutput[][] {
  return mapCells([potentialArg("reading"), electrodeArg, temperatureArg, electrodePHArg], [reading, electrode, temperature, pH], (r, el, t, p) => {
    const offset = electrodePotential(el, t, p);
    return offset instanceof CellError ? offset : r + offset;
  });
}

/** REDOX.FROMSHE(potential, electrode, [temperature], [pH]) → V vs the electrode. */
export function fromSHEAt(potential: CellInput, electrode: CellInput, temperature?: CellInput, pH?: CellInput): CellOutput[][] {
  return mapCells([potentialArg(), electrodeArg, temperatureArg, electrodePHArg], [potential, electrode, temperature, pH], (e, el, t, p) => {
    const offset = electrodePotential(el, t, p);
    return offset instanceof CellError ? offset : e - offset;
  });
}

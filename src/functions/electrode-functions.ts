/**
 * Worksheet functions between reference electrode scales: TOSHE and FROMSHE. Arguments are read and broadcast by
 * broadcast.ts; the electrode potentials come from src/chemistry/electrodes.ts. Readings may be in V (default) or
 * mV (`unit`); potentials vs SHE are always in V.
 */
import { Electrode, getElectrodes, inRange, MAX_POTENTIAL, ownEntry, PH_MAX, PH_MIN } from "../chemistry";
import { mapCells, numberArg, textArg } from "./broadcast";
import { argumentError, CellError, CellInput, CellOutput, valueError } from "./cell-values";
import { potentialArg, potentialMessage, temperatureArg } from "./common-args";

/** A reference electrode by name or alias, case-insensitive ("SCE", "AgCl-3M", "copper sulfate"). */
export const electrodeArg = textArg<Electrode>("electrode", (text) => {
  const found = getElectrodes().lookup(text);
  return "error" in found ? argumentError("electrode", found.error) : found.electrode;
});
/** pH of the solution, needed only by RHE; no default, and a blank cell is a missing measurement. */
const electrodePHArg = numberArg("pH", { min: PH_MIN, max: PH_MAX, optional: true, measured: true });

export type ReadingUnit = "V" | "mV";
/** Volts per unit of a reading. */
const READING_UNITS: Readonly<Record<string, { unit: ReadingUnit; volts: number }>> = {
  v: { unit: "V", volts: 1 },
  volt: { unit: "V", volts: 1 },
  volts: { unit: "V", volts: 1 },
  mv: { unit: "mV", volts: 1e-3 },
  millivolt: { unit: "mV", volts: 1e-3 },
  millivolts: { unit: "mV", volts: 1e-3 },
};

/** "V" (default) or "mV", case-insensitive. */
export const readingUnitArg = textArg(
  "unit",
  (text) =>
    ownEntry(READING_UNITS, text.toLowerCase()) ??
    argumentError("unit", `expected "V" or "mV", got "${text.slice(0, 24)}"`),
  { optional: true, defaultValue: READING_UNITS.v },
);

/** A reading in its unit, unchecked: the ±3 V limit applies after conversion to volts. */
const readingArg = numberArg("reading");

/** The reading in volts, or #VALUE! when beyond ±3 V (nearly always mV typed where volts are expected). */
function readingVolts(reading: number, unit: { unit: ReadingUnit; volts: number }): number | CellError {
  const volts = reading * unit.volts;
  if (Math.abs(volts) <= MAX_POTENTIAL) return volts;
  if (unit.unit === "V") return valueError(potentialMessage("reading", reading), "reading");
  return argumentError("reading", `${reading} mV is outside −3000…+3000 mV`);
}

/** Potential of `electrode` vs SHE at the conditions, or the error naming what is missing or out of range. */
function electrodePotential(electrode: Electrode, celsius: number, pH: number | undefined): number | CellError {
  if (!inRange(electrode, celsius)) {
    const [low, high] = electrode.validCelsius;
    return argumentError("temperature", `${celsius} °C is outside the range of ${electrode.id} (${low} to ${high} °C)`);
  }
  if (electrode.needsPH && pH === undefined) return argumentError("pH", `${electrode.id} needs the pH of the solution`);
  return getElectrodes().potential(electrode, celsius, pH);
}

/** REDOX.TOSHE(reading, electrode, [temperature], [pH], [unit]) → V vs SHE. */
export function toSHEAt(
  reading: CellInput,
  electrode: CellInput,
  temperature?: CellInput,
  pH?: CellInput,
  unit?: CellInput,
): CellOutput[][] {
  return mapCells(
    [readingArg, electrodeArg, temperatureArg, electrodePHArg, readingUnitArg],
    [reading, electrode, temperature, pH, unit],
    (r, el, t, p, u) => {
      const volts = readingVolts(r, u);
      if (volts instanceof CellError) return volts;
      const offset = electrodePotential(el, t, p);
      return offset instanceof CellError ? offset : volts + offset;
    },
  );
}

/** REDOX.FROMSHE(potential, electrode, [temperature], [pH], [unit]) → reading against the electrode, in `unit`. */
export function fromSHEAt(
  potential: CellInput,
  electrode: CellInput,
  temperature?: CellInput,
  pH?: CellInput,
  unit?: CellInput,
): CellOutput[][] {
  return mapCells(
    [potentialArg(), electrodeArg, temperatureArg, electrodePHArg, readingUnitArg],
    [potential, electrode, temperature, pH, unit],
    (e, el, t, p, u) => {
      const offset = electrodePotential(el, t, p);
      return offset instanceof CellError ? offset : (e - offset) / u.volts;
    },
  );
}

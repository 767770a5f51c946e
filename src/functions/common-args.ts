/**
 * Argument readers shared by the worksheet functions (ranges and defaults: docs/method.md, Domain).
 */
import {
  boundText,
  DEFAULT_ACTIVITY,
  DEFAULT_CELSIUS,
  getDatabase,
  MAX_ACTIVITY,
  MAX_CELSIUS,
  MAX_POTENTIAL,
  MIN_CELSIUS,
  PH_MAX,
  PH_MIN,
} from "../chemistry";
import { numberArg, textArg } from "./broadcast";
import { argumentError } from "./cell-values";

export const pHArg = numberArg("pH", { min: PH_MIN, max: PH_MAX });

/** What a potential beyond ±3 V (MAX_POTENTIAL: no aqueous redox couple exists there) most likely is, and what to do (a reading in mV typed where volts are expected). */
export function potentialMessage(name: string, x: number): string {
  return `${name}: ${x} is outside ${boundText(-MAX_POTENTIAL)}…+${MAX_POTENTIAL} V: a reading in mV? Divide by 1000 or use REDOX.TOSHE(…, "mV")`;
}

/** A potential in V vs SHE, −3 to +3 V. */
export const potentialArg = (name = "potential") =>
  numberArg(name, { min: -MAX_POTENTIAL, max: MAX_POTENTIAL, unit: "V", outOfRange: (x) => potentialMessage(name, x) });

/** Temperature in °C; omitted → 25 °C, a blank cell → a missing measurement (blank result). */
export const temperatureArg = numberArg("temperature", {
  min: MIN_CELSIUS,
  max: MAX_CELSIUS,
  unit: "°C",
  optional: true,
  measured: true,
  defaultValue: DEFAULT_CELSIUS,
});
export const activityArg = numberArg("activity", {
  min: 0,
  minExclusive: true,
  max: MAX_ACTIVITY,
  optional: true,
  defaultValue: DEFAULT_ACTIVITY,
});

/** A metal by symbol or name ("Fe", "iron"), case-insensitive. */
export const elementArg = textArg("element", (text) => {
  const db = getDatabase();
  const symbol = db.resolveMetal(text);
  return symbol ?? argumentError("element", `"${text}" is not a metal in the database (${db.metals().join(", ")})`);
});

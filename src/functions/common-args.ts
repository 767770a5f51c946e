/**
 * Argument readers shared by the worksheet functions (ranges and defaults: docs/method.md, Domain).
 */
import { MAX_CELSIUS, MIN_CELSIUS } from "../chemistry/constants";
import { getDatabase } from "../chemistry/database";
import { numberArg, textArg } from "./broadcast";
import { valueError } from "./cell-values";

/** Default activity of dissolved metal species: 10⁻⁶, the usual corrosion threshold (common practice). */
export const DEFAULT_ACTIVITY = 1e-6;
export const DEFAULT_CELSIUS = 25;

export const pHArg = numberArg("pH", { min: -2, max: 16 });
export const potentialArg = (name = "potential") => numberArg(name, { unit: "V" });
export const temperatureArg = numberArg("temperature", {
  min: MIN_CELSIUS,
  max: MAX_CELSIUS,
  unit: "°C",
  optional: true,
  defaultValue: DEFAULT_CELSIUS,
});
export const activityArg = numberArg("activity", { min: 0, minExclusive: true, max: 10, optional: true, defaultValue: DEFAULT_ACTIVITY });

/** A metal by symbol or name ("Fe", "iron"), case-insensitive. */
export const elementArg = textArg("element", (text) => {
  const db = getDatabase();
  const symbol = db.resolveMetal(text);
  return symbol ?? valueError(`element: "${text}" is not a metal in the database (${db.metals().join(", ")})`);
});

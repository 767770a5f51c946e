/**
 * Worksheet functions over a metal's stability system: SPECIES, REGIME, BOUNDARY, COUPLE, DISSOLVED and
 * SPECIESTABLE (README). Thin adapters: argument reading and broadcasting come from broadcast.ts, the answers
 * from src/chemistry.
 */
import {
  BOUNDARY_SEARCH_HIGH,
  BOUNDARY_SEARCH_LOW,
  boundText,
  CONSTANT_GIBBS_MAX_CELSIUS,
  couplePotential,
  dissolvedAtPoint,
  engineAtPoint,
  formationGibbsAt,
  getDatabase,
  halfReaction,
  MAX_DISSOLVED,
  ownEntry,
  pointBoundary,
  ReactionError,
  Species,
  speciesTable as metalSpeciesTable,
  type SystemSpecies,
} from "../chemistry";
import { mapCells, textArg } from "./broadcast";
import { argumentError, CellError, CellInput, CellOutput, notAvailable, toHostError, valueError } from "./cell-values";
import { activityArg, elementArg, pHArg, potentialArg, temperatureArg } from "./common-args";
import { carbonateArg, chlorideArg, ionicStrengthArg, phosphateArg, sulfurArg } from "./ligand-args";

/** #VALUE! for a point the engine cannot answer (above 100 °C without S°: temperature-range.ts), naming the temperature. */
export const temperatureError = (problem: string): CellError => valueError(problem, "temperature");

const directionArg = textArg<1 | -1>(
  "direction",
  (text) =>
    text === "1" ? 1 : text === "-1" ? -1 : argumentError("direction", `expected 1 (above) or -1 (below), got ${text}`),
  { optional: true, defaultValue: 1 },
);

/** The point arguments every stability function shares, in the agreed order. */
export const POINT_ARGS = [
  elementArg,
  pHArg,
  potentialArg(),
  temperatureArg,
  activityArg,
  carbonateArg,
  chlorideArg,
  sulfurArg,
  phosphateArg,
  ionicStrengthArg,
] as const;

/** Reads the point arguments shared by SPECIES and REGIME and answers with `describe` of the dominant species. */
function dominantAt(describe: (species: SystemSpecies) => string, inputs: readonly CellInput[]): CellOutput[][] {
  return mapCells([...POINT_ARGS], inputs, (el, p, e, t, a, co3, cl, s, po4, i) => {
    const engine = engineAtPoint(getDatabase(), el, t, a, co3, cl, s, po4, i);
    if (typeof engine === "string") return temperatureError(engine);
    return describe(engine.table.species[engine.dominant(p, e)]);
  });
}

/** A point function as the host calls it: element, pH, potential, then the optional water (declarations.ts). */
type PointFunction = (
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  activity?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
  phosphate?: CellInput,
  ionicStrength?: CellInput,
) => CellOutput[][];

/** The point arguments as a tuple, for functions that take more after them. */
export type PointArguments = Parameters<PointFunction>;

/** The worksheet function answering `describe` of the dominant species at each point. */
const dominantFunction =
  (describe: (species: SystemSpecies) => string): PointFunction =>
  (...inputs) =>
    dominantAt(describe, inputs);

/** REDOX.SPECIES: the dominant species' formula. */
export const speciesAt = dominantFunction((s) => s.formula);

/** REDOX.REGIME: immunity, passivation or corrosion, from the dominant species. */
export const regimeAt = dominantFunction((s) => s.regime);

/** The #N/A of a point with no boundary above (d = 1) or below in the searched span: one error value each, shared. */
const noBoundary = (direction: 1 | -1): CellError =>
  notAvailable(
    `no boundary ${direction > 0 ? "above" : "below"} this point between ${boundText(BOUNDARY_SEARCH_LOW)} and +${BOUNDARY_SEARCH_HIGH} V`,
  );
export const NO_BOUNDARY_ABOVE = noBoundary(1);
export const NO_BOUNDARY_BELOW = noBoundary(-1);

/** REDOX.BOUNDARY: the point arguments, then the direction (1 above, −1 below). */
export function boundaryFrom(...inputs: [...PointArguments, direction?: CellInput]): CellOutput[][] {
  return mapCells([...POINT_ARGS, directionArg], inputs, (el, p, e, t, a, co3, cl, s, po4, i, d) => {
    const engine = engineAtPoint(getDatabase(), el, t, a, co3, cl, s, po4, i);
    if (typeof engine === "string") return temperatureError(engine);
    const crossing = pointBoundary(engine, p, e, d);
    return crossing ? crossing.E : d > 0 ? NO_BOUNDARY_ABOVE : NO_BOUNDARY_BELOW;
  });
}

const speciesArg = (name: string) =>
  textArg(
    name,
    (text) => getDatabase().lookup(text) ?? argumentError(name, `"${text}" is not a species in the database`),
  );

export function coupleAt(
  oxidized: CellInput,
  reduced: CellInput,
  pH: CellInput,
  temperature?: CellInput,
  activity?: CellInput,
): CellOutput[][] {
  return mapCells(
    [speciesArg("oxidized"), speciesArg("reduced"), pHArg, temperatureArg, activityArg],
    [oxidized, reduced, pH, temperature, activity],
    (ox, red, p, t, a) => couple(ox, red, p, t, a),
  );
}

function couple(ox: Species, red: Species, pH: number, celsius: number, activity: number): CellOutput {
  const db = getDatabase();
  let reaction;
  try {
    reaction = halfReaction(db, ox, red);
  } catch (error) {
    if (error instanceof ReactionError) return argumentError("oxidized, reduced", error.message);
    throw error;
  }
  if (Math.abs(reaction.electrons) < 1e-12)
    return notAvailable(`${ox.formula} and ${red.formula} have the same oxidation state`);
  if (celsius > CONSTANT_GIBBS_MAX_CELSIUS) {
    const missing = [ox, red].filter((sp) => sp.S === null).map((sp) => sp.formula);
    if (missing.length)
      return valueError(
        `temperature ${celsius} °C: this couple is modelled 0–${CONSTANT_GIBBS_MAX_CELSIUS} °C only; above ${CONSTANT_GIBBS_MAX_CELSIUS} °C the records lack S° for ${missing.join(", ")}`,
        "temperature",
      );
  }
  // the couple's potential does not depend on which member is named first
  const [o, r] = reaction.electrons > 0 ? [ox, red] : [red, ox];
  return couplePotential(db, o, r, { pH, celsius, activity });
}

/** Units for dissolved totals: factor from mol/kg given the metal's atomic weight (g/mol). */
export const DISSOLVED_UNITS: Record<string, (atomicWeight: number) => number> = {
  "mol/kg": () => 1,
  "mg/l": (w) => w * 1e3,
  "ug/l": (w) => w * 1e6,
};
const UNIT_ALIASES: Record<string, string> = {
  "µg/l": "ug/l",
  "μg/l": "ug/l",
  ppb: "ug/l",
  ppm: "mg/l",
  molal: "mol/kg",
  "mol/l": "mol/kg",
};

export const unitArg = textArg(
  "unit",
  (text) => {
    const key = text.toLowerCase().replace(/\s+/g, "");
    const unit = ownEntry(UNIT_ALIASES, key) ?? key;
    return ownEntry(DISSOLVED_UNITS, unit) ? unit : argumentError("unit", `"${text}" is not one of mol/kg, mg/L, ug/L`);
  },
  { optional: true, defaultValue: "mol/kg" },
);

const noSolidErrors = new Map<string, CellError>();

/** The #N/A of a point where `formula`, the most stable solid, would all dissolve: one error value per solid. */
export function noSolidForms(formula: string): CellError {
  let error = noSolidErrors.get(formula);
  if (!error) {
    error = notAvailable(
      `no solid forms here: ${formula}, the most stable solid, would dissolve to more than ${MAX_DISSOLVED} mol/kg`,
    );
    noSolidErrors.set(formula, error);
  }
  return error;
}

export function dissolvedAt(
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
  phosphate?: CellInput,
  ionicStrength?: CellInput,
  unit?: CellInput,
): CellOutput[][] {
  return mapCells(
    [
      elementArg,
      pHArg,
      potentialArg(),
      temperatureArg,
      carbonateArg,
      chlorideArg,
      sulfurArg,
      phosphateArg,
      ionicStrengthArg,
      unitArg,
    ],
    [element, pH, potential, temperature, carbonate, chloride, sulfur, phosphate, ionicStrength, unit],
    (el, p, e, t, co3, cl, s, po4, i, u) => {
      const engine = engineAtPoint(getDatabase(), el, t, 1, co3, cl, s, po4, i);
      if (typeof engine === "string") return temperatureError(engine);
      const { total, solid } = dissolvedAtPoint(engine, p, e);
      if (!(total <= MAX_DISSOLVED)) return noSolidForms(engine.table.species[solid].formula);
      const weight = getDatabase().element(el)?.atomicWeight ?? NaN;
      return total * DISSOLVED_UNITS[u](weight);
    },
  );
}

const STATE_WORDS: Record<string, string> = { s: "solid", l: "liquid", g: "gas", aq: "dissolved" };

export function speciesTable(element: CellInput, temperature?: CellInput): CellOutput[][] {
  // one table per call: element and temperature must be single cells
  const single = mapCells([elementArg, temperatureArg], [element, temperature], (el, t) => `${el}|${t}`);
  if (single.length !== 1 || single[0].length !== 1)
    return [[toHostError(argumentError("element, temperature", "give single cells; the table spills by itself"))]];
  const only = single[0][0];
  if (typeof only !== "string" || only === "") return [[only]];
  const [el, t] = only.split("|");
  const celsius = Number(t);
  const db = getDatabase();
  const table = metalSpeciesTable(db, el);
  const header: CellOutput[] = ["formula", "state", "name", `ΔG°f(${celsius} °C) kJ/mol`, "source"];
  const rows: CellOutput[][] = [header];
  for (const s of table.species.filter((_, i) => table.needs[i] === 0)) {
    // above 100 °C a record without S° has no temperature dependence to give: the cell is left empty
    const g =
      s.species.S === null && celsius > CONSTANT_GIBBS_MAX_CELSIUS ? null : formationGibbsAt(db, s.species, celsius);
    rows.push([
      s.formula,
      STATE_WORDS[s.species.state],
      s.species.name,
      g === null ? "" : Math.round(g / 10) / 100,
      s.species.source,
    ]);
  }
  return rows;
}

/**
 * Worksheet functions over a metal's stability system: SPECIES, REGIME, BOUNDARY, COUPLE, DISSOLVED and
 * SPECIESTABLE (README). Thin adapters: argument reading and broadcasting come from broadcast.ts, the answers
 * from src/chemistry.
 */
import { getDatabase, Species } from "../chemistry/database";
import { formationGibbsAt } from "../chemistry/formation";
import { nearestBoundary, dissolvedAtPoint } from "../chemistry/predominance";
import { couplePotential, halfReaction, ReactionError } from "../chemistry/reaction";
import { SystemCache } from "../chemistry/system-cache";
import { ownEntry } from "../chemistry/own-entry";
import { dominantSpecies, MetalSystem, SystemSpecies } from "../chemistry/system";
import { mapCells, numberArg, textArg } from "./broadcast";
import { CellInput, CellOutput, notAvailable, toHostError, valueError } from "./cell-values";
import { activityArg, elementArg, pHArg, potentialArg, temperatureArg } from "./common-args";
import { ligandKey, LigandTotals } from "../chemistry/ligand-cells";
import { buildLigandSystem } from "../chemistry/ligand-system";
import { carbonateArg, chlorideArg, sulfurArg } from "./ligand-args";

let cache: SystemCache | undefined;

/**
 * The last few systems used, scanned before the bounded cache: a column usually repeats a handful of (element,
 * temperature, activity) conditions, and comparing three values is cheaper than building a cache key per row.
 */
const RECENT = 16;
const recentElement: string[] = new Array(RECENT).fill("");
const recentCelsius: number[] = new Array(RECENT).fill(NaN);
const recentActivity: number[] = new Array(RECENT).fill(NaN);
const recentSystem: (MetalSystem | null)[] = new Array(RECENT).fill(null);
let recentNext = 0;

/** The system for (element, T, activity), built once and reused. */
function systemFor(element: string, celsius: number, activity: number): MetalSystem {
  for (let k = 0; k < RECENT; k++) {
    if (recentCelsius[k] === celsius && recentActivity[k] === activity && recentElement[k] === element) return recentSystem[k]!;
  }
  cache ??= new SystemCache(getDatabase());
  const system = cache.get(element, celsius, activity);
  recentElement[recentNext] = element;
  recentCelsius[recentNext] = celsius;
  recentActivity[recentNext] = activity;
  recentSystem[recentNext] = system;
  recentNext = (recentNext + 1) % RECENT;
  return system;
}

const directionArg = numberArg("direction", { optional: true, defaultValue: 1 });

/**
 * The system for a water with ligand totals (mol/kg, 0 = absent). With none present this is systemFor itself (the
 * ligand-free path); otherwise the ligand cells are built once per condition through the same cache.
 */
export function systemInWater(element: string, celsius: number, activity: number, carbonate: number, chloride: number, sulfur: number): MetalSystem {
  if (carbonate === 0 && chloride === 0 && sulfur === 0) return systemFor(element, celsius, activity);
  const totals: LigandTotals = { carbonate, chloride, sulfur };
  cache ??= new SystemCache(getDatabase());
  return cache.get(element, celsius, activity, ligandKey(totals), () => buildLigandSystem(getDatabase(), element, { celsius, activity }, totals));
}

/** Reads the point arguments shared by SPECIES and REGIME and answers with `describe` of the dominant species. */
function dominantAt(
  describe: (species: SystemSpecies) => string,
  inputs: readonly CellInput[],
): CellOutput[][] {
  return mapCells(
    [elementArg, pHArg, potentialArg(), temperatureArg, activityArg, carbonateArg, chlorideArg, sulfurArg],
    inputs,
    (el, p, e, t, a, co3, cl, s) => {
      const system = systemInWater(el, t, a, co3, cl, s);
      return describe(system.species[dominantSpecies(system, p, e)]);
    },
  );
}

export function speciesAt(
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  activity?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
): CellOutput[][] {
  return dominantAt((s) => s.formula, [element, pH, potential, temperature, activity, carbonate, chloride, sulfur]);
}

export function regimeAt(
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  activity?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
): CellOutput[][] {
  return dominantAt((s) => s.regime, [element, pH, potential, temperature, activity, carbonate, chloride, sulfur]);
}

export function boundaryFrom(
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  direction?: CellInput,
  temperature?: CellInput,
  activity?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
): CellOutput[][] {
  return mapCells(
    [elementArg, pHArg, potentialArg(), directionArg, temperatureArg, activityArg, carbonateArg, chlorideArg, sulfurArg],
    [element, pH, potential, direction, temperature, activity, carbonate, chloride, sulfur],
    (el, p, e, d, t, a, co3, cl, s) => {
      if (d !== 1 && d !== -1) return valueError(`direction: expected 1 (above) or -1 (below), got ${d}`);
      const crossing = nearestBoundary(systemInWater(el, t, a, co3, cl, s), p, e, d);
      return crossing ? crossing.E : notAvailable(`no boundary ${d > 0 ? "above" : "below"} this point between −3 and +3 V`);
    },
  );
}

const speciesArg = (name: string) =>
  textArg(name, (text) => getDatabase().lookup(text) ?? valueError(`${name}: "${text}" is not a species in the database`));

export function coupleAt(oxidized: CellInput, reduced: CellInput, pH: CellInput, temperature?: CellInput, activity?: CellInput): CellOutput[][] {
  return mapCells([speciesArg("oxidized"), speciesArg("reduced"), pHArg, temperatureArg, activityArg], [oxidized, reduced, pH, temperature, activity], (ox, red, p, t, a) =>
    couple(ox, red, p, t, a),
  );
}

function couple(ox: Species, red: Species, pH: number, celsius: number, activity: number): CellOutput {
  const db = getDatabase();
  let reaction;
  try {
    reaction = halfReaction(db, ox, red);
  } catch (error) {
    if (error instanceof ReactionError) return valueError(`oxidized, reduced: ${error.message}`);
    throw error;
  }
  if (Math.abs(reaction.electrons) < 1e-12) return notAvailable(`${ox.formula} and ${red.formula} have the same oxidation state`);
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
const UNIT_ALIASES: Record<string, string> = { "µg/l": "ug/l", "μg/l": "ug/l", ppb: "ug/l", ppm: "mg/l", molal: "mol/kg", "mol/l": "mol/kg" };

export const unitArg = textArg(
  "unit",
  (text) => {
    const key = text.toLowerCase().replace(/\s+/g, "");
    const unit = ownEntry(UNIT_ALIASES, key) ?? key;
    return ownEntry(DISSOLVED_UNITS, unit) ? unit : valueError(`unit: "${text}" is not one of mol/kg, mg/L, ug/L`);
  },
  { optional: true, defaultValue: "mol/kg" },
);

export function dissolvedAt(
  element: CellInput,
  pH: CellInput,
  potential: CellInput,
  temperature?: CellInput,
  unit?: CellInput,
  activity?: CellInput,
  carbonate?: CellInput,
  chloride?: CellInput,
  sulfur?: CellInput,
): CellOutput[][] {
  return mapCells(
    [elementArg, pHArg, potentialArg(), temperatureArg, unitArg, activityArg, carbonateArg, chlorideArg, sulfurArg],
    [element, pH, potential, temperature, unit, activity, carbonate, chloride, sulfur],
    (el, p, e, t, u, a, co3, cl, s) => {
      const system = systemInWater(el, t, a, co3, cl, s);
      const result = dissolvedAtPoint(system, p, e);
      if (!result) return notAvailable("a dissolved species is dominant here: no solid is stable");
      const weight = getDatabase().element(el)?.atomicWeight ?? NaN;
      return result.total * DISSOLVED_UNITS[u](weight);
    },
  );
}

const STATE_WORDS: Record<string, string> = { s: "solid", l: "liquid", g: "gas", aq: "dissolved" };

export function speciesTable(element: CellInput, temperature?: CellInput): CellOutput[][] {
  // one table per call: element and temperature must be single cells
  const single = mapCells([elementArg, temperatureArg], [element, temperature], (el, t) => `${el}|${t}`);
  if (single.length !== 1 || single[0].length !== 1) return [[toHostError(valueError("element, temperature: give single cells; the table spills by itself"))]];
  const only = single[0][0];
  if (typeof only !== "string" || only === "") return [[only]];
  const [el, t] = only.split("|");
  const celsius = Number(t);
  const db = getDatabase();
  const system = systemFor(el, celsius, 1e-6);
  const header: CellOutput[] = ["formula", "state", "name", `ΔG°f(${celsius} °C) kJ/mol`, "source"];
  const rows: CellOutput[][] = [header];
  for (const s of system.species) {
    const g = formationGibbsAt(db, s.species, celsius);
    rows.push([s.formula, STATE_WORDS[s.species.state], s.species.name, g === null ? "" : Math.round(g / 10) / 100, s.species.source]);
  }
  return rows;
}

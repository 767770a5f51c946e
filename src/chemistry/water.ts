/**
 * Water: the two lines that bound its stability, the ion product Kw(T) and neutral pH.
 *
 * Both lines come from the species records of data/species/water.json through the same reaction thermodynamics
 * as every other couple (thermo.ts); Kw comes from the IAPWS formulation R11-07 (water-properties.ts):
 *
 *   oxygen line     O2(g) + 4 H+ + 4 e− = 2 H2O(l)   E = E°(T) − k(T)·pH + (k(T)/4)·log10 p(O2)
 *   hydrogen line   2 H+ + 2 e− = H2(g)               E = E°(T) − k(T)·pH − (k(T)/2)·log10 p(H2)
 *   ionisation      H2O(l) = H+ + OH−                pKw = −log10 Kw
 *
 * with k(T) = RT ln10 / F and E°(T) = k(T)·log10 K / n for the reduction of n electrons (log K from ΔG°r(T)).
 * E°(H+/H2) is 0 at every temperature by the hydrogen-electrode convention that thermo.ts applies to the electron.
 * Gas pressures in bar (ideal gas, 1 bar standard state). Temperatures in °C, as elsewhere in the engine.
 *
 * The lines keep constant heat capacities of H2O(l), H2(g) and O2(g) up to 300 °C: the rise of the liquid's Cp
 * above 150 °C and the saturation pressure on the liquid (∫V dP) shift ΔG°f(H2O, l) by about 0.2 kJ/mol each, in
 * opposite directions, at 300 °C — about 1 mV on the oxygen line (estimate, IAPWS-95 Cp and volume).
 * Kw from the species records drifts above R11-07 towards 100 °C (constant ΔCp°r of ionisation), so the published
 * formulation is used instead: pKw at 1 atm below 100 °C, on the saturation curve from 100 °C to 300 °C.
 */
import { DEFAULT_CELSIUS } from "./domain";
import { kelvin, nernstFactor } from "./constants";
import { Database, getDatabase } from "./database";
import { balancedProperties, logKAt, reactionLogK } from "./reaction";
import type { ReactionProperties } from "./thermo";
import { waterPKw } from "./water-properties";

export type WaterGas = "O2" | "H2";

/** O2(g) + 4 H+ + 4 e− → 2 H2O(l) */
const OXYGEN_REDUCTION = { "O2(g)": -1, "H+": -4, "e-": -4, "H2O(l)": 2 } as const;
/** 2 H+ + 2 e− → H2(g) */
const HYDROGEN_EVOLUTION = { "H+": -2, "e-": -2, "H2(g)": 1 } as const;
// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow (REDOX.ASSESS).
const { log10, min } = Math;

/** H2O(l) → H+ + OH− */
const IONISATION = { "H2O(l)": -1, "H+": 1, "OH-": 1 } as const;

/** The two couples' reaction properties by database, summed once (a column of new temperatures costs arithmetic only). */
const lineReactions = new WeakMap<Database, Record<WaterGas, ReactionProperties>>();

/** Standard potential (V vs SHE) of the O2/H2O (gas "O2") or H+/H2 (gas "H2") couple at `celsius`. */
export function waterStandardPotential(gas: WaterGas, celsius = DEFAULT_CELSIUS, db: Database = getDatabase()): number {
  let reactions = lineReactions.get(db);
  if (!reactions) {
    reactions = { O2: balancedProperties(db, OXYGEN_REDUCTION), H2: balancedProperties(db, HYDROGEN_EVOLUTION) };
    lineReactions.set(db, reactions);
  }
  const last = gas === "O2" ? lastOxygen : lastHydrogen;
  if (last.db === db && last.celsius === celsius) return last.e0; // a column of one temperature
  const k = nernstFactor(kelvin(celsius));
  // E° = k·log10 K / n for the reduction of n electrons; + 0 turns a negative zero into 0
  const e0 = gas === "O2" ? (k * logKAt(reactions.O2, celsius)) / 4 + 0 : (k * logKAt(reactions.H2, celsius)) / 2 + 0;
  last.db = db;
  last.celsius = celsius;
  last.e0 = e0;
  return e0;
}

/** The last standard potential of each couple, for the next call at the same temperature. */
interface LastPotential {
  db: Database | null;
  celsius: number;
  e0: number;
}
const lastOxygen: LastPotential = { db: null, celsius: 0 / 0, e0: 0 };
const lastHydrogen: LastPotential = { db: null, celsius: 0 / 0, e0: 0 };

/**
 * Potential (V vs SHE) of a water line at pH, temperature (°C) and partial pressure of the gas (bar).
 * Above the O2 line water is oxidised to oxygen; below the H2 line it is reduced to hydrogen.
 */
export function waterLine(
  pH: number,
  celsius = DEFAULT_CELSIUS,
  gas: WaterGas = "O2",
  pressure = 1,
  db: Database = getDatabase(),
): number {
  const k = nernstFactor(kelvin(celsius));
  const e0 = waterStandardPotential(gas, celsius, db);
  // Nernst: E = E° − (k/n)·log10 Q, Q = products over reactants with a(H+) = 10^−pH
  return gas === "O2" ? e0 - k * pH + (k / 4) * log10(pressure) : e0 - k * pH - (k / 2) * log10(pressure);
}

/** pKw = −log10 Kw of H2O(l) = H+ + OH− at `celsius` (molal activities; IAPWS R11-07 at the model's pressure). */
export function pKw(celsius = DEFAULT_CELSIUS): number {
  return waterPKw(celsius);
}

/** pKw of H2O(l) = H+ + OH− from the species records of a database (constant ΔCp°r; for checks of the data). */
export function recordsPKw(celsius = DEFAULT_CELSIUS, db: Database = getDatabase()): number {
  return -reactionLogK(db, IONISATION, celsius);
}

/** Ion product of water Kw(T). */
export function kw(celsius = DEFAULT_CELSIUS): number {
  return 10 ** -pKw(celsius);
}

/** pH of pure water, where a(H+) = a(OH−): ½ pKw(T). */
export function neutralPH(celsius = DEFAULT_CELSIUS): number {
  return pKw(celsius) / 2;
}

/**
 * Signed distance (V) of a potential from the water window at pH and temperature, both gases at 1 bar.
 * Positive inside the window: the distance to the nearer line. Negative outside: how far beyond the line crossed.
 * `overpotential` (V, ≥ 0) widens both sides, for the kinetic window in which water decomposes only slowly
 * (about 0.6 V beyond each line in practice).
 */
export function waterMargin(
  pH: number,
  potential: number,
  celsius = DEFAULT_CELSIUS,
  overpotential = 0,
  db: Database = getDatabase(),
): number {
  const upper = waterLine(pH, celsius, "O2", 1, db) + overpotential;
  const lower = waterLine(pH, celsius, "H2", 1, db) - overpotential;
  return min(upper - potential, potential - lower);
}

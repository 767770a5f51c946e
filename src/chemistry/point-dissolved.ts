/**
 * Equilibrium dissolved metal at a point from the controlling solid: the solid (the metal included) with the lowest g
 * at unit activity is the one the water is in equilibrium with; each dissolved species i then has
 *
 *   ln a_i = x_i·F·(g_solid − g_i°)/(RT),   molality m_i = a_i/γ_i,   total = Σ x_i·m_i   (mol/kg of metal)
 *
 * (g_i° at unit activity, ligands at their exact activities). This does not depend on the threshold activity that
 * decides SPECIES. Where the total would exceed MAX_DISSOLVED the solid cannot form (it would all dissolve).
 */
import { Database } from "./database";
import type { PointEngine, PointWater } from "./point-engine";
import { engineInWater } from "./point-service";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { exp } = Math;
const INF = 1 / 0;

/** Largest total reported, mol/kg: beyond it no solid forms and the dilute-solution treatment is meaningless. */
export const MAX_DISSOLVED = 1;

export interface DissolvedAnswer {
  /** Total dissolved metal, mol/kg. */
  readonly total: number;
  /** Index of the controlling solid in the engine's table. */
  readonly solid: number;
}

/** The controlling solid: lowest g among the solids available in the water (ligands at the point); leaves the unit lines. */
export function controllingSolid(engine: PointEngine, pH: number, E: number): number {
  engine.linesAt(pH, E, true);
  const { lineG, lineSpecies, lineCount } = engine;
  const dissolved = engine.table.dissolved;
  let best = -1;
  let bestG = INF;
  for (let k = 0; k < lineCount; k++) {
    const i = lineSpecies[k];
    if (!dissolved[i] && lineG[i] < bestG) {
      bestG = lineG[i];
      best = i;
    }
  }
  return best;
}

/** Total dissolved metal in equilibrium with the controlling solid at (pH, E), in the engine's current water. */
export function dissolvedAtPoint(engine: PointEngine, pH: number, E: number): DissolvedAnswer {
  const solid = controllingSolid(engine, pH, E);
  const { lineG, lineSpecies, lineCount } = engine;
  const gSolid = lineG[solid];
  const { dissolved, x } = engine.table;
  const f = engine.fOverRT;
  let total = 0;
  for (let k = 0; k < lineCount; k++) {
    const i = lineSpecies[k];
    if (!dissolved[i] || lineG[i] === INF) continue; // a line at +∞ (a guard: none expected where the water allows it)
    total += x[i] * exp(x[i] * f * (gSolid - lineG[i]) - engine.lnGamma(i));
  }
  return { total, solid };
}

/** Each dissolved species' molality (mol/kg of species) in equilibrium with `solid`, for checks and tables. */
export function dissolvedParts(
  engine: PointEngine,
  solid: number,
  pH: number,
  E: number,
): { species: number; molality: number }[] {
  engine.ligandsAt(pH, E);
  const gSolid = engine.g(solid, pH, E, true);
  const t = engine.table;
  const parts: { species: number; molality: number }[] = [];
  for (let i = 0; i < engine.size; i++) {
    if (!t.dissolved[i] || !engine.available(i)) continue;
    const x = t.x[i];
    parts.push({
      species: i,
      molality: exp(x * engine.fOverRT * (gSolid - engine.g(i, pH, E, true)) - engine.lnGamma(i)),
    });
  }
  return parts;
}

/**
 * Equilibrium dissolved metal and its controlling solid for one point — the call other features (the one-call
 * assessment) use. `total` is null where no solid can form (more than MAX_DISSOLVED would dissolve).
 */
export function dissolvedEquilibrium(
  db: Database,
  element: string,
  pH: number,
  E: number,
  water: PointWater,
): { total: number | null; controllingSolid: string } {
  const engine = engineInWater(db, element, water);
  const answer = dissolvedAtPoint(engine, pH, E);
  const formula = engine.table.species[answer.solid].formula;
  return { total: answer.total <= MAX_DISSOLVED ? answer.total : null, controllingSolid: formula };
}

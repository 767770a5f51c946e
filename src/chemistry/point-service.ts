/**
 * The one way to a point answer, for the worksheet functions, the pane, the command line and the diagrams: the point
 * engine (point-engine.ts) of an element with a water set. It owns what a point may be asked at — the temperature
 * range, and above 100 °C the records' S° for the ligands the water brings (temperature-range.ts) — and the engines,
 * one per database and element, so that every caller answers a row the same way.
 */
import { CONSTANT_GIBBS_MAX_CELSIUS, presentLigands, temperatureProblem } from "./temperature-range";
import { Database } from "./database";
import { PointEngine, pointEngine, PointWater } from "./point-engine";
import type { LigandTotals } from "./ligand-cells";
import type { SystemSpecies } from "./system";

let lastDb: Database | null = null;
let lastElement = "";
let lastEngine: PointEngine | null = null;

/**
 * The engine of `element` with the row's water set (it keeps what depends only on T from row to row), or the
 * problem — a message naming the temperature — when the element cannot be answered there. Positional arguments:
 * a column of rows allocates nothing.
 */
export function engineAtPoint(
  db: Database,
  element: string,
  celsius: number,
  activity: number,
  carbonate: number,
  chloride: number,
  sulfur: number,
  phosphate: number,
  ionicStrength: number,
): PointEngine | string {
  if (celsius > CONSTANT_GIBBS_MAX_CELSIUS) {
    const present = presentLigands(carbonate, chloride, sulfur, phosphate);
    const problem = temperatureProblem(db, element, celsius, present);
    if (problem) return problem;
  }
  if (db !== lastDb || element !== lastElement || !lastEngine) {
    lastEngine = pointEngine(db, element);
    lastDb = db;
    lastElement = element;
  }
  lastEngine.setWater(celsius, activity, carbonate, chloride, sulfur, ionicStrength, phosphate);
  return lastEngine;
}

/** The same for a water record; throws the problem (callers that drew a system for this water checked it already). */
export function engineInWater(db: Database, element: string, w: PointWater): PointEngine {
  const engine = engineAtPoint(
    db,
    element,
    w.celsius,
    w.activity,
    w.carbonate,
    w.chloride,
    w.sulfur,
    w.phosphate ?? 0,
    w.ionicStrength,
  );
  if (typeof engine === "string") throw new RangeError(engine);
  return engine;
}

/**
 * The dominant species at one point of a drawn system's water (its temperature, threshold and ligand totals, or
 * `ligands` of the sample's own), from the point engine: what SPECIES answers there. Returns the species record.
 */
export function dominantInWater(
  db: Database,
  system: {
    readonly element: string;
    readonly celsius: number;
    readonly activity: number;
    readonly ligandTotals?: LigandTotals;
  },
  pH: number,
  E: number,
  ligands?: LigandTotals,
): SystemSpecies {
  const water = ligands ?? system.ligandTotals ?? {};
  const engine = engineInWater(db, system.element, waterOf(system.celsius, system.activity, water));
  return engine.table.species[engine.dominant(pH, E)];
}

/** A point water from a temperature, threshold and ligand totals (absent ligands 0, no ionic strength). */
export function waterOf(celsius: number, activity: number, ligands: LigandTotals): PointWater {
  return {
    celsius,
    activity,
    carbonate: ligands.carbonate ?? 0,
    chloride: ligands.chloride ?? 0,
    sulfur: ligands.sulfur ?? 0,
    phosphate: ligands.phosphate ?? 0,
    ionicStrength: 0,
  };
}

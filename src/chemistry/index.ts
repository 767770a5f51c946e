/**
 * src/chemistry: the engine. Host-free (no Office, no DOM, no Node): pure functions over typed records from data/.
 * Its public surface, what the functions, the diagram renderer, the tables, the pane and the command line use (the
 * rest is internal; DEVELOPERS.md lists every file):
 * - point-service.ts   the one way to a point answer (the engine of an element with a row's water set)
 * - point-boundary.ts, point-dissolved.ts   the nearest boundary and the equilibrium dissolved metal at a point
 * - database.ts, species-tables.ts, formation.ts   the validated data, a metal's species, ΔG°f at temperature
 * - domain.ts, constants.ts   ranges, defaults, regime names; physical constants
 * - water.ts, pe.ts, electrodes.ts, reaction.ts   water lines, pe/Eh, reference scales, couples
 * - alkalinity.ts, ionic-strength.ts, activity-coefficients.ts, ligand-cells.ts   real waters
 * - system.ts, system-cache.ts, ligand-system.ts, predominance.ts, region-tracing.ts, halfplane.ts   diagrams
 */
export { MAX_IONIC_STRENGTH } from "./activity-coefficients";
export {
  AlkalinityError,
  AlkalinityProblem,
  CACO3_GRAMS_PER_EQUIVALENT,
  dicFromAlkalinity,
  dicOrProblem,
  dicFromBicarbonateOrProblem,
  dicFromReadingOrProblem,
  type DicBasis,
  HCO3_GRAMS_PER_MOLE,
} from "./alkalinity";
export { kelvin, nernstFactor } from "./constants";
export { dataFileCount, dataFingerprint } from "./data-fingerprint";
export { Database, getDatabase, type Species } from "./database";
export {
  BOUNDARY_SEARCH_HIGH,
  BOUNDARY_SEARCH_LOW,
  boundText,
  DEFAULT_ACTIVITY,
  DEFAULT_CELSIUS,
  FULL_E_LIMIT,
  MAX_ACTIVITY,
  MAX_CELSIUS,
  MAX_POTENTIAL,
  MIN_CELSIUS,
  PH_MAX,
  PH_MIN,
  REGIMES,
} from "./domain";
export { type Electrode, ElectrodeTable, getElectrodes, inRange } from "./electrodes";
export { formationGibbsAt } from "./formation";
export { clipPolygon, type HalfPlane, type Point, polygonArea } from "./halfplane";
export { type IonicStrengthBasis, ionicStrengthFrom } from "./ionic-strength";
export { hasLigands, LIGAND_ORDER, ligandKey, type LigandName, type LigandTotals } from "./ligand-cells";
export { buildLigandSystem, MAX_LIGAND_TOTAL } from "./ligand-system";
export { ownEntry } from "./own-entry";
export { ehFromPe, peFromEh } from "./pe";
export { pointBoundary } from "./point-boundary";
export { dissolvedAtPoint, MAX_DISSOLVED } from "./point-dissolved";
export { PointEngine } from "./point-engine";
export { dominantInWater, engineAtPoint } from "./point-service";
export { diagramRegions, type DiagramWindow, type Region } from "./predominance";
export { couplePotential, halfReaction, ReactionError } from "./reaction";
export { tracedRegions } from "./region-tracing";
export { speciesTable } from "./species-tables";
export { type MetalSystem, pairBoundary, type Regime, SystemError, type SystemSpecies } from "./system";
export { SystemCache } from "./system-cache";
export { CONSTANT_GIBBS_MAX_CELSIUS } from "./temperature-range";
export { neutralPH, type WaterGas, waterLine, waterMargin } from "./water";

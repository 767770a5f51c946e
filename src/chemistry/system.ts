/**
 * A metal–water system at one temperature and activity, as a set of species planes (docs/method.md, Species planes).
 *
 * Each species is written as formed from the metal and water (and, where it carries a ligand, from that ligand's
 * basis species):  x M + y H2O → MxOyHz^q + (2y − z) H+ + n e−. Per metal atom, in volts (Gibbs energy / F):
 *
 *   g(pH, E) = [ΔG°r(T) + RT ln a] / (xF) − ((2y − z)/x)·k(T)·pH − (n/x)·E,     k = RT ln10 / F
 *
 * with a the activity of a dissolved species (1 for solids). The metal has g = 0. The dominant species at a point
 * is the one with the lowest g; two share a boundary where their g are equal (Pourbaix 1974; Garrels & Christ 1965).
 *
 * Ligands (issue: real waters) split the plane into cells in each of which one basis species of every ligand
 * predominates; within a cell every plane is linear. Without ligands there is one cell covering everything.
 */
import { PH_MAX, PH_MIN } from "./domain";
import { FARADAY, GAS_CONSTANT, kelvin, MAX_CELSIUS, MIN_CELSIUS, nernstFactor } from "./constants";
import { Database, Species } from "./database";
import { envelopeRegions } from "./envelope";
import { clipPolygon, HalfPlane, insideAll, Point, rectangle } from "./halfplane";
import { formationTable } from "./formation";
import { presentLigands, temperatureProblem } from "./temperature-range";
import { ELECTRON, gibbsAt } from "./thermo";
import type { LigandTotals } from "./ligand-cells";

export type Regime = "immunity" | "passivation" | "corrosion";

export interface SystemSpecies {
  readonly species: Species;
  readonly formula: string;
  /** Metal atoms per formula unit (x). */
  readonly metalAtoms: number;
  readonly dissolved: boolean;
  readonly regime: Regime;
}

/** A ligand basis species held at a fixed activity inside a cell. */
export interface LigandBasis {
  readonly species: Species;
  /** Natural logarithm of its activity. */
  readonly lnActivity: number;
}

/** A convex region of the (pH, E) plane in which every species plane is linear. */
export interface PlaneCell {
  /** Half-planes a + b·pH + c·E ≤ 0 bounding the cell; empty = the whole plane. */
  readonly region: readonly HalfPlane[];
  /** g_i = a[i] + b[i]·pH + c[i]·E, volts per metal atom; +Infinity for species absent in this cell. */
  readonly a: Float64Array;
  readonly b: Float64Array;
  readonly c: Float64Array;
  /** a[i] at unit activity of species i (used for dissolved totals). */
  readonly aUnit: Float64Array;
  /** The ligand basis species of this cell, for labels and captions. */
  readonly ligands: readonly LigandBasis[];
  /**
   * Species that are dominant somewhere in this cell for pH within PRUNE_PH_MIN…PRUNE_PH_MAX (any potential in
   * ±PRUNE_E_LIMIT V): the only candidates a point there needs to compare. Found on demand (activeSpecies): a
   * system built for a single row — a water of its own — is answered faster by scanning every species.
   */
  active: Int32Array | null;
  /** Points answered by a full scan so far; after PRUNE_AFTER_QUERIES the active species are found. */
  queries: number;
}

/** Full scans a cell answers before it finds its active species (pruning costs about as much as 50–100 scans). */
export const PRUNE_AFTER_QUERIES = 64;

/** The pH domain the worksheet functions accept (docs/method.md, Domain), and a potential span far beyond any use. */
export const PRUNE_PH_MIN = PH_MIN;
export const PRUNE_PH_MAX = PH_MAX;
export const PRUNE_E_LIMIT = 1000;

export interface MetalSystem {
  readonly element: string;
  readonly celsius: number;
  readonly kelvin: number;
  /** Activity given to every dissolved metal species. */
  readonly activity: number;
  readonly species: readonly SystemSpecies[];
  readonly cells: readonly PlaneCell[];
  /** Index of the metal itself. */
  readonly metalIndex: number;
  /** The ligand totals the system was built for (absent in pure water), so points on it use the same water. */
  readonly ligandTotals?: LigandTotals;
}

export interface SystemOptions {
  celsius: number;
  activity: number;
}

export class SystemError extends Error {}

/** A cell of the plane given by its half-planes and the ligand basis species held fixed inside it. */
export type LigandCellSpec = { region: readonly HalfPlane[]; ligands: readonly LigandBasis[] };

/** Elements beyond H and O a species carries other than `element` (its ligands). */
function ligandElementsIn(species: Species, element: string): string[] {
  return Object.keys(species.elements).filter((e) => e !== element && e !== "H" && e !== "O");
}

/** The temperature and activity the engine accepts (docs/method.md, Domain), else a SystemError. */
function checkConditions(options: SystemOptions): void {
  if (!(options.celsius >= MIN_CELSIUS && options.celsius <= MAX_CELSIUS)) {
    throw new SystemError(`temperature ${options.celsius} °C is outside ${MIN_CELSIUS}–${MAX_CELSIUS} °C`);
  }
  if (!(options.activity > 0)) throw new SystemError("activity must be positive");
}

/** The ligand elements of the cells, after checking the data's temperature range covers each (temperature-range.ts). */
function ligandElementsChecked(
  db: Database,
  element: string,
  celsius: number,
  ligandCells: readonly LigandCellSpec[],
): Set<string> {
  const ligandElements = new Set<string>();
  for (const cell of ligandCells)
    for (const l of cell.ligands)
      for (const e of Object.keys(l.species.elements)) if (e !== "H" && e !== "O") ligandElements.add(e);
  const has = (e: string) => (ligandElements.has(e) ? 1 : 0);
  const problem = temperatureProblem(db, element, celsius, presentLigands(has("C"), has("Cl"), has("S"), has("P")));
  if (problem) throw new SystemError(problem);
  return ligandElements;
}

/** Species of the metal: those in its own file, plus ligand-bearing species of it whose ligands are present. */
function systemSpecies(
  db: Database,
  element: string,
  metal: Species,
  ligandElements: ReadonlySet<string>,
): SystemSpecies[] {
  const species: SystemSpecies[] = [];
  for (const s of db.allSpecies().filter((x) => x.elements[element] !== undefined)) {
    if (ligandElementsIn(s, element).some((e) => !ligandElements.has(e))) continue; // ligand not present in this water
    species.push({
      species: s,
      formula: s.formula,
      metalAtoms: s.elements[element],
      dissolved: s.state === "aq",
      regime: s === metal ? "immunity" : s.state === "aq" ? "corrosion" : "passivation",
    });
  }
  return species;
}

/** What every cell's planes share: the species, the metal, water, H+ and the temperature terms. */
interface PlaneContext {
  db: Database;
  species: readonly SystemSpecies[];
  metal: Species;
  metalIndex: number;
  /** Ligand elements each species needs (beyond the metal, H and O), found once. */
  needs: readonly string[][];
  T: number;
  lnActivity: number;
}

/**
 * The planes g_i = a + b·pH + c·E of one cell, per metal atom in volts: a = [ΔG°r(T) + RT Σ ν ln a_ligand]/(xF)
 * (+ RT ln a / (xF) when dissolved), b = −ν(H+)·k/x, c = −ν(e−)/x (Pourbaix 1974; Garrels & Christ 1965).
 */
function planeCell(ctx: PlaneContext, cell: LigandCellSpec): PlaneCell {
  const { db, species, metalIndex, needs, T, lnActivity } = ctx;
  const k = nernstFactor(T);
  const rtOverF = (GAS_CONSTANT * T) / FARADAY;
  const n = species.length;
  const a = new Float64Array(n);
  const b = new Float64Array(n);
  const c = new Float64Array(n);
  const aUnit = new Float64Array(n);
  const basis = [
    ctx.metal,
    db.require("H2O(l)"),
    db.require("H+"),
    ELECTRON,
    ...cell.ligands.map((l) => l.species),
  ] as const;
  const available = new Set(cell.ligands.flatMap((l) => Object.keys(l.species.elements)));
  const formationOf = formationTable(db, basis);
  species.forEach((entrySpecies, i) => {
    if (i === metalIndex) return; // the metal's plane is 0
    const formation = needs[i].some((e) => !available.has(e)) ? null : formationOf(entrySpecies.species);
    if (!formation) {
      a[i] = aUnit[i] = Infinity; // ligand absent in this cell, or no formation reaction
      return;
    }
    const { coefficients } = formation;
    const x = entrySpecies.metalAtoms;
    const dG = gibbsAt(formation.properties, T);
    let ligandTerm = 0;
    cell.ligands.forEach((l, j) => (ligandTerm += coefficients[4 + j] * l.lnActivity));
    aUnit[i] = (dG / FARADAY + rtOverF * ligandTerm) / x;
    a[i] = aUnit[i] + (entrySpecies.dissolved ? (rtOverF * lnActivity) / x : 0);
    b[i] = (-coefficients[2] * k) / x;
    c[i] = -coefficients[3] / x;
  });
  return { region: cell.region, a, b, c, aUnit, ligands: cell.ligands, active: null, queries: 0 };
}

/** Builds the planes of a metal's system at (T, activity), with optional ligand cells from `ligandCells`. */
export function buildSystem(
  db: Database,
  element: string,
  options: SystemOptions,
  ligandCells: readonly LigandCellSpec[] = [{ region: [], ligands: [] }],
): MetalSystem {
  const entry = db.system(element);
  if (!entry || entry.kind !== "metal") throw new SystemError(`no data for the metal ${element}`);
  checkConditions(options);
  // the element in its reference state: a solid, or the liquid for mercury
  const metal = entry.species.find(
    (s) => (s.state === "s" || s.state === "l") && Object.keys(s.elements).length === 1 && s.elements[element] === 1,
  );
  if (!metal) throw new SystemError(`the ${element} file lacks the metal ${element}(s)`);
  const ligandElements = ligandElementsChecked(db, element, options.celsius, ligandCells);
  const species = systemSpecies(db, element, metal, ligandElements);
  const metalIndex = species.findIndex((s) => s.species === metal);
  const T = kelvin(options.celsius);
  const ctx: PlaneContext = {
    db,
    species,
    metal,
    metalIndex,
    needs: species.map((s) => ligandElementsIn(s.species, element)),
    T,
    lnActivity: Math.log(options.activity),
  };
  const cells = ligandCells.map((cell) => planeCell(ctx, cell));
  return { element, celsius: options.celsius, kelvin: T, activity: options.activity, species, cells, metalIndex };
}

/** Indices of the species with a region of positive area in the pruning window of a cell (found once, kept). */
export function activeSpecies(cell: PlaneCell): Int32Array {
  if (cell.active) return cell.active;
  let area: Point[] = rectangle(PRUNE_PH_MIN, PRUNE_PH_MAX, -PRUNE_E_LIMIT, PRUNE_E_LIMIT);
  for (const h of cell.region) area = clipPolygon(area, h);
  const pieces = area.length > 2 ? envelopeRegions(cell, area, 0) : [];
  cell.active = Int32Array.from(new Set(pieces.map((p) => p.species))).sort();
  return cell.active;
}

/** The cell containing (pH, E); the first one when on a seam. */
export function cellAt(system: MetalSystem, pH: number, E: number): PlaneCell {
  const cells = system.cells;
  if (cells.length === 1) return cells[0];
  for (const cell of cells) if (insideAll(cell.region, pH, E, 1e-9)) return cell;
  return cells[cells.length - 1];
}

/** g of species i at (pH, E), volts per metal atom. */
export function speciesPotential(system: MetalSystem, i: number, pH: number, E: number): number {
  const cell = cellAt(system, pH, E);
  return cell.a[i] + cell.b[i] * pH + cell.c[i] * E;
}

/**
 * Index of the dominant species (lowest g) at (pH, E); ties go to the lower index. Inside the pruning window only
 * the cell's active species are compared (the others are never lowest there).
 */
export function dominantSpecies(system: MetalSystem, pH: number, E: number): number {
  const cell = cellAt(system, pH, E);
  const { a, b, c } = cell;
  const active = cell.active ?? (++cell.queries > PRUNE_AFTER_QUERIES ? activeSpecies(cell) : null);
  if (
    active &&
    active.length > 0 &&
    pH >= PRUNE_PH_MIN &&
    pH <= PRUNE_PH_MAX &&
    E >= -PRUNE_E_LIMIT &&
    E <= PRUNE_E_LIMIT
  ) {
    let best = active[0];
    let bestG = a[best] + b[best] * pH + c[best] * E;
    for (let k = 1, n = active.length; k < n; k++) {
      const i = active[k];
      const g = a[i] + b[i] * pH + c[i] * E;
      if (g < bestG) {
        bestG = g;
        best = i;
      }
    }
    return best;
  }
  let best = 0;
  let bestG = a[0] + b[0] * pH + c[0] * E;
  for (let i = 1, n = a.length; i < n; i++) {
    const g = a[i] + b[i] * pH + c[i] * E;
    if (g < bestG) {
      bestG = g;
      best = i;
    }
  }
  return best;
}

/** Index of a species by formula, or −1. */
export function speciesIndex(system: MetalSystem, formula: string): number {
  return system.species.findIndex((s) => s.formula === formula);
}

export type PairBoundary = { kind: "line"; intercept: number; slope: number } | { kind: "vertical"; pH: number } | null;

/**
 * The line where two species have equal g (in the first cell containing both), written E = intercept + slope·pH,
 * or pH = constant when no electrons are exchanged; null when the planes are parallel.
 */
export function pairBoundary(system: MetalSystem, first: string, second: string): PairBoundary {
  const i = speciesIndex(system, first);
  const j = speciesIndex(system, second);
  if (i < 0 || j < 0)
    throw new SystemError(`${i < 0 ? first : second} is not a species of the ${system.element} system`);
  const cell = system.cells.find((c) => Number.isFinite(c.a[i]) && Number.isFinite(c.a[j]));
  if (!cell) return null;
  const da = cell.a[i] - cell.a[j];
  const db = cell.b[i] - cell.b[j];
  const dc = cell.c[i] - cell.c[j];
  const tiny = 1e-12;
  if (Math.abs(dc) > tiny) return { kind: "line", intercept: -da / dc, slope: db === 0 ? 0 : -db / dc };
  if (Math.abs(db) > tiny) return { kind: "vertical", pH: -da / db };
  return null;
}

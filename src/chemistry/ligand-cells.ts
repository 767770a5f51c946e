/**
 * Ligands in real waters: carbonate, sulfur and chloride at fixed totals split the (pH, E) plane into cells in each
 * of which one basis species of every ligand predominates and carries the ligand's whole total as its activity.
 *
 * Method — the predominance treatment of a ligand at fixed total (Garrels, R.M., Christ, C.L., Solutions, Minerals
 * and Equilibria, 1965, ch. 7; Brookins, D.G., Eh–pH Diagrams for Geochemistry, 1988): the ligand's own species are
 * written as planes exactly like a metal's (system.ts, per ligand atom, dissolved species at activity = total,
 * solids at unit activity); the cells of their lower envelope are the ligand's predominance regions; in each cell
 * the predominant species is the basis from which every metal species containing the ligand is formed.
 *
 *   carbonate  CO2(aq) | HCO3− | CO3²−  — vertical boundaries at pK1(T) and pK2(T) (carbon treated as redox-inert:
 *              methane and graphite formation are slow and left out)
 *   sulfur     SO4²− | HSO4− | S(s) | H2S(aq) | HS− | S²−  — redox-active: a small predominance diagram of its own
 *   chloride   Cl− everywhere (its oxidation lies above the oxygen line and is very slow)
 *   phosphate  H3PO4 | H2PO4− | HPO4²− | PO4³−  — vertical boundaries at its three pKa (phosphorus redox-inert)
 *
 * Cells of several ligands are intersected (the half-planes of both).
 *
 * Approximation, stated: inside a cell the basis species is taken at the ligand's total, whereas by mass balance
 * its activity is total × its fraction. The error is largest on a ligand boundary, where two basis species share
 * the total: there the true activity is half the total (0.3 log units; a metal plane with ν ligands is off by
 * ν·0.3/x log units per metal atom), and it falls below 0.05 log units one pH unit (or 59/n mV) away from it.
 * Ligand bound in metal complexes is neglected (metal activities are far below ligand totals in waters). A full
 * mass balance would make ln a(basis) a non-linear function of pH and E, so the planes would no longer be linear in
 * the cells, and the exact polygons, boundaries and the one-scan batch kernel would be lost; it is not done here.
 * Ideal solution: activity coefficients 1 (totals in mol/kg are used as activities).
 */
import { FARADAY, GAS_CONSTANT, kelvin, nernstFactor } from "./constants";
import { Database, Species } from "./database";
import { formationTable } from "./formation";
import { clipPolygon, HalfPlane, Point, polygonArea, rectangle } from "./halfplane";
import { LigandBasis } from "./system";
import { ELECTRON, gibbsAt } from "./thermo";

export type LigandName = "carbonate" | "chloride" | "sulfur" | "phosphate";

/** Total of each ligand, mol/kg; 0 (or absent) = the ligand is not in the water. */
export type LigandTotals = Partial<Record<LigandName, number>>;

/** The ligand's own basis species (first one is the pivot they are written from), in data/species files. */
export const LIGAND_BASIS: Readonly<Record<LigandName, readonly string[]>> = {
  carbonate: ["HCO3-", "CO2(aq)", "CO32-"],
  sulfur: ["SO42-", "HSO4-", "S(s)", "H2S(aq)", "HS-", "S2-"],
  chloride: ["Cl-"],
  phosphate: ["HPO42-", "H3PO4(aq)", "H2PO4-", "PO43-"],
};

export const LIGAND_ORDER: readonly LigandName[] = ["carbonate", "sulfur", "chloride", "phosphate"];

/** A cell as buildSystem takes it. */
export interface LigandCell {
  readonly region: readonly HalfPlane[];
  readonly ligands: readonly LigandBasis[];
}

/**
 * Half-planes are checked and pruned inside a box far larger than any input the functions accept (pH −2…16, and
 * potentials a meter can read), so that every point a user can give lies in exactly one cell (seams aside).
 */
const BOX: Point[] = rectangle(-100, 100, -100, 100);
const BOX_AREA = Math.abs(polygonArea(BOX));
const EMPTY = BOX_AREA * 1e-14;

function clipAll(halfPlanes: readonly HalfPlane[]): Point[] {
  let polygon: Point[] = BOX;
  for (const h of halfPlanes) {
    polygon = clipPolygon(polygon, h);
    if (polygon.length < 3) return [];
  }
  return polygon;
}

function areaOf(halfPlanes: readonly HalfPlane[]): number {
  const polygon = clipAll(halfPlanes);
  return polygon.length < 3 ? 0 : Math.abs(polygonArea(polygon));
}

/** Drops half-planes that do not bound the region inside the box; null when the region is empty. */
export function pruneRegion(halfPlanes: readonly HalfPlane[]): HalfPlane[] | null {
  let kept = [...halfPlanes];
  const area = areaOf(kept);
  if (area <= EMPTY) return null;
  for (let i = kept.length - 1; i >= 0; i--) {
    const without = kept.filter((_, j) => j !== i);
    if (Math.abs(areaOf(without) - area) <= area * 1e-12) kept = without;
  }
  return kept;
}

/**
 * The predominance cells of one ligand at total `total` (mol/kg) and temperature: for each basis species that
 * predominates somewhere, the region where its plane is lowest and the basis it supplies.
 */
export function ligandOwnCells(db: Database, ligand: LigandName, total: number, celsius: number): LigandCell[] {
  if (!(total > 0)) throw new RangeError(`${ligand}: total must be positive`);
  const members = LIGAND_BASIS[ligand].map((f) => db.require(f));
  const element = ligandElement(members[0]);
  const T = kelvin(celsius);
  const k = nernstFactor(T);
  const rtOverF = (GAS_CONSTANT * T) / FARADAY;
  const lnTotal = Math.log(total);
  const pivot = members[0];
  const basis = [pivot, db.require("H2O(l)"), db.require("H+"), ELECTRON] as const;

  // planes per ligand atom, g = a + b·pH + c·E (volts), relative to the pivot at unit activity
  const formationOf = formationTable(db, basis);
  const planes = members.map((s) => {
    const atoms = s.elements[element];
    const formation = formationOf(s);
    if (!formation) throw new RangeError(`${s.formula} cannot be formed from ${pivot.formula}, H2O, H+ and e-`);
    const { coefficients } = formation;
    const dG = gibbsAt(formation.properties, T);
    const lnA = s.state === "aq" ? lnTotal : 0;
    return {
      a: (dG / FARADAY + rtOverF * lnA) / atoms,
      b: (-coefficients[2] * k) / atoms,
      c: -coefficients[3] / atoms,
      basis: { species: s, lnActivity: lnA },
    };
  });

  const cells: LigandCell[] = [];
  planes.forEach((p, i) => {
    const region: HalfPlane[] = [];
    for (let j = 0; j < planes.length; j++) {
      if (j === i) continue;
      const h = { a: p.a - planes[j].a, b: p.b - planes[j].b, c: p.c - planes[j].c };
      if (h.b === 0 && h.c === 0) {
        if (h.a > 0 || (h.a === 0 && j < i)) return; // never lowest (ties go to the lower index)
        continue;
      }
      region.push(h);
    }
    const pruned = pruneRegion(region);
    if (pruned) cells.push({ region: pruned, ligands: [p.basis] });
  });
  return cells;
}

/** Intersects two cell lists: every non-empty overlap, with the bases of both. */
export function intersectCells(first: readonly LigandCell[], second: readonly LigandCell[]): LigandCell[] {
  const out: LigandCell[] = [];
  for (const p of first) {
    for (const q of second) {
      const region = pruneRegion([...p.region, ...q.region]);
      if (region) out.push({ region, ligands: [...p.ligands, ...q.ligands] });
    }
  }
  return out;
}

/** The cells for a water with the given ligand totals; one empty cell when no ligand is present. */
export function ligandCells(db: Database, totals: LigandTotals, celsius: number): LigandCell[] {
  let cells: LigandCell[] = [{ region: [], ligands: [] }];
  for (const ligand of LIGAND_ORDER) {
    const total = totals[ligand] ?? 0;
    if (total > 0) cells = intersectCells(cells, ligandOwnCells(db, ligand, total, celsius));
  }
  return cells;
}

/** Whether any ligand is present. */
export function hasLigands(totals: LigandTotals): boolean {
  return LIGAND_ORDER.some((l) => (totals[l] ?? 0) > 0);
}

/** A cache key for the totals ("" when none is present). */
export function ligandKey(totals: LigandTotals): string {
  return hasLigands(totals) ? LIGAND_ORDER.map((l) => `${l}=${totals[l] ?? 0}`).join(";") : "";
}

function ligandElement(species: Species): string {
  const others = Object.keys(species.elements).filter((e) => e !== "H" && e !== "O");
  if (others.length !== 1) throw new Error(`${species.formula} is not a single-element ligand species`);
  return others[0];
}

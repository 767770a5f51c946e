/**
 * Coefficient tables of a metal's species, worked out once per database and element: every species (the metal's
 * own and the carbonate, sulfur, chloride and phosphate species containing it) is formed from the basis
 *
 *   metal, H2O, H+, e−, HCO3−, SO4²−, Cl−, HPO4²−
 *
 * by an exact balance (rationals, reaction.ts), and its reaction's ΔG°r(25 °C), ΔS°r and ΔCp°r are kept, so a point
 * at any temperature and in any water needs only arithmetic on these numbers (point-engine.ts). The ligands' own
 * species get the same treatment from their pivot (HCO3−, SO4²−, HPO4²−) for the ligand speciation (ligand-speciation.ts).
 */
import { CORRESPONDENCE_TERMS, NO_CORRESPONDENCE } from "./criss-cobble";
import { Database, Species } from "./database";
import { formationTable } from "./formation";
import type { Regime, SystemSpecies } from "./system";
import { ELECTRON, ReactionProperties } from "./thermo";

/** Bits of the ligands a species needs. */
export const NEEDS_CARBONATE = 1;
export const NEEDS_SULFUR = 2;
export const NEEDS_CHLORIDE = 4;
export const NEEDS_PHOSPHATE = 8;

/** The pivot (basis) species of each ligand. */
export const CARBONATE_PIVOT = "HCO3-";
export const SULFUR_PIVOT = "SO42-";
export const CHLORIDE_PIVOT = "Cl-";
export const PHOSPHATE_PIVOT = "HPO42-";

/**
 * Reaction properties as numbers: ΔG°r(T) = g0 − s·(T − T0) + cp·[(T − T0) − T·ln(T/T0)] + the Criss–Cobble
 * terms above 100 °C (row i's CORRESPONDENCE_TERMS weights from i·CORRESPONDENCE_TERMS; criss-cobble.ts).
 */
export interface ReactionColumns {
  readonly g0: Float64Array;
  readonly s: Float64Array;
  readonly cp: Float64Array;
  readonly correspondence: Float64Array;
}

/** ΔG°r(T) of row i, J/mol, with dT = T − T0, shape = dT − T·ln(T/T0) and the correspondence basis at T. */
export function rowGibbs(columns: ReactionColumns, i: number, dT: number, shape: number, basis: Float64Array): number {
  // at and below 100 °C the correspondence adds nothing: skip its terms (they ran once per species and temperature)
  if (basis === NO_CORRESPONDENCE) return columns.g0[i] - columns.s[i] * dT + columns.cp[i] * shape;
  let extra = 0;
  for (let k = 0, at = i * CORRESPONDENCE_TERMS; k < CORRESPONDENCE_TERMS; k++)
    extra += columns.correspondence[at + k] * basis[k];
  return columns.g0[i] - columns.s[i] * dT + columns.cp[i] * shape + extra;
}

export interface SpeciesTable extends ReactionColumns {
  readonly element: string;
  readonly species: readonly SystemSpecies[];
  readonly metalIndex: number;
  /** Metal atoms per formula unit. */
  readonly x: Float64Array;
  /** Basis coefficients (products positive) of H+, e−, HCO3−, SO4²−, Cl−, HPO4²−. */
  readonly proton: Float64Array;
  readonly electron: Float64Array;
  readonly carbonate: Float64Array;
  readonly sulfur: Float64Array;
  readonly chloride: Float64Array;
  readonly phosphate: Float64Array;
  /** NEEDS_* bits. */
  readonly needs: Uint8Array;
  /** 1 for dissolved species. */
  readonly dissolved: Uint8Array;
  /** z² of dissolved species (0 for solids), for activity coefficients. */
  readonly chargeSquared: Float64Array;
}

/** The ligand's own species, formed from its pivot, H2O, H+ and e− (one ligand atom each). */
export interface LigandTable extends ReactionColumns {
  readonly species: readonly Species[];
  readonly proton: Float64Array;
  readonly electron: Float64Array;
  readonly chargeSquared: Float64Array;
  /** Index of the solid (S(s)) or −1. */
  readonly solidIndex: number;
}

/** Fills reaction columns from properties (ΔG°r held constant when an entropy is missing, as thermo.ts does). */
function putReaction(columns: ReactionColumns, i: number, p: ReactionProperties): void {
  columns.g0[i] = p.dG0;
  columns.s[i] = p.dS === null ? 0 : p.dS;
  columns.cp[i] = p.dS === null ? 0 : p.dCp;
  if (p.dS !== null && p.correspondence) columns.correspondence.set(p.correspondence, i * CORRESPONDENCE_TERMS);
}

const LIGAND_ELEMENTS: Readonly<Record<string, number>> = {
  C: NEEDS_CARBONATE,
  S: NEEDS_SULFUR,
  Cl: NEEDS_CHLORIDE,
  P: NEEDS_PHOSPHATE,
};

const tables = new WeakMap<Database, Map<string, SpeciesTable>>();

/** The table of `element` (a metal of the database), built on first use and kept. */
export function speciesTable(db: Database, element: string): SpeciesTable {
  let byElement = tables.get(db);
  if (!byElement) tables.set(db, (byElement = new Map()));
  let table = byElement.get(element);
  if (!table) byElement.set(element, (table = buildSpeciesTable(db, element)));
  return table;
}

function buildSpeciesTable(db: Database, element: string): SpeciesTable {
  const entry = db.system(element);
  if (!entry || entry.kind !== "metal") throw new Error(`no data for the metal ${element}`);
  // the element in its reference state: a solid, or the liquid for mercury
  const metal = entry.species.find(
    (s) => (s.state === "s" || s.state === "l") && Object.keys(s.elements).length === 1 && s.elements[element] === 1,
  );
  if (!metal) throw new Error(`the ${element} file lacks the metal ${element}(s)`);
  const basis = [
    metal,
    db.require("H2O(l)"),
    db.require("H+"),
    ELECTRON,
    db.require(CARBONATE_PIVOT),
    db.require(SULFUR_PIVOT),
    db.require(CHLORIDE_PIVOT),
    db.require(PHOSPHATE_PIVOT),
  ] as const;
  const formationOf = formationTable(db, basis);
  const rows: { s: SystemSpecies; needs: number; coefficients: readonly number[]; props: ReactionProperties }[] = [];
  for (const s of db.allSpecies()) {
    if (s.elements[element] === undefined) continue;
    let needs = 0;
    let unknown = false;
    for (const e of Object.keys(s.elements)) {
      if (e === element || e === "H" || e === "O") continue;
      if (LIGAND_ELEMENTS[e] === undefined) unknown = true;
      else needs |= LIGAND_ELEMENTS[e];
    }
    const formation = unknown ? null : formationOf(s);
    if (!formation) continue;
    const regime: Regime = s === metal ? "immunity" : s.state === "aq" ? "corrosion" : "passivation";
    rows.push({
      s: { species: s, formula: s.formula, metalAtoms: s.elements[element], dissolved: s.state === "aq", regime },
      needs,
      coefficients: formation.coefficients,
      props: formation.properties,
    });
  }
  const n = rows.length;
  const col = () => new Float64Array(n);
  const table = {
    element,
    species: rows.map((r) => r.s),
    metalIndex: rows.findIndex((r) => r.s.species === metal),
    g0: col(),
    s: col(),
    cp: col(),
    correspondence: new Float64Array(n * CORRESPONDENCE_TERMS),
    x: col(),
    proton: col(),
    electron: col(),
    carbonate: col(),
    sulfur: col(),
    chloride: col(),
    phosphate: col(),
    needs: new Uint8Array(n),
    dissolved: new Uint8Array(n),
    chargeSquared: col(),
  };
  rows.forEach((r, i) => {
    putReaction(table, i, r.props);
    const c = r.coefficients;
    table.x[i] = r.s.metalAtoms;
    table.proton[i] = c[2];
    table.electron[i] = c[3];
    table.carbonate[i] = c[4];
    table.sulfur[i] = c[5];
    table.chloride[i] = c[6];
    table.phosphate[i] = c[7];
    table.needs[i] = r.needs;
    table.dissolved[i] = r.s.dissolved ? 1 : 0;
    table.chargeSquared[i] = r.s.dissolved ? r.s.species.charge ** 2 : 0;
  });
  return table;
}

const ligandTables = new WeakMap<Database, Map<string, LigandTable>>();

/** The own-species table of a ligand from its pivot; `members` are the ligand's species (pivot first). */
export function ligandTable(db: Database, members: readonly string[]): LigandTable {
  let byPivot = ligandTables.get(db);
  if (!byPivot) ligandTables.set(db, (byPivot = new Map()));
  const key = members.join(",");
  let table = byPivot.get(key);
  if (table) return table;
  const species = members.map((f) => db.require(f));
  const formationOf = formationTable(db, [species[0], db.require("H2O(l)"), db.require("H+"), ELECTRON]);
  const n = species.length;
  const built = {
    species,
    g0: new Float64Array(n),
    s: new Float64Array(n),
    cp: new Float64Array(n),
    correspondence: new Float64Array(n * CORRESPONDENCE_TERMS),
    proton: new Float64Array(n),
    electron: new Float64Array(n),
    chargeSquared: new Float64Array(n),
    solidIndex: species.findIndex((s) => s.state === "s"),
  };
  species.forEach((s, i) => {
    const formation = formationOf(s);
    if (!formation) throw new Error(`${s.formula} cannot be formed from ${species[0].formula}, H2O, H+ and e-`);
    putReaction(built, i, formation.properties);
    built.proton[i] = formation.coefficients[2];
    built.electron[i] = formation.coefficients[3];
    built.chargeSquared[i] = s.charge * s.charge;
  });
  byPivot.set(key, (table = built));
  return table;
}

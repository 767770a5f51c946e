/**
 * Formation reactions: of a species from a basis (the metal or a ligand's pivot species, H2O, H+, e−, ligand
 * species), for the species planes; and from the elements, for tables.
 *
 * From the elements, the formation reaction takes each element in its reference state (data/elements.json) and balances charge with
 * electrons, which follow the hydrogen-electrode convention (thermo.ts): for Cu2+,  Cu(s) → Cu2+ + 2e−, whose
 * ΔS equals that of Cu(s) + 2H+ → Cu2+ + H2(g) on the conventional ion scale.
 */
import { kelvin } from "./constants";
import { Database, Species } from "./database";
import { rational, Rational } from "./exact";
import { balanceWith } from "./reaction";
import { ELECTRON, gibbsAt, ReactionProperties, reactionProperties } from "./thermo";

/** ΔG°f(T) in J/mol, or null when a reference-state species of one of its elements is not in the database. */
export function formationGibbsAt(db: Database, species: Species, celsius: number): number | null {
  const stoichiometry = new Map<Species | typeof ELECTRON, number>([[species, 1]]);
  for (const [symbol, count] of Object.entries(species.elements)) {
    const element = db.element(symbol);
    const reference = element ? db.species(element.referenceState) : undefined;
    if (!reference) return null;
    const atomsPerUnit = reference.elements[symbol];
    if (reference === species) return 0; // an element in its reference state
    stoichiometry.set(reference, (stoichiometry.get(reference) ?? 0) - count / atomsPerUnit);
  }
  if (species.charge !== 0) stoichiometry.set(ELECTRON, species.charge);
  const props = reactionProperties(db, stoichiometry);
  // ΔG°r(T0) of the formation reaction is ΔG°f itself (reference states and the electron have zero ΔG°f)
  return gibbsAt(props, kelvin(celsius));
}

/** A species' formation reaction from a basis: coefficients of the basis species and the reaction's properties. */
export interface Formation {
  readonly coefficients: readonly number[];
  readonly properties: ReactionProperties;
}

/**
 * Formation reactions from one basis, looked up by species. A reaction (exact balance, then as numbers) depends
 * only on the formulas and the records, not on temperature, activity or ligand totals, so each is worked out once
 * per database and basis: systems for many conditions — a water of its own on every row — reuse them.
 */
const formations = new WeakMap<Database, Map<string, Map<Species, Formation | null>>>();

export function formationTable(
  db: Database,
  basis: readonly (Species | typeof ELECTRON)[],
): (s: Species) => Formation | null {
  let byBasis = formations.get(db);
  if (!byBasis) formations.set(db, (byBasis = new Map()));
  const key = basis.map((m) => (m === ELECTRON ? ELECTRON : m.formula)).join(",");
  let table = byBasis.get(key);
  if (!table) byBasis.set(key, (table = new Map()));
  const known = table;
  return (s) => {
    let found = known.get(s);
    if (found === undefined) {
      found = formationFromBasis(db, s, basis);
      known.set(s, found);
    }
    return found;
  };
}

/** The formation reaction of `s` from `basis`, or null when no balance exists (worked out afresh; see formationTable). */
export function formationFromBasis(
  db: Database,
  s: Species,
  basis: readonly (Species | typeof ELECTRON)[],
): Formation | null {
  let coefficients: number[];
  try {
    coefficients = balanceWith(new Map([[s, rational(1)]]), basis).map((c: Rational) => c.valueOf());
  } catch {
    return null;
  }
  const stoichiometry = new Map<Species | typeof ELECTRON, number>([[s, 1]]);
  basis.forEach((m, j) => stoichiometry.set(m, (stoichiometry.get(m) ?? 0) + coefficients[j]));
  return { coefficients, properties: reactionProperties(db, stoichiometry) };
}

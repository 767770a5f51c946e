/**
 * Gibbs energy of formation from the elements at temperature, for tables.
 *
 * The formation reaction takes each element in its reference state (data/elements.json) and balances charge with
 * electrons, which follow the hydrogen-electrode convention (thermo.ts): for Cu2+,  Cu(s) → Cu2+ + 2e−, whose
 * ΔS equals that of Cu(s) + 2H+ → Cu2+ + H2(g) on the conventional ion scale.
 */
import { kelvin } from "./constants";
import { Database, Species } from "./database";
import { ELECTRON, gibbsAt, reactionProperties } from "./thermo";

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

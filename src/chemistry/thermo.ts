/**
 * Reaction thermodynamics at temperature from properties at 25 °C.
 *
 * With a constant heat-capacity change (the usual integration of Kirchhoff's law at 1 bar, e.g. Anderson &
 * Crerar, Thermodynamics in Geochemistry, 1993, eq. 8.22):
 *
 *   ΔG°r(T) = ΔG°r(T0) − ΔS°r·(T − T0) + ΔCp°r·[(T − T0) − T·ln(T/T0)],   T0 = 298.15 K
 *
 * Above 100 °C the ions' heat capacities follow the correspondence principle of Criss & Cobble (1964)
 * (criss-cobble.ts), joined at 100 °C with equal ΔG°r and ΔS°r; solids, gases, neutral aqueous species and water
 * keep the constant-Cp form. Below 100 °C nothing changes.
 *
 * Conventions: ions on the conventional scale (H+ zero in G, H, S and Cp at every temperature). The electron
 * follows the hydrogen-electrode convention so that E°(H+/H2) = 0 at every temperature: it carries
 * S = ½ S°(H2, g) and Cp = ½ Cp°(H2, g), and zero Gibbs energy of formation.
 */
import { T0 } from "./constants";
import { addCorrespondence, correspondenceGibbs, CORRESPONDENCE_TERMS, setReplacedHeatCapacity } from "./criss-cobble";
import { Database, Species } from "./database";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { log } = Math;

/** Marker for the electron in a reaction. */
export const ELECTRON = "e-";

/** A reaction as coefficients: positive for products, negative for reactants. */
export type Stoichiometry = ReadonlyMap<Species | typeof ELECTRON, number>;

export interface ReactionProperties {
  /** ΔG°r at 298.15 K, J/mol. */
  readonly dG0: number;
  /** ΔS°r, J/(mol·K); null when a species lacks S° (then ΔG°r is taken as independent of T). */
  readonly dS: number | null;
  /**
   * ΔCp°r, J/(mol·K); 0 when any species lacks Cp° — the whole sum, so it depends on how the reaction is written
   * (every answer writes formations from the element's basis; docs/method.md, Temperature; the records' notes).
   */
  readonly dCp: number;
  /** True when some Cp° was missing and ΔCp°r was set to 0. */
  readonly cpMissing: boolean;
  /** Weights of the ions' Criss–Cobble terms above 100 °C (criss-cobble.ts), or null (no ion covered, or no ΔS°r). */
  readonly correspondence: Float64Array | null;
}

/** Sums the standard properties of a reaction. */
export function reactionProperties(db: Database, stoichiometry: Stoichiometry): ReactionProperties {
  const hydrogen = db.require("H2(g)");
  let dG0 = 0;
  let dS: number | null = 0;
  let dCp = 0;
  let cpMissing = false;
  const weights = new Float64Array(CORRESPONDENCE_TERMS);
  let covered = false;
  let coveredCp = 0;
  for (const [species, nu] of stoichiometry) {
    if (nu === 0) continue;
    if (species === ELECTRON) {
      // electron: G = 0, S = ½ S°(H2), Cp = ½ Cp°(H2)
      if (dS !== null) dS = hydrogen.S === null ? null : dS + nu * 0.5 * hydrogen.S;
      if (hydrogen.Cp === null) cpMissing = true;
      else dCp += nu * 0.5 * hydrogen.Cp;
      continue;
    }
    dG0 += nu * species.dGf;
    if (dS !== null) dS = species.S === null ? null : dS + nu * species.S;
    if (species.Cp === null) cpMissing = true;
    else dCp += nu * species.Cp;
    if (addCorrespondence(weights, species, nu)) {
      covered = true;
      coveredCp += nu * (species.Cp ?? 0);
    }
  }
  // the covered ions' share of the constant ΔCp°r, which the correspondence replaces above 100 °C
  setReplacedHeatCapacity(weights, cpMissing ? 0 : coveredCp);
  return { dG0, dS, dCp: cpMissing ? 0 : dCp, cpMissing, correspondence: covered && dS !== null ? weights : null };
}

/** ΔG°r at temperature T (kelvin), J/mol: constant ΔCp°r, plus the ions' Criss–Cobble terms above 100 °C. */
export function gibbsAt(props: ReactionProperties, kelvinT: number): number {
  if (props.dS === null) return props.dG0;
  const dT = kelvinT - T0;
  return (
    props.dG0 -
    props.dS * dT +
    props.dCp * (dT - kelvinT * log(kelvinT / T0)) +
    correspondenceGibbs(props.correspondence, kelvinT)
  );
}

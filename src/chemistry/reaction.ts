/**
 * Half-reactions and equilibrium constants.
 *
 * Reactions between species are balanced with H2O, H+ and e− (and, for species carrying a ligand element, a basis
 * species of that element) by solving the element and charge balances exactly in rationals. The standard potential
 * of a half-reaction  ox + h H+ + n e− → red + w H2O  is E° = −ΔG°r / (nF); at other activities the Nernst
 * equation E = E° − (RT ln10 / nF)·log10 Q applies (Q products over reactants, H+ through pH).
 */
import { DEFAULT_CELSIUS } from "./domain";
import { FARADAY, GAS_CONSTANT, LN10, kelvin, nernstFactor } from "./constants";
import { Database, Species } from "./database";
import { Rational, rational, solveExact } from "./exact";
import { ELECTRON, gibbsAt, ReactionProperties, reactionProperties, Stoichiometry } from "./thermo";

export class ReactionError extends Error {}

type Member = Species | typeof ELECTRON;

function composition(member: Member): Record<string, number> {
  if (member === ELECTRON) return { charge: -1 };
  return { ...member.elements, charge: member.charge };
}

/**
 * Finds coefficients for `basis` such that  Σ given + Σ c_b·basis_b  is balanced in every element and in charge.
 * `given` holds the fixed part (positive products, negative reactants). Returns the basis coefficients, exact.
 */
export function balanceWith(given: ReadonlyMap<Member, Rational>, basis: readonly Member[]): Rational[] {
  const keys = new Set<string>();
  for (const m of [...given.keys(), ...basis]) for (const k of Object.keys(composition(m))) keys.add(k);
  const keyList = [...keys];
  const a = keyList.map((k) => basis.map((b) => rational(composition(b)[k] ?? 0)));
  const rhs = keyList.map((k) => {
    let sum = rational(0);
    for (const [m, nu] of given) sum = sum.add(nu.mul(composition(m)[k] ?? 0));
    return sum.neg();
  });
  const x = solveExact(a, rhs);
  if (!x) {
    const names = [...given.keys()].map((m) => (m === ELECTRON ? "e-" : m.formula)).join(", ");
    throw new ReactionError(
      `cannot balance ${names} with ${basis.map((b) => (b === ELECTRON ? "e-" : b.formula)).join(", ")}`,
    );
  }
  return x;
}

/** A balanced half-reaction written as reduction: ox + h H+ + n e− → ν·red + w H2O (coefficients per 1 ox). */
export interface HalfReaction {
  readonly oxidized: Species;
  readonly reduced: Species;
  /** Moles of reduced species per mole of oxidized species. */
  readonly reducedPerOxidized: number;
  /** H+ consumed (negative when produced). */
  readonly protons: number;
  /** Electrons consumed; > 0 for a true reduction. */
  readonly electrons: number;
  /** H2O produced (negative when consumed). */
  readonly water: number;
  readonly stoichiometry: Stoichiometry;
}

/** The element both species share other than H and O: the one that is reduced. */
function sharedElement(a: Species, b: Species): string {
  const candidates = Object.keys(a.elements).filter((e) => e !== "H" && e !== "O" && b.elements[e] !== undefined);
  if (candidates.length === 0)
    throw new ReactionError(`${a.formula} and ${b.formula} share no element besides H and O`);
  return candidates[0];
}

/** Balances ox → red with H2O, H+ and e−. Throws ReactionError when no such balance exists. */
export function halfReaction(db: Database, oxidized: Species, reduced: Species): HalfReaction {
  const element = sharedElement(oxidized, reduced);
  const ratio = rational(oxidized.elements[element]).div(reduced.elements[element]);
  const water = db.require("H2O(l)");
  const proton = db.require("H+");
  const given = new Map<Member, Rational>([
    [oxidized, rational(-1)],
    [reduced, ratio],
  ]);
  const [cWater, cProton, cElectron] = balanceWith(given, [water, proton, ELECTRON]);
  // balanceWith returns coefficients as products; reactant H+ and e− are the negatives
  const stoichiometry = new Map<Member, number>([
    [oxidized, -1],
    [reduced, ratio.valueOf()],
    [water, cWater.valueOf()],
    [proton, cProton.valueOf()],
    [ELECTRON, cElectron.valueOf()],
  ]);
  return {
    oxidized,
    reduced,
    reducedPerOxidized: ratio.valueOf(),
    protons: -cProton.valueOf(),
    electrons: -cElectron.valueOf(),
    water: cWater.valueOf(),
    stoichiometry,
  };
}

/** Standard potential (V vs SHE) of the half-reaction between two species at `celsius`. */
export function standardPotential(
  db: Database,
  oxidized: string | Species,
  reduced: string | Species,
  celsius = DEFAULT_CELSIUS,
): number {
  const ox = typeof oxidized === "string" ? db.require(oxidized) : oxidized;
  const red = typeof reduced === "string" ? db.require(reduced) : reduced;
  const reaction = halfReaction(db, ox, red);
  if (reaction.electrons === 0)
    throw new ReactionError(`${ox.formula} and ${red.formula} have the same oxidation state`);
  const dG = gibbsAt(reactionProperties(db, reaction.stoichiometry), kelvin(celsius));
  return -dG / (reaction.electrons * FARADAY);
}

/**
 * Equilibrium potential (V vs SHE) of the couple at pH, temperature and a common activity for dissolved species
 * (solids and liquid water at unit activity, gases at 1 bar).
 */
export function couplePotential(
  db: Database,
  oxidized: Species,
  reduced: Species,
  options: { pH: number; celsius: number; activity: number },
): number {
  const reaction = halfReaction(db, oxidized, reduced);
  if (reaction.electrons === 0)
    throw new ReactionError(`${oxidized.formula} and ${reduced.formula} have the same oxidation state`);
  const T = kelvin(options.celsius);
  const k = nernstFactor(T);
  const dG = gibbsAt(reactionProperties(db, reaction.stoichiometry), T);
  const eStandard = -dG / (reaction.electrons * FARADAY);
  const logA = Math.log10(options.activity);
  const logActivity = (s: Species) => (s.state === "aq" && s.formula !== "H2O(l)" ? logA : 0);
  // log Q = ν_red·log a_red − log a_ox + h·pH   (a_H+ = 10^−pH is a reactant with coefficient h)
  const logQ =
    reaction.reducedPerOxidized * logActivity(reduced) - logActivity(oxidized) + reaction.protons * options.pH;
  return eStandard - (k / reaction.electrons) * logQ;
}

/**
 * log10 K of a reaction given as formula → coefficient (negative for reactants; "e-" for the electron) at
 * `celsius`. Checks the balance of every element and of charge first.
 */
export function reactionLogK(
  db: Database,
  coefficients: Readonly<Record<string, number>>,
  celsius = DEFAULT_CELSIUS,
): number {
  return logKAt(balancedProperties(db, coefficients), celsius);
}

/** log10 K at `celsius` of a reaction with these properties: log K = −ΔG°r(T)/(RT ln 10). */
export function logKAt(props: ReactionProperties, celsius: number): number {
  const T = kelvin(celsius);
  return -gibbsAt(props, T) / (GAS_CONSTANT * T * LN10);
}

/** The summed properties of a reaction given by formulas and coefficients, checked for balance (ReactionError). */
export function balancedProperties(db: Database, coefficients: Readonly<Record<string, number>>): ReactionProperties {
  const stoichiometry = new Map<Member, number>();
  const totals: Record<string, number> = {};
  for (const [formula, nu] of Object.entries(coefficients)) {
    const member: Member = formula === ELECTRON ? ELECTRON : db.require(formula);
    stoichiometry.set(member, nu);
    for (const [k, v] of Object.entries(composition(member))) totals[k] = (totals[k] ?? 0) + nu * v;
  }
  for (const [k, v] of Object.entries(totals)) {
    if (Math.abs(v) > 1e-9) throw new ReactionError(`reaction is not balanced in ${k} (${v})`);
  }
  return reactionProperties(db, stoichiometry);
}

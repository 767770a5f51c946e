/**
 * Estimated S° (records whose entropySource is the isocoulombic-exchange estimate, reference key ISO94): each record
 * states its exchange reaction with analogues, whose ΔS°r is taken as zero (Gu, Gammons & Bloom 1994, the premise of
 * their one-term extrapolation). These checks recompute ΔS°r of each stated reaction from the database's own
 * records — a round trip that guards the arithmetic and the note, not an outside check of the estimate — and require
 * every estimated record to have its reaction here.
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { parseFormula } from "../../src/chemistry/formula";

const db = getDatabase();

/**
 * Analogues outside the database, J/(mol·K): Wagman et al. 1982 (NBS tables), from memory, as ISO94 of the data
 * files cites them.
 */
const OUTSIDE = new Map([
  ["Be2+", { S: -129.7, charge: 2 }],
  ["BeO22-", { S: -159.0, charge: -2 }],
]);

/** Exchange reactions (reactants negative), one per estimated species, as the records' notes state them. */
const EXCHANGES: Record<string, Record<string, number>> = {
  "HFeO2-": { "Fe2+": -1, "Al(OH)4-": -1, "Fe3+": -1, "HFeO2-": 1, "H2O(l)": 1, "Al3+": 1, "FeOH2+": 1 },
  "Fe(OH)2+": { "FeOH2+": -1, "NiOH+": -1, "Fe(OH)2+": 1, "Ni2+": 1 },
  "Fe(OH)4-": { "Fe3+": -1, "Al(OH)4-": -1, "Fe(OH)4-": 1, "Al3+": 1 },
  "CuOH+": { "Cu2+": -1, "NiOH+": -1, "CuOH+": 1, "Ni2+": 1 },
  "HCuO2-": { "Cu2+": -1, "Al(OH)4-": -1, "Fe3+": -1, "HCuO2-": 1, "H2O(l)": 1, "Al3+": 1, "FeOH2+": 1 },
  "CuO22-": { "Cu2+": -1, "BeO22-": -1, "CuO22-": 1, "Be2+": 1 },
  "HNiO2-": { "Ni2+": -1, "Al(OH)4-": -1, "Fe3+": -1, "HNiO2-": 1, "H2O(l)": 1, "Al3+": 1, "FeOH2+": 1 },
  "ZnOH+": { "Zn2+": -1, "NiOH+": -1, "ZnOH+": 1, "Ni2+": 1 },
  "Zn(OH)3-": { "Zn2+": -1, "Al(OH)4-": -1, "Fe3+": -1, "Zn(OH)3-": 1, "Al3+": 1, "FeOH2+": 1 },
  "Zn(OH)42-": { "Zn2+": -1, "BeO22-": -1, "H2O(l)": -2, "Zn(OH)42-": 1, "Be2+": 1 },
  "Cr2+": { "Cr2+": -1, "Fe(s)": -1, "Fe2+": 1, "Cr(s)": 1 },
  "Cr3+": { "Cr3+": -1, "Fe(s)": -1, "Fe3+": 1, "Cr(s)": 1 },
  "CrOH2+": { "Cr3+": -1, "FeOH2+": -1, "CrOH2+": 1, "Fe3+": 1 },
  "Cr(OH)2+": { "CrOH2+": -1, "NiOH+": -1, "Cr(OH)2+": 1, "Ni2+": 1 },
  "Cr(OH)4-": { "Cr3+": -1, "Al(OH)4-": -1, "Cr(OH)4-": 1, "Al3+": 1 },
};
const entropy = (formula: string): number => OUTSIDE.get(formula)?.S ?? db.require(formula).S!;
const chargeOf = (formula: string): number => OUTSIDE.get(formula)?.charge ?? db.require(formula).charge;

describe("estimated S°: the stated isocoulombic exchange reactions", () => {
  for (const [formula, reaction] of Object.entries(EXCHANGES)) {
    it(`${formula}: its exchange reaction balances, keeps the charge types, and has ΔS°r = 0 within rounding`, () => {
      const parts = Object.entries(reaction).map(([f, nu]) => ({ nu, parsed: parseFormula(f, chargeOf(f)) }));
      const elements = new Map<string, number>();
      for (const { nu, parsed } of parts)
        for (const [el, n] of Object.entries(parsed.elements)) elements.set(el, (elements.get(el) ?? 0) + nu * n);
      for (const [el, n] of elements) expect(n, el).toBeCloseTo(0, 12);
      const charges = (sign: number) =>
        parts
          .filter(({ nu, parsed }) => Math.sign(nu) === sign && parsed.charge !== 0)
          .map(({ parsed }) => parsed.charge)
          .sort();
      expect(charges(1)).toEqual(charges(-1));
      const dS = Object.entries(reaction).reduce((sum, [f, nu]) => sum + nu * entropy(f), 0);
      expect(Math.abs(dS)).toBeLessThan(0.06);
    });
  }

  it("every record whose S° is an ISO94 estimate has its reaction here", () => {
    const estimated = db.allSpecies().filter((s) => s.source.includes("isocoulombic exchange"));
    expect(estimated.length).toBeGreaterThan(0);
    expect(estimated.map((s) => s.formula).sort()).toEqual(Object.keys(EXCHANGES).sort());
  });
});

/**
 * Consistency of every thermodynamic data file in data/species (all systems, whoever wrote them):
 *   - each file on disk is registered in src/chemistry/data-files.ts and passes the zod schema through the loader;
 *   - every formula parses with its stated charge, and ions are aqueous;
 *   - every element used has a record in data/elements.json whose reference state is itself a species record with
 *     S° (needed for ΔfS°);
 *   - ΔG°f ≈ ΔH°f − T·ΔfS° within 1.5 kJ/mol wherever all three are given;
 *   - the formation reaction of every species from its elements (conventional scale: + z H+ → + z/2 H2) balances
 *     in every element and in charge, and the engine's ΔG°r of it equals the record's ΔG°f;
 *   - the water records reproduce the ionisation constant of water from 0 to 100 °C within 0.05 in pKw;
 *   - every species consumes the ligand pivots of its formation (the point engine's bounds rest on it).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { Database, getDatabase } from "../../src/chemistry/database";
import { DATA_FILES, ELEMENTS_FILE } from "../../src/chemistry/data-files";
import { parseFormula } from "../../src/chemistry/formula";
import { reactionLogK } from "../../src/chemistry/reaction";
import { consumesLigands, pointEngine } from "../../src/chemistry/point-engine";
import { speciesTable } from "../../src/chemistry/species-tables";
import { GAS_CONSTANT, LN10, T0 } from "../../src/chemistry/constants";

const SPECIES_DIR = join(__dirname, "..", "..", "data", "species");
const filesOnDisk = readdirSync(SPECIES_DIR)
  .filter((f) => f.endsWith(".json"))
  .sort();

/**
 * Records whose compilation gives ΔG°f, ΔH°f and S° that agree only loosely, with the reason. Each entry must keep
 * failing the default tolerance; otherwise it is stale and the test says so.
 */
const LOOSE: Record<string, { tolerance: number; reason: string }> = {
  "Co3O4(s)": {
    tolerance: 2.0,
    reason: "NBS 1982 gives ΔH°f to 1 kJ/mol only (−891 kJ/mol); misfit 1.6 kJ/mol (documented in co.json's test)",
  },
};
const DEFAULT_TOLERANCE_KJ = 1.5;

describe("data files: registration and schema", () => {
  it("data/species holds files", () => {
    expect(filesOnDisk.length).toBeGreaterThan(0);
  });
  for (const file of filesOnDisk) {
    it(`${file} is registered in data-files.ts`, () => {
      expect(DATA_FILES.map((d) => d.path)).toContain(`data/species/${file}`);
    });
    it(`${file} loads through the zod-validated loader on its own (with water for the reference states)`, () => {
      const content = JSON.parse(readFileSync(join(SPECIES_DIR, file), "utf8"));
      const files = [{ path: `data/species/${file}`, content }];
      if (file !== "water.json") {
        files.push({
          path: "data/species/water.json",
          content: JSON.parse(readFileSync(join(SPECIES_DIR, "water.json"), "utf8")),
        });
      }
      expect(() => new Database(files, ELEMENTS_FILE)).not.toThrow();
    });
  }
  it("the registered set loads as one database with unique formulas", () => {
    expect(() => getDatabase()).not.toThrow();
  });
});

const db = getDatabase();
const hydrogen = db.require("H2(g)");

describe("data files: formulas, elements and reference states", () => {
  for (const s of db.allSpecies()) {
    it(`${s.system}: ${s.formula} parses with charge ${s.charge}`, () => {
      const parsed = parseFormula(s.formula, s.charge);
      expect(parsed.charge).toBe(s.charge);
      expect(parsed.elements).toEqual(s.elements);
      if (s.charge !== 0) expect(s.state).toBe("aq");
      else expect(parsed.state).toBe(s.state);
      for (const el of Object.keys(s.elements)) {
        const element = db.element(el);
        expect(element, `element ${el}`).toBeDefined();
        const ref = db.species(element!.referenceState);
        expect(ref, `reference state ${element!.referenceState} of ${el} has a species record`).toBeDefined();
        expect(Object.keys(ref!.elements), element!.referenceState).toEqual([el]);
        expect(ref!.dGf).toBe(0);
        expect(ref!.S, `S° of ${ref!.formula}`).not.toBeNull();
      }
    });
  }
});

/** Formation reaction of a species from its elements in their reference states, conventional scale for ions. */
function formationReaction(formula: string): Record<string, number> {
  const s = db.require(formula);
  const reaction: Record<string, number> = { [formula]: 1 };
  const add = (f: string, nu: number) => {
    reaction[f] = (reaction[f] ?? 0) + nu;
  };
  for (const [el, n] of Object.entries(s.elements)) {
    const ref = db.require(db.element(el)!.referenceState);
    add(ref.formula, -n / ref.elements[el]);
  }
  // ion of charge z: elements + z H+ → ion + z/2 H2(g)
  if (s.charge !== 0) {
    add("H+", -s.charge);
    add("H2(g)", s.charge / 2);
  }
  return reaction;
}

function isReferenceOrProton(formula: string): boolean {
  const s = db.require(formula);
  if (formula === "H+") return true;
  const symbols = Object.keys(s.elements);
  return symbols.length === 1 && db.element(symbols[0])?.referenceState === formula;
}

describe("data files: thermodynamic consistency", () => {
  for (const s of db.allSpecies()) {
    if (isReferenceOrProton(s.formula)) continue;
    it(`${s.system}: formation reaction of ${s.formula} balances and gives back ΔG°f`, () => {
      // reactionLogK throws when an element or the charge does not balance
      const logK = reactionLogK(db, formationReaction(s.formula), 25);
      const dG = -GAS_CONSTANT * T0 * LN10 * logK;
      expect(Math.abs(dG - s.dGf)).toBeLessThan(1e-6 * Math.max(1, Math.abs(s.dGf)));
    });

    if (s.dHf === null || s.S === null) continue;
    it(`${s.system}: ${s.formula} ΔG°f ≈ ΔH°f − T·ΔfS°`, () => {
      // ΔfS° = S° − Σ ν S°(elements) + (z/2)·S°(H2): the entropy of  elements + z H+ → species + z/2 H2(g)
      let sumElements = 0;
      for (const [el, n] of Object.entries(s.elements)) {
        const ref = db.require(db.element(el)!.referenceState);
        sumElements += (n / ref.elements[el]) * ref.S!;
      }
      const dS = s.S! - sumElements + (s.charge / 2) * hydrogen.S!;
      const calc = (s.dHf! - T0 * dS) / 1000;
      const misfit = Math.abs(calc - s.dGf / 1000);
      const loose = LOOSE[s.formula];
      if (loose) {
        expect(misfit, `${s.formula}: documented misfit (${loose.reason}) is no longer there`).toBeGreaterThan(
          DEFAULT_TOLERANCE_KJ,
        );
        expect(misfit).toBeLessThanOrEqual(loose.tolerance);
      } else {
        expect(
          misfit,
          `${s.formula}: ΔG°f ${s.dGf / 1000} kJ/mol, ΔH°f − TΔfS° = ${calc.toFixed(2)}`,
        ).toBeLessThanOrEqual(DEFAULT_TOLERANCE_KJ);
      }
    });
  }
});

/**
 * pKw(T) from the water records with the engine's constant-ΔCp integration. Check values: Bandura, A.V., Lvov,
 * S.N., "The ionization constant of water over wide ranges of temperature and density", J. Phys. Chem. Ref. Data
 * 35, 15 (2006), table of pKw along the saturation curve / 0.1 MPa (from memory).
 */
const PKW: { celsius: number; value: number; source: string }[] = [
  { celsius: 0, value: 14.946, source: "Bandura & Lvov 2006 (from memory)" },
  { celsius: 25, value: 13.995, source: "Bandura & Lvov 2006 (from memory)" },
  { celsius: 50, value: 13.264, source: "Bandura & Lvov 2006 (from memory)" },
  { celsius: 60, value: 13.017, source: "Bandura & Lvov 2006 (from memory)" },
  { celsius: 100, value: 12.264, source: "Bandura & Lvov 2006 (from memory)" },
];

describe("water records: pKw(T) within 0.05 of Bandura & Lvov 2006", () => {
  for (const c of PKW) {
    it(`pKw at ${c.celsius} °C = ${c.value} (${c.source})`, () => {
      const pKw = -reactionLogK(db, { "H2O(l)": -1, "H+": 1, "OH-": 1 }, c.celsius);
      expect(Math.abs(pKw - c.value)).toBeLessThanOrEqual(0.05);
    });
  }
});

describe("species tables: ligand pivots are consumed", () => {
  // the point engine's argmin bounds a species' g from below with each ligand pivot at its total: sound only where
  // every species takes its pivots in (ν_L ≤ 0 in its formation from metal, pivots, H2O, H+ and e−)
  it("every metal's engine builds (its constructor checks each species)", () => {
    for (const metal of getDatabase().metals()) expect(() => pointEngine(getDatabase(), metal)).not.toThrow();
  });

  it("a species that would release a pivot fails loudly, named", () => {
    const table = speciesTable(getDatabase(), "Pb");
    const i = table.species.findIndex((s) => s.formula === "PbCO3(s)");
    const broken = { ...table, carbonate: Float64Array.from(table.carbonate, (x, j) => (j === i ? 1 : x)) };
    expect(() => consumesLigands(table)).not.toThrow();
    expect(() => consumesLigands(broken)).toThrow(/PbCO3\(s\) releases a ligand pivot/);
  });
});

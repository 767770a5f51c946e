/**
 * Reference checks for the tin, cobalt, magnesium, titanium, silver, cadmium and molybdenum records
 * (data/species/sn.json … mo.json):
 *   1. standard potentials against Bard, Parsons & Jordan (1985) and the CRC electrochemical series, within 10 mV;
 *   2. hydrolysis and solubility constants against Baes & Mesmer (1976), within 0.5 log units;
 *   3. internal consistency of every record (ΔG°f ≈ ΔH°f − T·ΔfS°, formula parses with its stated charge).
 *
 * All check values below are recalled from the named publications (no copy at hand): each source string says so.
 * Alkaline couples are written with OH−, so they also depend on the water records (Kw).
 *
 * Check values, tolerances and sources: fixtures/metals-group-b/*.json, validated on load.
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { parseFormula } from "../../src/chemistry/formula";
import {
  checkConstants,
  checkDisagreements,
  checkPotentials,
  loadConstants,
  loadPotentialDisagreements,
  loadPotentials,
} from "./compilation-checks";
import { T0 } from "../../src/chemistry/constants";

const db = getDatabase();
const METALS = ["Sn", "Co", "Mg", "Ti", "Ag", "Cd", "Mo"] as const;

const potentials = loadPotentials(new URL("./fixtures/metals-group-b/potentials.json", import.meta.url));

checkPotentials("group B metals: standard potentials (25 °C) within 10 mV of the tabulated values", potentials);

/**
 * Couples where compilations disagree by more than 10 mV. Each case states the value the data follow and the size
 * of the disagreement with the other source, so a change of data that silently switches compilation fails here.
 */
const disagreements = loadPotentialDisagreements(
  new URL("./fixtures/metals-group-b/potential-disagreements.json", import.meta.url),
);

checkDisagreements("group B metals: documented disagreements between compilations", disagreements);

const constants = loadConstants(new URL("./fixtures/metals-group-b/constants.json", import.meta.url));

// Titanium has only a derivation round trip (no independent hydrolysis constant was at hand): round trips count here.
checkConstants(
  "group B metals: hydrolysis and solubility constants within 0.5 log units of Baes & Mesmer",
  constants,
  METALS,
  true,
);

/**
 * Records whose published ΔG°f, ΔH°f and S° agree only loosely (rounding in the compilation), with the reason.
 */
const LOOSE: Record<string, { tolerance: number; reason: string }> = {
  "Co3O4(s)": { tolerance: 2.0, reason: "NBS82 gives ΔH°f to 1 kJ/mol only (−891 kJ/mol); misfit 1.6 kJ/mol" },
};

describe("group B metals: record consistency", () => {
  for (const m of METALS) {
    const entry = db.system(m);
    it(`${m} file is registered, a metal system, with the metal at zero`, () => {
      expect(entry).toBeDefined();
      expect(entry!.kind).toBe("metal");
      const metal = entry!.species.find((s) => s.formula === `${m}(s)`);
      expect(metal).toBeDefined();
      expect(metal!.dGf).toBe(0);
      expect(metal!.dHf).toBe(0);
      expect(metal!.S).toBeGreaterThan(0);
      expect(metal!.Cp).toBeGreaterThan(0);
      expect(entry!.species.length).toBeGreaterThanOrEqual(5);
    });

    it(`${m}: every formula parses with its stated charge and state, only ${m}, O and H`, () => {
      for (const s of entry!.species) {
        const parsed = parseFormula(s.formula, s.charge);
        expect(parsed.charge, s.formula).toBe(s.charge);
        if (s.charge === 0) expect(parsed.state, s.formula).toBe(s.state);
        else expect(s.state, s.formula).toBe("aq");
        for (const el of Object.keys(parsed.elements)) expect([m, "O", "H"], s.formula).toContain(el);
        expect(parsed.elements[m], s.formula).toBeGreaterThan(0);
      }
    });

    it(`${m}: ΔG°f ≈ ΔH°f − T·ΔfS° for every record with all three`, () => {
      // ΔfS° = S° − Σ ν·S°(element in its reference state) + z·½S°(H2): the conventional-ion formation reaction
      // elements → species + z e−, with the electron carrying ½S°(H2) (hydrogen-electrode convention).
      const hydrogen = db.require("H2(g)");
      let checked = 0;
      for (const s of entry!.species) {
        if (s.dHf === null || s.S === null) continue;
        let sumElements = 0;
        for (const [el, n] of Object.entries(s.elements)) {
          const ref = db.element(el)!.referenceState;
          sumElements += (n * db.require(ref).S!) / (ref === "H2(g)" || ref === "O2(g)" ? 2 : 1);
        }
        const dS = s.S - sumElements + s.charge * 0.5 * hydrogen.S!;
        const calc = s.dHf / 1000 - (T0 * dS) / 1000;
        const tolerance = LOOSE[s.formula]?.tolerance ?? 1.0;
        expect(
          Math.abs(s.dGf / 1000 - calc),
          `${s.formula}: ΔG°f ${s.dGf / 1000} vs ${calc.toFixed(2)}`,
        ).toBeLessThanOrEqual(tolerance);
        checked++;
      }
      expect(checked).toBeGreaterThanOrEqual(3);
    });
  }
});

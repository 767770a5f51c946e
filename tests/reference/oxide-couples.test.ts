/**
 * Standard potentials of the iron, copper and chromium oxide couples at 25–300 °C against a compilation independent
 * of the records: the NASA polynomials of McBride, Gordon & Reno 1993 (TM-4513) for the iron and copper solids and
 * hydrogen, of McBride, Zehe & Gordon 2002 (TP-2002-211556) for chromium and eskolaite, IAPWS-95 for water (fixtures/high-temperature/oxide-couples.json, written by scripts/make-oxide-couple-fixtures.py).
 *
 * These couples hold no ion, so the check isolates what the records do for solids, water and hydrogen at
 * temperature (constant Cp° at 25 °C, docs/method.md, Temperature) from the ions' correspondence. Two checks per
 * value: the potential within the fixture's tolerance (which carries the two compilations' 25 °C difference), and
 * its change from 25 °C within 5 mV (the temperature model alone). The same lines are read back through
 * REDOX.BOUNDARY, the function a plant chemist calls.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { FARADAY, kelvin, nernstFactor } from "../../src/chemistry/constants";
import { getDatabase } from "../../src/chemistry/database";
import { halfReaction, standardPotential } from "../../src/chemistry/reaction";
import { gibbsAt, reactionProperties } from "../../src/chemistry/thermo";
import { boundaryFrom, speciesAt } from "../../src/functions/stability-functions";
import { loadReferenceFixture } from "../../test-support/reference-fixture";

const db = getDatabase();
/** The change of E° from 25 °C may differ from the compilation's by at most this (V). */
const SHIFT_TOLERANCE = 0.005;

const checks = loadReferenceFixture(
  new URL("./fixtures/high-temperature/oxide-couples.json", import.meta.url),
  z.strictObject({ oxidized: z.string(), reduced: z.string(), celsius: z.number() }),
  { ceiling: () => 0.05 }, // the largest tolerance allowed: 50 mV, as for published 25–300 °C lines where sources agree
);
const at25 = (oxidized: string, reduced: string) =>
  checks.find((c) => c.inputs.oxidized === oxidized && c.inputs.reduced === reduced && c.inputs.celsius === 25)!;

describe("E° of oxide couples at 25–300 °C against the NASA polynomials and IAPWS-95", () => {
  for (const c of checks) {
    const { oxidized, reduced, celsius } = c.inputs;
    it(`${c.id} within ${c.tolerance * 1000} mV: ${c.value} V (${c.source})`, () => {
      expect(Math.abs(standardPotential(db, oxidized, reduced, celsius) - c.value)).toBeLessThan(c.tolerance);
    });
    if (celsius === 25) continue;
    const base = at25(oxidized, reduced);
    it(`${c.id}: the change from 25 °C, ${((c.value - base.value) * 1000).toFixed(1)} mV, within ${SHIFT_TOLERANCE * 1000} mV`, () => {
      const ours = standardPotential(db, oxidized, reduced, celsius) - standardPotential(db, oxidized, reduced, 25);
      expect(Math.abs(ours - (c.value - base.value))).toBeLessThan(SHIFT_TOLERANCE);
    });
  }

  it("the change check needs the heat-capacity term: with ΔCp°r = 0, E°(Fe3O4/Fe) at 300 °C misses it by more than 5 mV", () => {
    const reaction = halfReaction(db, db.require("Fe3O4(s)"), db.require("Fe(s)"));
    const props = { ...reactionProperties(db, reaction.stoichiometry), dCp: 0 };
    const potential = (celsius: number) => -gibbsAt(props, kelvin(celsius)) / (reaction.electrons * FARADAY);
    const hot = checks.find((c) => c.id === "E°(Fe3O4/Fe) at 300 °C")!;
    const miss = potential(300) - potential(25) - (hot.value - at25("Fe3O4(s)", "Fe(s)").value);
    expect(Math.abs(miss)).toBeGreaterThan(SHIFT_TOLERANCE);
  });
});

describe("the same lines through REDOX.BOUNDARY at boiler temperatures (activity 10⁻², where solids border solids)", () => {
  const lineAt = (metal: string, pH: number, from: number, celsius: number) =>
    boundaryFrom(metal, pH, from, celsius, 1e-2, 0, 0, 0, 0, 0, 1)[0][0] as number;
  const expected = (id: string) => checks.find((c) => c.id === id)!;

  for (const celsius of [200, 250, 300]) {
    it(`${celsius} °C, pH 7: Fe/Fe3O4, Cu/Cu2O, Cu2O/CuO and Cr/Cr2O3 lie within 30 mV of the compilation's E° − k·pH`, () => {
      const pH = 7;
      const k = nernstFactor(kelvin(celsius));
      const iron = lineAt("Fe", pH, -2, celsius);
      expect(speciesAt("Fe", pH, iron + 1e-3, celsius, 1e-2)[0][0]).toBe("Fe3O4(s)");
      expect(Math.abs(iron - (expected(`E°(Fe3O4/Fe) at ${celsius} °C`).value - k * pH))).toBeLessThan(0.03);
      const copper = lineAt("Cu", pH, -1, celsius);
      expect(speciesAt("Cu", pH, copper + 1e-3, celsius, 1e-2)[0][0]).toBe("Cu2O(s)");
      expect(Math.abs(copper - (expected(`E°(Cu2O/Cu) at ${celsius} °C`).value - k * pH))).toBeLessThan(0.03);
      const cuprite = lineAt("Cu", pH, copper + 1e-3, celsius);
      expect(speciesAt("Cu", pH, cuprite + 1e-3, celsius, 1e-2)[0][0]).toBe("CuO(s)");
      expect(Math.abs(cuprite - (expected(`E°(CuO/Cu2O) at ${celsius} °C`).value - k * pH))).toBeLessThan(0.03);
      const chromium = lineAt("Cr", pH, -2, celsius);
      expect(speciesAt("Cr", pH, chromium + 1e-3, celsius, 1e-2)[0][0]).toBe("Cr2O3(s)");
      expect(Math.abs(chromium - (expected(`E°(Cr2O3/Cr) at ${celsius} °C`).value - k * pH))).toBeLessThan(0.03);
    });
  }
});

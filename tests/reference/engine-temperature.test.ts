/**
 * Temperature dependence of the engine: isothermal temperature coefficients against Bratsch (1989), and a
 * boundary at 60 °C computed by the engine and, independently, by hand in this test from the records'
 * ΔG°f, S° and Cp° with the constant-ΔCp integration.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { getDatabase } from "../../src/chemistry/database";
import { standardPotential } from "../../src/chemistry/reaction";
import { buildSystem, pairBoundary } from "../../src/chemistry/system";
import { nearestBoundary } from "../../src/chemistry/predominance";
import { loadReferenceFixture } from "../../test-support/reference-fixture";

const db = getDatabase();

/** dE°/dT by central difference, mV/K. */
function slopeMilliVoltPerKelvin(ox: string, red: string): number {
  return ((standardPotential(db, ox, red, 26) - standardPotential(db, ox, red, 24)) / 2) * 1000;
}

describe("isothermal temperature coefficients dE°/dT (V vs SHE)", () => {
  const cases = loadReferenceFixture(
    new URL("./fixtures/engine-temperature/temperature-coefficients.json", import.meta.url),
    z.strictObject({ pair: z.tuple([z.string(), z.string()]) }),
    { ceiling: () => 0.02 },
  );
  for (const c of cases) {
    it(`${c.id}: ${c.value} mV/K — ${c.source}`, () => {
      expect(Math.abs(slopeMilliVoltPerKelvin(...c.inputs.pair) - c.value)).toBeLessThan(c.tolerance);
    });
  }
});

describe("a boundary at 60 °C, engine against a hand calculation", () => {
  it("Zn2+/Zn(s) at activity 1e-6: E = −ΔG°r(T)/(2F) + (RT ln10 / 2F)·log10 a", () => {
    // Hand calculation, step by step, from the records (no engine code):
    const R = 8.314462618; // CODATA 2018
    const F = 96485.33212; // CODATA 2018
    const T0 = 298.15;
    const T = 333.15; // 60 °C
    const zn = db.require("Zn(s)");
    const zn2 = db.require("Zn2+");
    const h2 = db.require("H2(g)");
    // Zn2+ + 2e− → Zn(s): the electron carries S = ½S°(H2), Cp = ½Cp°(H2) (hydrogen-electrode convention)
    const dG0 = zn.dGf - zn2.dGf; // J/mol
    const dS = zn.S! - zn2.S! - 2 * 0.5 * h2.S!;
    const cpKnown = zn.Cp !== null && zn2.Cp !== null && h2.Cp !== null;
    const dCp = cpKnown ? zn.Cp! - zn2.Cp! - 2 * 0.5 * h2.Cp! : 0;
    const dG = dG0 - dS * (T - T0) + dCp * (T - T0 - T * Math.log(T / T0));
    const eStandard = -dG / (2 * F);
    const byHand = eStandard + ((R * T * Math.LN10) / (2 * F)) * Math.log10(1e-6);

    const system = buildSystem(db, "Zn", { celsius: 60, activity: 1e-6 });
    const line = pairBoundary(system, "Zn2+", "Zn(s)");
    expect(line?.kind).toBe("line");
    if (line?.kind !== "line") return;
    expect(line.slope).toBe(0); // no protons: a horizontal boundary
    expect(Math.abs(line.intercept - byHand)).toBeLessThan(1e-9);
    // and the engine's boundary search finds it at pH 2, where Zn2+ is the stable ion
    const crossing = nearestBoundary(system, 2, -1.5, 1);
    expect(crossing && system.species[crossing.below].formula).toBe("Zn(s)");
    expect(crossing && Math.abs(crossing.E - byHand)).toBeLessThan(1e-9);
  });
});

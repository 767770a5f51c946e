/**
 * A three-state system worked exactly: chromium, with Cr(s), Cr2+ and Cr3+ in acid, chromium(III) oxide at higher
 * pH and chromate at high potential. Each kind of boundary appears where the data put it:
 *  - horizontal (no protons):         Cr3+ + e− → Cr2+,           E = E°
 *  - sloped (h protons, n electrons): Cr2O3 + 6H+ + 2e− → 2Cr2+ + 3H2O,  slope −(6/2)·k per pH
 *  - vertical (acid–base, no e−):     Cr3+ + H2O → CrOH2+ + H+,   pH = −log K + 0 (equal activities)
 * Expected values are computed here from the records, independently of the engine's plane construction.
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { buildSystem, dominantSpecies, pairBoundary } from "../../src/chemistry/system";

const db = getDatabase();
const F = 96485.33212; // CODATA 2018
const R = 8.314462618; // CODATA 2018
const k = (R * 298.15 * Math.LN10) / F; // 0.059159 V per decade at 25 °C
const g = (formula: string) => db.require(formula).dGf; // J/mol
const water = g("H2O(l)");
const system = buildSystem(db, "Cr", { celsius: 25, activity: 1e-6 });

describe("chromium, 25 °C, activity 1e-6", () => {
  it("Cr3+/Cr2+ is horizontal at E° (equal activities cancel)", () => {
    const eStandard = -(g("Cr2+") - g("Cr3+")) / F;
    const line = pairBoundary(system, "Cr3+", "Cr2+");
    expect(line).toEqual({ kind: "line", intercept: expect.any(Number), slope: 0 });
    if (line?.kind === "line") expect(Math.abs(line.intercept - eStandard)).toBeLessThan(1e-9);
    // and the dominant species really change across it at pH 0
    expect(system.species[dominantSpecies(system, 0, eStandard - 0.01)].formula).toBe("Cr2+");
    expect(system.species[dominantSpecies(system, 0, eStandard + 0.01)].formula).toBe("Cr3+");
  });

  it("Cr2O3(s)/Cr2+ slopes at −(6/2)·k per pH unit", () => {
    // Cr2O3 + 6H+ + 2e− → 2Cr2+ + 3H2O: E = E° − (k/2)·log(a²) − 3k·pH
    const dG = 2 * g("Cr2+") + 3 * water - g("Cr2O3(s)");
    const intercept = -dG / (2 * F) - (k / 2) * Math.log10(1e-6 ** 2);
    const line = pairBoundary(system, "Cr2O3(s)", "Cr2+");
    expect(line?.kind).toBe("line");
    if (line?.kind !== "line") return;
    expect(Math.abs(line.slope - -3 * k)).toBeLessThan(1e-12);
    expect(Math.abs(line.intercept - intercept)).toBeLessThan(1e-9);
  });

  it("Cr3+/CrOH2+ is vertical at pH = −log K of the hydrolysis", () => {
    const logK = -(g("CrOH2+") - g("Cr3+") - water) / (R * 298.15 * Math.LN10);
    const line = pairBoundary(system, "Cr3+", "CrOH2+");
    expect(line?.kind).toBe("vertical");
    if (line?.kind === "vertical") expect(Math.abs(line.pH - -logK)).toBeLessThan(1e-9);
    // the vertical boundary falls inside the Cr(III) field: Cr3+ below it, CrOH2+ above it, at E = 0
    if (line?.kind === "vertical") {
      expect(system.species[dominantSpecies(system, line.pH - 0.05, 0)].formula).toBe("Cr3+");
      expect(system.species[dominantSpecies(system, line.pH + 0.05, 0)].formula).toBe("CrOH2+");
    }
  });

  it("all five states appear on the diagram in their expected order", () => {
    const at = (pH: number, E: number) => system.species[dominantSpecies(system, pH, E)].formula;
    expect(at(0, -1.5)).toBe("Cr(s)");
    expect(at(0, -0.7)).toBe("Cr2+");
    expect(at(0, 0.5)).toBe("Cr3+");
    expect(at(9, 0)).toBe("Cr2O3(s)");
    expect(at(9, 1.0)).toBe("CrO42-");
  });
});

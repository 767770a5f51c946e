/**
 * Shared runners for the metal reference tests: standard potentials against tabulated values, documented
 * disagreements between compilations, and hydrolysis/solubility constants. Each case carries its own source; the
 * runners only apply the tolerances stated here.
 */
import { describe, expect, it } from "vitest";
import { FARADAY, GAS_CONSTANT, LN10, T0 } from "../../src/chemistry/constants";
import { getDatabase } from "../../src/chemistry/database";
import { reactionLogK, standardPotential } from "../../src/chemistry/reaction";

const db = getDatabase();

export const BARD = "Bard, Parsons & Jordan 1985, Standard Potentials in Aqueous Solution (from memory)";
export const CRC = "CRC Handbook of Chemistry and Physics, Electrochemical Series (from memory)";
export const NBS = "Wagman et al. 1982, NBS tables (from memory)";
export const BM = "Baes & Mesmer 1976, The Hydrolysis of Cations, selected constants at 25 °C, I = 0 (from memory)";

/** E° (V) of a reduction written as formula → coefficient (reactants negative, "e-" for electrons). */
export function potentialOf(reaction: Record<string, number>): number {
  const electrons = -(reaction["e-"] ?? 0);
  return (reactionLogK(db, reaction, 25) * GAS_CONSTANT * T0 * LN10) / (electrons * FARADAY);
}

export interface PotentialCase {
  couple: string;
  /** An ox/red pair balanced by the engine with H2O/H+, or a reaction written out (alkaline couples). */
  pair?: [string, string];
  reaction?: Record<string, number>;
  value: number;
  source: string;
  /** True where the record's ΔG°f was derived from this very potential (the check proves the arithmetic only). */
  derived?: boolean;
}

export type Disagreement = PotentialCase & { follows: number; followsSource: string };

export interface ConstantCase {
  label: string;
  reaction: Record<string, number>;
  logK: number;
  source: string;
  /** False where the species' ΔG°f was derived from this very constant (the check proves the arithmetic only). */
  independent: boolean;
}

const potentialOfCase = (c: PotentialCase) =>
  c.pair ? standardPotential(db, c.pair[0], c.pair[1], 25) : potentialOf(c.reaction!);

/** E° within 10 mV of the tabulated value (0.5 mV for records derived from that value). */
export function checkPotentials(title: string, cases: readonly PotentialCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const tag = c.derived ? " [record derived from this value: arithmetic check]" : "";
      it(`${c.couple}: ${c.value} V (${c.source})${tag}`, () => {
        expect(Math.abs(potentialOfCase(c) - c.value)).toBeLessThanOrEqual(c.derived ? 0.0005 : 0.01);
      });
    }
  });
}

/**
 * Couples where the data follow one compilation and another differs by more than 10 mV: the data must match the
 * value they follow (3 mV) and stay more than 10 mV from the other, so a silent switch of compilation fails.
 */
export function checkDisagreements(title: string, cases: readonly Disagreement[]): void {
  describe(title, () => {
    for (const c of cases) {
      it(`${c.couple}: data follow ${c.follows} V (${c.followsSource}); ${c.source} gives ${c.value} V`, () => {
        const e = potentialOfCase(c);
        expect(Math.abs(e - c.follows)).toBeLessThanOrEqual(0.003);
        expect(Math.abs(e - c.value)).toBeGreaterThan(0.01);
      });
    }
  });
}

/**
 * log K within 0.5 of the published constant (0.01 for round trips); every metal covered by a constant —
 * an independent one unless `roundTripsCount` (a group where some metal has only a round trip, said in its test).
 */
export function checkConstants(
  title: string,
  cases: readonly ConstantCase[],
  metals: readonly string[],
  roundTripsCount = false,
): void {
  describe(title, () => {
    for (const c of cases) {
      const kind = c.independent ? "independent" : "derivation round trip";
      it(`${c.label}: log K = ${c.logK} (${c.source}) [${kind}]`, () => {
        expect(Math.abs(reactionLogK(db, c.reaction, 25) - c.logK)).toBeLessThanOrEqual(c.independent ? 0.5 : 0.01);
      });
    }
    it(`every metal of the group has at least one ${roundTripsCount ? "" : "independent "}constant checked`, () => {
      for (const m of metals) {
        const covered = cases.some(
          (c) => (c.independent || roundTripsCount) && Object.keys(c.reaction).some((f) => db.species(f)?.system === m),
        );
        expect(covered, m).toBe(true);
      }
    });
  });
}

/**
 * Shared runners for the metal reference tests: standard potentials against tabulated values, documented
 * disagreements between compilations, and hydrolysis/solubility constants. The check values, tolerances and sources
 * live in JSON fixtures (tests/reference/fixtures/, validated by test-support/reference-fixture.ts); the runners
 * state the largest tolerance each kind of check may carry, so a fixture cannot loosen one unnoticed.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { FARADAY, GAS_CONSTANT, LN10, T0 } from "../../src/chemistry/constants";
import { getDatabase } from "../../src/chemistry/database";
import { reactionLogK, standardPotential } from "../../src/chemistry/reaction";
import { loadReferenceFixture, ReferenceCheck } from "../../test-support/reference-fixture";

const db = getDatabase();

export const BARD = "Bard, Parsons & Jordan 1985, Standard Potentials in Aqueous Solution (from memory)";
export const CRC = "CRC Handbook of Chemistry and Physics, Electrochemical Series (from memory)";
export const NBS = "Wagman et al. 1982, NBS tables (from memory)";
export const BM = "Baes & Mesmer 1976, The Hydrolysis of Cations, selected constants at 25 °C, I = 0 (from memory)";

/** A reaction written as formula → coefficient (reactants negative, "e-" for electrons). */
const reaction = z.record(z.string(), z.number());
/** The inputs of a constant: its reaction. */
export const reactionInputs = z.strictObject({ reaction });

/** An ox/red pair balanced by the engine with H2O/H+, or a reaction written out (alkaline couples). */
const couple = z.union([z.strictObject({ pair: z.tuple([z.string(), z.string()]) }), z.strictObject({ reaction })]);

export type PotentialCase = ReferenceCheck<z.infer<typeof couple>>;
export type ConstantCase = ReferenceCheck<{ reaction: Record<string, number> }>;

/** Standard potentials (V): 10 mV at most, 0.5 mV for records derived from the value. */
export const loadPotentials = (file: URL): PotentialCase[] =>
  loadReferenceFixture(file, couple, { ceiling: (c) => (c.roundTrip ? 0.0005 : 0.01) });

/** Documented disagreements of potentials: the followed value within 3 mV, the other more than 10 mV away. */
export const loadPotentialDisagreements = (file: URL): PotentialCase[] =>
  loadReferenceFixture(file, couple, { ceiling: () => 0.003, differsBy: 0.01 });

/** Constants (log K): 0.5 at most, 0.01 for round trips. */
export const loadConstants = (file: URL): ConstantCase[] =>
  loadReferenceFixture(file, reactionInputs, { ceiling: (c) => (c.roundTrip ? 0.01 : 0.5) });

/** Documented disagreements of constants: the followed value within 0.02, the other more than 0.5 away. */
export const loadConstantDisagreements = (file: URL): ConstantCase[] =>
  loadReferenceFixture(file, reactionInputs, { ceiling: () => 0.02, differsBy: 0.5 });

/** E° (V) of a reduction written as formula → coefficient (reactants negative, "e-" for electrons). */
export function potentialOf(reaction: Record<string, number>): number {
  const electrons = -(reaction["e-"] ?? 0);
  return (reactionLogK(db, reaction, 25) * GAS_CONSTANT * T0 * LN10) / (electrons * FARADAY);
}

const potentialOfCase = ({ inputs }: PotentialCase) =>
  "pair" in inputs ? standardPotential(db, inputs.pair[0], inputs.pair[1], 25) : potentialOf(inputs.reaction);

/** E° within the record's tolerance of the tabulated value. */
export function checkPotentials(title: string, cases: readonly PotentialCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const tag = c.roundTrip ? " [record derived from this value: arithmetic check]" : "";
      it(`${c.id}: ${c.value} V (${c.source})${tag}`, () => {
        expect(Math.abs(potentialOfCase(c) - c.value)).toBeLessThanOrEqual(c.tolerance);
      });
    }
  });
}

/**
 * Couples where the data follow one compilation and another differs by more than 10 mV: the data must match the
 * value they follow and stay more than 10 mV from the other, so a silent switch of compilation fails.
 */
export function checkDisagreements(title: string, cases: readonly PotentialCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const other = c.differsFrom!;
      it(`${c.id}: data follow ${c.value} V (${c.source}); ${other.source} gives ${other.value} V`, () => {
        const e = potentialOfCase(c);
        expect(Math.abs(e - c.value)).toBeLessThanOrEqual(c.tolerance);
        expect(Math.abs(e - other.value)).toBeGreaterThan(other.moreThan);
      });
    }
  });
}

/**
 * log K within the record's tolerance of the published constant; every metal covered by a constant — an
 * independent one unless `roundTripsCount` (a group where some metal has only a round trip, said in its test).
 */
export function checkConstants(
  title: string,
  cases: readonly ConstantCase[],
  metals: readonly string[],
  roundTripsCount = false,
): void {
  describe(title, () => {
    for (const c of cases) {
      const kind = c.roundTrip ? "derivation round trip" : "independent";
      it(`${c.id}: log K = ${c.value} (${c.source}) [${kind}]`, () => {
        expect(Math.abs(reactionLogK(db, c.inputs.reaction, 25) - c.value)).toBeLessThanOrEqual(c.tolerance);
      });
    }
    it(`every metal of the group has at least one ${roundTripsCount ? "" : "independent "}constant checked`, () => {
      for (const m of metals) {
        const covered = cases.some(
          (c) =>
            (!c.roundTrip || roundTripsCount) &&
            Object.keys(c.inputs.reaction).some((f) => db.species(f)?.system === m),
        );
        expect(covered, m).toBe(true);
      }
    });
  });
}

/** Constants where the data follow one compilation and the published value differs by more than 0.5. */
export function checkConstantDisagreements(title: string, cases: readonly ConstantCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const other = c.differsFrom!;
      it(`${c.id}: data give ${c.value} (${c.source}); ${other.source} gives ${other.value}`, () => {
        const logK = reactionLogK(db, c.inputs.reaction, 25);
        expect(Math.abs(logK - c.value)).toBeLessThanOrEqual(c.tolerance);
        expect(Math.abs(logK - other.value)).toBeGreaterThan(other.moreThan);
      });
    }
  });
}

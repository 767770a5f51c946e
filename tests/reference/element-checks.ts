/**
 * Shared runners for the reference checks of the elements added for environmental and specialist laboratories
 * (tests/reference/elements-contaminants.test.ts, elements-specialist.test.ts) and of the group A metals' Atlas
 * lines: acid constants with a tolerance of their own, boundary equations of published diagrams at 25 °C, and
 * documented disagreements of constants. The check values, tolerances and sources live in JSON fixtures
 * (tests/reference/fixtures/); the loaders state the largest tolerance each kind of check may carry.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { nernstFactor, T0 } from "../../src/chemistry/constants";
import { getDatabase } from "../../src/chemistry/database";
import { reactionLogK } from "../../src/chemistry/reaction";
import { buildSystem, pairBoundary } from "../../src/chemistry/system";
import { loadReferenceFixture, ReferenceCheck } from "../../test-support/reference-fixture";

const db = getDatabase();

export const ATLAS =
  "Pourbaix 1974, Atlas of Electrochemical Equilibria in Aqueous Solutions, 2nd English ed. (from memory)";
export const SMITH_MARTELL =
  "Smith & Martell, Critical Stability Constants vol. 4 (1976) and NIST Standard Reference Database 46, critically selected constants, 25 °C, I = 0 (from memory)";

/** Nernst factor at 25 °C, V per decade. */
const K25 = nernstFactor(T0);
const ACTIVITY = 1e-6;
const LOG_A = Math.log10(ACTIVITY);

/** An acid HA = A + H+; the value is its pKa. */
const acidBase = z.strictObject({ acid: z.string(), base: z.string() });
export type AcidCase = ReferenceCheck<z.infer<typeof acidBase>>;

/** Acid constants: 0.15 at most, 0.2 where a note says why (round trips: the base derived from an equal constant). */
export const loadAcids = (file: URL): AcidCase[] =>
  loadReferenceFixture(file, acidBase, { ceiling: (c) => (c.note ? 0.2 : 0.15) });

/** Documented disagreements of acid constants: the followed value within 0.02, the other beyond 0.15. */
export const loadAcidDisagreements = (file: URL): AcidCase[] =>
  loadReferenceFixture(file, acidBase, { ceiling: () => 0.02, differsBy: 0.15 });

export function pKaOf(acid: string, base: string): number {
  return -reactionLogK(db, { [acid]: -1, [base]: 1, "H+": 1 }, 25);
}

export function checkAcids(title: string, cases: readonly AcidCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const kind = c.roundTrip ? "near round trip: record derived from an equal constant" : "independent";
      it(`${c.id}: pKa ${c.value} (${c.source}) [${kind}]`, () => {
        expect(Math.abs(pKaOf(c.inputs.acid, c.inputs.base) - c.value)).toBeLessThanOrEqual(c.tolerance);
      });
    }
  });
}

/** Constants where the records follow one compilation and the published value differs by more than the tolerance. */
export function checkAcidDisagreements(title: string, cases: readonly AcidCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const other = c.differsFrom!;
      it(`${c.id}: data give pKa ${c.value} (${c.source}); ${other.source} gives ${other.value}`, () => {
        const pKa = pKaOf(c.inputs.acid, c.inputs.base);
        expect(Math.abs(pKa - c.value)).toBeLessThanOrEqual(c.tolerance);
        expect(Math.abs(pKa - other.value)).toBeGreaterThan(other.moreThan);
      });
    }
  });
}

/**
 * A boundary line of a published diagram at 25 °C: a line E = value − hPerN·k·pH + logCoef·log10(a) for dissolved
 * species at the common activity a = 1e-6 (value: V at unit activity), or a vertical line at pH = value (at 1e-6,
 * acid–base, tolerance 0.5/h for h protons).
 */
export const diagramLine = z.discriminatedUnion("kind", [
  z.strictObject({
    element: z.string(),
    pair: z.tuple([z.string(), z.string()]),
    equation: z.string(),
    kind: z.literal("line"),
    hPerN: z.number(),
    logCoef: z.number(),
  }),
  z.strictObject({
    element: z.string(),
    pair: z.tuple([z.string(), z.string()]),
    equation: z.string(),
    kind: z.literal("vertical"),
    /** Protons in the acid–base reaction (a vertical line moves by −log10(a)/h with the activity). */
    h: z.number().positive().optional(),
  }),
]);
export type DiagramLine = ReferenceCheck<z.infer<typeof diagramLine>>;

/** Lines: intercept 30 mV at most (2 mV for round trips); vertical lines: pH 0.5 at most (0.5/h). */
export const loadDiagramLines = (file: URL): DiagramLine[] =>
  loadReferenceFixture(file, diagramLine, {
    ceiling: (c) => (c.inputs.kind === "vertical" ? 0.5 : c.roundTrip ? 0.002 : 0.03),
  });

/**
 * Published lines the data do not reproduce: value = the records' intercept at 1e-6 (3 mV), differsFrom.value =
 * the published E at unit activity, more than 30 mV from the records' once its logCoef·log10(1e-6) is added.
 */
export const loadDiagramDisagreements = (file: URL): DiagramLine[] =>
  loadReferenceFixture(file, diagramLine, { ceiling: () => 0.003, differsBy: 0.03 });

function boundaryOf({ inputs }: DiagramLine) {
  const system = buildSystem(db, inputs.element, { celsius: 25, activity: ACTIVITY });
  return pairBoundary(system, inputs.pair[0], inputs.pair[1]);
}

/** Intercept (vertical: pH) within the record's tolerance, slope exactly −(h/n)·k. */
export function checkDiagramLines(title: string, lines: readonly DiagramLine[]): void {
  describe(title, () => {
    for (const line of lines) {
      const tag = line.roundTrip ? " [record derived from the same value: arithmetic check]" : "";
      it(`${line.id}: ${line.inputs.equation} (${line.source})${tag}`, () => {
        const boundary = boundaryOf(line);
        const { inputs } = line;
        expect(boundary?.kind).toBe(inputs.kind);
        if (boundary?.kind === "vertical") {
          expect(
            Math.abs(boundary.pH - line.value),
            `pH ${boundary.pH.toFixed(3)} vs ${line.value}`,
          ).toBeLessThanOrEqual(line.tolerance);
          return;
        }
        if (boundary?.kind !== "line" || inputs.kind !== "line") return;
        const expected = line.value + inputs.logCoef * LOG_A;
        expect(
          Math.abs(boundary.intercept - expected),
          `intercept ${boundary.intercept.toFixed(4)} V vs ${expected.toFixed(4)} V`,
        ).toBeLessThanOrEqual(line.tolerance);
        expect(Math.abs(boundary.slope - -inputs.hPerN * K25)).toBeLessThan(1e-12);
      });
    }
  });
}

/** Published lines the data do not reproduce within 30 mV: the data's intercept and the gap are pinned. */
export function checkDiagramDisagreements(title: string, lines: readonly DiagramLine[]): void {
  describe(title, () => {
    for (const line of lines) {
      const other = line.differsFrom!;
      const { inputs } = line;
      it(`${line.id}: ${other.source} ${inputs.equation}; data intercept ${line.value} V at 1e-6 (${line.source})`, () => {
        const boundary = boundaryOf(line);
        expect(boundary?.kind).toBe("line");
        if (boundary?.kind !== "line" || inputs.kind !== "line") return;
        const published = other.value + inputs.logCoef * LOG_A;
        expect(Math.abs(boundary.intercept - line.value)).toBeLessThanOrEqual(line.tolerance);
        expect(Math.abs(boundary.intercept - published)).toBeGreaterThan(other.moreThan);
      });
    }
  });
}

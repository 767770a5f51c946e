/**
 * Shared runners for the reference checks of the elements added for environmental and specialist laboratories
 * (tests/reference/elements-contaminants.test.ts, elements-specialist.test.ts): acid constants with a tolerance
 * of their own, boundary equations of published diagrams at 25 °C, and documented disagreements of constants.
 * Each case carries its own source; the runners only apply the tolerances stated here.
 */
import { describe, expect, it } from "vitest";
import { nernstFactor, T0 } from "../../src/chemistry/constants";
import { getDatabase } from "../../src/chemistry/database";
import { reactionLogK } from "../../src/chemistry/reaction";
import { buildSystem, pairBoundary } from "../../src/chemistry/system";

const db = getDatabase();

export const ATLAS =
  "Pourbaix 1974, Atlas of Electrochemical Equilibria in Aqueous Solutions, 2nd English ed. (from memory)";
export const SMITH_MARTELL =
  "Smith & Martell, Critical Stability Constants vol. 4 (1976) and NIST Standard Reference Database 46, critically selected constants, 25 °C, I = 0 (from memory)";

/** Nernst factor at 25 °C, V per decade. */
const K25 = nernstFactor(T0);
const ACTIVITY = 1e-6;
const LOG_A = Math.log10(ACTIVITY);

/** pKa of an acid HA = A + H+ from the records, compared with the published value within `tolerance` (default 0.15). */
export interface AcidCase {
  label: string;
  acid: string;
  base: string;
  pKa: number;
  source: string;
  tolerance?: number;
  /** False where the base's ΔfG° was derived from this very constant or one equal to it within 0.05. */
  independent: boolean;
}

export function pKaOf(acid: string, base: string): number {
  return -reactionLogK(db, { [acid]: -1, [base]: 1, "H+": 1 }, 25);
}

export function checkAcids(title: string, cases: readonly AcidCase[]): void {
  describe(title, () => {
    for (const c of cases) {
      const kind = c.independent ? "independent" : "near round trip: record derived from an equal constant";
      it(`${c.label}: pKa ${c.pKa} (${c.source}) [${kind}]`, () => {
        expect(Math.abs(pKaOf(c.acid, c.base) - c.pKa)).toBeLessThanOrEqual(c.tolerance ?? 0.15);
      });
    }
  });
}

/** Constants where the records follow one compilation and the published value differs by more than the tolerance. */
export interface AcidDisagreement extends AcidCase {
  follows: number;
  followsSource: string;
}

export function checkAcidDisagreements(title: string, cases: readonly AcidDisagreement[]): void {
  describe(title, () => {
    for (const c of cases) {
      it(`${c.label}: data give pKa ${c.follows} (${c.followsSource}); ${c.source} gives ${c.pKa}`, () => {
        const pKa = pKaOf(c.acid, c.base);
        expect(Math.abs(pKa - c.follows)).toBeLessThanOrEqual(0.02);
        expect(Math.abs(pKa - c.pKa)).toBeGreaterThan(c.tolerance ?? 0.15);
      });
    }
  });
}

/**
 * A boundary line of a published diagram at 25 °C written as E = e0 − (h/n)·k·pH + logCoef·log10(a) for dissolved
 * species at the common activity a = 1e-6, or as a vertical line at pH0 (acid–base, h protons).
 */
export interface DiagramLine {
  element: string;
  pair: [string, string];
  equation: string;
  source: string;
  kind: "line" | "vertical";
  e0?: number;
  hPerN?: number;
  logCoef?: number;
  pH0?: number;
  h?: number;
  /** True where the record was derived from the same published number (the check proves the arithmetic only). */
  derived?: boolean;
}

function boundaryOf(line: DiagramLine) {
  return pairBoundary(buildSystem(db, line.element, { celsius: 25, activity: ACTIVITY }), line.pair[0], line.pair[1]);
}

/** Intercept within 30 mV (vertical: pH within 0.5/h), slope exactly −(h/n)·k. */
export function checkDiagramLines(title: string, lines: readonly DiagramLine[]): void {
  describe(title, () => {
    for (const line of lines) {
      const tag = line.derived ? " [record derived from the same value: arithmetic check]" : "";
      it(`${line.element}: ${line.pair[0]} / ${line.pair[1]}: ${line.equation} (${line.source})${tag}`, () => {
        const boundary = boundaryOf(line);
        expect(boundary?.kind).toBe(line.kind);
        if (boundary?.kind === "vertical") {
          expect(Math.abs(boundary.pH - line.pH0!), `pH ${boundary.pH.toFixed(3)} vs ${line.pH0}`).toBeLessThanOrEqual(
            0.5 / (line.h ?? 1),
          );
          return;
        }
        if (boundary?.kind !== "line") return;
        const expected = line.e0! + line.logCoef! * LOG_A;
        expect(
          Math.abs(boundary.intercept - expected),
          `intercept ${boundary.intercept.toFixed(4)} V vs ${expected.toFixed(4)} V`,
        ).toBeLessThanOrEqual(line.derived ? 0.002 : 0.03);
        expect(Math.abs(boundary.slope - -line.hPerN! * K25)).toBeLessThan(1e-12);
      });
    }
  });
}

/** Published lines the data do not reproduce within 30 mV: the data's intercept (3 mV) and the gap (> 30 mV) are pinned. */
export interface DiagramDisagreement extends DiagramLine {
  follows: number;
  reason: string;
}

export function checkDiagramDisagreements(title: string, lines: readonly DiagramDisagreement[]): void {
  describe(title, () => {
    for (const line of lines) {
      it(`${line.element}: ${line.pair[0]} / ${line.pair[1]}: ${line.source} ${line.equation}; data intercept ${line.follows} V at 1e-6 (${line.reason})`, () => {
        const boundary = boundaryOf(line);
        expect(boundary?.kind).toBe("line");
        if (boundary?.kind !== "line") return;
        const published = line.e0! + line.logCoef! * LOG_A;
        expect(Math.abs(boundary.intercept - line.follows)).toBeLessThanOrEqual(0.003);
        expect(Math.abs(boundary.intercept - published)).toBeGreaterThan(0.03);
      });
    }
  });
}

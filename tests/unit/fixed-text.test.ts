/**
 * fixedText and twoDecimals (src/diagram/fixed-text.ts) against Number.prototype.toFixed itself, the reference it stands in for
 * (ECMA-262, Number.prototype.toFixed): the same text for every value tried, ties and signs included.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { fixedText, twoDecimals } from "../../src/diagram/fixed-text";

describe("fixedText equals toFixed", () => {
  it("for doubles of every magnitude and 0–3 decimals (fast-check, 20 000 cases)", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: false }), fc.integer({ min: 0, max: 3 }), (x, digits) => {
        expect(fixedText(x, digits)).toBe(x.toFixed(digits));
      }),
      { numRuns: 20_000 },
    );
  });

  it("for values of the sizes a diagram writes (pH, volts, °C, margins), 0–3 decimals", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.integer({ min: 0, max: 3 }), (x, digits) => {
        expect(fixedText(x, digits)).toBe(x.toFixed(digits));
      }),
      { numRuns: 50_000 },
    );
  });

  it("at ties, signs and edges: 1.005, 0.125, 2.5, −0, −0.001, 1e9, NaN, ±∞", () => {
    for (const x of [
      1.005,
      0.125,
      2.5,
      -2.5,
      0,
      -0,
      -0.001,
      -0.0049,
      0.0049,
      999.9995,
      1e9,
      1e21,
      NaN,
      Infinity,
      -Infinity,
    ])
      for (const digits of [0, 1, 2, 3]) expect(fixedText(x, digits), `${x} to ${digits}`).toBe(x.toFixed(digits));
  });

  it("hands other decimal counts to toFixed", () => {
    expect(fixedText(Math.PI, 6)).toBe(Math.PI.toFixed(6));
  });
});

describe("twoDecimals equals Number(v.toFixed(2)).toString()", () => {
  it("for doubles of every magnitude and for pixel coordinates (fast-check, 20 000 + 50 000 cases)", () => {
    const reference = (v: number) => Number(v.toFixed(2)).toString();
    fc.assert(
      fc.property(fc.double({ noNaN: false }), (v) => {
        expect(twoDecimals(v)).toBe(reference(v));
      }),
      { numRuns: 20_000 },
    );
    fc.assert(
      fc.property(fc.double({ min: -5e3, max: 5e3, noNaN: true }), (v) => {
        expect(twoDecimals(v)).toBe(reference(v));
      }),
      { numRuns: 50_000 },
    );
    for (const v of [0.125, 1.005, -0.001, -0, 2.675, 1e9, -1e12, NaN])
      expect(twoDecimals(v), String(v)).toBe(reference(v));
  });
});

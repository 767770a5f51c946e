// Property tests (fast-check): every water and electrode worksheet function, called with random and hostile input —
// numbers (NaN, ±Infinity, huge), NaN-like text, booleans, null/undefined, objects, nested and ragged ranges of
// mismatched shape — answers with a non-empty rectangle of finite numbers, text or error values naming an argument;
// it never throws and never puts NaN or Infinity in a cell. Valid input gives numbers of the broadcast shape.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CellError } from "../../src/functions/cell-values";
import { eh, fromshe, neutralph, pe, slope, toshe, waterline, watermargin } from "../../src/functions/functions";

type Fn = (...args: any[]) => unknown[][];

const FUNCTIONS: { id: string; fn: Fn; arity: number; argNames: string[] }[] = [
  { id: "WATERLINE", fn: waterline, arity: 4, argNames: ["pH", "temperature", "gas", "pressure"] },
  { id: "WATERMARGIN", fn: watermargin, arity: 4, argNames: ["pH", "potential", "temperature", "overpotential"] },
  { id: "TOSHE", fn: toshe, arity: 5, argNames: ["reading", "electrode", "temperature", "pH", "unit"] },
  { id: "FROMSHE", fn: fromshe, arity: 5, argNames: ["potential", "electrode", "temperature", "pH", "unit"] },
  { id: "PE", fn: pe, arity: 2, argNames: ["potential", "temperature"] },
  { id: "EH", fn: eh, arity: 2, argNames: ["pe", "temperature"] },
  { id: "NEUTRALPH", fn: neutralph, arity: 1, argNames: ["temperature"] },
  { id: "SLOPE", fn: slope, arity: 1, argNames: ["temperature"] },
];

const hostileText = fc.constantFrom(
  "NaN",
  "Infinity",
  "-Infinity",
  "1e999",
  "-1e999",
  "",
  " ",
  "  7 ",
  "7,5",
  "0x10",
  "1e",
  ".",
  "-",
  "#VALUE!",
  "#N/A",
  "null",
  "undefined",
  "true",
  "SCE",
  "rhe",
  "Ag/AgCl",
  "AgCl-3M",
  "copper sulfate",
  "O2",
  "h2",
  "oxygen",
  "CO2",
  "\u0000",
  "💧",
  "a".repeat(300),
  "25",
  "-5",
  "101",
  "16.0001",
  "mV",
  "V",
  "constructor",
  "__proto__",
  "toString",
);
const hostileNumber = fc.oneof(
  fc.double(), // includes NaN, ±Infinity, −0, subnormals
  fc.integer({ min: -1000, max: 1000 }),
  fc.double({ min: -3, max: 120, noNaN: true }),
  fc.constantFrom(Number.MAX_VALUE, -Number.MAX_VALUE, Number.MIN_VALUE, 1e308, -1e-320, 0, -0),
);
const cell = fc.oneof(
  hostileNumber,
  hostileText,
  fc.string({ maxLength: 12 }),
  fc.boolean(),
  fc.constant(null),
  fc.constant(undefined),
  fc.constantFrom({}, [], { code: "#VALUE!" }, () => 1),
);
const rectangle = fc
  .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }))
  .chain(([r, c]) => fc.array(fc.array(cell, { minLength: c, maxLength: c }), { minLength: r, maxLength: r }));
const ragged = fc.array(fc.array(cell, { maxLength: 4 }), { maxLength: 4 });
const nested = fc.array(fc.array(fc.oneof(cell, fc.array(cell, { maxLength: 3 })), { maxLength: 3 }), { maxLength: 3 });
const argument = fc.oneof(
  { weight: 3, arbitrary: cell },
  { weight: 3, arbitrary: rectangle },
  { weight: 1, arbitrary: ragged },
  { weight: 1, arbitrary: nested },
);

// Excel shows a message only with #VALUE! and #N/A: no other code may come out
const CODES = new Set(["#VALUE!", "#N/A"]);

/** Why a result is not a well-formed spilled answer, or null. */
function problem(result: unknown, argNames: string[]): string | null {
  if (!Array.isArray(result) || result.length === 0) return "not a non-empty array of rows";
  const cols = (result[0] as unknown[])?.length;
  if (!cols) return "first row empty";
  for (const row of result) {
    if (!Array.isArray(row) || row.length !== cols) return "not rectangular";
    for (const v of row) {
      if (typeof v === "number") {
        if (!Number.isFinite(v)) return `non-finite ${v}`;
      } else if (typeof v === "string") {
        // text results only as blanks here: none of these functions returns words
        if (v !== "") return `unexpected text ${v}`;
      } else if (v instanceof CellError) {
        if (!CODES.has(v.code)) return `unknown code ${v.code}`;
        if (!v.message) return "error without message";
        // the message names an argument, or is the shape message naming all of them
        if (
          !argNames.some((n) => v.message.startsWith(`${n}:`)) &&
          !v.message.startsWith("ranges of different shapes")
        ) {
          return `message does not name an argument: ${v.message}`;
        }
      } else return `cell of type ${typeof v}`;
    }
  }
  return null;
}

describe("hostile input never throws and never yields NaN/Infinity", () => {
  for (const { id, fn, arity, argNames } of FUNCTIONS) {
    it(id, () => {
      fc.assert(
        fc.property(
          fc.integer({ min: 0, max: arity }).chain((n) => fc.array(argument, { minLength: n, maxLength: n })),
          (args) => {
            let result: unknown;
            expect(() => {
              result = fn(...args);
            }).not.toThrow();
            const p = problem(result, argNames);
            if (p) throw new Error(`${id}(${JSON.stringify(args)}): ${p}`);
          },
        ),
        { numRuns: 1500 },
      );
    });
  }
});

describe("valid input gives numbers of the broadcast shape", () => {
  const column = (arb: fc.Arbitrary<number>) =>
    fc.integer({ min: 1, max: 5 }).chain((n) =>
      fc.array(
        arb.map((v) => [v]),
        { minLength: n, maxLength: n },
      ),
    );
  const pH = fc.double({ min: -2, max: 16, noNaN: true });
  const celsius = fc.double({ min: 0, max: 60, noNaN: true });
  const volts = fc.double({ min: -3, max: 3, noNaN: true });

  it("WATERLINE and WATERMARGIN over a column of pH and a row of temperatures spill a pH × temperature table", () => {
    fc.assert(
      fc.property(column(pH), fc.array(celsius, { minLength: 1, maxLength: 4 }), volts, (pHs, temps, e) => {
        for (const out of [waterline(pHs, [temps]), watermargin(pHs, [[e]], [temps])]) {
          expect(out.length).toBe(pHs.length);
          for (const row of out) {
            expect(row.length).toBe(temps.length);
            for (const v of row) expect(Number.isFinite(v)).toBe(true);
          }
        }
      }),
    );
  });

  it("FROMSHE undoes TOSHE for every electrode in its range", () => {
    const electrodes = [
      "SHE",
      "SCE",
      "AgCl-sat",
      "AgCl-3.5M",
      "AgCl-3M",
      "AgCl-1M",
      "AgCl-sea",
      "CSE",
      "MSE",
      "HgO-1M",
      "RHE",
    ];
    // readings within ±2 V keep the potential vs SHE inside the ±3 V the functions accept (electrodes lie within 1 V of SHE)
    const reading2 = fc.double({ min: -2, max: 2, noNaN: true });
    fc.assert(
      fc.property(
        reading2,
        fc.constantFrom(...electrodes),
        fc.double({ min: 0, max: 40, noNaN: true }),
        pH,
        (reading, electrode, t, p) => {
          const she = toshe([[reading]], [[electrode]], [[t]], [[p]])[0][0] as number;
          const back = fromshe([[she]], [[electrode]], [[t]], [[p]])[0][0] as number;
          expect(typeof she).toBe("number");
          expect(back).toBeCloseTo(reading, 9);
        },
      ),
    );
  });

  it("FROMSHE undoes TOSHE for the pressure-balanced electrode over its 25–275 °C, and refuses outside it", () => {
    const reading2 = fc.double({ min: -2, max: 2, noNaN: true });
    fc.assert(
      fc.property(reading2, fc.double({ min: 25, max: 275, noNaN: true }), (reading, t) => {
        const she = toshe([[reading]], [["AgCl-EPB"]], [[t]])[0][0] as number;
        expect(typeof she).toBe("number");
        expect(fromshe([[she]], [["AgCl-EPB"]], [[t]])[0][0] as number).toBeCloseTo(reading, 9);
      }),
    );
    for (const t of [20, 280]) expect(typeof toshe([[0.1]], [["AgCl-EPB"]], [[t]])[0][0]).not.toBe("number");
  });

  it("EH undoes PE at any temperature", () => {
    fc.assert(
      fc.property(volts, fc.double({ min: 0, max: 100, noNaN: true }), (e, t) => {
        const p = pe([[e]], [[t]])[0][0] as number;
        expect(eh([[p]], [[t]])[0][0] as number).toBeCloseTo(e, 9);
      }),
    );
  });
});

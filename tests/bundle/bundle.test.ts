// The built functions bundle, loaded with nothing but a stand-in registry (harness.ts): every function in
// functions.json is registered, and every function answers hostile spreadsheet input with cells the spreadsheet can
// show — never a throw, NaN, Infinity or undefined. Needs a build: `npm test` builds first; alone, run
// `npx webpack --mode production --output-path /tmp/x && REDOX_DIST=/tmp/x npx vitest run tests/bundle`.

import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  StandInError,
  callFunction,
  loadBundle,
  resultProblem,
  runInStandInRegistry,
  safeString,
  type MetadataParameter,
} from "../../test-support/bundle-harness";

const bundle = loadBundle();
const declared = bundle.metadata.functions;

describe("the harness itself", () => {
  it("offers no browser globals: a bundle reaching for window, self or document fails to load", () => {
    for (const name of ["window", "self", "document"]) {
      expect(() => runInStandInRegistry(`${name}.x = 1;`)).toThrow(/is not defined/);
    }
  });

  it("collects associate calls and hands out the stand-in error type", () => {
    const { functions } = runInStandInRegistry(
      `CustomFunctions.associate("ECHO", function (x) { return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidNumber, "x"); });`,
    );
    const out = functions.get("ECHO")?.(1);
    expect(out).toBeInstanceOf(StandInError);
    expect((out as StandInError).code).toBe("#NUM!");
  });

  it("rejects cells the spreadsheet cannot show", () => {
    expect(resultProblem(Number.NaN)).toMatch(/non-finite/);
    expect(resultProblem(undefined)).toBe("undefined");
    expect(resultProblem(new StandInError(undefined as unknown as string))).toMatch(/unknown code/);
    expect(resultProblem([[1], [2, 3]], "matrix")).toMatch(/ragged/);
    expect(resultProblem([], "matrix")).toMatch(/no rows/);
    expect(
      resultProblem(
        [
          [1, ""],
          ["a", new StandInError("#N/A", "none")],
        ],
        "matrix",
      ),
    ).toBeNull();
  });
});

describe("registration", () => {
  it("functions.json declares at least one function", () => {
    expect(declared.length).toBeGreaterThan(0);
  });

  it.each(declared.map((f) => [f.id]))("%s is registered by the bundle", (id) => {
    expect(typeof bundle.functions.get(id)).toBe("function");
  });

  it("the bundle registers nothing that functions.json does not declare", () => {
    const ids = new Set(declared.map((f) => f.id));
    expect([...bundle.functions.keys()].filter((id) => !ids.has(id))).toEqual([]);
  });
});

// ---- hostile input -------------------------------------------------------------------------------------------

/** Scalars the spreadsheet can pass (and a few it should not, which must still not break a function). */
const hostileScalar: fc.Arbitrary<unknown> = fc.oneof(
  fc.double(), // includes NaN, ±Infinity, ±0, subnormals
  fc.integer({ min: -1_000_000, max: 1_000_000 }),
  fc.constantFrom(0, -0, 1, -1, 7, 25, 100, 1e308, -1e308, 5e-324, 1e-300, Number.MAX_SAFE_INTEGER, 2 ** 53 + 1),
  fc.constantFrom(
    "",
    " ",
    "abc",
    "7",
    " 7 ",
    "1e3",
    "NaN",
    "Infinity",
    "-",
    "#N/A",
    "TRUE",
    "Zn",
    "SHE",
    "O2",
    "H2",
    "ü—☃",
    "\u0000",
  ),
  fc.string({ maxLength: 12 }),
  fc.boolean(),
  fc.constantFrom(null, undefined),
);

/** A 2-D range: rectangular, ragged, empty, or of blank cells. */
const hostileMatrix: fc.Arbitrary<unknown> = fc.oneof(
  fc
    .integer({ min: 1, max: 4 })
    .chain((w) => fc.array(fc.array(hostileScalar, { minLength: w, maxLength: w }), { minLength: 1, maxLength: 4 })),
  fc.array(fc.array(hostileScalar, { maxLength: 4 }), { maxLength: 4 }), // ragged and empty rows
  fc.constantFrom(
    [],
    [[]],
    [[""]],
    [
      ["", ""],
      ["", ""],
    ],
    [[null]],
    [[undefined]],
  ),
);

function argumentFor(p: MetadataParameter): fc.Arbitrary<unknown> {
  const one = p.dimensionality === "matrix" ? fc.oneof(hostileMatrix, hostileScalar) : hostileScalar;
  // A repeating parameter arrives as an array of its values.
  return p.repeating ? fc.array(one, { maxLength: 3 }) : one;
}

/** Arguments for one call: all declared parameters, trailing optional ones sometimes left out. */
function argumentsFor(params: MetadataParameter[]): fc.Arbitrary<unknown[]> {
  const firstOptional = params.findIndex((p) => p.optional);
  const minCount = firstOptional === -1 ? params.length : firstOptional;
  return fc
    .tuple(fc.integer({ min: minCount, max: params.length }), fc.tuple(...params.map(argumentFor)))
    .map(([count, values]) => (values as unknown[]).slice(0, count));
}

describe("hostile input: never a throw, every cell a number, a string or an error value", () => {
  it.each(declared.map((f) => [f.id, f] as const))("%s", async (id, meta) => {
    const fn = bundle.functions.get(id);
    expect(typeof fn).toBe("function");
    const dimensionality = meta.result?.dimensionality ?? "scalar";
    await fc.assert(
      fc.asyncProperty(argumentsFor(meta.parameters), async (args) => {
        let out: unknown;
        try {
          out = await callFunction(fn!, args);
        } catch (e) {
          throw new Error(`${id}(${safeString(args)}) threw ${String(e)}`);
        }
        const problem = resultProblem(out, dimensionality);
        if (problem) throw new Error(`${id}(${safeString(args)}) → ${safeString(out)}: ${problem}`);
      }),
      { numRuns: 300 },
    );
  });
});

/**
 * Structured cell errors: a #VALUE! names the argument at fault in `argument` as well as in its message, so callers
 * (the command line) need not read it back out of the text. Check values: the argument names of the function help
 * (src/functions/declarations.ts, from which functions.ts is generated).
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { CellError, notAvailable, valueError } from "../../src/functions/cell-values";
import { WORKSHEET_FUNCTIONS } from "../../src/functions/declarations";
import * as declared from "../../src/functions/functions";
import { REPO_ROOT } from "../../test-support/bundle-harness";
import { elementArg, pHArg, potentialArg } from "../../src/functions/common-args";
import { speciesAt } from "../../src/functions/stability-functions";

describe("CellError.argument", () => {
  it("is set by the element reader for an unknown metal, beside the message naming it", () => {
    const error = elementArg.parse("unobtainium");
    expect(error).toBeInstanceOf(CellError);
    expect((error as CellError).code).toBe("#VALUE!");
    expect((error as CellError).argument).toBe("element");
    expect((error as CellError).message.startsWith("element:")).toBe(true);
  });

  it("is absent (not an own property) when no argument is at fault", () => {
    expect(Object.keys(notAvailable("no boundary within ±3 V"))).not.toContain("argument");
    expect(Object.keys(valueError("ranges of different shapes cannot be combined"))).not.toContain("argument");
    expect(valueError("pH: 17 is out of range", "pH").argument).toBe("pH");
  });

  it("is set by the number readers, for a wrong kind and for a value out of range", () => {
    expect((pHArg.parse("seven") as CellError).argument).toBe("pH");
    expect((pHArg.parse(17) as CellError).argument).toBe("pH");
    // a reading in mV typed where volts are expected (595 outside ±3 V)
    expect((potentialArg().parse(595) as CellError).argument).toBe("potential");
  });

  it("reaches the caller through a worksheet function, so the command line ties it to the column", () => {
    const [[cell]] = speciesAt("Fe", "seven", 0.1);
    expect(cell).toBeInstanceOf(CellError);
    expect((cell as CellError).argument).toBe("pH");
  });
});

/** A valid value for every argument name of the worksheet functions (the help's names). */
const VALID: Record<string, unknown> = {
  element: "Fe",
  pH: 7,
  potential: 0.1,
  temperature: 25,
  activity: 1e-6,
  carbonate: 0.001,
  chloride: 0.001,
  sulfur: 0.0001,
  phosphate: 0.00001,
  ionicStrength: 0.01,
  direction: 1,
  unit: undefined,
  header: false,
  reading: 0.2,
  electrode: "SCE",
  gas: "O2",
  pressure: 1,
  overpotential: 0,
  pe: 4,
  oxidized: "Fe3+",
  reduced: "Fe2+",
  value: 500,
  basis: "uS/cm",
  alkalinity: 100,
};

const ARGUMENT_NAMES = new Set(WORKSHEET_FUNCTIONS.flatMap((fn) => fn.parameters.map((p) => p.name)));

const exported = declared as unknown as Record<string, (...args: unknown[]) => unknown[][]>;

/** Every error cell of a result range. */
const errorsOf = (result: unknown[][]): CellError[] =>
  result.flat().filter((c): c is CellError => c instanceof CellError);

describe("every error naming an argument carries it", () => {
  const cases = WORKSHEET_FUNCTIONS.flatMap((fn) => fn.parameters.map((p, at) => ({ fn, name: p.name, at })));

  it.each(cases)("$fn.id: text where $name belongs gives an error with argument $name", ({ fn, name, at }) => {
    const args = fn.parameters.map((p, i) => (i === at ? "no such thing" : VALID[p.name]));
    const errors = errorsOf(exported[fn.id.toLowerCase()](...args));
    expect(errors.length, `${fn.id}(${name} = text)`).toBeGreaterThan(0);
    for (const e of errors) {
      expect(e.argument, e.message).toBe(name);
      expect(e.message.startsWith(`${name}: `), e.message).toBe(true);
    }
  });

  it.each(cases)("$fn.id: an #N/A cell in $name gives an error with argument $name", ({ fn, name, at }) => {
    const args = fn.parameters.map((p, i) => (i === at ? { code: "#N/A" } : VALID[p.name]));
    const errors = errorsOf(exported[fn.id.toLowerCase()](...args));
    expect(errors.length).toBeGreaterThan(0); // ASSESS: the seven answers of the row
    // ASSESS's header is a switch, not a value per row: an error cell there is a wrong kind of input (#VALUE!)
    for (const e of errors) expect([e.code, e.argument]).toEqual([name === "header" ? "#VALUE!" : "#N/A", name]);
  });

  it("answers with no argument at fault carry none (valid input with no answer, ranges of different shapes)", () => {
    const [[none]] = exported.boundary("Fe", 7, 2.9, 25);
    expect(none).toBeInstanceOf(CellError);
    expect(Object.keys(none as CellError)).not.toContain("argument");
    const mixed = errorsOf(exported.species("Fe", [[7], [8]], [[0.1], [0.2], [0.3]]));
    expect(mixed.length).toBeGreaterThan(0);
    for (const e of mixed) expect(Object.keys(e)).not.toContain("argument");
  });

  it("no source builds an error whose text leads with an argument name without recording it (use argumentError)", () => {
    const dir = join(REPO_ROOT, "src/functions");
    const unnamed = readdirSync(dir)
      .filter((f) => f.endsWith(".ts"))
      .flatMap((f) =>
        [
          ...readFileSync(join(dir, f), "utf8").matchAll(
            /\b(?:valueError|notAvailable)\(\s*[`"](\$\{\w+\}|[A-Za-z][\w ,]*):\s[^)]*\)/g,
          ),
        ]
          .filter((m) => m[1].startsWith("${") || m[1].split(", ").every((word) => ARGUMENT_NAMES.has(word)))
          .filter((m) => !/,\s*("\w+"|\w+)\s*\)$/.test(m[0]))
          .map((m) => `${f}: ${m[0].slice(0, 60)}`),
      );
    expect(unnamed.join("\n")).toBe("");
  });
});

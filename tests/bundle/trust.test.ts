// What a new user touches first, checked on the BUILT bundle (dist/functions.js in the stand-in registry,
// harness.ts): readings in mV are refused with a message saying what to do; every error is #VALUE! or #N/A with a
// message (Excel shows messages only for those two, Office documentation of CustomFunctions.ErrorCode); an error
// cell inside a range stays in its own cell; a blank measured cell is a missing value; ASSESS agrees with the
// single-answer functions row by row; METALS, ELECTRODES and VERSION spill; look-ups ignore inherited keys.
// Needs a build: `npm test` builds first.

import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import {
  callAsSpreadsheet,
  loadBundle,
  REPO_ROOT,
  StandInError,
  type LoadedBundle,
} from "../../test-support/bundle-harness";

let bundle: LoadedBundle;
beforeAll(() => {
  bundle = loadBundle();
});

const call = (id: string, ...args: unknown[]): unknown[][] => bundle.functions.get(id)!(...args) as unknown[][];
/** Arguments placed by parameter name from functions.json, so a check does not depend on argument order. */
const named = (id: string, values: Record<string, unknown>): unknown[][] => {
  const params = bundle.metadata.functions.find((f) => f.id === id)!.parameters;
  for (const key of Object.keys(values))
    expect(
      params.map((p) => p.name),
      `${id} has ${key}`,
    ).toContain(key);
  return call(id, ...params.map((p) => (p.name in values ? values[p.name] : null)));
};
const first = (id: string, ...args: unknown[]): unknown => call(id, ...args)[0][0];
const cell = (v: unknown) => [[v]];
const column = (...values: unknown[]) => values.map((v) => [v]);

function expectError(value: unknown, code: "#VALUE!" | "#N/A", message?: RegExp | string): StandInError {
  expect(value).toBeInstanceOf(StandInError);
  const e = value as StandInError;
  expect(e.code).toBe(code);
  expect(e.message ?? "").not.toBe("");
  if (typeof message === "string") expect(e.message).toBe(message);
  else if (message) expect(e.message).toMatch(message);
  return e;
}

const MV_MESSAGE = (name: string, x: number) =>
  `${name}: ${x} is outside −3…+3 V: a reading in mV? Divide by 1000 or use REDOX.TOSHE(…, "mV")`;

describe("readings in mV", () => {
  it("SPECIES, REGIME and WATERMARGIN refuse 595 and 1E9 (volts expected) with a message saying what to do", () => {
    expectError(first("SPECIES", cell("Pb"), cell(7), cell(595)), "#VALUE!", MV_MESSAGE("potential", 595));
    expectError(first("REGIME", cell("Fe"), cell(7), cell(1e9)), "#VALUE!", MV_MESSAGE("potential", 1e9));
    expectError(first("WATERMARGIN", cell(7), cell(595)), "#VALUE!", MV_MESSAGE("potential", 595));
  });

  it("every function taking a potential refuses one beyond ±3 V and accepts ±3 V itself", () => {
    const minimal: Record<string, unknown[]> = {
      SPECIES: ["Fe", 7],
      REGIME: ["Fe", 7],
      BOUNDARY: ["Fe", 7],
      DISSOLVED: ["Fe", 7],
      ASSESS: ["Fe", 7],
      WATERMARGIN: [7],
      PE: [],
      FROMSHE: [],
      TOSHE: [],
    };
    const withPotential = bundle.metadata.functions.filter((f) =>
      f.parameters.some((p) => p.name === "potential" || p.name === "reading"),
    );
    expect(withPotential.map((f) => f.id).sort()).toEqual(Object.keys(minimal).sort());
    for (const f of withPotential) {
      const index = f.parameters.findIndex((p) => p.name === "potential" || p.name === "reading");
      const args = (value: number) => {
        const a: unknown[] = f.parameters.map(() => null);
        minimal[f.id].forEach((v, i) => (a[i] = cell(v)));
        if (f.id === "TOSHE" || f.id === "FROMSHE") a[1] = cell("SHE");
        a[index] = cell(value);
        return a;
      };
      expectError(call(f.id, ...args(-612))[0][0], "#VALUE!", MV_MESSAGE(f.parameters[index].name, -612));
      for (const edge of [3, -3])
        expect(call(f.id, ...args(edge))[0][0], `${f.id}(${edge} V)`).not.toSatisfy(
          (v) => v instanceof StandInError && /outside −3…\+3 V/.test(v.message ?? ""),
        );
    }
  });

  it('TOSHE and FROMSHE take "mV": 595 mV vs saturated Ag/AgCl is 0.595 V plus the electrode, and back', () => {
    const inV = first("TOSHE", cell(0.595), cell("AgCl-sat"), cell(7.3)) as number;
    const inMV = first("TOSHE", cell(595), cell("AgCl-sat"), cell(7.3), null, cell("mV")) as number;
    expect(inMV).toBeCloseTo(inV, 12);
    expect(first("FROMSHE", cell(inMV), cell("AgCl-sat"), cell(7.3), null, cell("mV")) as number).toBeCloseTo(595, 9);
    expect(first("FROMSHE", cell(inMV), cell("AgCl-sat"), cell(7.3), null, cell("V")) as number).toBeCloseTo(0.595, 12);
    expectError(
      first("TOSHE", cell(595), cell("AgCl-sat"), null, null, cell("kV")),
      "#VALUE!",
      /^unit: expected "V" or "mV"/,
    );
    expectError(
      first("TOSHE", cell(5000), cell("AgCl-sat"), null, null, cell("mV")),
      "#VALUE!",
      /^reading: 5000 mV is outside/,
    );
  });

  it("TOSHE of a blank cell is blank, not the electrode's own potential", () => {
    expect(first("TOSHE", cell(null), cell("AgCl-sat"), cell(7.3), null, cell("mV"))).toBe("");
    expect(
      call("TOSHE", column(595, null, ""), cell("AgCl-sat"), cell(7.3), null, cell("mV")).map((r) => r[0] === ""),
    ).toEqual([false, true, true]);
  });
});

describe("errors Excel shows", () => {
  it("out-of-range numbers are #VALUE! naming argument, value and range; DIC below pH 4.5 is #N/A with its reason", () => {
    expectError(
      first("SPECIES", cell("Fe"), cell(17.2), cell(0)),
      "#VALUE!",
      "pH: 17.2 is out of range (at least -2 and at most 16)",
    );
    expectError(first("NEUTRALPH", cell(301)), "#VALUE!", /^temperature: 301 is out of range/); // 0–300 °C
    expectError(
      first("TOSHE", cell(0.1), cell("SCE"), cell(90)),
      "#VALUE!",
      /^temperature: 90 °C is outside the range of SCE/,
    );
    expectError(
      named("BOUNDARY", { element: cell("Fe"), pH: cell(7), potential: cell(0), direction: cell(2) })[0][0],
      "#VALUE!",
      /^direction: expected 1 \(above\) or -1 \(below\), got 2/,
    );
    expectError(first("DIC", cell(50), cell(3.5)), "#N/A", /^alkalinity, pH: pH 3.5 is below the alkalinity end point/);
  });

  it("no function answers with any code but #VALUE! or #N/A, and every error carries a message (random and hostile input)", async () => {
    const scalar = fc.oneof(
      fc.double(),
      fc.constantFrom(-1e9, -5, 0, 3.5, 7, 17, 150, 595, 1e9, "", "x", "Fe", "SCE", "mV", "ug/L", true),
      fc.constant(null),
    );
    for (const f of bundle.metadata.functions) {
      await fc.assert(
        fc.asyncProperty(
          fc.array(
            fc.oneof(
              scalar,
              scalar.map(cell),
              fc.array(scalar, { minLength: 1, maxLength: 3 }).map((v) => column(...v)),
            ),
            { maxLength: f.parameters.length },
          ),
          async (args) => {
            const out = callAsSpreadsheet(bundle, f.id, args);
            const cells = Array.isArray(out) ? (out as unknown[][]).flat() : [out];
            for (const c of cells) {
              if (!(c instanceof StandInError)) continue;
              if (c.code !== "#VALUE!" && c.code !== "#N/A")
                throw new Error(`${f.id}(${JSON.stringify(args)}) → ${c.code}`);
              if (!c.message) throw new Error(`${f.id}(${JSON.stringify(args)}) → ${c.code} without a message`);
            }
          },
        ),
        { numRuns: 60 },
      );
    }
  });
});

describe("error cells inside a range (allowErrorForDataTypeAny)", () => {
  it("functions.json sets allowErrorForDataTypeAny and every parameter has type any", () => {
    expect((bundle.metadata as { allowErrorForDataTypeAny?: boolean }).allowErrorForDataTypeAny).toBe(true);
    for (const f of bundle.metadata.functions)
      for (const p of f.parameters) expect(p.type ?? "any", `${f.id}.${p.name}`).toBe("any");
  });

  it("one error cell in a pH column gives one error cell; the other rows answer as before", () => {
    const pH = column(6, new StandInError("#DIV/0!"), 8, new StandInError("#N/A"));
    const out = callAsSpreadsheet(bundle, "REGIME", [cell("Fe"), pH, cell(0)]) as unknown[][];
    expect(out.length).toBe(4);
    expect(out[0][0]).toBe(first("REGIME", cell("Fe"), cell(6), cell(0)));
    expectError(out[1][0], "#VALUE!", "pH: the cell holds the error #DIV/0!; correct that cell");
    expect(out[2][0]).toBe(first("REGIME", cell("Fe"), cell(8), cell(0)));
    expectError(out[3][0], "#N/A", /^pH: the cell holds #N\/A/);
  });

  it("without the option the stand-in, as the documentation describes, fails the whole formula", () => {
    const { allowErrorForDataTypeAny: _dropped, ...without } = bundle.metadata as {
      allowErrorForDataTypeAny?: boolean;
    };
    const pH = column(6, new StandInError("#DIV/0!"), 8);
    const out = callAsSpreadsheet(
      { functions: bundle.functions, metadata: without as LoadedBundle["metadata"] },
      "REGIME",
      [cell("Fe"), pH, cell(0)],
    );
    expect(out).toBeInstanceOf(StandInError);
    expect((out as StandInError).code).toBe("#DIV/0!");
  });
});

describe("blank means missing", () => {
  it("a blank cell in a temperature column gives a blank row; an omitted temperature is 25 °C", () => {
    const out = call("SPECIES", cell("Fe"), column(7, 7, 7), column(-0.5, -0.5, -0.5), column(60, null, ""));
    expect(out.map((r) => r[0])).toEqual([first("SPECIES", cell("Fe"), cell(7), cell(-0.5), cell(60)), "", ""]);
    expect(first("SPECIES", cell("Fe"), cell(7), cell(-0.5))).toBe(
      first("SPECIES", cell("Fe"), cell(7), cell(-0.5), cell(25)),
    );
    expect(first("SPECIES", cell("Fe"), cell(7), cell(-0.5), cell(null))).toBe("");
    for (const id of ["WATERMARGIN", "NEUTRALPH", "SLOPE", "DIC", "TOSHE"]) {
      const f = bundle.metadata.functions.find((m) => m.id === id)!;
      const t = f.parameters.findIndex((p) => p.name === "temperature");
      const args: unknown[] = f.parameters.map(() => null);
      const sample: Record<string, unknown> = {
        pH: 7,
        potential: 0.5,
        alkalinity: 100,
        reading: 0.1,
        electrode: "SCE",
      };
      f.parameters.forEach((p, i) => p.name in sample && (args[i] = cell(sample[p.name])));
      args[t] = column(20, null);
      expect((call(id, ...args) as unknown[][])[1][0], id).toBe("");
    }
  });

  it("RHE needs the pH: a blank pH cell gives a blank result, an omitted one says it is needed", () => {
    expect(first("TOSHE", cell(0.1), cell("RHE"), cell(25), cell(null))).toBe("");
    expectError(first("TOSHE", cell(0.1), cell("RHE"), cell(25)), "#VALUE!", /^pH: RHE needs the pH/);
  });
});

describe("ASSESS, METALS, ELECTRODES, VERSION", () => {
  const elements = column("Pb", "Fe", "Cu", "Zn", null, "Xx");
  const pHs = column(7.02, 7, 9, 5, 7, 7);
  const Es = column(0.81, 0.1, 0.2, -0.9, 0, 0);
  const Ts = column(7.3, 13, 25, 40, 25, 25);

  it("spills seven columns per sample, equal to SPECIES, REGIME, BOUNDARY, WATERMARGIN and DISSOLVED of that row", () => {
    const out = named("ASSESS", { element: elements, pH: pHs, potential: Es, temperature: Ts, unit: cell("ug/L") });
    expect(out.length).toBe(6);
    for (let r = 0; r < 4; r++) {
      const at = { element: [elements[r]], pH: [pHs[r]], potential: [Es[r]], temperature: [Ts[r]] };
      const expected = [
        named("SPECIES", at)[0][0],
        named("REGIME", at)[0][0],
        named("BOUNDARY", { ...at, direction: cell(1) })[0][0],
        named("BOUNDARY", { ...at, direction: cell(-1) })[0][0],
        named("WATERMARGIN", { pH: [pHs[r]], potential: [Es[r]], temperature: [Ts[r]] })[0][0],
        named("DISSOLVED", { ...at, unit: cell("ug/L") })[0][0],
      ];
      const comparable = (v: unknown) => (v instanceof StandInError ? v.code : v);
      expect(out[r].slice(0, 6).map(comparable), `row ${r}`).toEqual(expected.map(comparable));
      if (typeof expected[5] === "number") expect(typeof out[r][6]).toBe("string");
      else expectError(out[r][6], "#N/A");
    }
    expect(out[4]).toEqual(["", "", "", "", "", "", ""]);
    for (const c of out[5]) expectError(c, "#VALUE!", /^element: "Xx" is not a metal/);
  });

  it("names the controlling solid, a header row on request, and refuses a row-shaped range", () => {
    const out = named("ASSESS", { element: cell("Fe"), pH: cell(8), potential: cell(0), header: cell(true) });
    expect(out[0]).toEqual([
      "species",
      "regime",
      "boundary above (V)",
      "boundary below (V)",
      "water margin (V)",
      "dissolved (mol/kg)",
      "controlling solid",
    ]);
    expect(out[1][6]).toBe(out[1][0]); // a solid is dominant: it controls the dissolved metal
    expectError(first("ASSESS", cell("Fe"), [[7, 8]], cell(0)), "#VALUE!", /one row per sample/);
  });

  it("METALS and ELECTRODES spill down one column, every name accepted by the functions", () => {
    const metals = call("METALS");
    expect(metals.length).toBeGreaterThanOrEqual(15);
    for (const [m] of metals) expect(typeof first("SPECIES", cell(m), cell(7), cell(0)), String(m)).toBe("string");
    const electrodes = call("ELECTRODES");
    expect(electrodes.map((r) => r[0])).toEqual(
      expect.arrayContaining(["SHE", "SCE", "AgCl-sat", "AgCl-3M", "CSE", "RHE"]),
    );
    for (const [e] of electrodes)
      expect(typeof first("TOSHE", cell(0.1), cell(e), cell(25), cell(7)), String(e)).toBe("number");
    expect(electrodes.map((r) => r[0])).not.toContain("Ag/AgCl");
  });

  it("VERSION gives the add-in version of package.json and an eight-digit data fingerprint", () => {
    const pkg = JSON.parse(readFileSync(join(REPO_ROOT, "package.json"), "utf8")) as { version: string };
    const out = call("VERSION");
    expect(out[0]).toEqual(["add-in", pkg.version]);
    expect(out[1][0]).toBe("data");
    expect(out[1][1]).toMatch(/^[0-9a-f]{8} \(\d+ files\)$/);
  });
});

describe("look-ups that cannot be fooled", () => {
  const INHERITED = [
    "constructor",
    "__proto__",
    "toString",
    "valueOf",
    "hasOwnProperty",
    "isPrototypeOf",
    "propertyIsEnumerable",
    "toLocaleString",
    "__defineGetter__",
    "__lookupGetter__",
    "prototype",
    "length",
    "name",
  ];
  const hostile = fc.oneof(
    fc.constantFrom(...INHERITED),
    fc.constantFrom(...INHERITED).map((s) => s.toUpperCase()),
    fc.constantFrom(...INHERITED).map((s) => ` ${s}(g) `),
    fc.string({ maxLength: 10 }).map((s) => `__${s}`),
  );

  it("gases, units, electrodes, elements and species refuse inherited names with #VALUE!", () => {
    fc.assert(
      fc.property(hostile, (text) => {
        const t = cell(text);
        const results: Array<[string, unknown]> = [
          ["WATERLINE gas", first("WATERLINE", cell(7), null, t)],
          [
            "DISSOLVED unit",
            named("DISSOLVED", { element: cell("Fe"), pH: cell(9), potential: cell(-0.3), unit: t })[0][0],
          ],
          ["ASSESS unit", named("ASSESS", { element: cell("Fe"), pH: cell(9), potential: cell(-0.3), unit: t })[0][0]],
          ["TOSHE electrode", first("TOSHE", cell(0.1), t)],
          ["TOSHE unit", first("TOSHE", cell(0.1), cell("SCE"), null, null, t)],
          ["SPECIES element", first("SPECIES", t, cell(7), cell(0))],
          ["SPECIESTABLE element", first("SPECIESTABLE", t)],
          ["COUPLE oxidized", first("COUPLE", t, cell("Fe2+"), cell(7))],
        ];
        for (const [where, value] of results) {
          if (!(value instanceof StandInError) || value.code !== "#VALUE!")
            throw new Error(`${where} "${text}" → ${String(value)}`);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('the water line for gas "constructor" is not the hydrogen line', () => {
    expectError(first("WATERLINE", cell(7), null, cell("constructor")), "#VALUE!", /^gas: expected "O2" or "H2"/);
  });
});

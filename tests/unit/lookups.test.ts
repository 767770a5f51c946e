/**
 * Look-ups that user text (or a data file's source key) meets answer only for the table's own keys: names every
 * object inherits ("constructor", "__proto__", "toString" …) are unknown names, at the engine level too (the bundle
 * harness checks the worksheet functions, tests/bundle/trust.test.ts).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import electrodesJson from "../../data/electrodes.json";
import { Database, getDatabase } from "../../src/chemistry/database";
import { ELEMENTS_FILE } from "../../src/chemistry/data-files";
import { ElectrodeTable, getElectrodes } from "../../src/chemistry/electrodes";
import { ownEntry } from "../../src/chemistry/own-entry";

const INHERITED = Object.getOwnPropertyNames(Object.prototype).concat(["prototype", "__proto__"]);
const hostile = fc.oneof(
  fc.constantFrom(...INHERITED),
  fc.constantFrom(...INHERITED).map((s) => s.toUpperCase()),
  fc.string({ maxLength: 8 }).map((s) => `__${s}`),
);

describe("own keys only", () => {
  it("ownEntry finds a table's own keys and nothing inherited", () => {
    const table = { o2: "O2" } as Record<string, string>;
    expect(ownEntry(table, "o2")).toBe("O2");
    fc.assert(fc.property(hostile, (key) => ownEntry(table, key) === undefined));
  });

  it("electrodes, metals and species know no inherited names", () => {
    const electrodes = getElectrodes();
    const db = getDatabase();
    fc.assert(
      fc.property(hostile, (text) => {
        expect("error" in electrodes.lookup(text)).toBe(true);
        expect(db.resolveMetal(text)).toBeUndefined();
        expect(db.lookup(text)).toBeUndefined();
        expect(db.element(text)).toBeUndefined();
      }),
    );
  });

  it("a data source key naming an inherited property is not found in the references", () => {
    const electrodes = JSON.parse(JSON.stringify(electrodesJson));
    electrodes.electrodes[0].source = "constructor";
    expect(() => new ElectrodeTable(electrodes)).toThrow(/source key "constructor" is not in references/);
    const water = JSON.parse(readFileSync(join(__dirname, "..", "..", "data", "species", "water.json"), "utf8"));
    water.species[0].source = "toString";
    expect(() => new Database([{ path: "data/species/water.json", content: water }], ELEMENTS_FILE)).toThrow(
      /source key "toString"/,
    );
  });
});

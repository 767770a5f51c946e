// The loader of reference fixtures (test-support/reference-fixture.ts): a wrong record fails loudly, naming the file,
// the record and the field; a tolerance above the check's ceiling or a disagreement without its other value fails;
// and every fixture under tests/reference/fixtures/ is read by a reference test.
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { loadReferenceFixture } from "../../test-support/reference-fixture";

const dir = mkdtempSync(join(tmpdir(), "reference-fixture-"));
const inputs = z.strictObject({ celsius: z.number() });
const record = {
  id: "pKw at 25 °C",
  inputs: { celsius: 25 },
  value: 13.995,
  tolerance: 0.002,
  unit: "pKw",
  source: "Bandura & Lvov 2006, J. Phys. Chem. Ref. Data 35:15 (from memory)",
};

function fixture(name: string, checks: unknown[]): URL {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify({ about: "test fixture", checks }));
  return pathToFileURL(path);
}

const load = (file: URL, ceiling = 0.002, differsBy?: number) =>
  loadReferenceFixture(file, inputs, { ceiling: () => ceiling, differsBy });

describe("loading a reference fixture", () => {
  it("returns the records of a valid file", () => {
    expect(load(fixture("good.json", [record]))).toEqual([record]);
  });

  it("names the file, the record and the field of a wrong record", () => {
    const file = fixture("bad-inputs.json", [record, { ...record, id: "pKw at 50 °C", inputs: { celsius: "50" } }]);
    expect(() => load(file)).toThrow(/bad-inputs\.json, record 1 \(pKw at 50 °C\): inputs\.celsius/);
  });

  it("refuses a record without a source naming a year, common practice or from memory", () => {
    const file = fixture("unsourced.json", [{ ...record, source: "a handbook" }]);
    expect(() => load(file)).toThrow(/unsourced\.json, record 0 \(pKw at 25 °C\): source: /);
  });

  it("refuses unknown fields and a missing unit", () => {
    const { unit: _unit, ...withoutUnit } = record;
    expect(() => load(fixture("extra.json", [{ ...record, tol: 1 }]))).toThrow(/record 0 .*tol/);
    expect(() => load(fixture("no-unit.json", [withoutUnit]))).toThrow(/record 0 .*unit/);
  });

  it("refuses a tolerance above the ceiling of its kind of check", () => {
    const file = fixture("loose.json", [{ ...record, tolerance: 0.003 }]);
    expect(() => load(file)).toThrow(/loose\.json, record 0 \(pKw at 25 °C\): tolerance 0\.003 is above 0\.002/);
  });

  it("a disagreement needs the other value, beyond the required gap; other checks may not carry one", () => {
    const other = { value: 14.1, source: "another compilation 1990 (from memory)", moreThan: 0.05 };
    expect(load(fixture("disagreement.json", [{ ...record, differsFrom: other }]), 0.002, 0.05)).toHaveLength(1);
    expect(() => load(fixture("no-other.json", [record]), 0.002, 0.05)).toThrow(/needs differsFrom/);
    const narrow = { ...other, moreThan: 0.01 };
    expect(() => load(fixture("narrow.json", [{ ...record, differsFrom: narrow }]), 0.002, 0.05)).toThrow(
      /moreThan 0\.01 is below 0\.05/,
    );
    expect(() => load(fixture("stray.json", [{ ...record, differsFrom: other }]))).toThrow(
      /disagreement fixtures only/,
    );
  });

  it("names the file of unreadable JSON and of an empty list", () => {
    const path = join(dir, "broken.json");
    writeFileSync(path, "{");
    expect(() => load(pathToFileURL(path))).toThrow(/broken\.json/);
    expect(() => load(fixture("empty.json", []))).toThrow(/empty\.json: checks/);
  });
});

describe("every reference fixture is read by a reference test", () => {
  const reference = fileURLToPath(new URL("../reference", import.meta.url));
  const tests = readdirSync(reference)
    .filter((f) => f.endsWith(".ts"))
    .map((f) => readFileSync(join(reference, f), "utf8"));
  const fixtures = readdirSync(join(reference, "fixtures"), { recursive: true, encoding: "utf8" })
    .filter((f) => f.endsWith(".json"))
    .map((f) => f.replace(/\\/g, "/"));

  it("finds the fixtures", () => {
    expect(fixtures.length).toBeGreaterThan(20);
  });

  for (const file of fixtures) {
    it(file, () => {
      expect(tests.some((t) => t.includes(`"./fixtures/${file}"`))).toBe(true);
    });
  }
});

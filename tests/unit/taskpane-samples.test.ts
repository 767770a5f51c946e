import { describe, expect, it } from "vitest";
import { readFileSync } from "fs";
import { median, readNumber, readSamples } from "../../src/taskpane/sample-table";
import { matchHeaders } from "../../src/tables";
import { parseDelimited } from "../../src/tables";
import { toSHE } from "../../src/chemistry/electrodes";

describe("reading samples", () => {
  const table = {
    headers: ["Sample", "pH", "ORP (mV)", "Temp"],
    rows: [
      ["a", "7.2", "410", "12"],
      ["b", "", "300", "12"],
      ["c", "7,4", "300", "12"],
      ["d", 17.2, 300, 12],
      ["e", 6.8, "612 mV", 12],
      ["f", 6.9, 5000, 12],
      ["", "", "", ""],
      ["g", 8.1, -250, ""],
    ],
    rowNumbers: [2, 3, 4, 5, 6, 7, 8, 9],
    source: "test",
  };
  const { mapping } = matchHeaders(table.headers);
  it("keeps good rows, converts readings to V vs SHE at the row's temperature, lists the rest with reasons", () => {
    const r = readSamples(table, { mapping, electrode: "AgCl-sat", unit: "mV", temperatureUnit: "C", celsius: 25 });
    expect(r.samples.map((s) => s.row)).toEqual([2, 9]);
    expect(r.samples[0].eSHE).toBeCloseTo(toSHE(0.41, "AgCl-sat", 12), 12);
    expect(r.samples[1].eSHE).toBeCloseTo(toSHE(-0.25, "AgCl-sat", 25), 12); // blank temperature: the diagram's
    expect(r.temperatures).toEqual([12]);
    expect(r.skipped.map((s) => s.row)).toEqual([3, 4, 5, 6, 7]);
    expect(r.skipped[0].reason).toMatch(/pH is blank/);
    expect(r.skipped[1].reason).toMatch(/decimal comma/);
    expect(r.skipped[2].reason).toMatch(/outside −2…16/);
    expect(r.skipped[3].reason).toMatch(/"612 mV" is not a number/);
    expect(r.skipped[4].reason).toMatch(/is the unit right/);
  });
  it("V instead of mV changes the reading a thousandfold", () => {
    const r = readSamples(
      { ...table, rows: [["a", 7, 0.41, 25]], rowNumbers: [2] },
      { mapping, electrode: "SHE", unit: "V", temperatureUnit: "C", celsius: 25 },
    );
    expect(r.samples[0].eSHE).toBeCloseTo(0.41, 12);
  });
  it("reads numbers strictly", () => {
    expect(readNumber(" 7.25 ")).toEqual({ value: 7.25 });
    expect(readNumber("1O.4")).toHaveProperty("error");
    expect(readNumber("7.4.1")).toHaveProperty("error");
    expect(readNumber(null)).toEqual({ blank: true });
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 2, 3])).toBe(2.5);
  });
  it("the invented demo log: rows of one metal, the deliberate mistakes listed", () => {
    const parsed = parseDelimited(readFileSync(new URL("../../data/demo/sample-log.csv", import.meta.url), "utf8"));
    const [headers, ...rows] = parsed.rows;
    const match = matchHeaders(headers, "Fe", "iron");
    const r = readSamples(
      { headers, rows, rowNumbers: parsed.lines.slice(1), source: "demo" },
      {
        mapping: match.mapping,
        electrode: match.hints.electrode!,
        unit: match.hints.potentialUnit!,
        temperatureUnit: "C",
        celsius: 25,
        onlyMetal: "Fe",
      },
    );
    expect(r.samples.length).toBeGreaterThan(50);
    expect(r.otherMetal).toBeGreaterThan(100);
    expect(r.samples.length + r.skipped.length + r.otherMetal).toBe(rows.length);
  });
});

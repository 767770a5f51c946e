import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { formatTick, makeAxes, niceTicks } from "../../src/diagram/axes";
import { displayScale } from "../../src/diagram/diagram-model";
import { getElectrodes } from "../../src/chemistry/electrodes";
import { nernstFactor, kelvin } from "../../src/chemistry/constants";

const area = { left: 60, top: 40, width: 600, height: 400 };
const window = { pHMin: -2, pHMax: 16, eMin: -2, eMax: 2 };

describe("axis transforms", () => {
  it("maps the window's corners onto the plot area's corners (E grows upwards)", () => {
    const axes = makeAxes(window, area);
    expect(axes.x(-2)).toBe(60);
    expect(axes.x(16)).toBe(660);
    expect(axes.y(2)).toBe(40);
    expect(axes.y(-2)).toBe(440);
    expect(axes.x(7)).toBeCloseTo(360, 12);
    expect(axes.y(0)).toBeCloseTo(240, 12);
  });

  it("inverts exactly", () => {
    const axes = makeAxes(window, area);
    fc.assert(
      fc.property(
        fc.double({ min: -2, max: 16, noNaN: true }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        (pH, E) => {
          expect(axes.pHAt(axes.x(pH))).toBeCloseTo(pH, 9);
          expect(axes.eAt(axes.y(E))).toBeCloseTo(E, 9);
        },
      ),
    );
  });

  it("refuses empty windows", () => {
    expect(() => makeAxes({ ...window, pHMax: -2 }, area)).toThrow(/maximum/);
    expect(() => makeAxes({ ...window, eMin: 3 }, area)).toThrow(/maximum/);
  });
});

describe("ticks", () => {
  it("chooses round steps inside the range", () => {
    expect(niceTicks(-2, 16, 9)).toEqual([-2, 0, 2, 4, 6, 8, 10, 12, 14, 16]);
    expect(niceTicks(-2, 2, 8)).toEqual([-2, -1.5, -1, -0.5, 0, 0.5, 1, 1.5, 2]);
    expect(niceTicks(-1800, 2200, 8)).toEqual([-1500, -1000, -500, 0, 500, 1000, 1500, 2000]);
    expect(niceTicks(0.12, 0.37, 5)).toEqual([0.15, 0.2, 0.25, 0.3, 0.35]);
  });
  it("writes negative numbers with the minus sign", () => {
    expect(formatTick(-0.5)).toBe("\u22120.5");
    expect(formatTick(0.1 + 0.2)).toBe("0.3");
  });
});

describe("potential scales", () => {
  it("SHE in volts is the identity, mV multiplies by 1000", () => {
    const she = displayScale("SHE", "V", 25);
    expect(she.fromSHE(7, 0.123)).toBeCloseTo(0.123, 12);
    expect(displayScale("SHE", "mV", 25).fromSHE(3, 0.5)).toBeCloseTo(500, 9);
    expect(she.axisTitle).toBe("E / V vs SHE");
  });
  it("an electrode scale subtracts the electrode's own potential from the electrode records", () => {
    const table = getElectrodes();
    const found = table.lookup("SCE");
    if ("error" in found) throw new Error(found.error);
    const sce = displayScale("sce", "V", 25);
    expect(sce.fromSHE(7, 0.5)).toBeCloseTo(0.5 - table.potential(found.electrode, 25), 12);
    expect(sce.toSHE(7, sce.fromSHE(7, 0.5))).toBeCloseTo(0.5, 12);
    expect(sce.axisTitle).toBe("E / V vs SCE");
  });
  it("RHE shifts by k(T)·pH: the H+/H2 line becomes horizontal at 0 (common practice)", () => {
    const rhe = displayScale("RHE", "V", 40);
    const k = nernstFactor(kelvin(40));
    for (const pH of [0, 4, 12]) expect(rhe.fromSHE(pH, -k * pH)).toBeCloseTo(0, 12);
  });
});

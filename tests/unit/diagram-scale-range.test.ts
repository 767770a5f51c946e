// The diagram axis vs a reference electrode is drawn only where the electrode's temperature dependence is
// published (data/electrodes.json, validCelsius): the pane refuses SCE at boiler temperatures instead of
// extrapolating its polynomial, and draws vs SHE (and RHE) to 300 °C.
import { describe, expect, it } from "vitest";
import { getElectrodes } from "../../src/chemistry/electrodes";
import { scaleProblem } from "../../src/diagram";

describe("scaleProblem: axis electrodes at temperature", () => {
  it("SHE and RHE are drawn at 300 °C; SCE at 25 °C", () => {
    expect(scaleProblem("SHE", 300)).toBeNull();
    expect(scaleProblem("RHE", 300)).toBeNull();
    expect(scaleProblem("SCE", 25)).toBeNull();
  });

  it("SCE at 250 °C is refused, naming its range and pointing to SHE", () => {
    const found = getElectrodes().lookup("SCE");
    if ("error" in found) throw new Error(found.error);
    const [low, high] = found.electrode.validCelsius;
    expect(high).toBeLessThan(250);
    expect(scaleProblem("SCE", 250)).toBe(`SCE is known from ${low} to ${high} °C only; at 250 °C draw vs SHE`);
    expect(scaleProblem("SCE", high)).toBeNull();
  });

  it("an unknown electrode name gives the look-up's message", () => {
    expect(scaleProblem("no-such-electrode", 25)).toMatch(/no-such-electrode/);
  });
});

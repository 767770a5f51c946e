/**
 * Properties of the solubility chart's curve (src/diagram/solubility-curve.ts, answered by the pane's evaluator
 * src/taskpane/dissolved-curve.ts): for any metal, potential, temperature, water and pH range, every grid point's
 * value is what REDOX.DISSOLVED gives for that pH alone (the worksheet function, bit for bit) and what the engine's
 * dissolvedEquilibrium gives (point-dissolved.ts, mol/kg × atomic weight); the curve has no number exactly where
 * DISSOLVED gives #N/A (no solid can form), and the drawn pieces and the listed gaps are those runs, nothing else.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { dissolvedEquilibrium } from "../../src/chemistry/point-dissolved";
import { CellError } from "../../src/functions/cell-values";
import { dissolvedAt } from "../../src/functions/stability-functions";
import {
  curveGaps,
  curvePieces,
  renderSolubilityChart,
  solubilityCurve,
  type PlottedSample,
  type SolubilityCurve,
} from "../../src/diagram";
import { dissolvedAlongPH } from "../../src/taskpane/dissolved-curve";

const db = getDatabase();
const optionalTotal = fc.option(fc.double({ min: -5, max: -2, noNaN: true }), { nil: undefined });

const cases = fc.record({
  metal: fc.constantFrom(...db.metals()),
  eSHE: fc.double({ min: -1, max: 1.4, noNaN: true }),
  celsius: fc.double({ min: 0, max: 100, noNaN: true }),
  carbonate: optionalTotal,
  chloride: optionalTotal,
  sulfur: optionalTotal,
  phosphate: optionalTotal,
  ionicStrength: fc.option(fc.double({ min: 1e-4, max: 0.1, noNaN: true }), { nil: undefined }),
  pHMin: fc.double({ min: -2, max: 13, noNaN: true }),
  width: fc.double({ min: 0.5, max: 10, noNaN: true }),
  at: fc.double({ min: 0, max: 1, noNaN: true }),
});

type Case = typeof cases extends fc.Arbitrary<infer T> ? T : never;

/** A sample as the pane plots it (only what the evaluator reads matters: E, T, water, I). */
function sampleOf(c: Case, pH: number): PlottedSample {
  const ligands = Object.fromEntries(
    (["carbonate", "chloride", "sulfur", "phosphate"] as const).flatMap((l) =>
      c[l] === undefined ? [] : [[l, 10 ** c[l]!]],
    ),
  );
  return {
    row: 2,
    id: "S-1",
    pH,
    E: c.eSHE,
    eSHE: c.eSHE,
    formula: "",
    regime: "passivation",
    waterMargin: 0,
    celsius: c.celsius,
    ...(Object.keys(ligands).length > 0 ? { ligands } : {}),
    ...(c.ionicStrength !== undefined ? { ionicStrength: c.ionicStrength } : {}),
  };
}

/** REDOX.DISSOLVED at one pH with the sample's arguments, as one cell of a sheet. */
function oneCell(metal: string, s: PlottedSample, pH: number) {
  const w = s.ligands ?? {};
  const I = s.ionicStrength ?? "";
  return dissolvedAt(metal, pH, s.eSHE, s.celsius, w.carbonate, w.chloride, w.sulfur, w.phosphate, I, "ug/L")[0][0];
}

/** The engine's answer in µg/L (null: no solid forms). */
function engineUg(metal: string, s: PlottedSample, pH: number): number | null {
  const w = s.ligands ?? {};
  const water = {
    celsius: s.celsius!,
    activity: 1,
    carbonate: w.carbonate ?? 0,
    chloride: w.chloride ?? 0,
    sulfur: w.sulfur ?? 0,
    phosphate: w.phosphate ?? 0,
    ionicStrength: s.ionicStrength ?? 0,
  };
  const { total } = dissolvedEquilibrium(db, metal, pH, s.eSHE, water);
  return total === null ? null : total * db.element(metal)!.atomicWeight * 1e6;
}

/** Every grid point against the worksheet function and the engine; pieces and gaps are the runs. */
function checkCurve(metal: string, sample: PlottedSample, curve: SolubilityCurve): void {
  for (const p of curve.points) {
    const cell = oneCell(metal, sample, p.pH);
    if (p.value === null) expect(cell instanceof CellError && cell.code === "#N/A", `pH ${p.pH}`).toBe(true);
    else expect(cell, `pH ${p.pH}`).toBe(p.value);
    const engine = engineUg(metal, sample, p.pH);
    if (p.value === null) expect(engine).toBeNull();
    else expect(Math.abs(engine! - p.value)).toBeLessThanOrEqual(1e-12 * p.value);
  }
  const numbers = curve.points.filter((p) => p.value !== null);
  expect(curvePieces(curve).flat()).toEqual(numbers);
  const inGaps = curve.points.filter((p) => curveGaps(curve).some((g) => p.pH >= g.from && p.pH <= g.to));
  expect(inGaps).toEqual(curve.points.filter((p) => p.value === null));
}

describe("the solubility curve is REDOX.DISSOLVED along pH", () => {
  it("at every grid point, for any metal, potential, temperature, water and range; gaps exactly at #N/A", () => {
    let withGaps = 0;
    let withNumbers = 0;
    fc.assert(
      fc.property(cases, (c) => {
        const pHMax = Math.min(16, c.pHMin + c.width);
        const pH = c.pHMin + (pHMax - c.pHMin) * c.at;
        const sample = sampleOf(c, pH);
        const curve = solubilityCurve(c.pHMin, pHMax, pH, dissolvedAlongPH(c.metal, sample, 25), 16);
        expect(curve.points.some((p) => p.pH === pH)).toBe(true);
        checkCurve(c.metal, sample, curve);
        expect(curve.sample.value).toBe(curve.points.find((p) => p.pH === pH)!.value);
        if (curve.points.some((p) => p.value === null)) withGaps++;
        if (curve.points.some((p) => p.value !== null)) withNumbers++;
      }),
      { numRuns: 120 },
    );
    // the random cases exercise both sides of the rule
    expect(withGaps).toBeGreaterThan(5);
    expect(withNumbers).toBeGreaterThan(30);
  });

  it("copper at 0.738 V over pH 2–8 has a gap at the acid end, where tenorite would dissolve beyond 1 mol/kg", () => {
    const c = { metal: "Cu", eSHE: 0.738, celsius: 13.1, carbonate: Math.log10(8.5e-4) } as Case;
    const sample = sampleOf({ ...c, chloride: undefined, sulfur: undefined, phosphate: undefined }, 7.07);
    const curve = solubilityCurve(2, 8, 7.07, dissolvedAlongPH("Cu", sample, 25), 120);
    checkCurve("Cu", sample, curve);
    const gaps = curveGaps(curve);
    expect(gaps.length).toBe(1);
    expect(gaps[0].from).toBe(2);
    expect(gaps[0].to).toBeGreaterThan(3);
    expect(gaps[0].to).toBeLessThan(5);
    // the drawn line has no vertex inside the gap
    const { svg } = renderSolubilityChart({
      curve,
      sample,
      metalName: "copper",
      threshold: 2000,
      width: 330,
      height: 200,
    });
    const gap = /class="rc-sol-gap" x="([\d.]+)" y="[\d.]+" width="([\d.]+)"/.exec(svg)!;
    const [x0, x1] = [Number(gap[1]), Number(gap[1]) + Number(gap[2])];
    const xs = [...svg.matchAll(/class="rc-sol-line" d="([^"]+)"/g)].flatMap((m) =>
      [...m[1].matchAll(/[ML]([\d.]+) /g)].map((v) => Number(v[1])),
    );
    expect(xs.length).toBeGreaterThan(50);
    expect(xs.filter((x) => x >= x0 && x < x1 - 0.01)).toEqual([]);
  });
});

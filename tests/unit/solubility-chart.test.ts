/**
 * The solubility chart's value at the sample's pH is REDOX.DISSOLVED of that row: the invented demo log's rows read
 * by the pane's own path (readSamples, ownAnswers: REDOX.TOSHE, REDOX.DIC of the row's alkalinity, the worksheet
 * functions), the chart model evaluated with the pane's evaluator, compared bit for bit with the worksheet function
 * called on the row as a sheet would chain it. Lead in a water with carbonate (the alkalinity column) and 1 mg/L
 * orthophosphate as PO4, and copper; then the rendered chart: its marker sits on the curve, its threshold line at the
 * value's height on the log axis.
 */
import { describe, expect, it } from "vitest";
import {
  decadeRange,
  displayScale,
  MAX_DECADES,
  renderSolubilityChart,
  solubilityCurve,
  solubilityLayout,
  type PlottedSample,
} from "../../src/diagram";
import { dissolvedAlongPH } from "../../src/taskpane/dissolved-curve";
import { PURE_WATER, type WaterSettings } from "../../src/taskpane/ligand-inputs";
import { ownAnswers } from "../../src/taskpane/pane-samples";
import { readSamples } from "../../src/taskpane/sample-table";
import { DEMO_ALKALINITY, DEMO_MATCH, DEMO_TABLE, demoRowDissolved } from "../../test-support/demo-dissolved";

const table = DEMO_TABLE;
const match = DEMO_MATCH;
const alkalinity = DEMO_ALKALINITY;
/** 1 mg/L orthophosphate as PO4 in mol/kg as P: 1e-3 / 94.97 (docs/lead-and-copper.md; 1 L ≈ 1 kg, common practice). */
const PO4_1MG = 1.053e-5;

/** The demo rows of `metal` as the pane answers them, with the alkalinity column and `phosphate` typed. */
function paneSamples(metal: string, phosphate: number): PlottedSample[] {
  const electrode = match.hints.electrode!;
  const unit = match.hints.potentialUnit!;
  const waterColumns = { carbonate: alkalinity };
  const read = readSamples(table, {
    mapping: match.mapping,
    electrode,
    unit,
    temperatureUnit: "C",
    celsius: 25,
    onlyMetal: metal,
    waterColumns,
  });
  const water: WaterSettings = {
    ...PURE_WATER,
    carbonate: { kind: "column", column: alkalinity },
    phosphate: { kind: "typed", total: phosphate > 0 ? phosphate : null },
  };
  const source = { table, mapping: match.mapping, temperatureUnit: "C" as const, ionic: null };
  const at = { metal, electrode, unit, activity: 1e-6, celsius: 25 };
  return ownAnswers(source, read, water, at, displayScale(electrode, unit, 25)).samples;
}

describe("the chart's value at the sample's pH is the row's REDOX.DISSOLVED", () => {
  const cases = [
    // lead service line, carbonate from the alkalinity column plus 1 mg/L PO4 (the docs' what-if)
    { metal: "Pb", id: "MLL-25-001", phosphate: PO4_1MG },
    { metal: "Pb", id: "MLL-25-001", phosphate: 0 },
    // copper line (docs/lead-and-copper.md, Orchard Rise)
    { metal: "Cu", id: "ORR-25-010", phosphate: 0 },
    { metal: "Cu", id: "ORR-25-010", phosphate: PO4_1MG },
  ];
  for (const c of cases) {
    it(`${c.metal} ${c.id}${c.phosphate ? " with 1 mg/L PO4" : ""}: bit for bit, and the marker on the curve`, () => {
      const sample = paneSamples(c.metal, c.phosphate).find((s) => s.id === c.id)!;
      expect(sample).toBeDefined();
      const curve = solubilityCurve(5.5, 8.5, sample.pH, dissolvedAlongPH(c.metal, sample, 25));
      const expected = demoRowDissolved(c.metal, c.id, c.phosphate);
      expect(curve.sample.value).toBe(expected);
      expect(curve.sample.value).toBe(sample.equilibrium); // the pane's own per-row answer (results table)
      expect(curve.points.find((p) => p.pH === sample.pH)?.value).toBe(expected);
    });
  }

  it("orthophosphate lowers the lead curve at the sample's pH and the chart says so in words", () => {
    const dosed = paneSamples("Pb", PO4_1MG).find((s) => s.id === "MLL-25-001")!;
    const plain = paneSamples("Pb", 0).find((s) => s.id === "MLL-25-001")!;
    const a = solubilityCurve(5.5, 8.5, dosed.pH, dissolvedAlongPH("Pb", dosed, 25));
    const b = solubilityCurve(5.5, 8.5, plain.pH, dissolvedAlongPH("Pb", plain, 25));
    // docs/lead-and-copper.md (this project's worked example, a round trip, not an outside check): about 268 µg/L
    // as sampled and about 14 µg/L with 1 mg/L PO4 at Mill Lane
    expect(b.sample.value! / a.sample.value!).toBeGreaterThan(10);
    const chart = renderSolubilityChart({
      curve: a,
      sample: dosed,
      metalName: "lead",
      threshold: 10,
      width: 330,
      height: 205,
    });
    expect(chart.summary).toContain("At the sample's pH 7.02 (MLL-25-001");
    expect(chart.summary).toMatch(/above the 10 µg\/L threshold/);
  });
});

describe("the rendered chart", () => {
  const sample = paneSamples("Pb", PO4_1MG).find((s) => s.id === "MLL-25-001")!;
  const curve = solubilityCurve(5.5, 8.5, sample.pH, dissolvedAlongPH("Pb", sample, 25));
  const width = 330;
  const height = 205;
  const area = solubilityLayout(width, height);

  it("puts the threshold line at log10(threshold) on the decade axis and moves it with the value", () => {
    const yOf = (threshold: number) => {
      const svg = renderSolubilityChart({ curve, sample, metalName: "lead", threshold, width, height }).svg;
      return Number(/class="rc-sol-threshold" data-y="([\d.]+)"/.exec(svg)![1]);
    };
    for (const threshold of [5, 10, 15]) {
      const { low, high } = decadeRange(curve, threshold);
      const expected = area.top + ((high - Math.log10(threshold)) / (high - low)) * area.height;
      expect(Math.abs(yOf(threshold) - expected)).toBeLessThanOrEqual(0.01);
    }
    expect(yOf(5)).toBeGreaterThan(yOf(15)); // a lower threshold sits lower on the chart
  });

  it("keeps the axis to at most MAX_DECADES with the threshold and the sample inside, off the frame", () => {
    // lead at 0.81 V from pH 2 to 16 spans about 22 decades (plattnerite holds lead at 10⁻¹⁴ µg/L at pH 16)
    const wide = solubilityCurve(2, 16, sample.pH, dissolvedAlongPH("Pb", sample, 25));
    for (const threshold of [0.001, 10, 2000]) {
      const { low, high } = decadeRange(wide, threshold);
      expect(high - low).toBeLessThanOrEqual(MAX_DECADES);
      for (const v of [threshold, wide.sample.value!]) {
        expect(Math.log10(v)).toBeGreaterThan(low + 0.29);
        expect(Math.log10(v)).toBeLessThan(high - 0.29);
      }
    }
  });

  it("marks the sample with its value and its regime's marker, and is labelled for screen readers", () => {
    const { svg, summary } = renderSolubilityChart({ curve, sample, metalName: "lead", threshold: 10, width, height });
    expect(svg).toContain(`data-value="${curve.sample.value}"`);
    expect(svg).toMatch(/role="img" aria-labelledby="rc-sol-title rc-sol-desc"/);
    expect(svg).toContain(`<desc id="rc-sol-desc">`);
    expect(summary.length).toBeGreaterThan(40);
    expect(svg).toContain(`width="${width}"`);
  });
});

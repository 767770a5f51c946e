/**
 * The diagram layer's label plan (no two labels overlap, every box inside its region) and the boundary equations
 * of a drawn pure-water diagram checked against standard potentials.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { getDatabase } from "../../src/chemistry/database";
import { buildSystem } from "../../src/chemistry/system";
import { boundaryEquations, equationText } from "../../src/diagram/boundary-equations";
import { Pixel, roomAt } from "../../src/diagram/label-placement";
import { boxesOverlap, labelBox, planLabels } from "../../src/diagram/region-labels";
import { fitWindow, isClustered, zoomWindow } from "../../src/diagram/view-window";

describe("label plan", () => {
  it("random tilings of a strip: placed labels never overlap and each fits inside its own piece", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 4, max: 120, noNaN: true }), { minLength: 2, maxLength: 12 }),
        fc.array(fc.integer({ min: 10, max: 90 }), { minLength: 12, maxLength: 12 }),
        (widths, textWidths) => {
          let x = 0;
          const pieces = widths.map((w, i) => {
            const pixels: Pixel[] = [
              [x, 0],
              [x + w, 0],
              [x + w, 60],
              [x, 60],
            ];
            x += w;
            return { key: `S${i}`, pixels, width: (size: number) => (textWidths[i] * size) / 13 };
          });
          const plans = planLabels(pieces);
          expect(plans.length).toBe(pieces.length); // every piece is labelled, numbered or keyed
          const boxes = plans.flatMap((p) => {
            if (p.kind === "key-only") return [];
            const width = p.kind === "formula" ? pieces[p.piece].width(p.size) : String(p.number).length * p.size * 0.6;
            const box = labelBox(p.x, p.y, width, p.size);
            expect(roomAt(pieces[p.piece].pixels, box.width, box.height, p.x, p.y)).toBeGreaterThanOrEqual(-1e-6);
            return [box];
          });
          for (let i = 0; i < boxes.length; i++)
            for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i], boxes[j])).toBe(false);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("boundary equations of the pure-water diagram", () => {
  const db = getDatabase();

  it("copper at 25 °C, activity 10⁻⁶: Cu²⁺/Cu is flat at E° + (0.05916/2)·log 10⁻⁶", () => {
    const system = buildSystem(db, "Cu", { celsius: 25, activity: 1e-6 });
    const eq = boundaryEquations(system, { pHMin: -2, pHMax: 16, eMin: -2, eMax: 2 });
    const line = eq.find((e) => [e.first, e.second].sort().join("|") === ["Cu(s)", "Cu2+"].sort().join("|"));
    expect(line, eq.map((e) => `${e.first}/${e.second}`).join(", ")).toBeDefined();
    // E°(Cu²⁺/Cu) = 0.3419 V (Bard, Parsons & Jordan 1985, Standard Potentials in Aqueous Solution; CRC series)
    expect(line!.vertical).toBe(false);
    expect(line!.slope).toBeCloseTo(0, 6);
    expect(line!.intercept).toBeCloseTo(0.3419 + (0.059159 / 2) * -6, 2);
    expect(equationText(line!)).toMatch(/^E = 0\.1[56]\d*$/);
  });

  it("every drawn boundary is listed once, with slope −(h/n)·0.0592 V per pH at 25 °C or vertical", () => {
    const system = buildSystem(db, "Fe", { celsius: 25, activity: 1e-6 });
    const eq = boundaryEquations(system, { pHMin: -2, pHMax: 16, eMin: -2, eMax: 2 });
    expect(eq.length).toBeGreaterThan(4);
    const keys = eq.map((e) => [e.first, e.second].sort().join("|"));
    expect(new Set(keys).size).toBe(keys.length);
    // common practice: slopes are multiples of 0.05916/n for small n (h/n ∈ {0, ½, 1, 3/2, 2, 3, …})
    for (const e of eq.filter((x) => !x.vertical)) {
      const ratio = -e.slope / 0.059159;
      expect(Math.abs(ratio * 6 - Math.round(ratio * 6)), `${e.first}/${e.second} slope ${e.slope}`).toBeLessThan(0.02);
    }
  });
});

describe("views", () => {
  it("fits clustered samples with margins and minimum spans, and zooms about the centre", () => {
    const full = { pHMin: -2, pHMax: 16, eMin: -2, eMax: 2 };
    const fitted = fitWindow(
      [
        { pH: 7.0, E: 0.3 },
        { pH: 7.6, E: 0.5 },
      ],
      "V",
    )!;
    expect(fitted.pHMin).toBeLessThanOrEqual(6.3);
    expect(fitted.pHMax).toBeGreaterThanOrEqual(8.3);
    expect(fitted.eMax - fitted.eMin).toBeGreaterThanOrEqual(0.4);
    expect(isClustered(fitted, full)).toBe(true);
    expect(
      isClustered(
        fitWindow(
          [
            { pH: -1, E: -1.8 },
            { pH: 15, E: 1.8 },
          ],
          "V",
        )!,
        full,
      ),
    ).toBe(false);
    const z = zoomWindow(full, 0.5);
    expect([z.pHMin, z.pHMax, z.eMin, z.eMax]).toEqual([2.5, 11.5, -1, 1]);
  });
});

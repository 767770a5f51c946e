/**
 * The canvas layer's pure parts: marker pixels from the same axes as the SVG, the nearest-marker lookup used for
 * hover and click, and the keyboard order (pH, then E).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { makeAxes } from "../../src/diagram/axes";
import type { PlottedSample } from "../../src/diagram/diagram-model";
import { axesOfSvg, keyboardOrder, markerPixels, nearestMarker } from "../../src/taskpane/sample-canvas";

const axes = makeAxes({ pHMin: 0, pHMax: 14, eMin: -1, eMax: 1 }, { left: 60, top: 40, width: 700, height: 500 });

function sample(pH: number, E: number, row = 2): PlottedSample {
  return { row, id: "", pH, E, eSHE: E, formula: "Fe2+", regime: "corrosion", waterMargin: 0 };
}

describe("canvas markers", () => {
  it("places markers where the SVG circles go and skips those outside the window", () => {
    const samples = [sample(7, 0), sample(-1, 0), sample(14, 1), sample(3, 1.2)];
    const p = markerPixels(samples, axes);
    expect([...p.index]).toEqual([0, 2]);
    expect([p.x[0], p.y[0]]).toEqual([axes.x(7), axes.y(0)]);
    expect([p.x[1], p.y[1]]).toEqual([60 + 700, 40]);
  });

  it("reads the axes back from an SVG's data attributes", () => {
    const attributes: Record<string, string> = {
      "data-ph-min": "0",
      "data-ph-max": "14",
      "data-e-min": "-1",
      "data-e-max": "1",
      "data-plot-left": "60",
      "data-plot-top": "40",
      "data-plot-width": "700",
      "data-plot-height": "500",
    };
    const fake = { getAttribute: (name: string) => attributes[name] ?? null } as unknown as Element;
    const back = axesOfSvg(fake);
    expect([back.x(3.3), back.y(0.42)]).toEqual([axes.x(3.3), axes.y(0.42)]);
  });

  it("finds the nearest marker within the pick distance (brute force agrees)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: 0, max: 14, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })), {
          minLength: 1,
          maxLength: 60,
        }),
        fc.double({ min: 50, max: 770, noNaN: true }),
        fc.double({ min: 30, max: 550, noNaN: true }),
        (points, px, py) => {
          const p = markerPixels(
            points.map(([pH, E]) => sample(pH, E)),
            axes,
          );
          const k = nearestMarker(p, px, py, 6);
          const distances = Array.from(p.x, (x, i) => Math.hypot(x - px, p.y[i] - py));
          const best = Math.min(...distances);
          if (best > 6) expect(k).toBe(-1);
          else expect(distances[k]).toBeCloseTo(best, 9);
        },
      ),
    );
  });

  it("steps through samples in pH order, then by potential", () => {
    const samples = [sample(9, 0), sample(4, 0.5), sample(4, -0.2), sample(6, 0)];
    const p = markerPixels(samples, axes);
    expect([...keyboardOrder(samples, p)].map((k) => p.index[k])).toEqual([2, 1, 3, 0]);
  });
});

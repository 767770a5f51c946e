import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { placeLabel, roomAt, Pixel } from "../../src/diagram/label-placement";
import { getDatabase } from "../../src/chemistry/database";
import { buildSystem } from "../../src/chemistry/system";
import { makeAxes } from "../../src/diagram/axes";
import { displayScale, defaultWindow, shownRegions } from "../../src/diagram/diagram-model";
import { formulaSegments, segmentsText } from "../../src/diagram/formula-markup";

/** Whether every corner of the box centred at (x, y) lies inside the convex polygon (either orientation). */
function boxInside(polygon: readonly Pixel[], x: number, y: number, w: number, h: number): boolean {
  const corners: Pixel[] = [
    [x - w / 2, y - h / 2],
    [x + w / 2, y - h / 2],
    [x + w / 2, y + h / 2],
    [x - w / 2, y + h / 2],
  ];
  let sign = 0;
  for (let i = 0; i < polygon.length; i++) {
    const p = polygon[i];
    const q = polygon[(i + 1) % polygon.length];
    for (const c of corners) {
      const cross = (q[0] - p[0]) * (c[1] - p[1]) - (q[1] - p[1]) * (c[0] - p[0]);
      if (Math.abs(cross) < 1e-6) continue;
      if (sign === 0) sign = Math.sign(cross);
      else if (Math.sign(cross) !== sign) return false;
    }
  }
  return true;
}

describe("label placement", () => {
  it("centres a box in a rectangle", () => {
    const rect: Pixel[] = [
      [0, 0],
      [200, 0],
      [200, 100],
      [0, 100],
    ];
    const p = placeLabel(rect, 40, 10);
    expect(p.x).toBeCloseTo(100, 0);
    expect(p.y).toBeCloseTo(50, 0);
    expect(p.room).toBeCloseTo(45, 0); // vertical margin (100 − 10)/2
    expect(p.fits).toBe(true);
  });

  it("finds the room in the wide part of a wedge, not at its centroid", () => {
    // triangle with its wide end on the right: the centroid (x = 133) is tighter than further right
    const wedge: Pixel[] = [
      [0, 50],
      [300, 0],
      [300, 100],
    ];
    const p = placeLabel(wedge, 60, 14);
    expect(p.fits).toBe(true);
    expect(p.x).toBeGreaterThan(200);
    expect(boxInside(wedge, p.x, p.y, 60, 14)).toBe(true);
  });

  it("reports when the text cannot fit", () => {
    const sliver: Pixel[] = [
      [0, 0],
      [100, 0],
      [100, 4],
      [0, 4],
    ];
    expect(placeLabel(sliver, 40, 12).fits).toBe(false);
  });

  it("random convex polygons: a fitting label's box lies inside, and no grid point has more room", () => {
    const polygonArb = fc
      .array(fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), { minLength: 3, maxLength: 9 })
      .chain((angles) =>
        fc.tuple(
          fc.constant([...angles].sort((a, b) => a - b)),
          fc.double({ min: 30, max: 200, noNaN: true }),
          fc.double({ min: 0.3, max: 1, noNaN: true }),
        ),
      );
    fc.assert(
      fc.property(polygonArb, ([angles, radius, squash]) => {
        const unique = angles.filter((a, i) => i === 0 || a - angles[i - 1] > 1e-3);
        if (unique.length < 3) return;
        const polygon: Pixel[] = unique.map((a) => [300 + radius * Math.cos(a), 300 + squash * radius * Math.sin(a)]);
        const p = placeLabel(polygon, 30, 12);
        if (p.fits) expect(boxInside(polygon, p.x, p.y, 30, 12)).toBe(true);
        for (let i = 0; i <= 20; i++)
          for (let j = 0; j <= 20; j++)
            expect(
              roomAt(polygon, 30, 12, 300 - radius + (i * radius) / 10, 300 - radius + (j * radius) / 10),
            ).toBeLessThanOrEqual(p.room + 0.5);
      }),
      { numRuns: 60 },
    );
  });

  it("every region of real diagrams gets a centre inside its polygon", () => {
    const db = getDatabase();
    for (const metal of ["Fe", "Cu", "Zn", "Pb", "Cr", "Mn"]) {
      const system = buildSystem(db, metal, { celsius: 25, activity: 1e-6 });
      const scale = displayScale("SHE", "V", 25);
      const window = defaultWindow(scale);
      const axes = makeAxes(window, { left: 60, top: 40, width: 600, height: 420 });
      for (const r of shownRegions(system, window, scale)) {
        const pixels: Pixel[] = r.vertices.map(([pH, e]) => [axes.x(pH), axes.y(e)]);
        const p = placeLabel(pixels, 0, 0);
        expect(p.room, `${metal} ${r.formula}`).toBeGreaterThanOrEqual(0);
        expect(boxInside(pixels, p.x, p.y, 0, 0), `${metal} ${r.formula}`).toBe(true);
      }
    }
  });
});

describe("formula typesetting", () => {
  it("subscripts counts and superscripts the charge from the record", () => {
    expect(formulaSegments("Fe2O3(s)", 0)).toEqual([
      { text: "Fe", kind: "normal" },
      { text: "2", kind: "sub" },
      { text: "O", kind: "normal" },
      { text: "3", kind: "sub" },
      { text: "(s)", kind: "normal" },
    ]);
    expect(formulaSegments("Cu2+", 2)).toEqual([
      { text: "Cu", kind: "normal" },
      { text: "2+", kind: "sup" },
    ]);
    expect(formulaSegments("HPbO2-", -1).map((s) => s.kind)).toEqual(["normal", "sub", "sup"]);
    expect(segmentsText(formulaSegments("Fe(OH)4-", -1))).toBe("Fe(OH)4\u2212");
    expect(segmentsText(formulaSegments("Cr2O72-", -2))).toBe("Cr2O72\u2212");
    expect(formulaSegments("Cr2O72-", -2).at(-1)).toEqual({ text: "2\u2212", kind: "sup" });
  });
});

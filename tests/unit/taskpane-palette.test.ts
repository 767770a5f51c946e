import { describe, expect, it } from "vitest";
import {
  contrastRatio,
  LABEL_TEXT,
  AXIS_TEXT,
  MARKER_FILLS,
  MARKER_OUTLINE,
  REGION_FILLS,
  relativeLuminance,
} from "../../src/diagram/palette";

// WCAG 2.1 (W3C Recommendation, 2018): contrast ratio (L1 + 0.05)/(L2 + 0.05); success criterion 1.4.3 asks 4.5:1
// for normal text, 1.4.11 asks 3:1 for graphical objects.
describe("palette contrast", () => {
  it("reproduces the WCAG definition on its end points", () => {
    expect(relativeLuminance("#ffffff")).toBeCloseTo(1, 12);
    expect(relativeLuminance("#000000")).toBe(0);
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 9); // WCAG 2.1: ratios range from 1 to 21
    expect(contrastRatio("#777777", "#ffffff")).toBeCloseTo(4.48, 2); // #777 on white just misses 4.5 (common practice)
  });

  for (const [regime, fills] of Object.entries(REGION_FILLS)) {
    it(`label text on every ${regime} fill reaches 4.5:1`, () => {
      for (const fill of fills) expect(contrastRatio(LABEL_TEXT, fill), fill).toBeGreaterThanOrEqual(4.5);
    });
  }

  it("axis text on white reaches 4.5:1; marker outlines stand out 3:1 from every fill", () => {
    expect(contrastRatio(AXIS_TEXT, "#ffffff")).toBeGreaterThanOrEqual(4.5);
    for (const fills of Object.values(REGION_FILLS))
      for (const fill of fills) expect(contrastRatio(MARKER_OUTLINE, fill)).toBeGreaterThanOrEqual(3);
  });

  it("the three regime families differ in lightness, not only in hue (colour-blind safety)", () => {
    const l = (hex: string) => relativeLuminance(hex);
    const markers = Object.values(MARKER_FILLS)
      .map(l)
      .sort((a, b) => a - b);
    // marker fills apart by at least 0.03 in relative luminance, so they differ in greyscale too
    for (let i = 1; i < markers.length; i++) expect(markers[i] - markers[i - 1]).toBeGreaterThan(0.03);
    for (const fill of Object.values(MARKER_FILLS)) expect(contrastRatio(fill, "#ffffff")).toBeGreaterThanOrEqual(3);
  });
});

/**
 * Diagram colours, by regime (docs/method.md): cool neutrals for immunity, greens and teals for passivation, warm
 * ochres to brick for corrosion, several lightness steps per regime so neighbouring species differ. The three
 * families differ in lightness and blue–yellow balance, which stays distinct under the common red–green colour
 * deficiencies; every region also carries a pattern of its regime and its formula, so colour is never the only cue.
 *
 * Contrast: label text is drawn in LABEL_TEXT on every fill; tests/unit/taskpane-palette.test.ts checks the WCAG 2.x
 * contrast ratio (W3C, Web Content Accessibility Guidelines 2.1, 2018, §1.4.3 and the relative-luminance
 * definition) is at least 4.5:1 on every fill.
 */
import { type Regime } from "../chemistry";

export const LABEL_TEXT = "#1b2329";
export const AXIS_TEXT = "#28343b";
export const WATER_LINE = "#2f5f8a";
export const WATER_BAND = "#5b8fc0";
/** The solubility chart: the dissolved-metal curve, the threshold line and the bands where no solid can form. */
export const CURVE_INK = "#1d4e89";
export const THRESHOLD_INK = "#9a3412";
export const GAP_FILL = "#e6e9ec";

export const REGION_FILLS: Record<Regime, readonly string[]> = {
  immunity: ["#dde2e8", "#cfd6de", "#e8ebef"],
  passivation: ["#cfe6d4", "#b8dccb", "#a6d2c4", "#c4e3dc", "#d9ecd2", "#b0d6d6"],
  corrosion: ["#f5e0b0", "#efcf9c", "#f2c9a6", "#e9b894", "#f7e6c7", "#e6c0a8", "#efd7b8"],
};

/** Strong fills of sample markers by regime (outlined in MARKER_OUTLINE). */
export const MARKER_FILLS: Record<Regime, string> = {
  immunity: "#7b8ca0",
  passivation: "#1f7a66",
  corrosion: "#8f3520",
};
export const MARKER_OUTLINE = "#11181c";

/** Pattern strokes drawn over region fills: immunity plain dots-free, passivation hatching, corrosion dots. */
export const PATTERN_INK: Record<Regime, string> = {
  immunity: "#8795a5",
  passivation: "#5f9c86",
  corrosion: "#b9835a",
};

export const REGIME_WORDS: Record<Regime, string> = {
  immunity: "immunity (metal stable)",
  passivation: "passivation (solid film)",
  corrosion: "corrosion (dissolved)",
};

/** Fill of the k-th region of a regime (cycles through the regime's shades). */
export function regionFill(regime: Regime, k: number): string {
  const shades = REGION_FILLS[regime];
  return shades[((k % shades.length) + shades.length) % shades.length];
}

/** sRGB channel (0–255) → linear light (WCAG 2.1 relative luminance definition). */
function linearChannel(value: number): number {
  const c = value / 255;
  return c <= 0.03928 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
}

/** Relative luminance of a "#rrggbb" colour. */
export function relativeLuminance(hex: string): number {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`);
  const [r, g, b] = [m[1], m[2], m[3]].map((h) => linearChannel(parseInt(h, 16)));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** WCAG contrast ratio (L1 + 0.05) / (L2 + 0.05), lighter over darker: 1…21. */
export function contrastRatio(a: string, b: string): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

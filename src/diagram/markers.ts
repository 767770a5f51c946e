/**
 * The sample marker, one specification for the SVG layer (diagram-svg.ts) and the canvas layer of large sets:
 * shape and fill both say the regime, so the markers read without colour — a square for immunity, a circle for
 * passivation, a triangle pointing up for corrosion — each outlined in MARKER_OUTLINE.
 */
import { type Regime } from "../chemistry";
import { twoDecimals } from "./fixed-text";
import { MARKER_FILLS, MARKER_OUTLINE } from "./palette";

export { MARKER_FILLS, MARKER_OUTLINE };

/** Marker size: the radius of the circle, px; the square and triangle are drawn to the same visual weight. */
export const MARKER_RADIUS = 4.5;

export type MarkerShape = "square" | "circle" | "triangle";

export const MARKER_SHAPES: Readonly<Record<Regime, MarkerShape>> = {
  immunity: "square",
  passivation: "circle",
  corrosion: "triangle",
};

/** The few drawing calls a marker needs: an SVG path builder and a canvas 2-D context both provide them. */
export interface PathSink {
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  arc(x: number, y: number, r: number, start: number, end: number): void;
  closePath(): void;
}

/** Traces the marker of `regime` centred at (x, y) into `sink`. */
export function traceMarker(sink: PathSink, regime: Regime, x: number, y: number, r = MARKER_RADIUS): void {
  const shape = MARKER_SHAPES[regime];
  if (shape === "circle") {
    sink.moveTo(x + r, y);
    sink.arc(x, y, r, 0, 2 * Math.PI);
    return;
  }
  if (shape === "square") {
    const h = r * 0.88; // same area as the circle: (2h)² ≈ π r²
    sink.moveTo(x - h, y - h);
    sink.lineTo(x + h, y - h);
    sink.lineTo(x + h, y + h);
    sink.lineTo(x - h, y + h);
  } else {
    const h = r * 1.35; // equilateral triangle of about the circle's area, centred on its centroid
    sink.moveTo(x, y - h);
    sink.lineTo(x + h * 0.866, y + h * 0.5);
    sink.lineTo(x - h * 0.866, y + h * 0.5);
  }
  sink.closePath();
}

/** The SVG path builder markerPath traces into (one for every marker: no closures made per marker). */
const svgPath = {
  d: "",
  moveTo(a: number, b: number): void {
    this.d += `M${twoDecimals(a)} ${twoDecimals(b)}`;
  },
  lineTo(a: number, b: number): void {
    this.d += `L${twoDecimals(a)} ${twoDecimals(b)}`;
  },
  // a full circle as two half arcs
  arc(cx: number, cy: number, radius: number): void {
    const r = twoDecimals(radius);
    const y = twoDecimals(cy);
    this.d += `A${r} ${r} 0 1 0 ${twoDecimals(cx - radius)} ${y}A${r} ${r} 0 1 0 ${twoDecimals(cx + radius)} ${y}`;
  },
  closePath(): void {
    this.d += "Z";
  },
};

/** SVG path data of a marker. */
export function markerPath(regime: Regime, x: number, y: number, r = MARKER_RADIUS): string {
  svgPath.d = "";
  traceMarker(svgPath, regime, x, y, r);
  return svgPath.d;
}

/** The legend's marker of a regime as a small standalone SVG (for HTML legends and tables). */
export function markerSvg(regime: Regime, size = 14): string {
  const c = size / 2;
  return `<svg width="${size}" height="${size}" viewBox="0 0 ${size} ${size}" aria-hidden="true"><path d="${markerPath(regime, c, c, size * 0.32)}" fill="${MARKER_FILLS[regime]}" stroke="${MARKER_OUTLINE}"/></svg>`;
}

/**
 * The solubility chart as SVG text: equilibrium dissolved metal (µg/L, log scale) against pH at one sample's
 * potential and water (solubility-curve.ts), with a dashed horizontal line at a typed threshold, the sample's own
 * point marked by its regime's marker, and light bands where no solid can form (gaps in the curve, not values).
 *
 * Pure string building, sharing the diagram's axis transform and ticks (axes.ts), marker (markers.ts), palette and
 * escaping; the words (title, description) come from solubility-words.ts.
 */
import { Axes, formatTick, makeAxes, niceTicks, PlotArea } from "./axes";
import type { PlottedSample } from "./diagram-model";
import { escapeXml, formatActivity } from "./diagram-svg";
import { markerPath } from "./markers";
import { AXIS_TEXT, CURVE_INK, GAP_FILL, MARKER_FILLS, MARKER_OUTLINE, THRESHOLD_INK } from "./palette";
import { curveGaps, curvePieces, type SolubilityCurve } from "./solubility-curve";
import { formatMicrograms, solubilitySummary } from "./solubility-words";

export interface SolubilityChartOptions {
  readonly curve: SolubilityCurve;
  /** The sample the curve is computed for (its potential, temperature, water, regime). */
  readonly sample: PlottedSample;
  /** The metal's English name ("lead"). */
  readonly metalName: string;
  /** Threshold, µg/L; null: no line. */
  readonly threshold: number | null;
  readonly width: number;
  readonly height: number;
}

export interface RenderedSolubilityChart {
  readonly svg: string;
  /** The chart in words (also the SVG's description). */
  readonly summary: string;
}

/** Bands around the plot: y tick labels on the left, x ticks and the axis title below. */
const BANDS = { top: 8, left: 50, right: 10, bottom: 40 } as const;
/** At most this many decades on the y axis; the curve runs off the frame beyond them. */
export const MAX_DECADES = 10;

export function solubilityLayout(width: number, height: number): PlotArea {
  return {
    left: BANDS.left,
    top: BANDS.top,
    width: Math.max(60, width - BANDS.left - BANDS.right),
    height: Math.max(60, height - BANDS.top - BANDS.bottom),
  };
}

/** The y range in decades (log10 µg/L): the curve's values, the threshold and the sample's value, ≤ MAX_DECADES. */
export function decadeRange(curve: SolubilityCurve, threshold: number | null): { low: number; high: number } {
  const logs = curve.points.flatMap((p) => (p.value !== null && p.value > 0 ? [Math.log10(p.value)] : []));
  const anchors = [threshold, curve.sample.value].flatMap((v) => (v !== null && v > 0 ? [Math.log10(v)] : []));
  const all = [...logs, ...anchors];
  if (all.length === 0) return { low: -1, high: 3 };
  // a threshold or sample on the frame would hide in it: at least a third of a decade between values and edges
  let low = Math.floor(Math.min(...all) - 0.3);
  let high = Math.ceil(Math.max(...all) + 0.3);
  if (high - low > MAX_DECADES) {
    // keep the threshold and the sample in view, the spare decades shared above and below them
    const keep = anchors.length > 0 ? anchors : [Math.max(...logs)];
    const top = Math.ceil(Math.max(...keep) + 0.3);
    const spare = MAX_DECADES - (top - Math.floor(Math.min(...keep) - 0.3));
    high = Math.min(high, top + Math.max(0, Math.ceil(spare / 2)));
    low = Math.max(low, high - MAX_DECADES);
  }
  if (high - low < 2) return { low: low - 1, high: high + 1 };
  return { low, high };
}

/** Text of a decade tick: plain numbers from 0.01 to 1000, powers of ten beyond. */
export function decadeText(k: number): string {
  return k >= -2 && k <= 3 ? formatTick(10 ** k) : formatActivity(10 ** k);
}

function axesSvg(axes: Axes, low: number, high: number): string {
  const a = axes.area;
  const out = [`<g class="rc-sol-axes" fill="${AXIS_TEXT}" font-size="11">`];
  out.push(
    `<rect x="${a.left}" y="${a.top}" width="${a.width}" height="${a.height}" fill="none" stroke="${AXIS_TEXT}"/>`,
  );
  for (const t of niceTicks(axes.window.pHMin, axes.window.pHMax, Math.max(3, Math.round(a.width / 55)))) {
    const x = axes.x(t).toFixed(2);
    out.push(
      `<path d="M${x} ${a.top + a.height}v4" stroke="${AXIS_TEXT}"/><text class="rc-sol-tick" x="${x}" y="${a.top + a.height + 18}" text-anchor="middle">${formatTick(t)}</text>`,
    );
  }
  const step = Math.max(1, Math.ceil((high - low) / Math.max(1, Math.floor(a.height / 26))));
  for (let k = high; k >= low; k -= step) {
    const y = axes.y(k);
    out.push(
      `<path d="M${a.left} ${y.toFixed(2)}h-4" stroke="${AXIS_TEXT}"/><path d="M${a.left} ${y.toFixed(2)}h${a.width}" stroke="${AXIS_TEXT}" stroke-opacity="0.12"/>` +
        `<text class="rc-sol-tick" x="${a.left - 6}" y="${(y + 3.5).toFixed(2)}" text-anchor="end">${decadeText(k)}</text>`,
    );
  }
  out.push(
    `<text class="rc-sol-axis-title" x="${a.left + a.width / 2}" y="${a.top + a.height + 35}" text-anchor="middle" font-size="12">pH</text>`,
    `<text class="rc-sol-axis-title" transform="translate(12 ${a.top + a.height / 2}) rotate(-90)" text-anchor="middle" font-size="12">µg/L</text>`,
    `</g>`,
  );
  return out.join("\n");
}

/** y of a value, held a little outside the frame when off the axis (the clip path cuts the line there). */
function yOf(axes: Axes, value: number): number {
  const { eMin, eMax } = axes.window;
  const log = value > 0 ? Math.log10(value) : eMin - 1;
  return axes.y(Math.max(eMin - 1, Math.min(eMax + 1, log)));
}

function curveSvg(axes: Axes, curve: SolubilityCurve): string {
  const a = axes.area;
  const out = [`<g class="rc-sol-curve" clip-path="url(#rc-sol-plot)">`];
  for (const gap of curveGaps(curve)) {
    const x0 = axes.x(gap.from);
    const x1 = axes.x(gap.to);
    out.push(
      `<rect class="rc-sol-gap" x="${x0.toFixed(2)}" y="${a.top}" width="${Math.max(1, x1 - x0).toFixed(2)}" height="${a.height}" fill="${GAP_FILL}" data-from="${gap.from}" data-to="${gap.to}"><title>no solid can form: no number</title></rect>`,
    );
  }
  for (const piece of curvePieces(curve)) {
    const d = piece.map((p, i) => `${i === 0 ? "M" : "L"}${axes.x(p.pH).toFixed(2)} ${yOf(axes, p.value!).toFixed(2)}`);
    if (piece.length === 1) d.push("h0.01"); // a lone point still shows (round cap)
    out.push(
      `<path class="rc-sol-line" d="${d.join("")}" fill="none" stroke="${CURVE_INK}" stroke-width="2" stroke-linecap="round" stroke-linejoin="round"/>`,
    );
  }
  out.push(`</g>`);
  return out.join("\n");
}

/** The threshold's dashed line and its label, above the line (below it when the line is near the top). */
function thresholdSvg(axes: Axes, threshold: number): string {
  const a = axes.area;
  const y = axes.y(Math.log10(threshold));
  const labelY = y - a.top < 16 ? y + 13 : y - 4;
  return (
    `<g class="rc-sol-threshold" data-y="${y.toFixed(2)}" data-value="${threshold}">` +
    `<path d="M${a.left} ${y.toFixed(2)}h${a.width}" stroke="${THRESHOLD_INK}" stroke-width="1.5" stroke-dasharray="6 3"/>` +
    `<text class="rc-sol-threshold-label" x="${a.left + a.width - 4}" y="${labelY.toFixed(2)}" text-anchor="end" font-size="11" fill="${THRESHOLD_INK}" paint-order="stroke" stroke="#ffffff" stroke-width="3" stroke-linejoin="round">threshold ${escapeXml(formatMicrograms(threshold))}</text></g>`
  );
}

function sampleSvg(axes: Axes, o: SolubilityChartOptions): string {
  const p = o.curve.sample;
  if (!p.inRange || p.value === null) return "";
  const { eMin, eMax } = axes.window;
  const log = p.value > 0 ? Math.log10(p.value) : -Infinity;
  if (!(log >= eMin && log <= eMax)) return "";
  const x = axes.x(p.pH);
  const y = axes.y(log);
  const name = o.sample.id || `row ${o.sample.row}`;
  return `<path class="rc-sol-sample" d="${markerPath(o.sample.regime, x, y, 5)}" fill="${MARKER_FILLS[o.sample.regime]}" stroke="${MARKER_OUTLINE}" data-ph="${p.pH}" data-value="${p.value}"${o.sample.equilibrium !== undefined ? ` data-row-value="${o.sample.equilibrium}"` : ""}><title>${escapeXml(`${name}: pH ${p.pH}, ${formatMicrograms(p.value)}`)}</title></path>`;
}

/** The whole chart and its summary. */
export function renderSolubilityChart(o: SolubilityChartOptions): RenderedSolubilityChart {
  const area = solubilityLayout(o.width, o.height);
  const { low, high } = decadeRange(o.curve, o.threshold);
  const axes = makeAxes({ pHMin: o.curve.pHMin, pHMax: o.curve.pHMax, eMin: low, eMax: high }, area);
  const summary = solubilitySummary(o.curve, o.sample, o.metalName, o.threshold);
  const title = `Equilibrium dissolved ${o.metalName} against pH`;
  const out = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${o.width}" height="${o.height}" viewBox="0 0 ${o.width} ${o.height}" role="img" aria-labelledby="rc-sol-title rc-sol-desc" class="rc-solubility"` +
      ` data-plot-left="${area.left}" data-plot-top="${area.top}" data-plot-width="${area.width}" data-plot-height="${area.height}" data-log-min="${low}" data-log-max="${high}"` +
      ` font-family="'Segoe UI', system-ui, -apple-system, sans-serif">`,
    `<title id="rc-sol-title">${escapeXml(title)}</title>`,
    `<desc id="rc-sol-desc">${escapeXml(summary)}</desc>`,
    `<defs><clipPath id="rc-sol-plot"><rect x="${area.left}" y="${area.top}" width="${area.width}" height="${area.height}"/></clipPath></defs>`,
    `<rect width="${o.width}" height="${o.height}" fill="#ffffff"/>`,
    curveSvg(axes, o.curve),
    axesSvg(axes, low, high),
    o.threshold !== null && o.threshold >= 10 ** low && o.threshold <= 10 ** high
      ? thresholdSvg(axes, o.threshold)
      : "",
    sampleSvg(axes, o),
    `</svg>`,
  ];
  return { svg: out.filter((part) => part !== "").join("\n"), summary };
}

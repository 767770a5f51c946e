/**
 * The potential–pH diagram as SVG text: regions coloured and patterned by regime and labelled in place, the water
 * window band between dashed lines, an optional fainter kinetic band (water decomposes only about 0.6 V beyond its
 * lines in practice — common practice), the samples as outlined circles, axes, legend and caption.
 *
 * Pure string building — no document, no window — so the command line and the tests can use it as the pane does.
 */
import { REGIMES, type MetalSystem, type Regime } from "../chemistry";
import { Axes, AxisWindow, formatTick, makeAxes, niceTicks, PlotArea } from "./axes";
import type { PlottedSample, ShownLine, ShownRegion } from "./diagram-model";
import { formulaSegments, Segment } from "./formula-markup";
import { formatTotals } from "./water-words";
import { fixedText, twoDecimals } from "./fixed-text";
import { markerPath } from "./markers";
import { LabelPlan, planLabels } from "./region-labels";
import {
  AXIS_TEXT,
  LABEL_TEXT,
  MARKER_FILLS,
  MARKER_OUTLINE,
  PATTERN_INK,
  REGIME_WORDS,
  regionFill,
  WATER_BAND,
  WATER_LINE,
} from "./palette";

export interface DiagramSvgOptions {
  readonly system: MetalSystem;
  readonly window: AxisWindow;
  readonly regions: readonly ShownRegion[];
  readonly samples: readonly PlottedSample[];
  /** Water lines in shown coordinates (diagram-model.ts shownWaterLines). */
  readonly water: { readonly oxygen: ShownLine; readonly hydrogen: ShownLine };
  /** "E / V vs SHE". */
  readonly axisTitle: string;
  /** Unit of the shown potential: sets the kinetic band's width and the number format. */
  readonly unit: "V" | "mV";
  readonly width: number;
  readonly height: number;
  /** Heading; default "<element>–water". */
  readonly title?: string;
  /** Lines printed under the legend (sources, data origin). */
  readonly caption?: readonly string[];
  readonly showKineticBand?: boolean;
  /**
   * Write each sample's hover text as its <title> (default true). Large sets may leave it out: the pane then shows
   * the same text (sampleText) on hover and focus from data-i, and the browser parses half as many nodes.
   */
  readonly sampleTitles?: boolean;
  /**
   * Leave the sample circles out (default false): the pane draws large sets on a canvas laid over the SVG
   * (sample-canvas.ts) and keeps the circles for exports.
   */
  readonly omitSamples?: boolean;
  /** Overpotential of the kinetic band, V (default 0.6). */
  readonly kineticOverpotential?: number;
  /**
   * Title, subtitle, legend and caption inside the SVG (default true: exports and the command line). The pane
   * shows them as HTML under the drawing instead, so the plot keeps its height in a narrow pane.
   */
  readonly chrome?: boolean;
  /** Fill of a sample's marker (default: by regime); the shape always says the regime. */
  readonly sampleFill?: (sample: PlottedSample) => string;
}

export const KINETIC_OVERPOTENTIAL = 0.6;
const TITLE_BAND = 46;
const LEFT_BAND = 64;
const RIGHT_BAND = 14;
const CAPTION_LINE = 14;
/** Bands of a drawing without title, legend and caption (the pane's screen drawing): ticks and axis titles only. */
const BARE = { top: 10, left: 54, right: 12, bottom: 44 } as const;

/**
 * The plot rectangle inside an SVG of the given size (also used by tests to place markers). `captionLines` < 0
 * means a drawing without title, legend and caption.
 */
export function diagramLayout(width: number, height: number, captionLines = 0): PlotArea {
  if (captionLines < 0)
    return {
      left: BARE.left,
      top: BARE.top,
      width: Math.max(40, width - BARE.left - BARE.right),
      height: Math.max(40, height - BARE.top - BARE.bottom),
    };
  const bottom = 22 + 20 + 26 + captionLines * CAPTION_LINE + 6;
  return {
    left: LEFT_BAND,
    top: TITLE_BAND,
    width: Math.max(40, width - LEFT_BAND - RIGHT_BAND),
    height: Math.max(40, height - TITLE_BAND - bottom),
  };
}

export function escapeXml(text: string): string {
  if (!/[&<>"']/.test(text)) return text; // most texts (every sample's title) have nothing to escape
  return text
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&apos;");
}

/** v to `digits` decimals without trailing zeros, as Number(v.toFixed(digits)).toString() writes it. */
const fixed = (v: number, digits = 2) => (digits === 2 ? twoDecimals(v) : Number(fixedText(v, digits)).toString());

/** Width (px) of a typeset formula at a font size — a fixed-advance estimate for sans-serif text. */
export function formulaWidth(segments: readonly Segment[], size: number): number {
  let w = 0;
  for (const s of segments)
    for (const ch of s.text)
      w += (s.kind === "normal" ? size : size * 0.72) * (/[A-Z(]|[\u2212+]/.test(ch) ? 0.66 : ch === ")" ? 0.36 : 0.56);
  return w;
}

function segmentsSvg(segments: readonly Segment[]): string {
  return segments
    .map((s) =>
      s.kind === "normal"
        ? `<tspan>${escapeXml(s.text)}</tspan>`
        : `<tspan font-size="72%" dy="${s.kind === "sub" ? "0.3em" : "-0.45em"}">${escapeXml(s.text)}</tspan><tspan dy="${s.kind === "sub" ? "-0.3em" : "0.45em"}"></tspan>`,
    )
    .join("");
}

/** "10⁻⁶" for powers of ten, otherwise "2.5 × 10⁻⁵". */
export function formatActivity(a: number): string {
  const sup = (text: string) =>
    text
      .replace(/-/g, "\u207b")
      .replace(/[0-9]/g, (d) => "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079"[Number(d)]);
  const exponent = Math.floor(Math.log10(a) + 1e-9);
  const mantissa = a / 10 ** exponent;
  if (Math.abs(mantissa - 1) < 1e-9) return exponent === 0 ? "1" : `10${sup(String(exponent))}`;
  return `${Number(mantissa.toPrecision(3))} \u00d7 10${sup(String(exponent))}`;
}

/** Hover and focus text of a sample: the reading as logged, E vs SHE, the row's own temperature and water, its answer. */
export function sampleText(s: PlottedSample, unit: "V" | "mV"): string {
  const shown = unit === "mV" ? `${Math.round(s.E)} mV` : `${fixedText(s.E, 3)} V`;
  const reading = s.reading ? `reading ${s.reading} = ${fixedText(s.eSHE, 3)} V vs SHE` : `E ${shown}`;
  const margin = `${s.waterMargin >= 0 ? "+" : "\u2212"}${fixedText(Math.abs(s.waterMargin), 2)} V ${s.waterMargin >= 0 ? "inside" : "outside"} the water window`;
  const who = s.id ? `${s.id} (row ${s.row})` : `row ${s.row}`;
  const at = s.celsius === undefined ? "" : ` at ${Number(fixedText(s.celsius, 1))} \u00b0C`;
  const water = s.ligands ? formatTotals(s.ligands) : "";
  const ionic = s.ionicStrength ? `, I ${Number(s.ionicStrength.toPrecision(3))} mol/kg` : "";
  return `${who}: pH ${fixedText(s.pH, 2)}, ${reading}${at}${water ? `, water ${water}` : ""}${ionic}; ${s.formula}, ${s.regime}; water margin ${margin}`;
}

function patternDefs(): string {
  return [
    `<pattern id="rc-pat-passivation" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(45)"><line x1="0" y1="0" x2="0" y2="8" stroke="${PATTERN_INK.passivation}" stroke-width="1.2" stroke-opacity="0.55"/></pattern>`,
    `<pattern id="rc-pat-corrosion" patternUnits="userSpaceOnUse" width="9" height="9"><circle cx="4.5" cy="4.5" r="1.3" fill="${PATTERN_INK.corrosion}" fill-opacity="0.6"/></pattern>`,
    `<pattern id="rc-pat-immunity" patternUnits="userSpaceOnUse" width="10" height="10"><path d="M0 5H10" stroke="${PATTERN_INK.immunity}" stroke-width="0.6" stroke-opacity="0.35"/></pattern>`,
  ].join("");
}

function polygonPath(points: readonly (readonly [number, number])[]): string {
  return points.map((p, i) => `${i === 0 ? "M" : "L"}${fixed(p[0])} ${fixed(p[1])}`).join("") + "Z";
}

/** Band between two lines E = a + b·pH (lower and upper) across the window, in pixels. */
function bandPath(axes: Axes, w: AxisWindow, lower: ShownLine, upper: ShownLine): string {
  const at = (l: ShownLine, pH: number) => l.intercept + l.slope * pH;
  return polygonPath([
    [axes.x(w.pHMin), axes.y(at(lower, w.pHMin))],
    [axes.x(w.pHMax), axes.y(at(lower, w.pHMax))],
    [axes.x(w.pHMax), axes.y(at(upper, w.pHMax))],
    [axes.x(w.pHMin), axes.y(at(upper, w.pHMin))],
  ]);
}

function linePath(axes: Axes, w: AxisWindow, l: ShownLine): string {
  return `M${fixed(axes.x(w.pHMin))} ${fixed(axes.y(l.intercept + l.slope * w.pHMin))}L${fixed(axes.x(w.pHMax))} ${fixed(axes.y(l.intercept + l.slope * w.pHMax))}`;
}

/** Caption lines wrapped at word boundaries to fit `width` px of 10 px text (fixed-advance estimate). */
export function wrapCaption(lines: readonly string[], width: number): string[] {
  const perLine = Math.max(20, Math.floor((width - LEFT_BAND - RIGHT_BAND) / 5.4));
  const out: string[] = [];
  for (const line of lines) {
    let current = "";
    for (const word of line.split(/\s+/)) {
      if (current && current.length + 1 + word.length > perLine) {
        out.push(current);
        current = word;
      } else current = current ? `${current} ${word}` : word;
    }
    if (current) out.push(current);
  }
  return out;
}

type PixelRegion = { region: ShownRegion; pixels: (readonly [number, number])[]; fill: string };

/** Region fills by regime, shades stepping per species so neighbours differ. */
function pixelRegions(o: DiagramSvgOptions, axes: Axes): PixelRegion[] {
  const shadeIndex: Record<Regime, Map<number, number>> = {
    immunity: new Map(),
    passivation: new Map(),
    corrosion: new Map(),
  };
  return o.regions.map((r) => {
    const shades = shadeIndex[r.regime];
    if (!shades.has(r.species)) shades.set(r.species, shades.size);
    return {
      region: r,
      pixels: r.vertices.map(([pH, e]) => [axes.x(pH), axes.y(e)] as const),
      fill: regionFill(r.regime, shades.get(r.species)!),
    };
  });
}

function regionsSvg(regions: readonly PixelRegion[]): string {
  const out = [`<g class="rc-regions" clip-path="url(#rc-plot)">`];
  for (const { region: r, pixels, fill } of regions) {
    const d = polygonPath(pixels);
    out.push(
      `<path class="rc-region" d="${d}" fill="${fill}" data-formula="${escapeXml(r.formula)}" data-regime="${r.regime}" data-fill="${fill}"><title>${escapeXml(`${r.formula}: ${REGIME_WORDS[r.regime]}`)}</title></path>` +
        `<path class="rc-ligand-edge" d="${d}" fill="url(#rc-pat-${r.regime})" stroke="#ffffff" stroke-width="1" pointer-events="none"/>`,
    );
  }
  out.push(`</g>`);
  return out.join("\n");
}

function waterSvg(o: DiagramSvgOptions, axes: Axes): string {
  const w = o.window;
  const out = [`<g class="rc-water" clip-path="url(#rc-plot)" pointer-events="none">`];
  if (o.showKineticBand) {
    const dv = (o.kineticOverpotential ?? KINETIC_OVERPOTENTIAL) * (o.unit === "mV" ? 1000 : 1);
    const up = { intercept: o.water.oxygen.intercept + dv, slope: o.water.oxygen.slope };
    const down = { intercept: o.water.hydrogen.intercept - dv, slope: o.water.hydrogen.slope };
    out.push(
      `<path class="rc-kinetic-band" d="${bandPath(axes, w, o.water.oxygen, up)}" fill="${WATER_BAND}" fill-opacity="0.07"/>`,
    );
    out.push(
      `<path class="rc-kinetic-band" d="${bandPath(axes, w, down, o.water.hydrogen)}" fill="${WATER_BAND}" fill-opacity="0.07"/>`,
    );
    for (const l of [up, down])
      out.push(
        `<path d="${linePath(axes, w, l)}" stroke="${WATER_LINE}" stroke-width="0.8" stroke-opacity="0.5" stroke-dasharray="2 4" fill="none"/>`,
      );
  }
  out.push(
    `<path class="rc-water-band" d="${bandPath(axes, w, o.water.hydrogen, o.water.oxygen)}" fill="${WATER_BAND}" fill-opacity="0.16"/>`,
  );
  for (const [l, name] of [
    [o.water.oxygen, "O2/H2O"],
    [o.water.hydrogen, "H+/H2"],
  ] as const) {
    out.push(
      `<path class="rc-water-line" data-couple="${name}" d="${linePath(axes, w, l)}" stroke="${WATER_LINE}" stroke-width="1.4" stroke-dasharray="7 4" fill="none"/>`,
    );
  }
  out.push(`</g>`);
  return out.join("\n");
}

/** The width estimate is a fixed-advance guess; fonts differ, so labels are planned 15 % wider than estimated. */
const LABEL_WIDTH_SAFETY = 1.15;

/** What the numbered key beside the diagram lists: number → formula (and whether it is marked in place). */
export interface KeyEntry {
  readonly number: number;
  readonly formula: string;
  readonly marked: boolean;
}

/** The labels as SVG and the numbered key for regions too small for their formula. */
function labelsSvg(regions: readonly PixelRegion[]): { svg: string; key: KeyEntry[] } {
  const segments = regions.map((r) => formulaSegments(r.region.formula, r.region.charge));
  const plans: LabelPlan[] = planLabels(
    regions.map((r, i) => ({
      key: r.region.formula,
      pixels: r.pixels,
      width: (size: number) => formulaWidth(segments[i], size) * LABEL_WIDTH_SAFETY,
    })),
  );
  const out = [
    `<g class="rc-labels" fill="${LABEL_TEXT}" text-anchor="middle" pointer-events="none" paint-order="stroke" stroke="#ffffff" stroke-width="3" stroke-opacity="0.75" stroke-linejoin="round">`,
  ];
  const key: KeyEntry[] = [];
  for (const p of plans) {
    const formula = regions[p.piece].region.formula;
    if (p.kind === "key-only") {
      key.push({ number: p.number, formula, marked: false });
      continue;
    }
    const y = fixed(p.y + p.size * 0.35, 1);
    if (p.kind === "formula") {
      out.push(
        `<text class="rc-label" data-formula="${escapeXml(formula)}" data-fits="true" x="${fixed(p.x, 1)}" y="${y}" font-size="${p.size}">${segmentsSvg(segments[p.piece])}</text>`,
      );
    } else {
      key.push({ number: p.number, formula, marked: true });
      out.push(
        `<text class="rc-label rc-key-number" data-formula="${escapeXml(formula)}" data-key="${p.number}" x="${fixed(p.x, 1)}" y="${y}" font-size="${p.size}" font-weight="600">${p.number}</text>`,
      );
    }
  }
  out.push(`</g>`);
  return { svg: out.join("\n"), key: key.sort((a, b) => a.number - b.number) };
}

function axesSvg(o: DiagramSvgOptions, area: PlotArea, axes: Axes): string {
  const w = o.window;
  const out = [`<g class="rc-axes" fill="${AXIS_TEXT}" font-size="11">`];
  out.push(
    `<rect x="${area.left}" y="${area.top}" width="${area.width}" height="${area.height}" fill="none" stroke="${AXIS_TEXT}" stroke-width="1"/>`,
  );
  for (const t of niceTicks(w.pHMin, w.pHMax, Math.max(3, Math.round(area.width / 55)))) {
    const x = fixed(axes.x(t));
    out.push(
      `<path d="M${x} ${area.top + area.height}v5" stroke="${AXIS_TEXT}"/><text x="${x}" y="${area.top + area.height + 17}" text-anchor="middle">${formatTick(t)}</text>`,
    );
  }
  for (const t of niceTicks(w.eMin, w.eMax, Math.max(3, Math.round(area.height / 45)))) {
    const y = fixed(axes.y(t));
    out.push(
      `<path d="M${area.left} ${y}h-5" stroke="${AXIS_TEXT}"/><text x="${area.left - 8}" y="${fixed(axes.y(t) + 4)}" text-anchor="end">${formatTick(t)}</text>`,
    );
  }
  out.push(
    `<text class="rc-axis-title" x="${area.left + area.width / 2}" y="${area.top + area.height + 36}" text-anchor="middle" font-size="13">pH</text>`,
  );
  out.push(
    `<text class="rc-axis-title" transform="translate(14 ${area.top + area.height / 2}) rotate(-90)" text-anchor="middle" font-size="13">${escapeXml(o.axisTitle)}</text>`,
  );
  out.push(`</g>`);
  return out.join("\n");
}

/** Title, subtitle, legend and caption inside the SVG (exports, command line). */
function chromeSvg(
  o: DiagramSvgOptions,
  area: PlotArea,
  title: string,
  subtitle: string,
  caption: readonly string[],
): string {
  const out = [
    `<g class="rc-chrome" fill="${AXIS_TEXT}"><text class="rc-title" x="${area.left}" y="19" font-size="15" font-weight="600">${escapeXml(title)}</text>`,
    `<text class="rc-subtitle" x="${area.left}" y="36" font-size="11.5">${escapeXml(subtitle)}</text></g>`,
  ];
  const legendY = area.top + area.height + 50;
  const legend: string[] = [];
  let lx = area.left;
  for (const regime of REGIMES) {
    legend.push(
      `<rect x="${lx}" y="${legendY}" width="16" height="12" fill="${regionFill(regime, 0)}" stroke="${AXIS_TEXT}" stroke-width="0.5"/><rect x="${lx}" y="${legendY}" width="16" height="12" fill="url(#rc-pat-${regime})"/>` +
        `<path d="${markerPath(regime, lx + 24, legendY + 6, 4)}" fill="${MARKER_FILLS[regime]}" stroke="${MARKER_OUTLINE}"/><text x="${lx + 32}" y="${legendY + 10}">${regime}</text>`,
    );
    lx += 32 + regime.length * 6.2 + 14;
  }
  legend.push(
    `<rect x="${lx}" y="${legendY}" width="16" height="12" fill="${WATER_BAND}" fill-opacity="0.25"/><path d="M${lx} ${legendY}h16M${lx} ${legendY + 12}h16" stroke="${WATER_LINE}" stroke-dasharray="4 2"/><text x="${lx + 22}" y="${legendY + 10}">water stable</text>`,
  );
  out.push(`<g class="rc-legend" font-size="11" fill="${AXIS_TEXT}">${legend.join("")}</g>`);
  if (caption.length > 0) {
    out.push(
      `<g class="rc-caption" font-size="10" fill="${AXIS_TEXT}">${caption.map((line, i) => `<text x="${area.left}" y="${legendY + 28 + i * CAPTION_LINE}">${escapeXml(line)}</text>`).join("")}</g>`,
    );
  }
  return out.join("\n");
}

/** The sample layer: one tab stop for the whole layer (the pane moves through it with the arrow keys). */
function samplesSvg(o: DiagramSvgOptions, axes: Axes): string {
  const w = o.window;
  const titles = o.sampleTitles !== false;
  const shown =
    o.omitSamples === true
      ? 0
      : o.samples.filter((s) => s.pH >= w.pHMin && s.pH <= w.pHMax && s.E >= w.eMin && s.E <= w.eMax).length;
  const out = [
    `<g class="rc-samples" stroke="${MARKER_OUTLINE}" stroke-width="1"${shown > 0 ? ` tabindex="0" role="group" aria-label="${shown} samples: arrow keys step through them in pH order, Enter selects the row"` : ""}>`,
  ];
  for (let i = 0; o.omitSamples !== true && i < o.samples.length; i++) {
    const s = o.samples[i];
    if (!(s.pH >= w.pHMin && s.pH <= w.pHMax && s.E >= w.eMin && s.E <= w.eMax)) continue;
    const fill = o.sampleFill ? o.sampleFill(s) : MARKER_FILLS[s.regime];
    out.push(
      `<path class="rc-sample" id="rc-s-${i}" d="${markerPath(s.regime, axes.x(s.pH), axes.y(s.E))}" fill="${fill}" data-row="${s.row}" data-ph="${s.pH}" data-e="${s.E}" data-regime="${s.regime}" data-species="${escapeXml(s.formula)}" data-i="${i}">${titles ? `<title>${escapeXml(sampleText(s, o.unit))}</title>` : ""}</path>`,
    );
  }
  out.push(`</g>`);
  return out.join("\n");
}

export interface RenderedDiagram {
  readonly svg: string;
  readonly key: KeyEntry[];
  readonly title: string;
  readonly subtitle: string;
}

/** The diagram and its numbered key. */
export function renderDiagram(o: DiagramSvgOptions): RenderedDiagram {
  const chrome = o.chrome !== false;
  const caption = chrome ? wrapCaption(o.caption ?? [], o.width) : [];
  const area = diagramLayout(o.width, o.height, chrome ? caption.length : -1);
  const axes = makeAxes(o.window, area);
  const w = o.window;
  const title = o.title ?? `${o.system.element}\u2013water`;
  const subtitle = `${fixed(o.system.celsius, 1)} \u00b0C \u00b7 dissolved activity ${formatActivity(o.system.activity)} \u00b7 potentials vs ${o.axisTitle.split(" vs ")[1] ?? "SHE"}`;
  const regions = pixelRegions(o, axes);
  const labels = labelsSvg(regions);
  const out = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${o.width}" height="${o.height}" viewBox="0 0 ${o.width} ${o.height}" role="group" aria-labelledby="rc-title rc-desc" class="rc-diagram"` +
      ` data-plot-left="${area.left}" data-plot-top="${area.top}" data-plot-width="${area.width}" data-plot-height="${area.height}"` +
      ` data-ph-min="${w.pHMin}" data-ph-max="${w.pHMax}" data-e-min="${w.eMin}" data-e-max="${w.eMax}" font-family="'Segoe UI', system-ui, -apple-system, sans-serif">`,
    `<title id="rc-title">${escapeXml(`${title} potential\u2013pH diagram`)}</title>`,
    `<desc id="rc-desc">${escapeXml(`${subtitle}. ${o.regions.length} stability regions, ${o.samples.length} samples.`)}</desc>`,
    `<defs>${patternDefs()}<clipPath id="rc-plot"><rect x="${area.left}" y="${area.top}" width="${area.width}" height="${area.height}"/></clipPath></defs>`,
    `<rect width="${o.width}" height="${o.height}" fill="#ffffff"/>`,
    regionsSvg(regions),
    waterSvg(o, axes),
    labels.svg,
    axesSvg(o, area, axes),
    chrome ? chromeSvg(o, area, title, subtitle, caption) : "",
    chrome && labels.key.length > 0 ? keySvg(labels.key, area) : "",
    samplesSvg(o, axes),
    `</svg>`,
  ];
  return { svg: out.filter((part) => part !== "").join("\n"), key: labels.key, title, subtitle };
}

/** The numbered key inside an exported drawing: one line at the top right of the plot's title band. */
function keySvg(key: readonly KeyEntry[], area: PlotArea): string {
  const text = key.map((k) => `${k.number} ${k.formula}`).join("  ");
  return `<text class="rc-key" x="${area.left + area.width}" y="36" text-anchor="end" font-size="10.5" fill="${AXIS_TEXT}">${escapeXml(text)}</text>`;
}

export function renderDiagramSvg(o: DiagramSvgOptions): string {
  return renderDiagram(o).svg;
}

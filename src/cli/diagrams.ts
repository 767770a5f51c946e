/**
 * Diagram SVGs for the command line: keeps a bounded, reproducible sample of each metal's points while the file
 * streams, then draws one potential–pH diagram per metal with the samples on it through the task pane's
 * DOM-free renderer (src/diagram), run in Node.
 */
import {
  buildLigandSystem,
  DEFAULT_CELSIUS,
  getDatabase,
  hasLigands,
  LIGAND_ORDER,
  SystemCache,
  type LigandTotals,
} from "../chemistry";
import { displayScale, plotSamples, renderDiagramSvg, shownRegions, shownWaterLines } from "../diagram";
import type { SamplePoint } from "./sample-offers";
import { Reservoir } from "./reservoir";

/** Points drawn per diagram at most (the pane's budget is 10 k samples, DEVELOPERS.md Speed budgets). */
export const POINTS_PER_DIAGRAM = 10_000;

interface MetalSamples {
  readonly symbol: string;
  readonly reservoir: Reservoir<SamplePoint>;
}

/** Metal cells whose symbol is kept (a metal column holds a handful of spellings). */
const MAX_NAMES = 1024;

export class DiagramSamples {
  private readonly bySymbol = new Map<string, Reservoir<SamplePoint>>();
  /** Metal cells offered → the metal's symbol and reservoir, or null for a cell that names no metal. */
  private readonly byName = new Map<string, MetalSamples | null>();
  private pending: { reservoir: Reservoir<SamplePoint>; slot: number } | null = null;

  /**
   * Counts one sample of the metal named `name` (a symbol or a name, as a metal cell holds it). Returns the metal's
   * symbol when the diagram keeps the sample — then give its point to `keep` — and null otherwise, or when `name` is
   * not a metal.
   */
  offer(name: string): string | null {
    this.pending = null;
    let metal = this.byName.get(name);
    if (metal === undefined) {
      metal = this.metalNamed(name);
      if (this.byName.size < MAX_NAMES) this.byName.set(name, metal);
    }
    if (metal === null) return null;
    const slot = metal.reservoir.nextSlot();
    if (slot < 0) return null;
    this.pending = { reservoir: metal.reservoir, slot };
    return metal.symbol;
  }

  /** The metal a cell names and its reservoir (made on first use); null when it names none. */
  private metalNamed(name: string): MetalSamples | null {
    const symbol = getDatabase().resolveMetal(name);
    if (!symbol) return null;
    let reservoir = this.bySymbol.get(symbol);
    if (!reservoir)
      this.bySymbol.set(symbol, (reservoir = new Reservoir<SamplePoint>(POINTS_PER_DIAGRAM, hashSeed(symbol))));
    return { symbol, reservoir };
  }

  /** Stores the point of the sample `offer` last kept (its symbol the one `offer` returned). */
  keep(point: SamplePoint): void {
    if (this.pending === null) throw new Error("keep() without a kept offer()");
    this.pending.reservoir.items[this.pending.slot] = point;
    this.pending = null;
  }

  symbols(): string[] {
    return [...this.bySymbol.keys()].sort();
  }

  points(symbol: string): SamplePoint[] {
    return this.bySymbol.get(symbol)?.items ?? [];
  }

  /** Samples offered for a metal (before thinning). */
  count(symbol: string): number {
    return this.bySymbol.get(symbol)?.count ?? 0;
  }
}

function hashSeed(text: string): number {
  let h = 2166136261;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 16777619);
  return h >>> 0;
}

/** The temperature a diagram is drawn at: the median of its samples' temperatures, to 1 °C. */
export function diagramCelsius(points: readonly SamplePoint[], fallback = DEFAULT_CELSIUS): number {
  const ts = points
    .map((p) => p.celsius)
    .filter((t) => Number.isFinite(t))
    .sort((a, b) => a - b);
  if (ts.length === 0) return fallback;
  const mid = ts.length >> 1;
  const median = ts.length % 2 ? ts[mid] : (ts[mid - 1] + ts[mid]) / 2;
  return Math.round(median);
}

function median(values: number[]): number {
  values.sort((a, b) => a - b);
  const mid = values.length >> 1;
  return values.length % 2 ? values[mid] : (values[mid - 1] + values[mid]) / 2;
}

/**
 * The water a diagram is drawn in: per ligand, the median of the drawn samples' totals, counting a sample without
 * the ligand as 0; a ligand is left out when that median is 0 (most samples lack it).
 */
export function diagramTotals(points: readonly SamplePoint[]): LigandTotals {
  const totals: LigandTotals = {};
  if (points.length === 0) return totals;
  for (const ligand of LIGAND_ORDER) {
    const m = median(points.map((p) => p.ligands?.[ligand] ?? 0));
    if (m > 0) totals[ligand] = m;
  }
  return totals;
}

/** "DIC 1.73, chloride 0.56 mmol/kg" (three significant figures); "" for pure water. */
export function totalsText(totals: LigandTotals): string {
  const words = {
    carbonate: "DIC",
    chloride: "chloride",
    sulfur: "sulfur",
    phosphate: "orthophosphate (as P)",
  } as const;
  const parts = LIGAND_ORDER.filter((l) => (totals[l] ?? 0) > 0).map(
    (l) => `${words[l]} ${Number(((totals[l] ?? 0) * 1000).toPrecision(3))}`,
  );
  return parts.length === 0 ? "" : `${parts.join(", ")} mmol/kg`;
}

/** What the command line draws for one metal. */
export interface DiagramRequest {
  element: string;
  celsius: number;
  activity: number;
  samples: readonly SamplePoint[];
  /** Lines under the legend: where the samples come from and how many were drawn. */
  caption: string[];
  /** Ligand totals (mol/kg) of the diagram's water; absent or empty = pure water. */
  ligands?: LigandTotals;
}

/** Diagram window: pH 0–14 and −1.5…+2 V vs SHE, which holds natural waters and both water lines. */
export const DIAGRAM_WINDOW = { pHMin: 0, pHMax: 14, eMin: -1.5, eMax: 2 } as const;

/** One potential–pH diagram as SVG text, vs SHE in volts, with the samples drawn on it (the pane's renderer). */
export function renderDiagram(request: DiagramRequest): string {
  const db = getDatabase();
  const options = { celsius: request.celsius, activity: request.activity };
  const system =
    request.ligands && hasLigands(request.ligands)
      ? buildLigandSystem(db, request.element, options, request.ligands)
      : new SystemCache(db).get(request.element, request.celsius, request.activity);
  const scale = displayScale("SHE", "V", request.celsius);
  const samples = plotSamples(
    system,
    request.samples.map((p) => ({ row: p.line, id: `line ${p.line}`, pH: p.pH, eSHE: p.E })),
    scale,
  );
  return renderDiagramSvg({
    system,
    window: DIAGRAM_WINDOW,
    regions: shownRegions(system, DIAGRAM_WINDOW, scale),
    samples,
    water: shownWaterLines(request.celsius, scale),
    axisTitle: scale.axisTitle,
    unit: "V",
    width: 900,
    height: 680,
    caption: request.caption,
  });
}

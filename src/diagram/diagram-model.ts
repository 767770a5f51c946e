/**
 * What the diagram shows, in the coordinates it is drawn in: the engine's regions, the water lines and the samples
 * converted from volts vs SHE to the chosen scale (any reference electrode, V or mV). Host-free and DOM-free, so
 * the command line can draw the same pictures.
 *
 * Every electrode scale is affine in (pH, E): E_shown = factor·(E_SHE − E_ref(T) − s·pH), with s ≠ 0 only for
 * the reversible hydrogen electrode (E_ref = −k(T)·pH). Regions stay convex polygons under such a map, so they are
 * computed vs SHE over a window covering the shown one, mapped vertex by vertex and clipped to the shown window.
 */
import {
  clipPolygon,
  diagramRegions,
  dominantInWater,
  FULL_E_LIMIT,
  getDatabase,
  getElectrodes,
  HalfPlane,
  hasLigands,
  inRange,
  MetalSystem,
  PH_MAX,
  PH_MIN,
  Point,
  polygonArea,
  Regime,
  Region,
  tracedRegions,
  waterLine,
  type LigandTotals,
} from "../chemistry";
import type { AxisWindow } from "./axes";

export type PotentialUnit = "V" | "mV";

export interface DisplayScale {
  /** Electrode id as in data/electrodes.json ("SHE", "SCE", "AgCl-sat", "RHE"…). */
  readonly electrode: string;
  readonly unit: PotentialUnit;
  /** Temperature (°C) at which the electrode's potential is taken. */
  readonly celsius: number;
  /** Potential shown on the axis for (pH, E vs SHE in V). */
  fromSHE(pH: number, eSHE: number): number;
  /** E vs SHE (V) of a shown potential at pH. */
  toSHE(pH: number, shown: number): number;
  /** Axis title: "E / V vs SHE". */
  readonly axisTitle: string;
}

/**
 * Why an axis vs `electrode` cannot be drawn at `celsius`, or null: outside the range where the electrode's
 * temperature dependence is published (data/electrodes.json, validCelsius) its potential is not extrapolated.
 */
export function scaleProblem(electrode: string, celsius: number): string | null {
  const found = getElectrodes().lookup(electrode);
  if ("error" in found) return found.error;
  if (inRange(found.electrode, celsius)) return null;
  const [low, high] = found.electrode.validCelsius;
  return `${found.electrode.id} is known from ${low} to ${high} °C only; at ${celsius} °C draw vs SHE`;
}

/** The scale of `electrode` (id or alias) and `unit` at `celsius`. Throws ElectrodeError for unknown names. */
export function displayScale(electrode: string, unit: PotentialUnit, celsius: number): DisplayScale {
  const table = getElectrodes();
  const found = table.lookup(electrode);
  if ("error" in found) throw new Error(found.error);
  const record = found.electrode;
  const offset = table.potential(record, celsius, 0);
  const perPH = record.needsPH ? table.potential(record, celsius, 1) - offset : 0;
  const factor = unit === "mV" ? 1000 : 1;
  return {
    electrode: record.id,
    unit,
    celsius,
    fromSHE: (pH, e) => factor * (e - offset - perPH * pH),
    toSHE: (pH, shown) => shown / factor + offset + perPH * pH,
    axisTitle: `E / ${unit} vs ${record.id}`,
  };
}

/** Default shown window: pH −2…16 and −2…+2 V vs SHE at pH 7 expressed in the scale, rounded outwards. */
export function defaultWindow(scale: DisplayScale): AxisWindow {
  const step = scale.unit === "mV" ? 100 : 0.1;
  const low = scale.fromSHE(7, -FULL_E_LIMIT);
  const high = scale.fromSHE(7, FULL_E_LIMIT);
  return { pHMin: PH_MIN, pHMax: PH_MAX, eMin: Math.floor(low / step) * step, eMax: Math.ceil(high / step) * step };
}

export interface ShownRegion {
  readonly species: number;
  readonly formula: string;
  readonly regime: Regime;
  readonly charge: number;
  /** Convex polygon in (pH, shown E). */
  readonly vertices: Point[];
}

/** The engine's regions inside the shown window, in shown coordinates. */
export function shownRegions(system: MetalSystem, window: AxisWindow, scale: DisplayScale): ShownRegion[] {
  const corners = [
    scale.toSHE(window.pHMin, window.eMin),
    scale.toSHE(window.pHMax, window.eMin),
    scale.toSHE(window.pHMin, window.eMax),
    scale.toSHE(window.pHMax, window.eMax),
  ];
  const sheWindow = {
    pHMin: window.pHMin,
    pHMax: window.pHMax,
    eMin: Math.min(...corners) - 1e-6,
    eMax: Math.max(...corners) + 1e-6,
  };
  // with ligands the regions are traced from the point engine, so they agree with REDOX.SPECIES (region-tracing.ts)
  const regions: Region[] =
    system.ligandTotals && hasLigands(system.ligandTotals)
      ? tracedRegions(getDatabase(), system, sheWindow)
      : diagramRegions(system, sheWindow);
  const clip: HalfPlane[] = [
    { a: -window.eMax, b: 0, c: 1 }, // E ≤ eMax
    { a: window.eMin, b: 0, c: -1 }, // E ≥ eMin
    { a: -window.pHMax, b: 1, c: 0 },
    { a: window.pHMin, b: -1, c: 0 },
  ];
  const minArea = (window.pHMax - window.pHMin) * (window.eMax - window.eMin) * 1e-9;
  const out: ShownRegion[] = [];
  for (const region of regions) {
    let polygon: Point[] = region.vertices.map(([pH, e]) => [pH, scale.fromSHE(pH, e)] as const);
    for (const h of clip) polygon = clipPolygon(polygon, h);
    if (polygon.length < 3 || Math.abs(polygonArea(polygon)) <= minArea) continue;
    const s = system.species[region.species];
    out.push({
      species: region.species,
      formula: region.formula,
      regime: s.regime,
      charge: s.species.charge,
      vertices: polygon,
    });
  }
  return out;
}

/** A straight line E = intercept + slope·pH in shown coordinates. */
export interface ShownLine {
  readonly intercept: number;
  readonly slope: number;
}

/** The O2/H2O and H+/H2 lines (1 bar) in shown coordinates at the system's temperature. */
export function shownWaterLines(celsius: number, scale: DisplayScale): { oxygen: ShownLine; hydrogen: ShownLine } {
  const line = (gas: "O2" | "H2"): ShownLine => {
    const at0 = scale.fromSHE(0, waterLine(0, celsius, gas));
    const at1 = scale.fromSHE(1, waterLine(1, celsius, gas));
    return { intercept: at0, slope: at1 - at0 };
  };
  return { oxygen: line("O2"), hydrogen: line("H2") };
}

/** A sample ready to plot. */
export interface PlottedSample {
  /** Row number in the sheet or line in the file. */
  readonly row: number;
  readonly id: string;
  readonly pH: number;
  /** Potential in shown coordinates. */
  readonly E: number;
  /** Potential vs SHE, V. */
  readonly eSHE: number;
  readonly formula: string;
  readonly regime: Regime;
  /** Signed distance to the water window, V (positive inside). */
  readonly waterMargin: number;
  readonly dissolved?: number;
  /** Ligand totals (mol/kg) the species and regime were found at; absent in pure water. */
  readonly ligands?: LigandTotals;
  /** Ionic strength (mol/kg) the species and regime were found at; absent for an ideal solution. */
  readonly ionicStrength?: number;
  /** The reading as logged, with its unit and electrode ("595 mV vs AgCl-sat"). */
  readonly reading?: string;
  /** Temperature (°C) the answer was found at, when it is the row's own. */
  readonly celsius?: number;
  /** Equilibrium dissolved metal, µg/L (null: no solid is stable there). */
  readonly equilibrium?: number | null;
  /** The row's site, when the log names one. */
  readonly site?: string;
}

export interface SampleInput {
  readonly row: number;
  readonly id: string;
  readonly pH: number;
  /** Potential vs SHE, V (already converted from the reading). */
  readonly eSHE: number;
  readonly dissolved?: number;
  /** Ligand totals (mol/kg) of this sample's water, when they differ from sample to sample. */
  readonly ligands?: LigandTotals;
}

/**
 * Species, regime and water margin of each sample on the system (at the system's temperature and activity). The
 * water margin is waterMargin() of water.ts; at one temperature both lines are straight in pH, so they are taken
 * once (at pH 0 and 1) instead of per sample. `systemOf` gives a sample its own system (same temperature and
 * activity, its own ligand totals) when the samples' waters differ.
 */
export function plotSamples(
  system: MetalSystem,
  samples: readonly SampleInput[],
  scale: DisplayScale,
  systemOf?: (sample: SampleInput) => MetalSystem,
): PlottedSample[] {
  const o0 = waterLine(0, system.celsius, "O2");
  const oSlope = waterLine(1, system.celsius, "O2") - o0;
  const h0 = waterLine(0, system.celsius, "H2");
  const hSlope = waterLine(1, system.celsius, "H2") - h0;
  return samples.map((s) => {
    const own = systemOf ? systemOf(s) : system;
    const species = dominantInWater(getDatabase(), own, s.pH, s.eSHE, s.ligands); // exactly what REDOX.SPECIES answers
    const plotted: PlottedSample = {
      row: s.row,
      id: s.id,
      pH: s.pH,
      E: scale.fromSHE(s.pH, s.eSHE),
      eSHE: s.eSHE,
      formula: species.formula,
      regime: species.regime,
      waterMargin: Math.min(o0 + oSlope * s.pH - s.eSHE, s.eSHE - (h0 + hSlope * s.pH)),
      dissolved: s.dissolved,
    };
    return s.ligands ? { ...plotted, ligands: s.ligands } : plotted;
  });
}

/**
 * Views of the diagram: the window fitted to the samples (the default when they are clustered), zooming about the
 * centre, and whether a set of samples is clustered in the full window.
 */
import { PH_MAX, PH_MIN } from "../chemistry";
import type { AxisWindow } from "./axes";

/** Samples are clustered when their padded box covers less than this share of the full window. */
export const CLUSTERED_SHARE = 0.25;

/** Smallest fitted span: 2 pH units and 0.4 V (400 mV), so boundaries near the samples stay in view. */
const MIN_PH_SPAN = 2;
const MIN_E_SPAN_V = 0.4;

function roundOut(low: number, high: number, step: number): [number, number] {
  return [Math.floor(low / step) * step, Math.ceil(high / step) * step];
}

/** The window around the points (pH, E shown) with 15 % margins and minimum spans, rounded outwards; null without points. */
export function fitWindow(
  points: readonly { readonly pH: number; readonly E: number }[],
  unit: "V" | "mV",
): AxisWindow | null {
  if (points.length === 0) return null;
  let [p0, p1, e0, e1] = [Infinity, -Infinity, Infinity, -Infinity];
  for (const p of points) {
    p0 = Math.min(p0, p.pH);
    p1 = Math.max(p1, p.pH);
    e0 = Math.min(e0, p.E);
    e1 = Math.max(e1, p.E);
  }
  const factor = unit === "mV" ? 1000 : 1;
  const widen = (low: number, high: number, min: number): [number, number] => {
    const span = Math.max(high - low, min / 1.3);
    const mid = (low + high) / 2;
    return [mid - span * 0.65, mid + span * 0.65];
  };
  const [pHMin, pHMax] = roundOut(...widen(p0, p1, MIN_PH_SPAN), 0.5);
  const [eMin, eMax] = roundOut(...widen(e0, e1, MIN_E_SPAN_V * factor), 0.05 * factor);
  return {
    pHMin: Math.max(PH_MIN, pHMin),
    pHMax: Math.min(PH_MAX, pHMax),
    eMin: Number(eMin.toPrecision(6)),
    eMax: Number(eMax.toPrecision(6)),
  };
}

/** Whether the fitted window is a small part of the full one. */
export function isClustered(fitted: AxisWindow, full: AxisWindow): boolean {
  const area = (w: AxisWindow) => (w.pHMax - w.pHMin) * (w.eMax - w.eMin);
  return area(fitted) < CLUSTERED_SHARE * area(full);
}

/** The window scaled by `factor` about its centre (factor < 1 zooms in), kept inside the pH domain (PH_MIN…PH_MAX). */
export function zoomWindow(w: AxisWindow, factor: number): AxisWindow {
  const cp = (w.pHMin + w.pHMax) / 2;
  const ce = (w.eMin + w.eMax) / 2;
  const hp = ((w.pHMax - w.pHMin) / 2) * factor;
  const he = ((w.eMax - w.eMin) / 2) * factor;
  const round = (v: number) => Number(v.toPrecision(6));
  return {
    pHMin: round(Math.max(PH_MIN, cp - hp)),
    pHMax: round(Math.min(PH_MAX, cp + hp)),
    eMin: round(ce - he),
    eMax: round(ce + he),
  };
}

/**
 * The model of the solubility chart: equilibrium total dissolved metal (µg/L) along pH at one sample's potential,
 * temperature and water. Host-free and engine-free: the numbers come from `evaluate`, which the host answers with
 * REDOX.DISSOLVED itself (one range of pH values, the other arguments the sample's own), so at the sample's pH the
 * curve is that row's DISSOLVED by construction. A pH where DISSOLVED gives no number (#N/A: no solid can form)
 * stays null — a gap in the curve, never an interpolated value.
 */

/** One pH of the curve and the dissolved metal there, µg/L; null where no solid can form. */
export interface CurvePoint {
  readonly pH: number;
  readonly value: number | null;
}

export interface SolubilityCurve {
  readonly pHMin: number;
  readonly pHMax: number;
  /** Grid points in increasing pH, the sample's pH among them when it lies in the range. */
  readonly points: readonly CurvePoint[];
  /** The sample's own point (its pH and DISSOLVED there); `inRange` false when its pH is off the chart. */
  readonly sample: CurvePoint & { readonly inRange: boolean };
}

/** Dissolved metal (µg/L, or null) at each pH of a list, in order. */
export type DissolvedEvaluator = (pHs: readonly number[]) => readonly (number | null)[];

/** Grid intervals across the pH range: about one per pixel of a task-pane-wide plot. */
export const CURVE_STEPS = 300;

/** `steps` + 1 evenly spaced pH values from min to max, with `extra` inserted in order when inside. */
export function curvePHs(pHMin: number, pHMax: number, extra: number, steps = CURVE_STEPS): number[] {
  const grid: number[] = [];
  for (let i = 0; i <= steps; i++) grid.push(i === steps ? pHMax : pHMin + ((pHMax - pHMin) * i) / steps);
  if (extra >= pHMin && extra <= pHMax && !grid.includes(extra)) {
    grid.push(extra);
    grid.sort((a, b) => a - b);
  }
  return grid;
}

/** The curve over [pHMin, pHMax] through the sample's pH, all values from one call of `evaluate`. */
export function solubilityCurve(
  pHMin: number,
  pHMax: number,
  samplePH: number,
  evaluate: DissolvedEvaluator,
  steps = CURVE_STEPS,
): SolubilityCurve {
  if (!(pHMax > pHMin)) throw new RangeError("pH range: the maximum must exceed the minimum");
  const pHs = curvePHs(pHMin, pHMax, samplePH, steps);
  const inRange = pHs.includes(samplePH);
  const values = evaluate(inRange ? pHs : [...pHs, samplePH]);
  const at = (i: number): number | null => {
    const v = values[i];
    return typeof v === "number" && Number.isFinite(v) ? v : null;
  };
  const points = pHs.map((pH, i) => ({ pH, value: at(i) }));
  const sampleIndex = inRange ? pHs.indexOf(samplePH) : pHs.length;
  return { pHMin, pHMax, points, sample: { pH: samplePH, value: at(sampleIndex), inRange } };
}

/** Runs of consecutive points that do (`value` true) or do not have a number. */
function runs(points: readonly CurvePoint[], keep: (p: CurvePoint) => boolean): CurvePoint[][] {
  const out: CurvePoint[][] = [];
  let current: CurvePoint[] = [];
  for (const p of points) {
    if (keep(p)) current.push(p);
    else if (current.length > 0) {
      out.push(current);
      current = [];
    }
  }
  if (current.length > 0) out.push(current);
  return out;
}

/** The drawn pieces of the curve: runs of grid points with a number (a gap between pieces is no number). */
export function curvePieces(curve: SolubilityCurve): CurvePoint[][] {
  return runs(curve.points, (p) => p.value !== null);
}

/** pH spans (first to last grid point) where no solid can form. */
export function curveGaps(curve: SolubilityCurve): { from: number; to: number }[] {
  return runs(curve.points, (p) => p.value === null).map((r) => ({ from: r[0].pH, to: r[r.length - 1].pH }));
}

/** pH spans (first to last grid point) where the curve lies above `threshold` µg/L. */
export function spansAbove(curve: SolubilityCurve, threshold: number): { from: number; to: number }[] {
  return runs(curve.points, (p) => p.value !== null && p.value > threshold).map((r) => ({
    from: r[0].pH,
    to: r[r.length - 1].pH,
  }));
}

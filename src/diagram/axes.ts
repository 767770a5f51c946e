/**
 * Axis transforms of the diagram: data (pH, E in the shown scale and unit) ↔ pixels, and the tick values drawn on
 * each axis. Pure functions: the SVG renderer, the pane and the tests all use the same arithmetic.
 *
 * The plot area is a rectangle in pixels; pH grows to the right, E grows upwards (SVG's y grows downwards).
 */

export interface PlotArea {
  /** Left and top edge of the plot area, px. */
  readonly left: number;
  readonly top: number;
  readonly width: number;
  readonly height: number;
}

export interface AxisWindow {
  readonly pHMin: number;
  readonly pHMax: number;
  /** Potential limits in the shown scale and unit. */
  readonly eMin: number;
  readonly eMax: number;
}

export interface Axes {
  readonly area: PlotArea;
  readonly window: AxisWindow;
  /** pH → x pixel. */
  x(pH: number): number;
  /** E (shown scale and unit) → y pixel. */
  y(E: number): number;
  /** x pixel → pH. */
  pHAt(x: number): number;
  /** y pixel → E. */
  eAt(y: number): number;
}

export class AxisError extends Error {}

/** Linear transforms of a window onto a plot area. */
export function makeAxes(window: AxisWindow, area: PlotArea): Axes {
  const { pHMin, pHMax, eMin, eMax } = window;
  if (!(pHMax > pHMin) || !(eMax > eMin)) throw new AxisError("axis limits: the maximum must exceed the minimum");
  if (!(area.width > 0) || !(area.height > 0)) throw new AxisError("plot area must have a positive size");
  const sx = area.width / (pHMax - pHMin);
  const sy = area.height / (eMax - eMin);
  return {
    area,
    window,
    x: (pH) => area.left + (pH - pHMin) * sx,
    y: (E) => area.top + (eMax - E) * sy,
    pHAt: (x) => pHMin + (x - area.left) / sx,
    eAt: (y) => eMax - (y - area.top) / sy,
  };
}

/**
 * Tick values on [min, max]: multiples of a "nice" step (1, 2, 2.5 or 5 × 10^k) chosen so that about `target`
 * ticks fall inside (after Heckbert 1990, Graphics Gems, "nice numbers"); values are rounded to the step's decimals.
 */
export function niceTicks(min: number, max: number, target = 7): number[] {
  if (!(max > min) || !Number.isFinite(min) || !Number.isFinite(max)) return [];
  const raw = (max - min) / Math.max(1, target);
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw * 0.999) ?? 10 * power;
  const decimals = Math.max(0, -Math.floor(Math.log10(step)) + (step / power === 2.5 ? 1 : 0));
  const ticks: number[] = [];
  const first = Math.ceil(min / step - 1e-9);
  for (let i = first; i * step <= max + step * 1e-9; i++) ticks.push(Number((i * step).toFixed(decimals)));
  return ticks;
}

/** Text of a tick value: trims float noise, uses the minus sign. */
export function formatTick(value: number): string {
  const text = String(Number(value.toPrecision(10)));
  return text.startsWith("-") ? "\u2212" + text.slice(1) : text;
}

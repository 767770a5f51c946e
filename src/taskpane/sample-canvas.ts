/**
 * Large sample sets on screen: the markers painted on a canvas laid over the SVG diagram instead of one SVG
 * circle each (thousands of circles cost the browser more to parse, lay out and paint than the whole diagram).
 * Same markers as the SVG (diagram/markers.ts: shape and fill by regime, outlined), later rows on top. Exports still write SVG circles.
 *
 * Access without per-point elements: the pointer finds the nearest sample (within a few pixels) for the info line
 * and the click; the canvas takes keyboard focus, arrow keys step through the samples in pH order (Home/End jump
 * to the ends), Enter or Space selects the row, and a ring marks the current sample.
 */
import {
  Axes,
  makeAxes,
  MARKER_FILLS,
  MARKER_OUTLINE,
  MARKER_RADIUS,
  traceMarker,
  type PlottedSample,
} from "../diagram";
import { type Regime } from "../chemistry";

export { MARKER_RADIUS };

/** Above this many samples the pane paints markers on the canvas layer; up to it, SVG circles. */
export const CANVAS_SAMPLES = 2000;
/** The pointer picks the nearest sample within this distance, px. */
export const PICK_DISTANCE = 6;

/** The axes an SVG from renderDiagramSvg was drawn with, from its data attributes. */
export function axesOfSvg(svg: Element): Axes {
  const n = (name: string) => Number(svg.getAttribute(name));
  return makeAxes(
    { pHMin: n("data-ph-min"), pHMax: n("data-ph-max"), eMin: n("data-e-min"), eMax: n("data-e-max") },
    { left: n("data-plot-left"), top: n("data-plot-top"), width: n("data-plot-width"), height: n("data-plot-height") },
  );
}

/** Pixel positions of the samples inside the window: indices into `samples` and x, y per shown sample. */
export interface MarkerPixels {
  readonly index: Int32Array;
  readonly x: Float64Array;
  readonly y: Float64Array;
}

export function markerPixels(samples: readonly PlottedSample[], axes: Axes): MarkerPixels {
  const w = axes.window;
  const index: number[] = [];
  for (let i = 0; i < samples.length; i++) {
    const s = samples[i];
    if (s.pH >= w.pHMin && s.pH <= w.pHMax && s.E >= w.eMin && s.E <= w.eMax) index.push(i);
  }
  const x = new Float64Array(index.length);
  const y = new Float64Array(index.length);
  index.forEach((i, k) => {
    x[k] = axes.x(samples[i].pH);
    y[k] = axes.y(samples[i].E);
  });
  return { index: Int32Array.from(index), x, y };
}

/** The shown sample nearest to (px, py) within `maxDistance` px: its position k in `pixels`, or −1. */
export function nearestMarker(pixels: MarkerPixels, px: number, py: number, maxDistance = PICK_DISTANCE): number {
  let best = -1;
  let bestD = maxDistance * maxDistance;
  // the last drawn is on top: ties go to the later sample
  for (let k = 0; k < pixels.x.length; k++) {
    const dx = pixels.x[k] - px;
    const dy = pixels.y[k] - py;
    const d = dx * dx + dy * dy;
    if (d <= bestD) {
      bestD = d;
      best = k;
    }
  }
  return best;
}

/** Positions k in pH order (then E), for keyboard stepping. */
export function keyboardOrder(samples: readonly PlottedSample[], pixels: MarkerPixels): Int32Array {
  const order = Array.from(pixels.index.keys());
  order.sort(
    (a, b) =>
      samples[pixels.index[a]].pH - samples[pixels.index[b]].pH ||
      samples[pixels.index[a]].E - samples[pixels.index[b]].E,
  );
  return Int32Array.from(order);
}

export interface SampleCanvasEvents {
  /** A sample (index into the plotted samples) is pointed at or focused. */
  show(i: number): void;
  /** A sample is clicked or chosen with Enter/Space. */
  choose(i: number): void;
}

export class SampleCanvas {
  private canvas: HTMLCanvasElement | null = null;
  private ring: HTMLDivElement | null = null;
  private pixels: MarkerPixels | null = null;
  private order: Int32Array = new Int32Array(0);
  /** Position in keyboard order of the current sample. */
  private current = -1;

  constructor(
    private readonly container: HTMLElement,
    private readonly events: SampleCanvasEvents,
  ) {
    container.addEventListener("mousemove", (event) => {
      const k = this.pick(event);
      if (this.canvas) this.container.style.cursor = k >= 0 ? "pointer" : "";
      if (k >= 0) this.events.show(this.pixels!.index[k]);
    });
    container.addEventListener("click", (event) => {
      const k = this.pick(event);
      if (k >= 0) this.events.choose(this.pixels!.index[k]);
    });
  }

  /** Whether the layer currently shows samples. */
  get active(): boolean {
    return this.canvas !== null;
  }

  /** Removes the layer (small sets are drawn as SVG circles). */
  clear(): void {
    this.canvas?.remove();
    this.ring?.remove();
    this.canvas = null;
    this.ring = null;
    this.pixels = null;
    this.current = -1;
    this.container.style.cursor = "";
  }

  /** Paints `samples` over `svg` (an SVG from renderDiagramSvg inside the container). */
  draw(svg: SVGSVGElement, samples: readonly PlottedSample[]): void {
    this.clear();
    const width = Number(svg.getAttribute("width"));
    const height = Number(svg.getAttribute("height"));
    const pixels = markerPixels(samples, axesOfSvg(svg));
    const ratio = globalThis.devicePixelRatio || 1;
    const canvas = document.createElement("canvas");
    canvas.className = "rc-sample-canvas";
    canvas.width = Math.round(width * ratio);
    canvas.height = Math.round(height * ratio);
    canvas.style.width = `${width}px`;
    canvas.style.height = `${height}px`;
    canvas.tabIndex = 0;
    canvas.setAttribute("role", "img");
    canvas.setAttribute(
      "aria-label",
      `${pixels.x.length} samples. Arrow keys step through them in pH order; Enter selects the row.`,
    );
    canvas.dataset.samples = String(pixels.x.length);
    const ctx = canvas.getContext("2d");
    if (ctx) {
      ctx.scale(ratio, ratio);
      ctx.lineWidth = 1;
      ctx.strokeStyle = MARKER_OUTLINE;
      // consecutive samples of one regime share a path: same stacking as the SVG, far fewer fill calls
      let k = 0;
      while (k < pixels.x.length) {
        const regime: Regime = samples[pixels.index[k]].regime;
        ctx.beginPath();
        for (; k < pixels.x.length && samples[pixels.index[k]].regime === regime; k++) {
          traceMarker(ctx, regime, pixels.x[k], pixels.y[k]);
        }
        ctx.fillStyle = MARKER_FILLS[regime];
        ctx.fill();
        ctx.stroke();
      }
    }
    const ring = document.createElement("div");
    ring.className = "rc-focus-ring";
    ring.hidden = true;
    canvas.addEventListener("keydown", (event) => this.key(event));
    canvas.addEventListener("focus", () => this.step(this.current < 0 ? 0 : this.current));
    canvas.addEventListener("blur", () => (ring.hidden = true));
    this.container.append(canvas, ring);
    this.canvas = canvas;
    this.ring = ring;
    this.pixels = pixels;
    this.order = keyboardOrder(samples, pixels);
  }

  private pick(event: MouseEvent): number {
    if (!this.canvas || !this.pixels) return -1;
    const box = this.canvas.getBoundingClientRect();
    return nearestMarker(this.pixels, event.clientX - box.left, event.clientY - box.top);
  }

  private step(position: number): void {
    if (!this.pixels || this.order.length === 0 || !this.ring) return;
    this.current = Math.max(0, Math.min(this.order.length - 1, position));
    const k = this.order[this.current];
    this.ring.style.left = `${this.pixels.x[k] - MARKER_RADIUS - 3}px`;
    this.ring.style.top = `${this.pixels.y[k] - MARKER_RADIUS - 3}px`;
    this.ring.hidden = false;
    this.events.show(this.pixels.index[k]);
  }

  private key(event: KeyboardEvent): void {
    const moves: Record<string, number> = {
      ArrowRight: 1,
      ArrowDown: 1,
      ArrowLeft: -1,
      ArrowUp: -1,
      PageDown: 50,
      PageUp: -50,
    };
    if (event.key in moves) this.step(this.current + moves[event.key]);
    else if (event.key === "Home") this.step(0);
    else if (event.key === "End") this.step(this.order.length - 1);
    else if ((event.key === "Enter" || event.key === " ") && this.current >= 0 && this.pixels)
      this.events.choose(this.pixels.index[this.order[this.current]]);
    else return;
    event.preventDefault();
  }
}

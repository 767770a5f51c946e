/**
 * The diagram on screen: drawn as wide as the pane and about as tall as wide (redrawn when the pane is resized),
 * without title, legend and caption inside the SVG — those are HTML under it, so they wrap instead of being cut —
 * and the sample layer as one tab stop whose arrow keys step through the samples in pH order (Home/End to the
 * ends, Enter or Space selects the row). Large sets go on the canvas layer (sample-canvas.ts), which behaves alike.
 */
import { escapeXml, renderDiagram, type DiagramSvgOptions, type KeyEntry, type PlottedSample } from "../diagram";
import { legendHtml, type LegendOptions } from "./pane-legend";
import { CANVAS_SAMPLES, SampleCanvas } from "./sample-canvas";

/** Everything of a drawing except its size. */
export type DrawingOptions = Omit<DiagramSvgOptions, "width" | "height" | "chrome" | "omitSamples">;

export interface Drawing {
  readonly options: DrawingOptions;
  readonly legend: LegendOptions;
  readonly caption: readonly string[];
  /** A second metal drawn beside (or under) the first, with the same window and samples. */
  readonly compare?: DrawingOptions;
}

export interface ViewEvents {
  show(sample: PlottedSample): void;
  choose(sample: PlottedSample): void;
}

/** Height of the on-screen drawing for a width: as tall as wide, at most 1.1× in very narrow panes. */
export function screenHeight(width: number): number {
  return Math.round(width * (width < 400 ? 1.08 : 0.95));
}

const byId = (id: string) => document.getElementById(id) as HTMLElement;

export class DiagramView {
  private drawing: Drawing | null = null;
  private width = 0;
  private readonly canvas: SampleCanvas;
  private order: number[] = [];
  private current = -1;

  constructor(
    private readonly container: HTMLElement,
    private readonly events: ViewEvents,
  ) {
    this.canvas = new SampleCanvas(container, {
      show: (i) => this.sample(i) && this.events.show(this.sample(i)!),
      choose: (i) => this.sample(i) && this.events.choose(this.sample(i)!),
    });
    if (typeof ResizeObserver !== "undefined") {
      let frame = 0;
      new ResizeObserver(() => {
        cancelAnimationFrame(frame);
        frame = requestAnimationFrame(() => this.resized());
      }).observe(container);
    }
    container.addEventListener("keydown", (event) => this.key(event));
  }

  private sample(i: number): PlottedSample | undefined {
    return this.drawing?.options.samples[i];
  }

  /** The width to draw at: the container's, at least 240 px. */
  private containerWidth(): number {
    return Math.max(240, Math.floor(this.container.clientWidth || 640));
  }

  private resized(): void {
    if (this.drawing && this.containerWidth() !== this.width) this.render();
  }

  show(drawing: Drawing): void {
    this.drawing = drawing;
    this.render();
    this.showHtml(drawing);
  }

  /** Draws at the container's width; returns the numbered key. */
  private render(): void {
    const d = this.drawing;
    if (!d) return;
    this.width = this.containerWidth();
    const height = screenHeight(this.width);
    const samples = d.options.samples;
    const onCanvas = samples.length > CANVAS_SAMPLES;
    const main = renderDiagram({ ...d.options, width: this.width, height, chrome: false, omitSamples: onCanvas });
    this.canvas.clear();
    this.container.innerHTML = main.svg;
    this.container.dataset.drawnWidth = String(this.width);
    if (onCanvas) this.canvas.draw(this.container.querySelector("svg")!, samples);
    this.container.dataset.samplesDrawn = String(samples.length);
    this.container.dataset.samplesOn = onCanvas ? "canvas" : "svg";
    this.order = [...this.container.querySelectorAll<SVGElement>(".rc-sample")]
      .map((n) => Number(n.getAttribute("data-i")))
      .sort((a, b) => samples[a].pH - samples[b].pH || samples[a].E - samples[b].E);
    this.current = -1;
    this.showKey(main.key);
    byId("diagram-subtitle").textContent = main.subtitle;
    const compare = byId("diagram-compare");
    byId("diagrams").classList.toggle("two", d.compare !== undefined);
    compare.hidden = d.compare === undefined;
    if (d.compare) {
      const other = renderDiagram({ ...d.compare, width: this.width, height, chrome: false, sampleTitles: true });
      // the comparison's markers are for reading only: the sample layer of the first drawing holds the tab stop
      compare.innerHTML = `<h3 class="diagram-title">${escapeXml(other.title)}</h3>${other.svg.replace(' tabindex="0"', "")}`;
    } else compare.replaceChildren();
  }

  private showKey(key: readonly KeyEntry[]): void {
    byId("region-key").innerHTML = key
      .map(
        (k) =>
          `<li value="${k.number}" data-formula="${escapeXml(k.formula)}">${escapeXml(k.formula)}${k.marked ? "" : " (too small to mark at this zoom)"}</li>`,
      )
      .join("");
  }

  private showHtml(d: Drawing): void {
    byId("diagram-title").textContent = d.options.title ?? "";
    byId("legend").innerHTML = legendHtml(d.legend);
    byId("diagram-caption").textContent = d.caption.join(" ");
  }

  /** Arrow keys inside the SVG sample layer. */
  private key(event: KeyboardEvent): void {
    const layer = event.target instanceof Element ? event.target.closest(".rc-samples") : null;
    if (!layer || this.order.length === 0) return;
    const moves: Record<string, number> = {
      ArrowRight: 1,
      ArrowDown: 1,
      ArrowLeft: -1,
      ArrowUp: -1,
      PageDown: 20,
      PageUp: -20,
    };
    let next = this.current;
    if (event.key in moves) next = this.current < 0 ? 0 : this.current + moves[event.key];
    else if (event.key === "Home") next = 0;
    else if (event.key === "End") next = this.order.length - 1;
    else if ((event.key === "Enter" || event.key === " ") && this.current >= 0) {
      event.preventDefault();
      const s = this.sample(this.order[this.current]);
      if (s) this.events.choose(s);
      return;
    } else return;
    event.preventDefault();
    this.step(layer, Math.max(0, Math.min(this.order.length - 1, next)));
  }

  private step(layer: Element, position: number): void {
    this.container.querySelector(".rc-sample.rc-current")?.classList.remove("rc-current");
    this.current = position;
    const i = this.order[position];
    const node = this.container.querySelector(`#rc-s-${i}`);
    node?.classList.add("rc-current");
    // on top of its neighbours while current
    if (node) node.parentNode?.appendChild(node);
    layer.setAttribute("aria-activedescendant", `rc-s-${i}`);
    const s = this.sample(i);
    if (s) this.events.show(s);
  }
}

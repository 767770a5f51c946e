/**
 * The solubility chart on screen (taskpane.html #solubility-section): the sample chosen in its list (or by Enter or
 * a click on its marker in the diagram), the threshold typed in µg/L, and the chart drawn at the container's width
 * by src/diagram. The numbers come from REDOX.DISSOLVED through dissolved-curve.ts; the view only reads controls,
 * keeps the last curve while only the threshold changes, and puts the SVG and its summary in the page.
 */
import {
  renderSolubilityChart,
  solubilityCurve,
  type AxisWindow,
  type PlottedSample,
  type SolubilityCurve,
} from "../diagram";
import { curveProblem, dissolvedAlongPH } from "./dissolved-curve";
import { $, input, select } from "./pane-dom";

/** Default threshold, µg/L: the lead parametric value of Directive (EU) 2020/2184 (10 µg/L until 2036). */
export const DEFAULT_THRESHOLD = 10;

/**
 * At most this many samples are listed to choose from; the others are chosen on the diagram (Enter or a click on the
 * marker), which adds them to the list. A list of every sample of a 10 000-row log was unusable to scroll and cost
 * the pane a style and layout of every entry whenever the drawn rows changed.
 */
export const LISTED_SAMPLES = 300;

/** What the chart is drawn for besides the sample: metal, its name, the diagram's pH range and temperature. */
export interface ChartContext {
  readonly metal: string;
  readonly metalName: string;
  readonly window: AxisWindow;
  readonly celsius: number;
}

/** The typed threshold: a positive number (decimal comma allowed), null when blank, or a message. */
export function readThreshold(text: string): number | null | { error: string } {
  const trimmed = text.trim();
  if (trimmed === "") return null;
  const value = Number(trimmed.replace(",", "."));
  return value > 0 && Number.isFinite(value) ? value : { error: `Threshold: a number of µg/L above 0, got "${text}".` };
}

/** Height of the chart for a width: a small chart under the diagram. */
export function chartHeight(width: number): number {
  return Math.max(180, Math.min(320, Math.round(width * 0.62)));
}

export class SolubilityView {
  private samples: readonly PlottedSample[] = [];
  private listKey = "";
  private context: ChartContext | null = null;
  private curve: { key: string; curve: SolubilityCurve } | null = null;
  private width = 0;

  constructor(private readonly container: HTMLElement) {
    input("solubility-threshold").value = String(DEFAULT_THRESHOLD);
    input("solubility-threshold").addEventListener("input", () => this.render());
    select("solubility-sample").addEventListener("change", () => this.render());
    if (typeof ResizeObserver !== "undefined") {
      let frame = 0;
      new ResizeObserver(() => {
        cancelAnimationFrame(frame);
        frame = requestAnimationFrame(() => this.containerWidth() !== this.width && this.render());
      }).observe(container);
    }
  }

  private containerWidth(): number {
    return Math.max(240, Math.floor(this.container.clientWidth || 640));
  }

  /** New samples or conditions: the list of samples (the chosen one kept when still drawn), then the chart. */
  show(samples: readonly PlottedSample[], context: ChartContext): void {
    this.samples = samples;
    this.context = context;
    $("solubility-section").hidden = samples.length === 0;
    $("solubility-heading").textContent = `Dissolved ${context.metalName} along pH, at the sample's potential`;
    const key = samples.map((s) => s.row).join(",");
    if (key !== this.listKey) this.fillList(samples);
    this.listKey = key;
    this.render();
  }

  /** The sample chosen in the diagram (Enter or a click on its marker); listed first if the list did not hold it. */
  follow(sample: PlottedSample): void {
    if (!this.samples.some((s) => s.row === sample.row)) return;
    const list = select("solubility-sample");
    const value = String(sample.row);
    if (![...list.options].some((o) => o.value === value)) list.prepend(sampleOption(sample));
    list.value = value;
    this.render();
  }

  /** The first LISTED_SAMPLES samples (and the chosen one, kept), then a line saying how to reach the others. */
  private fillList(samples: readonly PlottedSample[]): void {
    const list = select("solubility-sample");
    const keep = list.value;
    const listed = samples.slice(0, LISTED_SAMPLES);
    const kept = samples.find((s) => String(s.row) === keep);
    if (kept && !listed.includes(kept)) listed.unshift(kept);
    const options = listed.map(sampleOption);
    const more = samples.length - listed.length;
    if (more > 0) {
      const note = new Option(`… ${more.toLocaleString("en")} more: choose them on the diagram`, "");
      note.disabled = true;
      options.push(note);
    }
    list.replaceChildren(...options);
    if (kept) list.value = keep;
  }

  private chosen(): PlottedSample | undefined {
    const row = select("solubility-sample").value;
    return this.samples.find((s) => String(s.row) === row) ?? this.samples[0];
  }

  /** The curve of the chosen sample, computed again only when the sample or the conditions change. */
  private curveFor(sample: PlottedSample, c: ChartContext): SolubilityCurve {
    const water = JSON.stringify([sample.ligands ?? {}, sample.ionicStrength ?? 0]);
    const key = [
      c.metal,
      sample.row,
      sample.pH,
      sample.eSHE,
      sample.celsius,
      water,
      c.window.pHMin,
      c.window.pHMax,
    ].join("|");
    if (this.curve?.key !== key) {
      const evaluate = dissolvedAlongPH(c.metal, sample, c.celsius);
      this.curve = { key, curve: solubilityCurve(c.window.pHMin, c.window.pHMax, sample.pH, evaluate) };
    }
    return this.curve.curve;
  }

  private render(): void {
    const sample = this.chosen();
    const c = this.context;
    if (!sample || !c) return;
    const threshold = readThreshold(input("solubility-threshold").value);
    const problem = curveProblem(c.metal, sample, c.celsius);
    const note = $("solubility-note");
    note.textContent = typeof threshold === "object" && threshold !== null ? threshold.error : (problem ?? "");
    this.width = this.containerWidth();
    const chart = renderSolubilityChart({
      curve: this.curveFor(sample, c),
      sample,
      metalName: c.metalName,
      threshold: typeof threshold === "number" ? threshold : null,
      width: this.width,
      height: chartHeight(this.width),
    });
    this.container.innerHTML = chart.svg;
    this.container.dataset.drawnWidth = String(this.width);
    $("solubility-summary").textContent = chart.summary;
  }
}

/** A sample's entry in the list: its id (or row) and pH. */
function sampleOption(s: PlottedSample): HTMLOptionElement {
  return new Option(`${s.id || `row ${s.row}`} · pH ${s.pH.toFixed(2)}`, String(s.row));
}

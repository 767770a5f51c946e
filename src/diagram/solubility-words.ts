/**
 * The words of the solubility chart (its SVG description, the pane's summary line and the screen-reader text):
 * the sample's conditions, its own value against the threshold, where the curve lies above the threshold and
 * where no solid can form. Host-free string building over the chart model.
 */
import type { PlottedSample } from "./diagram-model";
import { formatActivity } from "./diagram-svg";
import { curveGaps, spansAbove, type SolubilityCurve } from "./solubility-curve";
import { formatTotals } from "./water-words";

/** µg/L as read on the chart: three significant figures, powers of ten beyond 10⁵ and below 0.01. */
export function formatMicrograms(value: number): string {
  if (value === 0) return "0 µg/L";
  if (value >= 1e5 || value < 0.01) return `${formatActivity(Number(value.toPrecision(3)))} µg/L`;
  return `${Number(value.toPrecision(3))} µg/L`;
}

const pHText = (v: number) => Number(v.toFixed(2)).toString();
const spanText = (s: { from: number; to: number }) =>
  s.from === s.to ? `pH ${pHText(s.from)}` : `pH ${pHText(s.from)}–${pHText(s.to)}`;

/** "E 0.810 V vs SHE, 7.3 °C, water DIC 0.98 mmol/kg, I 0.008 mol/kg": what the whole curve is computed at. */
export function curveConditions(sample: PlottedSample): string {
  const parts = [`E ${sample.eSHE.toFixed(3)} V vs SHE`];
  if (sample.celsius !== undefined) parts.push(`${Number(sample.celsius.toFixed(1))} °C`);
  const water = sample.ligands ? formatTotals(sample.ligands) : "";
  parts.push(water ? `water ${water}` : "pure water");
  if (sample.ionicStrength) parts.push(`I ${Number(sample.ionicStrength.toPrecision(3))} mol/kg`);
  return parts.join(", ");
}

/** The sample's own value against the threshold, in words. */
function sampleWords(curve: SolubilityCurve, sample: PlottedSample, threshold: number | null): string {
  const who = sample.id ? `${sample.id}, row ${sample.row}` : `row ${sample.row}`;
  const at = `At the sample's pH ${pHText(curve.sample.pH)} (${who})`;
  const v = curve.sample.value;
  if (v === null) return `${at} no solid can form: REDOX.DISSOLVED gives no number.`;
  if (threshold === null) return `${at}: ${formatMicrograms(v)}.`;
  const side = v > threshold ? "above" : v < threshold ? "below" : "at";
  return `${at}: ${formatMicrograms(v)}, ${side} the ${formatMicrograms(threshold)} threshold.`;
}

/** The summary sentences: what is drawn, the sample's value, spans above the threshold, gaps. */
export function solubilitySummary(
  curve: SolubilityCurve,
  sample: PlottedSample,
  metalName: string,
  threshold: number | null,
): string {
  const range = `pH ${pHText(curve.pHMin)}–${pHText(curve.pHMax)}`;
  const out = [`Equilibrium dissolved ${metalName} (µg/L, log scale) along ${range} at ${curveConditions(sample)}.`];
  out.push(sampleWords(curve, sample, threshold));
  if (!curve.sample.inRange) out.push("The sample's pH lies outside the diagram's pH range: its point is not drawn.");
  if (threshold !== null) {
    const above = spansAbove(curve, threshold);
    out.push(
      above.length === 0
        ? `The curve stays at or below the threshold over the whole range.`
        : `Above the threshold at ${above.map(spanText).join(", ")}.`,
    );
  }
  const gaps = curveGaps(curve);
  if (gaps.length > 0) out.push(`No solid can form (no number, no curve) at ${gaps.map(spanText).join(", ")}.`);
  return out.join(" ");
}

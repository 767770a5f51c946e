/**
 * The pane's text panels beside the drawing: the rows' temperature spread, the rows not drawn, the results table
 * and the pure-water boundary equations.
 */
import { FULL_E_LIMIT, hasLigands, LigandTotals, PH_MAX, PH_MIN, type Database, type MetalSystem } from "../chemistry";
import { boundaryEquations, equationText, escapeXml, formatActivity, type PlottedSample } from "../diagram";
import { $ } from "./pane-dom";
import { resultsHtml } from "./results-table";
import { median, readSamples, SkippedRow } from "./sample-table";

/** Temperature spread above which one diagram no longer represents the rows well (°C). */
export const SPREAD_WARNING = 10;

/** The rows' temperature range and median, with a warning when one diagram cannot represent them. */
export function showTemperatureSpread(
  temperatures: number[],
  celsius: number,
  hasTable: boolean,
  manual: boolean,
): void {
  const spread = $("temperature-spread");
  const warning = $("temperature-warning");
  if (temperatures.length === 0) {
    spread.textContent = hasTable ? "No temperature column: the diagram temperature is used for every row." : "";
    warning.hidden = true;
    return;
  }
  const low = Math.min(...temperatures);
  const high = Math.max(...temperatures);
  spread.textContent = `Rows: ${low.toFixed(1)}–${high.toFixed(1)} °C, median ${median(temperatures).toFixed(1)} °C${manual ? "; the diagram uses your value" : ""}.`;
  const wide = high - low > SPREAD_WARNING;
  warning.hidden = !wide;
  warning.textContent = wide
    ? `The rows span ${(high - low).toFixed(1)} °C (more than ${SPREAD_WARNING} °C): one diagram at ${celsius} °C only approximates them — consider drawing warm and cold samples separately.`
    : "";
}

/** The "not drawn" list: unreadable rows and rows the functions refused, with the reason of each. */
export function showSkipped(
  read: ReturnType<typeof readSamples> | null,
  failed: readonly SkippedRow[],
  columnsMissing: boolean,
): void {
  const list = $("skipped");
  list.replaceChildren();
  const skipped = [...(read?.skipped ?? []), ...failed].sort((a, b) => a.row - b.row);
  const parts: string[] = [];
  if (skipped.length === 0) parts.push("None.");
  else parts.push(`${skipped.length} row${skipped.length === 1 ? "" : "s"} with blank or unreadable cells:`);
  if (read && read.otherMetal > 0)
    parts.push(`(${read.otherMetal} rows of other metals are not shown on this diagram.)`);
  if (columnsMissing) parts.push("Choose the pH and potential columns under Columns.");
  $("skipped-summary").textContent = parts.join(" ");
  for (const s of skipped) {
    const item = document.createElement("li");
    item.dataset.row = String(s.row);
    item.textContent = `Row ${s.row}: ${s.reason}`;
    list.append(item);
  }
}

/**
 * The results table and the pure-water boundary equations at the diagram's temperature (`pure`: the ligand-free
 * system); returns the equations as tab-separated text for copying.
 */
export function showResults(
  db: Database,
  samples: readonly PlottedSample[],
  system: MetalSystem,
  pure: MetalSystem,
  celsius: number,
  totals: LigandTotals,
): string {
  $("results-table").innerHTML = resultsHtml(samples);
  const metal = system.element;
  const equations = boundaryEquations(pure, { pHMin: PH_MIN, pHMax: PH_MAX, eMin: -FULL_E_LIMIT, eMax: FULL_E_LIMIT });
  const head = ["between", "and", "boundary (E in V vs SHE)"];
  const rows = equations.map((e) => [e.first, e.second, equationText(e)]);
  $("equations-note").textContent =
    `${db.system(metal)?.title ?? metal} in pure water at ${celsius} °C, dissolved activity ${formatActivity(system.activity)}: each boundary drawn between pH ${PH_MIN} and ${PH_MAX} and −${FULL_E_LIMIT}…+${FULL_E_LIMIT} V vs SHE.` +
    (hasLigands(totals) ? " (The drawing itself includes the water's ligands; these equations do not.)" : "");
  $("equations-table").innerHTML =
    `<thead><tr>${head.map((h) => `<th scope="col">${escapeXml(h)}</th>`).join("")}</tr></thead>` +
    `<tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${escapeXml(c)}</td>`).join("")}</tr>`).join("")}</tbody>`;
  return [head, ...rows].map((r) => r.join("\t")).join("\n") + "\n";
}

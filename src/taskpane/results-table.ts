/**
 * The per-sample results a practitioner copies: row, sample, reading as logged, E vs SHE, species, regime, water
 * margin and equilibrium dissolved metal — as HTML table rows, tab-separated text (pastes into a sheet) and CSV.
 */
import { escapeXml, type PlottedSample } from "../diagram";

export const RESULT_HEADERS = [
  "row",
  "sample",
  "reading as logged",
  "T °C",
  "E vs SHE (V)",
  "species",
  "regime",
  "water margin (V)",
  "dissolved metal (µg/L)",
] as const;

const number = (v: number | null | undefined, digits: number) =>
  v === null || v === undefined || !Number.isFinite(v) ? "" : Number(v.toPrecision(digits)).toString();

export function resultCells(s: PlottedSample): string[] {
  return [
    String(s.row),
    s.id,
    s.reading ?? "",
    number(s.celsius, 4),
    s.eSHE.toFixed(4),
    s.formula,
    s.regime,
    s.waterMargin.toFixed(3),
    s.equilibrium === null ? "none (no stable solid)" : number(s.equilibrium, 4),
  ];
}

const csvField = (text: string) => (/[",\n\r]|^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text);

export function resultsCsv(samples: readonly PlottedSample[]): string {
  return (
    [RESULT_HEADERS.join(","), ...samples.map((s) => resultCells(s).map(csvField).join(","))].join("\r\n") + "\r\n"
  );
}

export function resultsTsv(samples: readonly PlottedSample[]): string {
  return (
    [
      RESULT_HEADERS.join("\t"),
      ...samples.map((s) =>
        resultCells(s)
          .map((c) => c.replace(/[\t\r\n]+/g, " "))
          .join("\t"),
      ),
    ].join("\n") + "\n"
  );
}

/** Table rows; at most `limit` rows are written (the CSV holds them all). */
export function resultsHtml(samples: readonly PlottedSample[], limit = 500): string {
  const numeric = new Set([0, 3, 4, 7, 8]);
  const head = `<thead><tr>${RESULT_HEADERS.map((h) => `<th scope="col">${escapeXml(h)}</th>`).join("")}</tr></thead>`;
  const rows = samples
    .slice(0, limit)
    .map(
      (s) =>
        `<tr>${resultCells(s)
          .map((c, i) => `<td${numeric.has(i) ? ' class="num"' : ""}>${escapeXml(c)}</td>`)
          .join("")}</tr>`,
    )
    .join("");
  const more =
    samples.length > limit
      ? `<tfoot><tr><td colspan="${RESULT_HEADERS.length}">${samples.length - limit} more rows in the CSV.</td></tr></tfoot>`
      : "";
  return head + `<tbody>${rows}</tbody>` + more;
}

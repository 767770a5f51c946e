/** The summary a run prints: rows, speed, where the results went, rows with bad or blank cells, regime counts. */

import { REGIMES } from "../chemistry";

const PROGRAM = "redox-cells";

export interface RunSummary {
  input: string;
  output: string;
  rows: number;
  errorRows: number;
  blankRows: number;
  messages: number;
  seconds: number;
  /** Regime counts per column prefix ("Fe", "metal"). */
  regimes: Record<string, Record<string, number>>;
  svgFiles: string[];
  header: string[];
  /** Lines on how the inputs were read (the ionic strength used), printed after the results line. */
  notes?: string[];
}

export function summaryText(s: RunSummary): string {
  const lines: string[] = [];
  const rate = s.seconds > 0 ? Math.round(s.rows / s.seconds) : s.rows;
  lines.push(
    `${PROGRAM}: ${s.rows.toLocaleString("en-US")} rows from ${s.input} in ${s.seconds.toFixed(1)} s (${rate.toLocaleString("en-US")} rows/s)`,
  );
  lines.push(`  results:  ${s.output === "-" ? "standard output" : s.output}`);
  for (const note of s.notes ?? []) lines.push(`  ${note}`);
  if (s.errorRows > 0)
    lines.push(
      `  rows with bad cells: ${s.errorRows} (error codes in their result cells, reasons in the errors column)`,
    );
  if (s.blankRows > 0) lines.push(`  rows with blank or missing inputs: ${s.blankRows} (results left blank)`);
  const prefixes = Object.keys(s.regimes);
  if (prefixes.length > 0) {
    lines.push(`  ${"".padEnd(8)}${REGIMES.map((r) => r.padStart(12)).join("")}`);
    for (const p of prefixes)
      lines.push(`  ${p.padEnd(8)}${REGIMES.map((r) => String(s.regimes[p][r] ?? 0).padStart(12)).join("")}`);
  }
  if (s.svgFiles.length > 0) lines.push(`  diagrams: ${s.svgFiles.join(", ")}`);
  return lines.join("\n") + "\n";
}

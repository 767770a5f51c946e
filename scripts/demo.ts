// `npm run demo`: runs the redox-cells command line on the invented demo log (data/demo/sample-log.csv), writes
// out/results.csv and one diagram SVG per pipe metal, and prints a short summary: samples per regime per site,
// the samples flagged corrosive, and where the files are. No build step is needed.

import { readFileSync } from "node:fs";
import { parse } from "csv-parse/sync";
import { runCommand } from "../src/cli/run";

const INPUT = "data/demo/sample-log.csv";
const OUTPUT = "out/results.csv";

async function main(): Promise<number> {
  console.log("Redox Cells demo — the Brackenholm Water Cooperative (an INVENTED utility; every value is fictional)\n");
  const { code, summary } = await runCommand(
    [INPUT, "-o", OUTPUT, "--svg-dir", "out", "--max-messages", "20", "--quiet"],
    {
      stdout: process.stdout,
      stderr: process.stderr,
    },
  );
  if (!summary || code > 1) {
    console.error(`demo: the command line failed (exit code ${code})`);
    return code || 1;
  }

  const rows = parse(readFileSync(OUTPUT, "utf8"), { columns: true, skip_empty_lines: true }) as Record<
    string,
    string
  >[];
  const regimes = ["immunity", "passivation", "corrosion"];
  const bySite = new Map<string, { metal: string; counts: Record<string, number>; other: number }>();
  for (const r of rows) {
    const entry = bySite.get(r.site) ?? { metal: r.pipe_metal, counts: {}, other: 0 };
    bySite.set(r.site, entry);
    if (regimes.includes(r.metal_regime)) entry.counts[r.metal_regime] = (entry.counts[r.metal_regime] ?? 0) + 1;
    else entry.other++;
  }

  const withCarbonate = rows.filter((r) => Number(r.DIC_mol_kg) > 0).length;
  console.log(
    `\nEach sample is evaluated in its own water: carbonate (DIC) from its alkalinity, pH and temperature (REDOX.DIC) for ${withCarbonate} of ${rows.length} samples.`,
  );
  console.log(`\nSamples per regime of each site's pipe metal (${rows.length} samples):`);
  const width = Math.max(...[...bySite.keys()].map((s) => s.length)) + 2;
  console.log(
    `  ${"site".padEnd(width)}${"metal".padEnd(7)}${regimes.map((r) => r.padStart(13)).join("")}${"not evaluated".padStart(15)}`,
  );
  for (const [site, e] of [...bySite].sort((a, b) => a[0].localeCompare(b[0]))) {
    console.log(
      `  ${site.padEnd(width)}${e.metal.padEnd(7)}${regimes.map((r) => String(e.counts[r] ?? 0).padStart(13)).join("")}${String(e.other).padStart(15)}`,
    );
  }

  const corrosive = rows.filter((r) => r.metal_regime === "corrosion");
  console.log(`\nSamples flagged corrosive (dissolved ${"species"} of the pipe metal dominant): ${corrosive.length}`);
  const shown = corrosive.slice(0, 15);
  for (const r of shown) {
    console.log(
      `  ${r.sample_id.padEnd(12)}${r.date}  ${r.site.padEnd(width)}pH ${r.pH.padStart(5)}  E ${Number(r.E_SHE_V).toFixed(3).padStart(6)} V vs SHE  → ${r.metal_species}`,
    );
  }
  if (corrosive.length > shown.length)
    console.log(`  … and ${corrosive.length - shown.length} more (filter metal_regime = corrosion in ${OUTPUT})`);

  console.log(
    `\nRows with deliberately mistyped cells: ${summary.errorRows}; rows with blank inputs: ${summary.blankRows} (see the errors column).`,
  );
  console.log(`\nFiles:\n  ${OUTPUT}${summary.svgFiles.map((f) => `\n  ${f}`).join("")}`);
  console.log(
    "\nThermodynamics says which state is stable, not how fast a pipe corrodes. For lead and copper in drinking water, confirm by\nlaboratory analysis and defer to local codes, regulators and licensed corrosion professionals.",
  );
  return 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  },
);

/**
 * Throughput with ligands: the batch kernel on a lead system in a water with carbonate and sulfur (several ligand
 * cells), next to the same system without ligands, and the cost of building the ligand system. Prints figures;
 * never passes or fails on time. Call from bench/index.ts as `rows.push(...benchLigands())`, or run alone with
 * `npx tsx bench/ligands.ts`.
 */
import { getDatabase } from "../src/chemistry/database";
import { buildLigandSystem } from "../src/chemistry/ligand-system";
import { buildSystem, dominantSpeciesBatch } from "../src/chemistry/system";
import { BenchRow, best, fmt } from "./engine";

export function benchLigands(): BenchRow[] {
  const db = getDatabase();
  const n = 1_000_000;
  const pH = new Float64Array(n);
  const E = new Float64Array(n);
  let seed = 7;
  const next = () => ((seed = (seed * 1103515245 + 12345) >>> 0) / 4294967296);
  for (let i = 0; i < n; i++) {
    pH[i] = 2 + 10 * next();
    E[i] = -1 + 2 * next();
  }
  const out = new Int32Array(n);
  const options = { celsius: 25, activity: 1e-6 };
  const totals = { carbonate: 2e-3, sulfur: 1e-4 };
  const plain = buildSystem(db, "Pb", options);
  const water = buildLigandSystem(db, "Pb", options, totals);

  const tPlain = best(5, () => dominantSpeciesBatch(plain, pH, E, out));
  const tWater = best(5, () => dominantSpeciesBatch(water, pH, E, out));
  const tBuild = best(5, () => buildLigandSystem(db, "Pb", options, totals));
  return [
    {
      name: `(l) batch kernel, Pb with DIC 2 mM + S 0.1 mM (${water.cells.length} cells), 1 M rows`,
      figure: `${fmt(n / (tWater / 1000))} rows/s (${tWater.toFixed(1)} ms)`,
      target: "figure only",
      met: null,
    },
    {
      name: "(l′) same kernel, Pb without ligands, 1 M rows",
      figure: `${fmt(n / (tPlain / 1000))} rows/s (${tPlain.toFixed(1)} ms)`,
      target: "≥ 10 M rows/s",
      met: n / (tPlain / 1000) >= 1e7,
    },
    { name: "(l″) build the Pb + carbonate + sulfur system", figure: `${tBuild.toFixed(2)} ms`, target: "figure only", met: null },
  ];
}

if (process.argv[1] && /ligands\.ts$/.test(process.argv[1])) {
  for (const row of benchLigands()) console.log(`${row.name}: ${row.figure}`);
}

/**
 * Throughput of the stability engine (GUIDE §6). Prints figures; never passes or fails on time.
 */
import { getDatabase } from "../src/chemistry/database";
import { diagramRegions } from "../src/chemistry/predominance";
import { buildSystem, dominantSpecies, dominantSpeciesBatch } from "../src/chemistry/system";
import { mulberry32 } from "../src/cli/seeded-random";
import { speciesAt } from "../src/functions/stability-functions";

export interface BenchRow {
  name: string;
  figure: string;
  target: string;
  met: boolean | null;
}

/** Fastest of `runs` calls, ms. */
export function best(runs: number, fn: () => void): number {
  let fastest = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    fn();
    fastest = Math.min(fastest, performance.now() - start);
  }
  return fastest;
}

export function benchEngine(): BenchRow[] {
  const db = getDatabase();
  const rows: BenchRow[] = [];
  const next = mulberry32(42);

  // (a) batch kernel: 1 M rows of typed arrays through one iron system
  const n = 1_000_000;
  const pH = new Float64Array(n);
  const E = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    pH[i] = 2 + 10 * next();
    E[i] = -1 + 2 * next();
  }
  const out = new Int32Array(n);
  const system = buildSystem(db, "Fe", { celsius: 25, activity: 1e-6 });
  dominantSpeciesBatch(system, pH, E, out); // warm-up
  const batchMs = best(5, () => dominantSpeciesBatch(system, pH, E, out));
  const batchRate = n / (batchMs / 1000);
  rows.push({ name: `(a) batch kernel, Fe, ${n.toLocaleString("en")} rows`, figure: `${fmt(batchRate)} rows/s (${batchMs.toFixed(1)} ms)`, target: "≥ 10 M rows/s", met: batchRate >= 10e6 });

  // (b) naive baseline: rebuild the system for every row (measured on a subset, the rate is per row)
  const naiveRows = 2_000;
  const naiveMs = best(3, () => {
    for (let i = 0; i < naiveRows; i++) {
      const s = buildSystem(db, "Fe", { celsius: 25, activity: 1e-6 });
      dominantSpecies(s, pH[i], E[i]);
    }
  });
  const naiveRate = naiveRows / (naiveMs / 1000);
  const ratio = batchRate / naiveRate;
  rows.push({ name: `(b) naive rebuild per row (${naiveRows.toLocaleString("en")} rows)`, figure: `${fmt(naiveRate)} rows/s; batch is ${fmt(ratio)}× faster`, target: "batch ≥ 20× naive", met: ratio >= 20 });

  // (c) REDOX.SPECIES through the worksheet wrapper over a 100 k-row range (mixed temperatures in 5 groups), run
  // from the TypeScript sources: tsx turns every imported binding into a getter call, so this row runs slower than
  // the built bundle the spreadsheet loads — row (c′) in index.ts measures that one.
  const m = 100_000;
  const pHRange = Array.from({ length: m }, (_, i) => [pH[i]]);
  const eRange = Array.from({ length: m }, (_, i) => [E[i]]);
  const tRange = Array.from({ length: m }, (_, i) => [15 + 5 * (i % 5)]);
  for (let k = 0; k < 3; k++) speciesAt("Fe", pHRange, eRange, tRange); // warm-up: the JIT compiles the loop
  const wrapperMs = best(5, () => speciesAt("Fe", pHRange, eRange, tRange));
  const wrapperRate = m / (wrapperMs / 1000);
  rows.push({ name: `(c) REDOX.SPECIES wrapper from the sources under tsx, ${m.toLocaleString("en")} rows`, figure: `${fmt(wrapperRate)} rows/s (${wrapperMs.toFixed(1)} ms)`, target: "≥ 1 M rows/s", met: wrapperRate >= 1e6 });

  // (d) polygons of one diagram, per metal (the slowest reported)
  let slowest = 0;
  let slowestMetal = "";
  for (const metal of db.metals()) {
    const s = buildSystem(db, metal, { celsius: 25, activity: 1e-6 });
    const ms = best(5, () => diagramRegions(s, { pHMin: -2, pHMax: 16, eMin: -2, eMax: 2.5 }));
    if (ms > slowest) {
      slowest = ms;
      slowestMetal = metal;
    }
  }
  rows.push({ name: "(d) diagram polygons, one system (slowest metal)", figure: `${slowest.toFixed(3)} ms (${slowestMetal})`, target: "< 5 ms", met: slowest < 5 });

  const buildMs = best(5, () => buildSystem(db, "Fe", { celsius: 37, activity: 1e-5 }));
  rows.push({ name: "system build, Fe (for reference)", figure: `${buildMs.toFixed(3)} ms`, target: "—", met: null });
  return rows;
}

export function fmt(x: number): string {
  if (x >= 1e6) return `${(x / 1e6).toFixed(2)} M`;
  if (x >= 1e3) return `${(x / 1e3).toFixed(1)} k`;
  return x.toFixed(1);
}

/**
 * Throughput of the stability functions as users call them: the built bundle's worksheet wrappers over ranges (the
 * way the spreadsheet calls an array formula), pure water against waters of their own per row, with the ratios
 * measured in one run, in CPU time. Prints figures; never passes or fails on time.
 */
import { getDatabase } from "../src/chemistry/database";
import { diagramRegions } from "../src/chemistry/predominance";
import { buildSystem } from "../src/chemistry/system";
import { mulberry32 } from "../src/cli/seeded-random";

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

type Fn = (...args: unknown[]) => unknown;
type Column = number[][];

/** Fastest of `runs` calls in CPU time (user + system), ms: less disturbed by other processes than wall time. */
function bestCpu(runs: number, fn: () => void): number {
  let fastest = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = process.cpuUsage();
    fn();
    const used = process.cpuUsage(start);
    fastest = Math.min(fastest, (used.user + used.system) / 1000);
  }
  return fastest;
}

/** Steady-state rows/s of `call` over `rows` rows, CPU time: three warm-up calls, then the best of seven. */
function rate(rows: number, call: () => void): number {
  for (let k = 0; k < 3; k++) call();
  return rows / (bestCpu(7, call) / 1000);
}

/** Columns of a lab export: pH, E, and each row's own temperature, DIC, chloride, sulfate and ionic strength. */
function columns(rows: number): Record<string, Column> {
  const next = mulberry32(42);
  const col = (f: () => number): Column => Array.from({ length: rows }, () => [f()]);
  return {
    pH: col(() => 5.5 + 4 * next()),
    E: col(() => -0.6 + 1.4 * next()),
    T: col(() => 2 + 35 * next()),
    co3: col(() => 2e-4 + 5e-3 * next()),
    cl: col(() => 1e-4 + 3e-3 * next()),
    s: col(() => 1e-5 + 1e-3 * next()),
    I: col(() => 1e-3 + 2e-2 * next()),
  };
}

/** Stability-function rows through the bundle's functions (`get(name)`), Pb, ratios against pure water. */
export function benchStability(get: (name: string) => Fn | undefined, rows = 50_000): BenchRow[] {
  const species = get("SPECIES");
  const boundary = get("BOUNDARY");
  const dissolved = get("DISSOLVED");
  const assess = get("ASSESS");
  if (!species || !boundary || !dissolved || !assess)
    return [{ name: "stability functions", figure: "not registered", target: "—", met: false }];
  const c = columns(rows);
  const out: BenchRow[] = [];
  const n = rows.toLocaleString("en");
  const pure = rate(rows, () => species("Pb", c.pH, c.E, 25));
  out.push({
    name: `SPECIES, Pb, pure water, one temperature (${n} rows)`,
    figure: `${fmt(pure)} rows/s`,
    target: "≥ 1 M rows/s",
    met: pure >= 1e6,
  });
  const perRow = (label: string, r: number, ref: number, target = 4) => {
    const ratio = ref / r;
    out.push({
      name: label,
      figure: `${fmt(r)} rows/s, ${ratio.toFixed(2)}× the cost`,
      target: `≤ ${target}×`,
      met: ratio <= target,
    });
  };
  perRow(
    "SPECIES, each row its own temperature",
    rate(rows, () => species("Pb", c.pH, c.E, c.T)),
    pure,
  );
  perRow(
    "SPECIES, each row its own carbonate",
    rate(rows, () => species("Pb", c.pH, c.E, 25, undefined, c.co3)),
    pure,
  );
  const water = rate(rows, () => species("Pb", c.pH, c.E, c.T, undefined, c.co3, c.cl, c.s, undefined, c.I));
  perRow("SPECIES, each row its own T, carbonate, chloride, sulfur, I", water, pure);
  perRow(
    "BOUNDARY above, pure water (vs SPECIES)",
    rate(rows, () => boundary("Pb", c.pH, c.E, 25)),
    pure,
  );
  perRow(
    "DISSOLVED, pure water (vs SPECIES)",
    rate(rows, () => dissolved("Pb", c.pH, c.E, 25)),
    pure,
  );
  perRow(
    "BOUNDARY above, own water per row (vs SPECIES same)",
    rate(rows, () => boundary("Pb", c.pH, c.E, c.T, undefined, c.co3, c.cl, c.s, undefined, c.I, 1)),
    water,
  );
  perRow(
    "DISSOLVED, own water per row (vs SPECIES same)",
    rate(rows, () => dissolved("Pb", c.pH, c.E, c.T, c.co3, c.cl, c.s, undefined, c.I)),
    water,
  );
  // the one-call assessment (species, regime, both boundaries, water margin, dissolved metal and its solid)
  perRow(
    "ASSESS, pure water (vs SPECIES)",
    rate(rows, () => assess("Pb", c.pH, c.E, 25)),
    pure,
  );
  perRow(
    "ASSESS, own water per row (vs SPECIES same)",
    rate(rows, () => assess("Pb", c.pH, c.E, c.T, undefined, c.co3, c.cl, c.s, undefined, c.I)),
    water,
  );
  // no cliff: the same column with 100, 1 000 and every row a distinct water
  const distinct = [100, 1000, rows].map((k) => {
    const T = c.T.map((_, i) => c.T[i % k]);
    return rate(rows, () => species("Pb", c.pH, c.E, T, undefined, c.co3, c.cl, c.s, undefined, c.I));
  });
  const spread = Math.max(...distinct) / Math.min(...distinct);
  out.push({
    name: "SPECIES, 100 / 1 000 / all distinct temperatures",
    figure: distinct.map(fmt).join(" / ") + " rows/s",
    target: "no cliff (≤ 1.5×)",
    met: spread <= 1.5,
  });
  // the naive alternative a user has: one formula per row (a single-cell call each), own water per row
  const cells = 5_000;
  const naive = rate(cells, () => {
    for (let i = 0; i < cells; i++)
      species(
        "Pb",
        c.pH[i][0],
        c.E[i][0],
        c.T[i][0],
        undefined,
        c.co3[i][0],
        c.cl[i][0],
        c.s[i][0],
        undefined,
        c.I[i][0],
      );
  });
  out.push({
    name: `naive: one single-cell SPECIES formula per row, own water (${cells.toLocaleString("en")} calls)`,
    figure: `${fmt(naive)} rows/s; the range call is ${(water / naive).toFixed(1)}× faster`,
    target: "—",
    met: null,
  });
  return out;
}

/** Polygons of one pure-water diagram, per metal (the slowest reported). */
export function benchDiagrams(): BenchRow[] {
  const db = getDatabase();
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
  return [
    {
      name: "diagram polygons, one pure-water system (slowest metal)",
      figure: `${slowest.toFixed(3)} ms (${slowestMetal})`,
      target: "< 5 ms",
      met: slowest < 5,
    },
  ];
}

export function fmt(x: number): string {
  if (x >= 1e6) return `${(x / 1e6).toFixed(2)} M`;
  if (x >= 1e3) return `${(x / 1e3).toFixed(1)} k`;
  return x.toFixed(1);
}

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

/** Best CPU time (ms) of each case, measured in interleaved rounds so that load on the machine affects all alike. */
function interleaved(cases: Record<string, () => void>, rounds = 9): Record<string, number> {
  const fastest: Record<string, number> = {};
  for (const [name, call] of Object.entries(cases)) {
    for (let k = 0; k < 3; k++) call(); // warm-up
    fastest[name] = Infinity;
  }
  for (let round = 0; round < rounds; round++)
    for (const [name, call] of Object.entries(cases)) fastest[name] = Math.min(fastest[name], bestCpu(1, call));
  return fastest;
}

/** Stability-function rows through the bundle's functions (`get(name)`), Pb, ratios against pure water. */
export function benchStability(get: (name: string) => Fn | undefined, rows = 50_000): BenchRow[] {
  const species = get("SPECIES");
  const regime = get("REGIME");
  const boundary = get("BOUNDARY");
  const dissolved = get("DISSOLVED");
  const margin = get("WATERMARGIN");
  const assess = get("ASSESS");
  if (!species || !regime || !boundary || !dissolved || !margin || !assess)
    return [{ name: "stability functions", figure: "not registered", target: "—", met: false }];
  const c = columns(rows);
  const water = [c.co3, c.cl, c.s, undefined, c.I] as const;
  const ms = interleaved({
    pure: () => species("Pb", c.pH, c.E, 25),
    ownT: () => species("Pb", c.pH, c.E, c.T),
    ownCarbonate: () => species("Pb", c.pH, c.E, 25, undefined, c.co3),
    ownWater: () => species("Pb", c.pH, c.E, c.T, undefined, ...water),
    boundaryPure: () => boundary("Pb", c.pH, c.E, 25),
    dissolvedPure: () => dissolved("Pb", c.pH, c.E, 25),
    boundaryWater: () => boundary("Pb", c.pH, c.E, c.T, undefined, ...water, 1),
    boundaryBelowWater: () => boundary("Pb", c.pH, c.E, c.T, undefined, ...water, -1),
    dissolvedWater: () => dissolved("Pb", c.pH, c.E, c.T, ...water),
    regimeWater: () => regime("Pb", c.pH, c.E, c.T, undefined, ...water),
    marginWater: () => margin(c.pH, c.E, c.T),
    assessPure: () => assess("Pb", c.pH, c.E, 25),
    assessWater: () => assess("Pb", c.pH, c.E, c.T, undefined, ...water),
  });
  const rate = (name: string) => rows / (ms[name] / 1000);
  const out: BenchRow[] = [];
  const n = rows.toLocaleString("en");
  out.push({
    name: `SPECIES, Pb, pure water, one temperature (${n} rows)`,
    figure: `${fmt(rate("pure"))} rows/s`,
    target: "≥ 1 M rows/s",
    met: rate("pure") >= 1e6,
  });
  const perRow = (label: string, name: string, reference: string, target = 4) => {
    const ratio = ms[name] / ms[reference];
    out.push({
      name: label,
      figure: `${fmt(rate(name))} rows/s, ${ratio.toFixed(2)}× the cost`,
      target: `≤ ${target}×`,
      met: ratio <= target,
    });
  };
  perRow("SPECIES, each row its own temperature", "ownT", "pure");
  perRow("SPECIES, each row its own carbonate", "ownCarbonate", "pure");
  perRow("SPECIES, each row its own T, carbonate, chloride, sulfur, I", "ownWater", "pure");
  perRow("BOUNDARY above, pure water (vs SPECIES)", "boundaryPure", "pure");
  perRow("DISSOLVED, pure water (vs SPECIES)", "dissolvedPure", "pure");
  perRow("BOUNDARY above, own water per row (vs SPECIES same)", "boundaryWater", "ownWater");
  perRow("DISSOLVED, own water per row (vs SPECIES same)", "dissolvedWater", "ownWater");
  // the one-call assessment against what a user would otherwise enter: one column of each function it answers for
  const separate = ["ownWater", "regimeWater", "boundaryWater", "boundaryBelowWater", "marginWater", "dissolvedWater"];
  const separateMs = separate.reduce((sum, name) => sum + ms[name], 0);
  out.push({
    name: "ASSESS, own water per row (vs its six columns as separate functions)",
    figure: `${fmt(rate("assessWater"))} rows/s, ${(ms.assessWater / separateMs).toFixed(2)}× the cost`,
    target: "≤ 1×",
    met: ms.assessWater <= separateMs,
  });
  out.push({
    name: "ASSESS, pure water / own water per row (vs SPECIES same)",
    figure: `${(ms.assessPure / ms.pure).toFixed(1)}× / ${(ms.assessWater / ms.ownWater).toFixed(1)}×`,
    target: "—",
    met: null,
  });
  out.push(distinctConditions(species, c, rows));
  out.push(naiveCells(species, c, rate("ownWater")));
  return out;
}

/** No cliff: the own-water column with 100, 1 000 and every row a distinct temperature. */
function distinctConditions(species: Fn, c: Record<string, Column>, rows: number): BenchRow {
  const columnsOf = [100, 1000, rows].map((k) => c.T.map((_, i) => c.T[i % k]));
  const ms = interleaved(
    Object.fromEntries(
      columnsOf.map((T, k) => [k, () => species("Pb", c.pH, c.E, T, undefined, c.co3, c.cl, c.s, undefined, c.I)]),
    ),
    5,
  );
  const distinct = Object.values(ms).map((t) => rows / (t / 1000));
  const spread = Math.max(...distinct) / Math.min(...distinct);
  return {
    name: "SPECIES, 100 / 1 000 / all distinct temperatures",
    figure: distinct.map(fmt).join(" / ") + " rows/s",
    target: "no cliff (≤ 1.5×)",
    met: spread <= 1.5,
  };
}

/** The naive alternative a user has: one formula per row (a single-cell call each), own water per row. */
function naiveCells(species: Fn, c: Record<string, Column>, rangeRate: number): BenchRow {
  const cells = 5_000;
  const one = (i: number) =>
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
  const ms = interleaved(
    {
      naive: () => {
        for (let i = 0; i < cells; i++) one(i);
      },
    },
    5,
  );
  const naive = cells / (ms.naive / 1000);
  return {
    name: `naive: one single-cell SPECIES formula per row, own water (${cells.toLocaleString("en")} calls)`,
    figure: `${fmt(naive)} rows/s; the range call is ${(rangeRate / naive).toFixed(1)}× faster`,
    target: "—",
    met: null,
  };
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

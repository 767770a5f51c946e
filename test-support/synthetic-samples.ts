/**
 * Deterministic pane samples and sample logs (mulberry32), shared by the pane bench and the browser tests.
 */
import type { SampleInput } from "../src/diagram/diagram-model";
import { mulberry32 } from "../src/cli/seeded-random";

/** Deterministic samples spread over the usual window (mulberry32). */
export function syntheticSamples(count: number, seed = 7): SampleInput[] {
  const next = mulberry32(seed);
  return Array.from({ length: count }, (_, i) => ({
    row: i + 2,
    id: `S-${i + 1}`,
    pH: 4 + 6 * next(),
    eSHE: -0.6 + 1.4 * next(),
  }));
}

/** A sample log as the pane reads it: pH, ORP in mV vs Ag/AgCl (sat.), and with `ownWater` a temperature and alkalinity per row. */
export function syntheticLog(count: number, ownWater: boolean, seed = 7): { headers: string[]; rows: unknown[][] } {
  const next = mulberry32(seed + 1);
  const samples = syntheticSamples(count, seed);
  const headers = ["id", "pH", "ORP (mV) vs AgCl sat", ...(ownWater ? ["temp C", "alkalinity mg/L CaCO3"] : [])];
  const rows = samples.map((s) => [
    s.id,
    // waters with an alkalinity are above its end point (pH 4.5): pH 5–10 there
    Number((ownWater ? 5 + ((s.pH - 4) * 5) / 6 : s.pH).toFixed(2)),
    Math.round((s.eSHE - 0.197) * 1000),
    ...(ownWater ? [Number((4 + 20 * next()).toFixed(1)), Math.round(20 + 180 * next())] : []),
  ]);
  return { headers, rows };
}

// Synthetic CSV logs for the command-line tests and bench: n rows of pH, a potential reading in mV vs a saturated
// Ag/AgCl electrode, temperature on a 0.5 °C grid (so that a handful of systems serve every row, as in real logs)
// and a metal per row. Seeded, so every run writes the same file. Test data only — not the demo scenario.
import { createWriteStream } from "node:fs";
import { once } from "node:events";
import { mulberry32 } from "../src/cli/seeded-random";

export const SYNTHETIC_HEADER = ["id", "pH", "ORP_mV_AgCl_sat", "temp_C", "metal"];
const METALS = ["Fe", "Cu", "Zn", "Pb"];

/** The fields of row i (0-based) of the synthetic log with this seed; rows listed in `bad` get a mistyped pH. */
/** The extra column of a log whose every row has its own water (`ownWater`): alkalinity, mg/L as CaCO3. */
export const SYNTHETIC_WATER_HEADER = "alkalinity_mg_L_CaCO3";

export async function writeSyntheticLog(
  path: string,
  rows: number,
  options: { seed?: number; bad?: ReadonlyMap<number, string>; ownWater?: boolean } = {},
): Promise<void> {
  const random = mulberry32(options.seed ?? 7);
  const out = createWriteStream(path);
  out.write([...SYNTHETIC_HEADER, ...(options.ownWater ? [SYNTHETIC_WATER_HEADER] : [])].join(",") + "\n");
  let chunk = "";
  for (let i = 0; i < rows; i++) {
    const pH = (4 + random() * 8).toFixed(2);
    const orp = Math.round(-400 + random() * 1200);
    const t = (5 + Math.floor(random() * 41) * 0.5).toFixed(1);
    const metal = METALS[Math.floor(random() * METALS.length)];
    const badPH = options.bad?.get(i);
    // a mistyped cell is quoted, as a spreadsheet export quotes text holding the delimiter
    // own water: 20–220 mg/L to 0.01, a distinct total on practically every row
    const water = options.ownWater ? `,${(20 + random() * 200).toFixed(2)}` : "";
    chunk += `S${i + 1},${badPH === undefined ? pH : `"${badPH.replace(/"/g, '""')}"`},${orp},${t},${metal}${water}\n`;
    if (chunk.length > 65536) {
      if (!out.write(chunk)) await once(out, "drain");
      chunk = "";
    }
  }
  out.end(chunk);
  await once(out, "finish");
}

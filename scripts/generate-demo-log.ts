// Writes data/demo/sample-log.csv: an INVENTED year of water-quality samples from a fictional utility,
// the "Brackenholm Water Cooperative". Nothing here is measured data. The script is deterministic (seeded
// PRNG), so re-running it reproduces the committed file byte for byte.
//
// What the values try to look like (common practice, not a source for any check):
// - pH 6.8–8.2 in normal operation; ORP of chlorinated water roughly +450…+700 mV against a saturated
//   Ag/AgCl electrode, falling towards +100…+300 mV at dead ends where the disinfectant residual is lost;
// - water temperature following the seasons (about 4 °C in winter to 20 °C in late summer);
// - alkalinity 20–150 mg/L as CaCO3 depending on the source blend;
// - metal results in µg/L that rise when the water is more aggressive (low pH, low alkalinity);
// - two invented incidents: ten days in March when the pH-correction dosing at the works failed (pH about 6.2 at
//   every site), and a summer of stagnation at the Old Town dead end (low ORP, iron pick-up);
// - a few blank cells, a decimal comma, a typo, "<0.5"-style below-detection results, as real logs have.
//
// Usage: npx tsx scripts/generate-demo-log.ts [output path]

import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { mulberry32 } from "../src/cli/seeded-random";

const random = mulberry32(20250117);

/** Standard normal deviate by Box–Muller. */
function gaussian(): number {
  const u = 1 - random();
  const v = random();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}

function clamp(x: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, x));
}

interface Site {
  /** Site name as written in the log. */
  name: string;
  /** Short code used in the sample id. */
  code: string;
  pipe: string;
  /** Chemical symbol of the pipe metal the site is watched for. */
  metal: "Fe" | "Cu" | "Pb" | "Zn" | "Ni" | "Al";
  pH: number;
  orp: number;
  alkalinity: number;
  /** Temperature offset from the network mean (°C). */
  dT: number;
  /** Days between routine samples. */
  interval: number;
}

const SITES: Site[] = [
  {
    name: "Brackenholm Works outlet",
    code: "BWO",
    pipe: "stainless / nickel-alloy plant line",
    metal: "Ni",
    pH: 7.6,
    orp: 640,
    alkalinity: 95,
    dT: 0.5,
    interval: 7,
  },
  {
    name: "Eastgate trunk main",
    code: "ETM",
    pipe: "ductile iron, cement-lined",
    metal: "Fe",
    pH: 7.5,
    orp: 590,
    alkalinity: 92,
    dT: 0.3,
    interval: 7,
  },
  {
    name: "Old Town dead end",
    code: "OTD",
    pipe: "cast iron, unlined",
    metal: "Fe",
    pH: 7.3,
    orp: 420,
    alkalinity: 88,
    dT: 1.2,
    interval: 7,
  },
  {
    name: "Mill Lane",
    code: "MLL",
    pipe: "lead service line",
    metal: "Pb",
    pH: 7.2,
    orp: 520,
    alkalinity: 40,
    dT: 0.8,
    interval: 14,
  },
  {
    name: "Orchard Rise",
    code: "ORR",
    pipe: "copper service lines",
    metal: "Cu",
    pH: 7.1,
    orp: 560,
    alkalinity: 35,
    dT: 1.0,
    interval: 14,
  },
  {
    name: "Quayside estate",
    code: "QSE",
    pipe: "galvanised steel (zinc)",
    metal: "Zn",
    pH: 7.4,
    orp: 540,
    alkalinity: 70,
    dT: 0.9,
    interval: 14,
  },
  {
    name: "Fellside clarifier",
    code: "FSC",
    pipe: "aluminium launders",
    metal: "Al",
    pH: 7.0,
    orp: 610,
    alkalinity: 60,
    dT: -0.5,
    interval: 7,
  },
];

const METAL_COLUMNS = ["Fe", "Cu", "Pb", "Zn", "Ni", "Al"] as const;
type Metal = (typeof METAL_COLUMNS)[number];

/** Typical background (µg/L) of each metal at each site's tap, before aggressiveness scaling. */
function background(site: Site, metal: Metal): number {
  const base: Record<Metal, number> = { Fe: 40, Cu: 15, Pb: 0.8, Zn: 25, Ni: 2, Al: 30 };
  return site.metal === metal ? base[metal] * 4 : base[metal];
}

const START = Date.UTC(2025, 0, 6); // first Monday of 2025
const DAY = 86_400_000;

/** Seasonal water temperature (°C): coldest in early February, warmest in mid-August. */
function seasonalTemperature(day: number): number {
  return 12 - 8 * Math.cos((2 * Math.PI * (day - 35)) / 365);
}

function fmt(x: number, digits: number): string {
  return x.toFixed(digits);
}

interface Row {
  cells: string[];
  day: number;
  siteIndex: number;
}

const header = [
  "site",
  "pipe_material",
  "pipe_metal",
  "sample_id",
  "date",
  "pH",
  "ORP_mV_AgCl_sat",
  "temp_C",
  "alkalinity_mg_L_CaCO3",
  ...METAL_COLUMNS.map((m) => `${m}_ug_L`),
  "note",
];

const rows: Row[] = [];
SITES.forEach((site, siteIndex) => {
  let serial = 1;
  for (let day = siteIndex % 3; day < 364; day += site.interval) {
    const jitterDay = day + Math.floor(random() * 2);
    const dosingFailure = jitterDay >= 63 && jitterDay < 74; // 10–20 March
    const stagnation = site.code === "OTD" && jitterDay >= 175 && jitterDay < 250; // summer at the dead end
    const temperature = clamp(seasonalTemperature(jitterDay) + site.dT + 0.6 * gaussian(), 0.5, 26);
    let pH = site.pH + 0.12 * gaussian();
    let orp = site.orp + 35 * gaussian() - 4 * (temperature - 12); // residual decays faster when warm
    let alkalinity = site.alkalinity * (1 + 0.08 * gaussian());
    let note = "";
    if (dosingFailure) {
      pH = 6.2 + 0.15 * gaussian();
      alkalinity *= 0.55;
      note = "works pH-correction dosing failure";
    }
    if (stagnation) {
      orp = 120 + 60 * gaussian();
      note = note ? `${note}; low residual` : "low residual, discoloured water complaint";
    }
    pH = clamp(pH, 5.6, 9.2);
    orp = clamp(orp, -80, 780);
    alkalinity = clamp(alkalinity, 8, 220);

    // Aggressiveness: metal release grows as pH and alkalinity fall (a qualitative invention, not a model).
    const aggressiveness = Math.exp(1.6 * (7.4 - pH)) * Math.sqrt(80 / alkalinity);
    const metals = METAL_COLUMNS.map((m) => {
      let value = background(site, m) * aggressiveness * Math.exp(0.35 * gaussian());
      if (m === "Fe" && stagnation) value *= 6;
      return value;
    });

    const date = new Date(START + jitterDay * DAY).toISOString().slice(0, 10);
    const cells = [
      site.name,
      site.pipe,
      site.metal,
      `${site.code}-25-${String(serial).padStart(3, "0")}`,
      date,
      fmt(pH, 2),
      fmt(orp, 0),
      fmt(temperature, 1),
      fmt(alkalinity, 0),
      ...metals.map((v, i) => {
        const m = METAL_COLUMNS[i];
        const detection = m === "Pb" ? 0.5 : m === "Ni" ? 1 : 5;
        if (v < detection) return `<${detection}`;
        return v >= 100 ? fmt(v, 0) : fmt(v, 1);
      }),
      note,
    ];
    rows.push({ cells, day: jitterDay, siteIndex });
    serial++;
  }
});

// Chronological order, as a laboratory system would export.
rows.sort((a, b) => a.day - b.day || a.siteIndex - b.siteIndex);

// Faults as real logs have them, at fixed positions so that they are reproducible.
const col = (name: string): number => header.indexOf(name);
const faults: Array<[number, string, string, string]> = [
  // [row index, column, new text, note]
  [11, "pH", "", "pH not recorded"],
  [37, "pH", "7,3", ""], // decimal comma from a different locale
  [45, "ORP_mV_AgCl_sat", "", "ORP probe out of service"],
  [83, "temp_C", "", ""],
  [102, "pH", "7.4.1", ""], // typing slip
  [131, "ORP_mV_AgCl_sat", "n/a", ""],
  [157, "alkalinity_mg_L_CaCO3", "", ""],
  [176, "pH", "17.2", "suspect entry"], // impossible pH (out of range)
  [203, "temp_C", "1O.4", ""], // letter O for zero
  [241, "ORP_mV_AgCl_sat", "612 mV", ""], // unit typed into the cell
  [266, "pH", "", "sample bottle broken"],
];
for (const [index, column, text, note] of faults) {
  const row = rows[index % rows.length];
  row.cells[col(column)] = text;
  if (note) row.cells[col("note")] = row.cells[col("note")] ? `${row.cells[col("note")]}; ${note}` : note;
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const lines = [
  "# INVENTED DEMO DATA: the Brackenholm Water Cooperative, its sites and every value below are fictional, generated by scripts/generate-demo-log.ts. Not measurements.",
  header.map(csvField).join(","),
  ...rows.map((r) => r.cells.map(csvField).join(",")),
];

const output = resolve(process.argv[2] ?? "data/demo/sample-log.csv");
mkdirSync(dirname(output), { recursive: true });
writeFileSync(output, lines.join("\n") + "\n", "utf8");
console.log(`wrote ${rows.length} samples to ${output}`);

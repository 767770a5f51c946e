/**
 * Decides everything about the columns from the header row and the options: which column feeds which argument,
 * the unit and electrode of the readings, the temperature scale, the metals. UsageError when it cannot; notes for
 * what the user should know (duplicate headers).
 */
import { getDatabase, getElectrodes } from "../chemistry";
import {
  BARE_SILVER_CHLORIDE,
  electrodeNamed,
  EMPTY_MAPPING,
  headerTokens,
  matchHeaders,
  temperatureScale,
  type TemperatureScale,
} from "../tables";
import type { CsvFormat } from "./csv-format";
import type { EvaluationPlan, MetalTarget } from "./evaluation-plan";
import { clip } from "./row-messages";
import { UsageError, type CliOptions } from "./options";
import { planWater } from "./water";
import { planIonic } from "./ionic";

/** Headers listed in a message: each cut to a few dozen characters, at most twenty of them. */
export function headerList(headers: readonly string[]): string {
  const shown = headers.slice(0, 20).map((h) => `"${clip(h, 40)}"`);
  return shown.join(", ") + (headers.length > 20 ? `, … (${headers.length} columns)` : "");
}

/** A column named on the command line: header text (exact, else ignoring case and punctuation) or a 1-based number. */
export function findColumn(headers: readonly string[], choice: string): number | string {
  if (/^\d+$/.test(choice.trim())) {
    const n = Number(choice);
    if (n >= 1 && n <= headers.length) return n - 1;
    return `column ${n} does not exist (the table has ${headers.length} columns)`;
  }
  const exact = headers.indexOf(choice);
  if (exact >= 0) return exact;
  const wanted = headerTokens(choice).join(" ");
  const index = headers.findIndex((h) => headerTokens(h).join(" ") === wanted);
  if (index >= 0) return index;
  return `no column is headed "${clip(choice, 60)}" (headers: ${headerList(headers)})`;
}

/** The unit a potential header names ("ORP_mV", "Eh (V)"), or null. */
function unitFromHeader(header: string): "V" | "mV" | null {
  const tokens = headerTokens(header);
  if (tokens.includes("mv")) return "mV";
  if (tokens.includes("v") || tokens.includes("volt") || tokens.includes("volts")) return "V";
  return null;
}

/** Notes for headers that occur more than once (the first of them is the one used). */
export function duplicateHeaders(headers: readonly string[]): string[] {
  const seen = new Map<string, number>();
  const notes: string[] = [];
  headers.forEach((h, i) => {
    const key = h.trim().toLowerCase();
    if (key === "") return;
    const first = seen.get(key);
    if (first === undefined) seen.set(key, i);
    else notes.push(`the header "${clip(h, 60)}" is in columns ${first + 1} and ${i + 1}; the first is the one read`);
  });
  return notes;
}

/** The reference electrode of the readings: the option, else the potential header; refused when neither says. */
function electrodeOf(potentialHeader: string, option: string | undefined): string {
  const named = option ?? electrodeNamed(headerTokens(potentialHeader));
  const shown = clip(potentialHeader, 60);
  if (named === null) {
    throw new UsageError(
      `the header "${shown}" does not say which reference electrode the readings are against; give --electrode (e.g. SHE, SCE, AgCl-3M)`,
    );
  }
  const found = getElectrodes().lookup(named);
  if ("error" in found) {
    if (option === undefined && named === BARE_SILVER_CHLORIDE) {
      const fillings = getElectrodes()
        .all()
        .filter((e) => e.id.startsWith("AgCl"))
        .map((e) => e.id);
      throw new UsageError(
        `the header "${shown}" names a silver chloride electrode but not its filling (they read several mV apart); give --electrode with one of ${fillings.join(", ")}`,
      );
    }
    throw new UsageError(`--electrode: ${found.error}`);
  }
  return found.electrode.id;
}

/** The metals of the results: those named with --metal, then the per-row metal column. */
function targetsOf(options: CliOptions, metalColumn: number | null): MetalTarget[] {
  const db = getDatabase();
  const targets: MetalTarget[] = [];
  for (const m of options.metals) {
    const symbol = db.resolveMetal(m);
    if (!symbol)
      throw new UsageError(`--metal: "${clip(m, 40)}" is not a metal in the database (${db.metals().join(", ")})`);
    if (!targets.some((t) => t.symbol === symbol)) targets.push({ prefix: symbol, symbol });
  }
  if (metalColumn !== null) targets.push({ prefix: "metal", symbol: null });
  if (targets.length === 0)
    throw new UsageError(
      "no metal to evaluate: give --metal Fe,Cu,… or a column naming each row's metal (--metal-column)",
    );
  return targets;
}

/**
 * The plan of a file. Columns are found by the shared header matching (src/tables), so a file maps the same way in
 * the pane and here; a column named on the command line wins.
 */
export function planFromHeader(headers: string[], options: CliOptions, format: CsvFormat): EvaluationPlan {
  const auto = matchHeaders(headers).mapping;
  const pick = (option: string | null | undefined, automatic: number, what: string): number | null => {
    if (option === null) return null;
    if (option === undefined) return automatic >= 0 ? automatic : null;
    const found = findColumn(headers, option);
    if (typeof found === "string") throw new UsageError(`${what}: ${found}`);
    return found;
  };
  const ph = pick(options.phColumn, auto.pH, "--ph-column");
  if (ph === null) throw new UsageError(`no pH column found among ${headerList(headers)}; name it with --ph-column`);
  const potential = pick(options.potentialColumn, auto.potential, "--potential-column");
  if (potential === null)
    throw new UsageError(`no potential column found among ${headerList(headers)}; name it with --potential-column`);
  const temperatureColumn = pick(options.temperatureColumn, auto.temperature, "--temperature-column");
  const metalColumn = pick(
    options.metalColumn === "auto" ? undefined : options.metalColumn,
    auto.metal,
    "--metal-column",
  );
  const mapping = {
    ...EMPTY_MAPPING,
    pH: ph,
    potential,
    temperature: temperatureColumn ?? -1,
    metal: metalColumn ?? -1,
    id: auto.id,
    site: auto.site,
  };
  const ligands = planWater(headers, options, mapping, (option, what) => pick(option, -1, what) as number);
  const taken = [...Object.values(mapping).filter((i) => i >= 0), ...ligands.map((l) => l.column)];
  const ionic = planIonic(headers, options, taken, (option, what) => pick(option, -1, what) as number);
  const potentialHeader = headers[potential];
  const unit = options.unit ?? unitFromHeader(potentialHeader);
  if (unit === null)
    throw new UsageError(
      `the header "${clip(potentialHeader, 60)}" does not say whether the readings are in V or mV; give --unit V or --unit mV`,
    );
  const scale: TemperatureScale =
    options.temperatureUnit ??
    (temperatureColumn === null ? "C" : temperatureScale(headerTokens(headers[temperatureColumn])));
  return {
    headers,
    phColumn: ph,
    potentialColumn: potential,
    temperatureColumn,
    metalColumn,
    fixedTemperature: options.temperature,
    temperatureScale: scale,
    electrode: electrodeOf(potentialHeader, options.electrode),
    unit,
    activity: options.activity,
    dissolvedUnit: options.dissolvedUnit,
    overpotential: options.overpotential,
    targets: targetsOf(options, metalColumn),
    keepInput: options.keepInput,
    ligands,
    ionic,
    format,
    diagrams: options.svgDir !== null,
  };
}

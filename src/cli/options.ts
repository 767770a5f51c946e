/**
 * Command-line options of `redox-cells`: parsing (node:util parseArgs) and the help text. Every option the program
 * reads is declared and documented here.
 */
import { parseArgs } from "node:util";
import { DEFAULT_ACTIVITY, DEFAULT_CELSIUS, MAX_ACTIVITY, MAX_CELSIUS, MIN_CELSIUS } from "../chemistry";
import { type DecimalMark, type TemperatureScale } from "../tables";

export const EXIT = {
  /** Every row was read; results written (blank input cells give blank results and do not count as errors). */
  ok: 0,
  /** Results written, but some rows had unreadable or out-of-range cells (their result cells hold error codes). */
  rowErrors: 1,
  /** The command line itself is wrong: unknown option, missing input, no pH or potential column, … */
  usage: 2,
  /** The input cannot be read (missing, unreadable, malformed CSV) or the output cannot be written. */
  io: 3,
  /** The results are written and complete, but the diagrams could not be written. */
  diagrams: 4,
  /** Interrupted (Ctrl-C, SIGINT: 128 + 2); no results written, any previous ones left as they were. */
  interrupted: 130,
  /** Terminated (SIGTERM: 128 + 15); as interrupted. */
  terminated: 143,
} as const;

export class UsageError extends Error {}

export type PotentialUnitOption = "V" | "mV";
export type DissolvedUnit = "ug/L" | "mg/L" | "mol/kg";

export interface CliOptions {
  input: string;
  /** Results CSV path, or "-" for standard output. */
  output: string;
  /** Directory for the diagram SVGs, or null for none. */
  svgDir: string | null;
  /** Metals evaluated on every row (symbols or names as given). */
  metals: string[];
  /** Column naming the metal of each row (header text or 1-based number), "auto" or null (none). */
  metalColumn: string | null | "auto";
  phColumn?: string;
  potentialColumn?: string;
  temperatureColumn?: string | null;
  /** Ligand columns (header text or 1-based number), null = "none", undefined = found by header. */
  alkalinityColumn?: string | null;
  dicColumn?: string | null;
  chlorideColumn?: string | null;
  sulfurColumn?: string | null;
  phosphateColumn?: string | null;
  /** Ignore every ligand column: evaluate in pure water. */
  pureWater: boolean;
  /** Ionic strength column (header text or 1-based number), null = "none", undefined = found by header. */
  ionicStrengthColumn?: string | null;
  /** Fixed ionic strength (mol/kg) for every row; columns ignored. */
  ionicStrength?: number;
  /** No activity correction: every conductivity, TDS and ionic-strength column ignored. */
  ideal: boolean;
  /** Fixed temperature °C, used when there is no temperature column (and for blank cells in it). */
  temperature?: number;
  /** Scale of the temperature column's numbers; undefined = from its header. */
  temperatureUnit?: TemperatureScale;
  /** Decimal mark of the input (and results); undefined = detected. */
  decimalMark?: DecimalMark;
  /** Write text cells as they are, formula-like text included. */
  rawText: boolean;
  /** Write result numbers with every digit. */
  fullPrecision: boolean;
  electrode?: string;
  unit?: PotentialUnitOption;
  activity: number;
  dissolvedUnit: DissolvedUnit;
  overpotential: number;
  delimiter?: string;
  keepInput: boolean;
  progress: boolean | "auto";
  maxMessages: number;
  quiet: boolean;
  batchSize: number;
}

export const HELP = `redox-cells — evaluate the REDOX worksheet functions over a CSV file

Usage
  redox-cells [options] <input.csv>
  redox-cells --help | --version

For every row the program converts the potential reading to volts against the standard hydrogen electrode
(as REDOX.TOSHE does), measures its distance from the water-stability window (REDOX.WATERMARGIN), and for each
metal finds the dominant species (REDOX.SPECIES), the regime — immunity, passivation or corrosion —
(REDOX.REGIME), the nearest stability boundaries above and below (REDOX.BOUNDARY) and the dissolved metal in
equilibrium with the stable solid (REDOX.DISSOLVED). It writes the input columns plus result columns to a CSV,
and one potential–pH diagram SVG per metal with the samples drawn on it.

Real waters: when the file has alkalinity or DIC, chloride or sulfate columns, each row's totals go to the
[carbonate], [chloride] and [sulfur] arguments of those functions (mol/kg; mass units are converted with the
atomic weights of the element records, 1 L taken as 1 kg). Each ligand is speciated exactly at the row's pH and
potential from its total. A blank cell there means the ligand is absent in that row, as in the worksheet. A water
of its own per row costs no system build (68 000–135 000 rows/s against 127 000–257 000 for pure water, both
without diagrams, in npm run bench, 2 cores, Node 20); --pure-water ignores these columns.

Ionic strength: a conductivity column ("conductivity", "specific conductance", "EC", "SC"; µS/cm, or mS/cm
and mS/m when the header says so), a TDS column ("TDS", "total dissolved solids"; mg/L or ppm, g/L) or an
ionic-strength column ("ionic strength", "I (mol/kg)"; mol/L read as mol/kg for dilute water) gives each row's
[ionicStrength] (Davies activity coefficients). Conductivity and TDS go through REDOX.IONICSTRENGTH (I ≈
1.6e-5 × µS/cm, Russell 1976; I ≈ 2.5e-5 × mg/L, Langelier 1936). With several, a stated ionic strength wins,
then conductivity, then TDS; the summary names the one used. A blank cell: that row is answered without the
correction (ideal solution) and reported. Above 0.5 mol/kg the row's results are #VALUE!.

Columns are found by their headers (case, accents and punctuation ignored): pH ("pH"), the potential reading ("ORP",
"Eh", "redox", "potential", …), temperature ("temp", "temperature", …), the metal of each row ("metal",
"element", "pipe metal"), and the water: alkalinity ("alkalinity", "alk", "TA"; or bicarbonate, "HCO3"), DIC
("DIC", "TIC"), chloride ("chloride", "Cl"), sulfate ("sulfate", "SO4"); lab headers in German, French,
Spanish, Italian, Dutch, Portuguese, Swedish, Danish, Norwegian, Finnish, Polish and Czech too ("Temperatur",
"Redoxpotential", "KS 4,3", "TAC (°f)", "Chlorures", "Lämpötila", "Zasadowość", "KNK 4,5", …). The unit and
electrode are read from the potential header when it names them ("ORP_mV_AgCl_sat", "Eh (V)"); otherwise give
--unit and --electrode. A silver chloride header must name its
filling ("AgCl sat", "Ag/AgCl 3M"), or give --electrode. A temperature header naming °F or K ("Temp (°F)",
"T_K") is converted to °C. Blank lines and lines starting with # before the header are skipped; after it every
record is a row (a sample id may begin with #), and the results have one row per input record.

Input and output
  -o, --output FILE          results CSV (default: <input>-results.csv next to the input; "-" = standard output)
      --svg-dir DIR          directory for the diagram SVGs (default: the output's directory)
      --no-svg               write no diagrams
      --delimiter C          field separator: "," ";" "tab" (default: guessed from the header line); the
                             results use the same one
      --decimal comma|point  decimal mark of the numbers (default: a comma when the delimiter is ";" or tab
                             and the data are written so, else a point); the results use the same one
      --no-keep-input        write only the result columns (default: input columns first, then results)
      --raw-text             write text cells as they are (default: text starting with = + - @, tab or
                             carriage return gets a leading ' so that a spreadsheet does not run it as a formula)
      --full-precision       write result numbers with every digit (default: potentials to 0.1 mV, amounts
                             to 4 significant figures)

Columns (header text, or a 1-based column number)
      --ph-column COL        the pH column
      --potential-column COL the potential reading column
      --temperature-column COL
                             the temperature column; "none" to ignore one
      --temperature-unit C|F|K
                             scale of the temperature column (default: from its header, else °C)
      --metal-column COL     the column naming each row's metal ("Fe", "copper"); "none" to ignore one
      --alkalinity-column COL
                             total alkalinity, mg/L as CaCO3 (meq/L when the header says meq or mmol); each
                             row's DIC is REDOX.DIC(alkalinity, pH, temperature); "none" to ignore one
      --dic-column COL       dissolved inorganic carbon, mol/kg (mmol/L, µmol/L or mg/L as C when the header
                             says so); a DIC column is used before an alkalinity column; "none" to ignore one
      --chloride-column COL  chloride, mg/L (µg/L, mmol/L or mol/kg when the header says so); "none" to ignore
      --sulfur-column COL    total sulfur: a sulfate column in mg/L as SO4 (mg/L as S, mmol/L or mol/kg when the
                             header says so); "none" to ignore one
      --phosphate-column COL orthophosphate, mg/L as PO4 (mg/L as P when the header says "as P" or "PO4-P";
                             mmol/L or mol/kg as P likewise); "none" to ignore one
      --pure-water           ignore every alkalinity, DIC, chloride, sulfur and phosphate column (the functions'
                             defaults), and every ionic-strength source (as --ideal)
      --ionic-strength-column COL
                             the column giving each row's ionic strength: a conductivity (µS/cm; mS/cm, mS/m
                             when the header says so), a TDS (mg/L or ppm; g/L) or an ionic strength (mol/kg;
                             mol/L read as mol/kg) column; "none" to ignore one

Chemistry
  -m, --metal LIST           metals evaluated on every row, comma-separated symbols or names: Fe,Cu,Pb
                             (at least one of --metal or a metal column is needed)
  -e, --electrode NAME       reference electrode of the readings: SHE, SCE, AgCl-sat, AgCl-3.5M, AgCl-3M,
                             AgCl-1M, AgCl-sea, CSE, MSE, HgO-1M, AgCl-EPB, RHE (default: from the header)
  -u, --unit V|mV            unit of the readings (default: from the header)
  -t, --temperature C        temperature in °C when there is no temperature column (default ${DEFAULT_CELSIUS}), and for the
                             blank cells of one (default: none — a blank temperature is a missing measurement,
                             that row's results are left blank and the row is reported)
  -a, --activity A           activity of dissolved metal species, 0 < A ≤ ${MAX_ACTIVITY} (default ${DEFAULT_ACTIVITY.toExponential()})
      --dissolved-unit U     ug/L (default), mg/L or mol/kg
      --overpotential V      widens the water window on both sides for the margin column (default 0)
      --ionic-strength I     ionic strength in mol/kg (0 to 0.5) for every row; columns giving one are ignored
                             (default: from a column found by header, else none)
      --ideal                no activity correction (γ = 1): ignore every conductivity, TDS and ionic-strength
                             column

Messages and progress
      --progress             show a progress bar on standard error even when it is not a terminal
      --no-progress          never show one (default: shown when standard error is a terminal)
      --max-messages N       print at most N cell messages (default 50; 0 = none); the rest are counted
      --batch-size N         rows evaluated together (default 1024): the answers are the same at any size;
                             memory grows with it
  -q, --quiet                no summary
  -h, --help                 this text
  -V, --version              the program's version

Result columns
  E_SHE_V                    potential vs SHE, V
  water_margin_V             distance from the water-stability window, V: positive inside, negative outside
  DIC_mol_kg, chloride_mol_kg, sulfur_mol_kg
                             the totals passed to the functions (only for the ligands read from columns)
  ionic_strength_mol_kg      the ionic strength passed to the functions (only when one is used; blank where the
                             row had a blank cell and was answered without the correction)
  <M>_species                dominant species of metal M (M = symbol, or "metal" for the per-row metal column)
  <M>_regime                 immunity, passivation or corrosion
  <M>_boundary_above_V       nearest stability boundary above the point at its pH (#N/A if none up to +3 V)
  <M>_boundary_below_V       nearest stability boundary below (#N/A if none down to −3 V)
  <M>_dissolved_<unit>       dissolved metal in equilibrium with the stable solid (#N/A where a dissolved species
                             is dominant)
  errors                     what was wrong with the row's cells (empty when nothing was)
A blank input cell gives blank results in that row. An unreadable or out-of-range cell gives the spreadsheet's
error code (#VALUE!; #N/A where an input admits no answer) in the results that depend on it, a message on standard error naming the line and
column, and its text in the errors column; the row is never dropped.

Exit codes
  0    all rows read (blank cells allowed)
  1    results written, but some rows had bad cells
  2    usage error (unknown option, no input, no pH or potential column, unknown metal or electrode, the
       output is the input file)
  3    the input cannot be read (missing file, malformed CSV) or the output cannot be written (full disk, …)
  4    results written and complete, but the diagrams could not be written
  130  interrupted (Ctrl-C); 143 terminated (SIGTERM)
For 2, 3, 130 and 143 no results are written: the results go to a temporary file beside the output and replace
it only when complete, so any previous results are left as they were.

Examples
  redox-cells data/demo/sample-log.csv -o out/results.csv
  redox-cells lab-export.csv --metal Fe,Cu --electrode SCE --unit mV --temperature 15
  redox-cells big.csv --metal Pb -o - --no-svg | gzip > results.csv.gz

Thermodynamics tells which state is stable, not how fast a metal corrodes. For drinking water (lead, copper),
structural corrosion or cathodic protection, confirm by laboratory analysis and defer to local codes, regulators
and licensed corrosion professionals.
`;

const DEFAULT_MAX_MESSAGES = 50;

/**
 * Rows per batch. The engine builds nothing per row, so the size trades memory for the functions' overhead per call
 * and for how many rows share a metal and temperature when grouped (evaluate.ts); the answers are the same at any
 * size (a test). 1024 was the fastest of 256, 1024, 2048 and 4096 on the bench logs.
 */
export const DEFAULT_BATCH_SIZE = 1024;

function numberOption(
  name: string,
  text: string | undefined,
  check: (x: number) => boolean,
  expected: string,
): number | undefined {
  if (text === undefined) return undefined;
  const x = Number(text);
  if (text.trim() === "" || !Number.isFinite(x) || !check(x))
    throw new UsageError(`--${name}: expected ${expected}, got "${text}"`);
  return x;
}

/** Every option the program accepts (node:util parseArgs); each is documented in HELP. */
export const OPTION_SPEC = {
  output: { type: "string", short: "o" },
  "svg-dir": { type: "string" },
  "no-svg": { type: "boolean" },
  delimiter: { type: "string" },
  decimal: { type: "string" },
  "raw-text": { type: "boolean" },
  "full-precision": { type: "boolean" },
  "temperature-unit": { type: "string" },
  "no-keep-input": { type: "boolean" },
  "ph-column": { type: "string" },
  "potential-column": { type: "string" },
  "temperature-column": { type: "string" },
  "metal-column": { type: "string" },
  "alkalinity-column": { type: "string" },
  "dic-column": { type: "string" },
  "chloride-column": { type: "string" },
  "sulfur-column": { type: "string" },
  "phosphate-column": { type: "string" },
  "pure-water": { type: "boolean" },
  "ionic-strength-column": { type: "string" },
  "ionic-strength": { type: "string" },
  ideal: { type: "boolean" },
  metal: { type: "string", short: "m", multiple: true },
  electrode: { type: "string", short: "e" },
  unit: { type: "string", short: "u" },
  temperature: { type: "string", short: "t" },
  activity: { type: "string", short: "a" },
  "dissolved-unit": { type: "string" },
  overpotential: { type: "string" },
  progress: { type: "boolean" },
  "no-progress": { type: "boolean" },
  "max-messages": { type: "string" },
  "batch-size": { type: "string" },
  quiet: { type: "boolean", short: "q" },
  help: { type: "boolean", short: "h" },
  version: { type: "boolean", short: "V" },
} as const;

export type ParsedCommand = { kind: "help" } | { kind: "version" } | { kind: "run"; options: CliOptions };

/** argv read against OPTION_SPEC; a parse failure becomes a UsageError with its message. */
function readArgs(argv: readonly string[]) {
  try {
    return parseArgs({
      args: [...argv],
      allowPositionals: true,
      strict: true,
      options: OPTION_SPEC,
    });
  } catch (error) {
    throw new UsageError(error instanceof Error ? error.message : String(error));
  }
}

/** The option values as parseArgs reads them. */
type OptionValues = ReturnType<typeof readArgs>["values"];

/** The one input file among the positionals. */
function inputFile(positionals: readonly string[]): string {
  if (positionals.length === 0) throw new UsageError("no input file given");
  if (positionals.length > 1)
    throw new UsageError(`one input file at a time (got ${positionals.length}: ${positionals.join(", ")})`);
  return positionals[0];
}

/** --unit: V or mV (and their spelled-out names). */
function potentialUnitOption(text: string | undefined): PotentialUnitOption | undefined {
  if (text === undefined) return undefined;
  const u = text.trim().toLowerCase();
  if (u === "v" || u === "volt" || u === "volts") return "V";
  if (u === "mv" || u === "millivolt" || u === "millivolts") return "mV";
  throw new UsageError(`--unit: expected V or mV, got "${text}"`);
}

/** --dissolved-unit: ug/L (default, also ppb), mg/L (also ppm) or mol/kg; µ and μ read as u. */
function dissolvedUnitOption(text: string | undefined): DissolvedUnit {
  if (text === undefined) return "ug/L";
  const key = text.trim().toLowerCase().replace(/[µμ]/g, "u");
  const known: Record<string, DissolvedUnit> = {
    "ug/l": "ug/L",
    ppb: "ug/L",
    "mg/l": "mg/L",
    ppm: "mg/L",
    "mol/kg": "mol/kg",
  };
  if (!Object.prototype.hasOwnProperty.call(known, key))
    throw new UsageError(`--dissolved-unit: expected ug/L, mg/L or mol/kg, got "${text}"`);
  return known[key];
}

/** --delimiter: one character, or "tab". */
function delimiterOption(text: string | undefined): string | undefined {
  if (text === undefined) return undefined;
  const d = text === "tab" || text === "\\t" ? "\t" : text;
  if (d.length !== 1) throw new UsageError(`--delimiter: expected one character or "tab", got "${text}"`);
  return d;
}

/** --decimal: comma or point; the comma needs a delimiter other than the comma. */
function decimalMarkOption(text: string | undefined, delimiter: string | undefined): DecimalMark | undefined {
  if (text === undefined) return undefined;
  let decimalMark: DecimalMark;
  const key = text.trim().toLowerCase();
  if (key === "comma" || key === ",") decimalMark = ",";
  else if (key === "point" || key === "." || key === "dot") decimalMark = ".";
  else throw new UsageError(`--decimal: expected comma or point, got "${text.slice(0, 40)}"`);
  if (decimalMark === "," && delimiter === ",")
    throw new UsageError("--decimal comma needs a delimiter other than the comma (--delimiter ';' or tab)");
  return decimalMark;
}

/** --temperature-unit: C, F or K (a leading ° allowed). */
function temperatureUnitOption(text: string | undefined): TemperatureScale | undefined {
  if (text === undefined) return undefined;
  const key = text.trim().toUpperCase().replace(/^°/, "");
  if (key !== "C" && key !== "F" && key !== "K")
    throw new UsageError(`--temperature-unit: expected C, F or K, got "${text.slice(0, 40)}"`);
  return key;
}

/** A column option: undefined when not given, null for "none", else the column as written. */
function columnOption(text: string | undefined): string | null | undefined {
  return text === undefined ? undefined : text.trim().toLowerCase() === "none" ? null : text;
}

/** The numeric options, each checked against its range (in this order), with their defaults. */
function numericOptions(v: OptionValues) {
  return {
    ionicStrength: numberOption(
      "ionic-strength",
      v["ionic-strength"],
      (x) => x >= 0 && x <= 0.5,
      "an ionic strength from 0 to 0.5 mol/kg (the Davies equation's range)",
    ),
    temperature: numberOption(
      "temperature",
      v.temperature,
      (x) => x >= MIN_CELSIUS && x <= MAX_CELSIUS,
      `a temperature from ${MIN_CELSIUS} to ${MAX_CELSIUS} °C`,
    ),
    activity:
      numberOption(
        "activity",
        v.activity,
        (x) => x > 0 && x <= MAX_ACTIVITY,
        `a number above 0 and at most ${MAX_ACTIVITY}`,
      ) ?? DEFAULT_ACTIVITY,
    overpotential:
      numberOption("overpotential", v.overpotential, (x) => x >= 0 && x <= 3, "a number of volts from 0 to 3") ?? 0,
    maxMessages:
      numberOption("max-messages", v["max-messages"], (x) => Number.isInteger(x) && x >= 0, "a whole number ≥ 0") ??
      DEFAULT_MAX_MESSAGES,
    batchSize:
      numberOption(
        "batch-size",
        v["batch-size"],
        (x) => Number.isInteger(x) && x >= 1 && x <= 1_000_000,
        "a whole number from 1 to 1000000",
      ) ?? DEFAULT_BATCH_SIZE,
  };
}

/** Parses argv (without node and script). Throws UsageError for anything wrong. */
export function parseCommandLine(argv: readonly string[]): ParsedCommand {
  const parsed = readArgs(argv);
  const v = parsed.values;
  if (v.help) return { kind: "help" };
  if (v.version) return { kind: "version" };
  const input = inputFile(parsed.positionals);
  const unit = potentialUnitOption(v.unit);
  const dissolvedUnit = dissolvedUnitOption(v["dissolved-unit"]);
  const delimiter = delimiterOption(v.delimiter);
  const decimalMark = decimalMarkOption(v.decimal, delimiter);
  const temperatureUnit = temperatureUnitOption(v["temperature-unit"]);
  const metals = (v.metal ?? [])
    .flatMap((m) => m.split(","))
    .map((m) => m.trim())
    .filter((m) => m !== "");
  const metalColumnOption = columnOption(v["metal-column"]);
  const numbers = numericOptions(v);

  const output = v.output ?? defaultOutput(input);
  const options: CliOptions = {
    input,
    output,
    svgDir: v["no-svg"] ? null : (v["svg-dir"] ?? (output === "-" ? "." : dirnameOf(output))),
    metals,
    metalColumn: metalColumnOption === undefined ? "auto" : metalColumnOption,
    phColumn: v["ph-column"],
    potentialColumn: v["potential-column"],
    temperatureColumn: columnOption(v["temperature-column"]),
    alkalinityColumn: columnOption(v["alkalinity-column"]),
    dicColumn: columnOption(v["dic-column"]),
    chlorideColumn: columnOption(v["chloride-column"]),
    sulfurColumn: columnOption(v["sulfur-column"]),
    phosphateColumn: columnOption(v["phosphate-column"]),
    pureWater: v["pure-water"] ?? false,
    ionicStrengthColumn: columnOption(v["ionic-strength-column"]),
    ionicStrength: numbers.ionicStrength,
    ideal: v.ideal ?? false,
    temperature: numbers.temperature,
    electrode: v.electrode,
    unit,
    activity: numbers.activity,
    dissolvedUnit,
    overpotential: numbers.overpotential,
    temperatureUnit,
    delimiter,
    decimalMark,
    rawText: v["raw-text"] ?? false,
    fullPrecision: v["full-precision"] ?? false,
    keepInput: !v["no-keep-input"],
    progress: v["no-progress"] ? false : v.progress ? true : "auto",
    maxMessages: numbers.maxMessages,
    quiet: v.quiet ?? false,
    batchSize: numbers.batchSize,
  };
  return { kind: "run", options };
}

function defaultOutput(input: string): string {
  const base = input.replace(/\.(csv|txt|tsv)$/i, "");
  return `${base}-results.csv`;
}

function dirnameOf(path: string): string {
  const i = Math.max(path.lastIndexOf("/"), path.lastIndexOf("\\"));
  return i < 0 ? "." : i === 0 ? "/" : path.slice(0, i);
}

/**
 * The command line's pipeline: read the header, decide the column mapping, then stream the CSV in batches
 * through the worksheet functions and out to the results CSV, with bounded memory (csv-parse streaming, waits for
 * the output to drain), a progress bar, messages naming line and column, diagram SVGs and a summary.
 */
import { once } from "node:events";
import { closeSync, createReadStream, createWriteStream, mkdirSync, openSync, readFileSync, readSync, statSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import type { Writable } from "node:stream";
import { parse } from "csv-parse";
import { getDatabase } from "../chemistry/database";
import { getElectrodes } from "../chemistry/electrodes";
import { EMPTY_MAPPING, electrodeHint, headerTokens, matchHeaders } from "../taskpane/header-match";
import { DiagramSamples, diagramCelsius, diagramTotals, renderDiagram, totalsText } from "./diagrams";
import { csvLine, EvaluationPlan, evaluateBatch, InputRow, MetalTarget, outputHeader, RowMessage } from "./evaluate";
import { CliOptions, EXIT, HELP, parseCommandLine, UsageError } from "./options";
import { ProgressBar } from "./progress";
import { planWater } from "./water";
import { worksheetFunctions, WorksheetFunctions } from "./worksheet";

export interface CliStreams {
  stdout: Writable;
  stderr: Writable & { isTTY?: boolean; columns?: number };
}

export interface RunSummary {
  input: string;
  output: string;
  rows: number;
  errorRows: number;
  blankRows: number;
  messages: number;
  seconds: number;
  /** Regime counts per column prefix ("Fe", "metal"). */
  regimes: Record<string, Record<string, number>>;
  svgFiles: string[];
  header: string[];
}

export interface RunResult {
  code: number;
  summary: RunSummary | null;
}

const PROGRAM = "redox-cells";

function version(): string {
  try {
    const pkg = JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { version?: string };
    return pkg.version ?? "unknown";
  } catch {
    return "unknown";
  }
}

/** Entry point: parses argv, runs, returns the exit code. Never throws. */
export async function runCli(argv: readonly string[], streams: CliStreams, fns: WorksheetFunctions = worksheetFunctions): Promise<number> {
  return (await runCommand(argv, streams, fns)).code;
}

export async function runCommand(argv: readonly string[], streams: CliStreams, fns: WorksheetFunctions = worksheetFunctions): Promise<RunResult> {
  let command;
  try {
    command = parseCommandLine(argv);
  } catch (error) {
    if (error instanceof UsageError) {
      streams.stderr.write(`${PROGRAM}: ${error.message}\nTry '${PROGRAM} --help'.\n`);
      return { code: EXIT.usage, summary: null };
    }
    throw error;
  }
  if (command.kind === "help") {
    streams.stdout.write(HELP);
    return { code: EXIT.ok, summary: null };
  }
  if (command.kind === "version") {
    streams.stdout.write(`${PROGRAM} ${version()}\n`);
    return { code: EXIT.ok, summary: null };
  }
  return runWithOptions(command.options, streams, fns);
}

/** The field separator: the one of tab, semicolon and comma that occurs most, outside quotes, on the header line. */
export function guessDelimiter(headerLine: string): string {
  const counts: Record<string, number> = { "\t": 0, ",": 0, ";": 0 };
  let quoted = false;
  for (const ch of headerLine) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && ch in counts) counts[ch]++;
  }
  let best = ",";
  for (const d of ["\t", ";", ","]) if (counts[d] > counts[best]) best = d;
  return best;
}

/** The first line that is neither blank nor a # comment, from the first 64 KiB of the file. */
function firstDataLine(path: string): string {
  const fd = openSync(path, "r");
  try {
    const buffer = Buffer.alloc(65536);
    const n = readSync(fd, buffer, 0, buffer.length, 0);
    const text = buffer.subarray(0, n).toString("utf8").replace(/^\uFEFF/, "");
    for (const line of text.split(/\r?\n/)) {
      if (line.trim() === "" || line.trim().startsWith("#")) continue;
      return line;
    }
    return "";
  } finally {
    closeSync(fd);
  }
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
  return `no column is headed "${choice}" (headers: ${headers.map((h) => `"${h}"`).join(", ")})`;
}

/** The unit a potential header names ("ORP_mV", "Eh (V)"), or null. */
function unitFromHeader(header: string): "V" | "mV" | null {
  const tokens = headerTokens(header);
  if (tokens.includes("mv")) return "mV";
  if (tokens.includes("v") || tokens.includes("volt") || tokens.includes("volts")) return "V";
  return null;
}

/**
 * Decides everything about the columns from the header row and the options; UsageError when it cannot. Columns
 * are found by the task pane's header matching (src/taskpane/header-match.ts), so a file maps the same way in
 * both; a column named on the command line wins.
 */
export function planFromHeader(headers: string[], options: CliOptions): EvaluationPlan {
  const auto = matchHeaders(headers).mapping;
  const pick = (option: string | null | undefined, automatic: number, what: string): number | null => {
    if (option === null) return null;
    if (option === undefined) return automatic >= 0 ? automatic : null;
    const found = findColumn(headers, option);
    if (typeof found === "string") throw new UsageError(`${what}: ${found}`);
    return found;
  };
  const list = headers.map((h) => `"${h}"`).join(", ");
  const ph = pick(options.phColumn, auto.pH, "--ph-column");
  if (ph === null) throw new UsageError(`no pH column found among ${list}; name it with --ph-column`);
  const potential = pick(options.potentialColumn, auto.potential, "--potential-column");
  if (potential === null) throw new UsageError(`no potential column found among ${list}; name it with --potential-column`);
  const temperatureColumn = pick(options.temperatureColumn, auto.temperature, "--temperature-column");
  const metalColumn = pick(options.metalColumn === "auto" ? undefined : options.metalColumn, auto.metal, "--metal-column");
  const potentialHeader = headers[potential];
  const ligands = planWater(
    headers,
    options,
    { ...EMPTY_MAPPING, pH: ph, potential, temperature: temperatureColumn ?? -1, metal: metalColumn ?? -1, id: auto.id, site: auto.site },
    (option, what) => pick(option, -1, what) as number,
  );

  const electrodeName = options.electrode ?? electrodeHint(headerTokens(potentialHeader));
  if (electrodeName === null) {
    throw new UsageError(`the header "${potentialHeader}" does not say which reference electrode the readings are against; give --electrode (e.g. SHE, SCE, AgCl-sat)`);
  }
  const found = getElectrodes().lookup(electrodeName);
  if ("error" in found) throw new UsageError(`--electrode: ${found.error}`);
  const unit = options.unit ?? unitFromHeader(potentialHeader);
  if (unit === null) throw new UsageError(`the header "${potentialHeader}" does not say whether the readings are in V or mV; give --unit V or --unit mV`);

  const db = getDatabase();
  const targets: MetalTarget[] = [];
  for (const m of options.metals) {
    const symbol = db.resolveMetal(m);
    if (!symbol) throw new UsageError(`--metal: "${m}" is not a metal in the database (${db.metals().join(", ")})`);
    if (!targets.some((t) => t.symbol === symbol)) targets.push({ prefix: symbol, symbol });
  }
  if (metalColumn !== null) targets.push({ prefix: "metal", symbol: null });
  if (targets.length === 0) throw new UsageError("no metal to evaluate: give --metal Fe,Cu,… or a column naming each row's metal (--metal-column)");

  return {
    headers,
    phColumn: ph,
    potentialColumn: potential,
    temperatureColumn,
    metalColumn,
    fixedTemperature: options.temperature,
    electrode: found.electrode.id,
    unit,
    activity: options.activity,
    dissolvedUnit: options.dissolvedUnit,
    overpotential: options.overpotential,
    targets,
    keepInput: options.keepInput,
    ligands,
  };
}

function formatMessage(m: RowMessage): string {
  const where = m.column !== null ? `line ${m.line}, column "${m.column}"` : `line ${m.line}`;
  return `${PROGRAM}: ${m.kind === "error" ? "error" : "note"}: ${where}: ${m.text}\n`;
}

export async function runWithOptions(options: CliOptions, streams: CliStreams, fns: WorksheetFunctions = worksheetFunctions): Promise<RunResult> {
  const started = Date.now();
  const err = streams.stderr;
  let size: number;
  try {
    const stat = statSync(options.input);
    if (!stat.isFile()) throw new Error("not a file");
    size = stat.size;
  } catch (error) {
    err.write(`${PROGRAM}: cannot read the input "${options.input}": ${reason(error)}\n`);
    return { code: EXIT.io, summary: null };
  }

  let delimiter: string;
  try {
    delimiter = options.delimiter ?? guessDelimiter(firstDataLine(options.input));
  } catch (error) {
    err.write(`${PROGRAM}: cannot read the input "${options.input}": ${reason(error)}\n`);
    return { code: EXIT.io, summary: null };
  }

  const source = createReadStream(options.input);
  const parser = source.pipe(
    parse({
      delimiter,
      bom: true,
      comment: "#",
      comment_no_infix: true,
      skip_empty_lines: true,
      skip_records_with_empty_values: true,
      relax_column_count: true,
      info: true,
    }),
  );
  let sourceError: unknown = null;
  source.on("error", (e) => {
    sourceError = e;
    parser.destroy(e);
  });

  const showProgress = options.progress === true || (options.progress === "auto" && err.isTTY === true);
  const progress = showProgress ? new ProgressBar(err, size) : null;
  const toStdout = options.output === "-";
  let out: Writable | null = null;
  let outError: unknown = null;
  const diagrams = new DiagramSamples();
  const regimes: Record<string, Record<string, number>> = {};
  let plan: EvaluationPlan | null = null;
  let header: string[] = [];
  let rows = 0;
  let errorRows = 0;
  let blankRows = 0;
  let messageCount = 0;
  let batch: InputRow[] = [];

  const say = (text: string): void => {
    progress?.clear();
    err.write(text);
  };

  const flush = async (): Promise<void> => {
    if (batch.length === 0 || !plan || !out) return;
    const result = evaluateBatch(plan, batch, fns);
    batch = [];
    errorRows += result.errorRows;
    blankRows += result.blankRows;
    for (const m of result.messages) {
      if (messageCount < options.maxMessages) say(formatMessage(m));
      messageCount++;
    }
    for (const [prefix, counts] of result.regimes) {
      const into = (regimes[prefix] ??= {});
      for (const [regime, n] of counts) into[regime] = (into[regime] ?? 0) + n;
    }
    for (const p of result.points) diagrams.add(p);
    let chunk = "";
    for (const line of result.lines) chunk += line;
    if (outError) throw outError;
    if (!out.write(chunk)) await drained(out);
    if (outError) throw outError;
  };

  try {
    for await (const item of parser as AsyncIterable<{ record: string[]; info: { lines: number } }>) {
      const { record, info } = item;
      if (plan === null) {
        header = record.map((h) => h.trim());
        try {
          plan = planFromHeader(header, options);
        } catch (error) {
          source.destroy();
          if (error instanceof UsageError) {
            err.write(`${PROGRAM}: ${error.message}\nTry '${PROGRAM} --help'.\n`);
            return { code: EXIT.usage, summary: null };
          }
          throw error;
        }
        try {
          if (toStdout) out = streams.stdout;
          else {
            mkdirSync(dirname(options.output), { recursive: true });
            out = createWriteStream(options.output);
            await once(out, "open");
          }
          out.on("error", (e) => {
            outError = e;
          });
        } catch (error) {
          source.destroy();
          err.write(`${PROGRAM}: cannot write the output "${options.output}": ${reason(error)}\n`);
          return { code: EXIT.io, summary: null };
        }
        out.write(csvLine(outputHeader(plan)));
        continue;
      }
      // a record spanning several lines (quoted line breaks) is named by its first line
      const width = header.length;
      const fields = record.length === width ? record : record.length > width ? record.slice(0, width) : [...record, ...new Array<string>(width - record.length).fill("")];
      batch.push({ fields, line: info.lines - countLineBreaks(record) });
      rows++;
      if (batch.length >= options.batchSize) {
        await flush();
        progress?.update(source.bytesRead, rows);
      }
    }
    await flush();
  } catch (error) {
    progress?.clear();
    if (outError || (error as { code?: string })?.code === "EPIPE") {
      err.write(`${PROGRAM}: cannot write the output "${options.output}": ${reason(outError ?? error)}\n`);
    } else {
      err.write(`${PROGRAM}: cannot read the input "${options.input}": ${reason(sourceError ?? error)}\n`);
    }
    if (out && !toStdout) (out as Writable).destroy();
    return { code: EXIT.io, summary: null };
  }
  progress?.update(size, rows, true);
  progress?.clear();

  if (plan === null || out === null) {
    err.write(`${PROGRAM}: the input "${options.input}" has no header row\n`);
    return { code: EXIT.io, summary: null };
  }
  if (!toStdout) {
    const closing = out as Writable;
    closing.end();
    try {
      await once(closing, "finish");
    } catch (error) {
      err.write(`${PROGRAM}: cannot write the output "${options.output}": ${reason(error)}\n`);
      return { code: EXIT.io, summary: null };
    }
    if (outError) {
      err.write(`${PROGRAM}: cannot write the output "${options.output}": ${reason(outError)}\n`);
      return { code: EXIT.io, summary: null };
    }
  }
  if (messageCount > options.maxMessages) err.write(`${PROGRAM}: … ${messageCount - options.maxMessages} more messages not shown (the errors column has them all)\n`);

  // diagrams
  const svgFiles: string[] = [];
  if (options.svgDir !== null) {
    try {
      mkdirSync(options.svgDir, { recursive: true });
      for (const symbol of diagrams.symbols()) {
        const points = diagrams.points(symbol);
        const total = diagrams.count(symbol);
        const celsius = plan.temperatureColumn === null ? (plan.fixedTemperature ?? 25) : diagramCelsius(points, plan.fixedTemperature ?? 25);
        const ligands = diagramTotals(points);
        const caption = [
          `${total.toLocaleString("en-US")} samples from ${baseName(options.input)}${points.length < total ? ` (${points.length.toLocaleString("en-US")} drawn, chosen at random)` : ""}.`,
          plan.temperatureColumn === null
            ? `Drawn at ${celsius} °C.`
            : `Drawn at ${celsius} °C, the samples' median; each sample's result columns use its own temperature.`,
        ];
        if (plan.ligands.length > 0) {
          caption.push(
            totalsText(ligands) === ""
              ? "Drawn in pure water (no sample has ligand totals); each sample's result columns use its own water."
              : `Drawn in water with the samples' median totals (${totalsText(ligands)}); each sample's result columns use its own water.`,
          );
        }
        const svg = renderDiagram({ element: symbol, celsius, activity: plan.activity, samples: points, caption, ligands });
        const file = join(options.svgDir, `diagram-${symbol}.svg`);
        writeFileSync(file, svg, "utf8");
        svgFiles.push(file);
      }
    } catch (error) {
      err.write(`${PROGRAM}: cannot write the diagrams to "${options.svgDir}": ${reason(error)}\n`);
      return { code: EXIT.io, summary: null };
    }
  }

  const summary: RunSummary = {
    input: options.input,
    output: options.output,
    rows,
    errorRows,
    blankRows,
    messages: messageCount,
    seconds: (Date.now() - started) / 1000,
    regimes,
    svgFiles,
    header: outputHeader(plan),
  };
  if (!options.quiet) (toStdout ? err : streams.stdout).write(summaryText(summary));
  return { code: errorRows > 0 ? EXIT.rowErrors : EXIT.ok, summary };
}

/** Resolves when the stream has drained or failed (the failure is reported through its error listener). */
function drained(stream: Writable): Promise<void> {
  return new Promise((resolve) => {
    const done = (): void => {
      stream.off("drain", done);
      stream.off("error", done);
      stream.off("close", done);
      resolve();
    };
    stream.on("drain", done);
    stream.on("error", done);
    stream.on("close", done);
  });
}

function countLineBreaks(record: readonly string[]): number {
  let n = 0;
  for (const f of record) for (let i = f.indexOf("\n"); i >= 0; i = f.indexOf("\n", i + 1)) n++;
  return n;
}

function baseName(path: string): string {
  const i = Math.max(path.lastIndexOf("/"), path.lastIndexOf("\\"));
  return path.slice(i + 1);
}

function reason(error: unknown): string {
  if (error && typeof error === "object" && "code" in error && typeof (error as { code: unknown }).code === "string") {
    const e = error as { code: string; message?: string };
    if (e.code === "ENOENT") return "no such file";
    if (e.code === "EACCES") return "permission denied";
    if (e.code === "EISDIR") return "it is a directory";
    return e.message ?? e.code;
  }
  return error instanceof Error ? error.message : String(error);
}

const REGIMES = ["immunity", "passivation", "corrosion"];

export function summaryText(s: RunSummary): string {
  const lines: string[] = [];
  const rate = s.seconds > 0 ? Math.round(s.rows / s.seconds) : s.rows;
  lines.push(`${PROGRAM}: ${s.rows.toLocaleString("en-US")} rows from ${s.input} in ${s.seconds.toFixed(1)} s (${rate.toLocaleString("en-US")} rows/s)`);
  lines.push(`  results:  ${s.output === "-" ? "standard output" : s.output}`);
  if (s.errorRows > 0) lines.push(`  rows with bad cells: ${s.errorRows} (error codes in their result cells, reasons in the errors column)`);
  if (s.blankRows > 0) lines.push(`  rows with blank inputs: ${s.blankRows} (results left blank)`);
  const prefixes = Object.keys(s.regimes);
  if (prefixes.length > 0) {
    lines.push(`  ${"".padEnd(8)}${REGIMES.map((r) => r.padStart(12)).join("")}`);
    for (const p of prefixes) lines.push(`  ${p.padEnd(8)}${REGIMES.map((r) => String(s.regimes[p][r] ?? 0).padStart(12)).join("")}`);
  }
  if (s.svgFiles.length > 0) lines.push(`  diagrams: ${s.svgFiles.join(", ")}`);
  return lines.join("\n") + "\n";
}

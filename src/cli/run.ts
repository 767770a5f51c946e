/**
 * The command line's pipeline: check the paths, find the input's format, read the header and decide the column
 * mapping, then stream the records in batches through the worksheet functions into a temporary results file that
 * replaces the output only when complete (safe-output.ts), with bounded memory, a progress bar, messages naming
 * line and column, diagram SVGs and a summary.
 */
import { createReadStream, statSync } from "node:fs";
import type { Writable } from "node:stream";
import { DiagramSamples } from "./diagrams";
import { CsvBytes } from "./csv-bytes";
import { DEFAULT_FORMAT, textLine, type CsvFormat } from "./csv-format";
import { clip, evaluateBatch, outputHeader, type EvaluationPlan, type RowMessage } from "./evaluate";
import { probeInput } from "./input-probe";
import { CliOptions, EXIT, HELP, parseCommandLine, UsageError } from "./options";
import { duplicateHeaders, planFromHeader } from "./plan";
import { ProgressBar } from "./progress";
import { MalformedCsvError, RecordSplitter, type InputRow } from "./record-reader";
import { writeDiagrams } from "./run-diagrams";
import { SafeOutput, sameFile, type StreamOpener } from "./safe-output";
import { summaryText, type RunSummary } from "./summary";
import { ionicSummary } from "./ionic";
import { waterSummary } from "./water";
import { version } from "./version";
import { worksheetFunctions, WorksheetFunctions } from "./worksheet";

export { findColumn, planFromHeader } from "./plan";
export { summaryText, type RunSummary } from "./summary";

export interface CliStreams {
  stdout: Writable;
  stderr: Writable & { isTTY?: boolean; columns?: number };
  /** Opens the temporary results file (tests give one that fails, as a full disk does). */
  openOutput?: StreamOpener;
}

export interface RunResult {
  code: number;
  summary: RunSummary | null;
}

const PROGRAM = "redox-cells";
/** A record longer than this is refused (an unclosed quote would otherwise read the whole file into memory). */
const MAX_RECORD_CHARS = 64 * 1024 * 1024;
/** Results bytes gathered before one write. */
const WRITE_BYTES = 1 << 20;

/** Entry point: parses argv, runs, returns the exit code. Never throws. */
export async function runCli(
  argv: readonly string[],
  streams: CliStreams,
  fns: WorksheetFunctions = worksheetFunctions,
): Promise<number> {
  return (await runCommand(argv, streams, fns)).code;
}

export async function runCommand(
  argv: readonly string[],
  streams: CliStreams,
  fns: WorksheetFunctions = worksheetFunctions,
): Promise<RunResult> {
  let command;
  try {
    command = parseCommandLine(argv);
  } catch (error) {
    if (error instanceof UsageError) return usage(streams, error);
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

function usage(streams: CliStreams, error: UsageError): RunResult {
  streams.stderr.write(`${PROGRAM}: ${clip(error.message, 1000)}\nTry '${PROGRAM} --help'.\n`);
  return { code: EXIT.usage, summary: null };
}

function formatMessage(m: RowMessage): string {
  const where = m.column !== null ? `line ${m.line}, column "${clip(m.column, 60)}"` : `line ${m.line}`;
  return `${PROGRAM}: ${m.kind === "error" ? "error" : "note"}: ${where}: ${clip(m.text, 400)}\n`;
}

/** Failure of a run: a message on standard error, an exit code, and no results written. */
class RunFailure extends Error {
  constructor(
    readonly code: number,
    message: string,
  ) {
    super(message);
  }
}

const cannotRead = (options: CliOptions, error: unknown): RunFailure =>
  new RunFailure(EXIT.io, `cannot read the input "${clip(options.input, 200)}": ${reason(error)}`);
const cannotWrite = (options: CliOptions, error: unknown): RunFailure =>
  new RunFailure(EXIT.io, `cannot write the output "${clip(options.output, 200)}": ${reason(error)}`);

/** The input's size; refuses a missing input and an output that is the input. */
function checkPaths(options: CliOptions): number {
  let size: number;
  try {
    const stat = statSync(options.input);
    if (!stat.isFile()) throw new Error("not a file");
    size = stat.size;
  } catch (error) {
    throw cannotRead(options, error);
  }
  if (options.output !== "-" && sameFile(options.input, options.output)) {
    throw new RunFailure(
      EXIT.usage,
      `the output "${clip(options.output, 200)}" is the input file; give another -o (the input is left untouched)`,
    );
  }
  return size;
}

export async function runWithOptions(
  options: CliOptions,
  streams: CliStreams,
  fns: WorksheetFunctions = worksheetFunctions,
): Promise<RunResult> {
  const started = Date.now();
  let output: SafeOutput | null = null;
  try {
    const size = checkPaths(options);
    let format: CsvFormat;
    try {
      format = {
        ...DEFAULT_FORMAT,
        ...probeInput(options.input, options.delimiter, options.decimalMark),
        rawText: options.rawText,
        fullPrecision: options.fullPrecision,
      };
    } catch (error) {
      throw cannotRead(options, error);
    }
    const run = new StreamedRun(options, streams, fns, format, size);
    const plan = await run.stream(async () => {
      if (options.output === "-") return streams.stdout;
      try {
        output = await SafeOutput.open(options.output, streams.openOutput);
      } catch (error) {
        throw cannotWrite(options, error);
      }
      return output.stream;
    });
    if (output !== null) {
      try {
        await (output as SafeOutput).commit();
      } catch (error) {
        throw cannotWrite(options, error);
      }
    }
    return finish(options, streams, run, plan, started);
  } catch (error) {
    (output as SafeOutput | null)?.abort();
    if (error instanceof UsageError) return usage(streams, error);
    if (error instanceof RunFailure) {
      streams.stderr.write(`${PROGRAM}: ${error.message}\n`);
      if (error.code === EXIT.usage) streams.stderr.write(`Try '${PROGRAM} --help'.\n`);
      return { code: error.code, summary: null };
    }
    throw error;
  }
}

/** After the results are in place: the message count, the diagrams and the summary. */
async function finish(
  options: CliOptions,
  streams: CliStreams,
  run: StreamedRun,
  plan: EvaluationPlan,
  started: number,
): Promise<RunResult> {
  const err = streams.stderr;
  if (run.messageCount > options.maxMessages)
    err.write(
      `${PROGRAM}: … ${run.messageCount - options.maxMessages} more messages not shown (the errors column has the errors)\n`,
    );
  let svgFiles: string[] = [];
  let diagramFailure: string | null = null;
  if (options.svgDir !== null) {
    try {
      const outcome = writeDiagrams(options, plan, run.diagrams);
      svgFiles = outcome.files;
      if (outcome.notDrawn.length > 0) diagramFailure = `the results are complete, but ${outcome.notDrawn.join("; ")}`;
    } catch (error) {
      diagramFailure = `the results are complete, but the diagrams cannot be written to "${clip(options.svgDir, 200)}": ${reason(error)}`;
    }
  }
  const summary: RunSummary = {
    input: options.input,
    output: options.output,
    rows: run.rows,
    errorRows: run.errorRows,
    blankRows: run.blankRows,
    messages: run.messageCount,
    seconds: (Date.now() - started) / 1000,
    regimes: run.regimes,
    svgFiles,
    header: outputHeader(plan),
    notes: [
      waterSummary(plan.ligands, plan.headers, options),
      ...(plan.ionic && (plan.ionic.kind !== "ideal" || plan.ionic.ignored.length > 0)
        ? [ionicSummary(plan.ionic, plan.headers)]
        : []),
    ],
  };
  if (!options.quiet) (options.output === "-" ? err : streams.stdout).write(summaryText(summary));
  if (diagramFailure !== null) {
    err.write(`${PROGRAM}: ${diagramFailure}\n`);
    return { code: EXIT.diagrams, summary };
  }
  return { code: run.errorRows > 0 ? EXIT.rowErrors : EXIT.ok, summary };
}

/** One pass over the input: records → batches → results lines, with counts, messages and diagram samples. */
class StreamedRun {
  rows = 0;
  errorRows = 0;
  blankRows = 0;
  messageCount = 0;
  readonly regimes: Record<string, Record<string, number>> = {};
  readonly diagrams: DiagramSamples | null;
  /** The results lines not written yet. */
  private bytes: CsvBytes | null = null;
  private readonly progress: ProgressBar | null;

  constructor(
    private readonly options: CliOptions,
    private readonly streams: CliStreams,
    private readonly fns: WorksheetFunctions,
    private readonly format: CsvFormat,
    private readonly size: number,
  ) {
    const show = options.progress === true || (options.progress === "auto" && streams.stderr.isTTY === true);
    this.progress = show ? new ProgressBar(streams.stderr, size) : null;
    this.diagrams = options.svgDir === null ? null : new DiagramSamples();
  }

  private say(text: string): void {
    this.progress?.clear();
    this.streams.stderr.write(text);
  }

  /** Reads every record; `openOutput` is called once the header is planned. Returns the plan. */
  async stream(openOutput: (plan: EvaluationPlan) => Promise<Writable>): Promise<EvaluationPlan> {
    const { options, format } = this;
    const splitter = new RecordSplitter(format.delimiter);
    const source = createReadStream(options.input, { encoding: "utf8", highWaterMark: 64 << 10 });
    let plan: EvaluationPlan | null = null;
    let out: Writable | null = null;
    let pending: InputRow[] = [];
    const state = { failed: null as unknown };
    try {
      for await (const chunk of source as AsyncIterable<string>) {
        splitter.push(chunk, pending);
        if (splitter.pending > MAX_RECORD_CHARS)
          throw new MalformedCsvError(`a record runs past ${MAX_RECORD_CHARS / 1048576} MiB (an unclosed quote?)`);
        if (plan === null && pending.length > 0) {
          plan = this.planOf(pending.shift()!);
          out = await openOutput(plan);
          out.on("error", (e) => (state.failed ??= e));
          await this.write(out, textLine(outputHeader(plan), format), state);
        }
        if (plan !== null && out !== null && pending.length >= options.batchSize)
          pending = await this.flush(plan, out, pending, state, false);
        this.progress?.update(source.bytesRead, this.rows);
      }
      splitter.end(pending);
    } catch (error) {
      source.destroy();
      if (error instanceof UsageError || error instanceof RunFailure) throw error;
      if (state.failed !== null || (error as { code?: string })?.code === "EPIPE")
        throw cannotWrite(options, state.failed ?? error);
      throw cannotRead(options, error);
    }
    if (plan === null && pending.length > 0) {
      plan = this.planOf(pending.shift()!);
      out = await openOutput(plan);
      out.on("error", (e) => (state.failed ??= e));
      await this.write(out, textLine(outputHeader(plan), format), state);
    }
    if (plan === null || out === null)
      throw new RunFailure(EXIT.io, `the input "${clip(options.input, 200)}" has no header row`);
    await this.flush(plan, out, pending, state, true);
    this.progress?.update(this.size, this.rows, true);
    this.progress?.clear();
    return plan;
  }

  private planOf(header: InputRow): EvaluationPlan {
    const headers = header.fields.map((h) => h.trim());
    const plan = planFromHeader(headers, this.options, this.format);
    for (const note of duplicateHeaders(headers)) this.say(`${PROGRAM}: note: line ${header.line}: ${note}\n`);
    return plan;
  }

  /** Evaluates and writes the rows in batches; all of them when `all`, else whole batches (the rest is returned). */
  private async flush(
    plan: EvaluationPlan,
    out: Writable,
    rows: InputRow[],
    state: { failed: unknown },
    all: boolean,
  ): Promise<InputRow[]> {
    const size = this.options.batchSize;
    const bytes = (this.bytes ??= new CsvBytes(plan.format));
    let start = 0;
    // batches' lines are written together, about 1 MiB at a time (one write per batch costs more than the batch)
    while (rows.length - start >= size || (all && start < rows.length)) {
      const batch = rows.slice(start, start + size).map((r) => this.fitted(plan, r));
      start += batch.length;
      this.evaluate(plan, batch, bytes);
      if (bytes.length >= WRITE_BYTES) await this.write(out, bytes.take(), state);
    }
    if (all && bytes.length > 0) await this.write(out, bytes.take(), state);
    return rows.slice(start);
  }

  /** A record with as many fields as the header: padded with blanks, or cut with a note. */
  private fitted(plan: EvaluationPlan, row: InputRow): InputRow {
    const width = plan.headers.length;
    const n = row.fields.length;
    this.rows++;
    if (n === width) return row;
    if (n < width)
      return { fields: [...row.fields, ...new Array<string>(width - n).fill("")], line: row.line, text: undefined };
    const extra = row.fields.slice(width);
    if (extra.some((f) => f.trim() !== ""))
      this.message({
        line: row.line,
        column: null,
        text: `${n} fields, the header has ${width}; the fields after column ${width} are not written`,
        kind: "blank",
      });
    return { fields: row.fields.slice(0, width), line: row.line, text: undefined };
  }

  private message(m: RowMessage): void {
    if (this.messageCount < this.options.maxMessages) this.say(formatMessage(m));
    this.messageCount++;
  }

  private evaluate(plan: EvaluationPlan, batch: InputRow[], bytes: CsvBytes): void {
    const result = evaluateBatch(plan, batch, this.fns, bytes, this.diagrams);
    this.errorRows += result.errorRows;
    this.blankRows += result.blankRows;
    for (const m of result.messages) this.message(m);
    for (const [prefix, counts] of result.regimes) {
      const into = (this.regimes[prefix] ??= {});
      for (const [regime, n] of counts) into[regime] = (into[regime] ?? 0) + n;
    }
  }

  private async write(out: Writable, text: string | Buffer, state: { failed: unknown }): Promise<void> {
    if (state.failed) throw cannotWrite(this.options, state.failed);
    if (!out.write(text)) await drained(out);
    if (state.failed) throw cannotWrite(this.options, state.failed);
  }
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

export function reason(error: unknown): string {
  if (error && typeof error === "object" && "code" in error && typeof (error as { code: unknown }).code === "string") {
    const e = error as { code: string; message?: string };
    if (e.code === "ENOENT") return "no such file";
    if (e.code === "EACCES") return "permission denied";
    if (e.code === "EISDIR") return "it is a directory";
    if (e.code === "ENOSPC")
      return "no space left on the device (the disk is full); any previous results are left as they were";
    return clip(e.message ?? e.code, 300);
  }
  return clip(error instanceof Error ? error.message : String(error), 300);
}

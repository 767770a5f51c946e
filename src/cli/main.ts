/**
 * `redox-cells` entry point: answers --help and --version without loading the chemistry, runs the command line
 * on process.argv otherwise, and sets the exit code (options.ts). Ctrl-C (SIGINT) and SIGTERM remove the results
 * file being written, leave any previous results as they were, and exit 130 / 143.
 */
import { EXIT, HELP, parseCommandLine, UsageError } from "./options";
import { abortAllOutputs } from "./safe-output";
import { version } from "./version";

function onSignal(code: number, what: string): void {
  abortAllOutputs();
  process.stderr.write(`\nredox-cells: ${what}; no results written (any previous results are left as they were)\n`);
  process.exit(code);
}

async function main(argv: readonly string[]): Promise<number> {
  let quick: string | null = null;
  try {
    const command = parseCommandLine(argv);
    if (command.kind === "help") quick = HELP;
    else if (command.kind === "version") quick = `redox-cells ${version()}\n`;
  } catch (error) {
    if (!(error instanceof UsageError)) throw error;
  }
  if (quick !== null) {
    process.stdout.write(quick);
    return EXIT.ok;
  }
  process.on("SIGINT", () => onSignal(EXIT.interrupted, "interrupted"));
  process.on("SIGTERM", () => onSignal(EXIT.terminated, "terminated"));
  const { runCli } = await import("./run");
  return runCli(argv, { stdout: process.stdout, stderr: process.stderr });
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    abortAllOutputs();
    process.stderr.write(
      `redox-cells: unexpected failure: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`,
    );
    process.exitCode = 3;
  },
);

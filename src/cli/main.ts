/**
 * `redox-cells` entry point: runs the command line on process.argv and sets the exit code (see options.ts).
 */
import { runCli } from "./run";

void runCli(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr }).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`redox-cells: unexpected failure: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    process.exitCode = 3;
  },
);

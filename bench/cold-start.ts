/**
 * Cold start of the worksheet functions, in a fresh process: the built bundle read and evaluated the way the host
 * loads it (test-support's stand-in registry), then the first SPECIES and the first own-water SPECIES answered —
 * what a user waits for when a workbook with Redox Cells formulas opens. Prints one line; never fails on time.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { distDir, runInStandInRegistry } from "../test-support/bundle-harness";

const start = performance.now();
const file = join(distDir(), "functions.js");
const { functions } = runInStandInRegistry(readFileSync(file, "utf8"), file);
const loaded = performance.now();
const species = functions.get("SPECIES");
if (!species) throw new Error("SPECIES is not registered");
species("Pb", 7.5, 0.2, 25);
species("Pb", [[7.5]], [[0.2]], [[12]], undefined, [[1e-3]], [[5e-4]], [[1e-4]], undefined, [[5e-3]]);
const answered = performance.now();
const total = answered - start;
console.log(
  `functions bundle: cold start (evaluate the bundle, first SPECIES in pure and in own water): ${total.toFixed(0)} ms ` +
    `(evaluate ${(loaded - start).toFixed(0)} ms, first answers ${(answered - loaded).toFixed(0)} ms)  ` +
    `target < 150 ms  ${total < 150 ? "met" : "NOT MET"}`,
);

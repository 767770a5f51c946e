/**
 * Writes tests/fixtures/species-25c-snapshot.json: REDOX.SPECIES of the structural metals at 25 °C over a pH/E grid,
 * from the code and data at the current commit. Written once before S° was added to hydroxo-complexes (issue #16),
 * so that tests/reference/boiler-metals.test.ts shows the 25 °C answers did not change (a regression snapshot, not an
 * outside check). Run from the repository root: npx tsx scripts/make-species-snapshot.ts
 */
import { execSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { getDatabase } from "../src/chemistry/database";
import { speciesAt } from "../src/functions/stability-functions";

const range = (from: number, to: number, step: number): number[] =>
  Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => Math.round((from + i * step) * 1000) / 1000);
const SNAPSHOT_GRID = {
  metals: ["Fe", "Cu", "Ni", "Zn", "Cr"],
  activities: [1e-6, 1e-3],
  pH: range(0, 14, 0.5),
  potentials: range(-1.6, 1.6, 0.05),
};

const commit = execSync("git rev-parse HEAD").toString().trim();
const answers: Record<string, Record<string, string[]>> = {};
for (const metal of SNAPSHOT_GRID.metals) {
  answers[metal] = {};
  for (const activity of SNAPSHOT_GRID.activities) {
    const cells = speciesAt(
      metal,
      [SNAPSHOT_GRID.pH],
      SNAPSHOT_GRID.potentials.map((e) => [e]),
      25,
      activity,
    );
    answers[metal][String(activity)] = cells.map((row) => row.map(String).join(" "));
  }
}
// ΔG°f at 25 °C of every species of these metals' files, J/mol
const db = getDatabase();
const gibbs = Object.fromEntries(
  db
    .allSpecies()
    .filter((s) => SNAPSHOT_GRID.metals.includes(s.system))
    .map((s) => [s.formula, s.dGf]),
);
const out = { writtenFrom: commit, grid: SNAPSHOT_GRID, answers, gibbs };
writeFileSync("tests/fixtures/species-25c-snapshot.json", JSON.stringify(out, null, 1) + "\n");
console.log(`wrote tests/fixtures/species-25c-snapshot.json from ${commit}`);

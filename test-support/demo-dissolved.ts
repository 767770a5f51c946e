/**
 * REDOX.DISSOLVED (µg/L) of one row of the invented demo log, chained as a worksheet chains it: REDOX.TOSHE of the
 * reading as logged (mV vs the electrode its header names) at the row's temperature, REDOX.DIC of its alkalinity at
 * its pH and temperature, and an optional orthophosphate total typed once (mol/kg as P). For the solubility-chart
 * tests: the chart's value at the sample's pH must be this number.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { dicAt } from "../src/functions/carbonate-functions";
import { toSHEAt } from "../src/functions/electrode-functions";
import { dissolvedAt } from "../src/functions/stability-functions";
import { matchHeaders, matchWaterColumns } from "../src/tables";
import { tableFromText } from "../src/taskpane/standalone-adapter";

export const DEMO_TABLE = tableFromText(
  readFileSync(join(__dirname, "../data/demo/sample-log.csv"), "utf8"),
  "sample-log.csv",
);
export const DEMO_MATCH = matchHeaders(DEMO_TABLE.headers);
export const DEMO_ALKALINITY = matchWaterColumns(DEMO_TABLE.headers, DEMO_MATCH.mapping).alkalinity!;

/** The sheet's REDOX.DISSOLVED for the demo row `id`; throws when the row or a cell gives no number. */
export function demoRowDissolved(metal: string, id: string, phosphate = 0): number {
  const m = DEMO_MATCH.mapping;
  const row = DEMO_TABLE.rows.find((r) => r[m.id] === id);
  if (!row) throw new Error(`no demo row ${id}`);
  const cell = (i: number) => Number(row[i]);
  const number = (v: unknown, what: string): number => {
    if (typeof v !== "number") throw new Error(`${id}: ${what} gave no number`);
    return v;
  };
  const [pH, celsius] = [cell(m.pH), cell(m.temperature)];
  const eSHE = number(toSHEAt(cell(m.potential) / 1000, DEMO_MATCH.hints.electrode!, celsius)[0][0], "TOSHE");
  const dic = number(dicAt(cell(DEMO_ALKALINITY.index), pH, celsius)[0][0], "DIC");
  return number(dissolvedAt(metal, pH, eSHE, celsius, dic, "", "", phosphate || "", "", "ug/L")[0][0], "DISSOLVED");
}

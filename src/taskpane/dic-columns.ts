/**
 * Columns of dissolved inorganic carbon (DIC, TIC) for the carbonate argument, matched and scaled as the command
 * line does (src/cli/water.ts): mol/kg as written, or mmol/L, µmol/L or mg/L as C when the header says so (dilute
 * water, 1 L taken as 1 kg — common practice). A measured DIC is used before one derived from alkalinity.
 * (To move with the header matching into the shared tables layer.)
 */
import { getDatabase } from "../chemistry/database";
import { headerTokens } from "./header-match";

export interface DicColumn {
  readonly index: number;
  /** mol/kg per unit of the column. */
  readonly factor: number;
  /** The unit read, in words. */
  readonly unit: string;
}

const has = (tokens: readonly string[], ...words: string[]) => words.some((w) => tokens.includes(w));

export function isDicHeader(header: string): boolean {
  const t = headerTokens(header);
  return has(t, "dic", "tic") || (has(t, "inorganic") && has(t, "carbon"));
}

export function dicColumnAt(headers: readonly string[], index: number): DicColumn {
  const t = headerTokens(headers[index] ?? "");
  if (has(t, "mmol", "mm")) return { index, factor: 1e-3, unit: "mmol/L" };
  if (has(t, "umol")) return { index, factor: 1e-6, unit: "µmol/L" };
  if (has(t, "mg", "ppm")) return { index, factor: 1e-3 / (getDatabase().element("C")?.atomicWeight ?? NaN), unit: "mg/L as C" };
  return { index, factor: 1, unit: "mol/kg" };
}

/** The first DIC column among `headers` that no other role uses, or null. */
export function findDicColumn(headers: readonly string[], taken: ReadonlySet<number>): DicColumn | null {
  const index = headers.findIndex((h, i) => !taken.has(i) && isDicHeader(h));
  return index < 0 ? null : dicColumnAt(headers, index);
}

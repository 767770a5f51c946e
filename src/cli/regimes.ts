/**
 * The regime column from the species column. REDOX.REGIME and REDOX.SPECIES read the same arguments and describe
 * the same dominant species (its regime, its formula: src/functions/stability-functions.ts), so the command line
 * calls SPECIES once and reads each formula's regime from the metal's species table instead of finding the dominant
 * species a second time. Errors and blanks are the same in both columns.
 */
import { getDatabase, speciesTable } from "../chemistry";
import { type CellOutput, type CellScalar } from "../functions";

const bySymbol = new Map<string, ReadonlyMap<string, string>>();

/** Formula → regime of every species of a metal (formulas are unique within a metal's table). */
function regimesOf(symbol: string): ReadonlyMap<string, string> {
  let regimes = bySymbol.get(symbol);
  if (!regimes) {
    regimes = new Map(speciesTable(getDatabase(), symbol).species.map((s) => [s.formula, s.regime]));
    bySymbol.set(symbol, regimes);
  }
  return regimes;
}

/**
 * REGIME's answers for a batch from SPECIES's: `element` is the fixed metal's symbol, or each row's element cell
 * (read as the functions read it: trimmed text, a symbol or a name).
 */
export function regimeColumn(species: readonly CellOutput[], element: string | readonly CellScalar[]): CellOutput[] {
  const out: CellOutput[] = new Array(species.length);
  let lastCell: CellScalar = null;
  let regimes: ReadonlyMap<string, string> | null = typeof element === "string" ? regimesOf(element) : null;
  for (let r = 0; r < species.length; r++) {
    const s = species[r];
    if (typeof s !== "string" || s === "") {
      out[r] = s; // an error or a blank: REGIME gives the same
      continue;
    }
    if (typeof element !== "string" && (regimes === null || element[r] !== lastCell)) {
      lastCell = element[r];
      // a species answer means the cell named a metal
      regimes = regimesOf(getDatabase().resolveMetal(String(lastCell).trim())!);
    }
    out[r] = regimes!.get(s)!;
  }
  return out;
}

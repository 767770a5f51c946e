/**
 * The ionic strength of each sample in the pane: a conductivity, TDS or ionic-strength column found by header
 * (src/tables/ionic-columns.ts; a text column is never taken), used automatically like the alkalinity column, and
 * turned into the [ionicStrength] argument exactly as the command line does (ionicStrengthArgument: REDOX.IONICSTRENGTH
 * for conductivity and TDS, the stated value otherwise). A blank cell: that sample is answered without the
 * correction (ideal solution) and counted in the caption. Pure: no host, no DOM.
 */
import { ionicStrengthArgument, type CellScalar, type IonicStrengthArgument } from "../functions";
import { IONIC_UNITS, isNumericColumn, matchIonicColumns, readNumber, type IonicColumn } from "../tables";

/** The column the pane reads the ionic strength from, or null: the first by precedence whose cells are numbers. */
export function findIonicColumn(
  headers: readonly unknown[],
  taken: readonly number[],
  rows: readonly (readonly unknown[])[],
): IonicColumn | null {
  const found = matchIonicColumns(headers, taken);
  return found.find((c) => isNumericColumn(rows.map((r) => r[c.index]))) ?? null;
}

/** A host cell as a number × factor (decimal point or comma), or as written for the functions' own message. */
function cellValue(cell: unknown, factor: number): CellScalar {
  if (typeof cell === "number") return cell * factor;
  if (cell === null || cell === undefined) return "";
  const text = String(cell).trim();
  const x = readNumber(text, ".") ?? readNumber(text, ",");
  return x === null ? text : x * factor;
}

/** Every row's [ionicStrength] from its cell in `column`. */
export function ionicArgumentFor(column: IonicColumn, rows: readonly (readonly unknown[])[]): IonicStrengthArgument {
  const { factor, basis } = IONIC_UNITS[column.unit];
  return ionicStrengthArgument(
    rows.map((r) => [cellValue(r[column.index], factor)]),
    basis === "mol/kg" ? null : basis,
  );
}

const SOURCE = {
  "uS/cm": "REDOX.IONICSTRENGTH from specific conductance, Russell 1976",
  "mg/L": "REDOX.IONICSTRENGTH from TDS, Langelier 1936",
  "mol/kg": "as stated",
} as const;

/** "I 0.016 mol/kg" for a sample's hover; "" when its answer is ideal. */
export function ionicHover(used: unknown): string {
  return typeof used === "number" && used > 0 ? `I ${Number(used.toPrecision(3))} mol/kg` : "";
}

/**
 * The caption sentence: where the ionic strength comes from, its median over the samples and how many were blank.
 * The diagram itself is drawn for an ideal solution; each sample's marker is its own row's corrected answer.
 */
export function ionicCaption(header: string, column: IonicColumn, argument: IonicStrengthArgument): string {
  const used = argument.cells.map(([c]) => c).filter((c): c is number => typeof c === "number");
  const sorted = [...used].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const median = sorted.length === 0 ? 0 : sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
  const blanks = argument.cells.filter(([c]) => c === "").length;
  const basis = IONIC_UNITS[column.unit].basis;
  return (
    `Ionic strength: each sample's own from "${header}" (${IONIC_UNITS[column.unit].words}, ${SOURCE[basis]}), ` +
    `median ${Number(median.toPrecision(3))} mol/kg; Davies activity coefficients in the samples' answers, the regions drawn ideal` +
    (blanks > 0 ? `; ${blanks} blank ${blanks === 1 ? "row" : "rows"} answered without the correction.` : ".")
  );
}

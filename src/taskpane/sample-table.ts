/**
 * Rows of a sample log → samples for the diagram, with every row that cannot be drawn listed with its reason
 * (blank or unreadable pH or potential, values out of range). Readings are converted to volts vs SHE with the
 * chosen electrode at the row's own temperature when it has one (the reference electrode sits in that water),
 * otherwise at the diagram's temperature. Pure: no host, no DOM.
 */
import {
  boundText,
  getDatabase,
  getElectrodes,
  MAX_CELSIUS,
  MAX_POTENTIAL,
  MIN_CELSIUS,
  PH_MAX,
  PH_MIN,
  type Electrode,
  type ElectrodeTable,
  type LigandName,
} from "../chemistry";
import { ColumnMapping, findHeaderRow, POINT_NUMBER, toCelsius, WaterColumn } from "../tables";
import { type PotentialUnit, type SampleInput } from "../diagram";
import { RowTotals, rowTotal } from "./ligand-inputs";

/** A block of cells as a host hands it over: header texts, data rows, and the row number of each data row. */
export interface SampleTable {
  readonly headers: readonly string[];
  readonly rows: readonly (readonly unknown[])[];
  /** Sheet row (1-based) or file line of each data row, for messages and for selecting the row again. */
  readonly rowNumbers: readonly number[];
  /** Where the rows came from: "Sheet1!A1:P288", "pasted text", "sample-log.csv". */
  readonly source: string;
}

export interface ReadOptions {
  readonly mapping: ColumnMapping;
  readonly electrode: string;
  readonly unit: PotentialUnit;
  readonly temperatureUnit: "C" | "F";
  /** Diagram temperature, °C: used for rows without a temperature. */
  readonly celsius: number;
  /** When set and a metal column is mapped, only rows of this metal are read. */
  readonly onlyMetal?: string;
  /** Ligands read per row from a water column (ligand-inputs.ts); absent: none. */
  readonly waterColumns?: Partial<Record<LigandName, WaterColumn>>;
}

export interface SkippedRow {
  readonly row: number;
  readonly reason: string;
}

export interface ReadResult {
  readonly samples: SampleInput[];
  /** Temperatures of the drawn rows, °C (rows with a temperature only). */
  readonly temperatures: number[];
  readonly skipped: SkippedRow[];
  /** Rows left out because the metal column names another metal. */
  readonly otherMetal: number;
  /** Per drawn sample (aligned with `samples`): its ligand totals read from the water columns. */
  readonly rowTotals: RowTotals[];
  /** Per drawn sample: its index in `table.rows`. */
  readonly indices: number[];
}

const NUMBER = POINT_NUMBER;

type Parsed = { value: number } | { blank: true } | { error: string };

/** A cell as a number: numbers as they are, text only when it is a plain decimal number. */
export function readNumber(cell: unknown): Parsed {
  if (cell === null || cell === undefined) return { blank: true };
  if (typeof cell === "number") return Number.isFinite(cell) ? { value: cell } : { error: "is not a finite number" };
  if (typeof cell === "boolean") return { error: `"${cell}" is not a number` };
  const text = String(cell).trim();
  if (text === "") return { blank: true };
  if (NUMBER.test(text)) return { value: Number(text) };
  if (/^[+-]?\d+,\d+$/.test(text)) return { error: `"${text}" has a decimal comma; write ${text.replace(",", ".")}` };
  return { error: `"${text.length > 20 ? text.slice(0, 20) + "…" : text}" is not a number` };
}

/** Median of a list (0 items → NaN). */
export function median(values: readonly number[]): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

const NO_TOTALS: RowTotals = Object.freeze({});
const PH_RANGE = [PH_MIN, PH_MAX] as const; // docs/method.md, Domain
const E_RANGE = [-MAX_POTENTIAL, MAX_POTENTIAL] as const; // V vs SHE, the span searched for boundaries (docs/method.md, Domain)

/** Why a row cannot be drawn (empty when it can), with its pH, temperature (°C) and E vs SHE as read. */
function checkRow(
  row: readonly unknown[],
  options: ReadOptions,
  electrodes: ElectrodeTable,
  electrode: Electrode,
): { reasons: string[]; pH: Parsed; celsius: number; hasTemperature: boolean; eSHE: number } {
  const { mapping } = options;
  const factor = options.unit === "mV" ? 1e-3 : 1;
  const cell = (index: number) => (index >= 0 ? row[index] : undefined);
  const reasons: string[] = [];
  const pH = readNumber(cell(mapping.pH));
  const reading = readNumber(cell(mapping.potential));
  const temperature = mapping.temperature >= 0 ? readNumber(cell(mapping.temperature)) : ({ blank: true } as Parsed);
  if ("blank" in pH) reasons.push("pH is blank");
  else if ("error" in pH) reasons.push(`pH ${pH.error}`);
  else if (pH.value < PH_RANGE[0] || pH.value > PH_RANGE[1])
    reasons.push(`pH ${pH.value} is outside ${boundText(PH_MIN)}…${PH_MAX}`);
  if ("blank" in reading) reasons.push("potential is blank");
  else if ("error" in reading) reasons.push(`potential ${reading.error}`);
  let celsius = options.celsius;
  let hasTemperature = false;
  if ("error" in temperature) reasons.push(`temperature ${temperature.error}`);
  else if ("value" in temperature) {
    celsius = toCelsius(temperature.value, options.temperatureUnit);
    if (celsius < MIN_CELSIUS || celsius > MAX_CELSIUS)
      reasons.push(
        `temperature ${temperature.value} °${options.temperatureUnit} is outside ${MIN_CELSIUS}…${MAX_CELSIUS} °C`,
      );
    else hasTemperature = true;
  }
  let eSHE = NaN;
  if ("value" in reading && "value" in pH && reasons.length === 0) {
    eSHE = reading.value * factor + electrodes.potential(electrode, celsius, pH.value);
    if (eSHE < E_RANGE[0] || eSHE > E_RANGE[1]) {
      reasons.push(
        `potential ${reading.value} ${options.unit} is ${eSHE.toFixed(2)} V vs SHE, outside ${boundText(-MAX_POTENTIAL)}…+${MAX_POTENTIAL} V (is the unit right?)`,
      );
    }
  }
  return { reasons, pH, celsius, hasTemperature, eSHE };
}

export function readSamples(table: SampleTable, options: ReadOptions): ReadResult {
  const { mapping } = options;
  const electrodes = getElectrodes();
  const found = electrodes.lookup(options.electrode);
  if ("error" in found) throw new Error(found.error);
  const electrode = found.electrode;
  const samples: SampleInput[] = [];
  const temperatures: number[] = [];
  const skipped: SkippedRow[] = [];
  let otherMetal = 0;
  const rowTotals: RowTotals[] = [];
  const indices: number[] = [];
  const waterColumns = Object.entries(options.waterColumns ?? {}) as [LigandName, WaterColumn][];
  const db = waterColumns.length > 0 ? getDatabase() : null;
  const cell = (row: readonly unknown[], index: number) => (index >= 0 ? row[index] : undefined);

  table.rows.forEach((row, i) => {
    const rowNumber = table.rowNumbers[i] ?? i + 1;
    if (row.every((c) => c === null || c === undefined || String(c).trim() === "")) return; // an empty line is not a sample
    if (options.onlyMetal && mapping.metal >= 0) {
      const metal = String(cell(row, mapping.metal) ?? "").trim();
      if (metal.toLowerCase() !== options.onlyMetal.toLowerCase()) {
        otherMetal++;
        return;
      }
    }
    const { reasons, pH, celsius, hasTemperature, eSHE } = checkRow(row, options, electrodes, electrode);
    if (reasons.length > 0 || !("value" in pH)) {
      skipped.push({ row: rowNumber, reason: reasons.join("; ") });
      return;
    }
    const idCell = cell(row, mapping.id);
    const siteCell = cell(row, mapping.site);
    const id =
      [idCell, siteCell]
        .filter((c) => c !== undefined && c !== null && String(c).trim() !== "")
        .map((c) => String(c).trim())[0] ?? "";
    const dissolved = readNumber(cell(row, mapping.dissolved));
    samples.push({
      row: rowNumber,
      id,
      pH: pH.value,
      eSHE,
      dissolved: "value" in dissolved ? dissolved.value : undefined,
    });
    indices.push(i);
    if (hasTemperature) temperatures.push(celsius);
    if (waterColumns.length === 0) rowTotals.push(NO_TOTALS);
    else {
      const totals: RowTotals = {};
      for (const [ligand, column] of waterColumns)
        totals[ligand] = rowTotal(db!, ligand, column, cell(row, column.index), pH.value, celsius);
      rowTotals.push(totals);
    }
  });
  return { samples, temperatures, skipped, otherMetal, rowTotals, indices };
}

/**
 * A block of cells (a selection, a table, a parsed file) → header texts and data rows: the header row is found by
 * its text among the first rows (header-match.ts findHeaderRow). Without one, `headersAbove` (the rows above the
 * block in the sheet) may hold it; failing both, the block's first row serves as header and the user maps columns.
 */
export function tableFromBlock(
  cells: readonly (readonly unknown[])[],
  rowNumbers: readonly number[],
  source: string,
  headersAbove?: readonly (readonly unknown[])[],
): SampleTable {
  const text = (row: readonly unknown[]) => row.map((c) => (c === null || c === undefined ? "" : String(c).trim()));
  const at = findHeaderRow(cells);
  if (at >= 0)
    return { headers: text(cells[at]), rows: cells.slice(at + 1), rowNumbers: rowNumbers.slice(at + 1), source };
  if (headersAbove && headersAbove.length > 0) {
    const above = findHeaderRow(headersAbove, headersAbove.length);
    if (above >= 0) return { headers: text(headersAbove[above]), rows: cells, rowNumbers, source };
  }
  if (cells.length === 0) return { headers: [], rows: [], rowNumbers: [], source };
  return { headers: text(cells[0]), rows: cells.slice(1), rowNumbers: rowNumbers.slice(1), source };
}

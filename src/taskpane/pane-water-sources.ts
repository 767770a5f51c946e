/**
 * The pane's ligand fieldset: each ligand's source (a typed total, or a column of the table — a measured DIC column
 * first for carbonate), reading those choices, remembering them and the note on what the diagram uses.
 */
import { LIGAND_ORDER, LigandName, MAX_LIGAND_TOTAL } from "../chemistry";
import {
  ColumnMapping,
  matchWaterColumns,
  dicBasis,
  WATER_UNIT_WORDS,
  WaterColumn,
  waterColumnAt,
  WaterColumns,
} from "../tables";
import type { PaneSettings } from "./host";
import { LIGAND_COLUMN, LigandSource, resolveWater, WaterSettings, waterCaption } from "./ligand-inputs";
import { $, input, select } from "./pane-dom";
import type { SampleTable } from "./sample-table";

/** Ligand settings and the columns they read, or a message when a typed total is not a number in range. */
export type WaterInput =
  { settings: WaterSettings; columns: Partial<Record<LigandName, WaterColumn>> } | { error: string };

/** Whether most filled cells of column `index` (among the first 200 rows) are numbers. */
function mostlyNumbers(table: SampleTable | null, index: number): boolean {
  let numbers = 0;
  let filled = 0;
  for (const row of (table?.rows ?? []).slice(0, 200)) {
    const cell = row[index];
    if (cell === null || cell === undefined || String(cell).trim() === "") continue;
    filled++;
    if (typeof cell === "number" || /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(String(cell))) numbers++;
  }
  return filled > 0 && numbers >= filled / 2;
}

/** A menu option reading column `index`, remembering its header text. */
function columnOption(text: string, value: string, header: string): HTMLOptionElement {
  const option = new Option(text, value);
  option.dataset.header = header;
  return option;
}

/**
 * The "from column" menus of the ligand fieldset: the column found by its header first, then every other
 * column. A choice survives a new table when a column of the same header text is still there. Returns the
 * water columns found by their headers.
 */
export function buildWaterSources(
  table: SampleTable | null,
  mapping: ColumnMapping,
  settings: PaneSettings,
): WaterColumns {
  const headers = table?.headers ?? [];
  const waterFound = matchWaterColumns(headers, mapping);
  const taken = (i: number) => Object.values(mapping).includes(i);
  for (const ligand of LIGAND_ORDER) {
    const role = LIGAND_COLUMN[ligand];
    const menu = select(`${ligand}-source`);
    const previous = /^(col|dic):/.test(menu.value)
      ? menu.selectedOptions[0]?.dataset.header
      : settings.water?.[ligand]?.column;
    menu.replaceChildren(new Option("typed total", "typed"));
    // carbonate: a measured DIC column first (used before alkalinity, as the command line does)
    const dic = ligand === "carbonate" ? waterFound.dic : undefined;
    if (dic)
      menu.add(
        columnOption(
          `from the DIC column “${headers[dic.index]}” (${WATER_UNIT_WORDS[dic.unit]})`,
          `dic:${dic.index}`,
          headers[dic.index],
        ),
      );
    const found = waterFound[role];
    const order = found
      ? [found.index, ...headers.keys()].filter((i, k, all) => all.indexOf(i) === k)
      : [...headers.keys()];
    for (const i of order) {
      if (taken(i)) continue; // pH, potential… are not water columns
      if (i !== found?.index && !mostlyNumbers(table, i)) continue; // site, date, note… are not either
      const read = waterColumnAt(role, headers, i).unit;
      const unit = WATER_UNIT_WORDS[read];
      const what = role === "alkalinity" && dicBasis(read) === "bicarbonate" ? "bicarbonate" : role;
      menu.add(
        columnOption(
          `from ${i === found?.index ? `the ${what} column` : "column"} “${headers[i] || `column ${i + 1}`}” (${unit})`,
          `col:${i}`,
          headers[i],
        ),
      );
    }
    // a column found by its header is used unless the user chose otherwise (as the command line does)
    const keep = previous === undefined ? -1 : headers.indexOf(previous);
    const typedChosen = settings.water?.[ligand]?.typed === true;
    const usable = (i: number) => i >= 0 && !taken(i);
    const auto =
      dic && !typedChosen
        ? `dic:${dic.index}`
        : found && !typedChosen && usable(found.index)
          ? `col:${found.index}`
          : "typed";
    menu.value = dic && keep === dic.index ? `dic:${dic.index}` : usable(keep) ? `col:${keep}` : auto;
    input(`${ligand}-total`).disabled = menu.value !== "typed";
  }
  return waterFound;
}

/** Ligand settings from the controls; a message when a typed total is not a number in range. */
export function readWater(table: SampleTable | null): WaterInput {
  const settings: Partial<Record<LigandName, LigandSource>> = {};
  const columns: Partial<Record<LigandName, WaterColumn>> = {};
  const headers = table?.headers ?? [];
  for (const ligand of LIGAND_ORDER) {
    const source = select(`${ligand}-source`).value;
    const kind = source.startsWith("dic:") ? "dic" : source.startsWith("col:") ? LIGAND_COLUMN[ligand] : null;
    if (kind && table) {
      const column = waterColumnAt(kind, headers, Number(source.slice(4)));
      settings[ligand] = { kind: "column", column };
      columns[ligand] = column;
      continue;
    }
    const text = input(`${ligand}-total`).value.trim();
    const total = text === "" ? null : Number(text);
    if (total !== null && !(total >= 0 && total <= MAX_LIGAND_TOTAL)) {
      return {
        error: `${ligand[0].toUpperCase()}${ligand.slice(1)} total: a number from 0 to ${MAX_LIGAND_TOTAL} mol/kg (e.g. 1.5e-3), or blank for none.`,
      };
    }
    settings[ligand] = { kind: "typed", total };
  }
  return { settings: settings as WaterSettings, columns };
}

/** Ligand totals and column choices as remembered with the workbook (or the browser). */
export function waterToRemember(waterFound: WaterColumns): NonNullable<PaneSettings["water"]> {
  const water: NonNullable<PaneSettings["water"]> = {};
  for (const ligand of LIGAND_ORDER) {
    const menu = select(`${ligand}-source`);
    const total = input(`${ligand}-total`).value.trim();
    const column = /^(col|dic):/.test(menu.value) ? menu.selectedOptions[0]?.dataset.header : undefined;
    const typed = column === undefined && waterFound[LIGAND_COLUMN[ligand]] !== undefined;
    if (total || column !== undefined || typed)
      water[ligand] = {
        ...(total ? { total } : {}),
        ...(column !== undefined ? { column } : {}),
        ...(typed ? { typed } : {}),
      };
  }
  return water;
}

/** The ligand note: which totals the diagram uses, and rows that fell back to the median. */
export function showWater(resolved: ReturnType<typeof resolveWater>, ligands: boolean): void {
  const note = $("ligand-note");
  if (!ligands && resolved.unusable.length === 0) {
    note.textContent =
      "A column choice reads each row's value: DIC from the row's alkalinity, pH and temperature; sulfate as total sulfur; orthophosphate as PO4 (as P when the header says so). The diagram is drawn at the median, each sample at its own row's water.";
    return;
  }
  const parts: string[] = [];
  const caption = waterCaption(resolved);
  if (caption) parts.push(caption.split(";")[0] + ".");
  for (const ligand of resolved.fromColumns) {
    const n = resolved.fallbacks[ligand] ?? 0;
    if (n > 0)
      parts.push(`${n} row${n === 1 ? "" : "s"} without a usable ${LIGAND_COLUMN[ligand]} value use the median.`);
  }
  for (const ligand of resolved.unusable)
    parts.push(`No row has a usable ${LIGAND_COLUMN[ligand]} value: ${ligand} is left out.`);
  note.textContent = parts.join(" ");
}

/**
 * The diagram pane's behaviour: settings controls → system (engine) → regions and samples in the chosen scale →
 * SVG (diagram-svg.ts). The host adapter supplies tables and, in Excel, row selection and picture insertion.
 */
import { getDatabase } from "../chemistry/database";
import { getElectrodes } from "../chemistry/electrodes";
import { SystemCache } from "../chemistry/system-cache";
import { hasLigands, ligandKey, LIGAND_ORDER, LigandName, LigandTotals } from "../chemistry/ligand-cells";
import { buildLigandSystem, MAX_LIGAND_TOTAL } from "../chemistry/ligand-system";
import type { MetalSystem } from "../chemistry/system";
import type { AxisWindow } from "./axes";
import { defaultWindow, displayScale, plotSamples, PotentialUnit, shownRegions, shownWaterLines } from "./diagram-model";
import { formatActivity, renderDiagramSvg, sampleText } from "./diagram-svg";
import type { PlottedSample, SampleInput } from "./diagram-model";
import { COLUMN_ROLES, ColumnMapping, ColumnRole, matchHeaders, matchWaterColumns, waterColumnAt, WaterColumn, WaterColumns, WATER_UNIT_WORDS } from "../tables";
import { LIGAND_COLUMN, LigandSource, ligandNames, resolveWater, WaterSettings, waterCaption } from "./ligand-inputs";
import { CANVAS_SAMPLES, SampleCanvas } from "./sample-canvas";
import type { HostAdapter, PaneSettings } from "./host";
import { blobToBase64, download, svgToPngBlob } from "./png-export";
import { median, readSamples, SampleTable } from "./sample-table";

const ROLE_WORDS: Record<ColumnRole, string> = {
  pH: "pH",
  potential: "Potential (ORP, Eh, E)",
  temperature: "Temperature",
  id: "Sample id",
  site: "Site",
  dissolved: "Dissolved metal",
  metal: "Metal",
};

/** Temperature spread above which one diagram no longer represents the rows well (°C). */
export const SPREAD_WARNING = 10;
/** Sample count up to which the on-screen SVG carries a <title> per point. */
export const TITLED_SAMPLES = 2000;

/** The opening clause of a data file's compilation note (up to the first ";"), for captions. */
function firstSentence(text: string): string {
  const clause = text.split(";")[0].trim();
  if (clause.length <= 120) return clause;
  const cut = clause.lastIndexOf(" ", 120);
  return clause.slice(0, cut > 60 ? cut : 120) + "…";
}

function $(id: string): HTMLElement {
  const element = document.getElementById(id);
  if (!element) throw new Error(`pane element #${id} is missing`);
  return element;
}
const input = (id: string) => $(id) as HTMLInputElement;
const select = (id: string) => $(id) as HTMLSelectElement;

interface Drawn {
  svg: string;
  caption: string[];
  render(width: number, height: number, titles?: boolean): string;
}

export class DiagramPane {
  private readonly db = getDatabase();
  private readonly cache = new SystemCache(this.db);
  private table: SampleTable | null = null;
  private mapping: ColumnMapping = { pH: -1, potential: -1, temperature: -1, id: -1, site: -1, dissolved: -1, metal: -1 };
  private temperatureUnit: "C" | "F" = "C";
  private manualTemperature = false;
  private window: AxisWindow | null = null;
  private drawn: Drawn | null = null;
  private plotted: { samples: PlottedSample[]; unit: PotentialUnit } = { samples: [], unit: "V" };
  private settings: PaneSettings;
  private waterFound: WaterColumns = {};
  private canvas: SampleCanvas | null = null;

  constructor(private readonly host: HostAdapter) {
    this.settings = host.loadSettings() ?? {};
  }

  async start(): Promise<void> {
    const metals = select("metal");
    for (const symbol of this.db.metals()) metals.add(new Option(`${this.db.system(symbol)?.title ?? symbol} (${symbol})`, symbol));
    metals.value = this.settings.metal && this.db.metals().includes(this.settings.metal) ? this.settings.metal : "Fe";
    const electrodes = select("electrode");
    for (const e of getElectrodes().all()) electrodes.add(new Option(`${e.id} — ${e.name}`, e.id));
    electrodes.value = this.settings.electrode ?? "SHE";
    select("unit").value = this.settings.unit ?? "V";
    if (this.settings.activity) input("activity").value = String(this.settings.activity);
    input("temperature").value = "25";

    const redraw = () => this.draw();
    metals.addEventListener("change", () => {
      this.applyHeaders(false);
      this.remember();
      redraw();
    });
    for (const id of ["electrode", "unit"]) {
      $(id).addEventListener("change", () => {
        this.window = null;
        this.remember();
        redraw();
      });
    }
    input("activity").addEventListener("change", () => {
      this.remember();
      redraw();
    });
    input("temperature").addEventListener("change", () => {
      this.manualTemperature = true;
      redraw();
    });
    $("temperature-median").addEventListener("click", () => {
      this.manualTemperature = false;
      redraw();
    });
    for (const ligand of LIGAND_ORDER) {
      const saved = this.settings.water?.[ligand]?.total;
      if (saved) input(`${ligand}-total`).value = saved;
      input(`${ligand}-total`).addEventListener("change", () => {
        this.rememberWater();
        redraw();
      });
      select(`${ligand}-source`).addEventListener("change", () => {
        input(`${ligand}-total`).disabled = select(`${ligand}-source`).value !== "typed";
        this.rememberWater();
        redraw();
      });
    }
    input("kinetic").addEventListener("change", redraw);
    input("only-metal").addEventListener("change", redraw);
    for (const id of ["ph-min", "ph-max", "e-min", "e-max"]) $(id).addEventListener("change", () => this.readWindow());
    $("reset-axes").addEventListener("click", () => {
      this.window = null;
      redraw();
    });
    $("export-svg").addEventListener("click", () => this.exportSvg());
    $("export-png").addEventListener("click", () => void this.exportPng());
    if (this.host.insertPicture) {
      $("insert-sheet").hidden = false;
      $("insert-sheet").addEventListener("click", () => void this.insertPicture());
    }
    this.wireSamples();
    this.draw();
    await this.host.start(
      (table) => this.setTable(table),
      (text) => this.status(text),
    );
  }

  private status(text: string): void {
    $("pane-status").textContent = text;
  }

  /** A new table from the host: match its columns (remembered choices first), then draw. */
  setTable(table: SampleTable): void {
    const headerChanged = !this.table || this.table.headers.join("\u0001") !== table.headers.join("\u0001");
    this.table = table;
    if (headerChanged) {
      this.applyHeaders(true);
      this.manualTemperature = false;
    }
    this.draw();
  }

  /** Column mapping from the headers, overridden by the columns remembered for this workbook. */
  private applyHeaders(newTable: boolean): void {
    if (!this.table) return;
    const metal = select("metal").value;
    const headers = this.table.headers;
    const match = matchHeaders(headers, metal, this.db.element(metal)?.name ?? "");
    const mapping = { ...match.mapping };
    const remembered = this.settings.columns ?? {};
    for (const role of COLUMN_ROLES) {
      const name = remembered[role];
      if (name === undefined) continue;
      const index = name === "" ? -1 : headers.indexOf(name);
      if (name === "" || index >= 0) mapping[role] = index;
    }
    if (newTable) {
      // metal column: draw the metal most rows name, when the user has not chosen one for this workbook
      if (mapping.metal >= 0 && !this.settings.metal) {
        const counts = new Map<string, number>();
        for (const row of this.table.rows) {
          const m = this.db.resolveMetal(String(row[mapping.metal] ?? ""));
          if (m) counts.set(m, (counts.get(m) ?? 0) + 1);
        }
        const top = [...counts.entries()].sort((a, b) => b[1] - a[1])[0];
        if (top && top[0] !== metal) {
          select("metal").value = top[0];
          return this.applyHeaders(newTable);
        }
      }
      if (!this.settings.electrode && match.hints.electrode) select("electrode").value = match.hints.electrode;
      if (!this.settings.unit && match.hints.potentialUnit) select("unit").value = match.hints.potentialUnit;
      this.temperatureUnit = match.hints.temperatureUnit ?? "C";
      this.window = null;
    }
    this.mapping = mapping;
    this.buildColumnControls();
    this.buildWaterSources();
  }

  /**
   * The "from column" menus of the ligand fieldset: the column found by its header first, then every other
   * column. A choice survives a new table when a column of the same header text is still there.
   */
  private buildWaterSources(): void {
    const headers = this.table?.headers ?? [];
    this.waterFound = matchWaterColumns(headers, this.mapping);
    for (const ligand of LIGAND_ORDER) {
      const role = LIGAND_COLUMN[ligand];
      const menu = select(`${ligand}-source`);
      const previous = menu.value.startsWith("col:") ? menu.selectedOptions[0]?.dataset.header : this.settings.water?.[ligand]?.column;
      menu.replaceChildren(new Option("typed total", "typed"));
      const found = this.waterFound[role];
      const order = found ? [found.index, ...headers.keys()].filter((i, k, all) => all.indexOf(i) === k) : [...headers.keys()];
      for (const i of order) {
        if (Object.values(this.mapping).includes(i)) continue; // pH, potential… are not water columns
        const unit = WATER_UNIT_WORDS[waterColumnAt(role, headers, i).unit];
        const option = new Option(`from ${i === found?.index ? `the ${role} column` : "column"} “${headers[i] || `column ${i + 1}`}” (${unit})`, `col:${i}`);
        option.dataset.header = headers[i];
        menu.add(option);
      }
      const keep = previous === undefined ? -1 : headers.indexOf(previous);
      menu.value = keep >= 0 && !Object.values(this.mapping).includes(keep) ? `col:${keep}` : "typed";
      input(`${ligand}-total`).disabled = menu.value !== "typed";
    }
  }

  /** Ligand settings from the controls; a message when a typed total is not a number in range. */
  private readWater(): { settings: WaterSettings; columns: Partial<Record<LigandName, WaterColumn>> } | { error: string } {
    const settings: Partial<Record<LigandName, LigandSource>> = {};
    const columns: Partial<Record<LigandName, WaterColumn>> = {};
    const headers = this.table?.headers ?? [];
    for (const ligand of LIGAND_ORDER) {
      const source = select(`${ligand}-source`).value;
      if (source.startsWith("col:") && this.table) {
        const column = waterColumnAt(LIGAND_COLUMN[ligand], headers, Number(source.slice(4)));
        settings[ligand] = { kind: "column", column };
        columns[ligand] = column;
        continue;
      }
      const text = input(`${ligand}-total`).value.trim();
      const total = text === "" ? null : Number(text);
      if (total !== null && !(total >= 0 && total <= MAX_LIGAND_TOTAL)) {
        return { error: `${ligand[0].toUpperCase()}${ligand.slice(1)} total: a number from 0 to ${MAX_LIGAND_TOTAL} mol/kg (e.g. 1.5e-3), or blank for none.` };
      }
      settings[ligand] = { kind: "typed", total };
    }
    return { settings: settings as WaterSettings, columns };
  }

  /** The system of a water: the ligand-free one when no ligand is present. */
  private systemIn(metal: string, celsius: number, activity: number, totals: LigandTotals): MetalSystem {
    if (!hasLigands(totals)) return this.cache.get(metal, celsius, activity);
    return this.cache.get(metal, celsius, activity, ligandKey(totals), () => buildLigandSystem(this.db, metal, { celsius, activity }, totals));
  }

  private buildColumnControls(): void {
    const container = $("column-controls");
    container.replaceChildren();
    const headers = this.table?.headers ?? [];
    for (const role of COLUMN_ROLES) {
      const label = document.createElement("label");
      label.htmlFor = `column-${role}`;
      label.textContent = ROLE_WORDS[role];
      const choice = document.createElement("select");
      choice.id = `column-${role}`;
      choice.add(new Option("(none)", "-1"));
      headers.forEach((h, i) => choice.add(new Option(h || `column ${i + 1}`, String(i))));
      choice.value = String(this.mapping[role]);
      choice.addEventListener("change", () => {
        this.mapping = { ...this.mapping, [role]: Number(choice.value) };
        this.settings.columns = { ...(this.settings.columns ?? {}), [role]: this.mapping[role] >= 0 ? headers[this.mapping[role]] : "" };
        void this.host.saveSettings(this.settings);
        this.draw();
      });
      container.append(label, choice);
    }
  }

  private remember(): void {
    const activity = Number(input("activity").value);
    this.settings = {
      ...this.settings,
      metal: select("metal").value,
      electrode: select("electrode").value,
      unit: select("unit").value as PotentialUnit,
      activity: Number.isFinite(activity) && activity > 0 ? activity : undefined,
    };
    void this.host.saveSettings(this.settings);
  }

  /** Ligand totals and column choices, kept with the workbook (or the browser). */
  private rememberWater(): void {
    const water: NonNullable<PaneSettings["water"]> = {};
    for (const ligand of LIGAND_ORDER) {
      const menu = select(`${ligand}-source`);
      const total = input(`${ligand}-total`).value.trim();
      const column = menu.value.startsWith("col:") ? menu.selectedOptions[0]?.dataset.header : undefined;
      if (total || column !== undefined) water[ligand] = { ...(total ? { total } : {}), ...(column !== undefined ? { column } : {}) };
    }
    this.settings = { ...this.settings, water };
    void this.host.saveSettings(this.settings);
  }

  private readWindow(): void {
    const w = { pHMin: Number(input("ph-min").value), pHMax: Number(input("ph-max").value), eMin: Number(input("e-min").value), eMax: Number(input("e-max").value) };
    if (![w.pHMin, w.pHMax, w.eMin, w.eMax].every(Number.isFinite) || w.pHMax <= w.pHMin || w.eMax <= w.eMin) {
      this.status("Axis limits: each maximum must exceed its minimum.");
      return;
    }
    this.window = w;
    this.draw();
  }

  /** Everything from the controls and the table to the SVG. */
  draw(): void {
    const metal = select("metal").value;
    const electrode = select("electrode").value;
    const unit = select("unit").value as PotentialUnit;
    const activity = Number(input("activity").value);
    if (!(activity > 0 && activity <= 10)) return this.status("Dissolved activity: a number above 0 and at most 10, e.g. 1e-6.");
    const waterInput = this.readWater();
    if ("error" in waterInput) return this.status(waterInput.error);

    // rows → samples (twice: the first pass finds the rows' temperatures for the default)
    const options = {
      mapping: this.mapping,
      electrode,
      unit,
      temperatureUnit: this.temperatureUnit,
      celsius: 25,
      onlyMetal: input("only-metal").checked ? metal : undefined,
      waterColumns: Object.keys(waterInput.columns).length > 0 ? waterInput.columns : undefined,
    };
    let read = this.table ? readSamples(this.table, options) : null;
    const temperatures = read?.temperatures ?? [];
    let celsius = Number(input("temperature").value);
    if (!this.manualTemperature && temperatures.length > 0) {
      celsius = Math.round(median(temperatures) * 10) / 10;
      input("temperature").value = String(celsius);
    }
    if (!(celsius >= 0 && celsius <= 100)) return this.status("Temperature: 0 to 100 °C.");
    if (this.table) read = readSamples(this.table, { ...options, celsius });
    this.showTemperatureSpread(temperatures, celsius);

    // the water: typed ligand totals, or each row's from a column with the median for the diagram
    const inputs = read?.samples ?? [];
    const resolved = resolveWater(waterInput.settings, read?.rowTotals ?? []);
    const ligands = hasLigands(resolved.diagram) || resolved.fromColumns.length > 0;
    let system: MetalSystem;
    try {
      system = this.systemIn(metal, celsius, activity, resolved.diagram);
    } catch (error) {
      return this.status(`The diagram could not be built: ${(error as Error).message}`);
    }
    const scale = displayScale(electrode, unit, celsius);
    const window = this.window ?? defaultWindow(scale);
    this.showWindow(window);
    const regions = shownRegions(system, window, scale);
    let samples: PlottedSample[];
    if (!ligands) samples = plotSamples(system, inputs, scale);
    else {
      const perRow = resolved.perSample;
      const withWater: SampleInput[] = inputs.map((s, i) => ({ ...s, ligands: perRow[i] }));
      const systems = new Map<string, MetalSystem>([[ligandKey(resolved.diagram), system]]);
      const systemOf = (s: SampleInput) => {
        const totals = s.ligands ?? {};
        const key = ligandKey(totals);
        let own = systems.get(key);
        if (!own) systems.set(key, (own = this.systemIn(metal, celsius, activity, totals)));
        return own;
      };
      try {
        samples = plotSamples(system, withWater, scale, systemOf);
      } catch (error) {
        return this.status(`The samples could not be placed: ${(error as Error).message}`);
      }
    }
    this.showWater(resolved, ligands);
    const water = shownWaterLines(celsius, scale);
    const metalTitle = this.db.system(metal)?.title ?? metal;
    const title = hasLigands(resolved.diagram) ? `${metalTitle} in water with ${ligandNames(resolved.diagram)}` : `${metalTitle} in water`;
    const compilation = this.db.system(metal)?.compilation ?? "";
    const waterLine = waterCaption(resolved);
    const caption = [
      `${title} at ${celsius} °C, dissolved activity ${formatActivity(activity)}, potentials in ${unit} vs ${scale.electrode}.`,
      ...(waterLine ? [waterLine] : []),
      `Samples: ${this.table ? `${this.table.source}; ${samples.length} drawn, ${read?.skipped.length ?? 0} not drawn` : "none"}. Thermodynamic data: ${firstSentence(compilation)}`,
    ];
    const showKineticBand = input("kinetic").checked;
    // above this many points the on-screen diagram leaves out the per-point <title> (the info line shows the text)
    const sampleTitles = samples.length <= TITLED_SAMPLES;
    this.plotted = { samples, unit };
    // above CANVAS_SAMPLES the screen gets the markers on a canvas layer (sample-canvas.ts); exports keep circles
    const onCanvas = samples.length > CANVAS_SAMPLES;
    const render = (width: number, height: number, titles = sampleTitles, omitSamples = false) =>
      renderDiagramSvg({ system, window, regions, samples, water, axisTitle: scale.axisTitle, unit, width, height, title, caption, showKineticBand, sampleTitles: titles, omitSamples });
    const container = $("diagram");
    const width = Math.max(360, Math.min(900, Math.floor(container.clientWidth || 640)));
    const height = Math.round(width * 0.82);
    const svg = render(width, height, sampleTitles, onCanvas);
    this.canvas?.clear();
    container.innerHTML = svg;
    if (onCanvas) this.canvas?.draw(container.querySelector("svg")!, samples);
    container.dataset.samplesDrawn = String(samples.length);
    container.dataset.samplesOn = onCanvas ? "canvas" : "svg";
    this.drawn = { svg, caption, render };
    this.showSkipped(read);
    if (this.table) this.status(`${samples.length} sample${samples.length === 1 ? "" : "s"} drawn from ${this.table.source}.`);
  }

  private showTemperatureSpread(temperatures: number[], celsius: number): void {
    const spread = $("temperature-spread");
    const warning = $("temperature-warning");
    if (temperatures.length === 0) {
      spread.textContent = this.table ? "No temperature column: the diagram temperature is used for every row." : "";
      warning.hidden = true;
      return;
    }
    const low = Math.min(...temperatures);
    const high = Math.max(...temperatures);
    spread.textContent = `Rows: ${low.toFixed(1)}–${high.toFixed(1)} °C, median ${median(temperatures).toFixed(1)} °C${this.manualTemperature ? "; the diagram uses your value" : ""}.`;
    const wide = high - low > SPREAD_WARNING;
    warning.hidden = !wide;
    warning.textContent = wide
      ? `The rows span ${(high - low).toFixed(1)} °C (more than ${SPREAD_WARNING} °C): one diagram at ${celsius} °C only approximates them — consider drawing warm and cold samples separately.`
      : "";
  }

  /** The ligand note: which totals the diagram uses, and rows that fell back to the median. */
  private showWater(resolved: ReturnType<typeof resolveWater>, ligands: boolean): void {
    const note = $("ligand-note");
    if (!ligands && resolved.unusable.length === 0) {
      note.textContent = "A column choice reads each row's value: DIC from the row's alkalinity, pH and temperature; sulfate as total sulfur; orthophosphate as PO4 (as P when the header says so). The diagram is drawn at the median, each sample at its own row's water.";
      return;
    }
    const parts: string[] = [];
    const caption = waterCaption(resolved);
    if (caption) parts.push(caption.split(";")[0] + ".");
    for (const ligand of resolved.fromColumns) {
      const n = resolved.fallbacks[ligand] ?? 0;
      if (n > 0) parts.push(`${n} row${n === 1 ? "" : "s"} without a usable ${LIGAND_COLUMN[ligand]} value use the median.`);
    }
    for (const ligand of resolved.unusable) parts.push(`No row has a usable ${LIGAND_COLUMN[ligand]} value: ${ligand} is left out.`);
    note.textContent = parts.join(" ");
  }

  private showWindow(w: AxisWindow): void {
    input("ph-min").value = String(w.pHMin);
    input("ph-max").value = String(w.pHMax);
    input("e-min").value = String(Number(w.eMin.toPrecision(6)));
    input("e-max").value = String(Number(w.eMax.toPrecision(6)));
    const step = select("unit").value === "mV" ? "50" : "0.05";
    input("e-min").step = step;
    input("e-max").step = step;
  }

  private showSkipped(read: ReturnType<typeof readSamples> | null): void {
    const list = $("skipped");
    list.replaceChildren();
    const skipped = read?.skipped ?? [];
    const parts: string[] = [];
    if (skipped.length === 0) parts.push("None.");
    else parts.push(`${skipped.length} row${skipped.length === 1 ? "" : "s"} with blank or unreadable cells:`);
    if (read && read.otherMetal > 0) parts.push(`(${read.otherMetal} rows of other metals are not shown on this diagram.)`);
    if (this.table && (this.mapping.pH < 0 || this.mapping.potential < 0)) parts.push("Choose the pH and potential columns under Columns.");
    $("skipped-summary").textContent = parts.join(" ");
    for (const s of skipped) {
      const item = document.createElement("li");
      item.dataset.row = String(s.row);
      item.textContent = `Row ${s.row}: ${s.reason}`;
      list.append(item);
    }
  }

  /** Hover, focus, click and Enter on sample points. */
  private wireSamples(): void {
    const container = $("diagram");
    const info = $("point-info");
    const target = (event: Event) => (event.target instanceof Element ? event.target.closest(".rc-sample") : null);
    const show = (event: Event) => {
      const point = target(event);
      if (!point) return;
      const sample = this.plotted.samples[Number(point.getAttribute("data-i"))];
      info.textContent = sample ? sampleText(sample, this.plotted.unit) : (point.querySelector("title")?.textContent ?? "");
    };
    container.addEventListener("mouseover", show);
    container.addEventListener("focusin", show);
    const selectRow = (row: number) => {
      if (this.host.selectRow && Number.isFinite(row)) void this.host.selectRow(row).catch((e: unknown) => this.status(`Could not select row ${row}: ${(e as Error).message}`));
    };
    const choose = (point: Element) => selectRow(Number(point.getAttribute("data-row")));
    this.canvas = new SampleCanvas(container, {
      show: (i) => {
        const sample = this.plotted.samples[i];
        if (sample) info.textContent = sampleText(sample, this.plotted.unit);
      },
      choose: (i) => {
        const sample = this.plotted.samples[i];
        if (sample) selectRow(sample.row);
      },
    });
    container.addEventListener("click", (event) => {
      const point = target(event);
      if (point) choose(point);
    });
    container.addEventListener("keydown", (event) => {
      const point = target(event);
      if (point && (event.key === "Enter" || event.key === " ")) {
        event.preventDefault();
        choose(point);
      }
    });
  }

  private exportSize(): { width: number; height: number } {
    const width = Math.round(Number(input("png-width").value));
    const height = Math.round(Number(input("png-height").value));
    return { width: width >= 200 && width <= 4000 ? width : 1200, height: height >= 150 && height <= 3000 ? height : 900 };
  }

  private fileName(ext: string): string {
    return `redox-cells-${select("metal").value}-${input("temperature").value}C.${ext}`;
  }

  exportSvg(): void {
    if (!this.drawn) return;
    const { width, height } = this.exportSize();
    download(new Blob([this.drawn.render(width, height, true)], { type: "image/svg+xml" }), this.fileName("svg"));
  }

  async exportPng(): Promise<void> {
    if (!this.drawn) return;
    const { width, height } = this.exportSize();
    download(await svgToPngBlob(this.drawn.render(width, height), width, height), this.fileName("png"));
  }

  async insertPicture(): Promise<void> {
    if (!this.drawn || !this.host.insertPicture) return;
    const { width, height } = this.exportSize();
    try {
      const png = await svgToPngBlob(this.drawn.render(width, height), width, height);
      await this.host.insertPicture({ pngBase64: await blobToBase64(png), widthPx: width, heightPx: height, caption: this.drawn.caption.join(" ") });
      this.status("Diagram inserted beside the data.");
    } catch (error) {
      this.status(`Could not insert the picture: ${(error as Error).message}`);
    }
  }
}

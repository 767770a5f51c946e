/**
 * The diagram pane's behaviour: settings controls → system (engine) → regions and samples in the chosen scale →
 * SVG (diagram-svg.ts). The host adapter supplies tables and, in Excel, row selection and picture insertion.
 */
import { getDatabase } from "../chemistry/database";
import { MAX_CELSIUS, MIN_CELSIUS } from "../chemistry/constants";
import { getElectrodes } from "../chemistry/electrodes";
import { SystemCache } from "../chemistry/system-cache";
import { hasLigands, ligandKey, LIGAND_ORDER, LigandName, LigandTotals } from "../chemistry/ligand-cells";
import { buildLigandSystem, MAX_LIGAND_TOTAL } from "../chemistry/ligand-system";
import type { MetalSystem } from "../chemistry/system";
import type { AxisWindow } from "../diagram/axes";
import { defaultWindow, displayScale, PotentialUnit, shownRegions, shownWaterLines } from "../diagram/diagram-model";
import { escapeXml, formatActivity, renderDiagramSvg, sampleText } from "../diagram/diagram-svg";
import { boundaryEquations, equationText } from "../diagram/boundary-equations";
import { ligandEdges } from "../diagram/ligand-edges";
import { fitWindow, isClustered, zoomWindow } from "../diagram/view-window";
import { DiagramView, type DrawingOptions } from "./pane-view";
import { SITE_COLOURS } from "./pane-legend";
import { resultsCsv, resultsHtml, resultsTsv } from "./results-table";
import type { DisplayScale, PlottedSample } from "../diagram/diagram-model";
import { COLUMN_ROLES, ColumnMapping, ColumnRole, matchHeaders, matchWaterColumns, waterColumnAt, WaterColumn, WaterColumns, WATER_UNIT_WORDS, type IonicColumn } from "../tables";
import { LIGAND_COLUMN, LigandSource, ligandNames, resolveWater, WaterSettings, waterCaption } from "./ligand-inputs";
import type { HostAdapter, PaneSettings } from "./host";
import { blobToBase64, download, svgToPngBlob } from "./png-export";
import { median, readSamples, SampleTable, SkippedRow } from "./sample-table";
import { AnswerPlan, answerSamples, RowLigand, rowLigand } from "./sample-answers";
import { findIonicColumn, ionicArgumentFor, ionicCaption } from "./ionic-input";

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
/** The caption's promise about markers (sample-answers.ts keeps it). */
export const OWN_ANSWERS =
  "Each marker's shape and colour are its own row's answer (REDOX.REGIME at that row's temperature and water, its reading as logged); the regions are drawn at the single temperature and water above.";
export const POINT_PROMPT = "Hover over a sample, or tab to the samples and use the arrow keys, for its details.";
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
  caption: string[];
  /** The drawing for export, title, legend and caption inside. */
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
  /** The conductivity, TDS or ionic-strength column used automatically for each sample's [ionicStrength]. */
  private ionicFound: IonicColumn | null = null;
  private view!: DiagramView;
  /** "fit": the samples' window; "full": pH −2…16, ±2 V; null: fit when the samples are clustered. */
  private viewMode: "fit" | "full" | null = null;
  private lastWindow: AxisWindow | null = null;

  constructor(private readonly host: HostAdapter) {
    this.settings = host.loadSettings() ?? {};
  }

  async start(): Promise<void> {
    const metals = select("metal");
    for (const symbol of this.db.metals()) metals.add(new Option(`${this.db.system(symbol)?.title ?? symbol} (${symbol})`, symbol));
    metals.value = this.settings.metal && this.db.metals().includes(this.settings.metal) ? this.settings.metal : "Fe";
    for (const symbol of this.db.metals()) select("compare-metal").add(new Option(`${this.db.system(symbol)?.title ?? symbol} (${symbol})`, symbol));
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
      this.viewMode = null;
      redraw();
    });
    $("export-svg").addEventListener("click", () => this.exportSvg());
    $("export-png").addEventListener("click", () => void this.exportPng());
    if (this.host.insertPicture) {
      $("insert-sheet").hidden = false;
      $("insert-sheet").addEventListener("click", () => void this.insertPicture());
    }
    this.view = new DiagramView($("diagram"), {
      show: (sample) => ($("point-info").textContent = sampleText(sample, this.plotted.unit)),
      choose: (sample) => this.selectRow(sample.row),
    });
    this.wireSamples();
    this.wireView();
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
    const taken = [...Object.values(this.mapping), ...Object.values(this.waterFound).map((c) => c.index)].filter((i) => i >= 0);
    this.ionicFound = findIonicColumn(headers, taken, this.table?.rows ?? []);
    for (const ligand of LIGAND_ORDER) {
      const role = LIGAND_COLUMN[ligand];
      const menu = select(`${ligand}-source`);
      const previous = /^(col|dic):/.test(menu.value) ? menu.selectedOptions[0]?.dataset.header : this.settings.water?.[ligand]?.column;
      menu.replaceChildren(new Option("typed total", "typed"));
      // carbonate: a measured DIC column first (used before alkalinity, as the command line does)
      const dic = ligand === "carbonate" ? this.waterFound.dic : undefined;
      if (dic) {
        const option = new Option(`from the DIC column “${headers[dic.index]}” (${WATER_UNIT_WORDS[dic.unit]})`, `dic:${dic.index}`);
        option.dataset.header = headers[dic.index];
        menu.add(option);
      }
      const found = this.waterFound[role];
      const order = found ? [found.index, ...headers.keys()].filter((i, k, all) => all.indexOf(i) === k) : [...headers.keys()];
      for (const i of order) {
        if (Object.values(this.mapping).includes(i)) continue; // pH, potential… are not water columns
        if (i !== found?.index && !this.mostlyNumbers(i)) continue; // site, date, note… are not either
        const unit = WATER_UNIT_WORDS[waterColumnAt(role, headers, i).unit];
        const option = new Option(`from ${i === found?.index ? `the ${role} column` : "column"} “${headers[i] || `column ${i + 1}`}” (${unit})`, `col:${i}`);
        option.dataset.header = headers[i];
        menu.add(option);
      }
      // a column found by its header is used unless the user chose otherwise (as the command line does)
      const keep = previous === undefined ? -1 : headers.indexOf(previous);
      const typedChosen = this.settings.water?.[ligand]?.typed === true;
      const usable = (i: number) => i >= 0 && !Object.values(this.mapping).includes(i);
      const auto = dic && !typedChosen ? `dic:${dic.index}` : found && !typedChosen && usable(found.index) ? `col:${found.index}` : "typed";
      menu.value = dic && keep === dic.index ? `dic:${dic.index}` : usable(keep) ? `col:${keep}` : auto;
      input(`${ligand}-total`).disabled = menu.value !== "typed";
    }
  }

  /** Whether most filled cells of column `index` (among the first 200 rows) are numbers. */
  private mostlyNumbers(index: number): boolean {
    let numbers = 0;
    let filled = 0;
    for (const row of (this.table?.rows ?? []).slice(0, 200)) {
      const cell = row[index];
      if (cell === null || cell === undefined || String(cell).trim() === "") continue;
      filled++;
      if (typeof cell === "number" || /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(String(cell))) numbers++;
    }
    return filled > 0 && numbers >= filled / 2;
  }

  /** Ligand settings from the controls; a message when a typed total is not a number in range. */
  private readWater(): { settings: WaterSettings; columns: Partial<Record<LigandName, WaterColumn>> } | { error: string } {
    const settings: Partial<Record<LigandName, LigandSource>> = {};
    const columns: Partial<Record<LigandName, WaterColumn>> = {};
    const headers = this.table?.headers ?? [];
    for (const ligand of LIGAND_ORDER) {
      const source = select(`${ligand}-source`).value;
      if (source.startsWith("dic:") && this.table) {
        const column = waterColumnAt("dic", headers, Number(source.slice(4)));
        settings[ligand] = { kind: "column", column };
        columns[ligand] = column;
        continue;
      }
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
      const column = /^(col|dic):/.test(menu.value) ? menu.selectedOptions[0]?.dataset.header : undefined;
      const typed = column === undefined && this.waterFound[LIGAND_COLUMN[ligand]] !== undefined;
      if (total || column !== undefined || typed) water[ligand] = { ...(total ? { total } : {}), ...(column !== undefined ? { column } : {}), ...(typed ? { typed } : {}) };
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
    if (!(celsius >= MIN_CELSIUS && celsius <= MAX_CELSIUS)) return this.status(`Temperature: ${MIN_CELSIUS} to ${MAX_CELSIUS} °C.`);
    if (this.table) read = readSamples(this.table, { ...options, celsius });
    this.showTemperatureSpread(temperatures, celsius);

    // the water: typed ligand totals, or each row's from a column with the median for the diagram
    const resolved = resolveWater(waterInput.settings, read?.rowTotals ?? []);
    const ligands = hasLigands(resolved.diagram) || resolved.fromColumns.length > 0;
    let system: MetalSystem;
    try {
      system = this.systemIn(metal, celsius, activity, resolved.diagram);
    } catch (error) {
      return this.status(`The diagram could not be built: ${(error as Error).message}`);
    }
    const scale = displayScale(electrode, unit, celsius);
    const own = this.ownAnswers(read, waterInput.settings, { metal, electrode, unit, activity, celsius }, scale);
    const samples = this.siteFiltered(own.samples);
    const window = this.chooseWindow(scale, samples);
    this.showWindow(window);
    const regions = shownRegions(system, window, scale);
    this.showWater(resolved, ligands);
    const water = shownWaterLines(celsius, scale);
    const metalTitle = this.db.system(metal)?.title ?? metal;
    const title = hasLigands(resolved.diagram) ? `${metalTitle} in water with ${ligandNames(resolved.diagram)}` : `${metalTitle} in water`;
    const compilation = this.db.system(metal)?.compilation ?? "";
    const waterLine = waterCaption(resolved);
    const ionicLine = own.ionicLine;
    const atMedian = !this.manualTemperature && temperatures.length > 0;
    const caption = [
      `${title} at ${celsius} °C${atMedian ? " (the rows' median temperature)" : ""}, dissolved activity ${formatActivity(activity)}, potentials in ${unit} vs ${scale.electrode}.`,
      ...(samples.length > 0 ? [OWN_ANSWERS] : []),
      ...(waterLine ? [waterLine] : []),
      ...(ionicLine ? [ionicLine] : []),
      `Samples: ${this.table ? `${this.table.source}; ${samples.length} drawn, ${read?.skipped.length ?? 0} not drawn` : "none"}. Thermodynamic data: ${firstSentence(compilation)}`,
    ];
    const showKineticBand = input("kinetic").checked;
    this.plotted = { samples, unit };
    const sites = this.siteColours(own.samples);
    const drawing: DrawingOptions = {
      system,
      window,
      regions,
      samples,
      water,
      axisTitle: scale.axisTitle,
      unit,
      title,
      caption,
      showKineticBand,
      // above this many points the on-screen diagram leaves out the per-point <title> (the info line shows the text)
      sampleTitles: samples.length <= TITLED_SAMPLES,
      sampleFill: sites ? (p: PlottedSample) => sites.get(p.site ?? "") ?? "#888888" : undefined,
    };
    const compare = this.compareOptions(drawing, { electrode, unit, activity, celsius }, resolved.diagram, read, waterInput.settings, scale);
    $("point-info").textContent = POINT_PROMPT; // the previous drawing's sample may not be on this one
    this.view.show({ options: drawing, caption, compare, legend: { kinetic: showKineticBand, ligandEdges: ligandEdges(system), sites } });
    this.drawn = {
      caption,
      render: (width, height, titles = true) => renderDiagramSvg({ ...drawing, width, height, sampleTitles: titles }),
    };
    this.showResults(samples, system, celsius, resolved.diagram);
    this.showSkipped(read, own.failed);
    if (this.table) this.status(`${samples.length} sample${samples.length === 1 ? "" : "s"} drawn from ${this.table.source}.`);
  }

  /**
   * Every drawn row's own answer from the worksheet functions (sample-answers.ts): its reading as logged at its
   * own temperature, its own water. Rows the functions refuse move to the "not drawn" list with their message.
   */
  private ownAnswers(
    read: ReturnType<typeof readSamples> | null,
    water: WaterSettings,
    at: { metal: string; electrode: string; unit: PotentialUnit; activity: number; celsius: number },
    scale: DisplayScale,
  ): { samples: PlottedSample[]; failed: SkippedRow[]; ionicLine: string } {
    if (!this.table || !read) return { samples: [], failed: [], ionicLine: "" };
    const table = this.table;
    const ligands: RowLigand[] = [];
    const typed: Partial<Record<LigandName, number>> = {};
    for (const ligand of LIGAND_ORDER) {
      const source = water[ligand];
      if (source.kind === "column") ligands.push(rowLigand(ligand, source.column));
      else if (source.total !== null && source.total > 0) typed[ligand] = source.total;
    }
    const plan: AnswerPlan = {
      ...at,
      phColumn: this.mapping.pH,
      potentialColumn: this.mapping.potential,
      temperatureColumn: this.mapping.temperature,
      temperatureUnit: this.temperatureUnit,
      ligands,
      typed,
      ...(this.ionicFound ? { ionic: this.ionicFound } : {}),
    };
    const rows = read.indices.map((i) => table.rows[i]);
    const answers = answerSamples(plan, rows);
    const ionic = this.ionicFound;
    const ionicLine = ionic && rows.length > 0 ? ionicCaption(table.headers[ionic.index], ionic, ionicArgumentFor(ionic, rows)) : "";
    const samples: PlottedSample[] = [];
    const failed: SkippedRow[] = [];
    const electrodeId = scale.electrode;
    read.samples.forEach((s, k) => {
      const a = answers[k];
      if ("error" in a) return void failed.push({ row: s.row, reason: a.error });
      const logged = String(rows[k][this.mapping.potential] ?? "").trim();
      const plotted: PlottedSample = {
        row: s.row,
        id: s.id,
        pH: s.pH,
        E: scale.fromSHE(s.pH, a.eSHE),
        eSHE: a.eSHE,
        formula: a.species,
        regime: a.regime,
        waterMargin: a.margin,
        dissolved: s.dissolved,
        reading: `${logged} ${at.unit} vs ${electrodeId}`,
        celsius: a.celsius,
        equilibrium: a.dissolved,
        site: this.mapping.site >= 0 ? String(rows[k][this.mapping.site] ?? "").trim() : undefined,
      };
      const withIonic = a.ionicStrength === null ? plotted : { ...plotted, ionicStrength: a.ionicStrength };
      samples.push(hasLigands(a.water) ? { ...withIonic, ligands: a.water } : withIonic);
    });
    return { samples, failed, ionicLine };
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

  private showSkipped(read: ReturnType<typeof readSamples> | null, failed: readonly SkippedRow[] = []): void {
    const list = $("skipped");
    list.replaceChildren();
    const skipped = [...(read?.skipped ?? []), ...failed].sort((a, b) => a.row - b.row);
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

  /** Hover and click on sample points (the keyboard is the view's: one tab stop, arrow keys). */
  private wireSamples(): void {
    const container = $("diagram");
    const info = $("point-info");
    const target = (event: Event) => (event.target instanceof Element ? event.target.closest(".rc-sample") : null);
    container.addEventListener("mouseover", (event) => {
      const point = target(event);
      const sample = point ? this.plotted.samples[Number(point.getAttribute("data-i"))] : undefined;
      if (sample) info.textContent = sampleText(sample, this.plotted.unit);
    });
    container.addEventListener("click", (event) => {
      const point = target(event);
      const sample = point ? this.plotted.samples[Number(point.getAttribute("data-i"))] : undefined;
      if (sample) this.selectRow(sample.row);
    });
  }

  private selectRow(row: number): void {
    if (this.host.selectRow && Number.isFinite(row)) void this.host.selectRow(row).catch((e: unknown) => this.status(`Could not select row ${row}: ${(e as Error).message}`));
  }


  /** View buttons: fit to the samples, the full range, zoom in and out. */
  private wireView(): void {
    const setWindow = (w: AxisWindow | null, mode: "fit" | "full" | null) => {
      this.window = w;
      this.viewMode = mode;
      this.draw();
    };
    $("fit-samples").addEventListener("click", () => setWindow(null, "fit"));
    $("full-range").addEventListener("click", () => setWindow(null, "full"));
    $("zoom-in").addEventListener("click", () => this.lastWindow && setWindow(zoomWindow(this.lastWindow, 0.6), this.viewMode));
    $("zoom-out").addEventListener("click", () => this.lastWindow && setWindow(zoomWindow(this.lastWindow, 1 / 0.6), this.viewMode));
    for (const id of ["color-by", "site-filter", "compare-metal"]) $(id).addEventListener("change", () => this.draw());
    $("export-csv").addEventListener("click", () => download(new Blob([resultsCsv(this.plotted.samples)], { type: "text/csv" }), this.fileName("csv")));
    $("copy-results").addEventListener("click", () => void this.copy(resultsTsv(this.plotted.samples), "Results copied: paste them into a sheet."));
    $("copy-equations").addEventListener("click", () => void this.copy(this.equationsText, "Boundary equations copied."));
  }

  private async copy(text: string, done: string): Promise<void> {
    try {
      await navigator.clipboard.writeText(text);
      this.status(done);
    } catch (error) {
      this.status(`Could not copy (${(error as Error).message}); use Download CSV instead.`);
    }
  }

  /** The shown window: the user's limits, else fitted to the samples when asked or when they are clustered. */
  private chooseWindow(scale: DisplayScale, samples: readonly PlottedSample[]): AxisWindow {
    const full = defaultWindow(scale);
    let chosen = this.window;
    if (!chosen && this.viewMode !== "full") {
      const fitted = fitWindow(samples, scale.unit);
      if (fitted && (this.viewMode === "fit" || isClustered(fitted, full))) chosen = fitted;
    }
    this.lastWindow = chosen ?? full;
    return this.lastWindow;
  }

  /** Samples of the chosen site only (the "Show site" menu), refreshing the menu's list of sites. */
  private siteFiltered(samples: PlottedSample[]): PlottedSample[] {
    const menu = select("site-filter");
    const sites = [...new Set(samples.map((s) => s.site ?? "").filter((x) => x !== ""))].sort();
    const keep = menu.value;
    menu.replaceChildren(new Option("all sites", ""), ...sites.map((x) => new Option(x, x)));
    menu.value = sites.includes(keep) ? keep : "";
    menu.disabled = sites.length === 0;
    return menu.value === "" ? samples : samples.filter((s) => s.site === menu.value);
  }

  /** Site → colour when colouring by site (Okabe–Ito colours, cycling past eight sites). */
  private siteColours(samples: readonly PlottedSample[]): Map<string, string> | undefined {
    if (select("color-by").value !== "site") return undefined;
    const sites = [...new Set(samples.map((s) => s.site ?? "").filter((x) => x !== ""))].sort();
    if (sites.length === 0) return undefined;
    return new Map(sites.map((x, i) => [x, SITE_COLOURS[i % SITE_COLOURS.length]]));
  }

  /** A second metal with the same window, temperature, water and samples (their own answers for that metal). */
  private compareOptions(
    first: DrawingOptions,
    at: { electrode: string; unit: PotentialUnit; activity: number; celsius: number },
    totals: LigandTotals,
    read: ReturnType<typeof readSamples> | null,
    water: WaterSettings,
    scale: DisplayScale,
  ): DrawingOptions | undefined {
    const metal = select("compare-metal").value;
    if (!metal || metal === select("metal").value) return undefined;
    try {
      const system = this.systemIn(metal, at.celsius, at.activity, totals);
      const own = this.ownAnswers(read, water, { ...at, metal }, scale);
      const keep = new Set(first.samples.map((s) => s.row));
      const title = `${this.db.system(metal)?.title ?? metal} in water`;
      return { ...first, system, regions: shownRegions(system, first.window, scale), samples: own.samples.filter((s) => keep.has(s.row)), title, sampleFill: undefined };
    } catch (error) {
      this.status(`The comparison could not be drawn: ${(error as Error).message}`);
      return undefined;
    }
  }

  private equationsText = "";

  /** The results table and the pure-water boundary equations at the diagram's temperature. */
  private showResults(samples: readonly PlottedSample[], system: MetalSystem, celsius: number, totals: LigandTotals): void {
    $("results-table").innerHTML = resultsHtml(samples);
    const metal = system.element;
    const pure = hasLigands(totals) ? this.systemIn(metal, celsius, system.activity, {}) : system;
    const equations = boundaryEquations(pure, { pHMin: -2, pHMax: 16, eMin: -2, eMax: 2 });
    const head = ["between", "and", "boundary (E in V vs SHE)"];
    const rows = equations.map((e) => [e.first, e.second, equationText(e)]);
    this.equationsText = [head, ...rows].map((r) => r.join("\t")).join("\n") + "\n";
    $("equations-note").textContent =
      `${this.db.system(metal)?.title ?? metal} in pure water at ${celsius} °C, dissolved activity ${formatActivity(system.activity)}: each boundary drawn between pH −2 and 16 and −2…+2 V vs SHE.` +
      (hasLigands(totals) ? " (The drawing itself includes the water's ligands; these equations do not.)" : "");
    $("equations-table").innerHTML =
      `<thead><tr>${head.map((h) => `<th scope="col">${escapeXml(h)}</th>`).join("")}</tr></thead>` +
      `<tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${escapeXml(c)}</td>`).join("")}</tr>`).join("")}</tbody>`;
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

/**
 * The diagram pane's orchestration: settings controls (pane-controls.ts) and water sources
 * (pane-water-sources.ts) → system (engine) → regions and samples in the chosen scale (pane-samples.ts) → SVG
 * (diagram-svg.ts), the text panels (pane-notes.ts) and exports (pane-export.ts). The host adapter supplies tables
 * and, in Excel, row selection and picture insertion.
 */
import {
  buildLigandSystem,
  DEFAULT_ACTIVITY,
  DEFAULT_CELSIUS,
  getDatabase,
  hasLigands,
  LIGAND_ORDER,
  ligandKey,
  LigandTotals,
  MAX_ACTIVITY,
  MAX_CELSIUS,
  MIN_CELSIUS,
  SystemCache,
  type MetalSystem,
} from "../chemistry";
import {
  defaultWindow,
  displayScale,
  fitWindow,
  formatActivity,
  isClustered,
  ligandEdges,
  PotentialUnit,
  renderDiagramSvg,
  sampleText,
  scaleProblem,
  shownRegions,
  shownWaterLines,
  zoomWindow,
  type AxisWindow,
  type DisplayScale,
  type PlottedSample,
} from "../diagram";
import { DiagramView, type DrawingOptions } from "./pane-view";
import { resultsCsv, resultsTsv } from "./results-table";
import { COLUMN_ROLES, ColumnMapping, EMPTY_MAPPING, matchHeaders, WaterColumns, type IonicColumn } from "../tables";
import { findIonicColumn } from "./ionic-input";
import { ligandNames, resolveWater, WaterSettings, waterCaption } from "./ligand-inputs";
import type { HostAdapter, PaneSettings } from "./host";
import { download } from "./png-export";
import { median, readSamples, SampleTable } from "./sample-table";
import { $, input, select } from "./pane-dom";
import {
  buildColumnControls,
  fillSettingControls,
  settingsFromControls,
  showWindow,
  siteColours,
  siteFiltered,
  windowFromControls,
} from "./pane-controls";
import { buildWaterSources, readWater, showWater, waterToRemember } from "./pane-water-sources";
import { copyText, Drawn, exportFileName, exportPng, exportSvg, insertPicture } from "./pane-export";
import { showResults, showSkipped, showTemperatureSpread } from "./pane-notes";
import { AnswerConditions, ownAnswers } from "./pane-samples";
import { SolubilityView } from "./solubility-view";

export { SPREAD_WARNING } from "./pane-notes";
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

/** The rows read at the diagram temperature, the rows' own temperatures, and where the diagram temperature came from. */
interface ReadRows {
  read: ReturnType<typeof readSamples> | null;
  temperatures: number[];
  celsius: number;
  atMedian: boolean;
}

export class DiagramPane {
  private readonly db = getDatabase();
  private readonly cache = new SystemCache(this.db);
  private table: SampleTable | null = null;
  private mapping: ColumnMapping = { ...EMPTY_MAPPING };
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
  /** The dissolved-metal-along-pH chart of one sample under the diagram. */
  private solubility!: SolubilityView;
  /** "fit": the samples' window; "full": pH −2…16, ±2 V; null: fit when the samples are clustered. */
  private viewMode: "fit" | "full" | null = null;
  private lastWindow: AxisWindow | null = null;
  private equationsText = "";

  constructor(private readonly host: HostAdapter) {
    this.settings = host.loadSettings() ?? {};
  }

  async start(): Promise<void> {
    fillSettingControls(this.db, this.settings);
    this.wireSettings();
    this.wireWater();
    this.wireExports();
    this.view = new DiagramView($("diagram"), {
      show: (sample) => ($("point-info").textContent = sampleText(sample, this.plotted.unit)),
      choose: (sample) => this.chooseSample(sample),
    });
    this.solubility = new SolubilityView($("solubility-chart"));
    this.wireSamples();
    this.wireView();
    this.draw();
    await this.host.start(
      (table) => this.setTable(table),
      (text) => this.status(text),
    );
  }

  /** Metal, electrode, unit, activity, temperature and the axis limits: each change redraws. */
  private wireSettings(): void {
    const redraw = () => this.draw();
    select("metal").addEventListener("change", () => {
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
    input("kinetic").addEventListener("change", redraw);
    input("only-metal").addEventListener("change", redraw);
    for (const id of ["ph-min", "ph-max", "e-min", "e-max"]) $(id).addEventListener("change", () => this.readWindow());
    $("reset-axes").addEventListener("click", () => {
      this.window = null;
      this.viewMode = null;
      redraw();
    });
  }

  /** The ligand totals and their sources: remembered totals restored, each change remembered and redrawn. */
  private wireWater(): void {
    for (const ligand of LIGAND_ORDER) {
      const saved = this.settings.water?.[ligand]?.total;
      if (saved) input(`${ligand}-total`).value = saved;
      input(`${ligand}-total`).addEventListener("change", () => {
        this.rememberWater();
        this.draw();
      });
      select(`${ligand}-source`).addEventListener("change", () => {
        input(`${ligand}-total`).disabled = select(`${ligand}-source`).value !== "typed";
        this.rememberWater();
        this.draw();
      });
    }
  }

  /** SVG, PNG and (in Excel) picture insertion. */
  private wireExports(): void {
    $("export-svg").addEventListener("click", () => exportSvg(this.drawn));
    $("export-png").addEventListener("click", () => void exportPng(this.drawn));
    if (this.host.insertPicture) {
      $("insert-sheet").hidden = false;
      $("insert-sheet").addEventListener("click", () => void this.insertPicture());
    }
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
      const top = mapping.metal >= 0 && !this.settings.metal ? this.commonestMetal(mapping.metal) : undefined;
      if (top && top !== metal) {
        select("metal").value = top;
        return this.applyHeaders(newTable);
      }
      if (!this.settings.electrode && match.hints.electrode) select("electrode").value = match.hints.electrode;
      if (!this.settings.unit && match.hints.potentialUnit) select("unit").value = match.hints.potentialUnit;
      this.temperatureUnit = match.hints.temperatureUnit ?? "C";
      this.window = null;
    }
    this.mapping = mapping;
    buildColumnControls(headers, this.mapping, (role, index) => this.chooseColumn(role, index));
    this.waterFound = buildWaterSources(this.table, this.mapping, this.settings);
    const taken = [...Object.values(this.mapping), ...Object.values(this.waterFound).map((c) => c.index)].filter(
      (i) => i >= 0,
    );
    this.ionicFound = findIonicColumn(headers, taken, this.table.rows);
  }

  /** The metal most rows of column `index` name, if any does. */
  private commonestMetal(index: number): string | undefined {
    const counts = new Map<string, number>();
    for (const row of this.table?.rows ?? []) {
      const m = this.db.resolveMetal(String(row[index] ?? ""));
      if (m) counts.set(m, (counts.get(m) ?? 0) + 1);
    }
    return [...counts.entries()].sort((a, b) => b[1] - a[1])[0]?.[0];
  }

  /** A column menu's choice: remembered by header text for this workbook, then drawn. */
  private chooseColumn(role: keyof ColumnMapping, index: number): void {
    const headers = this.table?.headers ?? [];
    this.mapping = { ...this.mapping, [role]: index };
    this.settings.columns = {
      ...(this.settings.columns ?? {}),
      [role]: this.mapping[role] >= 0 ? headers[this.mapping[role]] : "",
    };
    void this.host.saveSettings(this.settings);
    this.draw();
  }

  /** The system of a water: the ligand-free one when no ligand is present. */
  private systemIn(metal: string, celsius: number, activity: number, totals: LigandTotals): MetalSystem {
    if (!hasLigands(totals)) return this.cache.get(metal, celsius, activity);
    return this.cache.get(metal, celsius, activity, ligandKey(totals), () =>
      buildLigandSystem(this.db, metal, { celsius, activity }, totals),
    );
  }

  private remember(): void {
    this.settings = settingsFromControls(this.settings);
    void this.host.saveSettings(this.settings);
  }

  /** Ligand totals and column choices, kept with the workbook (or the browser). */
  private rememberWater(): void {
    this.settings = { ...this.settings, water: waterToRemember(this.waterFound) };
    void this.host.saveSettings(this.settings);
  }

  private readWindow(): void {
    const w = windowFromControls();
    if (!w) return this.status("Axis limits: each maximum must exceed its minimum.");
    this.window = w;
    this.draw();
  }

  /**
   * Rows → samples, twice: the first pass finds the rows' temperatures for the diagram's default (their median),
   * the second reads the rows at that temperature. A message when the temperature is out of range.
   */
  private readRows(options: Parameters<typeof readSamples>[1]): ReadRows | { error: string } {
    let read = this.table ? readSamples(this.table, options) : null;
    const temperatures = read?.temperatures ?? [];
    let celsius = Number(input("temperature").value);
    if (!this.manualTemperature && temperatures.length > 0) {
      celsius = Math.round(median(temperatures) * 10) / 10;
      input("temperature").value = String(celsius);
    }
    if (!(celsius >= MIN_CELSIUS && celsius <= MAX_CELSIUS))
      return { error: `Temperature: ${MIN_CELSIUS} to ${MAX_CELSIUS} °C.` };
    if (this.table) read = readSamples(this.table, { ...options, celsius });
    return { read, temperatures, celsius, atMedian: !this.manualTemperature && temperatures.length > 0 };
  }

  /** Everything from the controls and the table to the SVG. */
  draw(): void {
    const metal = select("metal").value;
    const electrode = select("electrode").value;
    const unit = select("unit").value as PotentialUnit;
    const activity = Number(input("activity").value);
    if (!(activity > 0 && activity <= MAX_ACTIVITY))
      return this.status(
        `Dissolved activity: a number above 0 and at most ${MAX_ACTIVITY}, e.g. ${DEFAULT_ACTIVITY.toExponential()}.`,
      );
    const waterInput = readWater(this.table);
    if ("error" in waterInput) return this.status(waterInput.error);
    const rows = this.readRows({
      mapping: this.mapping,
      electrode,
      unit,
      temperatureUnit: this.temperatureUnit,
      celsius: DEFAULT_CELSIUS,
      onlyMetal: input("only-metal").checked ? metal : undefined,
      waterColumns: Object.keys(waterInput.columns).length > 0 ? waterInput.columns : undefined,
    });
    if ("error" in rows) return this.status(rows.error);
    const { read, celsius } = rows;
    showTemperatureSpread(rows.temperatures, celsius, this.table !== null, this.manualTemperature);
    const axisProblem = scaleProblem(electrode, celsius);
    if (axisProblem) return this.status(`The diagram could not be drawn: ${axisProblem}.`);
    // the water: typed ligand totals, or each row's from a column with the median for the diagram
    const resolved = resolveWater(waterInput.settings, read?.rowTotals ?? []);
    let system: MetalSystem;
    try {
      system = this.systemIn(metal, celsius, activity, resolved.diagram);
    } catch (error) {
      return this.status(`The diagram could not be built: ${(error as Error).message}`);
    }
    const at: AnswerConditions = { metal, electrode, unit, activity, celsius };
    this.drawSystem(system, at, rows, resolved, waterInput.settings);
  }

  /** The built system with its samples: window, regions, caption, the view, the text panels and the export. */
  private drawSystem(
    system: MetalSystem,
    at: AnswerConditions,
    rows: ReadRows,
    resolved: ReturnType<typeof resolveWater>,
    water: WaterSettings,
  ): void {
    const { read, celsius } = rows;
    const scale = displayScale(at.electrode, at.unit, celsius);
    const own = ownAnswers(this.rowSource(), read, water, at, scale);
    const samples = siteFiltered(own.samples);
    const window = this.chooseWindow(scale, samples);
    showWindow(window);
    const regions = shownRegions(system, window, scale);
    showWater(resolved, hasLigands(resolved.diagram) || resolved.fromColumns.length > 0);
    const title = this.diagramTitle(at.metal, resolved.diagram);
    const caption = this.caption(title, at, scale, rows, samples.length, [waterCaption(resolved), own.ionicLine]);
    const showKineticBand = input("kinetic").checked;
    this.plotted = { samples, unit: at.unit };
    const sites = siteColours(own.samples);
    const drawing: DrawingOptions = {
      system,
      window,
      regions,
      samples,
      water: shownWaterLines(celsius, scale),
      axisTitle: scale.axisTitle,
      unit: at.unit,
      title,
      caption,
      showKineticBand,
      // above this many points the on-screen diagram leaves out the per-point <title> (the info line shows the text)
      sampleTitles: samples.length <= TITLED_SAMPLES,
      sampleFill: sites ? (p: PlottedSample) => sites.get(p.site ?? "") ?? "#888888" : undefined,
    };
    const compare = this.compareOptions(drawing, at, resolved.diagram, read, water, scale);
    $("point-info").textContent = POINT_PROMPT; // the previous drawing's sample may not be on this one
    this.view.show({
      options: drawing,
      caption,
      compare,
      legend: { kinetic: showKineticBand, ligandEdges: ligandEdges(system), sites },
    });
    const metalName = this.db.element(at.metal)?.name ?? at.metal;
    this.solubility.show(samples, { metal: at.metal, metalName, window, celsius });
    this.drawn = {
      caption,
      render: (width, height, titles = true) => renderDiagramSvg({ ...drawing, width, height, sampleTitles: titles }),
    };
    const pure = hasLigands(resolved.diagram) ? this.systemIn(system.element, celsius, system.activity, {}) : system;
    this.equationsText = showResults(this.db, samples, system, pure, celsius, resolved.diagram);
    showSkipped(read, own.failed, this.table !== null && (this.mapping.pH < 0 || this.mapping.potential < 0));
    if (this.table)
      this.status(`${samples.length} sample${samples.length === 1 ? "" : "s"} drawn from ${this.table.source}.`);
  }

  private rowSource() {
    return this.table
      ? { table: this.table, mapping: this.mapping, temperatureUnit: this.temperatureUnit, ionic: this.ionicFound }
      : null;
  }

  /** "Iron in water", with the water's ligands named when it has any. */
  private diagramTitle(metal: string, totals: LigandTotals): string {
    const metalTitle = this.db.system(metal)?.title ?? metal;
    return hasLigands(totals) ? `${metalTitle} in water with ${ligandNames(totals)}` : `${metalTitle} in water`;
  }

  /**
   * The caption: conditions, the markers' promise, the water's lines (ligands, ionic strength; blank ones left
   * out), the samples' source and the data's compilation.
   */
  private caption(
    title: string,
    at: AnswerConditions,
    scale: DisplayScale,
    rows: ReadRows,
    drawn: number,
    waterLines: string[],
  ): string[] {
    const compilation = this.db.system(at.metal)?.compilation ?? "";
    return [
      `${title} at ${rows.celsius} °C${rows.atMedian ? " (the rows' median temperature)" : ""}, dissolved activity ${formatActivity(at.activity)}, potentials in ${at.unit} vs ${scale.electrode}.`,
      ...(drawn > 0 ? [OWN_ANSWERS] : []),
      ...waterLines.filter((line) => line !== ""),
      `Samples: ${this.table ? `${this.table.source}; ${drawn} drawn, ${rows.read?.skipped.length ?? 0} not drawn` : "none"}. Thermodynamic data: ${firstSentence(compilation)}`,
    ];
  }

  /** Hover and click on sample points (the keyboard is the view's: one tab stop, arrow keys). */
  private wireSamples(): void {
    const container = $("diagram");
    const info = $("point-info");
    const target = (event: Event) => (event.target instanceof Element ? event.target.closest(".rc-sample") : null);
    const sampleOf = (event: Event) => {
      const point = target(event);
      return point ? this.plotted.samples[Number(point.getAttribute("data-i"))] : undefined;
    };
    container.addEventListener("mouseover", (event) => {
      const sample = sampleOf(event);
      if (sample) info.textContent = sampleText(sample, this.plotted.unit);
    });
    container.addEventListener("click", (event) => {
      const sample = sampleOf(event);
      if (sample) this.chooseSample(sample);
    });
  }

  /** A sample chosen on the diagram: its row in the sheet, and the solubility chart's sample. */
  private chooseSample(sample: PlottedSample): void {
    this.solubility.follow(sample);
    this.selectRow(sample.row);
  }

  private selectRow(row: number): void {
    if (this.host.selectRow && Number.isFinite(row))
      void this.host
        .selectRow(row)
        .catch((e: unknown) => this.status(`Could not select row ${row}: ${(e as Error).message}`));
  }

  /** View buttons: fit to the samples, the full range, zoom in and out; results and equations out. */
  private wireView(): void {
    const setWindow = (w: AxisWindow | null, mode: "fit" | "full" | null) => {
      this.window = w;
      this.viewMode = mode;
      this.draw();
    };
    const status = (text: string) => this.status(text);
    $("fit-samples").addEventListener("click", () => setWindow(null, "fit"));
    $("full-range").addEventListener("click", () => setWindow(null, "full"));
    $("zoom-in").addEventListener(
      "click",
      () => this.lastWindow && setWindow(zoomWindow(this.lastWindow, 0.6), this.viewMode),
    );
    $("zoom-out").addEventListener(
      "click",
      () => this.lastWindow && setWindow(zoomWindow(this.lastWindow, 1 / 0.6), this.viewMode),
    );
    for (const id of ["color-by", "site-filter", "compare-metal"]) $(id).addEventListener("change", () => this.draw());
    $("export-csv").addEventListener("click", () =>
      download(new Blob([resultsCsv(this.plotted.samples)], { type: "text/csv" }), exportFileName("csv")),
    );
    $("copy-results").addEventListener(
      "click",
      () => void copyText(resultsTsv(this.plotted.samples), "Results copied: paste them into a sheet.", status),
    );
    $("copy-equations").addEventListener(
      "click",
      () => void copyText(this.equationsText, "Boundary equations copied.", status),
    );
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

  /** A second metal with the same window, temperature, water and samples (their own answers for that metal). */
  private compareOptions(
    first: DrawingOptions,
    at: AnswerConditions,
    totals: LigandTotals,
    read: ReturnType<typeof readSamples> | null,
    water: WaterSettings,
    scale: DisplayScale,
  ): DrawingOptions | undefined {
    const metal = select("compare-metal").value;
    if (!metal || metal === select("metal").value) return undefined;
    try {
      const system = this.systemIn(metal, at.celsius, at.activity, totals);
      const own = ownAnswers(this.rowSource(), read, water, { ...at, metal }, scale);
      const keep = new Set(first.samples.map((s) => s.row));
      const title = `${this.db.system(metal)?.title ?? metal} in water`;
      return {
        ...first,
        system,
        regions: shownRegions(system, first.window, scale),
        samples: own.samples.filter((s) => keep.has(s.row)),
        title,
        sampleFill: undefined,
      };
    } catch (error) {
      this.status(`The comparison could not be drawn: ${(error as Error).message}`);
      return undefined;
    }
  }

  exportSvg(): void {
    exportSvg(this.drawn);
  }

  async exportPng(): Promise<void> {
    await exportPng(this.drawn);
  }

  async insertPicture(): Promise<void> {
    await insertPicture(this.drawn, this.host, (text) => this.status(text));
  }
}

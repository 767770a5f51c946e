/**
 * The pane's settings controls and menus: metal, electrode, unit and activity (remembered per workbook), the
 * column menus, the axis limits, and the site menus (filter and colours).
 */
import {
  boundText,
  DEFAULT_ACTIVITY,
  DEFAULT_CELSIUS,
  FULL_E_LIMIT,
  getElectrodes,
  MAX_CELSIUS,
  MIN_CELSIUS,
  PH_MAX,
  PH_MIN,
  type Database,
} from "../chemistry";
import { type AxisWindow, type PlottedSample, type PotentialUnit } from "../diagram";
import { COLUMN_ROLES, ColumnMapping, ColumnRole } from "../tables";
import type { PaneSettings } from "./host";
import { $, input, select } from "./pane-dom";
import { SITE_COLOURS } from "./pane-legend";

const ROLE_WORDS: Record<ColumnRole, string> = {
  pH: "pH",
  potential: "Potential (ORP, Eh, E)",
  temperature: "Temperature",
  id: "Sample id",
  site: "Site",
  dissolved: "Dissolved metal",
  metal: "Metal",
};

/**
 * The metal, comparison and electrode menus, the remembered settings (else Fe, SHE, V, the default activity and
 * temperature) and the limits of the domain (src/chemistry/domain.ts) on the inputs.
 */
export function fillSettingControls(db: Database, settings: PaneSettings): void {
  const metals = select("metal");
  const metalText = (symbol: string) => `${db.system(symbol)?.title ?? symbol} (${symbol})`;
  for (const symbol of db.metals()) metals.add(new Option(metalText(symbol), symbol));
  metals.value = settings.metal && db.metals().includes(settings.metal) ? settings.metal : "Fe";
  for (const symbol of db.metals()) select("compare-metal").add(new Option(metalText(symbol), symbol));
  const electrodes = select("electrode");
  for (const e of getElectrodes().all()) electrodes.add(new Option(`${e.id} — ${e.name}`, e.id));
  electrodes.value = settings.electrode ?? "SHE";
  select("unit").value = settings.unit ?? "V";
  input("activity").value = settings.activity ? String(settings.activity) : DEFAULT_ACTIVITY.toExponential();
  const temperature = input("temperature");
  [temperature.min, temperature.max] = [String(MIN_CELSIUS), String(MAX_CELSIUS)];
  temperature.value = String(DEFAULT_CELSIUS);
  $("full-range").title = `pH ${boundText(PH_MIN)}…${PH_MAX}, ±${FULL_E_LIMIT} V`;
}

/** The settings as shown in the controls (metal, electrode, unit, activity), to remember. */
export function settingsFromControls(settings: PaneSettings): PaneSettings {
  const activity = Number(input("activity").value);
  return {
    ...settings,
    metal: select("metal").value,
    electrode: select("electrode").value,
    unit: select("unit").value as PotentialUnit,
    activity: Number.isFinite(activity) && activity > 0 ? activity : undefined,
  };
}

/** One menu per column role listing the table's headers; `choose` gets the role and the column (−1 for none). */
export function buildColumnControls(
  headers: readonly string[],
  mapping: ColumnMapping,
  choose: (role: ColumnRole, index: number) => void,
): void {
  const container = $("column-controls");
  container.replaceChildren();
  for (const role of COLUMN_ROLES) {
    const label = document.createElement("label");
    label.htmlFor = `column-${role}`;
    label.textContent = ROLE_WORDS[role];
    const choice = document.createElement("select");
    choice.id = `column-${role}`;
    choice.add(new Option("(none)", "-1"));
    headers.forEach((h, i) => choice.add(new Option(h || `column ${i + 1}`, String(i))));
    choice.value = String(mapping[role]);
    choice.addEventListener("change", () => choose(role, Number(choice.value)));
    container.append(label, choice);
  }
}

/** The axis limits typed by the user, or null when a maximum does not exceed its minimum. */
export function windowFromControls(): AxisWindow | null {
  const w = {
    pHMin: Number(input("ph-min").value),
    pHMax: Number(input("ph-max").value),
    eMin: Number(input("e-min").value),
    eMax: Number(input("e-max").value),
  };
  if (![w.pHMin, w.pHMax, w.eMin, w.eMax].every(Number.isFinite) || w.pHMax <= w.pHMin || w.eMax <= w.eMin) return null;
  return w;
}

/** The shown window in the axis-limit inputs (steps of 50 mV or 0.05 V). */
export function showWindow(w: AxisWindow): void {
  input("ph-min").value = String(w.pHMin);
  input("ph-max").value = String(w.pHMax);
  input("e-min").value = String(Number(w.eMin.toPrecision(6)));
  input("e-max").value = String(Number(w.eMax.toPrecision(6)));
  const step = select("unit").value === "mV" ? "50" : "0.05";
  input("e-min").step = step;
  input("e-max").step = step;
}

/** The samples' site names, sorted, blanks left out. */
function siteNames(samples: readonly PlottedSample[]): string[] {
  return [...new Set(samples.map((s) => s.site ?? "").filter((x) => x !== ""))].sort();
}

/** Samples of the chosen site only (the "Show site" menu), refreshing the menu's list of sites. */
export function siteFiltered(samples: PlottedSample[]): PlottedSample[] {
  const menu = select("site-filter");
  const sites = siteNames(samples);
  const keep = menu.value;
  menu.replaceChildren(new Option("all sites", ""), ...sites.map((x) => new Option(x, x)));
  menu.value = sites.includes(keep) ? keep : "";
  menu.disabled = sites.length === 0;
  return menu.value === "" ? samples : samples.filter((s) => s.site === menu.value);
}

/** Site → colour when colouring by site (Okabe–Ito colours, cycling past eight sites). */
export function siteColours(samples: readonly PlottedSample[]): Map<string, string> | undefined {
  if (select("color-by").value !== "site") return undefined;
  const sites = siteNames(samples);
  if (sites.length === 0) return undefined;
  return new Map(sites.map((x, i) => [x, SITE_COLOURS[i % SITE_COLOURS.length]]));
}

/**
 * Finding the columns of a sample log by their header text, the way people actually write them:
 * "pH", "pH (field)"; "ORP", "ORP (mV)", "Eh", "E", "E vs SCE / V", "Redox potential [mV]", "ORP_mV_AgCl_sat";
 * "Temp", "Temperature (°C)", "°C", "T (C)", "temp_C", "Water temp °F"; "Sample ID", "site"; "Fe (µg/L)",
 * "Dissolved lead, mg/L", "Pb_ug_L"; "metal", "pipe_metal". Pure functions: no host, no DOM.
 *
 * Headers also hint at the potential's unit (mV or V) and reference electrode ("vs SCE", "AgCl sat", "Eh" is vs
 * SHE by definition — common practice) and at a temperature in °F or K; the pane offers these as defaults and the
 * command line uses them. Lab exports in German, French, Spanish, Italian, Dutch and Portuguese name the same
 * columns in their own words ("Probe", "Messstelle", "Temperatur", "Redoxpotential", "Chlorid", "Sulfat",
 * "Alkalinität", "TAC (°f)", "KS 4,3", "Échantillon", "cloruros", "solfati"), and so do those in Swedish, Danish,
 * Norwegian, Finnish, Polish and Czech ("Prøve", "Lämpötila", "Przewodność", "Chlorki", "Teplota", "KNK 4,5"):
 * accents are dropped before matching (ł, ø, æ and ß spelt out), and those words are matched too. The words are the
 * languages' ordinary names for these quantities (from memory, not from a lab's export).
 */
import { type TemperatureScale, type WaterUnit } from "./units";

export type ColumnRole = "pH" | "potential" | "temperature" | "id" | "site" | "dissolved" | "metal";

export const COLUMN_ROLES: readonly ColumnRole[] = [
  "pH",
  "potential",
  "temperature",
  "id",
  "site",
  "dissolved",
  "metal",
];

/** Column index per role, −1 when absent. */
export type ColumnMapping = Record<ColumnRole, number>;

export interface HeaderHints {
  /** Unit of the potential column when its header says so. */
  potentialUnit: "V" | "mV" | null;
  /** Reference electrode named by the potential header (a name the electrode records know), or null. */
  electrode: string | null;
  /** Temperature in Fahrenheit? (°C otherwise, also for a kelvin header: see temperatureScale.) */
  temperatureUnit: "C" | "F" | null;
  /** The temperature scale the header names: °C (also when it names none), °F or K; null without a column. */
  temperatureScale: TemperatureScale | null;
  /** Unit of the dissolved-metal column. */
  dissolvedUnit: "ug/L" | "mg/L" | "mol/kg" | null;
}

export interface HeaderMatch {
  readonly mapping: ColumnMapping;
  readonly hints: HeaderHints;
}

export const EMPTY_MAPPING: ColumnMapping = {
  pH: -1,
  potential: -1,
  temperature: -1,
  id: -1,
  site: -1,
  dissolved: -1,
  metal: -1,
};

/** Lower-case word tokens of a header: "ORP (mV) vs Ag/AgCl" → orp, mv, vs, ag, agcl. */
export function headerTokens(header: string): string[] {
  return header
    .toLowerCase()
    .replace(/[µμ]/g, "u")
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "") // accents off: "température" → "temperature", "Säure" → "saure"
    .replace(/ł/g, "l") // letters NFD leaves whole: "potencjał" → "potencjal", "prøve" → "prove", "Meß" → "mess"
    .replace(/ø/g, "o")
    .replace(/æ/g, "ae")
    .replace(/ß/g, "ss")
    .replace(/°\s*c\b/g, " degc ")
    .replace(/°\s*f\b/g, " degf ")
    .replace(/℃/g, " degc ")
    .replace(/([a-z])([0-9])/g, "$1 $2")
    .split(/[^a-z0-9.]+/)
    .filter((t) => t !== "");
}

const has = (tokens: readonly string[], ...words: string[]) => words.some((w) => tokens.includes(w));

function isPH(tokens: readonly string[]): boolean {
  if (!tokens.includes("ph") || has(tokens, "mv", "orp", "eh", "temp", "temperature")) return false;
  return !namesAlkalinity(tokens); // "Alkalinity to pH 4.5", "Säurekapazität bis pH 4,3"
}

/** "potential" and "redox potential" in the languages of European lab exports (one word in some of them). */
const POTENTIAL_WORDS = [
  "potentiel",
  "potencial", // es, pt, cs
  "potenziale",
  "redoxpotential", // de, sv, da, no
  "redoxpotentiaal",
  "redoxspannung",
  "potencjal", // pl
  "potentiaali", // fi
  "redoks",
];

function isPotential(tokens: readonly string[]): boolean {
  if (has(tokens, "orp", "eh", "potential", "redox", "ecorr", "ecp", "e.h")) return true; // ECP: corrosion potential (loops)
  if (has(tokens, ...POTENTIAL_WORDS)) return true;
  if (tokens[0] === "e" && !has(tokens, "coli")) return true; // "E", "E (V)", "E vs SCE"
  if (tokens.length === 1 && tokens[0] === "mv") return true;
  return false;
}

/** Conductivity in other languages: de, fr, es, it, nl, pt, sv, da/no, fi, pl, cs (ionic-columns.ts reads them too). */
export const CONDUCTIVITY_WORDS = [
  "leitfahigkeit",
  "conductivite",
  "conductividad",
  "conducibilita",
  "conduttivita",
  "geleidbaarheid",
  "geleidendheid",
  "condutividade",
  "konduktivitet",
  "ledningsevne",
  "sahkonjohtavuus",
  "johtokyky",
  "przewodnosc",
  "konduktywnosc",
  "vodivost",
  "konduktivita",
];

/**
 * Total dissolved solids, as labs name it: "TDS", "total dissolved solids", and in other languages the evaporation
 * residue (de), "résidu sec" (fr), "residuo fisso" (it), "sólidos disueltos" (es), "droogrest" (nl) …
 */
export function namesDissolvedSolids(tokens: readonly string[]): boolean {
  if (has(tokens, "tds") || (has(tokens, "dissolved") && has(tokens, "solids"))) return true;
  if (has(tokens, "abdampfruckstand", "trockenruckstand", "droogrest")) return true;
  if (has(tokens, "residu", "residuo") && has(tokens, "sec", "seco", "fisso", "secco")) return true;
  return has(tokens, "solidos", "solides", "solidi") && has(tokens, "dissous", "disueltos", "dissolvidos", "disciolti");
}

function isTemperature(tokens: readonly string[]): boolean {
  // "Conductivity (µS/cm at 25 °C)", "Résidu sec à 180 °C"; "TAC (°f)" is alkalinity in French degrees
  if (has(tokens, "conductivity", "conductance", "ec", "sc", "spcond", ...CONDUCTIVITY_WORDS)) return false;
  if (namesDissolvedSolids(tokens)) return false;
  if (namesAlkalinity(tokens)) return false;
  if (has(tokens, "temp", "temperature", "degc", "degf", "celsius", "fahrenheit", "kelvin")) return true;
  if (has(tokens, "temperatur", "temperatura", "temperatuur", "wassertemperatur")) return true; // de/sv/da/no, es/it/pt/pl, nl
  if (has(tokens, "lampotila", "teplota")) return true; // fi, cs
  // "T", "T (C)", "t_c", "T °C", "T (K)"
  return (
    tokens[0] === "t" && tokens.length <= 3 && tokens.slice(1).every((t) => ["c", "f", "k", "degc", "degf"].includes(t))
  );
}

/** The scale a temperature header names: °F ("°F", "fahrenheit", "F"), K ("K", "kelvin"), else °C. */
export function temperatureScale(tokens: readonly string[]): TemperatureScale {
  if (has(tokens, "degf", "fahrenheit", "f")) return "F";
  if (has(tokens, "kelvin", "k")) return "K";
  return "C";
}

/**
 * "Sample" in other languages: de, fr, es, it, nl, pt, sv, da/no, fi, pl, cs; only as a short header's first word
 * ("ORP probe" is a sensor).
 */
const SAMPLE_WORDS = [
  "probe",
  "probennummer",
  "echantillon",
  "muestra",
  "campione",
  "monster",
  "amostra",
  "prov",
  "prove",
  "nayte",
  "probka",
  "vzorek",
];
/** "Date" in those languages: a sample word followed by it names the sampling date, not the sample. */
const DATE_WORDS = ["datum", "date", "fecha", "data", "dato", "pvm"];

function isId(tokens: readonly string[]): boolean {
  if (has(tokens, "id", "sampleid", "label", "code")) return true;
  if (tokens[0] === "sample" && tokens.length <= 2 && !has(tokens, "date", "time")) return true;
  if (SAMPLE_WORDS.includes(tokens[0]) && tokens.length <= 2 && !has(tokens, ...DATE_WORDS)) return true;
  return tokens.length === 1 && has(tokens, "name", "no", "number", "#");
}

/** Sampling point in other languages: de, fr, es, it, nl, pt, sv, da/no, fi, pl, cs. */
const SITE_WORDS = [
  "messstelle",
  "entnahmestelle",
  "probenahmestelle",
  "standort",
  "lieu",
  "punto",
  "estacion",
  "stazione",
  "meetpunt",
  "locatie",
  "ponto",
  "provplats",
  "provtagningsplats",
  "provested",
  "malested",
  "naytepaikka",
  "naytteenottopaikka",
  "punkt",
  "stanowisko",
  "misto",
];

function isSite(tokens: readonly string[]): boolean {
  return has(tokens, "site", "location", "station", "well", "tap", "point", ...SITE_WORDS) && !has(tokens, "id");
}

function isMetal(tokens: readonly string[]): boolean {
  return has(tokens, "metal", "element") && !has(tokens, "ug", "mg", "ppb", "ppm", "dissolved");
}

const CONCENTRATION = ["ug", "mg", "ppb", "ppm", "mol", "mmol", "umol", "dissolved", "total", "conc", "concentration"];

/** Whether a header names the dissolved concentration of `metal` (symbol) or its element `name`. */
function isDissolved(tokens: readonly string[], metal: string, name: string): boolean {
  const symbol = metal.toLowerCase();
  const mentionsMetal = tokens.includes(symbol) || (name !== "" && tokens.includes(name.toLowerCase()));
  return mentionsMetal && (has(tokens, ...CONCENTRATION) || tokens.length === 1);
}

function potentialUnit(tokens: readonly string[]): "V" | "mV" | null {
  if (tokens.includes("mv")) return "mV";
  if (tokens.includes("v") || tokens.includes("volt") || tokens.includes("volts")) return "V";
  return null;
}

/** "Saturated" (of the KCl filling) in de, fr, es/pt, it, nl, sv, da, no, fi, pl, cs. */
const SATURATED_WORDS = [
  "gesattigt",
  "sature",
  "saturee",
  "saturado",
  "saturo",
  "verzadigd",
  "mattad",
  "maettet",
  "mettet",
  "kyllainen",
  "nasycony",
  "nasyceny",
];

/** The name a bare silver chloride header gives: an ambiguous name of the electrode records (which filling?). */
export const BARE_SILVER_CHLORIDE = "Ag/AgCl";

/**
 * The electrode a potential header names, as an electrode-record name; BARE_SILVER_CHLORIDE when it names silver
 * chloride without its filling (saturated, 3.5 M, 3 M, 1 M and seawater fillings read several mV apart).
 */
export function electrodeNamed(tokens: readonly string[]): string | null {
  if (has(tokens, "she", "nhe") || tokens.includes("eh")) return "SHE";
  if (has(tokens, "sce", "calomel", "ecs")) return "SCE"; // ECS: French and Spanish for SCE
  if (has(tokens, "rhe")) return "RHE";
  if (has(tokens, "cse", "cuso", "cuso4")) return "CSE";
  if (has(tokens, "mse", "hg2so4")) return "MSE";
  if (has(tokens, "epbre", "epb")) return "AgCl-EPB"; // external pressure-balanced Ag/AgCl, before the fillings
  if (has(tokens, "agcl")) {
    if (has(tokens, "sat", "saturated", ...SATURATED_WORDS)) return "AgCl-sat";
    if (tokens.includes("3.5") || tokens.includes("3.5m")) return "AgCl-3.5M";
    if (tokens.includes("3") || tokens.includes("3m")) return "AgCl-3M";
    if (tokens.includes("1") || tokens.includes("1m")) return "AgCl-1M";
    if (has(tokens, "sea", "seawater")) return "AgCl-sea";
    return BARE_SILVER_CHLORIDE;
  }
  if (has(tokens, "hgo")) return "HgO-1M";
  return null;
}

/**
 * The electrode the pane offers as its default for a potential header: as electrodeNamed, with saturated KCl
 * offered (visibly, in its electrode menu) for a bare silver chloride header. The command line refuses that case.
 */
export function electrodeHint(tokens: readonly string[]): string | null {
  const named = electrodeNamed(tokens);
  return named === BARE_SILVER_CHLORIDE ? "AgCl-sat" : named;
}

function dissolvedUnit(tokens: readonly string[]): HeaderHints["dissolvedUnit"] {
  if (has(tokens, "ug", "ppb")) return "ug/L";
  if (has(tokens, "mg", "ppm")) return "mg/L";
  if (has(tokens, "mol", "molal")) return "mol/kg";
  return null;
}

/**
 * Matches header cells to roles. Each column serves at most one role; roles are tried in the order pH,
 * potential, temperature, dissolved, metal, id, site, and the first matching column (left to right) wins.
 */
export function matchHeaders(headers: readonly unknown[], metal = "", metalName = ""): HeaderMatch {
  const tokens = headers.map((h) =>
    headerTokens(typeof h === "string" ? h : h === null || h === undefined ? "" : String(h)),
  );
  const mapping: ColumnMapping = { ...EMPTY_MAPPING };
  const taken = new Set<number>();
  const claim = (role: ColumnRole, test: (t: string[]) => boolean) => {
    const index = tokens.findIndex((t, i) => !taken.has(i) && t.length > 0 && test(t));
    if (index >= 0) {
      mapping[role] = index;
      taken.add(index);
    }
  };
  claim("pH", isPH);
  claim("potential", isPotential);
  claim("temperature", isTemperature);
  if (metal) claim("dissolved", (t) => isDissolved(t, metal, metalName));
  claim("metal", isMetal);
  claim("id", isId);
  claim("site", isSite);
  const potentialTokens = mapping.potential >= 0 ? tokens[mapping.potential] : [];
  const temperatureTokens = mapping.temperature >= 0 ? tokens[mapping.temperature] : [];
  return {
    mapping,
    hints: {
      potentialUnit: potentialUnit(potentialTokens),
      electrode: mapping.potential >= 0 ? electrodeHint(potentialTokens) : null,
      temperatureUnit: mapping.temperature < 0 ? null : temperatureScale(temperatureTokens) === "F" ? "F" : "C",
      temperatureScale: mapping.temperature < 0 ? null : temperatureScale(temperatureTokens),
      dissolvedUnit: mapping.dissolved >= 0 ? dissolvedUnit(tokens[mapping.dissolved]) : null,
    },
  };
}

/**
 * The header row among the first rows of a block: the first row that names both a pH and a potential column
 * and is mostly text. −1 when none does (the block then has no header; see the adapters).
 */
export function findHeaderRow(rows: readonly (readonly unknown[])[], maxRows = 10): number {
  for (let r = 0; r < Math.min(rows.length, maxRows); r++) {
    const row = rows[r];
    const texts = row.filter((c) => typeof c === "string" && c.trim() !== "" && !Number.isFinite(Number(c)));
    if (texts.length < 2) continue;
    const { mapping } = matchHeaders(row);
    if (mapping.pH >= 0 && mapping.potential >= 0) return r;
  }
  return -1;
}

/**
 * Columns describing the water rather than the sample's reading: total alkalinity, chloride, sulfate, dissolved
 * inorganic carbon and orthophosphate, with the unit their header names (units.ts). The pane and the command line take each row's
 * ligand totals from them. Matched apart from the main roles so a sample log's mapping is unchanged by them.
 */
export type WaterColumnRole = "alkalinity" | "chloride" | "sulfate" | "dic" | "phosphate";

export const WATER_COLUMN_ROLES: readonly WaterColumnRole[] = ["alkalinity", "chloride", "sulfate", "dic", "phosphate"];

export interface WaterColumn {
  readonly index: number;
  readonly unit: WaterUnit;
}

export type WaterColumns = Partial<Record<WaterColumnRole, WaterColumn>>;

/** Total alkalinity in other languages: de, fr, es, it, nl, pt, sv/da/no, fi, pl, cs. */
const ALKALINITY_WORDS = [
  "alkalinitat",
  "alcalinite",
  "alcalinidad",
  "alcalinita",
  "alkaliniteit",
  "alcalinidade",
  "alkalinitet",
  "alkaliniteetti",
  "zasadowosc",
  "alkalita",
];

function isAlkalinity(tokens: readonly string[]): boolean {
  return namesAlkalinity(tokens) || (tokens[0] === "ta" && tokens.length <= 4);
}

/** A header naming alkalinity by a word of its own (not the bare "TA"), in any of the languages matched. */
function namesAlkalinity(tokens: readonly string[]): boolean {
  return has(tokens, "alkalinity", "alk", "talk", "tac", ...ALKALINITY_WORDS) || isAcidCapacity(tokens);
}

/**
 * The acid capacity to pH 4.3 of German practice, "KS 4,3", "Säurekapazität bis pH 4,3", "m-Wert", and the acid
 * neutralising capacity to pH 4.5 of Czech practice, "KNK 4,5" (kyselinová neutralizační kapacita): the total
 * alkalinity in mmol/L (common practice; DIN 38409-7), so meq/L when the header names no unit.
 */
function isAcidCapacity(tokens: readonly string[]): boolean {
  if (has(tokens, "saurekapazitat", "saeurekapazitaet")) return true;
  if (tokens[0] === "m" && tokens[1] === "wert") return true;
  if (tokens[0] === "knk" && (tokens[1] === "4" || tokens[1] === "4.5")) return true;
  return tokens[0] === "ks" && (tokens[1] === "4" || tokens[1] === "4.3");
}

function isChloride(tokens: readonly string[]): boolean {
  // chlorine residual (Cl2, "free chlorine") is not chloride
  if (
    has(tokens, "chlorine", "residual", "free", "combined", "chloramine") ||
    (tokens.includes("cl") && tokens[tokens.indexOf("cl") + 1] === "2")
  )
    return false;
  return has(tokens, "chloride", "chlorides", "cl", ...CHLORIDE_WORDS);
}

/** Chloride in other languages: de, fr, es, it, pt, sv/da/no, fi, pl, cs. */
const CHLORIDE_WORDS = [
  "chlorid",
  "chlorure",
  "chlorures",
  "cloruro",
  "cloruros",
  "cloruri",
  "cloreto",
  "cloretos",
  "klorid",
  "klorider",
  "kloridi",
  "chlorki",
  "chloridy",
];

/** Sulfate in other languages: de/sv/da/no, es/pt, it, nl, fi, pl, cs. */
const SULFATE_WORDS = [
  "sulfat",
  "sulfato",
  "sulfatos",
  "solfato",
  "solfati",
  "sulfaat",
  "sulfaatti",
  "siarczany",
  "siarczan",
  "sirany",
];

function isSulfate(tokens: readonly string[]): boolean {
  if (has(tokens, "sulfate", "sulphate", "sulfates", "sulphates", ...SULFATE_WORDS)) return true;
  const at = tokens.indexOf("so");
  return at >= 0 && tokens[at + 1] === "4";
}

/** Orthophosphate in other languages: de, es/it/pt, nl, sv/da/no, fi, pl, cs. */
const PHOSPHATE_WORDS = [
  "phosphat",
  "orthophosphat",
  "fosfato",
  "fosfatos",
  "fosfati",
  "ortofosfato",
  "fosfaat",
  "fosfat",
  "fosfaatti",
  "fosforany",
  "fosforecnany",
];

/**
 * A header naming orthophosphate: "orthophosphate", "phosphate", "PO4", "ortho-P". Total phosphorus is not
 * orthophosphate (it counts organic and condensed phosphorus too) and is not matched.
 */
function isPhosphate(tokens: readonly string[]): boolean {
  if (has(tokens, "orthophosphate", "phosphate", "phosphates", "orthophosphates", ...PHOSPHATE_WORDS)) return true;
  if (has(tokens, "ortho") && (has(tokens, "p", "phosphorus") || tokens.includes("po"))) return true;
  const at = tokens.indexOf("po");
  return at >= 0 && tokens[at + 1] === "4";
}

/** Orthophosphate "as P": "PO4-P", "ortho-P", "Phosphat-P", "(mg/L as P)"; otherwise mg/L as PO4. */
function phosphateAsP(tokens: readonly string[]): boolean {
  const phosphateWord = (t: string | undefined) =>
    t !== undefined && ["orthophosphate", "phosphate", "ortho", ...PHOSPHATE_WORDS].includes(t);
  return tokens.some(
    (t, i) =>
      t === "p" &&
      (tokens[i - 1] === "as" || phosphateWord(tokens[i - 1]) || (tokens[i - 1] === "4" && tokens[i - 2] === "po")),
  );
}

/** Bicarbonate in the languages matched: en, de, fr, es/pt, it, nl, sv/da/no, fi, pl, cs; and the formula HCO3. */
const BICARBONATE_WORDS = [
  "bicarbonate",
  "bicarbonates",
  "hydrogencarbonat",
  "hydrogenocarbonate",
  "hydrogenocarbonates",
  "bicarbonato",
  "bicarbonatos",
  "idrogenocarbonato",
  "idrogenocarbonati",
  "bicarbonaat",
  "waterstofcarbonaat",
  "bikarbonat",
  "vatekarbonat",
  "bikarbonaatti",
  "vetykarbonaatti",
  "wodoroweglany",
  "hydrogenuhlicitany",
];

/** A header naming bicarbonate (HCO3−, a laboratory's report of the carbonate instead of alkalinity). */
function isBicarbonate(tokens: readonly string[]): boolean {
  if (has(tokens, ...BICARBONATE_WORDS)) return true;
  const at = tokens.indexOf("hco");
  return at >= 0 && tokens[at + 1] === "3";
}

/** A header naming dissolved inorganic carbon: "DIC", "TIC", "dissolved inorganic carbon (mmol/L)". */
function isDic(tokens: readonly string[]): boolean {
  return has(tokens, "dic", "tic") || (has(tokens, "inorganic") && has(tokens, "carbon"));
}

/** Header says mol/kg (or molal), not a milli- or micro- unit. */
function saysMolPerKg(tokens: readonly string[]): boolean {
  return has(tokens, "molal") || (tokens.includes("mol") && tokens.includes("kg"));
}

function waterUnit(role: WaterColumnRole, tokens: readonly string[]): WaterUnit {
  const millimoles = has(tokens, "mmol", "mm", "mmol/l");
  // bicarbonate as HCO3 (not "bicarbonate alkalinity as CaCO3", which is alkalinity)
  if (role === "alkalinity" && isBicarbonate(tokens) && !namesAlkalinity(tokens) && !has(tokens, "caco"))
    return millimoles ? "mmol/L HCO3" : "mg/L HCO3";
  if (role === "alkalinity") {
    if (has(tokens, "meq", "mval") || millimoles) return "meq/L";
    if (tokens.includes("degf")) return "degf"; // "TAC (°f)": French degrees
    if (has(tokens, "mg", "ppm", "caco")) return "mg/L CaCO3";
    if (isAcidCapacity(tokens)) return "meq/L";
    return tokens.includes("tac") ? "degf" : "mg/L CaCO3"; // a bare "TAC" is French: in French degrees (common practice)
  }
  if (millimoles) return "mmol/L";
  if (has(tokens, "umol")) return "umol/L";
  if (saysMolPerKg(tokens)) return "mol/kg";
  if (role === "dic") return has(tokens, "mg", "ppm") ? "mg/L C" : "mol/kg";
  if (role === "chloride") return has(tokens, "ug", "ppb") ? "ug/L" : "mg/L";
  if (role === "phosphate") return phosphateAsP(tokens) ? "mg/L P" : "mg/L PO4";
  // sulfate "as S" (SO4-S): the token "s" after "as", or "so 4 s"
  const asS = tokens.some(
    (t, i) => t === "s" && (tokens[i - 1] === "as" || (tokens[i - 1] === "4" && tokens[i - 2] === "so")),
  );
  return asS ? "mg/L S" : "mg/L SO4";
}

/**
 * The alkalinity, chloride and sulfate columns among `headers`, skipping the columns the main mapping uses; the
 * first matching column (left to right) wins.
 */
export function matchWaterColumns(headers: readonly unknown[], mapping: ColumnMapping = EMPTY_MAPPING): WaterColumns {
  const tokens = headers.map((h) =>
    headerTokens(typeof h === "string" ? h : h === null || h === undefined ? "" : String(h)),
  );
  const taken = new Set(Object.values(mapping).filter((i) => i >= 0));
  const out: WaterColumns = {};
  const tests: Record<WaterColumnRole, (t: readonly string[]) => boolean> = {
    alkalinity: isAlkalinity,
    chloride: isChloride,
    sulfate: isSulfate,
    dic: isDic,
    phosphate: isPhosphate,
  };
  for (const role of WATER_COLUMN_ROLES) {
    let index = tokens.findIndex((t, i) => !taken.has(i) && t.length > 0 && tests[role](t));
    // no alkalinity column: a bicarbonate column gives the carbonate the same way (through REDOX.DIC)
    if (index < 0 && role === "alkalinity") index = tokens.findIndex((t, i) => !taken.has(i) && isBicarbonate(t));
    if (index < 0) continue;
    taken.add(index);
    out[role] = { index, unit: waterUnit(role, tokens[index]) };
  }
  return out;
}

/** A column the user chose for `role`, with the unit its header names (or the role's default unit). */
export function waterColumnAt(role: WaterColumnRole, headers: readonly unknown[], index: number): WaterColumn {
  const h = headers[index];
  return {
    index,
    unit: waterUnit(role, headerTokens(typeof h === "string" ? h : h === null || h === undefined ? "" : String(h))),
  };
}

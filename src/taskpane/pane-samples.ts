/**
 * The drawn samples: every drawn row's own answer from the worksheet functions (sample-answers.ts) — its reading
 * as logged at its own temperature, its own water. Rows the functions refuse go to the "not drawn" list.
 */
import { hasLigands, LIGAND_ORDER, LigandName } from "../chemistry";
import { type DisplayScale, type PlottedSample, type PotentialUnit } from "../diagram";
import { type ColumnMapping, type IonicColumn } from "../tables";
import { ionicArgumentFor, ionicCaption } from "./ionic-input";
import type { WaterSettings } from "./ligand-inputs";
import { AnswerPlan, answerSamples, RowLigand, rowLigand } from "./sample-answers";
import type { readSamples, SampleTable, SkippedRow } from "./sample-table";

/** Where the rows are drawn: metal, electrode and unit of the readings, activity and the diagram temperature. */
export interface AnswerConditions {
  metal: string;
  electrode: string;
  unit: PotentialUnit;
  activity: number;
  celsius: number;
}

/** The table, its column mapping and temperature unit. */
export interface RowSource {
  table: SampleTable;
  mapping: ColumnMapping;
  temperatureUnit: "C" | "F";
  /** The conductivity, TDS or ionic-strength column used automatically for each sample's [ionicStrength]. */
  ionic: IonicColumn | null;
}

/** The worksheet functions' plan for the rows: their columns, the ligands read per row and the typed totals. */
function answerPlan(source: RowSource, water: WaterSettings, at: AnswerConditions): AnswerPlan {
  const ligands: RowLigand[] = [];
  const typed: Partial<Record<LigandName, number>> = {};
  for (const ligand of LIGAND_ORDER) {
    const entry = water[ligand];
    if (entry.kind === "column") ligands.push(rowLigand(ligand, entry.column));
    else if (entry.total !== null && entry.total > 0) typed[ligand] = entry.total;
  }
  return {
    ...at,
    phColumn: source.mapping.pH,
    potentialColumn: source.mapping.potential,
    temperatureColumn: source.mapping.temperature,
    temperatureUnit: source.temperatureUnit,
    ligands,
    typed,
    ...(source.ionic ? { ionic: source.ionic } : {}),
  };
}

/**
 * Each read row's own answer as a plotted sample; rows the functions refuse in `failed` with their message;
 * `ionicLine` the caption's words on the ionic-strength column used, if any.
 */
export function ownAnswers(
  source: RowSource | null,
  read: ReturnType<typeof readSamples> | null,
  water: WaterSettings,
  at: AnswerConditions,
  scale: DisplayScale,
): { samples: PlottedSample[]; failed: SkippedRow[]; ionicLine: string } {
  if (!source || !read) return { samples: [], failed: [], ionicLine: "" };
  const { table, mapping } = source;
  const rows = read.indices.map((i) => table.rows[i]);
  const answers = answerSamples(answerPlan(source, water, at), rows);
  const ionic = source.ionic;
  const ionicLine =
    ionic && rows.length > 0 ? ionicCaption(table.headers[ionic.index], ionic, ionicArgumentFor(ionic, rows)) : "";
  const samples: PlottedSample[] = [];
  const failed: SkippedRow[] = [];
  read.samples.forEach((s, k) => {
    const a = answers[k];
    if ("error" in a) return void failed.push({ row: s.row, reason: a.error });
    const logged = String(rows[k][mapping.potential] ?? "").trim();
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
      reading: `${logged} ${at.unit} vs ${scale.electrode}`,
      celsius: a.celsius,
      equilibrium: a.dissolved,
      site: mapping.site >= 0 ? String(rows[k][mapping.site] ?? "").trim() : undefined,
    };
    const withIonic = a.ionicStrength === null ? plotted : { ...plotted, ionicStrength: a.ionicStrength };
    samples.push(hasLigands(a.water) ? { ...withIonic, ligands: a.water } : withIonic);
  });
  return { samples, failed, ionicLine };
}

/**
 * Reference electrode scales: the potential of each reference electrode vs the standard hydrogen electrode (SHE)
 * as a function of temperature, from the records of data/electrodes.json (validated with zod at load; each record
 * names its sources), and conversion of readings between scales:
 *
 *   E(vs SHE) = reading(vs electrode) + E_electrode(vs SHE, t)
 *
 * Temperature models (the record says which one its source supports):
 *   polynomial           E(t) = e25 + Σ c_i·(t − 25)^i, t in °C
 *   silver-chloride      E(t) = E°(AgCl/Ag, t) + [e25 − E°(AgCl/Ag, 25)]·T/T0 — Bates & Bower's standard potential
 *                        plus the chloride term −k(T)·log10 a(Cl−), filling activity held at its 25 °C value
 *   reversible-hydrogen  E = −k(T)·pH, k = RT ln10 / F (hydrogen electrode in the test solution, 1 bar H2)
 */
import { DEFAULT_CELSIUS } from "./domain";
import { z } from "zod";
import electrodesData from "../../data/electrodes.json";
import { kelvin, nernstFactor, T0 } from "./constants";
import { ownEntry } from "./own-entry";

const celsiusRange = z
  .tuple([z.number().finite(), z.number().finite()])
  .refine(([low, high]) => low < high, { message: "validCelsius must be [low, high] with low < high" });

const temperatureModelSchema = z.discriminatedUnion("model", [
  z.object({ model: z.literal("polynomial"), coefficients: z.array(z.number().finite()).max(4) }).strict(),
  z.object({ model: z.literal("silver-chloride") }).strict(),
  z.object({ model: z.literal("reversible-hydrogen") }).strict(),
]);

export const electrodeRecordSchema = z
  .object({
    /** Name shown to users and accepted as typed: "SCE", "AgCl-3M". */
    id: z.string().min(2),
    name: z.string().min(3),
    /** Other spellings users type; matched ignoring case, spaces and the separators - _ / ( ) ,. */
    aliases: z.array(z.string().min(2)),
    /** Potential vs SHE at 25 °C, V. */
    e25: z.number().finite().min(-1.5).max(1.5),
    temperature: temperatureModelSchema,
    /** Temperatures (°C) in which the temperature model holds. */
    validCelsius: celsiusRange,
    /** Reference keys for the 25 °C value and for the temperature dependence. */
    source: z.string().min(1),
    temperatureSource: z.string().min(1),
    note: z.string().optional(),
  })
  .strict();

export const electrodesFileSchema = z
  .object({
    description: z.string().min(10),
    references: z.record(z.string(), z.string().min(10)),
    silverChlorideStandard: z
      .object({
        description: z.string(),
        /** E°(AgCl/Ag) = Σ a_i·t^i, t in °C. */
        coefficients: z.array(z.number().finite()).min(1).max(5),
        validCelsius: celsiusRange,
        source: z.string().min(1),
      })
      .strict(),
    /** Names that could mean several electrodes: answered with an error listing them. */
    ambiguousNames: z.array(z.object({ name: z.string().min(2), candidates: z.array(z.string()).min(2) }).strict()),
    electrodes: z.array(electrodeRecordSchema).min(1),
  })
  .strict();

export type ElectrodeRecord = z.infer<typeof electrodeRecordSchema>;
export type ElectrodesFile = z.infer<typeof electrodesFileSchema>;

export interface Electrode extends ElectrodeRecord {
  /** Full citation of the 25 °C value. */
  readonly citation: string;
  /** Full citation of the temperature dependence. */
  readonly temperatureCitation: string;
  /** True when the potential depends on the pH of the solution (RHE). */
  readonly needsPH: boolean;
}

export class ElectrodeError extends Error {}

/** The outcome of looking up a name: an electrode, or why not. */
export type ElectrodeLookup = { electrode: Electrode } | { error: string };

/** Lower case without spaces and the separators - _ / ( ) , — "Ag/AgCl 3M" → "agagcl3m". */
export function normaliseElectrodeName(text: string): string {
  return text.toLowerCase().replace(/[\s\-_/(),]+/g, "");
}

export class ElectrodeTable {
  private readonly byName = new Map<string, Electrode>();
  private readonly ambiguous = new Map<string, readonly string[]>();
  private readonly list: Electrode[] = [];
  private readonly agcl: ElectrodesFile["silverChlorideStandard"];

  constructor(content: unknown, path = "data/electrodes.json") {
    const parsed = electrodesFileSchema.safeParse(content);
    if (!parsed.success) {
      const issues = parsed.error.issues
        .slice(0, 5)
        .map((i) => `${i.path.map(String).join(".") || "(file)"}: ${i.message}`);
      throw new ElectrodeError(`${path}: ${issues.join("; ")}`);
    }
    const data = parsed.data;
    const cite = (key: string, where: string): string => {
      const text = ownEntry(data.references, key);
      if (!text) throw new ElectrodeError(`${path}: ${where}: source key "${key}" is not in references`);
      return text;
    };
    cite(data.silverChlorideStandard.source, "silverChlorideStandard");
    this.agcl = data.silverChlorideStandard;
    for (const record of data.electrodes) {
      const electrode: Electrode = {
        ...record,
        citation: cite(record.source, record.id),
        temperatureCitation: cite(record.temperatureSource, record.id),
        needsPH: record.temperature.model === "reversible-hydrogen",
      };
      if (record.temperature.model === "silver-chloride") {
        const [low, high] = data.silverChlorideStandard.validCelsius;
        if (record.validCelsius[0] < low || record.validCelsius[1] > high) {
          throw new ElectrodeError(
            `${path}: ${record.id}: validCelsius exceeds the range of the silver chloride standard potential`,
          );
        }
      }
      for (const name of [record.id, ...record.aliases]) {
        const key = normaliseElectrodeName(name);
        const other = this.byName.get(key);
        if (other && other !== electrode)
          throw new ElectrodeError(`${path}: name "${name}" is used by both ${other.id} and ${record.id}`);
        this.byName.set(key, electrode);
      }
      this.list.push(electrode);
    }
    for (const entry of data.ambiguousNames) {
      const key = normaliseElectrodeName(entry.name);
      if (this.byName.has(key))
        throw new ElectrodeError(`${path}: ambiguous name "${entry.name}" is also an electrode name`);
      for (const id of entry.candidates) {
        if (!this.list.some((e) => e.id === id))
          throw new ElectrodeError(`${path}: ambiguous name "${entry.name}" lists unknown electrode ${id}`);
      }
      this.ambiguous.set(key, entry.candidates);
    }
  }

  /** Every electrode, in file order. */
  all(): readonly Electrode[] {
    return this.list;
  }

  /** Finds an electrode by id or alias, ignoring case, spaces and separators. */
  lookup(text: string): ElectrodeLookup {
    const key = normaliseElectrodeName(text);
    const electrode = this.byName.get(key);
    if (electrode) return { electrode };
    const candidates = this.ambiguous.get(key);
    if (candidates) return { error: `"${text}" could mean several electrodes; write one of ${candidates.join(", ")}` };
    return {
      error: `"${text.length > 24 ? text.slice(0, 24) + "…" : text}" is not a known reference electrode (${this.list.map((e) => e.id).join(", ")})`,
    };
  }

  /** E°(AgCl/Ag) at `celsius`, V vs SHE (Bates & Bower polynomial). */
  silverChlorideStandard(celsius: number): number {
    return polynomial(this.agcl.coefficients, celsius);
  }

  /**
   * Potential of the electrode vs SHE, V, at `celsius` (and pH for RHE). The caller checks the validity range
   * with `inRange`; outside it the models extrapolate.
   */
  potential(electrode: Electrode, celsius: number, pH?: number): number {
    const model = electrode.temperature;
    switch (model.model) {
      case "polynomial":
        return electrode.e25 + polynomial([0, ...model.coefficients], celsius - 25);
      case "silver-chloride": {
        const chlorideTerm = electrode.e25 - this.silverChlorideStandard(25);
        return this.silverChlorideStandard(celsius) + (chlorideTerm * kelvin(celsius)) / T0;
      }
      case "reversible-hydrogen":
        if (pH === undefined) throw new ElectrodeError(`${electrode.id} needs the pH of the solution`);
        return electrode.e25 - nernstFactor(kelvin(celsius)) * pH + 0;
    }
  }
}

/** Whether `celsius` lies in the electrode's validity range. */
export function inRange(electrode: Electrode, celsius: number): boolean {
  return celsius >= electrode.validCelsius[0] && celsius <= electrode.validCelsius[1];
}

/** Σ a_i·x^i (Horner). */
function polynomial(coefficients: readonly number[], x: number): number {
  let sum = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) sum = sum * x + coefficients[i];
  return sum;
}

let shared: ElectrodeTable | undefined;

/** The electrodes of data/electrodes.json, loaded and validated once. */
export function getElectrodes(): ElectrodeTable {
  shared ??= new ElectrodeTable(electrodesData);
  return shared;
}

/** An electrode given as a record or by name; an unknown or ambiguous name throws ElectrodeError. */
function resolve(electrode: Electrode | string, table: ElectrodeTable): Electrode {
  if (typeof electrode !== "string") return electrode;
  const found = table.lookup(electrode);
  if ("error" in found) throw new ElectrodeError(found.error);
  return found.electrode;
}

/** Potential vs SHE from a reading (V) against `electrode` at `celsius` (pH only for RHE). */
export function toSHE(
  reading: number,
  electrode: Electrode | string,
  celsius = DEFAULT_CELSIUS,
  pH?: number,
  table: ElectrodeTable = getElectrodes(),
): number {
  return reading + table.potential(resolve(electrode, table), celsius, pH);
}

/** Reading (V) against `electrode` of a potential given vs SHE. */
export function fromSHE(
  potential: number,
  electrode: Electrode | string,
  celsius = DEFAULT_CELSIUS,
  pH?: number,
  table: ElectrodeTable = getElectrodes(),
): number {
  return potential - table.potential(resolve(electrode, table), celsius, pH);
}

/**
 * The thermodynamic database: species records from data/species/*.json and element records from
 * data/elements.json, validated with zod at load. A record that fails validation stops the load with an error that
 * names the file, the record and the field — nothing is skipped silently.
 */
import { ElementRecord, elementsFileSchema, SpeciesRecord, systemFileSchema } from "./database-schema";
import { DATA_FILES, ELEMENTS_FILE } from "./data-files";
import { parseFormula, PhaseState } from "./formula";
import { ownEntry } from "./own-entry";

/** A species as the engine uses it: SI units (J/mol), parsed composition, full source citation. */
export interface Species {
  readonly formula: string;
  readonly charge: number;
  readonly state: PhaseState;
  readonly name: string;
  /** ΔG°f at 298.15 K, J/mol. */
  readonly dGf: number;
  /** ΔH°f at 298.15 K, J/mol, or null. */
  readonly dHf: number | null;
  /** S° at 298.15 K, J/(mol·K), or null. */
  readonly S: number | null;
  /** Cp° at 298.15 K, J/(mol·K), or null. */
  readonly Cp: number | null;
  /** Full citation of the values. */
  readonly source: string;
  readonly note?: string;
  /** The file's system: "Fe", "water", "C"… */
  readonly system: string;
  readonly elements: Readonly<Record<string, number>>;
}

export interface SystemEntry {
  readonly system: string;
  readonly kind: "metal" | "water" | "ligand";
  readonly title: string;
  readonly compilation: string;
  readonly references: Readonly<Record<string, string>>;
  readonly species: readonly Species[];
}

export interface DataFile {
  /** Path shown in error messages: "data/species/fe.json". */
  readonly path: string;
  readonly content: unknown;
}

export class DatabaseError extends Error {}

export class Database {
  private readonly byFormula = new Map<string, Species>();
  private readonly byLowerFormula = new Map<string, Species[]>();
  private readonly systems = new Map<string, SystemEntry>();
  private readonly elementRecords = new Map<string, ElementRecord>();

  constructor(files: readonly DataFile[], elementsFile: DataFile) {
    const elements = elementsFileSchema.safeParse(elementsFile.content);
    if (!elements.success) throw new DatabaseError(`${elementsFile.path}: ${formatIssues(elements.error.issues)}`);
    for (const e of elements.data.elements) this.elementRecords.set(e.symbol, e);

    for (const file of files) {
      const parsed = systemFileSchema.safeParse(file.content);
      if (!parsed.success) {
        throw new DatabaseError(`${file.path}: ${formatIssues(parsed.error.issues, file.content)}`);
      }
      const data = parsed.data;
      if (this.systems.has(data.system))
        throw new DatabaseError(`${file.path}: system "${data.system}" is defined twice`);
      const species = data.species.map((record, i) =>
        this.toSpecies(record, data.system, data.references, `${file.path}: species[${i}] ${record.formula}`),
      );
      this.systems.set(data.system, {
        system: data.system,
        kind: data.kind,
        title: data.title,
        compilation: data.compilation,
        references: data.references,
        species,
      });
    }
  }

  private toSpecies(record: SpeciesRecord, system: string, references: Record<string, string>, where: string): Species {
    let elements: Record<string, number>;
    try {
      const parsed = parseFormula(record.formula, record.charge);
      elements = { ...parsed.elements };
      const impliedState = parsed.state;
      if (record.charge === 0 && impliedState !== record.state) {
        throw new Error(`state "${record.state}" does not match the formula's suffix`);
      }
      if (record.charge !== 0 && record.state !== "aq") throw new Error("an ion must be aqueous");
    } catch (error) {
      throw new DatabaseError(`${where}: ${(error as Error).message}`);
    }
    for (const symbol of Object.keys(elements)) {
      if (!this.elementRecords.has(symbol))
        throw new DatabaseError(`${where}: element ${symbol} is not in data/elements.json`);
    }
    const source = ownEntry(references, record.source);
    if (!source) throw new DatabaseError(`${where}: source key "${record.source}" is not in the file's references`);
    for (const key of [record.cpSource, record.entropySource]) {
      if (key !== undefined && !ownEntry(references, key))
        throw new DatabaseError(`${where}: source key "${key}" is not in the file's references`);
    }
    if (this.byFormula.has(record.formula))
      throw new DatabaseError(`${where}: formula ${record.formula} appears twice in the database`);
    const species: Species = {
      formula: record.formula,
      charge: record.charge,
      state: record.state,
      name: record.name ?? "",
      dGf: record.dGf * 1000,
      dHf: record.dHf === null ? null : record.dHf * 1000,
      S: record.S,
      Cp: record.Cp,
      source: citation(source, references, record),
      note: record.note,
      system,
      elements,
    };
    this.byFormula.set(species.formula, species);
    const lower = species.formula.toLowerCase();
    this.byLowerFormula.set(lower, [...(this.byLowerFormula.get(lower) ?? []), species]);
    return species;
  }

  /** The species written exactly so, or undefined. */
  species(formula: string): Species | undefined {
    return this.byFormula.get(formula);
  }

  /**
   * Finds a species the way a user types it: exact formula first, then ignoring case, then without a state suffix
   * ("Fe2O3" → "Fe2O3(s)") when that is unambiguous.
   */
  lookup(text: string): Species | undefined {
    const t = text.trim();
    const exact = this.byFormula.get(t);
    if (exact) return exact;
    const lower = this.byLowerFormula.get(t.toLowerCase());
    if (lower && lower.length === 1) return lower[0];
    const matches: Species[] = [];
    for (const s of this.byFormula.values()) {
      if (s.formula.replace(/\((s|l|g|aq)\)$/, "") === t) matches.push(s);
    }
    if (matches.length === 1) return matches[0];
    return undefined;
  }

  /** A species that must exist (programming error otherwise). */
  require(formula: string): Species {
    const s = this.byFormula.get(formula);
    if (!s) throw new DatabaseError(`species ${formula} is not in the database`);
    return s;
  }

  system(name: string): SystemEntry | undefined {
    return this.systems.get(name);
  }

  /** Metal systems by element symbol, in file order. */
  metals(): string[] {
    return [...this.systems.values()].filter((s) => s.kind === "metal").map((s) => s.system);
  }

  /** The metal system an element name or symbol refers to ("fe", "Iron", "FE" → "Fe"), or undefined. */
  resolveMetal(text: string): string | undefined {
    const t = text.trim().toLowerCase();
    for (const entry of this.systems.values()) {
      if (entry.kind !== "metal") continue;
      if (entry.system.toLowerCase() === t || entry.title.toLowerCase() === t) return entry.system;
      const element = this.elementRecords.get(entry.system);
      if (element && element.name.toLowerCase() === t) return entry.system;
    }
    return undefined;
  }

  element(symbol: string): ElementRecord | undefined {
    return this.elementRecords.get(symbol);
  }

  allSpecies(): Species[] {
    return [...this.byFormula.values()];
  }
}

/** The full citation of a record: its source, then where its S° and Cp° come from when they come from elsewhere. */
function citation(source: string, references: Readonly<Record<string, string>>, record: SpeciesRecord): string {
  const entropy = record.entropySource ? `; S°: ${ownEntry(references, record.entropySource)}` : "";
  const heatCapacity = record.cpSource ? `; Cp°: ${ownEntry(references, record.cpSource)}` : "";
  return source + entropy + heatCapacity;
}

function formatIssues(issues: readonly { path: readonly PropertyKey[]; message: string }[], content?: unknown): string {
  return issues
    .slice(0, 5)
    .map((issue) => {
      const path = issue.path.map(String);
      let label = path.join(".");
      // name the record by its formula where the path points into species[]
      if (path[0] === "species" && content && typeof content === "object") {
        const list = (content as { species?: { formula?: unknown }[] }).species;
        const formula = list?.[Number(path[1])]?.formula;
        if (typeof formula === "string")
          label = `species[${path[1]}] ${formula}${path.length > 2 ? " ." + path.slice(2).join(".") : ""}`;
      }
      return `${label || "(file)"}: ${issue.message}`;
    })
    .join("; ");
}

let shared: Database | undefined;

/** The database of data/ as bundled, loaded and validated once. */
export function getDatabase(): Database {
  shared ??= new Database(DATA_FILES, ELEMENTS_FILE);
  return shared;
}
